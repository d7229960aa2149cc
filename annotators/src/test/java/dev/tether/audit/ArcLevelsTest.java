package dev.tether.audit;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

/** Stacking arcs: the greedy interval colouring, narrowest first (common practice for arc diagrams). */
class ArcLevelsTest {
    @Test
    void disjointArcsShareTheLowestLevelAndNestedOnesStack() {
        // [0,10] and [20,30] are apart; [0,30] spans both; [5,25] crosses into both.
        int[] level = ArcLevels.assign(new double[] {0, 20, 0, 5}, new double[] {10, 30, 30, 25});
        assertArrayEquals(new int[] {0, 0, 2, 1}, level);
    }

    @Test
    void arcsThatTouchAtAPointGoOnDifferentLevels() {
        int[] level = ArcLevels.assign(new double[] {0, 10}, new double[] {10, 20});
        assertNotEquals(level[0], level[1]);
    }

    @Test
    void theSameArcsGiveTheSameLevelsWhateverTheirOrder() {
        int[] a = ArcLevels.assign(new double[] {0, 3, 8}, new double[] {5, 9, 12});
        int[] b = ArcLevels.assign(new double[] {8, 3, 0}, new double[] {12, 9, 5});
        assertArrayEquals(new int[] {a[2], a[1], a[0]}, b);
    }
}
