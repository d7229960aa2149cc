package dev.tether.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.tether.model.ModelFile;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TaggerSection;
import dev.tether.model.TetherModel;

/** {@code tether train --conllu} trains the model's tagger from column 5, says what it used, and can be told not to. */
class TrainTaggerCommandTest {
    @TempDir
    Path dir;

    private static String fixture(String name) throws Exception {
        return Path.of(TrainTaggerCommandTest.class.getResource("/dev/tether/preprocessing/" + name).toURI()).toString();
    }

    @Test
    void aTreebankTrainsTheModelsTagger() throws Exception {
        Path model = dir.resolve("ferry.tether");
        CommandLineRun run = CommandLineRun.of("train", "--conllu", fixture("ferry-logs-tagged.conllu"), "--out", model.toString());
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        assertTrue(run.out().contains("ferry-logs-tagged.conllu: 64 of 64 sentences for the tagger"), run::toString);
        TetherModel m = ModelFile.read(model);
        assertTrue(m.tagger().orElseThrow().description().contains("maximum entropy"), m.tagger()::toString);
        CommandLineRun inspect = CommandLineRun.of("inspect", model.toString());
        assertTrue(inspect.out().contains("tagger         OpenNLP") && inspect.out().contains("64 sentences"), inspect::toString);
    }

    @Test
    void noTaggerLeavesTheShippedTaggerInUse() throws Exception {
        Path model = dir.resolve("ferry.tether");
        CommandLineRun run = CommandLineRun.of("train", "--conllu", fixture("ferry-logs-tagged.conllu"), "--no-tagger",
                "--out", model.toString());
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        assertTrue(ModelFile.read(model).tagger().isEmpty());
        assertTrue(!run.out().contains("tagger:"), run::toString);
        assertTrue(CommandLineRun.of("inspect", model.toString()).out().contains("tagger         none"));
    }

    @Test
    void aTreebankWithoutTagsIsRefusedNamingTheFile() throws Exception {
        // Without Penn tags the candidate finder proposes nothing, so the treebank gives neither ranker events nor a
        // tagger: training stops with the file named instead of writing a model that learned nothing from it.
        Path model = dir.resolve("untagged.tether");
        CommandLineRun run = CommandLineRun.of("train", "--conllu", fixture("ferry-logs-untagged.conllu"), "--out", model.toString());
        assertEquals(Tether.INPUT, run.exitCode(), run::toString);
        assertTrue(run.err().contains("ferry-logs-untagged.conllu: no usable attachment events"), run::toString);
        assertTrue(run.err().contains("Penn Treebank tags in column 5"), "says what to check: " + run);
        assertTrue(Files.notExists(model), "no model is written");
    }

    @Test
    void aModelWithDamagedTaggerBytesStopsAnnotationNamingTheFile() throws Exception {
        Path model = dir.resolve("damaged-tagger.tether");
        TaggerSection junk = new TaggerSection("junk", "not an OpenNLP model".getBytes(StandardCharsets.UTF_8), "test");
        ModelFile.write(new ModelTrainer().withTagger(junk).build(), model);
        Path doc = dir.resolve("log.txt");
        Files.writeString(doc, "Replaced the gasket on the pump.");
        CommandLineRun run = CommandLineRun.of("annotate", "--in", doc.toString(), "--out", dir.resolve("out").toString(),
                "--model", model.toString());
        assertEquals(Tether.INPUT, run.exitCode(), run::toString);
        assertTrue(run.err().contains(model.toString()) && run.err().contains("tagger section"), run::toString);
    }
}
