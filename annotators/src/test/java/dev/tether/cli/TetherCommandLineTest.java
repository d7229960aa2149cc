package dev.tether.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The train, evaluate and inspect commands end to end on invented ferry maintenance logs (see {@link FerryLogs} for
 * the expected figures, worked out by hand), and what users get for bad input. Exit codes are those documented on
 * {@link Tether}: 0 success, 2 a wrong command line, 3 an input or model that cannot be used.
 */
class TetherCommandLineTest {
    @TempDir
    Path dir;
    private Path training;
    private Path evaluation;

    @BeforeEach
    void writeFixtures() throws Exception {
        training = FerryLogs.write(dir, "ferry-training.txt", FerryLogs.TRAINING);
        evaluation = FerryLogs.write(dir, "ferry-evaluation.tsv", FerryLogs.EVALUATION);
    }

    private Path trainModel() {
        Path model = dir.resolve("ferry.tether");
        CommandLineRun run = CommandLineRun.of("train", "--quadruples", training.toString(), "--out", model.toString());
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        return model;
    }

    @Test
    void trainEvaluateInspectRoundTrip() throws Exception {
        Path model = trainModel();
        assertTrue(Files.isRegularFile(model));

        CommandLineRun eval = CommandLineRun.of("evaluate", "--model", model.toString(), "--quadruples", evaluation.toString());
        assertEquals(Tether.OK, eval.exitCode(), eval::toString);
        assertTrue(eval.out().contains("accuracy 0.8750"), eval::toString);
        assertTrue(eval.out().contains("always-noun") && eval.out().contains("preposition-majority"), eval::toString);

        CommandLineRun inspect = CommandLineRun.of("inspect", model.toString());
        assertEquals(Tether.OK, inspect.exitCode(), inspect::toString);
        assertTrue(inspect.out().contains("ferry-training.txt"), inspect::toString);
        assertTrue(inspect.out().contains("16 counted, 8 attached to the noun"), inspect::toString);
        assertTrue(inspect.out().contains("7 prepositions"), inspect::toString);

        // The id that inspect shows is the one evaluate reports, and retraining gives the same model.
        JsonNode json = json(CommandLineRun.of("evaluate", "--model", model.toString(), "--quadruples", evaluation.toString(), "--json"));
        String id = json.get("model").asText();
        assertTrue(inspect.out().contains(id), inspect::toString);
        byte[] first = Files.readAllBytes(model);
        trainModel();
        assertArrayEquals(first, Files.readAllBytes(model));
    }

    @Test
    void jsonHoldsAccuracyCountAndBothBaselines() throws Exception {
        Path model = trainModel();
        JsonNode json = json(CommandLineRun.of("evaluate", "--model", model.toString(), "--quadruples", evaluation.toString(), "--json"));
        // Expected figures worked out by hand in FerryLogs.EVALUATION.
        assertEquals(8, json.get("n").asInt());
        assertEquals(0.875, json.get("accuracy").asDouble(), 1e-12);
        assertEquals(0.625, json.at("/baselines/always-noun/accuracy").asDouble(), 1e-12);
        assertEquals(0.75, json.at("/baselines/preposition-majority/accuracy").asDouble(), 1e-12);
        assertEquals(8, json.at("/baselines/always-noun/n").asInt());
        JsonNode interval = json.get("interval95");
        assertTrue(interval.get(0).asDouble() < 0.875 && 0.875 < interval.get(1).asDouble(), interval::toString);
        assertEquals(0, json.get("skipped").asInt());
    }

    @Test
    void malformedTrainingLineFailsNamingFileAndLineAndWritesNothing() throws Exception {
        Path bad = FerryLogs.write(dir, "bad-log.txt", FerryLogs.TRAINING + "17 drained tank of V\n");
        Path model = dir.resolve("never.tether");
        CommandLineRun run = CommandLineRun.of("train", "--quadruples", bad.toString(), "--out", model.toString());
        assertEquals(Tether.INPUT, run.exitCode(), run::toString);
        assertTrue(run.err().contains(bad + ":17"), run::toString);
        assertTrue(run.err().contains("--skip-malformed"), run::toString);
        assertFalse(Files.exists(model));
        assertNoTemporaryFiles();
    }

    @Test
    void skippingMalformedLinesReportsTheirCount() throws Exception {
        Path bad = FerryLogs.write(dir, "bad-log.txt", FerryLogs.TRAINING + "17 drained tank of V\n18 drained tank of ballast Q\n");
        Path model = dir.resolve("ferry.tether");
        CommandLineRun run = CommandLineRun.of("train", "--quadruples", bad.toString(), "--skip-malformed", "--out", model.toString());
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        assertTrue(run.out().contains("2 malformed lines skipped"), run::toString);
        assertTrue(run.out().contains("bad-log.txt:17") && run.out().contains("bad-log.txt:18"), run::toString);

        CommandLineRun inspect = CommandLineRun.of("inspect", model.toString());
        assertTrue(inspect.out().contains("(2 skipped)"), inspect::toString);

        Path badEval = FerryLogs.write(dir, "bad-eval.tsv", FerryLogs.EVALUATION + "painted\thull\n");
        CommandLineRun strict = CommandLineRun.of("evaluate", "--model", model.toString(), "--quadruples", badEval.toString());
        assertEquals(Tether.INPUT, strict.exitCode(), strict::toString);
        assertTrue(strict.err().contains(badEval + ":10"), strict::toString);
        JsonNode json = json(CommandLineRun.of("evaluate", "--model", model.toString(), "--quadruples", badEval.toString(),
                "--skip-malformed", "--json"));
        assertEquals(1, json.get("skipped").asInt());
        assertEquals(8, json.get("n").asInt());
    }

