package dev.tether.treebank;

import com.code_intelligence.jazzer.junit.FuzzTest;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Fuzz test of {@link ConlluReader}: {@code open(Path)}, then {@code next()} until {@code null}. The contract
 * (DESIGN.md, "Bad input"): any file either yields sentences or fails with a {@link ConlluFormatException} naming the
 * file and a line; never IndexOutOfBounds, NumberFormat, NullPointer or any other exception, and never an endless
 * stream of sentences.
 * <p>
 * The seeds (CoNLL-U format, universaldependencies.org/format.html: ten tab-separated columns, multiword token
 * ranges like {@code 3-4}, empty nodes like {@code 5.1}, {@code # text =} comments, {@code SpaceAfter=No}) are in
 * {@code src/test/resources/dev/tether/treebank/ConlluReaderFuzzTestInputs/readAll/}, one of them gzip-compressed.
 * A normal build runs the seeds only. To fuzz:
 * <pre>
 *   JAZZER_FUZZ=1 mvn -B -pl models test -Dtest='ConlluReaderFuzzTest'
 * </pre>
 */
class ConlluReaderFuzzTest {
    @TempDir
    static Path dir;

    @FuzzTest(maxDuration = "3m")
    void readAll(byte[] bytes) throws IOException {
        Path file = dir.resolve("fuzzed.conllu");
        Files.write(file, bytes);
        boolean gzip = bytes.length >= 2 && (bytes[0] & 0xff) == 0x1f && (bytes[1] & 0xff) == 0x8b;
        // Lines as the reader counts them (BufferedReader): ended by \n, \r or \r\n.
        int lines = 1;
        for (int i = 0; i < bytes.length; i++) {
            if (bytes[i] == '\n' || (bytes[i] == '\r' && (i + 1 == bytes.length || bytes[i + 1] != '\n'))) lines++;
        }

        int sentences = 0;
        try (ConlluReader reader = ConlluReader.open(file)) {
            for (TreebankSentence s = reader.next(); s != null; s = reader.next()) {
                sentences++;
                assertTrue(s.size() > 0, "a sentence has words");
                assertEquals(file.toString(), s.source());
                if (!gzip) assertTrue(sentences <= lines, sentences + " sentences from " + lines + " lines");
            }
        } catch (ConlluFormatException e) {
            assertEquals(file.toString(), e.file());
            assertTrue(e.line() >= 1, "a line is named: " + e.getMessage());
            if (!gzip) assertTrue(e.line() <= lines, "line " + e.line() + " of " + lines + ": " + e.getMessage());
            assertTrue(e.getMessage().startsWith(file + ":" + e.line() + ": "), e.getMessage());
        }
    }
}
