package dev.tether.attachment;

import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.SubTuple;
import dev.tether.counts.TupleCounts;

/**
 * The backed-off estimate of Collins &amp; Brooks (1995), "Prepositional Phrase Attachment through a Backed-Off
 * Model": the probability of noun attachment is the relative frequency at the most specific level with any
 * evidence — the whole quadruple; else the three triples that contain the preposition, pooled; else the three
 * pairs that contain it, pooled; else the preposition alone; else the default, noun attachment. Noun attachment is
 * chosen when that probability is at least 0.5. Thread-safe; no allocation besides the returned decision.
 */
public final class BackedOffScorer implements QuadrupleScorer {
    private final QuadrupleCounts counts;

    public BackedOffScorer(QuadrupleCounts counts) {
        this.counts = counts;
    }

    @Override
    public String name() {
        return "backed-off";
    }

    @Override
    public QuadrupleDecision decide(int v, int n1, int p, int n2) {
        if (p <= 0 || p > counts.prepositions().size()) return fallback();
        TupleCounts quad = counts.table(p, SubTuple.VERB_NOUN1_NOUN2);
        long q = quad.find(SubTuple.VERB_NOUN1_NOUN2.key(v, n1, n2));
        if (q != TupleCounts.ABSENT && TupleCounts.trialsIn(q) > 0) {
            return decision(TupleCounts.hitsIn(q), TupleCounts.trialsIn(q), DecisionBasis.QUADRUPLE);
        }
        for (int level = 0; level < POOLED.length; level++) {
            double hits = 0;
            double trials = 0;
            for (SubTuple part : POOLED[level]) {
                long e = counts.table(p, part).find(part.key(v, n1, n2));
                if (e != TupleCounts.ABSENT) {
                    hits += TupleCounts.hitsIn(e);
                    trials += TupleCounts.trialsIn(e);
                }
            }
            if (trials > 0) return decision(hits, trials, POOLED_BASIS[level]);
        }
        if (counts.prepositionCount(p) > 0) {
            return decision(counts.prepositionNounCount(p), counts.prepositionCount(p), DecisionBasis.PREPOSITION);
        }
        return fallback();
    }

    /** The pooled levels in back-off order: the three triples with the preposition, then the three pairs. */
    private static final SubTuple[][] POOLED = {
            {SubTuple.VERB_NOUN1, SubTuple.VERB_NOUN2, SubTuple.NOUN1_NOUN2},
            {SubTuple.VERB, SubTuple.NOUN1, SubTuple.NOUN2}};
    private static final DecisionBasis[] POOLED_BASIS = {DecisionBasis.TRIPLES, DecisionBasis.PAIRS};

    private static QuadrupleDecision decision(double nounHits, double trials, DecisionBasis basis) {
        double pn = nounHits / trials;
        return new QuadrupleDecision(pn >= 0.5 ? AttachmentSite.NOUN : AttachmentSite.VERB, pn, basis, nounHits, trials, pn);
    }

    private static QuadrupleDecision fallback() {
        return new QuadrupleDecision(AttachmentSite.NOUN, 1.0, DecisionBasis.DEFAULT, 0, 0, 1.0);
    }
}
