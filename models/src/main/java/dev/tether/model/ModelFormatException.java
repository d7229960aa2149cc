package dev.tether.model;

import java.io.IOException;

/** A file that is not a usable Tether model: foreign, truncated, damaged, or of an unknown format version. */
public final class ModelFormatException extends IOException {
    public ModelFormatException(String message) {
        super(message);
    }

    public ModelFormatException(String message, Throwable cause) {
        super(message, cause);
    }
}
