package dev.tether.audit;

import dev.tether.candidates.HeadClass;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The review sheet read back: marks, escaped values, and lines that cannot be used (invented ferry-log lines). */
class ReviewSheetReaderTest {
    @TempDir
    Path dir;

    private static final String LINE = "\tlogs/Corrie\\tBell.txt\tat@451\tYard@460\t0.0053\t1:Renewed/verb@373 0.4383"
            + "\t2:period/noun@444 0.4329\t3:a/b@c/noun@417 0.0503";

    private Path sheet(String... lines) throws IOException {
        return Files.writeString(dir.resolve("sheet.tsv"), ReviewSheet.HEADER + "\n# a comment\n" + String.join("\n", lines) + "\n");
    }

    @Test
    void marksGiveTheChosenHead() throws IOException {
        ReviewSheetReader.Sheet s = new ReviewSheetReader().read(sheet("?" + LINE, "=" + LINE, "2" + LINE, "x" + LINE, "", "3" + LINE));
        assertEquals(1, s.unreviewed());
        assertEquals(4, s.reviewed().size());
        assertEquals(0, s.reviewed().get(0).chosen());
        assertEquals(1, s.reviewed().get(1).chosen());
        assertEquals(-1, s.reviewed().get(2).chosen());
        ReviewSheetReader.ReviewedLine third = s.reviewed().get(3);
        assertEquals(2, third.chosen());
        assertEquals(8, third.line(), "line numbers count the header and comments");
        assertEquals("logs/Corrie\tBell.txt", third.doc(), "escaped tab");
        assertEquals(new Span(451, 453, "at"), third.preposition());
        assertEquals("a/b@c", third.offered().get(2).head().text(), "slash and at sign inside a word");
        assertEquals(HeadClass.NOUN, third.offered().get(2).headClass());
        assertEquals(417, third.offered().get(2).head().begin());
        assertTrue(s.problems().isEmpty());
    }

    @Test
    void aLineThatCannotBeUsedIsReportedWithItsNumberAndTheRestRead() throws IOException {
        Path f = sheet("4" + LINE, "=" + LINE.replace("verb@373", "verb@here"), "=\tonly\tthree", "y" + LINE, "=" + LINE);
        ReviewSheetReader.Sheet s = new ReviewSheetReader().read(f);
        assertEquals(1, s.reviewed().size());
        assertEquals(7, s.reviewed().get(0).line());
        assertEquals(4, s.problems().size());
        assertTrue(s.problems().get(0).startsWith(f + ":3: choice 4 is not one of the 3 offered"), s.problems().get(0));
        assertTrue(s.problems().get(1).startsWith(f + ":4: "), s.problems().get(1));
        assertTrue(s.problems().get(2).startsWith(f + ":5: expected at least 6"), s.problems().get(2));
        assertTrue(s.problems().get(3).startsWith(f + ":6: mark 'y'"), s.problems().get(3));
    }

    @Test
    void aFileThatIsNotASheetOrOfAnotherFormatIsRefused() throws IOException {
        Path other = Files.writeString(dir.resolve("other.tsv"), "verb\tnoun1\tpreposition\tnoun2\tsite\n");
        assertTrue(assertThrows(IOException.class, () -> new ReviewSheetReader().read(other)).getMessage()
                .contains(other + ":1: not a Tether review sheet"));
        Path newer = Files.writeString(dir.resolve("newer.tsv"), "# tether review sheet, format 2\n");
        assertTrue(assertThrows(IOException.class, () -> new ReviewSheetReader().read(newer)).getMessage()
                .contains("this Tether reads review sheet format 1"));
    }

    @Test
    void escapingRoundTrips() {
        String s = "a\\b\tc\nd\re";
        assertEquals(s, ReviewSheet.unescape(ReviewSheet.escape(s)));
        assertTrue(!ReviewSheet.escape(s).contains("\t") && !ReviewSheet.escape(s).contains("\n"));
    }
}
