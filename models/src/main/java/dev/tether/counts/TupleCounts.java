package dev.tether.counts;

import gnu.trove.map.hash.TLongLongHashMap;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;
import java.util.Arrays;

/**
 * An immutable count table: for each packed key, how often the tuple was seen ({@code trials}) and how often with
 * the outcome counted ({@code hits}; for the quadruple model, attachment to the noun). Both counts of a key travel
 * together as one {@code long} entry (two {@code float}s, exact for whole counts below 2^24), so a lookup is one
 * primitive hash probe and nothing else: {@link #find} gives the entry, {@link #hitsIn} and {@link #trialsIn} read
 * it. Keys are also kept in ascending order for iteration and for a serialized form that does not depend on
 * hash-table history.
 */
public final class TupleCounts {
    /** What {@link #find} returns for a tuple never seen; no pair of non-negative counts packs to it. */
    public static final long ABSENT = -1L;

    private final TLongLongHashMap entries;
    private final long[] keys;
    private final long[] packed;

    TupleCounts(long[] keys, long[] packed) {
        this.keys = keys;
        this.packed = packed;
        this.entries = new TLongLongHashMap(Math.max(16, keys.length * 2), 0.5f, Long.MIN_VALUE, ABSENT);
        for (int i = 0; i < keys.length; i++) entries.put(keys[i], packed[i]);
    }

    public static TupleCounts empty() {
        return new TupleCounts(new long[0], new long[0]);
    }

    /** The two counts of one tuple in one entry. */
    static long pack(double hits, double trials) {
        return ((long) Float.floatToIntBits((float) hits) << 32) | (Float.floatToIntBits((float) trials) & 0xFFFFFFFFL);
    }

    /** The entry of {@code key}, or {@link #ABSENT} when the tuple was never seen. */
    public long find(long key) {
        return entries.get(key);
    }

    /** Hits of an entry returned by {@link #find} (not {@link #ABSENT}). */
    public static double hitsIn(long entry) {
        return Float.intBitsToFloat((int) (entry >>> 32));
    }

    /** Trials of an entry returned by {@link #find} (not {@link #ABSENT}). */
    public static double trialsIn(long entry) {
        return Float.intBitsToFloat((int) entry);
    }

    /** Trials of {@code key}, 0 when unseen. */
    public double trialsOf(long key) {
        long e = entries.get(key);
        return e == ABSENT ? 0 : trialsIn(e);
    }

    /** Hits of {@code key}, 0 when unseen. */
    public double hitsOf(long key) {
        long e = entries.get(key);
        return e == ABSENT ? 0 : hitsIn(e);
    }

    /** Number of distinct tuples. */
    public int size() {
        return keys.length;
    }

    /** The {@code i}-th key in ascending order. */
    public long key(int i) {
        return keys[i];
    }

    public double hitsAt(int i) {
        return hitsIn(packed[i]);
    }

    public double trialsAt(int i) {
        return trialsIn(packed[i]);
    }

    /** Rough heap footprint in bytes: the sorted arrays plus the hash table's keys, values and states. */
    public long approximateBytes() {
        return (long) keys.length * 16 + (long) entries.capacity() * (8 + 8 + 1);
    }

    public void write(DataOutput out) throws IOException {
        out.writeInt(keys.length);
        long previous = 0;
        for (long k : keys) {
            out.writeLong(k - previous);
            previous = k;
        }
        for (long e : packed) out.writeLong(e);
    }

    public static TupleCounts read(DataInput in) throws IOException {
        int n = in.readInt();
        if (n < 0) throw new IOException("negative table size " + n);
        // Grow while reading rather than trusting n up front: a damaged size must not ask for gigabytes.
        long[] keys = new long[Math.min(n, 1 << 16)];
        long previous = 0;
        for (int i = 0; i < n; i++) {
            if (i == keys.length) keys = Arrays.copyOf(keys, (int) Math.min(n, 2L * i));
            long delta = in.readLong();
            if ((i > 0 && delta <= 0) || previous + delta < 0) {
                throw new IOException("table key " + i + " is out of order or repeated");
            }
            previous += delta;
            keys[i] = previous;
        }
        long[] packed = new long[n];
        for (int i = 0; i < n; i++) {
            packed[i] = in.readLong();
            double hits = hitsIn(packed[i]);
            double trials = trialsIn(packed[i]);
            // Written so that NaN fails too.
            if (packed[i] == ABSENT || !(hits >= 0) || !(trials >= hits) || Double.isInfinite(trials)) {
                throw new IOException("count entry " + i + " is not a pair of counts");
            }
        }
        return new TupleCounts(keys, packed);
    }
}
