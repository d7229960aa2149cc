package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.model.ModelFile;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TetherModel;
import dev.tether.ranking.Lbfgs;
import dev.tether.ranking.RankerTrainer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The attachment ranker trained on invented maintenance-log decisions (the project's ferry scenario): a verb, its
 * object noun and a preposition; tools ("with a wrench") attach to the verb, parts ("on the pump") to the noun.
 */
class AttachmentRankerTest {
    @TempDir
    Path dir;

    private static final String[] VERBS = {"replaced", "inspected", "fitted", "tightened", "cleaned", "checked"};
    private static final String[] NOUNS = {"gasket", "valve", "seal", "bearing", "filter", "hose"};
    private static final String[] TOOLS = {"wrench", "spanner", "solvent", "brush", "gauge"};
    private static final String[] PARTS = {"pump", "engine", "gearbox", "hull", "winch"};

    /** Decisions "VERB the NOUN with a TOOL" (gold: verb) and "VERB the NOUN on the PART" (gold: noun). */
    static List<AttachmentExample> examples(long seed, int n) {
        Random r = new Random(seed);
        List<AttachmentExample> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            boolean tool = r.nextBoolean();
            String object = tool ? TOOLS[r.nextInt(TOOLS.length)] : PARTS[r.nextInt(PARTS.length)];
            AttachmentQuery q = AttachmentQuery.builder(tool ? "with" : "on", object).objectTag("NN")
                    .candidate(NOUNS[r.nextInt(NOUNS.length)], "NN", HeadClass.NOUN, 2, false)
                    .candidate(VERBS[r.nextInt(VERBS.length)], "VBD", HeadClass.VERB, 4, false)
                    .quadruple(1, 0).build();
            out.add(new AttachmentExample(q, tool ? 1 : 0, "ferry-log:" + (i + 1)));
        }
        return out;
    }

    private static TetherModel train(List<AttachmentExample> examples) {
        ModelTrainer trainer = new ModelTrainer().rankerTrainer(new RankerTrainer(new double[] {0.1, 1}, 3, new Lbfgs(300, 1e-8)));
        for (AttachmentExample e : examples) trainer.addExample(e);
        return trainer.build();
    }

    @Test
    void learnsTheInventedRuleAndGivesProbabilitiesThatSumToOne() {
        TetherModel model = train(examples(1, 200));
        AttachmentRanker ranker = model.attachmentRanker().orElseThrow();
        int right = 0;
        List<AttachmentExample> heldOut = examples(2, 100);
        for (AttachmentExample e : heldOut) {
            HeadChoice c = ranker.choose(e.query());
            assertEquals(1.0, c.probability(0) + c.probability(1), 1e-12);
            if (c.best() == e.gold()) right++;
        }
        assertEquals(heldOut.size(), right, "the preposition alone separates the two kinds of decision");
    }

    @Test
    void savedModelLoadsWithTheSameRankerAndProbabilities() throws Exception {
        TetherModel trained = train(examples(3, 120));
        Path file = dir.resolve("ferry.tether");
        ModelFile.write(trained, file);
        TetherModel loaded = ModelFile.read(file);
        assertEquals(trained.attachmentRanker().orElseThrow(), loaded.attachmentRanker().orElseThrow());
        assertEquals(trained.id(), loaded.id());
        for (AttachmentExample e : examples(4, 30)) {
            HeadChoice a = trained.chooseHead(e.query());
            HeadChoice b = loaded.chooseHead(e.query());
            assertArrayEquals(new double[] {a.probability(0), a.probability(1)}, new double[] {b.probability(0), b.probability(1)}, 0.0);
        }
    }

    @Test
    void trainingTwiceGivesTheSameBytes() throws Exception {
        Path a = dir.resolve("a.tether");
        Path b = dir.resolve("b.tether");
        ModelFile.write(train(examples(5, 80)), a);
        ModelFile.write(train(examples(5, 80)), b);
        assertArrayEquals(java.nio.file.Files.readAllBytes(a), java.nio.file.Files.readAllBytes(b));
    }

    @Test
    void explanationNamesWhatWeighedMostForTheChosenHead() {
        TetherModel model = train(examples(6, 200));
        AttachmentRanker ranker = model.attachmentRanker().orElseThrow();
        AttachmentQuery q = AttachmentQuery.builder("with", "wrench").objectTag("NN")
                .candidate("gasket", "NN", HeadClass.NOUN, 2, false)
                .candidate("replaced", "VBD", HeadClass.VERB, 4, false).quadruple(1, 0).build();
        HeadChoice c = ranker.choose(q);
        assertEquals(1, c.best());
        List<AttachmentRanker.Reason> reasons = ranker.explain(q, c, 3);
        assertFalse(reasons.isEmpty());
        assertTrue(reasons.size() <= 3);
        for (int i = 1; i < reasons.size(); i++) assertTrue(reasons.get(i - 1).weight() >= reasons.get(i).weight());
        String sentence = AttachmentRanker.sentence(q, c, reasons);
        assertTrue(sentence.startsWith("'replaced' (verb"), sentence);
        assertTrue(sentence.contains("over 'gasket' (noun"), sentence);
    }

    @Test
    void withoutExamplesThereIsNoRankerAndTheCountScoreDecides() throws Exception {
        ModelTrainer trainer = new ModelTrainer();
        trainer.addQuadruple(new LabelledQuadruple(new Quadruple("replaced", "gasket", "with", "wrench"), AttachmentSite.VERB, "t:1"));
        TetherModel model = trainer.build();
        assertTrue(model.attachmentRanker().isEmpty());
        AttachmentQuery q = examples(7, 1).get(0).query();
        assertArrayEquals(new double[] {model.headChoiceScorer().choose(q).probability(0)},
                new double[] {model.chooseHead(q).probability(0)}, 0.0);
    }

    @Test
    void aBaseModelsRankerIsKeptWhenOnlyCountsAreAdded() {
        TetherModel base = train(examples(8, 100));
        ModelTrainer trainer = new ModelTrainer().addModel(base, "base");
        trainer.addQuadruple(new LabelledQuadruple(new Quadruple("fitted", "seal", "with", "gauge"), AttachmentSite.VERB, "t:1"));
        TetherModel extended = trainer.build();
        assertEquals(base.attachmentRanker().orElseThrow().weights(), extended.attachmentRanker().orElseThrow().weights());
    }

    @Test
    void anEmptyCandidateListIsAClearError() {
        TetherModel model = train(examples(9, 40));
        AttachmentQuery empty = AttachmentQuery.builder("with", "wrench").build();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> model.chooseHead(empty));
        assertTrue(e.getMessage().contains("no candidate heads for 'with'"), e.getMessage());
    }

    @Test
    void familiesCanBeSwitchedOff() {
        ModelTrainer trainer = new ModelTrainer().rankerFamilies(EnumSet.of(AttachmentFeatureFamily.CLASS_PREPOSITION))
                .rankerTrainer(new RankerTrainer(new double[] {1}, 1, new Lbfgs(200, 1e-8)));
        for (AttachmentExample e : examples(10, 60)) trainer.addExample(e);
        AttachmentRanker r = trainer.build().attachmentRanker().orElseThrow();
        assertEquals(EnumSet.of(AttachmentFeatureFamily.CLASS_PREPOSITION), r.families());
        // Two prepositions by two classes, for each of: class with preposition, nearest of its class, and preposition
        // with class and distance bucket (the noun is always 2 words away, the verb 4).
        assertEquals(3 * 4, r.featureCount());
    }
}
