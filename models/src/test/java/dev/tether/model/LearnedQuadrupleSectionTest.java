package dev.tether.model;

import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.BackedOffScorer;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.LearnedQuadrupleScorer;
import dev.tether.attachment.LearnedQuadrupleTrainer;
import dev.tether.attachment.Quadruple;
import dev.tether.attachment.QuadrupleDecision;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The learned quadruple scorer's section of the model file: round trip, determinism, other versions, too little data. */
class LearnedQuadrupleSectionTest {
    @TempDir
    Path dir;

    /** Invented ferry-log quadruples: "of" mostly with the noun, "with" and "after" mostly with the verb. */
    private static List<LabelledQuadruple> quadruples(int n) {
        String[] verbs = {"replaced", "inspected", "logged", "tightened", "drained", "painted"};
        String[] nouns = {"valve", "pump", "hatch", "winch", "gangway", "bilge"};
        String[] prepositions = {"of", "with", "after", "on"};
        String[] objects = {"crew", "spanner", "crossing", "deck", "engine", "report", "storm", "rust"};
        Random r = new Random(21);
        List<LabelledQuadruple> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            String p = prepositions[r.nextInt(prepositions.length)];
            double noun = p.equals("of") ? 0.9 : p.equals("on") ? 0.5 : 0.2;
            out.add(new LabelledQuadruple(new Quadruple(verbs[r.nextInt(verbs.length)], nouns[r.nextInt(nouns.length)], p,
                    objects[r.nextInt(objects.length)]), r.nextDouble() < noun ? AttachmentSite.NOUN : AttachmentSite.VERB,
                    "ferry-log:" + (i + 1)));
        }
        return out;
    }

    private static TetherModel train(List<LabelledQuadruple> items) {
        ModelTrainer t = new ModelTrainer();
        items.forEach(t::addQuadruple);
        return t.build();
    }

    @Test
    void aModelReadBackDecidesEveryQuadrupleAsBefore() throws Exception {
        List<LabelledQuadruple> items = quadruples(1200);
        TetherModel model = train(items);
        LearnedQuadrupleScorer learned = model.learnedQuadrupleScorer().orElseThrow();
        assertTrue(learned.weights().l2() > 0 && learned.weights().decisions() == items.size());
        Path file = dir.resolve("learned.tether");
        ModelFile.write(model, file);
        TetherModel back = ModelFile.read(file);
        LearnedQuadrupleScorer read = assertInstanceOf(LearnedQuadrupleScorer.class, back.quadrupleScorer());
        assertEquals(learned.weights(), read.weights());
        for (LabelledQuadruple lq : items.subList(0, 200)) {
            QuadrupleDecision a = learned.decide(lq.quadruple());
            QuadrupleDecision b = read.decide(lq.quadruple());
            assertEquals(a.site(), b.site());
            assertEquals(a.nounProbability(), b.nounProbability(), 0.0);
        }
        assertEquals(model.id(), train(items).id(), "training twice on the same quadruples gives the same model bytes");
    }

    @Test
    void aSectionOfAnotherVersionLeavesTheBackOffToDecide() throws Exception {
        TetherModel model = train(quadruples(1200));
        Map<String, byte[]> sections = ModelFile.sections(model.normalizerVersion(), model.sources(), model.quadruples(),
                model.headChoice(), null, null, null);
        sections.put("quadruple-scorer", new byte[] {0, 0, 0, 99, 1, 2, 3});
        TetherModel older = ModelFile.decode(ModelFile.pack(sections), "other-version.tether");
        assertTrue(older.learnedQuadrupleScorer().isEmpty());
        assertInstanceOf(BackedOffScorer.class, older.quadrupleScorer());

        sections.put("quadruple-scorer", new byte[] {0, 0, 0, (byte) LearnedQuadrupleScorer.VERSION, 0, 0});
        ModelFormatException e = assertThrows(ModelFormatException.class,
                () -> ModelFile.decode(ModelFile.pack(sections), "damaged.tether"));
        assertTrue(e.getMessage().contains("damaged.tether") && e.getMessage().contains("train it again"), e.getMessage());
    }

    @Test
    void tooFewQuadruplesKeepTheBaseModelsScorerOrTheBackOff() {
        TetherModel few = train(quadruples(LearnedQuadrupleTrainer.MIN_QUADRUPLES - 1));
        assertFalse(few.learnedQuadrupleScorer().isPresent());
        assertInstanceOf(BackedOffScorer.class, few.quadrupleScorer());

        TetherModel base = train(quadruples(1200));
        ModelTrainer onTop = new ModelTrainer().addModel(base, "base");
        quadruples(30).forEach(onTop::addQuadruple);
        TetherModel adapted = onTop.build();
        LearnedQuadrupleScorer kept = adapted.learnedQuadrupleScorer().orElseThrow();
        assertEquals(base.learnedQuadrupleScorer().orElseThrow().weights(), kept.weights(),
                "a handful of new quadruples keeps the base model's weights, over the new counts");
        assertEquals(0, kept.neighbours());
    }
}
