package dev.tether.attachment;

import dev.tether.counts.QuadrupleCounts;
import org.junit.jupiter.api.Test;

import static dev.tether.attachment.CountTables.decide;
import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Each level of the backed-off estimate of Collins &amp; Brooks (1995), "Prepositional Phrase Attachment through a
 * Backed-Off Model": p(noun | v,n1,p,n2) is the relative frequency of noun attachment at the most specific level with
 * any count: (1) the quadruple; (2) the three triples (v,n1,p), (v,p,n2), (n1,p,n2), hits and totals summed before
 * dividing; (3) the three pairs (v,p), (n1,p), (p,n2), summed likewise; (4) p alone; (5) default noun attachment.
 * Noun attachment when the estimate is at least 0.5.
 *
 * <p>The table (normalized words, invented ferry maintenance log entries):
 * <pre>
 *   a  replac gasket with spare  N        f  inspect hull   for corrosion N
 *   b  replac pump   with spare  V        g  check   engine for leak      V
 *   c  replac pump   with spare  V        h  check   pump   for leak      V
 *   i  replac pump   with spare  N
 *   d  fit    gasket with seal   N        j  secur   hatch  with latch    N
 *   e  fit    valve  with spare  N        k  secur   hatch  with latch    V
 * </pre>
 * Per preposition: with = 8 cases, 5 noun (a d e i j); for = 3 cases, 1 noun (f).
 * The expected answers are worked out by hand beside each test.
 */
class BackedOffScorerTest {
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
    private static final BackedOffScorer SCORER = new BackedOffScorer(COUNTS);

    @Test
    void quadrupleSeenInTrainingDecidesByItsOwnCounts() {
        // (replac, pump, with, spare) seen 3 times (b c i), once noun: 1/3 < 0.5 -> verb. (The pooled triples would
        // give 4/10, so 1/3 shows that the quadruple level decided.)
        QuadrupleDecision d = decide(SCORER, COUNTS, "replac pump with spare");
        assertDecision(d, AttachmentSite.VERB, DecisionBasis.QUADRUPLE, 1, 3);
        assertEquals(2.0 / 3, d.probability(), 1e-12);
    }

    @Test
    void tieAtOneHalfGoesToTheNoun() {
        // (secur, hatch, with, latch) seen twice (j k), once noun: 1/2, which is >= 0.5 -> noun.
        QuadrupleDecision d = decide(SCORER, COUNTS, "secur hatch with latch");
        assertDecision(d, AttachmentSite.NOUN, DecisionBasis.QUADRUPLE, 1, 2);
    }

    @Test
    void unseenQuadrupleBacksOffToPooledTriples() {
        // (replac, valve, with, spare) unseen. Triples under 'with':
        //   (replac, valve) 0 cases;  (replac, spare) a b c i = 4 cases, 2 noun;  (valve, spare) e = 1 case, 1 noun.
        // Pooled: (0 + 2 + 1) / (0 + 4 + 1) = 3/5 = 0.6 -> noun. (Averaging the ratios would give 0.75.)
        QuadrupleDecision d = decide(SCORER, COUNTS, "replac valve with spare");
        assertDecision(d, AttachmentSite.NOUN, DecisionBasis.TRIPLES, 3, 5);
    }

    @Test
    void pooledTriplesCanChooseTheVerbAgainstThePrepositionMajority() {
        // (replac, pump, with, seal) unseen. Triples: (replac, pump) b c i = 3 cases, 1 noun; (replac, seal) 0;
        // (pump, seal) 0. Pooled 1/3 -> verb, although 'with' alone (5/8) would say noun.
        QuadrupleDecision d = decide(SCORER, COUNTS, "replac pump with seal");
        assertDecision(d, AttachmentSite.VERB, DecisionBasis.TRIPLES, 1, 3);
    }

