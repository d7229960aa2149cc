package dev.tether.model;

import dev.tether.attachment.AttachmentQuery;
import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;
import dev.tether.attachment.ReviewedChoice;
import dev.tether.candidates.HeadClass;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Reviewed decisions counted as weighted lexical head-choice events (invented ferry-log cases). */
class ReviewedChoiceTrainingTest {
    /** "cleaned the filters with solvent": before review the counts favour the verb. */
    private static final AttachmentQuery QUERY = new AttachmentQuery("with", "solvent",
            new String[] {"filters", "cleaned"}, new HeadClass[] {HeadClass.NOUN, HeadClass.VERB},
            new int[] {1, 3}, new boolean[] {false, false});

    private static ModelTrainer base() {
        ModelTrainer t = new ModelTrainer();
        t.addQuadruple(new LabelledQuadruple(new Quadruple("cleaned", "filters", "with", "solvent"), AttachmentSite.VERB, "fixture"));
        t.addQuadruple(new LabelledQuadruple(new Quadruple("fitted", "valve", "with", "seal"), AttachmentSite.NOUN, "fixture"));
        return t;
    }

    @Test
    void aCorrectedDecisionWithEnoughWeightChangesTheChoice() {
        TetherModel before = base().build();
        assertEquals(1, before.headChoiceScorer().choose(QUERY).best(), "the verb, before review");

        ReviewedChoice reviewed = new ReviewedChoice("with", "solvent", List.of("cleaned", "filters"),
                List.of(HeadClass.VERB, HeadClass.NOUN), 1, 5.0);
        TetherModel after = base().addReviewedChoices(List.of(reviewed), "review.tsv", "ab12").build();

        assertEquals(0, after.headChoiceScorer().choose(QUERY).best(), "the noun the reviewer chose");
        assertNotEquals(before.id(), after.id());
        ModelSource source = after.sources().get(after.sources().size() - 1);
        assertEquals(new ModelSource("review.tsv", "corrections", 1, 0, "ab12"), source);
    }

    @Test
    void anAcceptedDecisionStrengthensTheChoiceItConfirms() {
        ReviewedChoice accepted = new ReviewedChoice("with", "solvent", List.of("filters", "cleaned"),
                List.of(HeadClass.NOUN, HeadClass.VERB), 1, 1.0);
        double before = base().build().headChoiceScorer().choose(QUERY).probability(1);
        double after = base().addReviewedChoices(List.of(accepted), "review.tsv", "ab12").build()
                .headChoiceScorer().choose(QUERY).probability(1);
        assertTrue(after > before, before + " -> " + after);
    }

    @Test
    void aChoiceOutsideTheOfferedHeadsIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> new ReviewedChoice("with", "solvent", List.of("filters"),
                List.of(HeadClass.NOUN), 1, 1.0));
        assertThrows(IllegalArgumentException.class, () -> new ReviewedChoice("with", "solvent", List.of("filters"),
                List.of(HeadClass.NOUN), 0, 0.0));
    }
}
