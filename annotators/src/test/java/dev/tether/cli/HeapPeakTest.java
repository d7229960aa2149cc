package dev.tether.cli;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class HeapPeakTest {
    private static final int HELD = 64 << 20;

    @Test
    void seesWhatTheHeapHoldsAcrossACollectionAndNeverMoreThanTheHeapCanHold() throws InterruptedException {
        try (HeapPeak peak = HeapPeak.start()) {
            byte[] held = new byte[HELD];
            held[HELD - 1] = 1;
            System.gc();
            // The collector reports on a thread of its own, shortly after the collection.
            for (int i = 0; i < 200 && peak.peakAfterCollectionBytes() < HELD; i++) Thread.sleep(50);
            assertTrue(peak.peakAfterCollectionBytes() >= HELD,
                    () -> "64 MB held through a collection, seen after it: " + peak.peakAfterCollectionBytes());
            assertTrue(peak.peakBytes() >= peak.peakAfterCollectionBytes());
            // A sum of each pool's own peak can exceed the heap's maximum; a sum at one instant cannot.
            assertTrue(peak.peakBytes() <= Runtime.getRuntime().maxMemory(),
                    () -> peak.peakBytes() + " bytes is more than the heap's maximum " + Runtime.getRuntime().maxMemory());
            assertEquals(1, held[HELD - 1]);
        }
    }
}
