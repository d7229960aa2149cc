package dev.tether.similarity;

/**
 * How a thesaurus is built from counted contexts.
 *
 * @param contexts        which contexts make up the vectors
 * @param weighting       how a context is weighted
 * @param measure         how two vectors are compared
 * @param minFrequency    the frequency floor: a word needs at least this many tokens to get a vector
 * @param maxContextWords pruning: a context shared by more than this many words is dropped as uninformative (and
 *                        because scoring all pairs through it would cost the square of its word count)
 * @param neighbours      how many nearest neighbours are stored per word (k)
 */
public record ThesaurusSettings(ContextChoice contexts, Weighting weighting, SimilarityMeasure measure,
                                int minFrequency, int maxContextWords, int neighbours) {

    /**
     * The defaults, chosen on the five development similarity sets with a thesaurus of the 2.8 M words of
     * development raw text (README, "Distributional thesaurus"): window and grammatical contexts together, PPMI and
     * cosine gave the best mean Spearman correlation (0.425; smoothed PPMI 0.424); a floor of 5 tokens keeps 89–97%
     * of the pairs covered (10 drops RG-65 to 46%); pruning contexts shared by more than 5,000 words costs nothing
     * measurable (mean 0.424 unpruned, 0.419 at 2,000, 0.411 at 500) and makes the neighbour search several times
     * faster than without pruning.
     */
    public static final ThesaurusSettings DEFAULT = new ThesaurusSettings(ContextChoice.ALL, Weighting.PPMI,
            SimilarityMeasure.COSINE, 5, 5000, 50);

    public ThesaurusSettings {
        if (contexts == null || weighting == null || measure == null) throw new IllegalArgumentException("contexts, weighting and measure are required");
        if (minFrequency < 1) throw new IllegalArgumentException("the frequency floor must be at least 1, was " + minFrequency);
        if (maxContextWords < 2) throw new IllegalArgumentException("the context pruning limit must be at least 2, was " + maxContextWords);
        if (neighbours < 1) throw new IllegalArgumentException("the number of neighbours must be at least 1, was " + neighbours);
    }

    public ThesaurusSettings withContexts(ContextChoice c) {
        return new ThesaurusSettings(c, weighting, measure, minFrequency, maxContextWords, neighbours);
    }

    public ThesaurusSettings withWeighting(Weighting w) {
        return new ThesaurusSettings(contexts, w, measure, minFrequency, maxContextWords, neighbours);
    }

    public ThesaurusSettings withMeasure(SimilarityMeasure m) {
        return new ThesaurusSettings(contexts, weighting, m, minFrequency, maxContextWords, neighbours);
    }

    public ThesaurusSettings withMinFrequency(int f) {
        return new ThesaurusSettings(contexts, weighting, measure, f, maxContextWords, neighbours);
    }

    public ThesaurusSettings withMaxContextWords(int m) {
        return new ThesaurusSettings(contexts, weighting, measure, minFrequency, m, neighbours);
    }

    public ThesaurusSettings withNeighbours(int k) {
        return new ThesaurusSettings(contexts, weighting, measure, minFrequency, maxContextWords, k);
    }
}
