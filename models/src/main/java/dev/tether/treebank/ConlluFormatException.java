package dev.tether.treebank;

import java.io.IOException;

/** A CoNLL-U file that does not follow the format; the message names the file and line and what is wrong. */
public final class ConlluFormatException extends IOException {
    private final String file;
    private final int line;

    public ConlluFormatException(String file, int line, String problem) {
        super(file + ":" + line + ": " + problem);
        this.file = file;
        this.line = line;
    }

    public String file() { return file; }
    /** 1-based line number of the offending line. */
    public int line() { return line; }
}
