package dev.tether.attachment;

import dev.tether.ranking.FeatureKey;

/**
 * The feature templates of the learned quadruple scorer ({@link LearnedQuadrupleScorer}). Every feature belongs to
 * the noun side of the binary choice (the verb side has none), so the scorer is a logistic regression on them; the
 * parts are listed beside each template (level = index into {@link QuadrupleFeatureExtractor#LEVELS}).
 */
enum QuadrupleFeature {
    /** The level's tuple was seen with the preposition; parts: level. */
    LEVEL_SEEN,
    /** log((noun cases + ½) / (verb cases + ½)) at the level; parts: level. */
    LEVEL_LOG_ODDS,
    /** log(1 + cases) at the level; parts: level. */
    LEVEL_TRIALS,
    /** The preposition's log-odds of noun attachment over all its cases; no parts. */
    PREPOSITION_LOG_ODDS,
    /** log(1 + the preposition's cases); no parts. */
    PREPOSITION_TRIALS,
    /** The preposition itself (its id in the model's prepositions, 0 for one the model never saw); parts: id. */
    PREPOSITION,
    /** The log-odds of the Collins &amp; Brooks back-off's estimate, clipped to [0.001, 0.999]; no parts. */
    BACKED_OFF_LOG_ODDS,
    /** The level the back-off decided at; parts: {@link DecisionBasis} ordinal (up to the default). */
    BACKED_OFF_BASIS,
    /**
     * Similarity-weighted mean noun-attachment rate of the tuples with one word replaced by its thesaurus neighbours
     * (Dagan, Lee &amp; Pereira 1999), as log-odds; parts: slot (0 verb, 1 first noun, 2 object), level group (0 the
     * quadruple, 1 the triples, 2 the pairs).
     */
    NEIGHBOUR_LOG_ODDS,
    /** log(1 + summed similarity) behind {@link #NEIGHBOUR_LOG_ODDS}; parts as there. */
    NEIGHBOUR_WEIGHT,
    /** Some neighbour of the slot's word was seen at the level group; parts as {@link #NEIGHBOUR_LOG_ODDS}. */
    NEIGHBOUR_SEEN;

    private static final QuadrupleFeature[] ALL = values();

    long key(int a, int b) {
        return key(a, b, 0);
    }

    long key(int a, int b, int c) {
        return FeatureKey.of(ordinal() + 1, a, b, c);
    }

    long key() {
        return key(0, 0);
    }

    static QuadrupleFeature of(long key) {
        int t = FeatureKey.template(key) - 1;
        if (t < 0 || t >= ALL.length) throw new IllegalArgumentException("unknown quadruple feature template " + (t + 1));
        return ALL[t];
    }
}
