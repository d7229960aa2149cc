package dev.tether.attachment;

/**
 * A decision on one quadruple: the chosen site, the estimated probability of attachment to the noun, what decided it,
 * and the counts behind that estimate ({@code nounCount} of {@code count} training cases attached to the noun; for
 * lexical association, {@code score} holds the log-ratio).
 */
public record QuadrupleDecision(AttachmentSite site, double nounProbability, DecisionBasis basis,
                                double nounCount, double count, double score) {

    /** Probability of the chosen site. */
    public double probability() {
        return site == AttachmentSite.NOUN ? nounProbability : 1 - nounProbability;
    }
}
