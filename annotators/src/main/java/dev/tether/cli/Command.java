package dev.tether.cli;

import java.io.IOException;
import java.io.PrintStream;

/** One verb of the command line. */
interface Command {
    String name();

    /** One line: the command and its options. */
    String usage();

    /** What {@code tether <name> --help} prints: the usage line, what the command does, and every option. */
    default String help() {
        return "usage: tether " + usage() + "\n";
    }

    /** Runs with the whole argument vector ({@code args[0]} is the command name); returns the exit code. */
    int run(String[] args, PrintStream out, PrintStream err) throws UsageException, IOException;
}
