package dev.tether.cli;

import dev.tether.counts.RawAttachmentCounts;
import dev.tether.model.ModelFile;
import dev.tether.model.ModelSource;
import dev.tether.model.TetherModel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@code tether train --raw} on bad input and across thread counts (issue 8, "Bad input and scale"): empty, binary
 * and badly encoded documents are skipped, counted in the summary and named with what to do, the exit code says so,
 * and the counts are those of the good documents alone; the model bytes do not depend on {@code --threads}; a model,
 * raw counts file or thesaurus of another format version is refused, naming the file and what to do. Documents are
 * invented maintenance logs of the fictional ferry operator.
 */
class TrainRawInputTest {
    private static final String[] SHIFTS = {
            "Replaced the cracked gasket on the cooling pump with a spare from the stores.",
            "Found a slow leak in the fuel line near the starboard engine.",
            "Greased the hinges of the loading ramp before the morning sailing.",
            "Checked the mooring lines for chafe at the bow and logged it in the deck book.",
            "Tightened the bolts on the ramp with a torque wrench from the workshop.",
            "Painted the hull near the waterline with primer before the survey."};

    @TempDir
    Path dir;

    /** Eight short logs, each with three of the sentences above. */
    private Path writeGoodLogs(Path folder) throws Exception {
        Files.createDirectories(folder);
        for (int d = 0; d < 8; d++) {
            String text = SHIFTS[d % SHIFTS.length] + " " + SHIFTS[(d + 1) % SHIFTS.length] + " " + SHIFTS[(d + 3) % SHIFTS.length] + "\n";
            FerryLogs.write(folder, String.format("shift-%02d.txt", d), text);
        }
        return folder;
    }

    @Test
    void emptyBinaryAndMisencodedDocumentsAreSkippedCountedAndNamed() throws Exception {
        Path good = writeGoodLogs(dir.resolve("good"));
        Path mixed = writeGoodLogs(dir.resolve("mixed"));
        Files.write(mixed.resolve("blank.txt"), new byte[0]);
        Files.write(mixed.resolve("photo.txt"), new byte[] {(byte) 0xFF, (byte) 0xD8, (byte) 0xFF, 0, 0x10, 'J', 'F', 'I', 'F'});
        // "Überholung der Pumpe" in ISO-8859-1: 0xDC is not valid UTF-8.
        Files.write(mixed.resolve("latin1.txt"), "\u00dcberholung der Pumpe im Hafen.\n".getBytes(StandardCharsets.ISO_8859_1));

        Path fromGood = dir.resolve("good.tether");
        Path fromMixed = dir.resolve("mixed.tether");
        CommandLineRun g = CommandLineRun.of("train", "--raw", good.toString(), "--out", fromGood.toString());
        CommandLineRun m = CommandLineRun.of("train", "--raw", mixed.toString(), "--out", fromMixed.toString());
        assertEquals(Tether.OK, g.exitCode(), g::toString);
        assertEquals(Tether.SOME_FAILED, m.exitCode(), m::toString);

        assertTrue(g.out().contains("raw text: 8 documents"), g::toString);
        assertTrue(m.out().contains("raw text: 8 documents"), m::toString);
        assertTrue(m.out().contains("raw text: skipped 3 documents (1 empty, 1 binary, 1 not valid UTF-8), 0 entries that are not documents"), m::toString);
        assertTrue(m.out().contains("skipped " + mixed.resolve("blank.txt") + ": empty (no text to count); add its text or move it out of the input"), m::toString);
        assertTrue(m.out().contains("skipped " + mixed.resolve("photo.txt") + ": holds NUL bytes, a binary file; give plain UTF-8 text, or move it out of the input"), m::toString);
        assertTrue(m.out().contains("skipped " + mixed.resolve("latin1.txt") + ":1: is not valid UTF-8 text; convert the file to UTF-8"), m::toString);
        assertTrue(m.out().contains("3 raw documents were skipped (listed above); the model holds the others (exit code 1)"), m::toString);
        assertTrue(m.out().contains("raw source mixed: 8 documents (3 skipped)"), m::toString);

        // The counts are those of the good documents alone; the model records the skipped ones.
        TetherModel a = ModelFile.read(fromGood);
        TetherModel b = ModelFile.read(fromMixed);
        assertArrayEquals(bytes(a, true), bytes(b, true));
        assertArrayEquals(bytes(a, false), bytes(b, false));
        ModelSource sa = a.sources().get(0), sb = b.sources().get(0);
        assertEquals(sa.items(), sb.items());
        assertEquals(0, sa.skipped());
        assertEquals(3, sb.skipped());
    }

