package dev.tether.evaluation;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** The exact McNemar test (McNemar 1947) on worked examples. */
class PairedComparisonTest {
    private static PairedComparison of(int bothRight, int firstOnly, int secondOnly, int bothWrong) {
        PairedComparison c = new PairedComparison();
        for (int i = 0; i < bothRight; i++) c.add(true, true);
        for (int i = 0; i < firstOnly; i++) c.add(true, false);
        for (int i = 0; i < secondOnly; i++) c.add(false, true);
        for (int i = 0; i < bothWrong; i++) c.add(false, false);
        return c;
    }

    @Test
    void tenAgainstTwoDiscordantItems() {
        // 12 discordant items, 2 in the smaller cell: p = 2 * (C(12,0) + C(12,1) + C(12,2)) / 2^12 = 2 * 79 / 4096.
        PairedComparison c = of(50, 10, 2, 8);
        assertEquals(10, c.firstOnly());
        assertEquals(2, c.secondOnly());
        assertEquals(70, c.total());
        assertEquals(158.0 / 4096, c.pValue(), 1e-12);
    }

    @Test
    void anEvenSplitAndNoDiscordanceGiveOne() {
        assertEquals(1.0, of(5, 3, 3, 1).pValue(), 1e-12);
        assertEquals(1.0, of(5, 0, 0, 1).pValue(), 0.0);
    }
}
