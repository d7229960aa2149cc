package dev.tether.io;

import java.io.IOException;
import java.nio.file.Path;

/** Input that cannot be used, located by file and line (line 0 when the problem is the file as a whole). */
public final class InputFormatException extends IOException {
    private final Path file;
    private final int line;

    public InputFormatException(Path file, int line, String problem) {
        super(line > 0 ? file + ":" + line + ": " + problem : file + ": " + problem);
        this.file = file;
        this.line = line;
    }

    public Path file() { return file; }
    public int line() { return line; }
}
