package dev.tether.attachment;

/** What a quadruple decision rested on: a back-off level, a lexical-association score, or a baseline rule. */
public enum DecisionBasis {
    /** The whole (v, n1, p, n2) was seen in training. */
    QUADRUPLE,
    /** The three triples that contain the preposition. */
    TRIPLES,
    /** The three pairs that contain the preposition. */
    PAIRS,
    /** The preposition alone. */
    PREPOSITION,
    /** Nothing was seen: the default (attach to the noun). */
    DEFAULT,
    /** Hindle &amp; Rooth (1993) lexical association. */
    LEXICAL_ASSOCIATION,
    /** A baseline rule. */
    BASELINE,
    /** Whole quadruples with one word replaced by a distributional neighbour ({@link SimilarityBackedOffScorer}). */
    SIMILAR_QUADRUPLES,
    /** The triples, pooled with triples in which one word is replaced by a distributional neighbour. */
    SIMILAR_TRIPLES;

    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
