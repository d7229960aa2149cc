package dev.tether.spark;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Partitions for the thesaurus count: consecutive runs in order, non-empty, of about equal weight. */
class BalancedPartitionsTest {
    @Test
    void runsInOrderCoverEveryItemOnceAndShareTheWeight() {
        List<String> items = new ArrayList<>();
        for (int i = 0; i < 100; i++) items.add("doc-" + i);
        for (int n : new int[] {1, 3, 8, 100, 150}) {
            List<ArrayList<String>> parts = BalancedPartitions.inOrder(items, n, s -> 10);
            List<String> joined = new ArrayList<>();
            parts.forEach(joined::addAll);
            assertEquals(items, joined, "in order, each item once, for " + n);
            assertEquals(Math.min(n, items.size()), parts.size());
            for (ArrayList<String> p : parts) {
                assertFalse(p.isEmpty());
                // Equal weights: no run more than one item above its share.
                assertTrue(p.size() <= (items.size() + Math.min(n, items.size()) - 1) / Math.min(n, items.size()) + 1, p::toString);
            }
        }
    }

    @Test
    void aHeavyFirstItemGetsARunOfItsOwnAndTheRestStillGetOne() {
        List<String> items = List.of("big", "a", "b", "c", "d");
        List<ArrayList<String>> parts = BalancedPartitions.inOrder(items, 3, s -> s.equals("big") ? 1000 : 1);
        assertEquals(List.of(List.of("big"), List.of("a"), List.of("b", "c", "d")), parts);
    }
}
