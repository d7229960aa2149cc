package dev.tether.pipeline;

import dev.tether.io.InputFormatException;
import dev.tether.io.Utf8Text;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Reads a document as UTF-8 text; refuses binary files and invalid UTF-8 with a message naming the file and line.
 *
 * <p>A byte-order mark at the start (EF BB BF) is not part of the text: it is dropped, so the document text, and
 * every offset into it, starts at the first character after it. Any other valid UTF-8 is kept as it is, characters
 * outside the Basic Multilingual Plane included. Two code points are refused because no XML version can carry them
 * and the document could not be written as XMI: the noncharacters U+FFFE and U+FFFF.
 */
public final class DocumentText {
    private static final char BYTE_ORDER_MARK = '\uFEFF';

    private DocumentText() {
    }

    public static String read(Path file) throws IOException {
        return decode(file, Files.readAllBytes(file));
    }

    /** The text of {@code bytes}, read from {@code file}. */
    public static String decode(Path file, byte[] bytes) throws IOException {
        int line = 1;
        for (byte b : bytes) {
            if (b == 0) {
                throw new InputFormatException(file, line, "looks like a binary file (it contains NUL bytes); give plain UTF-8 text");
            }
            if (b == '\n') line++;
        }
        String text = Utf8Text.decode(file, bytes);
        if (!text.isEmpty() && text.charAt(0) == BYTE_ORDER_MARK) text = text.substring(1);
        line = 1;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n') line++;
            if (c == '\uFFFE' || c == '\uFFFF') {
                throw new InputFormatException(file, line, String.format("holds the noncharacter U+%04X, which XMI "
                        + "(XML) cannot carry; remove it from the text", (int) c));
            }
        }
        return text;
    }
}
