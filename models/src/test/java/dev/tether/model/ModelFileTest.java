package dev.tether.model;

import dev.tether.attachment.BackedOffScorer;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.io.QuadrupleReader;
import dev.tether.io.QuadrupleSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The model file: round trip, determinism, and a clear error naming the file for anything that is not a model. */
class ModelFileTest {
    @TempDir
    Path dir;

    private static QuadrupleSet fixture() throws Exception {
        Path file = Path.of(ModelFileTest.class.getResource("/dev/tether/io/ferry-logs.quadruples").toURI());
        return new QuadrupleReader(false).read(file);
    }

    private static TetherModel train() throws Exception {
        return new ModelTrainer().addQuadruples(fixture()).build();
    }

    @Test
    void savedModelLoadsWithTheSameDecisionsAndId() throws Exception {
        TetherModel trained = train();
        Path file = dir.resolve("ferry.tether");
        ModelFile.write(trained, file);
        TetherModel loaded = ModelFile.read(file);

        assertEquals(trained.id(), loaded.id());
        assertEquals(trained.sources(), loaded.sources());
        assertEquals(trained.normalizerVersion(), loaded.normalizerVersion());
        assertEquals(trained.quadruples().total(), loaded.quadruples().total());
        assertEquals(fixture().quadruples().size(), (int) loaded.quadruples().total());
        int compared = 0;
        for (Quadruple q : queries()) {
            assertEquals(decide(trained, q), decide(loaded, q), q.toString());
            compared++;
        }
        assertTrue(compared > 30);
    }

    @Test
    void trainingTwiceOnTheSameInputGivesByteIdenticalFiles() throws Exception {
        Path a = dir.resolve("a.tether");
        Path b = dir.resolve("b.tether");
        ModelFile.write(train(), a);
        ModelFile.write(train(), b);
        assertArrayEquals(Files.readAllBytes(a), Files.readAllBytes(b));
        // A different input gives a different model (so the comparison above is not trivially true).
        ModelTrainer other = new ModelTrainer().addQuadruples(fixture());
        other.addQuadruple(new LabelledQuadruple(new Quadruple("moored", "ferry", "at", "pier"),
                dev.tether.attachment.AttachmentSite.VERB, "test"));
        Path c = dir.resolve("c.tether");
        ModelFile.write(other.build(), c);
        assertTrue(!Arrays.equals(Files.readAllBytes(a), Files.readAllBytes(c)));
    }

    @Test
    void everySingleFlippedByteIsRejectedWithTheFileName() throws Exception {
        Path good = dir.resolve("good.tether");
        ModelFile.write(train(), good);
        byte[] bytes = Files.readAllBytes(good);
        Path damaged = dir.resolve("damaged.tether");
        for (int i = 0; i < bytes.length; i++) {
            byte[] copy = bytes.clone();
            copy[i] ^= 0x01;
            Files.write(damaged, copy);
            int at = i;
            ModelFormatException e = assertThrows(ModelFormatException.class, () -> ModelFile.read(damaged),
                    () -> "flipped byte " + at + " of " + bytes.length + " was accepted");
            assertNamesFile(e, damaged);
        }
    }

    @Test
    void flippedPayloadByteIsReportedAsDamaged() throws Exception {
        Path file = dir.resolve("ferry.tether");
        ModelFile.write(train(), file);
        byte[] bytes = Files.readAllBytes(file);
        bytes[bytes.length / 2] ^= 0x40;
        Files.write(file, bytes);
        ModelFormatException e = assertThrows(ModelFormatException.class, () -> ModelFile.read(file));
        assertNamesFile(e, file);
        assertTrue(e.getMessage().contains("damaged"), e.getMessage());
    }

    @Test
    void everyTruncationIsRejectedWithTheFileName() throws Exception {
        Path good = dir.resolve("good.tether");
        ModelFile.write(train(), good);
        byte[] bytes = Files.readAllBytes(good);
        Path cut = dir.resolve("cut.tether");
        for (int n = 0; n < bytes.length; n++) {
            Files.write(cut, Arrays.copyOf(bytes, n));
            int length = n;
            ModelFormatException e = assertThrows(ModelFormatException.class, () -> ModelFile.read(cut),
                    () -> "first " + length + " bytes accepted");
            assertNamesFile(e, cut);
        }
    }

