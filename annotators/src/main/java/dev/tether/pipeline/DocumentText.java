package dev.tether.pipeline;

import dev.tether.io.InputFormatException;
import dev.tether.io.Utf8Text;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Reads a document as UTF-8 text; refuses binary files and invalid UTF-8 with a message naming the file and line. */
public final class DocumentText {
    private DocumentText() {
    }

    public static String read(Path file) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        int line = 1;
        for (byte b : bytes) {
            if (b == 0) {
                throw new InputFormatException(file, line, "looks like a binary file (it contains NUL bytes); give plain UTF-8 text");
            }
            if (b == '\n') line++;
        }
        String text = Utf8Text.decode(file, bytes);
        return !text.isEmpty() && text.charAt(0) == '\uFEFF' ? text.substring(1) : text;
    }
}
