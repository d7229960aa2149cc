package dev.tether.counts;

import dev.tether.vocabulary.Vocabulary;
import gnu.trove.list.array.TLongArrayList;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * How often each word occurred in counted text, keyed by the normalized form the count tables use (a noun by
 * {@code WordNormalizer.noun}, a verb by {@code WordNormalizer.verb}). Raw counts keep one, so that a model trained
 * with {@code --base} can say how much of the new text's vocabulary the base already knew. Words are held in sorted
 * order, so the same text gives the same bytes however it was split; immutable.
 */
public final class WordFrequencies {
    private static final WordFrequencies EMPTY = new WordFrequencies(new String[0], new long[0]);

    private final String[] words;
    private final long[] counts;
    private final long total;

    private WordFrequencies(String[] words, long[] counts) {
        this.words = words;
        this.counts = counts;
        long t = 0;
        for (long c : counts) t += c;
        this.total = t;
    }

    public static WordFrequencies empty() {
        return EMPTY;
    }

    /** Distinct words. */
    public int size() {
        return words.length;
    }

    /** The {@code i}-th word in sorted order. */
    public String word(int i) {
        return words[i];
    }

    public long count(int i) {
        return counts[i];
    }

    /** Occurrences of all words. */
    public long total() {
        return total;
    }

    public void write(DataOutput out) throws IOException {
        out.writeInt(words.length);
        for (int i = 0; i < words.length; i++) {
            out.writeUTF(words[i]);
            out.writeLong(counts[i]);
        }
    }

    public static WordFrequencies read(DataInput in) throws IOException {
        int n = in.readInt();
        if (n < 0 || n > Vocabulary.MAX_SIZE) throw new IOException("word count " + n + " out of range");
        String[] words = new String[n];
        long[] counts = new long[n];
        for (int i = 0; i < n; i++) {
            words[i] = in.readUTF();
            counts[i] = in.readLong();
            if (counts[i] < 1) throw new IOException("word '" + words[i] + "' has count " + counts[i]);
            if (i > 0 && words[i - 1].compareTo(words[i]) >= 0) throw new IOException("words are not in sorted order");
        }
        return new WordFrequencies(words, counts);
    }

    /** Counts occurrences; not thread-safe, one per thread. */
    public static final class Builder {
        private final Vocabulary ids = new Vocabulary();
        private final TLongArrayList counts = new TLongArrayList();

        public Builder() {
            counts.add(0); // the unknown id
        }

        /** One occurrence of {@code word} (already normalized). */
        public void add(String word) {
            add(word, 1);
        }

        public void add(String word, long times) {
            int id = ids.add(word);
            if (id == counts.size()) counts.add(0);
            counts.setQuick(id, counts.getQuick(id) + times);
        }

        public void addAll(WordFrequencies other) {
            for (int i = 0; i < other.size(); i++) add(other.word(i), other.count(i));
        }

        /** The frequencies in sorted word order. */
        public WordFrequencies build() {
            List<String> sorted = new ArrayList<>(ids.words());
            sorted.sort(null);
            String[] w = sorted.toArray(new String[0]);
            long[] c = new long[w.length];
            for (int i = 0; i < w.length; i++) c[i] = counts.getQuick(ids.id(w[i]));
            return w.length == 0 ? EMPTY : new WordFrequencies(w, c);
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof WordFrequencies f && Arrays.equals(words, f.words) && Arrays.equals(counts, f.counts);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(words) + Arrays.hashCode(counts);
    }
}
