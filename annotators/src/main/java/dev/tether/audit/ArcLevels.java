package dev.tether.audit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

/**
 * Stacks arcs so that no two on the same level share any horizontal stretch: narrower arcs go lower, and each takes
 * the lowest level where its extent (closed interval, in pixels) meets no other. Arcs on different levels may cross,
 * but never run along each other.
 */
final class ArcLevels {
    private ArcLevels() {
    }

    /** The level (0 = nearest the text) of each extent {@code [left[i], right[i]]}. */
    static int[] assign(double[] left, double[] right) {
        int n = left.length;
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) order[i] = i;
        Arrays.sort(order, Comparator.<Integer>comparingDouble(i -> right[i] - left[i]).thenComparingDouble(i -> left[i])
                .thenComparingInt(i -> i));
        int[] level = new int[n];
        List<List<Integer>> taken = new ArrayList<>();
        for (int i : order) {
            int l = 0;
            while (l < taken.size() && meetsAny(taken.get(l), i, left, right)) l++;
            if (l == taken.size()) taken.add(new ArrayList<>());
            taken.get(l).add(i);
            level[i] = l;
        }
        return level;
    }

    private static boolean meetsAny(List<Integer> onLevel, int i, double[] left, double[] right) {
        for (int j : onLevel) {
            if (left[i] <= right[j] && left[j] <= right[i]) return true;
        }
        return false;
    }
}
