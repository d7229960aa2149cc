package dev.tether.output;

import org.junit.jupiter.api.Test;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** The XMI writer's UTF-8 encoder against the JDK's (RFC 3629 UTF-8, as {@code String.getBytes} writes it). */
class Utf8BufferTest {
    @Test
    void everyKindOfCharacterAtEveryOffsetAcrossManyBuffersEncodesAsTheJdkDoes() throws IOException {
        String[] kinds = {"a", "\u00e9", "\u20ac", "\uD83D\uDD27", "\u4e2d", "\u07ff", "\u0800", "\uffef", "\uDBFF\uDFFF"};
        StringBuilder text = new StringBuilder();
        // Runs of each kind whose lengths do not divide the buffer, so every kind meets a buffer's end at every offset.
        for (int i = 0; text.length() < 300_000; i++) text.append(kinds[i % kinds.length].repeat(1 + i % 5));
        String s = text.toString();
        for (int chunk : new int[] {1, 7, 4096, s.length()}) {
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            XmlTextWriter.Utf8Buffer buffer = new XmlTextWriter.Utf8Buffer(out);
            for (int from = 0; from < s.length(); ) {
                int to = Math.min(s.length(), from + chunk);
                if (to < s.length() && Character.isHighSurrogate(s.charAt(to - 1))) to++; // the writer never cuts a pair
                buffer.write(s, from, to - from);
                from = to;
            }
            buffer.flush();
            assertArrayEquals(s.getBytes(StandardCharsets.UTF_8), out.toByteArray(), "written in pieces of " + chunk);
        }
    }

    @Test
    void anUnpairedSurrogateIsAnErrorNotAQuestionMark() {
        XmlTextWriter.Utf8Buffer buffer = new XmlTextWriter.Utf8Buffer(new ByteArrayOutputStream());
        assertThrows(IOException.class, () -> buffer.write("gasket \uD83D seal"));
        assertThrows(IOException.class, () -> buffer.write("\uDD27"));
    }
}
