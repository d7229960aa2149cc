package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.RawAttachmentCounts;
import dev.tether.counts.RawAttachmentCountsBuilder;
import dev.tether.counts.TupleCounts;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Re-estimation gives the ambiguous verb–noun configurations of raw text to both sites, lexically and structurally:
 * the structural rate of a verb with a noun between it and the preposition gets the verb's share of the split (hits
 * only), which it never gets from the unambiguous prepositions alone. Invented ferry-log candidate sets.
 */
class AmbiguousReestimationTest {
    /** "replaced the gasket on the pump": verb 3 tokens left, the noun right before. */
    private static AttachmentQuery ambiguous(String verb, String noun, String object) {
        return AttachmentQuery.builder("on", object)
                .candidate(noun, "NN", HeadClass.NOUN, 1, false)
                .candidate(verb, "VBD", HeadClass.VERB, 3, false)
                .quadruple(1, 0).build();
    }

    /** "replaced on deck": the verb alone, unambiguous. */
    private static AttachmentQuery verbOnly(String verb, String object) {
        return AttachmentQuery.builder("on", object).candidate(verb, "VBD", HeadClass.VERB, 1, false).build();
    }

    private static RawAttachmentCounts counts() {
        RawAttachmentCountsBuilder b = new RawAttachmentCountsBuilder();
        for (int i = 0; i < 30; i++) b.add(verbOnly("replaced", "deck"));
        for (int i = 0; i < 10; i++) b.add(ambiguous("replaced", "gasket", "deck"));
        b.addDocument(1, 200);
        return b.build();
    }

    private static double hits(TupleCounts t, long key) {
        long e = t.find(key);
        return e == TupleCounts.ABSENT ? 0 : TupleCounts.hitsIn(e);
    }

    @Test
    void theSplitOfAmbiguousConfigurationsAlsoReachesTheStructuralRates() {
        RawAttachmentCounts raw = counts();
        long[] keys = CandidateStructure.keys(ambiguous("replaced", "gasket", "deck"));
        long noun = keys[0], verb = keys[1];
        TupleCounts before = raw.cooccurrence().structure();
        assertEquals(0.0, hits(before, verb), "no unambiguous preposition makes a verb behind a noun the head");

        TupleCounts after = AmbiguousReestimation.of(raw, 1).headChoice().structure();
        double verbShare = hits(after, verb) - hits(before, verb);
        double nounShare = hits(after, noun) - hits(before, noun);
        // Each of the 10 configurations is split between its two candidates, nothing more, nothing less.
        assertEquals(10.0, verbShare + nounShare, 1e-4);
        // "replaced ... on deck" was always the verb's: the back-off gives the verb the larger share.
        assertTrue(verbShare > nounShare, verbShare + " to the verb, " + nounShare + " to the noun");
        assertEquals(before.trialsOf(verb), after.trialsOf(verb), 1e-6, "hits only: the candidates were trials already");
    }

    @Test
    void roundZeroAddsNoAmbiguousCase() {
        RawAttachmentCounts raw = counts();
        assertEquals(raw.cooccurrence().structure().hitsOf(CandidateStructure.keys(ambiguous("replaced", "gasket", "deck"))[1]),
                AmbiguousReestimation.of(raw, 0).headChoice().structure().hitsOf(
                        CandidateStructure.keys(ambiguous("replaced", "gasket", "deck"))[1]));
    }
}
