package dev.tether.counts;

import gnu.trove.map.hash.TLongIntHashMap;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;

/**
 * An immutable count table: for each packed key, how often the tuple was seen ({@code trials}) and how often with
 * the outcome counted ({@code hits}; for the quadruple model, attachment to the noun). Lookup is one primitive hash
 * probe to a slot, then two array reads. Keys are stored in ascending order, which makes the serialized form
 * independent of hash-table history.
 */
public final class TupleCounts {
    private static final int ABSENT = -1;
    private final TLongIntHashMap slots;
    private final long[] keys;
    private final double[] hits;
    private final double[] trials;

    TupleCounts(long[] keys, double[] hits, double[] trials) {
        this.keys = keys;
        this.hits = hits;
        this.trials = trials;
        this.slots = new TLongIntHashMap(Math.max(16, keys.length * 2), 0.5f, Long.MIN_VALUE, ABSENT);
        for (int i = 0; i < keys.length; i++) slots.put(keys[i], i);
    }

    public static TupleCounts empty() {
        return new TupleCounts(new long[0], new double[0], new double[0]);
    }

    /** The slot of {@code key}, or -1 when the tuple was never seen. */
    public int slot(long key) {
        return slots.get(key);
    }

    public double hits(int slot) {
        return hits[slot];
    }

    public double trials(int slot) {
        return trials[slot];
    }

    /** Trials of {@code key}, 0 when unseen. */
    public double trialsOf(long key) {
        int s = slots.get(key);
        return s < 0 ? 0 : trials[s];
    }

    /** Hits of {@code key}, 0 when unseen. */
    public double hitsOf(long key) {
        int s = slots.get(key);
        return s < 0 ? 0 : hits[s];
    }

    /** Number of distinct tuples. */
    public int size() {
        return keys.length;
    }

    public long key(int slot) {
        return keys[slot];
    }

    /** Sum of all trials. */
    public double totalTrials() {
        double t = 0;
        for (double x : trials) t += x;
        return t;
    }

    /** Rough heap footprint in bytes: the arrays plus the hash table's own two arrays. */
    public long approximateBytes() {
        return (long) keys.length * (8 + 8 + 8) + (long) slots.capacity() * (8 + 4 + 1);
    }

    public void write(DataOutput out) throws IOException {
        out.writeInt(keys.length);
        long previous = 0;
        for (long k : keys) {
            out.writeLong(k - previous);
            previous = k;
        }
        for (double h : hits) out.writeDouble(h);
        for (double t : trials) out.writeDouble(t);
    }

    public static TupleCounts read(DataInput in) throws IOException {
        int n = in.readInt();
        if (n < 0) throw new IOException("negative table size " + n);
        long[] keys = new long[n];
        long previous = 0;
        for (int i = 0; i < n; i++) {
            previous += in.readLong();
            keys[i] = previous;
        }
        double[] hits = new double[n];
        double[] trials = new double[n];
        for (int i = 0; i < n; i++) hits[i] = in.readDouble();
        for (int i = 0; i < n; i++) trials[i] = in.readDouble();
        return new TupleCounts(keys, hits, trials);
    }
}
