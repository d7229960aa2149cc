package dev.tether.model;

import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.HeadChoiceScorer;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;
import dev.tether.attachment.ReviewedChoice;
import dev.tether.candidates.HeadClass;
import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.TupleCounts;
import dev.tether.counts.TupleKey;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * Reviewed decisions counted as weighted lexical head-choice events (invented ferry-log cases): every offered head a
 * trial, the reviewer's choice the hit. That retraining on them changes the decisions is shown end to end by
 * {@code ReviewCorrectionsTest} in annotators.
 */
class ReviewedChoiceTrainingTest {
    private static ModelTrainer base() {
        ModelTrainer t = new ModelTrainer();
        t.addQuadruple(new LabelledQuadruple(new Quadruple("cleaned", "filters", "with", "solvent"), AttachmentSite.VERB, "fixture"));
        return t;
    }

    /** {hits, trials} of a head word of class {@code c} with "with ... solvent". */
    private static double[] withSolvent(TetherModel m, String head, HeadClass c) {
        HeadChoiceCounts counts = m.headChoice();
        int p = counts.prepositions().id(m.normalizer().preposition("with"));
        int h = counts.words().id(HeadChoiceScorer.headKey(m.normalizer(), head, c));
        int o = counts.words().id(m.normalizer().noun("solvent"));
        long e = counts.lexical(p, HeadChoiceCounts.Part.HEAD_OBJECT).find(TupleKey.of(h, c.ordinal() + 1, o));
        return e == TupleCounts.ABSENT ? new double[] {0, 0} : new double[] {TupleCounts.hitsIn(e), TupleCounts.trialsIn(e)};
    }

    @Test
    void aCorrectionCountsEveryOfferedHeadWithItsWeightAndTheChoiceAsTheHit() {
        TetherModel before = base().build();
        assertEquals(0.0, withSolvent(before, "filters", HeadClass.NOUN)[0]);
        assertEquals(1.0, withSolvent(before, "filters", HeadClass.NOUN)[1], "the noun was a candidate in training");
        assertEquals(1.0, withSolvent(before, "cleaned", HeadClass.VERB)[0], "the verb was the head in training");

        ReviewedChoice reviewed = new ReviewedChoice("with", "solvent", List.of("cleaned", "filters"),
                List.of(HeadClass.VERB, HeadClass.NOUN), 1, 5.0);
        TetherModel after = base().addReviewedChoices(List.of(reviewed), "review.tsv", "ab12").build();

        double[] noun = withSolvent(after, "filters", HeadClass.NOUN);
        double[] verb = withSolvent(after, "cleaned", HeadClass.VERB);
        assertEquals(5.0, noun[0], "the reviewer's choice: a hit of weight 5");
        assertEquals(6.0, noun[1]);
        assertEquals(1.0, verb[0], "the other offered head: trials only");
        assertEquals(6.0, verb[1]);
        assertNotEquals(before.id(), after.id());
        assertEquals(new ModelSource("review.tsv", "corrections", 1, 0, "ab12"), after.sources().get(after.sources().size() - 1));
    }

    @Test
    void noneOfTheOfferedHeadsMakesEveryOneATrialWithoutAHit() {
        ReviewedChoice none = new ReviewedChoice("with", "solvent", List.of("filters", "cleaned"),
                List.of(HeadClass.NOUN, HeadClass.VERB), -1, 2.0);
        TetherModel after = base().addReviewedChoices(List.of(none), "review.tsv", "ab12").build();
        assertEquals(0.0, withSolvent(after, "filters", HeadClass.NOUN)[0]);
        assertEquals(3.0, withSolvent(after, "filters", HeadClass.NOUN)[1]);
        assertEquals(1.0, withSolvent(after, "cleaned", HeadClass.VERB)[0]);
        assertEquals(3.0, withSolvent(after, "cleaned", HeadClass.VERB)[1]);
    }

    @Test
    void aChoiceOutsideTheOfferedHeadsIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> new ReviewedChoice("with", "solvent", List.of("filters"),
                List.of(HeadClass.NOUN), 1, 1.0));
        assertThrows(IllegalArgumentException.class, () -> new ReviewedChoice("with", "solvent", List.of("filters"),
                List.of(HeadClass.NOUN), 0, 0.0));
    }
}
