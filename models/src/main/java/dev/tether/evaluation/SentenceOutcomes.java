package dev.tether.evaluation;

import java.util.Arrays;
import java.util.BitSet;

/**
 * Right or wrong for every scored item, grouped by the sentence it came from, in the order they were scored: what a
 * paired comparison of two models on the same sentences needs (the items pair up by position, the sentences are the
 * unit a bootstrap resamples). A small accumulator: call {@link #startSentence} before each sentence's items.
 */
public final class SentenceOutcomes {
    private final BitSet right = new BitSet();
    private int[] firstItem = new int[64];
    private int sentences;
    private int items;

    /** Starts the next sentence; its items follow. A sentence may have none. */
    public void startSentence() {
        if (sentences == firstItem.length) firstItem = Arrays.copyOf(firstItem, 2 * sentences);
        firstItem[sentences++] = items;
    }

    /** One item of the current sentence. */
    public void add(boolean itemRight) {
        if (sentences == 0) throw new IllegalStateException("startSentence() before the first item");
        if (itemRight) right.set(items);
        items++;
    }

    public int sentences() { return sentences; }
    public int items() { return items; }

    /** Whether item {@code i} (in scoring order, over all sentences) was right. */
    public boolean right(int i) {
        if (i < 0 || i >= items) throw new IndexOutOfBoundsException("item " + i + " of " + items);
        return right.get(i);
    }

    /** Items of sentence {@code s}. */
    public int itemsIn(int s) {
        return end(s) - firstItem[s];
    }

    /** Right items of sentence {@code s}. */
    public int rightIn(int s) {
        int from = firstItem[s];
        int to = end(s);
        return to == from ? 0 : right.get(from, to).cardinality();
    }

    /** Fraction of all items right; 0 without items. */
    public double accuracy() {
        return items == 0 ? 0 : (double) right.cardinality() / items;
    }

    private int end(int s) {
        if (s < 0 || s >= sentences) throw new IndexOutOfBoundsException("sentence " + s + " of " + sentences);
        return s + 1 < sentences ? firstItem[s + 1] : items;
    }
}
