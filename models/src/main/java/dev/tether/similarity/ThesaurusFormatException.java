package dev.tether.similarity;

import java.io.IOException;

/** A file that is not a usable thesaurus: foreign, truncated, damaged, of another format version or normalization. */
public final class ThesaurusFormatException extends IOException {
    public ThesaurusFormatException(String message) {
        super(message);
    }

    public ThesaurusFormatException(String message, Throwable cause) {
        super(message, cause);
    }
}
