package dev.tether.io;

import com.code_intelligence.jazzer.junit.FuzzTest;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Fuzz test of {@link QuadrupleReader#read(Path)}, strict and with {@code skipMalformed}. The contract (DESIGN.md,
 * "Bad input"): any file either gives a {@link QuadrupleSet} or fails with an {@link InputFormatException} naming the
 * file (and the line, where one is at fault); no other exception; and nothing is dropped silently: every line that is
 * not blank, not the header and not a comment of Tether's own format is either a quadruple or counted as skipped.
 * <p>
 * A normal build runs the seeds only, from
 * {@code src/test/resources/dev/tether/io/QuadrupleReaderFuzzTestInputs/readBothWays/}. To fuzz:
 * <pre>
 *   JAZZER_FUZZ=1 mvn -B -pl models test -Dtest='QuadrupleReaderFuzzTest'
 * </pre>
 */
class QuadrupleReaderFuzzTest {
    @TempDir
    static Path dir;

    @FuzzTest(maxDuration = "3m")
    void readBothWays(byte[] bytes) throws IOException {
        Path file = dir.resolve("fuzzed.quadruples");
        Files.write(file, bytes);
        int lines = lineCount(bytes);

        QuadrupleSet strict = null;
        InputFormatException strictError = null;
        try {
            strict = new QuadrupleReader(false).read(file);
        } catch (InputFormatException e) {
            assertNamesFileAndLine(e, file, lines);
            strictError = e;
        }
        QuadrupleSet lenient = null;
        try {
            lenient = new QuadrupleReader(true).read(file);
        } catch (InputFormatException e) {
            assertNamesFileAndLine(e, file, lines);
        }

        if (strict != null) {
            assertEquals(0, strict.skipped());
            assertFalse(strict.quadruples().isEmpty());
            assertEquals(strict, lenient, "with nothing malformed, skipping changes nothing");
        }
        if (lenient != null) {
            assertFalse(lenient.quadruples().isEmpty());
            assertEquals(Math.min(lenient.skipped(), 5), lenient.skippedReasons().size());
            assertEquals(dataLines(new String(bytes, StandardCharsets.UTF_8)),
                    lenient.quadruples().size() + lenient.skipped(), "every data line is read or counted as skipped");
            if (strictError != null) {
                assertTrue(lenient.skipped() > 0, "strict reading failed (" + strictError.getMessage()
                        + "), so skipping must have skipped something");
            }
        }
    }

    private static void assertNamesFileAndLine(InputFormatException e, Path file, int lines) {
        assertEquals(file.toString(), e.file());
        assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
        assertTrue(e.line() >= 0 && e.line() <= lines, "line " + e.line() + " of " + lines + ": " + e.getMessage());
        if (e.line() > 0) assertTrue(e.getMessage().startsWith(file + ":" + e.line() + ": "), e.getMessage());
    }

    private static int lineCount(byte[] bytes) {
        int n = 1;
        for (byte b : bytes) if (b == '\n') n++;
        return n;
    }

    /**
     * Lines that must become a quadruple or a skip, by the rules QuadrupleReader documents: blank lines are ignored;
     * a file whose first non-blank line is the header is in Tether's own format, where lines starting with # are
     * comments.
     */
    private static int dataLines(String text) {
        String[] lines = text.split("\r?\n", -1);
        int first = 0;
        while (first < lines.length && lines[first].isBlank()) first++;
        boolean own = first < lines.length && lines[first].strip().equals(QuadrupleReader.HEADER_TEXT);
        int n = 0;
        for (int i = own ? first + 1 : 0; i < lines.length; i++) {
            if (lines[i].isBlank() || (own && lines[i].startsWith("#"))) continue;
            n++;
        }
        return n;
    }
}
