package dev.tether.attachment;

import dev.tether.counts.QuadrupleCounts;
import org.junit.jupiter.api.Test;

import static dev.tether.attachment.CountTables.decide;
import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Lexical association after Hindle &amp; Rooth (1993), "Structural Ambiguity and Lexical Relations", in the form the
 * class documents:
 * <pre>
 *   LA = log2( P(p|v) / P(p|n1) )
 *   P(p|v)  = ( f(v,p,verb-attached)  + f(p,verb-attached) / f(verb-attached) ) / ( f(v)  + 1 )
 *   P(p|n1) = ( f(n1,p,noun-attached) + f(p,noun-attached) / f(noun-attached) ) / ( f(n1) + 1 )
 * </pre>
 * verb attachment when LA &gt; 0. Worked by hand on the table of {@link BackedOffScorerTest} (11 cases: 6 attached
 * to the noun, a d e f i j; 5 to the verb, b c g h k):
 * <pre>
 *   f(with, noun) = 5 (a d e i j)   f(with, verb) = 2 + 1 = 3 (b c k)
 *   f(for, noun)  = 1 (f)           f(for, verb)  = 2 (g h)
 * </pre>
 */
class LexicalAssociationScorerTest {
    private static final QuadrupleCounts COUNTS = CountTables.of(
            "replac gasket with spare N",
            "replac pump with spare V",
            "replac pump with spare V",
            "replac pump with spare N",
            "fit gasket with seal N",
            "fit valve with spare N",
            "secur hatch with latch N",
            "secur hatch with latch V",
            "inspect hull for corrosion N",
            "check engine for leak V",
            "check pump for leak V");
    private static final LexicalAssociationScorer SCORER = new LexicalAssociationScorer(COUNTS);

    @Test
    void nounWinsWhenTheNounTakesThePrepositionMoreReadily() {
        // (replac, gasket, with, spare):
        //   f(replac, with, verb) = 2 (b c), f(replac) = 4 (a b c i)
        //   P(with|replac) = (2 + 3/5) / (4 + 1) = 2.6 / 5 = 13/25 = 0.52
        //   f(gasket, with, noun) = 2 (a d), f(gasket) = 2 (a d)
        //   P(with|gasket) = (2 + 5/6) / (2 + 1) = 17/18 = 0.9444...
        //   LA = log2( (13/25) / (17/18) ) = log2(234/425) = -0.8609543 -> noun
        //   reported noun probability 1 / (1 + 2^LA) = 1 / (1 + 234/425) = 425/659 = 0.6449165
        QuadrupleDecision d = decide(SCORER, COUNTS, "replac gasket with spare");
        assertEquals(AttachmentSite.NOUN, d.site());
        assertEquals(DecisionBasis.LEXICAL_ASSOCIATION, d.basis());
        assertEquals(-0.8609543114, d.score(), 1e-9);
        assertEquals(425.0 / 659, d.nounProbability(), 1e-12);
        assertEquals(2, d.nounCount());
        assertEquals(4, d.count());
    }

    @Test
    void verbWinsWhenTheVerbTakesThePrepositionMoreReadily() {
        // (check, pump, for, leak):
        //   f(check, for, verb) = 2 (g h), f(check) = 2
        //   P(for|check) = (2 + 2/5) / (2 + 1) = 4/5
        //   f(pump, for, noun) = 0 (h is verb-attached), f(pump) = 4 (b c i h)
        //   P(for|pump) = (0 + 1/6) / (4 + 1) = 1/30
        //   LA = log2(24) = 4.5849625 -> verb; noun probability 1 / (1 + 24) = 0.04
        QuadrupleDecision d = decide(SCORER, COUNTS, "check pump for leak");
        assertEquals(AttachmentSite.VERB, d.site());
        assertEquals(4.5849625007, d.score(), 1e-9);
        assertEquals(0.04, d.nounProbability(), 1e-12);
        assertEquals(0.96, d.probability(), 1e-12);
        assertEquals(0, d.nounCount());
        assertEquals(2, d.count());
    }

    @Test
    void theObjectOfThePrepositionPlaysNoPart() {
        // Hindle & Rooth's score uses v, n1 and p only.
        assertEquals(decide(SCORER, COUNTS, "check pump for leak"), decide(SCORER, COUNTS, "check pump for corrosion"));
    }

    @Test
    void unseenWordsFallBackToThePrepositionRates() {
        // (paint, funnel, for, regatta), all words unseen: f(v) = f(n1) = 0, so
        //   P(for|v) = (0 + 2/5) / 1 = 0.4, P(for|n1) = (0 + 1/6) / 1 = 1/6, LA = log2(2.4) > 0 -> verb
        QuadrupleDecision d = decide(SCORER, COUNTS, "paint funnel for regatta");
        assertEquals(AttachmentSite.VERB, d.site());
        assertEquals(Math.log(2.4) / Math.log(2), d.score(), 1e-12);
    }

    @Test
    void unknownPrepositionGetsTheDefault() {
        QuadrupleDecision d = decide(SCORER, COUNTS, "replac pump beside spare");
        assertEquals(AttachmentSite.NOUN, d.site());
        assertEquals(DecisionBasis.DEFAULT, d.basis());
    }
}
