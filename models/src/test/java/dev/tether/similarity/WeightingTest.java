package dev.tether.similarity;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * Each weighting on one worked cell: the word occurs 4 times, the context 5 times, together 2 times, in a table of
 * 20 (so P(w,c) = 0.1, P(w) = 0.2, P(c) = 0.25); a second context of total 15 makes the smoothed context total
 * 5^0.75 + 15^0.75. Values worked out by hand from the published definitions named in {@link Weighting}.
 */
class WeightingTest {
    private static final double SMOOTHED_C = Math.pow(5, 0.75);
    private static final double SMOOTHED_TOTAL = Math.pow(5, 0.75) + Math.pow(15, 0.75);

    private static double weigh(Weighting w, double fwc, double fw, double fc, double n) {
        return w.weight(fwc, fw, fc, n, Math.pow(fc, 0.75), SMOOTHED_TOTAL);
    }

    @Test
    void relativeFrequencyIsTheShareOfTheContextsTotal() {
        assertEquals(0.4, weigh(Weighting.RELATIVE, 2, 4, 5, 20), 1e-12); // 2 / 5
    }

    @Test
    void ppmiIsTheLogOfObservedOverExpected() {
        assertEquals(Math.log(2), weigh(Weighting.PPMI, 2, 4, 5, 20), 1e-12); // 0.1 / (0.2 * 0.25) = 2
        assertEquals(0.6931, weigh(Weighting.PPMI, 2, 4, 5, 20), 1e-4);
    }

    @Test
    void smoothedPpmiRaisesTheContextProbability() {
        // P_0.75(c) = 3.3437 / 10.9657 = 0.30492; log(0.1 / (0.2 * 0.30492)) = 0.4945
        assertEquals(0.4945, Weighting.PPMI_SMOOTHED.weight(2, 4, 5, 20, SMOOTHED_C, SMOOTHED_TOTAL), 1e-4);
        assertEquals(true, Weighting.PPMI_SMOOTHED.weight(2, 4, 5, 20, SMOOTHED_C, SMOOTHED_TOTAL)
                < weigh(Weighting.PPMI, 2, 4, 5, 20), "a rare context is discounted");
    }

    @Test
    void tTestIsTheDifferenceOverTheRootOfTheExpectedProbability() {
        assertEquals(0.05 / Math.sqrt(0.05), weigh(Weighting.TTEST, 2, 4, 5, 20), 1e-12); // (0.1 - 0.05) / sqrt(0.05)
        assertEquals(0.2236, weigh(Weighting.TTEST, 2, 4, 5, 20), 1e-4);
    }

    @Test
    void negativeAssociationIsClippedToZero() {
        // Together once in 20 while each occurs 10 times: expected 5, observed 1.
        assertEquals(0, weigh(Weighting.PPMI, 1, 10, 10, 20));
        assertEquals(0, weigh(Weighting.TTEST, 1, 10, 10, 20));
        assertEquals(0, Weighting.PPMI_SMOOTHED.weight(1, 10, 10, 20, Math.pow(10, 0.75), Math.pow(10, 0.75)));
    }

    @Test
    void aFrequentContextWeighsLessThanARareOneWithTheSameJointCount() {
        for (Weighting w : Weighting.values()) {
            double rare = weigh(w, 2, 4, 5, 1000);
            double frequent = weigh(w, 2, 4, 500, 1000);
            assertEquals(true, frequent < rare, w + ": " + frequent + " vs " + rare);
        }
    }

    @Test
    void labelsNameTheWeightings() {
        for (Weighting w : Weighting.values()) assertEquals(w, Weighting.of(w.label()));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Weighting.of("tfidf"));
        assertEquals("unknown weighting 'tfidf'; choose one of relative, ppmi, ppmi-smoothed, ttest", e.getMessage());
    }
}
