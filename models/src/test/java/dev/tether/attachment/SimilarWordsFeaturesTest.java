package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.model.ModelFile;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TetherModel;
import dev.tether.ranking.Lbfgs;
import dev.tether.ranking.RankerTrainer;
import dev.tether.similarity.ContextCounter;
import dev.tether.similarity.Thesaurus;
import dev.tether.similarity.ThesaurusBuilder;
import dev.tether.similarity.ThesaurusSettings;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The similar-words features on an invented ferry-log case where only the object decides: "replaced the valve with a
 * wrench" (a tool: the verb) against "replaced the valve with a crack" (a defect: the noun). The training decisions
 * never show the tool "ratchet" or the defect "fracture"; the thesaurus, from other invented sentences, has them
 * beside the tools and the defects they resemble. Without a thesaurus the two unseen objects look alike to the
 * ranker; with it, each goes where its neighbours go, and the evidence names those neighbours.
 */
class SimilarWordsFeaturesTest {
    static final String[] VERBS = {"replaced", "inspected", "fitted", "cleaned", "checked"};
    static final String[] NOUNS = {"valve", "gasket", "seal", "hose", "bearing"};
    /** Thirty tools and thirty defects, so that many occur in only a few decisions, as most words of real text do. */
    static final String[] TOOLS = compounds(new String[] {"torque", "socket", "hex", "pipe", "box", "ring"},
            new String[] {"wrench", "key", "driver", "spanner", "bar"});
    static final String[] DEFECTS = compounds(new String[] {"hairline", "surface", "deep", "edge", "weld", "seam"},
            new String[] {"crack", "dent", "pit", "scratch", "gouge"});
    static final String UNSEEN_TOOL = "ratchet";
    static final String UNSEEN_DEFECT = "fracture";

    @TempDir
    Path dir;

    private static String[] compounds(String[] first, String[] second) {
        String[] out = new String[first.length * second.length];
        for (int i = 0; i < out.length; i++) out[i] = first[i / second.length] + "-" + second[i % second.length];
        return out;
    }

    private static String[] with(String[] words, String extra) {
        String[] out = java.util.Arrays.copyOf(words, words.length + 1);
        out[words.length] = extra;
        return out;
    }

    /** Sentences where tools are held and used and defects are found and repaired, the unseen two among them. */
    static Thesaurus thesaurus() {
        ContextCounter counter = new ContextCounter();
        Random r = new Random(3);
        String[] tools = with(TOOLS, UNSEEN_TOOL);
        String[] defects = with(DEFECTS, UNSEEN_DEFECT);
        String[] crew = {"engineer", "mechanic", "deckhand"};
        for (int i = 0; i < 3000; i++) {
            String who = crew[r.nextInt(crew.length)];
            if (r.nextBoolean()) {
                counter.addSentence(new String[] {"The", who, "held", "the", tools[r.nextInt(tools.length)], "and", "turned", "it", "."},
                        new String[] {"DT", "NN", "VBD", "DT", "NN", "CC", "VBD", "PRP", "."});
            } else {
                counter.addSentence(new String[] {"The", who, "found", "a", "deep", defects[r.nextInt(defects.length)], "in", "the", "hull", "."},
                        new String[] {"DT", "NN", "VBD", "DT", "JJ", "NN", "IN", "DT", "NN", "."});
            }
        }
        return ThesaurusBuilder.build(counter, ThesaurusSettings.DEFAULT.withMinFrequency(3).withMaxContextWords(1000), 1);
    }

    private static AttachmentQuery query(String verb, String noun, String object) {
        return AttachmentQuery.builder("with", object).objectTag("NN")
                .candidate(noun, "NN", HeadClass.NOUN, 2, false)
                .candidate(verb, "VBD", HeadClass.VERB, 4, false)
                .quadruple(1, 0).build();
    }

    /** Tools with the verb (candidate 1), defects with the noun (candidate 0). */
    private static List<AttachmentExample> examples() {
        Random r = new Random(5);
        List<AttachmentExample> out = new ArrayList<>();
        for (int i = 0; i < 240; i++) {
            boolean tool = r.nextBoolean();
            String object = tool ? TOOLS[r.nextInt(TOOLS.length)] : DEFECTS[r.nextInt(DEFECTS.length)];
            out.add(new AttachmentExample(query(VERBS[r.nextInt(VERBS.length)], NOUNS[r.nextInt(NOUNS.length)], object),
                    tool ? 1 : 0, "ferry-log:" + (i + 1)));
        }
        return out;
    }

    private static TetherModel train(Thesaurus thesaurus) {
        ModelTrainer trainer = new ModelTrainer().rankerTrainer(new RankerTrainer(new double[] {0.1, 1}, 3, new Lbfgs(300, 1e-8)));
        if (thesaurus != null) trainer.withThesaurus(thesaurus);
        for (AttachmentExample e : examples()) trainer.addExample(e);
        return trainer.build();
    }

