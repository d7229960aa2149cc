package dev.tether.counts;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;
import java.util.Map;
import java.util.TreeMap;

/**
 * The structures ({@link StructureKey}) of the verb and the noun candidate of each ambiguous verb–noun–preposition–noun
 * configuration of unlabelled text, counted per preposition: what re-estimation needs to give the structural rates
 * their share of the ambiguous prepositions, which otherwise teach the structural table only trials (only an
 * unambiguous preposition has a known head), so that a verb with a noun between it and the preposition would look as
 * if it were never the head. Prepositions in sorted order and pairs in key order, so the same text gives the same
 * table however it was sharded. Immutable; see {@link Builder}.
 */
public final class AmbiguousStructures {
    private final String[] prepositions;
    /** Per preposition: pair key ({@link #pairKey}) to the number of configurations with that pair, as trials. */
    private final TupleCounts[] pairs;

    private AmbiguousStructures(String[] prepositions, TupleCounts[] pairs) {
        this.prepositions = prepositions;
        this.pairs = pairs;
    }

    /** Number of prepositions with ambiguous configurations. */
    public int size() {
        return prepositions.length;
    }

    /** The normalized preposition of entry {@code i}, in sorted order. */
    public String preposition(int i) {
        return prepositions[i];
    }

    /** The pairs of entry {@code i}: each key ({@link #verbStructure}, {@link #nounStructure}) with its count as trials. */
    public TupleCounts pairs(int i) {
        return pairs[i];
    }

    /**
     * A structure key in 16 bits: its three parts are at most 6 (class), 55 (rank and distance bucket) and 12 (verbs
     * nearer, nearest, punctuation), see {@link StructureKey#of}.
     */
    static int code(long structureKey) {
        int a = TupleKey.part(structureKey, 3, 0);
        int b = TupleKey.part(structureKey, 3, 1);
        int c = TupleKey.part(structureKey, 3, 2);
        if (a >= 64 || b >= 64 || c >= 16 || TupleKey.of(a, b, c) != structureKey) {
            throw new IllegalArgumentException("not a structure key: " + structureKey);
        }
        return (a << 10) | (b << 4) | c;
    }

    static long structure(int code) {
        return TupleKey.of(code >>> 10, (code >>> 4) & 63, code & 15);
    }

    static long pairKey(long verbStructure, long nounStructure) {
        return TupleKey.of(code(verbStructure), code(nounStructure));
    }

    /** The verb candidate's structure key in a pair key of {@link #pairs}. */
    public static long verbStructure(long pairKey) {
        return structure(TupleKey.part(pairKey, 2, 0));
    }

    /** The noun candidate's structure key in a pair key of {@link #pairs}. */
    public static long nounStructure(long pairKey) {
        return structure(TupleKey.part(pairKey, 2, 1));
    }

    public void write(DataOutput out) throws IOException {
        out.writeInt(prepositions.length);
        for (int i = 0; i < prepositions.length; i++) {
            out.writeUTF(prepositions[i]);
            pairs[i].write(out);
        }
    }

    public static AmbiguousStructures read(DataInput in) throws IOException {
        int n = in.readInt();
        if (n < 0 || n > 1 << 20) throw new IOException("preposition count " + n + " out of range");
        String[] prepositions = new String[n];
        TupleCounts[] pairs = new TupleCounts[n];
        for (int i = 0; i < n; i++) {
            prepositions[i] = in.readUTF();
            if (i > 0 && prepositions[i - 1].compareTo(prepositions[i]) >= 0) {
                throw new IOException("prepositions of the ambiguous structures are not in sorted order");
            }
            pairs[i] = TupleCounts.read(in);
        }
        return new AmbiguousStructures(prepositions, pairs);
    }

    /** Counts pairs; not thread-safe, one per thread. */
    public static final class Builder {
        private final Map<String, TupleCountsBuilder> byPreposition = new TreeMap<>();

        /** Counts one ambiguous configuration of {@code preposition} (normalized) with its two candidates' structures. */
        public void add(String preposition, long verbStructure, long nounStructure) {
            byPreposition.computeIfAbsent(preposition, p -> new TupleCountsBuilder())
                    .add(pairKey(verbStructure, nounStructure), 0, 1);
        }

        public void addAll(AmbiguousStructures other) {
            for (int i = 0; i < other.size(); i++) {
                byPreposition.computeIfAbsent(other.preposition(i), p -> new TupleCountsBuilder())
                        .addAll(other.pairs(i), k -> k);
            }
        }

        public AmbiguousStructures build() {
            String[] prepositions = byPreposition.keySet().toArray(new String[0]);
            TupleCounts[] pairs = new TupleCounts[prepositions.length];
            for (int i = 0; i < prepositions.length; i++) pairs[i] = byPreposition.get(prepositions[i]).build();
            return new AmbiguousStructures(prepositions, pairs);
        }
    }
}
