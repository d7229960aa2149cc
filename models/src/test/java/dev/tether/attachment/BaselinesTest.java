package dev.tether.attachment;

import dev.tether.counts.QuadrupleCounts;
import org.junit.jupiter.api.Test;

import static dev.tether.attachment.CountTables.decide;
import static org.junit.jupiter.api.Assertions.assertEquals;

/** The two baselines reported beside the model (always noun; majority attachment per preposition in training). */
class BaselinesTest {
    // with: 3 cases, 2 noun -> noun.  for: 3 cases, 1 noun -> verb.  on: 2 cases, 1 noun -> tie -> noun.
    private static final QuadrupleCounts COUNTS = CountTables.of(
            "replac gasket with spare N",
            "fit valve with seal N",
            "replac pump with spare V",
            "inspect hull for corrosion N",
            "check engine for leak V",
            "check pump for leak V",
            "fit valve on deck V",
            "tighten bolt on ramp N");

    @Test
    void alwaysNounAttachesEverythingToTheNoun() {
        AlwaysNounBaseline baseline = new AlwaysNounBaseline();
        assertEquals("always-noun", baseline.name());
        for (String q : new String[] {"check pump for leak", "replac pump with spare", "paint funnel beside pier"}) {
            QuadrupleDecision d = decide(baseline, COUNTS, q);
            assertEquals(AttachmentSite.NOUN, d.site(), q);
            assertEquals(DecisionBasis.BASELINE, d.basis(), q);
        }
    }

    @Test
    void prepositionMajorityFollowsEachPrepositionsTrainingMajority() {
        PrepositionMajorityBaseline baseline = new PrepositionMajorityBaseline(COUNTS);
        assertEquals("preposition-majority", baseline.name());
        // The other words do not matter: 'replac pump with spare' was verb-attached, but 'with' is noun 2 of 3.
        QuadrupleDecision with = decide(baseline, COUNTS, "replac pump with spare");
        assertEquals(AttachmentSite.NOUN, with.site());
        assertEquals(2.0 / 3, with.nounProbability(), 1e-12);
        QuadrupleDecision forDecision = decide(baseline, COUNTS, "inspect hull for corrosion");
        assertEquals(AttachmentSite.VERB, forDecision.site());
        assertEquals(1.0 / 3, forDecision.nounProbability(), 1e-12);
    }

    @Test
    void prepositionMajorityTieAndUnknownPrepositionGoToTheNoun() {
        PrepositionMajorityBaseline baseline = new PrepositionMajorityBaseline(COUNTS);
        assertEquals(AttachmentSite.NOUN, decide(baseline, COUNTS, "fit valve on deck").site());
        assertEquals(0.5, decide(baseline, COUNTS, "fit valve on deck").nounProbability());
        assertEquals(AttachmentSite.NOUN, decide(baseline, COUNTS, "moor ferry beside pier").site());
    }
}
