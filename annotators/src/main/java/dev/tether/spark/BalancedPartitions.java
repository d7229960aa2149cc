package dev.tether.spark;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.PriorityQueue;
import java.util.function.ToLongFunction;

/**
 * Splits documents into partitions of about equal size in bytes: largest first, each to the partition with the fewest
 * bytes so far (longest-processing-time-first scheduling, common practice), so that no task slot waits on one
 * partition that drew the long documents. Within a partition the documents keep their order. Which document lands in
 * which partition does not change any result: annotation outcomes are recorded in document order and counts merge in
 * any order.
 */
final class BalancedPartitions {
    private BalancedPartitions() {
    }

    /** {@code items} in at most {@code partitions} non-empty lists; {@code size} gives each item's weight. */
    static <T extends Serializable> List<ArrayList<T>> of(List<T> items, int partitions, ToLongFunction<T> size) {
        int n = Math.max(1, Math.min(partitions, items.size()));
        long[] sizes = new long[items.size()];
        List<Integer> order = new ArrayList<>(items.size());
        for (int i = 0; i < items.size(); i++) {
            sizes[i] = Math.max(1, size.applyAsLong(items.get(i)));
            order.add(i);
        }
        order.sort(Comparator.comparingLong((Integer i) -> -sizes[i]).thenComparingInt(i -> i));
        long[] load = new long[n];
        List<List<Integer>> members = new ArrayList<>();
        for (int k = 0; k < n; k++) members.add(new ArrayList<>());
        PriorityQueue<Integer> lightest = new PriorityQueue<>(Comparator.comparingLong((Integer k) -> load[k]).thenComparingInt(k -> k));
        for (int k = 0; k < n; k++) lightest.add(k);
        for (int i : order) {
            int k = lightest.poll();
            members.get(k).add(i);
            load[k] += sizes[i];
            lightest.add(k);
        }
        List<ArrayList<T>> result = new ArrayList<>();
        for (List<Integer> m : members) {
            if (m.isEmpty()) continue;
            m.sort(null);
            ArrayList<T> part = new ArrayList<>(m.size());
            for (int i : m) part.add(items.get(i));
            result.add(part);
        }
        return result;
    }

    /**
     * {@code items} cut into at most {@code partitions} consecutive, non-empty runs of about equal weight, in order: the
     * first run holds the first items. For counts whose ids follow the order of the text (a thesaurus's context
     * counts), which must be merged in that order.
     */
    static <T extends Serializable> List<ArrayList<T>> inOrder(List<T> items, int partitions, ToLongFunction<T> size) {
        int n = Math.max(1, Math.min(partitions, items.size()));
        long total = 0;
        long[] sizes = new long[items.size()];
        for (int i = 0; i < items.size(); i++) total += sizes[i] = Math.max(1, size.applyAsLong(items.get(i)));
        List<ArrayList<T>> result = new ArrayList<>();
        ArrayList<T> part = new ArrayList<>();
        long done = 0;
        for (int i = 0; i < items.size(); i++) {
            part.add(items.get(i));
            done += sizes[i];
            int left = items.size() - i - 1;
            // Close this run once it reaches its share of the weight, keeping one item for each run still to come.
            boolean share = done * n >= total * (result.size() + 1);
            if (left > 0 && result.size() < n - 1 && (share || left == n - 1 - result.size())) {
                result.add(part);
                part = new ArrayList<>();
            }
        }
        if (!part.isEmpty()) result.add(part);
        return result;
    }
}
