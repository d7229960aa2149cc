package dev.tether.evaluation;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Accuracy with its 95% Wilson score interval. Reference values: Newcombe (1998), "Two-sided confidence intervals
 * for the single proportion: comparison of seven methods", Statistics in Medicine 17:857-872, Table I, the score
 * method without continuity correction, to four decimals. These figures are recalled from memory; each was checked
 * by hand with the closed form  (p + z²/2n ± z·sqrt(p(1-p)/n + z²/4n²)) / (1 + z²/n),  z = 1.959964.
 */
class AccuracyTest {
    @Test
    void wilsonIntervalMatchesPublishedExamples() {
        assertInterval(81, 263, 0.2553, 0.3662);
        assertInterval(15, 148, 0.0624, 0.1605);
        assertInterval(0, 20, 0.0000, 0.1611);
        assertInterval(1, 29, 0.0061, 0.1718);
    }

    @Test
    void countsAndValue() {
        Accuracy a = new Accuracy();
        for (int i = 0; i < 10; i++) a.add(i < 8);
        assertEquals(8, a.correct());
        assertEquals(10, a.total());
        assertEquals(0.8, a.value(), 1e-15);
        // 8 of 10 by the closed form above (worked by hand): 0.4902 to 0.9433.
        assertArrayEquals(new double[] {0.4902, 0.9433}, a.interval95(), 5e-5);
    }

    @Test
    void nothingCountedGivesZeros() {
        Accuracy a = new Accuracy();
        assertEquals(0, a.value());
        assertArrayEquals(new double[] {0, 0}, a.interval95());
    }

    private static void assertInterval(int correct, int total, double lower, double upper) {
        Accuracy a = new Accuracy();
        for (int i = 0; i < total; i++) a.add(i < correct);
        assertArrayEquals(new double[] {lower, upper}, a.interval95(), 5e-5, correct + " of " + total);
    }
}
