package dev.tether.attachment;

import dev.tether.model.ModelTrainer;
import dev.tether.model.TetherModel;
import dev.tether.similarity.Thesaurus;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static dev.tether.attachment.SimilarWordsFeaturesTest.DEFECTS;
import static dev.tether.attachment.SimilarWordsFeaturesTest.NOUNS;
import static dev.tether.attachment.SimilarWordsFeaturesTest.TOOLS;
import static dev.tether.attachment.SimilarWordsFeaturesTest.UNSEEN_DEFECT;
import static dev.tether.attachment.SimilarWordsFeaturesTest.UNSEEN_TOOL;
import static dev.tether.attachment.SimilarWordsFeaturesTest.VERBS;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The learned quadruple scorer on the invented ferry-log case of {@link SimilarWordsFeaturesTest}: "replaced the valve
 * with a wrench" (a tool: the verb) against "... with a crack" (a defect: the noun), as labelled quadruples. The
 * training quadruples never show the tool "ratchet" or the defect "fracture"; the thesaurus has them beside the
 * tools and defects they resemble.
 */
class LearnedQuadrupleScorerTest {
    /** Tools with the verb, defects with the noun, with every verb and noun. */
    private static List<LabelledQuadruple> quadruples() {
        Random r = new Random(9);
        List<LabelledQuadruple> out = new ArrayList<>();
        for (int i = 0; i < 800; i++) {
            boolean tool = r.nextBoolean();
            String object = tool ? TOOLS[r.nextInt(TOOLS.length)] : DEFECTS[r.nextInt(DEFECTS.length)];
            out.add(new LabelledQuadruple(new Quadruple(VERBS[r.nextInt(VERBS.length)], NOUNS[r.nextInt(NOUNS.length)], "with", object),
                    tool ? AttachmentSite.VERB : AttachmentSite.NOUN, "ferry-log:" + (i + 1)));
        }
        return out;
    }

    private static TetherModel train(Thesaurus thesaurus) {
        ModelTrainer trainer = new ModelTrainer();
        if (thesaurus != null) trainer.withThesaurus(thesaurus);
        for (LabelledQuadruple lq : quadruples()) trainer.addQuadruple(lq);
        return trainer.build();
    }

    @Test
    void unseenObjectsGoWhereTheirNeighboursGoOnlyWithAThesaurus() {
        Quadruple tool = new Quadruple("fitted", "seal", "with", UNSEEN_TOOL);
        Quadruple defect = new Quadruple("fitted", "seal", "with", UNSEEN_DEFECT);

        TetherModel without = train(null);
        LearnedQuadrupleScorer plain = assertInstanceOf(LearnedQuadrupleScorer.class, without.quadrupleScorer(),
                "a model trained on labelled quadruples scores them with the learned scorer");
        assertEquals(0, plain.neighbours());
        assertEquals(plain.decide(tool).nounProbability(), plain.decide(defect).nounProbability(), 1e-12,
                "without a thesaurus two unseen objects get the same decision");

        TetherModel with = train(SimilarWordsFeaturesTest.thesaurus());
        LearnedQuadrupleScorer learned = assertInstanceOf(LearnedQuadrupleScorer.class, with.quadrupleScorer());
        assertEquals(QuadrupleFeatureExtractor.NEIGHBOURS, learned.neighbours());
        QuadrupleDecision toolDecision = learned.decide(tool);
        QuadrupleDecision defectDecision = learned.decide(defect);
        assertEquals(AttachmentSite.VERB, toolDecision.site(), "an unseen tool goes with the verb, as its neighbours do");
        assertEquals(AttachmentSite.NOUN, defectDecision.site(), "an unseen defect goes with the noun, as its neighbours do");
        // The decision names the level the plain back-off reached for the same quadruple, and its counts.
        int[] ids = with.quadruples().encode(with.normalizer(), "fitted", "seal", "with", UNSEEN_TOOL);
        QuadrupleDecision backedOff = new BackedOffScorer(with.quadruples()).decide(ids[0], ids[1], ids[2], ids[3]);
        assertEquals(backedOff.basis(), toolDecision.basis());
        assertEquals(backedOff.count(), toolDecision.count(), 1e-9);
    }

    @Test
    void seenQuadruplesAreDecidedAsTheirLabelsSay() {
        TetherModel model = train(null);
        QuadrupleScorer scorer = model.quadrupleScorer();
        int right = 0;
        List<LabelledQuadruple> all = quadruples();
        for (LabelledQuadruple lq : all) {
            if (((LearnedQuadrupleScorer) scorer).decide(lq.quadruple()).site() == lq.site()) right++;
        }
        assertEquals(all.size(), right, "the invented labels follow the object's kind without exception");
    }
}
