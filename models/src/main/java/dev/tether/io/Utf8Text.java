package dev.tether.io;

import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/** Strict UTF-8 decoding that names the first bad line instead of replacing bytes silently. */
public final class Utf8Text {
    private Utf8Text() {
    }

    /** The text of {@code bytes}, read from {@code file}; invalid UTF-8 fails with the file and line. */
    public static String decode(Path file, byte[] bytes) throws InputFormatException {
        return decode(file.toString(), bytes);
    }

    /** The same for an input named by {@code file} (a local path or a file system URI). */
    public static String decode(String file, byte[] bytes) throws InputFormatException {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        try {
            return decoder.decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException whole) {
            int line = 1;
            int start = 0;
            for (int i = 0; i <= bytes.length; i++) {
                if (i == bytes.length || bytes[i] == '\n') {
                    try {
                        decoder.reset().decode(ByteBuffer.wrap(bytes, start, i - start));
                    } catch (CharacterCodingException e) {
                        throw new InputFormatException(file, line, "is not valid UTF-8 text; convert the file to UTF-8");
                    }
                    line++;
                    start = i + 1;
                }
            }
            throw new InputFormatException(file, 0, "is not valid UTF-8 text; convert the file to UTF-8");
        }
    }
}
