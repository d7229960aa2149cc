package dev.tether.io;

import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Both quadruple formats: the benchmark's whitespace-separated lines {@code id verb noun1 preposition noun2 V|N}
 * (the format of the data of Ratnaparkhi, Reynar &amp; Roukos 1994) and Tether's own tab-separated file with a header.
 */
class QuadrupleReaderTest {
    @TempDir
    Path dir;

    private static Path resource(String name) throws Exception {
        return Path.of(QuadrupleReaderTest.class.getResource("/dev/tether/io/" + name).toURI());
    }

    @Test
    void readsTheBenchmarkFormat() throws Exception {
        Path file = resource("ferry-logs.quadruples");
        QuadrupleSet set = new QuadrupleReader(false).read(file);
        assertEquals(33, set.quadruples().size());
        assertEquals("ferry-logs.quadruples", set.name());
        assertEquals(0, set.skipped());
        LabelledQuadruple first = set.quadruples().get(0);
        assertEquals(new Quadruple("replaced", "gasket", "with", "spare"), first.quadruple());
        assertEquals(AttachmentSite.VERB, first.site());
        assertEquals("ferry-logs.quadruples:1", first.source());
        LabelledQuadruple crack = set.quadruples().get(5);
        assertEquals(new Quadruple("found", "crack", "in", "bulkhead"), crack.quadruple());
        assertEquals(AttachmentSite.NOUN, crack.site());
        // Words are kept as written; normalization is the model's job.
        assertEquals("2,400", set.quadruples().get(18).quadruple().noun1());
        assertEquals(Sha256.hex(Files.readAllBytes(file)), set.sha256());
    }

    @Test
    void readsTetherTabSeparatedFormatWithCommentsAndBlankLines() throws Exception {
        QuadrupleSet set = new QuadrupleReader(false).read(resource("ferry-logs.tsv"));
        assertEquals(List.of(
                new Quadruple("secured", "hatch", "with", "bolts"),
                new Quadruple("moored", "ferry", "at", "pier"),
                new Quadruple("checked", "level", "of", "oil")),
                set.quadruples().stream().map(LabelledQuadruple::quadruple).toList());
        assertEquals(List.of(AttachmentSite.VERB, AttachmentSite.VERB, AttachmentSite.NOUN),
                set.quadruples().stream().map(LabelledQuadruple::site).toList());
        // Line numbers count the header, the comment and the blank line.
        assertEquals("ferry-logs.tsv:6", set.quadruples().get(2).source());
    }

    @Test
    void benchmarkFormatAcceptsTabsRunsOfSpacesAndWindowsLineEnds() throws Exception {
        Path file = write("mixed.txt", "1\treplaced  gasket with\tspare V\r\n\r\n2 fitted valve with seal N\r\n");
        QuadrupleSet set = new QuadrupleReader(false).read(file);
        assertEquals(2, set.quadruples().size());
        assertEquals(new Quadruple("replaced", "gasket", "with", "spare"), set.quadruples().get(0).quadruple());
        assertEquals(AttachmentSite.NOUN, set.quadruples().get(1).site());
    }

    @Test
    void malformedLineIsAnErrorNamingFileAndLine() throws Exception {
        Path file = write("logs.txt", "1 replaced gasket with spare V\n2 inspected hull for V\n3 fitted valve with seal N\n");
        InputFormatException e = assertThrows(InputFormatException.class, () -> new QuadrupleReader(false).read(file));
        assertEquals(file.toString(), e.file());
        assertEquals(2, e.line());
        assertTrue(e.getMessage().startsWith(file + ":2: "), e.getMessage());
        assertTrue(e.getMessage().contains("--skip-malformed"), e.getMessage());
    }

