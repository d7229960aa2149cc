package dev.tether.preprocessing;

import static org.apache.uima.fit.factory.AnalysisEngineFactory.createEngine;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.fit.factory.JCasFactory;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
import org.apache.uima.resource.ResourceInitializationException;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.tether.model.ModelFile;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TaggerSection;
import dev.tether.model.TetherModel;
import dev.tether.type.Token;
import opennlp.tools.postag.POSModel;
import opennlp.tools.postag.POSTagFormat;
import opennlp.tools.postag.POSTaggerME;

/**
 * A tagger trained from the Penn Treebank tags of a tiny invented treebank (ferry maintenance log lines, tagged by
 * hand with prepositional "to" as {@code IN} and infinitival "to" as {@code TO}, the convention of UD English EWT's
 * XPOS column): it learns the fixture's tags, survives the model file, is deterministic, and is what the built-in
 * preprocessing tags with when the model carries it.
 */
class TreebankTaggerTrainerTest {
    private static final String FIXTURE = "/dev/tether/preprocessing/ferry-logs-tagged.conllu";
    private static TaggerSection trained;

    @TempDir
    Path dir;

    private static Path resource(String name) throws Exception {
        return Path.of(TreebankTaggerTrainerTest.class.getResource(name).toURI());
    }

    private static TaggerSection train() throws Exception {
        TreebankTaggerTrainer trainer = new TreebankTaggerTrainer();
        TreebankTaggerTrainer.FileTally tally = trainer.add(resource(FIXTURE));
        assertEquals(64, tally.used(), tally.summary());
        return trainer.train();
    }

    @BeforeAll
    static void trainOnce() throws Exception {
        trained = train();
    }

    private static String[] tag(POSModel model, String sentence) {
        return new POSTaggerME(model, POSTagFormat.PENN).tag(sentence.split(" "));
    }

    @Test
    void learnsTheFixturesTagsOnALineItNeverSaw() throws Exception {
        POSModel model = PosModelBytes.unpack(trained);
        // Not a line of the fixture: this subject, verb, part and machine never occur together there.
        assertArrayEquals(new String[] {"DT", "NN", "VBD", "DT", "NN", "IN", "DT", "NN", "."},
                tag(model, "The skipper inspected the gasket on the winch ."));
        assertArrayEquals(new String[] {"DT", "NN", "VBZ", "TO", "VB", "DT", "NN", "IN", "DT", "NN", "."},
                tag(model, "The mate wants to clean the impeller in the stores ."));
        assertEquals("IN", tag(model, "The deckhand moved the winch to the berth .")[5], "prepositional 'to', EWT style");
        assertTrue(trained.description().contains("64 sentences") && trained.description().contains("8 tags"),
                trained.description());
    }

    @Test
    void trainingTwiceGivesTheSameBytesAndTheSameModelFile() throws Exception {
        TaggerSection again = train();
        assertArrayEquals(trained.bytes(), again.bytes());
        Path a = dir.resolve("a.tether");
        Path b = dir.resolve("b.tether");
        ModelFile.write(new ModelTrainer().withTagger(trained).build(), a);
        ModelFile.write(new ModelTrainer().withTagger(again).build(), b);
        assertArrayEquals(Files.readAllBytes(a), Files.readAllBytes(b));
        // OpenNLP's own serialization stamps the time; the packed bytes carry none of it.
        assertFalse(new String(trained.bytes(), StandardCharsets.ISO_8859_1).contains("Timestamp"));
    }

    @Test
    void roundTripThroughTheModelFileTagsTheSame() throws Exception {
        Path file = dir.resolve("ferry.tether");
        ModelFile.write(new ModelTrainer().withTagger(trained).build(), file);
        TetherModel loaded = ModelFile.read(file);
        POSModel decoded = ModelTaggers.of(loaded).orElseThrow();
        String line = "The engineer checked the filter on the generator .";
        assertArrayEquals(tag(PosModelBytes.unpack(trained), line), tag(decoded, line));
        assertSame(decoded, ModelTaggers.of(loaded).orElseThrow(), "decoded once per loaded model");
        assertTrue(ModelTaggers.of(new ModelTrainer().build()).isEmpty(), "a model without tagger has none");
    }

