package dev.tether.similarity;

import dev.tether.candidates.HeadClass;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ThesaurusFileTest {
    @TempDir
    Path dir;

    private static Thesaurus small() {
        return ThesaurusBuilder.build(FerryLogCorpus.count(300, 21),
                ThesaurusSettings.DEFAULT.withMinFrequency(3).withNeighbours(5).withWeighting(Weighting.TTEST), 1);
    }

    @Test
    void roundTripKeepsWordsVectorsAndNeighbours() throws IOException {
        Thesaurus t = small();
        Path file = dir.resolve("ferry.thesaurus");
        ThesaurusFile.write(t, file);
        Thesaurus back = ThesaurusFile.read(file);
        assertEquals(t.size(), back.size());
        assertEquals(t.settings(), back.settings());
        assertEquals(t.tokens(), back.tokens());
        for (int a = 0; a < t.size(); a++) {
            assertEquals(t.key(a), back.key(a));
            assertEquals(t.id(t.wordClass(a), t.key(a)), back.id(back.wordClass(a), back.key(a)));
            assertEquals(t.neighbourCount(a), back.neighbourCount(a));
            for (int i = 0; i < t.neighbourCount(a); i++) {
                assertEquals(t.neighbourId(a, i), back.neighbourId(a, i));
                assertEquals(t.neighbourScore(a, i), back.neighbourScore(a, i));
            }
            for (int b = 0; b < t.size(); b++) assertEquals(t.similarity(a, b), back.similarity(a, b));
        }
        assertArrayEquals(Files.readAllBytes(file), ThesaurusFile.encode(back));
        try (Stream<Path> left = Files.list(dir)) {
            assertEquals(1, left.count(), "no temporary file is left beside the thesaurus");
        }
    }

    @Test
    void theSameInputGivesTheSameBytes() throws IOException {
        assertArrayEquals(ThesaurusFile.encode(small()), ThesaurusFile.encode(small()));
    }

    @Test
    void aDamagedFileFailsNamingIt() throws IOException {
        Path file = dir.resolve("damaged.thesaurus");
        byte[] bytes = ThesaurusFile.encode(small());
        bytes[bytes.length / 2] ^= 0x10;
        Files.write(file, bytes);
        ThesaurusFormatException e = assertThrows(ThesaurusFormatException.class, () -> ThesaurusFile.read(file));
        assertEquals(file + " is damaged: its checksum does not match its content; copy or build it again", e.getMessage());
    }

    @Test
    void aTruncatedFileFailsNamingIt() throws IOException {
        Path file = dir.resolve("short.thesaurus");
        byte[] bytes = ThesaurusFile.encode(small());
        Files.write(file, java.util.Arrays.copyOf(bytes, bytes.length - 100));
        ThesaurusFormatException e = assertThrows(ThesaurusFormatException.class, () -> ThesaurusFile.read(file));
        assertTrue(e.getMessage().startsWith(file + " is truncated"), e.getMessage());
    }

    @Test
    void aForeignFileFailsNamingIt() throws IOException {
        Path file = dir.resolve("notes.txt");
        Files.writeString(file, "TETHER-MODEL\nnot a thesaurus at all");
        ThesaurusFormatException e = assertThrows(ThesaurusFormatException.class, () -> ThesaurusFile.read(file));
        assertEquals(file + " is not a Tether thesaurus file (it lacks the thesaurus header); give the path of a file "
                + "written by 'tether thesaurus build'", e.getMessage());
        Path missing = dir.resolve("missing.thesaurus");
        assertTrue(assertThrows(ThesaurusFormatException.class, () -> ThesaurusFile.read(missing)).getMessage()
                .startsWith(missing + " does not exist"));
    }

    @Test
    void anotherFormatVersionFailsNamingIt() throws IOException {
        Path file = dir.resolve("future.thesaurus");
        byte[] bytes = ThesaurusFile.encode(small());
        ByteBuffer.wrap(bytes).putInt("TETHER-THESAURUS\n".length(), ThesaurusFile.FORMAT_VERSION + 1);
        Files.write(file, bytes);
        ThesaurusFormatException e = assertThrows(ThesaurusFormatException.class, () -> ThesaurusFile.read(file));
        assertEquals(file + " has thesaurus format version " + (ThesaurusFile.FORMAT_VERSION + 1) + "; this build of Tether "
                + "reads version " + ThesaurusFile.FORMAT_VERSION + ". Build the thesaurus again with this version "
                + "('tether thesaurus build').", e.getMessage());
    }

    @Test
    void lookupsByKeyAndById() {
        Thesaurus t = small();
        int gasket = t.id(HeadClass.NOUN, "gasket");
        assertTrue(gasket >= 0);
        assertEquals("gasket", t.key(gasket));
        assertEquals(Thesaurus.UNKNOWN, t.id(HeadClass.VERB, "gasket"));
        assertEquals(t.neighbourCount(gasket), t.neighbours(HeadClass.NOUN, "gasket").size());
        assertThrows(IndexOutOfBoundsException.class, () -> t.neighbours(gasket).id(99));
    }
}
