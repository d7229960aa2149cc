package dev.tether.similarity;

import dev.tether.candidates.HeadClass;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.tether.io.ChecksummedFile;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import java.util.zip.DeflaterOutputStream;
import java.util.zip.InflaterInputStream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
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
                + "reads version " + ThesaurusFile.OLDEST_READABLE + " to " + ThesaurusFile.FORMAT_VERSION
                + ". Build the thesaurus again with this version ('tether thesaurus build').", e.getMessage());
    }

    @Test
    void neighbourListsOnlyKeepTheNearestNeighboursAndDropTheVectors() throws IOException {
        Thesaurus t = small();
        Thesaurus lists = t.listsOnly(3);
        assertTrue(t.hasVectors());
        assertFalse(lists.hasVectors());
        assertEquals(3, lists.settings().neighbours());
        assertEquals(0, lists.contexts());
        assertEquals(t.size(), lists.size());
        int longer = 0;
        for (int a = 0; a < t.size(); a++) {
            assertEquals(t.key(a), lists.key(a));
            assertEquals(Math.min(3, t.neighbourCount(a)), lists.neighbourCount(a));
            if (t.neighbourCount(a) > 3) longer++;
            for (int i = 0; i < lists.neighbourCount(a); i++) {
                assertEquals(t.neighbourId(a, i), lists.neighbourId(a, i));
                assertEquals(t.neighbourScore(a, i), lists.neighbourScore(a, i));
            }
        }
        assertTrue(longer > 0, "the ferry-log thesaurus has words with more than 3 neighbours, so the lists were cut");
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> lists.similarity(0, 1));
        assertTrue(e.getMessage().contains("neighbour lists only"), e.getMessage());

        Path file = dir.resolve("lists.thesaurus");
        ThesaurusFile.write(lists, file);
        Thesaurus back = ThesaurusFile.read(file);
        assertFalse(back.hasVectors());
        assertArrayEquals(Files.readAllBytes(file), ThesaurusFile.encode(back));
        assertTrue(Files.size(file) < ThesaurusFile.encode(t).length / 2,
                Files.size(file) + " bytes of lists against " + ThesaurusFile.encode(t).length + " in all");
    }

    /** A file of format version 1 (vectors always kept, no flag for them) is still read, vectors and all. */
    @Test
    void aVersionOneFileIsStillRead() throws IOException {
        Thesaurus t = small();
        Path file = dir.resolve("version1.thesaurus");
        Files.write(file, asVersionOne(ThesaurusFile.encode(t)));
        Thesaurus back = ThesaurusFile.read(file);
        assertTrue(back.hasVectors());
        assertEquals(t.size(), back.size());
        for (int a = 0; a < t.size(); a++) {
            assertEquals(t.neighbourCount(a), back.neighbourCount(a));
            for (int b = 0; b < t.size(); b++) assertEquals(t.similarity(a, b), back.similarity(a, b));
        }
        assertArrayEquals(ThesaurusFile.encode(t), ThesaurusFile.encode(back), "written again, it is a version-2 file");
    }

    /** The bytes of a version-2 file with vectors rewritten as version 1 wrote them: the same payload without the flag. */
    private static byte[] asVersionOne(byte[] file) throws IOException {
        int header = "TETHER-THESAURUS\n".length() + 4 + 8;
        ByteBuffer frame = ByteBuffer.wrap(file);
        int length = (int) frame.getLong("TETHER-THESAURUS\n".length() + 4);
        byte[] payload = new InflaterInputStream(new ByteArrayInputStream(file, header, length)).readAllBytes();
        DataInputStream in = new DataInputStream(new ByteArrayInputStream(payload));
        for (int i = 0; i < 4; i++) in.readUTF();
        for (int i = 0; i < 3; i++) in.readInt();
        in.readLong();
        in.readLong();
        int flagAt = payload.length - in.available();
        assertEquals(1, payload[flagAt], "the flag that the vectors are kept");
        ByteArrayOutputStream older = new ByteArrayOutputStream();
        try (DeflaterOutputStream out = new DeflaterOutputStream(older)) {
            out.write(payload, 0, flagAt);
            out.write(payload, flagAt + 1, payload.length - flagAt - 1);
        }
        return ChecksummedFile.frame(new ChecksummedFile.Kind("TETHER-THESAURUS\n", "thesaurus", "", "", ""), 1, older);
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
