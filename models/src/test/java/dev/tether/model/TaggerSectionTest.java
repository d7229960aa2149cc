package dev.tether.model;

import dev.tether.io.QuadrupleReader;
import dev.tether.io.QuadrupleSet;
import dev.tether.io.Sha256;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.zip.Deflater;
import java.util.zip.DeflaterOutputStream;
import java.util.zip.InflaterInputStream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The model file's {@code tagger} section: carried as opaque bytes through a save and load, absent when a model was
 * trained without one, taken over from a base model, and refused with the file's name when it has another version.
 */
class TaggerSectionTest {
    @TempDir
    Path dir;

    /** Stand-in bytes: the statistics core never looks inside them. */
    private static final TaggerSection TAGGER = new TaggerSection("hand-made tagger for the ferry logs",
            "opaque tagger bytes \u0000\u0001\u00ff".getBytes(StandardCharsets.UTF_8), "test");

    private static ModelTrainer trainer() throws Exception {
        Path file = Path.of(TaggerSectionTest.class.getResource("/dev/tether/io/ferry-logs.quadruples").toURI());
        QuadrupleSet set = new QuadrupleReader(false).read(file);
        return new ModelTrainer().addQuadruples(set);
    }

    @Test
    void taggerBytesSurviveASaveAndLoadAndNameTheirFile() throws Exception {
        TetherModel trained = trainer().withTagger(TAGGER).build();
        Path file = dir.resolve("ferry.tether");
        ModelFile.write(trained, file);
        TetherModel loaded = ModelFile.read(file);

        assertEquals(TAGGER, loaded.tagger().orElseThrow());
        assertArrayEquals(TAGGER.bytes(), loaded.tagger().orElseThrow().bytes());
        assertEquals(file.toString(), loaded.tagger().orElseThrow().origin(), "messages about the tagger name its file");
        assertEquals(trained.id(), loaded.id());
    }

    @Test
    void aModelWithoutTaggerHasNoneAndTheTaggerIsPartOfTheModelIdentity() throws Exception {
        TetherModel without = trainer().build();
        TetherModel with = trainer().withTagger(TAGGER).build();
        Path a = dir.resolve("without.tether");
        Path b = dir.resolve("with.tether");
        ModelFile.write(without, a);
        ModelFile.write(with, b);

        assertTrue(ModelFile.read(a).tagger().isEmpty());
        assertFalse(without.id().equals(with.id()), "a different tagger is a different model");
        assertTrue(Files.size(b) > Files.size(a));
        Path again = dir.resolve("with-again.tether");
        ModelFile.write(trainer().withTagger(TAGGER).build(), again);
        assertArrayEquals(Files.readAllBytes(b), Files.readAllBytes(again), "same inputs, same bytes");
    }

    @Test
    void aBaseModelsTaggerIsTakenOverUnlessReplacedOrDropped() throws Exception {
        TetherModel base = trainer().withTagger(TAGGER).build();
        TaggerSection other = new TaggerSection("another", new byte[] {1, 2, 3}, "test");

        assertEquals(TAGGER, new ModelTrainer().addModel(base, "base").build().tagger().orElseThrow());
        assertEquals(other, new ModelTrainer().addModel(base, "base").withTagger(other).build().tagger().orElseThrow());
        assertTrue(new ModelTrainer().addModel(base, "base").withTagger(null).build().tagger().isEmpty());
    }

    @Test
    void aTaggerSectionOfAnotherVersionIsRefusedWithTheFileName() throws Exception {
        Path file = dir.resolve("future.tether");
        byte[] encoded = ModelFile.encode("n", java.util.List.of(), trainer().build().quadruples(),
                trainer().build().headChoice(), null, TAGGER);
        Files.write(file, withTaggerVersion(encoded, TaggerSection.VERSION + 1));

        ModelFormatException e = assertThrows(ModelFormatException.class, () -> ModelFile.read(file));
        assertTrue(e.getMessage().contains(file.toString()), e.getMessage());
        assertTrue(e.getMessage().contains("tagger section of version " + (TaggerSection.VERSION + 1)), e.getMessage());
        assertTrue(e.getMessage().contains("--no-tagger"), "says what to do: " + e.getMessage());
    }

    /**
     * The file with the version field of its tagger section rewritten, and its payload length and checksum made
     * right again, so that only the version is wrong. Layout as {@link ModelFile} documents it.
     */
    private static byte[] withTaggerVersion(byte[] file, int version) throws Exception {
        int header = 13 + 4 + 8;
        long length = ByteBuffer.wrap(file, 13 + 4, 8).getLong();
        byte[] payload;
        try (InflaterInputStream in = new InflaterInputStream(new ByteArrayInputStream(file, header, (int) length))) {
            payload = in.readAllBytes();
        }
        ByteArrayOutputStream marker = new ByteArrayOutputStream();
        new DataOutputStream(marker).writeInt(TaggerSection.VERSION);
        new DataOutputStream(marker).writeUTF(TAGGER.description());
        int at = indexOf(payload, marker.toByteArray());
        assertTrue(at > 0, "tagger section found in the payload");
        ByteBuffer.wrap(payload, at, 4).putInt(version);

        ByteArrayOutputStream compressed = new ByteArrayOutputStream();
        try (DeflaterOutputStream out = new DeflaterOutputStream(compressed, new Deflater(Deflater.BEST_COMPRESSION))) {
            out.write(payload);
        }
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        DataOutputStream out = new DataOutputStream(body);
        out.write(file, 0, 13 + 4);
        out.writeLong(compressed.size());
        compressed.writeTo(out);
        byte[] b = body.toByteArray();
        byte[] digest = Sha256.newDigest().digest(b);
        byte[] all = Arrays.copyOf(b, b.length + digest.length);
        System.arraycopy(digest, 0, all, b.length, digest.length);
        return all;
    }

    private static int indexOf(byte[] haystack, byte[] needle) {
        outer:
        for (int i = 0; i + needle.length <= haystack.length; i++) {
            for (int j = 0; j < needle.length; j++) {
                if (haystack[i + j] != needle[j]) continue outer;
            }
            return i;
        }
        return -1;
    }
}
