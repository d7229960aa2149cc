package dev.tether.counts;

import gnu.trove.map.hash.TLongIntHashMap;

import java.util.Arrays;
import java.util.function.LongUnaryOperator;

/** Accumulates counts for a {@link TupleCounts}. Adding is commutative and associative, so shards can be counted apart and added. */
public final class TupleCountsBuilder {
    // Small at first: a model keeps several tables per preposition, and raw text brings hundreds of rare ones.
    private final TLongIntHashMap slots = new TLongIntHashMap(16, 0.5f, Long.MIN_VALUE, -1);
    private long[] keys = new long[16];
    private double[] hits = new double[16];
    private double[] trials = new double[16];
    private int size;

    public void add(long key, double hit, double trial) {
        int s = slots.get(key);
        if (s < 0) {
            if (size == keys.length) grow();
            s = size++;
            slots.put(key, s);
            keys[s] = key;
        }
        hits[s] += hit;
        trials[s] += trial;
    }

    /** Adds every entry of {@code other}, with its keys rewritten by {@code keyMap} (for a different vocabulary). */
    public void addAll(TupleCounts other, LongUnaryOperator keyMap) {
        for (int i = 0; i < other.size(); i++) add(keyMap.applyAsLong(other.key(i)), other.hitsAt(i), other.trialsAt(i));
    }

    /** Adds every entry of {@code other} times {@code scale}, keys rewritten by {@code keyMap}. */
    public void addAll(TupleCounts other, LongUnaryOperator keyMap, double scale) {
        if (scale == 1.0) {
            addAll(other, keyMap);
            return;
        }
        for (int i = 0; i < other.size(); i++) {
            add(keyMap.applyAsLong(other.key(i)), other.hitsAt(i) * scale, other.trialsAt(i) * scale);
        }
    }

    public int size() {
        return size;
    }

    private void grow() {
        int n = keys.length * 2;
        keys = Arrays.copyOf(keys, n);
        hits = Arrays.copyOf(hits, n);
        trials = Arrays.copyOf(trials, n);
    }

    /** The immutable table, keys in ascending order. */
    public TupleCounts build() {
        long[] k = Arrays.copyOf(keys, size);
        Arrays.sort(k);
        long[] packed = new long[size];
        for (int i = 0; i < size; i++) {
            int s = slots.get(k[i]);
            packed[i] = TupleCounts.pack(hits[s], trials[s]);
        }
        return new TupleCounts(k, packed);
    }
}
