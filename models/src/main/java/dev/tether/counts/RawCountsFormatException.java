package dev.tether.counts;

import java.io.IOException;

/** A file that is not usable raw counts: foreign, truncated, damaged, or of another version. */
public final class RawCountsFormatException extends IOException {
    public RawCountsFormatException(String message) {
        super(message);
    }
}
