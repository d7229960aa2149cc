package dev.tether.evaluation;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The paired bootstrap over sentences (Efron &amp; Tibshirani 1993) against the normal approximation of the standard
 * error of a mean of paired differences (common practice), for independent items and for items that move together
 * within their sentence.
 */
class PairedBootstrapTest {
    /** {@code sentences} sentences of {@code perSentence} items each; the outcome is the same for a sentence's items. */
    private static SentenceOutcomes[] pair(int sentences, int perSentence, int firstOnly, int secondOnly, int bothRight) {
        SentenceOutcomes first = new SentenceOutcomes();
        SentenceOutcomes second = new SentenceOutcomes();
        for (int s = 0; s < sentences; s++) {
            boolean f = s < firstOnly || (s >= firstOnly + secondOnly && s < firstOnly + secondOnly + bothRight);
            boolean g = (s >= firstOnly && s < firstOnly + secondOnly) || (s >= firstOnly + secondOnly && s < firstOnly + secondOnly + bothRight);
            first.startSentence();
            second.startSentence();
            for (int i = 0; i < perSentence; i++) {
                first.add(f);
                second.add(g);
            }
        }
        return new SentenceOutcomes[] {first, second};
    }

    /** Half-width of the normal 95% interval of the mean difference, with {@code n} independent units. */
    private static double normalHalfWidth(int n, int firstOnly, int secondOnly) {
        double gain = (double) (secondOnly - firstOnly) / n;
        double variance = (double) (firstOnly + secondOnly) / n - gain * gain;
        return 1.959964 * Math.sqrt(variance / n);
    }

    @Test
    void independentItemsMatchTheNormalApproximation() {
        SentenceOutcomes[] p = pair(400, 1, 40, 60, 200);
        PairedBootstrap.Interval ci = new PairedBootstrap(1000, 7).gain(p[0], p[1], 0.95);
        assertEquals(0.05, ci.observed(), 1e-12);
        double half = normalHalfWidth(400, 40, 60);
        assertEquals(half, (ci.high() - ci.low()) / 2, 0.15 * half);
        assertTrue(ci.low() < ci.observed() && ci.observed() < ci.high());
    }

    @Test
    void itemsThatMoveWithTheirSentenceWidenTheIntervalAsFewerUnitsWould() {
        // 100 sentences of 4 items each, all four alike: 100 independent units, not 400, so the interval is that of
        // 100 units (twice as wide as 400 independent items would give).
        SentenceOutcomes[] p = pair(100, 4, 10, 15, 50);
        PairedBootstrap.Interval ci = new PairedBootstrap(1000, 11).gain(p[0], p[1], 0.95);
        double half = normalHalfWidth(100, 10, 15);
        assertEquals(half, (ci.high() - ci.low()) / 2, 0.15 * half);
        assertTrue((ci.high() - ci.low()) / 2 > 1.5 * normalHalfWidth(400, 40, 60));
    }

    @Test
    void identicalOutcomesGiveNoGainAndAZeroInterval() {
        SentenceOutcomes[] p = pair(50, 3, 0, 0, 30);
        PairedBootstrap.Interval ci = new PairedBootstrap(200, 1).gain(p[0], p[1], 0.95);
        assertEquals(0, ci.observed(), 0);
        assertEquals(0, ci.low(), 0);
        assertEquals(0, ci.high(), 0);
    }

    @Test
    void theSameSeedDrawsTheSameResamples() {
        SentenceOutcomes[] p = pair(120, 2, 20, 30, 40);
        double[] once = new PairedBootstrap(300, 5).resampledGains(p[0], p[1]);
        assertArrayEquals(once, new PairedBootstrap(300, 5).resampledGains(p[0], p[1]), 0);
        assertFalse(java.util.Arrays.equals(once, new PairedBootstrap(300, 6).resampledGains(p[0], p[1])));
    }

    @Test
    void percentileBoundsAreTheOrderStatistics() {
        double[] values = new double[1000];
        for (int i = 0; i < values.length; i++) values[i] = values.length - i;   // 1000 down to 1
        assertArrayEquals(new double[] {26, 975}, PairedBootstrap.percentileBounds(values, 0.95), 0);
    }

    @Test
    void outcomesOfDifferentSentencesAreRefused() {
        SentenceOutcomes[] p = pair(10, 2, 1, 1, 5);
        SentenceOutcomes[] q = pair(10, 1, 1, 1, 5);
        assertThrows(IllegalArgumentException.class, () -> new PairedBootstrap(10, 1).gain(p[0], q[1], 0.95));
    }

    @Test
    void sentenceOutcomesCountBySentence() {
        SentenceOutcomes o = new SentenceOutcomes();
        assertThrows(IllegalStateException.class, () -> o.add(true));
        o.startSentence();
        o.add(true);
        o.add(false);
        o.startSentence();                 // a sentence without items
        o.startSentence();
        o.add(true);
        assertEquals(3, o.sentences());
        assertEquals(3, o.items());
        assertEquals(2, o.itemsIn(0));
        assertEquals(1, o.rightIn(0));
        assertEquals(0, o.itemsIn(1));
        assertEquals(0, o.rightIn(1));
        assertEquals(1, o.rightIn(2));
        assertTrue(o.right(2));
        assertFalse(o.right(1));
        assertEquals(2.0 / 3, o.accuracy(), 1e-12);
    }
}