    @Test
    void unknownLabelEmptyFileAndDirectoryAreInputErrorsNamingTheFile() throws Exception {
        Path label = FerryLogs.write(dir, "label.txt", "1 replaced gasket with spare Verb\n");
        Path empty = FerryLogs.write(dir, "empty.txt", "");
        Path folder = Files.createDirectory(dir.resolve("logs"));
        for (Path input : List.of(label, empty, folder)) {
            Path model = dir.resolve("never.tether");
            CommandLineRun run = CommandLineRun.of("train", "--quadruples", input.toString(), "--out", model.toString());
            assertEquals(Tether.INPUT, run.exitCode(), run::toString);
            assertTrue(run.err().contains(input.toString()), run::toString);
            assertFalse(Files.exists(model), input::toString);
        }
        assertTrue(CommandLineRun.of("train", "--quadruples", label.toString(), "--out", dir.resolve("never.tether").toString())
                .err().contains("'Verb'"));
    }

    @Test
    void unknownOptionAndMissingValuesAreUsageErrors() {
        CommandLineRun typo = CommandLineRun.of("train", "--quadruple", training.toString(), "--out", dir.resolve("m").toString());
        assertEquals(Tether.USAGE, typo.exitCode(), typo::toString);
        assertTrue(typo.err().contains("--quadruple") && typo.err().contains("usage: tether train"), typo::toString);
        assertFalse(Files.exists(dir.resolve("m")));

        CommandLineRun noOut = CommandLineRun.of("train", "--quadruples", training.toString());
        assertEquals(Tether.USAGE, noOut.exitCode(), noOut::toString);
        assertTrue(noOut.err().contains("--out"), noOut::toString);

        CommandLineRun unknown = CommandLineRun.of("attach");
        assertEquals(Tether.USAGE, unknown.exitCode(), unknown::toString);
        assertTrue(unknown.err().contains("'attach'"), unknown::toString);

        assertEquals(Tether.USAGE, CommandLineRun.of().exitCode());
    }

    @Test
    void modelPathThatIsNotAModelIsAnInputErrorNamingIt() throws Exception {
        Path folder = Files.createDirectory(dir.resolve("models"));
        Path missing = dir.resolve("missing.tether");
        for (Path notAModel : List.of(evaluation, folder, missing)) {
            CommandLineRun eval = CommandLineRun.of("evaluate", "--model", notAModel.toString(), "--quadruples", evaluation.toString());
            assertEquals(Tether.INPUT, eval.exitCode(), eval::toString);
            assertTrue(eval.err().contains(notAModel.toString()), eval::toString);
            CommandLineRun inspect = CommandLineRun.of("inspect", notAModel.toString());
            assertEquals(Tether.INPUT, inspect.exitCode(), inspect::toString);
            assertTrue(inspect.err().contains(notAModel.toString()), inspect::toString);
        }
        Path model = trainModel();
        byte[] damaged = Files.readAllBytes(model);
        damaged[damaged.length / 2] ^= 0x10;
        Files.write(model, damaged);
        CommandLineRun eval = CommandLineRun.of("evaluate", "--model", model.toString(), "--quadruples", evaluation.toString());
        assertEquals(Tether.INPUT, eval.exitCode(), eval::toString);
        assertTrue(eval.err().contains(model.toString()) && eval.err().contains("damaged"), eval::toString);
    }

    @Test
    void failedTrainingLeavesAnExistingModelUntouched() throws Exception {
        Path model = trainModel();
        byte[] before = Files.readAllBytes(model);
        Path bad = FerryLogs.write(dir, "bad-log.txt", "1 replaced gasket with spare V\n2 garbage\n");
        CommandLineRun run = CommandLineRun.of("train", "--quadruples", bad.toString(), "--out", model.toString());
        assertNotEquals(Tether.OK, run.exitCode(), run::toString);
        assertArrayEquals(before, Files.readAllBytes(model));
        assertNoTemporaryFiles();
    }

    @Test
    void outputThatIsADirectoryFailsAndStaysAsItWas() throws Exception {
        Path out = Files.createDirectory(dir.resolve("out"));
        CommandLineRun run = CommandLineRun.of("train", "--quadruples", training.toString(), "--out", out.toString());
        assertEquals(Tether.INPUT, run.exitCode(), run::toString);
        assertTrue(run.err().contains(out.toString()), run::toString);
        try (Stream<Path> files = Files.list(out)) {
            assertEquals(0, files.count());
        }
        assertNoTemporaryFiles();
    }

    private void assertNoTemporaryFiles() throws Exception {
        try (Stream<Path> files = Files.list(dir)) {
            List<String> partial = files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".partial")).toList();
            assertEquals(List.of(), partial);
        }
    }

    private static JsonNode json(CommandLineRun run) throws Exception {
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        return new ObjectMapper().readTree(run.out());
    }
}
