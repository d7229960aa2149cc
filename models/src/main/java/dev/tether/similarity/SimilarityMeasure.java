package dev.tether.similarity;

import java.util.Locale;

/**
 * How alike two weighted context vectors are. Each measure is a sum over the contexts the two words share, finished
 * with per-word totals, so that all pairs can be scored through an inverted index over shared contexts
 * ({@link NeighbourSearch}) with exactly the arithmetic of {@link Thesaurus#similarity(int, int)}.
 */
public enum SimilarityMeasure {
    /** {@code sum(a_c b_c) / (|a| |b|)}. */
    COSINE("cosine"),
    /** Lin (1998): {@code sum over shared c of (a_c + b_c) / (sum a_c + sum b_c)}. */
    LIN("lin"),
    /** Weighted Jaccard: {@code sum min(a_c, b_c) / sum max(a_c, b_c)}; the denominator is {@code sum a + sum b - sum min}. */
    WEIGHTED_JACCARD("jaccard");

    private final String label;

    SimilarityMeasure(String label) {
        this.label = label;
    }

    /** The contribution of one shared context with weights {@code a} and {@code b}. */
    double shared(double a, double b) {
        return switch (this) {
            case COSINE -> a * b;
            case LIN -> a + b;
            case WEIGHTED_JACCARD -> Math.min(a, b);
        };
    }

    /**
     * The score from the sum of shared contributions; {@code norm*} are the vectors' Euclidean lengths and
     * {@code total*} the sums of their weights. 0 when nothing is shared.
     */
    double finish(double sharedSum, double normA, double totalA, double normB, double totalB) {
        if (sharedSum <= 0) return 0;
        return switch (this) {
            case COSINE -> sharedSum / (normA * normB);
            case LIN -> sharedSum / (totalA + totalB);
            case WEIGHTED_JACCARD -> sharedSum / (totalA + totalB - sharedSum);
        };
    }

    public String label() {
        return label;
    }

    public static SimilarityMeasure of(String label) {
        for (SimilarityMeasure m : values()) {
            if (m.label.equals(label.toLowerCase(Locale.ROOT))) return m;
        }
        StringBuilder names = new StringBuilder();
        for (SimilarityMeasure m : values()) names.append(names.length() == 0 ? "" : ", ").append(m.label);
        throw new IllegalArgumentException("unknown similarity measure '" + label + "'; choose one of " + names);
    }
}