    @Test
    void unknownLabelIsAnErrorNamingTheLabel() throws Exception {
        Path file = write("logs.txt", "1 replaced gasket with spare V\n2 inspected hull for corrosion X\n");
        InputFormatException e = assertThrows(InputFormatException.class, () -> new QuadrupleReader(false).read(file));
        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("'X'"), e.getMessage());
        Path own = write("own.tsv", QuadrupleReader.HEADER_TEXT + "\nsecured\thatch\twith\tbolts\tsideways\n");
        InputFormatException o = assertThrows(InputFormatException.class, () -> new QuadrupleReader(false).read(own));
        assertEquals(2, o.line());
        assertTrue(o.getMessage().contains("'sideways'"), o.getMessage());
    }

    @Test
    void ownFormatRejectsMissingFieldsAndEmptyWords() throws Exception {
        Path file = write("own.tsv", QuadrupleReader.HEADER_TEXT + "\nsecured\thatch\twith\tbolts\tverb\n"
                + "secured\t\twith\tbolts\tverb\n");
        InputFormatException e = assertThrows(InputFormatException.class, () -> new QuadrupleReader(false).read(file));
        assertEquals(3, e.line());
        Path short_ = write("short.tsv", QuadrupleReader.HEADER_TEXT + "\nsecured hatch with bolts verb\n");
        assertEquals(2, assertThrows(InputFormatException.class, () -> new QuadrupleReader(false).read(short_)).line());
    }

    @Test
    void skippingCountsMalformedLinesAndKeepsTheirReasons() throws Exception {
        Path file = write("logs.txt", "1 replaced gasket with spare V\n"
                + "2 inspected hull for V\n"
                + "3 fitted valve with seal N\n"
                + "4 drained tank of ballast maybe\n"
                + "5 too many fields in this line N\n");
        QuadrupleSet set = new QuadrupleReader(true).read(file);
        assertEquals(2, set.quadruples().size());
        assertEquals(3, set.skipped());
        assertEquals(3, set.skippedReasons().size());
        assertTrue(set.skippedReasons().get(0).startsWith("logs.txt:2: "), set.skippedReasons().toString());
        assertTrue(set.skippedReasons().get(1).startsWith("logs.txt:4: "), set.skippedReasons().toString());
        assertTrue(set.skippedReasons().get(1).contains("'maybe'"), set.skippedReasons().toString());
        assertTrue(set.skippedReasons().get(2).startsWith("logs.txt:5: "), set.skippedReasons().toString());
    }

    @Test
    void fileWithOnlyMalformedLinesFailsEvenWhenSkipping() throws Exception {
        Path file = write("logs.txt", "garbage\nmore garbage\n");
        InputFormatException e = assertThrows(InputFormatException.class, () -> new QuadrupleReader(true).read(file));
        assertTrue(e.getMessage().contains(file.toString()), e.getMessage());
        assertTrue(e.getMessage().contains("2 malformed"), e.getMessage());
    }

    @Test
    void emptyFileIsAnErrorNamingTheFile() throws Exception {
        for (String content : new String[] {"", "\n\n  \n", QuadrupleReader.HEADER_TEXT + "\n# only a comment\n"}) {
            Path file = write("empty.txt", content);
            InputFormatException e = assertThrows(InputFormatException.class, () -> new QuadrupleReader(false).read(file));
            assertEquals(file.toString(), e.file());
            assertTrue(e.getMessage().contains(file.toString()) && e.getMessage().contains("no quadruples"), e.getMessage());
        }
    }

    @Test
    void directoryAndMissingFileAreErrorsNamingThePath() throws Exception {
        InputFormatException d = assertThrows(InputFormatException.class, () -> new QuadrupleReader(false).read(dir));
        assertTrue(d.getMessage().contains(dir.toString()) && d.getMessage().contains("directory"), d.getMessage());
        Path missing = dir.resolve("no-such-log.txt");
        InputFormatException m = assertThrows(InputFormatException.class, () -> new QuadrupleReader(false).read(missing));
        assertTrue(m.getMessage().contains(missing.toString()), m.getMessage());
    }

    @Test
    void invalidUtf8IsAnErrorNamingTheLine() throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        bytes.writeBytes("1 replaced gasket with spare V\n2 fitted valve with seal N\n3 painted hull with ".getBytes(StandardCharsets.UTF_8));
        bytes.write(0xC3); // a lead byte followed by a space: not UTF-8
        bytes.writeBytes(" V\n4 drained tank of ballast N\n".getBytes(StandardCharsets.UTF_8));
        Path file = dir.resolve("latin.txt");
        Files.write(file, bytes.toByteArray());
        InputFormatException e = assertThrows(InputFormatException.class, () -> new QuadrupleReader(true).read(file));
        assertEquals(3, e.line());
        assertTrue(e.getMessage().startsWith(file + ":3: ") && e.getMessage().contains("UTF-8"), e.getMessage());
    }

    @Test
    void validUtf8BeyondAsciiIsRead() throws Exception {
        Path file = write("accents.txt", "1 réparé joint with pièce V\n");
        assertEquals("réparé", new QuadrupleReader(false).read(file).quadruples().get(0).quadruple().verb());
    }

    private Path write(String name, String content) throws Exception {
        return Files.writeString(dir.resolve(name), content, StandardCharsets.UTF_8);
    }
}
