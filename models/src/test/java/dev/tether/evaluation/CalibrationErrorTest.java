package dev.tether.evaluation;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * Expected calibration error over equal-width bins as defined by Naeini, Cooper &amp; Hauskrecht (2015) and Guo et al.
 * (2017, eq. 3, bins {@code ((m-1)/M, m/M]}), checked on an example worked by hand.
 */
class CalibrationErrorTest {
    @Test
    void workedExampleOfTenDecisions() {
        // Worked by hand, 10 bins:
        //   4 decisions at 0.95, 3 right: bin (0.9, 1.0], accuracy 0.75, confidence 0.95, gap 0.20, weight 0.4 -> 0.08
        //   4 decisions at 0.55, 2 right: bin (0.5, 0.6], accuracy 0.50, confidence 0.55, gap 0.05, weight 0.4 -> 0.02
        //   2 decisions at 0.25, 1 right: bin (0.2, 0.3], accuracy 0.50, confidence 0.25, gap 0.25, weight 0.2 -> 0.05
        //   ECE = 0.08 + 0.02 + 0.05 = 0.15
        CalibrationError c = new CalibrationError();
        for (int i = 0; i < 4; i++) c.add(0.95, i < 3);
        for (int i = 0; i < 4; i++) c.add(0.55, i < 2);
        for (int i = 0; i < 2; i++) c.add(0.25, i < 1);

        assertEquals(10, c.bins());
        assertEquals(10, c.total());
        assertEquals(4, c.count(9));
        assertEquals(3, c.correct(9));
        assertEquals(0.75, c.accuracy(9), 1e-12);
        assertEquals(0.95, c.confidence(9), 1e-12);
        assertEquals(4, c.count(5));
        assertEquals(2, c.count(2));
        assertEquals(0, c.count(0));
        assertEquals(0, c.accuracy(0));
        assertEquals(0.15, c.ece(), 1e-12);
    }

    @Test
    void binsAreClosedOnTheRightAndZeroFallsInTheFirst() {
        CalibrationError c = new CalibrationError(10);
        assertEquals(0, c.bin(0.0));
        assertEquals(0, c.bin(0.1));
        assertEquals(1, c.bin(0.1000001));
        assertEquals(4, c.bin(0.5));
        assertEquals(9, c.bin(0.95));
        assertEquals(9, c.bin(1.0));
        assertEquals(0.4, c.lowerEdge(4), 1e-12);
        assertEquals(0.5, c.upperEdge(4), 1e-12);
    }

    @Test
    void statedProbabilitiesThatMatchTheAccuracyHaveNoError() {
        CalibrationError c = new CalibrationError();
        for (int i = 0; i < 5; i++) c.add(0.8, i < 4);
        for (int i = 0; i < 10; i++) c.add(0.3, i < 3);
        assertEquals(0, c.ece(), 1e-12);
        assertEquals(0, new CalibrationError().ece(), "nothing counted");
    }

    @Test
    void aProbabilityOutsideTheUnitIntervalIsRefused() {
        CalibrationError c = new CalibrationError();
        assertThrows(IllegalArgumentException.class, () -> c.add(1.5, true));
        assertThrows(IllegalArgumentException.class, () -> c.add(Double.NaN, true));
        assertThrows(IllegalArgumentException.class, () -> new CalibrationError(0));
    }
}