    @Test
    void preprocessingTagsWithTheModelsTaggerAndTheShippedOneWithoutIt() throws Exception {
        Path withTagger = dir.resolve("with.tether");
        Path without = dir.resolve("without.tether");
        ModelFile.write(new ModelTrainer().withTagger(trained).build(), withTagger);
        ModelFile.write(new ModelTrainer().build(), without);
        String line = "The deckhand moved the pump to the workshop.";
        // The shipped model was trained on the Penn Treebank, which tags every "to" TO; the fixture tags this one IN.
        assertEquals("IN", tagOf(line, withTagger, "to"));
        assertEquals("TO", tagOf(line, without, "to"));
    }

    private static String tagOf(String text, Path model, String word) throws Exception {
        AnalysisEngine preprocessor = createEngine(TextPreprocessor.class, TextPreprocessor.PARAM_MODEL, model.toString(),
                TextPreprocessor.PARAM_CHUNK, false);
        JCas jcas = JCasFactory.createJCas();
        jcas.setDocumentText(text);
        preprocessor.process(jcas);
        for (Token t : JCasUtil.select(jcas, Token.class)) {
            if (t.getCoveredText().equals(word)) return t.getPos();
        }
        throw new AssertionError(word + " not among the tokens of " + text);
    }

    @Test
    void damagedTaggerBytesFailNamingTheModelFile() throws Exception {
        Path file = dir.resolve("damaged-tagger.tether");
        TaggerSection damaged = new TaggerSection("not a tagger", "these bytes are no zip".getBytes(StandardCharsets.UTF_8), "x");
        ModelFile.write(new ModelTrainer().withTagger(damaged).build(), file);

        IOException e = assertThrows(IOException.class, () -> ModelTaggers.of(ModelFile.read(file)));
        assertTrue(e.getMessage().contains(file.toString()) && e.getMessage().contains("tagger section"), e.getMessage());
        ResourceInitializationException r = assertThrows(ResourceInitializationException.class,
                () -> createEngine(TextPreprocessor.class, TextPreprocessor.PARAM_MODEL, file.toString()));
        String message = messages(r);
        assertTrue(message.contains(file.toString()) && message.contains(TextPreprocessor.PARAM_MODEL), message);
    }

    @Test
    void aTreebankWithoutTagsGivesNoSentencesAndSaysSo() throws Exception {
        TreebankTaggerTrainer trainer = new TreebankTaggerTrainer();
        TreebankTaggerTrainer.FileTally tally = trainer.add(resource("/dev/tether/preprocessing/ferry-logs-untagged.conllu"));
        assertEquals(0, trainer.sentences());
        assertEquals(3, tally.untagged());
        assertTrue(tally.summary().contains("ferry-logs-untagged.conllu") && tally.summary().contains("column 5"), tally.summary());
        assertThrows(IllegalStateException.class, trainer::train);
    }

    @Test
    void aTreebankWithAnotherTagSetInColumnFiveIsLeftOut() throws Exception {
        // The fixture with universal tags copied into column 5: not Penn Treebank tags, which the finder reads.
        List<String> lines = Files.readAllLines(resource(FIXTURE));
        StringBuilder universal = new StringBuilder();
        for (String l : lines) {
            String[] c = l.split("\t");
            if (c.length == 10) c[4] = c[3];
            universal.append(String.join("\t", c)).append('\n');
        }
        Path file = dir.resolve("universal.conllu");
        Files.writeString(file, universal);
        TreebankTaggerTrainer trainer = new TreebankTaggerTrainer();
        TreebankTaggerTrainer.FileTally tally = trainer.add(file);
        assertTrue(tally.otherTagSet(), tally.summary());
        assertEquals(0, trainer.sentences());
        assertTrue(tally.summary().contains("does not hold Penn Treebank tags"), tally.summary());
        assertNotEquals(0, tally.sentences());
    }

    private static String messages(Throwable t) {
        StringBuilder b = new StringBuilder();
        for (Throwable c = t; c != null; c = c.getCause()) b.append(c.getMessage()).append(" | ");
        return b.toString();
    }
}
