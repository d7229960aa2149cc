package dev.tether.evaluation;

import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.DecisionBasis;

import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The result of scoring a set of labelled quadruples: accuracy of the model's scorer and of every comparison scorer
 * from the same run, the main scorer's accuracy by what decided it, and its confusion table (gold × chosen).
 */
public final class QuadrupleEvaluation {
    private final String mainScorer;
    private final Map<String, Accuracy> byScorer = new LinkedHashMap<>();
    private final Map<DecisionBasis, Accuracy> byBasis = new EnumMap<>(DecisionBasis.class);
    private final long[][] confusion = new long[2][2];
    private long unknownPrepositions;
    private final Map<DecisionBasis, Accuracy[]> smoothingByLevel = new EnumMap<>(DecisionBasis.class);

    QuadrupleEvaluation(String mainScorer) {
        this.mainScorer = mainScorer;
    }

    void record(String scorer, boolean right) {
        byScorer.computeIfAbsent(scorer, s -> new Accuracy()).add(right);
    }

    void recordMain(DecisionBasis basis, AttachmentSite gold, AttachmentSite chosen) {
        byBasis.computeIfAbsent(basis, b -> new Accuracy()).add(gold == chosen);
        confusion[gold.ordinal()][chosen.ordinal()]++;
    }

    /** With a thesaurus: the level the plain back-off used, whether it was right, and whether the smoothed one was. */
    void recordSmoothing(DecisionBasis plainLevel, boolean plainRight, boolean smoothedRight) {
        Accuracy[] a = smoothingByLevel.computeIfAbsent(plainLevel, b -> new Accuracy[] {new Accuracy(), new Accuracy()});
        a[0].add(plainRight);
        a[1].add(smoothedRight);
    }

    /**
     * For a model with a thesaurus, per level of the plain back-off: its accuracy ([0]) and the smoothed scorer's on
     * the same items ([1]). Empty without a thesaurus.
     */
    public Map<DecisionBasis, Accuracy[]> smoothingByLevel() { return smoothingByLevel; }

    void recordUnknownPreposition() {
        unknownPrepositions++;
    }

    public String mainScorer() { return mainScorer; }
    public Accuracy main() { return byScorer.get(mainScorer); }
    /** Accuracy per scorer name, the main scorer first. */
    public Map<String, Accuracy> byScorer() { return byScorer; }
    /** The main scorer's accuracy per back-off level (only levels that decided something). */
    public Map<DecisionBasis, Accuracy> byBasis() { return byBasis; }
    /** Count of items with gold site {@code gold} that the main scorer attached to {@code chosen}. */
    public long confusion(AttachmentSite gold, AttachmentSite chosen) { return confusion[gold.ordinal()][chosen.ordinal()]; }
    /** Items whose preposition the model never saw in training. */
    public long unknownPrepositions() { return unknownPrepositions; }
}
