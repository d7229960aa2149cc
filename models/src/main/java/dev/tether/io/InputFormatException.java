package dev.tether.io;

import java.io.IOException;
import java.nio.file.Path;

/** Input that cannot be used, located by file and line (line 0 when the problem is the file as a whole). */
public final class InputFormatException extends IOException {
    private final String file;
    private final int line;

    public InputFormatException(Path file, int line, String problem) {
        this(file.toString(), line, problem);
    }

    /** The same for an input named other than by a local path (a file system URI). */
    public InputFormatException(String file, int line, String problem) {
        super(line > 0 ? file + ":" + line + ": " + problem : file + ": " + problem);
        this.file = file;
        this.line = line;
    }

    /** The input's name: its path, or its URI. */
    public String file() { return file; }
    public int line() { return line; }
}
