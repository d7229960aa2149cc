package dev.tether.cli;

/** A command line that does not say what to do; the message tells the user how to fix it. */
final class UsageException extends Exception {
    UsageException(String message) {
        super(message);
    }
}
