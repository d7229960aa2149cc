package dev.tether.attachment;

/** The baseline that attaches every phrase to the noun. */
public final class AlwaysNounBaseline implements QuadrupleScorer {
    @Override
    public String name() {
        return "always-noun";
    }

    @Override
    public QuadrupleDecision decide(int v, int n1, int p, int n2) {
        return new QuadrupleDecision(AttachmentSite.NOUN, 1.0, DecisionBasis.BASELINE, 0, 0, 0);
    }
}