    @Test
    void theModelIsTheSameForOneAndTwoThreads() throws Exception {
        Path logs = writeGoodLogs(dir.resolve("logs"));
        Path one = dir.resolve("one.tether");
        Path two = dir.resolve("two.tether");
        CommandLineRun a = CommandLineRun.of("train", "--raw", logs.toString(), "--threads", "1", "--out", one.toString());
        CommandLineRun b = CommandLineRun.of("train", "--raw", logs.toString(), "--threads", "2", "--out", two.toString());
        assertEquals(Tether.OK, a.exitCode(), a::toString);
        assertEquals(Tether.OK, b.exitCode(), b::toString);
        assertTrue(b.out().contains("2 threads"), b::toString);
        assertTrue(ModelFile.read(one).quadruples().total() > 0, "the logs must give counts for the comparison to mean anything");
        assertArrayEquals(Files.readAllBytes(one), Files.readAllBytes(two));
    }

    @Test
    void inputsOfAnotherFormatVersionAreRefusedNamingTheFile() throws Exception {
        Path logs = writeGoodLogs(dir.resolve("logs"));
        Path model = dir.resolve("logs.tether");
        Path counts = dir.resolve("logs.counts");
        CommandLineRun t = CommandLineRun.of("train", "--raw", logs.toString(), "--save-raw-counts", counts.toString(),
                "--out", model.toString());
        assertEquals(Tether.OK, t.exitCode(), t::toString);

        Path oldModel = withVersion(model, "TETHER-MODEL\n", 99, "old.tether");
        CommandLineRun inspect = CommandLineRun.of("inspect", oldModel.toString());
        assertEquals(Tether.INPUT, inspect.exitCode(), inspect::toString);
        assertTrue(inspect.err().contains(oldModel + " has model format version 99; this build of Tether reads version "
                + ModelFile.FORMAT_VERSION + ". Retrain the model with this version ('tether train')."), inspect::toString);
        CommandLineRun base = CommandLineRun.of("train", "--raw-counts", counts.toString(), "--base", oldModel.toString(),
                "--out", dir.resolve("x.tether").toString());
        assertEquals(Tether.INPUT, base.exitCode(), base::toString);
        assertTrue(base.err().contains(oldModel + " has model format version 99"), base::toString);

        Path oldCounts = withVersion(counts, "TETHER-RAW-COUNTS\n", 1, "old.counts");
        CommandLineRun merge = CommandLineRun.of("train", "--raw-counts", oldCounts.toString(), "--out", dir.resolve("y.tether").toString());
        assertEquals(Tether.INPUT, merge.exitCode(), merge::toString);
        assertTrue(merge.err().contains(oldCounts + " has raw counts format version 1; this build of Tether reads version "
                + RawAttachmentCounts.FORMAT_VERSION + "."), merge::toString);

        // A thesaurus file's frame with another version: refused before anything else is read.
        ByteArrayOutputStream frame = new ByteArrayOutputStream();
        try (DataOutputStream out = new DataOutputStream(frame)) {
            out.write("TETHER-THESAURUS\n".getBytes(StandardCharsets.US_ASCII));
            out.writeInt(99);
            out.writeLong(0);
            out.write(new byte[32]);
        }
        Path oldThesaurus = Files.write(dir.resolve("old.thesaurus"), frame.toByteArray());
        CommandLineRun withThesaurus = CommandLineRun.of("train", "--raw-counts", counts.toString(), "--thesaurus",
                oldThesaurus.toString(), "--out", dir.resolve("z.tether").toString());
        assertEquals(Tether.INPUT, withThesaurus.exitCode(), withThesaurus::toString);
        assertTrue(withThesaurus.err().contains(oldThesaurus + " has thesaurus format version 99; this build of Tether reads version"),
                withThesaurus::toString);
        CommandLineRun query = CommandLineRun.of("thesaurus", "query", "--thesaurus", oldThesaurus.toString(), "pump");
        assertEquals(Tether.INPUT, query.exitCode(), query::toString);
        assertTrue(query.err().contains(oldThesaurus + " has thesaurus format version 99"), query::toString);
        assertTrue(Files.notExists(dir.resolve("x.tether")) && Files.notExists(dir.resolve("y.tether"))
                && Files.notExists(dir.resolve("z.tether")), "no model is written from an input that was refused");
    }

    /** A copy of {@code file} whose format version (the int after the header) is {@code version}. */
    private Path withVersion(Path file, String header, int version, String name) throws Exception {
        byte[] bytes = Files.readAllBytes(file);
        ByteBuffer.wrap(bytes).putInt(header.length(), version);
        return Files.write(dir.resolve(name), bytes);
    }

    /** The serialized quadruple counts (or head-choice counts) of a model. */
    private static byte[] bytes(TetherModel m, boolean quadruples) throws Exception {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        try (DataOutputStream out = new DataOutputStream(b)) {
            if (quadruples) m.quadruples().write(out);
            else m.headChoice().write(out);
        }
        return b.toByteArray();
    }
}
