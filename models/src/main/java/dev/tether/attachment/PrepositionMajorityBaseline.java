package dev.tether.attachment;

import dev.tether.counts.QuadrupleCounts;

/**
 * The baseline that gives each preposition the attachment it had most often in training (noun on a tie and for a
 * preposition never seen).
 */
public final class PrepositionMajorityBaseline implements QuadrupleScorer {
    private final QuadrupleCounts counts;

    public PrepositionMajorityBaseline(QuadrupleCounts counts) {
        this.counts = counts;
    }

    @Override
    public String name() {
        return "preposition-majority";
    }

    @Override
    public QuadrupleDecision decide(int v, int n1, int p, int n2) {
        if (p <= 0 || p > counts.prepositions().size() || counts.prepositionCount(p) <= 0) {
            return new QuadrupleDecision(AttachmentSite.NOUN, 1.0, DecisionBasis.BASELINE, 0, 0, 0);
        }
        double noun = counts.prepositionNounCount(p);
        double all = counts.prepositionCount(p);
        double pn = noun / all;
        return new QuadrupleDecision(pn >= 0.5 ? AttachmentSite.NOUN : AttachmentSite.VERB, pn, DecisionBasis.BASELINE,
                noun, all, pn);
    }
}
