package dev.tether.treebank;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.OutputStream;
import java.io.StringReader;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.zip.GZIPOutputStream;

import static org.junit.jupiter.api.Assertions.*;

class ConlluReaderTest {

    static Path fixture(String name) throws URISyntaxException {
        return Path.of(ConlluReaderTest.class.getResource(name).toURI());
    }

    @Test
    void readsWordsTagsAndZeroBasedHeads() throws Exception {
        List<TreebankSentence> all = ConlluReader.readAll(fixture("maintenance.conllu"));
        assertEquals(2, all.size());
        TreebankSentence s = all.get(0);
        assertEquals("The crew replaced the seal on the pump with a spare.", s.text());
        assertEquals(12, s.size());
        assertEquals("replaced", s.form(2));
        assertEquals("VERB", s.upos(2));
        assertEquals("VBD", s.xpos(2));
        assertEquals(-1, s.head(2), "the root's head is -1");
        assertEquals(4, s.head(7), "pump hangs off seal (word 5, index 4)");
        assertEquals("nmod", s.relation(7));
        assertEquals(4, s.line(0), "the first word line is line 4 of the file");
        assertTrue(s.location(5).endsWith("maintenance.conllu:9"));
    }

    @Test
    void alignsFormsToTheText() throws Exception {
        TreebankSentence s = ConlluReader.readAll(fixture("maintenance.conllu")).get(0);
        for (int i = 0; i < s.size(); i++) {
            assertEquals(s.form(i), s.text().substring(s.begin(i), s.end(i)), "word " + i);
        }
        assertEquals(46, s.begin(10), "'spare' starts at character 46");
        assertEquals(51, s.begin(11), "the full stop follows 'spare' with no space");
    }

    @Test
    void multiwordTokenWordsShareTheSurfaceSpanAndEmptyNodesAreSkipped() throws Exception {
        TreebankSentence s = ConlluReader.readAll(fixture("maintenance.conllu")).get(1);
        assertEquals(14, s.size(), "14 words: the range line and the empty node are not words");
        assertEquals("did", s.form(5));
        assertEquals("n't", s.form(6));
        int begin = s.text().indexOf("didn't");
        assertEquals(begin, s.begin(5));
        assertEquals(begin + 6, s.end(5));
        assertEquals(begin, s.begin(6));
        assertEquals(begin + 6, s.end(6));
        assertEquals("check", s.text().substring(s.begin(7), s.end(7)));
        assertEquals(7, s.head(11), "'was' hangs off 'check' although the empty node 8.1 sits between them");
    }

    @Test
    void rebuildsMissingTextFromFormsAndSpaceAfter() throws Exception {
        TreebankSentence s = ConlluReader.readAll(fixture("no-text.conllu")).get(0);
        assertEquals("Check the bilge!", s.text());
        assertEquals(10, s.begin(2));
        assertEquals(15, s.begin(3));
    }

    @Test
    void aBrokenLineNamesFileLineAndProblem() {
        ConlluFormatException e = assertThrows(ConlluFormatException.class,
                () -> ConlluReader.readAll(fixture("broken-columns.conllu")));
        assertEquals(3, e.line());
        assertTrue(e.getMessage().contains("broken-columns.conllu:3:"), e.getMessage());
        assertTrue(e.getMessage().contains("expected 10 tab-separated columns, found 9"), e.getMessage());
    }

    @Test
    void aHeadBeyondTheSentenceNamesItsLine() {
        ConlluFormatException e = assertThrows(ConlluFormatException.class,
                () -> ConlluReader.readAll(fixture("broken-head.conllu")));
        assertEquals(4, e.line());
        assertTrue(e.getMessage().contains("head 7"), e.getMessage());
    }

    @Test
    void wrongIdsFormsAndHeadsAreReported() {
        String base = "# text = a b\n";
        assertProblem(base + "1\ta\t_\tX\tX\t_\t0\troot\t_\t_\n3\tb\t_\tX\tX\t_\t1\tdep\t_\t_\n", 3, "word id 3 where 2");
        assertProblem(base + "1\ta\t_\tX\tX\t_\tzero\troot\t_\t_\n", 2, "head 'zero'");
        assertProblem(base + "x\ta\t_\tX\tX\t_\t0\troot\t_\t_\n", 2, "not a number");
        assertProblem(base + "1\ta\t_\tX\tX\t_\t0\troot\t_\t_\n# late comment\n", 3, "comment after word lines");
        assertProblem(base + "\n", 2, "blank line after comments");
        assertProblem("# text = ab\n1\tab\t_\tX\tX\t_\t0\troot\t_\t_\n2\tc\t_\tX\tX\t_\t1\tdep\t_\t_\n", 3, "form 'c' not found");
    }

    private static void assertProblem(String conllu, int line, String words) {
        ConlluFormatException e = assertThrows(ConlluFormatException.class, () -> {
            try (ConlluReader r = new ConlluReader(new StringReader(conllu), "inline.conllu")) {
                while (r.next() != null) { /* read to the end */ }
            }
        });
        assertTrue(e.getMessage().startsWith("inline.conllu:" + line + ": "), e.getMessage());
        assertTrue(e.getMessage().contains(words), e.getMessage());
    }

    @Test
    void readsGzipTransparently(@TempDir Path dir) throws Exception {
        Path gz = dir.resolve("maintenance.conllu.gz");
        try (OutputStream out = new GZIPOutputStream(Files.newOutputStream(gz))) {
            out.write(Files.readAllBytes(fixture("maintenance.conllu")));
        }
        assertEquals(ConlluReader.readAll(fixture("maintenance.conllu")), ConlluReader.readAll(gz));
    }

    @Test
    void invalidUtf8IsReportedWithItsLine(@TempDir Path dir) throws IOException {
        Path bad = dir.resolve("latin1.conllu");
        byte[] bytes = "# text = caf\u00e9\n1\tcaf\u00e9\t_\tX\tX\t_\t0\troot\t_\t_\n\n".getBytes(java.nio.charset.StandardCharsets.ISO_8859_1);
        Files.write(bad, bytes);
        ConlluFormatException e = assertThrows(ConlluFormatException.class, () -> ConlluReader.readAll(bad));
        assertTrue(e.getMessage().contains("UTF-8"), e.getMessage());
        assertTrue(e.getMessage().startsWith(bad.toString() + ":"), e.getMessage());
    }

    @Test
    void endOfInputWithoutBlankLineEndsTheSentence() throws IOException {
        try (ConlluReader r = new ConlluReader(new StringReader("# text = Go\n1\tGo\tgo\tVERB\tVB\t_\t0\troot\t_\t_"), "x")) {
            assertEquals("Go", r.next().text());
            assertNull(r.next());
            assertNull(r.next());
        }
    }
}
