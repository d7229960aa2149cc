package dev.tether.ranking;

import java.util.Arrays;

/**
 * A reusable buffer for the features of one decision's candidates: for each candidate a run of packed feature keys
 * ({@link FeatureKey}) with their values. Filled by a feature extractor, read by {@link RankerModel}. One buffer
 * per thread; {@link #reset} makes it ready for the next decision without allocating.
 */
public final class CandidateFeatures {
    private long[] keys = new long[256];
    private double[] values = new double[256];
    private int[] start = new int[17];
    private int candidates;
    private int size;

    /** Starts a decision. */
    public void reset() {
        candidates = 0;
        size = 0;
    }

    /** Opens the next candidate; features added after this belong to it. */
    public void nextCandidate() {
        if (candidates + 1 >= start.length) start = Arrays.copyOf(start, 2 * start.length);
        start[candidates++] = size;
        start[candidates] = size;
    }

    public void add(long key, double value) {
        if (candidates == 0) throw new IllegalStateException("add before nextCandidate");
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("feature template " + FeatureKey.template(key) + " has the value " + value
                    + "; feature values must be finite");
        }
        if (size == keys.length) {
            keys = Arrays.copyOf(keys, 2 * size);
            values = Arrays.copyOf(values, 2 * size);
        }
        keys[size] = key;
        values[size++] = value;
        start[candidates] = size;
    }

    public int candidates() { return candidates; }
    public int from(int candidate) { return start[candidate]; }
    public int to(int candidate) { return start[candidate + 1]; }
    public long key(int entry) { return keys[entry]; }
    public double value(int entry) { return values[entry]; }

    /** The value of {@code key} for {@code candidate} (0 when absent; repeated keys add up). */
    public double valueOf(int candidate, long key) {
        double v = 0;
        for (int e = from(candidate); e < to(candidate); e++) if (keys[e] == key) v += values[e];
        return v;
    }
}
