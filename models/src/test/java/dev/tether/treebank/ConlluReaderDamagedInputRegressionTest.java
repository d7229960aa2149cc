package dev.tether.treebank;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.zip.GZIPOutputStream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Inputs that made {@link ConlluReader} throw something other than a {@link ConlluFormatException} naming file and
 * line. The gzip cases were found by {@link ConlluReaderFuzzTest}; the overlapping ranges by reading the reader while
 * fixing them (CoNLL-U format, universaldependencies.org/format.html: a multiword token line {@code 1-2} names the
 * consecutive words it spans, so two ranges never share a word). The inputs are also seeds of the fuzz test, in
 * {@code ConlluReaderFuzzTestInputs/readAll/}.
 */
class ConlluReaderDamagedInputRegressionTest {
    private static final String SENTENCE = "# text = The crew fixed it.\n"
            + "1\tThe\tthe\tDET\tDT\t_\t2\tdet\t_\t_\n"
            + "2\tcrew\tcrew\tNOUN\tNN\t_\t3\tnsubj\t_\t_\n"
            + "3\tfixed\tfix\tVERB\tVBD\t_\t0\troot\t_\t_\n"
            + "4\tit\tit\tPRON\tPRP\t_\t3\tobj\t_\tSpaceAfter=No\n"
            + "5\t.\t.\tPUNCT\t.\t_\t3\tpunct\t_\t_\n\n";

    @TempDir
    Path dir;

    /** Was: java.util.zip.ZipException "Corrupt GZIP trailer" out of next(). */
    @Test
    void gzipWithADamagedTrailerNamesFileAndLine() throws IOException {
        byte[] gz = gzip(SENTENCE);
        for (int i = gz.length - 8; i < gz.length; i++) gz[i] = (byte) 0xff; // CRC-32 and size
        ConlluFormatException e = readExpectingError("trailer.conllu.gz", gz);
        assertTrue(e.getMessage().contains("gzip-compressed data is damaged"), e.getMessage());
    }

    /** The fuzzer's own input for the trailer case. */
    @Test
    void fuzzerFoundGzipInputNamesFileAndLine() throws IOException {
        try (InputStream in = getClass().getResourceAsStream("ConlluReaderFuzzTestInputs/readAll/gzip-corrupt-trailer")) {
            assertNotNull(in);
            ConlluFormatException e = readExpectingError("fuzzed.conllu", in.readAllBytes());
            assertTrue(e.getMessage().contains("gzip"), e.getMessage());
        }
    }

    /** Was: java.io.EOFException "Unexpected end of ZLIB input stream" out of next(). */
    @Test
    void gzipCutShortNamesFileAndTheLineWhereItEnds() throws IOException {
        byte[] gz = gzip(SENTENCE);
        ConlluFormatException e = readExpectingError("cut.conllu.gz", Arrays.copyOf(gz, gz.length / 2));
        assertTrue(e.getMessage().contains("gzip-compressed data is damaged or cut short"), e.getMessage());
        assertTrue(e.line() >= 1 && e.line() <= 7, "line " + e.line());
    }

    /** Was: java.io.EOFException out of ConlluReader.open, before any line was read. */
    @Test
    void gzipSignatureWithoutAHeaderNamesTheFile() throws IOException {
        ConlluFormatException e = readExpectingError("header.conllu.gz", new byte[] {0x1f, (byte) 0x8b, 8});
        assertEquals(1, e.line());
        assertTrue(e.getMessage().contains("gzip header is damaged"), e.getMessage());
    }

    /** Was: ArrayIndexOutOfBoundsException in the alignment: range 1-5 was forgotten once range 1-2 followed it. */
    @Test
    void overlappingMultiwordRangesAreAFormatError() throws IOException {
        String text = "# text = ab cd\n"
                + "1-5\tab\t_\t_\t_\t_\t_\t_\t_\t_\n"
                + "1-2\tab\t_\t_\t_\t_\t_\t_\t_\t_\n"
                + "1\ta\ta\tX\tX\t_\t0\troot\t_\t_\n"
                + "2\tb\tb\tX\tX\t_\t1\tdep\t_\t_\n\n";
        ConlluFormatException e = readExpectingError("overlap.conllu", text.getBytes(StandardCharsets.UTF_8));
        assertEquals(3, e.line());
        assertTrue(e.getMessage().contains("overlaps the range before it"), e.getMessage());
    }

    @Test
    void consecutiveRangesStillRead() throws IOException {
        String text = "# text = didn't won't\n"
                + "1-2\tdidn't\t_\t_\t_\t_\t_\t_\t_\t_\n"
                + "1\tdid\tdo\tAUX\tVBD\t_\t0\troot\t_\t_\n"
                + "2\tn't\tnot\tPART\tRB\t_\t1\tadvmod\t_\t_\n"
                + "3-4\twon't\t_\t_\t_\t_\t_\t_\t_\t_\n"
                + "3\two\twill\tAUX\tMD\t_\t1\tconj\t_\t_\n"
                + "4\tn't\tnot\tPART\tRB\t_\t3\tadvmod\t_\t_\n\n";
        Path file = dir.resolve("ranges.conllu");
        Files.writeString(file, text);
        TreebankSentence s = ConlluReader.readAll(file).get(0);
        assertEquals(4, s.size());
        assertEquals(7, s.begin(2), "'wo' shares the span of \"won't\"");
        assertEquals(12, s.end(3));
    }

    private ConlluFormatException readExpectingError(String name, byte[] bytes) throws IOException {
        Path file = dir.resolve(name);
        Files.write(file, bytes);
        ConlluFormatException e = assertThrows(ConlluFormatException.class, () -> ConlluReader.readAll(file));
        assertEquals(file.toString(), e.file());
        assertTrue(e.getMessage().startsWith(file + ":" + e.line() + ": "), e.getMessage());
        return e;
    }

    private static byte[] gzip(String text) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (GZIPOutputStream out = new GZIPOutputStream(bytes)) {
            out.write(text.getBytes(StandardCharsets.UTF_8));
        }
        return bytes.toByteArray();
    }
}
