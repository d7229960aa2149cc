package dev.tether.similarity;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The three measures on one worked pair: a = {c0: 1, c1: 2}, b = {c1: 3, c2: 4}. By hand:
 * cosine = 2·3 / (√5 · 5) = 0.53666; Lin (1998) = (2 + 3) / (3 + 7) = 0.5; weighted Jaccard =
 * min(2,3) / (max(1,0) + max(2,3) + max(0,4)) = 2 / 8 = 0.25.
 */
class SimilarityMeasureTest {
    private static final ContextVectors VECTORS = new ContextVectors(
            new int[] {0, 2, 4, 5}, new int[] {0, 1, 1, 2, 0}, new float[] {1, 2, 3, 4, 7}, 3);

    @Test
    void cosine() {
        assertEquals(6 / (Math.sqrt(5) * 5), VECTORS.similarity(SimilarityMeasure.COSINE, 0, 1), 1e-12);
        assertEquals(0.53666, VECTORS.similarity(SimilarityMeasure.COSINE, 0, 1), 1e-5);
    }

    @Test
    void lin() {
        assertEquals(0.5, VECTORS.similarity(SimilarityMeasure.LIN, 0, 1), 1e-12);
    }

    @Test
    void weightedJaccard() {
        assertEquals(0.25, VECTORS.similarity(SimilarityMeasure.WEIGHTED_JACCARD, 0, 1), 1e-12);
    }

    @Test
    void identicalDirectionsScoreOneAndDisjointVectorsZero() {
        // Word 2 = {c0: 7}: it shares nothing with b; with a it shares c0 only.
        for (SimilarityMeasure m : SimilarityMeasure.values()) {
            assertEquals(1.0, VECTORS.similarity(m, 0, 0), 1e-12, m.label());
            assertEquals(0.0, VECTORS.similarity(m, 1, 2), m.label());
            assertEquals(VECTORS.similarity(m, 0, 1), VECTORS.similarity(m, 1, 0), m.label() + " is symmetric");
        }
    }
}
