package dev.tether.counts;

import dev.tether.vocabulary.Vocabulary;

/**
 * Packs up to three word ids of {@value Vocabulary#ID_BITS} bits each into one {@code long}, so that count tables
 * are keyed by primitives and never by concatenated strings.
 */
public final class TupleKey {
    private static final int BITS = Vocabulary.ID_BITS;
    private static final long MASK = (1L << BITS) - 1;

    private TupleKey() {
    }

    public static long of(int a) {
        return a & MASK;
    }

    public static long of(int a, int b) {
        return ((a & MASK) << BITS) | (b & MASK);
    }

    public static long of(int a, int b, int c) {
        return ((a & MASK) << (2 * BITS)) | ((b & MASK) << BITS) | (c & MASK);
    }

    /** The id at {@code position} (0 = first) of a key made from {@code arity} ids. */
    public static int part(long key, int arity, int position) {
        return (int) ((key >>> ((arity - 1 - position) * BITS)) & MASK);
    }
}