    @Test
    void noTripleSeenBacksOffToPooledPairs() {
        // (fit, pump, with, bolt): triples (fit, pump), (fit, bolt), (pump, bolt) never seen under 'with'.
        // Pairs: (fit, with) d e = 2 cases, 2 noun; (pump, with) b c i = 3 cases, 1 noun; (with, bolt) 0.
        // Pooled (2 + 1 + 0) / (2 + 3 + 0) = 3/5 -> noun. (Averaging the ratios would give 2/3.)
        QuadrupleDecision d = decide(SCORER, COUNTS, "fit pump with bolt");
        assertDecision(d, AttachmentSite.NOUN, DecisionBasis.PAIRS, 3, 5);
    }

    @Test
    void pairsCountOnlyUnderTheQueriedPreposition() {
        // (check, pump, with, bolt): 'check' was seen only with 'for', so (check, with) = 0 cases.
        // Pairs: (check, with) 0; (pump, with) b c i = 3 cases, 1 noun; (with, bolt) 0. 1/3 -> verb.
        QuadrupleDecision d = decide(SCORER, COUNTS, "check pump with bolt");
        assertDecision(d, AttachmentSite.VERB, DecisionBasis.PAIRS, 1, 3);
    }

    @Test
    void tieAtOneHalfGoesToTheNounOnPooledPairs() {
        // (replac, hull, with, rust): no triple under 'with'. Pairs: (replac, with) a b c i = 4 cases, 2 noun;
        // (hull, with) 0; (with, rust) 0. 2/4 = 0.5 -> noun.
        QuadrupleDecision d = decide(SCORER, COUNTS, "replac hull with rust");
        assertDecision(d, AttachmentSite.NOUN, DecisionBasis.PAIRS, 2, 4);
    }

    @Test
    void wordsNeverSeenWithThePrepositionBackOffToThePrepositionAlone() {
        // (replac, gasket, for, spare): all three words are known, but never with 'for', so no quadruple, triple
        // or pair under 'for' has a count. 'for' alone: f g h = 3 cases, 1 noun -> 1/3 -> verb.
        QuadrupleDecision d = decide(SCORER, COUNTS, "replac gasket for spare");
        assertDecision(d, AttachmentSite.VERB, DecisionBasis.PREPOSITION, 1, 3);
        // Words the model never saw at all (id 0) land on the same level.
        QuadrupleDecision unknownWords = decide(SCORER, COUNTS, "paint funnel for regatta");
        assertEquals(d, unknownWords);
    }

    @Test
    void unknownPrepositionGetsTheDefaultNounAttachment() {
        // 'beside' never occurs in training: nothing at any level; Collins & Brooks default to noun attachment.
        QuadrupleDecision d = decide(SCORER, COUNTS, "replac pump beside spare");
        assertDecision(d, AttachmentSite.NOUN, DecisionBasis.DEFAULT, 0, 0);
        assertEquals(1.0, d.nounProbability());
        // An id outside the model's preposition vocabulary is treated as unknown, not as an error.
        int v = COUNTS.words().id("replac");
        int n1 = COUNTS.words().id("pump");
        int n2 = COUNTS.words().id("spare");
        assertEquals(DecisionBasis.DEFAULT, SCORER.decide(v, n1, COUNTS.prepositions().size() + 1, n2).basis());
        assertEquals(DecisionBasis.DEFAULT, SCORER.decide(v, n1, -1, n2).basis());
    }

    @Test
    void emptyTableAlwaysGivesTheDefault() {
        QuadrupleCounts empty = CountTables.of();
        QuadrupleDecision d = new BackedOffScorer(empty).decide(0, 0, 0, 0);
        assertDecision(d, AttachmentSite.NOUN, DecisionBasis.DEFAULT, 0, 0);
    }

    private static void assertDecision(QuadrupleDecision d, AttachmentSite site, DecisionBasis basis,
                                       double nounCount, double count) {
        assertEquals(basis, d.basis(), "level that decided");
        assertEquals(site, d.site(), "site");
        assertEquals(nounCount, d.nounCount(), "noun-attached count behind the estimate");
        assertEquals(count, d.count(), "count behind the estimate");
        double expected = count == 0 ? 1.0 : nounCount / count;
        assertEquals(expected, d.nounProbability(), 1e-12, "estimated probability of noun attachment");
    }
}
