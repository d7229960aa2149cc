package dev.tether.evaluation;

/**
 * How well a thesaurus ranks judged word pairs.
 *
 * @param spearman Spearman's rank correlation between the thesaurus's similarity and the human scores, over the
 *                 covered pairs (NaN with fewer than two)
 * @param covered  pairs whose two words the thesaurus holds in a common class
 * @param pairs    all pairs of the set
 */
public record SimilarityEvaluation(double spearman, int covered, int pairs) {
    /** Fraction of the pairs covered. */
    public double coverage() {
        return pairs == 0 ? 0 : (double) covered / pairs;
    }
}
