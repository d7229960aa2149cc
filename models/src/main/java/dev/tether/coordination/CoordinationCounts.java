package dev.tether.coordination;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.VocabularyCodec;
import dev.tether.ranking.FeatureKey;
import dev.tether.vocabulary.Vocabulary;
import gnu.trove.map.hash.TLongIntHashMap;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;
import java.util.Arrays;

/**
 * The counts behind the coordination features, read off a treebank: coordinated head pairs (by word and class), how
 * often a word was a conjunct head and how often it occurred with that class, and modifier–head dependencies by
 * {@link ModifierKind} (the kind of association counts Nakov &amp; Hearst 2005 used to decide whether a modifier is
 * shared: "worn bearings" and "worn seals", here counted in treebank text). Keys pack a table and up to three parts
 * into one {@code long} ({@link FeatureKey}); words are normalized keys with ids from one {@link Vocabulary}.
 * Immutable and thread-safe.
 */
public final class CoordinationCounts implements CoordinationStatistics {
    /** (left word, right word, left class × 4 + right class): gold coordinations with these heads. */
    public static final int PAIR = 1;
    /** (word, 0, class): times the word headed a conjunct. */
    public static final int CONJUNCT = 2;
    /** (word, 0, class): times the word occurred with that class. */
    public static final int OCCURRENCE = 3;
    /** (modifier word, head word, kind ordinal): a modifier of that kind depending on that head. */
    public static final int MODIFIER = 4;
    /** (preposition, head word, 0): a prepositional phrase with that preposition depending on that head. */
    public static final int PREPOSITION = 5;

    private final Vocabulary words;
    private final TLongIntHashMap counts;

    CoordinationCounts(Vocabulary words, TLongIntHashMap counts) {
        this.words = words;
        this.counts = counts;
    }

    public static long key(int table, int a, int b, int c) {
        return FeatureKey.of(table, a, b, c);
    }

    public static long pair(int left, HeadClass leftClass, int right, HeadClass rightClass) {
        return key(PAIR, left, right, leftClass.ordinal() * 4 + rightClass.ordinal());
    }

    @Override public Vocabulary words() { return words; }
    @Override public int count(long key) { return counts.get(key); }
    public int size() { return counts.size(); }

    /** Counts of everything except {@code part} (whose words must share this vocabulary): a held-out view. */
    public CoordinationStatistics without(CoordinationCounts part) {
        return new CoordinationStatistics() {
            @Override public Vocabulary words() { return words; }
            @Override public int count(long key) { return counts.get(key) - part.counts.get(key); }
        };
    }

    public void write(DataOutput out) throws IOException {
        VocabularyCodec.write(words, out);
        long[] keys = counts.keys();
        Arrays.sort(keys);
        out.writeInt(keys.length);
        for (long k : keys) {
            out.writeLong(k);
            out.writeInt(counts.get(k));
        }
    }

    public static CoordinationCounts read(DataInput in) throws IOException {
        Vocabulary words = VocabularyCodec.read(in);
        int n = in.readInt();
        if (n < 0 || n > 100_000_000) throw new IOException("implausible count of coordination entries " + n);
        TLongIntHashMap counts = new TLongIntHashMap(Math.max(16, Math.min(n, 1 << 22) * 2), 0.5f, Long.MIN_VALUE, 0);
        long previous = Long.MIN_VALUE;
        for (int i = 0; i < n; i++) {
            long k = in.readLong();
            if (i > 0 && k <= previous) throw new IOException("coordination count keys out of order at " + i);
            previous = k;
            int v = in.readInt();
            if (v < 0) throw new IOException("negative coordination count at " + i);
            counts.put(k, v);
        }
        return new CoordinationCounts(words, counts);
    }

    @Override public boolean equals(Object o) {
        return o instanceof CoordinationCounts && counts.equals(((CoordinationCounts) o).counts)
                && words.words().equals(((CoordinationCounts) o).words.words());
    }
    @Override public int hashCode() { return counts.hashCode(); }
}
