package dev.tether.ranking;

import gnu.trove.map.hash.TLongIntHashMap;
import gnu.trove.map.hash.TLongLongHashMap;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;
import java.util.Arrays;

/**
 * The features a ranker knows: packed {@code long} feature keys (their meaning belongs to whoever extracts them)
 * interned to dense ids {@code 0..size-1}, in ascending key order, so the same key set always gets the same ids.
 * Built once at training from the keys seen, keeping those seen in at least a given number of decisions; a key
 * never seen at training has no id ({@link #ABSENT}) and contributes nothing at run time. Immutable.
 */
public final class FeatureSpace {
    public static final int ABSENT = -1;

    private final long[] keys;
    private final TLongIntHashMap ids;

    private FeatureSpace(long[] sortedKeys) {
        this.keys = sortedKeys;
        this.ids = new TLongIntHashMap(Math.max(16, keys.length * 2), 0.5f, Long.MIN_VALUE, ABSENT);
        for (int i = 0; i < keys.length; i++) ids.put(keys[i], i);
    }

    public static FeatureSpace of(long[] keys) {
        long[] sorted = keys.clone();
        Arrays.sort(sorted);
        for (int i = 1; i < sorted.length; i++) {
            if (sorted[i] == sorted[i - 1]) throw new IllegalArgumentException("feature key " + sorted[i] + " repeated");
        }
        return new FeatureSpace(sorted);
    }

    public int size() { return keys.length; }
    public long key(int id) { return keys[id]; }
    /** The id of {@code key}, or {@link #ABSENT}. */
    public int id(long key) { return ids.get(key); }

    /** Counts in how many decisions each feature key occurs, to keep those seen often enough. */
    public static final class Counter {
        private final TLongLongHashMap decisionsSeen = new TLongLongHashMap();
        private final TLongLongHashMap lastDecision = new TLongLongHashMap();
        private long decision;

        /** Starts counting the keys of the next decision. */
        public void nextDecision() { decision++; }

        public void see(long key) {
            if (lastDecision.get(key) == decision && lastDecision.containsKey(key)) return;
            lastDecision.put(key, decision);
            decisionsSeen.adjustOrPutValue(key, 1, 1);
        }

        /** Keys seen in at least {@code minimum(key)} decisions. */
        public FeatureSpace build(java.util.function.LongToIntFunction minimum) {
            long[] all = decisionsSeen.keys();
            int kept = 0;
            for (long k : all) if (decisionsSeen.get(k) >= minimum.applyAsInt(k)) all[kept++] = k;
            return of(Arrays.copyOf(all, kept));
        }
    }

    public void write(DataOutput out) throws IOException {
        out.writeInt(keys.length);
        for (long k : keys) out.writeLong(k);
    }

    public static FeatureSpace read(DataInput in) throws IOException {
        int n = in.readInt();
        if (n < 0 || n > 50_000_000) throw new IOException("implausible feature count " + n);
        long[] keys = new long[Math.min(n, 1 << 16)];
        for (int i = 0; i < n; i++) {
            if (i == keys.length) keys = Arrays.copyOf(keys, Math.min(n, 2 * keys.length));
            keys[i] = in.readLong();
            if (i > 0 && keys[i] <= keys[i - 1]) throw new IOException("feature keys out of order at " + i);
        }
        return new FeatureSpace(keys);
    }

    @Override public boolean equals(Object o) {
        return o instanceof FeatureSpace && Arrays.equals(keys, ((FeatureSpace) o).keys);
    }
    @Override public int hashCode() { return Arrays.hashCode(keys); }
}