    @Test
    void theThesaurusPlacesTheNeighboursOfTheTrainingWordsItNeverSaw() throws Exception {
        Thesaurus thesaurus = thesaurus();
        assertTrue(List.of(TOOLS).contains(thesaurus.key(thesaurus.neighbourId(thesaurus.id(HeadClass.NOUN, UNSEEN_TOOL), 0))),
                "the fixture's nearest neighbour of the unseen tool is a tool");

        AttachmentQuery tool = query("fitted", "seal", UNSEEN_TOOL);
        AttachmentQuery defect = query("fitted", "seal", UNSEEN_DEFECT);

        TetherModel without = train(null);
        double verbWithout = without.chooseHead(tool).probability(1);
        assertEquals(verbWithout, without.chooseHead(defect).probability(1), 1e-12,
                "without a thesaurus two unseen objects of the same tag get the same decision");

        TetherModel with = train(thesaurus);
        HeadChoice toolChoice = with.chooseHead(tool);
        HeadChoice defectChoice = with.chooseHead(defect);
        assertEquals(1, toolChoice.best(), "an unseen tool goes with the verb, as its neighbours do");
        assertEquals(0, defectChoice.best(), "an unseen defect goes with the noun, as its neighbours do");
        assertTrue(toolChoice.probability(1) > verbWithout && defectChoice.probability(0) > 1 - verbWithout,
                "both are surer than the ranker without a thesaurus");

        String evidence = AttachmentRanker.sentence(tool, toolChoice, with.attachmentRanker().orElseThrow().explain(tool, toolChoice, 3));
        assertTrue(evidence.contains("words like '" + UNSEEN_TOOL + "'") && evidence.matches(".*neighbours [a-z]+-(wrench|key|driver|spanner|bar) \\(.*"),
                "the evidence names the neighbours that decided: " + evidence);

        Path file = dir.resolve("with.tether");
        ModelFile.write(with, file);
        TetherModel reloaded = ModelFile.read(file);
        assertEquals(toolChoice.probability(1), reloaded.chooseHead(tool).probability(1), 1e-12,
                "a model read back uses its stored thesaurus for the same features");
    }

    @Test
    void aRankerKeptFromABaseModelKeepsTheThesaurusItWasTrainedOn() {
        Thesaurus thesaurus = thesaurus();
        TetherModel with = train(thesaurus);
        TetherModel without = train(null);
        LabelledQuadruple extra = new LabelledQuadruple(new Quadruple("fitted", "seal", "with", "spanner-key"), AttachmentSite.VERB, "ferry-log:extra");

        // Same thesaurus (taken over from the base, or the same one given again): the ranker is kept.
        TetherModel kept = new ModelTrainer().addModel(with, "with").build();
        assertTrue(kept.attachmentRanker().orElseThrow().families().contains(AttachmentFeatureFamily.SIMILAR_WORDS));
        ModelTrainer again = new ModelTrainer().addModel(with, "with").withThesaurus(thesaurus());
        again.addQuadruple(extra);
        assertTrue(again.build().attachmentRanker().isPresent(), "an equal thesaurus keeps the ranker");

        // Another thesaurus, or none, under similar-words weights fitted on the first: refused, saying what to do.
        Thesaurus other = ThesaurusBuilder.build(otherCounter(), ThesaurusSettings.DEFAULT.withMinFrequency(3).withMaxContextWords(1000), 1);
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> new ModelTrainer().addModel(with, "with").withThesaurus(other).build());
        assertTrue(e.getMessage().contains(with.id()) && e.getMessage().contains("--conllu"), e.getMessage());
        assertThrows(IllegalStateException.class, () -> new ModelTrainer().addModel(with, "with").withThesaurus(null).build());

        // A base ranker trained without a thesaurus is kept; the thesaurus then serves the quadruple scorer only.
        TetherModel plain = new ModelTrainer().addModel(without, "without").withThesaurus(thesaurus).build();
        assertTrue(ModelTrainer.thesaurusUnusedByRanker(plain));
        assertFalse(ModelTrainer.thesaurusUnusedByRanker(with));
        assertFalse(ModelTrainer.thesaurusUnusedByRanker(without));
    }

    /** Other invented sentences, so another thesaurus over some of the same words. */
    private static ContextCounter otherCounter() {
        ContextCounter counter = new ContextCounter();
        Random r = new Random(11);
        String[] tools = with(TOOLS, UNSEEN_TOOL);
        for (int i = 0; i < 2000; i++) {
            counter.addSentence(new String[] {"A", "deckhand", "stowed", "the", tools[r.nextInt(tools.length)], "below", "."},
                    new String[] {"DT", "NN", "VBD", "DT", "NN", "RB", "."});
        }
        return counter;
    }
}