    @Test
    void foreignFilesAreRejectedWithTheFileName() throws Exception {
        Path random = dir.resolve("random.bin");
        byte[] noise = new byte[4096];
        new Random(7).nextBytes(noise);
        Files.write(random, noise);
        assertNotAModel(random);

        Path text = dir.resolve("ferry-logs.txt");
        Files.writeString(text, "1 replaced gasket with spare V\n2 inspected hull for corrosion V\n", StandardCharsets.UTF_8);
        assertNotAModel(text);

        Path empty = dir.resolve("empty.tether");
        Files.write(empty, new byte[0]);
        assertNotAModel(empty);
    }

    @Test
    void directoryAndMissingFileAreRejectedWithTheFileName() throws Exception {
        Path folder = Files.createDirectory(dir.resolve("models"));
        assertNamesFile(assertThrows(ModelFormatException.class, () -> ModelFile.read(folder)), folder);
        Path missing = dir.resolve("no-such.tether");
        assertNamesFile(assertThrows(ModelFormatException.class, () -> ModelFile.read(missing)), missing);
    }

    @Test
    void writeLeavesOnlyTheTargetAndReplacesAnOlderModel() throws Exception {
        Path target = dir.resolve("ferry.tether");
        Files.writeString(target, "an older file");
        ModelFile.write(train(), target);
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(target), files.toList(), "temporary files left behind");
        }
        assertEquals(train().id(), ModelFile.read(target).id());
    }

    @Test
    void failedWriteLeavesNoPartialFileAndDoesNotTouchTheTarget() throws Exception {
        // The target is a directory: the write must fail, leave the directory and its content as they were, and
        // leave no temporary file beside it.
        Path target = Files.createDirectory(dir.resolve("ferry.tether"));
        Path inside = Files.writeString(target.resolve("notes.txt"), "keep me");
        IOException e = assertThrows(IOException.class, () -> ModelFile.write(train(), target));
        assertTrue(e.getMessage().contains(target.toString()), e.getMessage());
        assertTrue(Files.isDirectory(target));
        assertEquals("keep me", Files.readString(inside));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(target), files.toList(), "partial file left behind");
        }
        try (Stream<Path> files = Files.list(target)) {
            assertEquals(List.of(inside), files.toList());
        }
    }

    @Test
    void failedWriteUnderAFileLeavesThatFileAlone() throws Exception {
        Path notAFolder = Files.writeString(dir.resolve("logbook"), "ferry logbook");
        assertThrows(IOException.class, () -> ModelFile.write(train(), notAFolder.resolve("ferry.tether")));
        assertEquals("ferry logbook", Files.readString(notAFolder));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(notAFolder), files.toList());
        }
    }

    private static void assertNotAModel(Path file) {
        ModelFormatException e = assertThrows(ModelFormatException.class, () -> ModelFile.read(file));
        assertNamesFile(e, file);
        assertTrue(e.getMessage().contains("not a Tether model"), e.getMessage());
    }

    private static void assertNamesFile(Exception e, Path file) {
        assertTrue(e.getMessage().contains(file.toString()), () -> "message does not name " + file + ": " + e.getMessage());
    }

    private static List<Quadruple> queries() throws Exception {
        List<LabelledQuadruple> items = fixture().quadruples();
        List<Quadruple> out = new java.util.ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            Quadruple q = items.get(i).quadruple();
            Quadruple r = items.get((i + 7) % items.size()).quadruple();
            out.add(q);
            out.add(new Quadruple(q.verb(), r.noun1(), q.preposition(), r.noun2()));
        }
        return out;
    }

    private static Object decide(TetherModel model, Quadruple q) {
        QuadrupleCounts c = model.quadruples();
        int[] ids = c.encode(model.normalizer(), q.verb(), q.noun1(), q.preposition(), q.noun2());
        return new BackedOffScorer(c).decide(ids[0], ids[1], ids[2], ids[3]);
    }
}
