package dev.tether.vocabulary;

import gnu.trove.map.hash.TObjectIntHashMap;

import java.util.ArrayList;
import java.util.List;

/**
 * Integer ids for normalized words. Id {@value #UNKNOWN} is reserved for words never seen; known words are numbered
 * from 1 in the order they were first added, so that the same inputs give the same ids. Ids fit in
 * {@value #ID_BITS} bits, which lets three of them share one {@code long} key.
 * <p>A vocabulary is append-only while training ({@link #add}) and frozen once a model is built
 * ({@link #frozenCopy}); a frozen vocabulary is immutable and safe to share across threads.
 */
public final class Vocabulary {
    public static final int UNKNOWN = 0;
    public static final int ID_BITS = 21;
    public static final int MAX_SIZE = (1 << ID_BITS) - 1;

    private final TObjectIntHashMap<String> ids;
    private final List<String> words;
    private final boolean frozen;

    public Vocabulary() {
        this(new TObjectIntHashMap<>(1024, 0.5f, UNKNOWN), new ArrayList<>(List.of("<unknown>")), false);
    }

    private Vocabulary(TObjectIntHashMap<String> ids, List<String> words, boolean frozen) {
        this.ids = ids;
        this.words = words;
        this.frozen = frozen;
    }

    /** A vocabulary holding {@code words} in that order (ids 1..n), frozen. */
    public static Vocabulary frozenOf(List<String> words) {
        Vocabulary v = new Vocabulary();
        for (String w : words) v.add(w);
        return v.frozenCopy();
    }

    /** The id of {@code word}, adding it if new. */
    public int add(String word) {
        if (frozen) throw new IllegalStateException("this vocabulary belongs to a built model and cannot grow");
        int id = ids.get(word);
        if (id != UNKNOWN) return id;
        if (words.size() > MAX_SIZE) {
            throw new IllegalStateException("vocabulary is full (" + MAX_SIZE + " words); prune rare words before counting");
        }
        id = words.size();
        ids.put(word, id);
        words.add(word);
        return id;
    }

    /** The id of {@code word}, or {@link #UNKNOWN}. */
    public int id(String word) {
        return ids.get(word);
    }

    public String word(int id) {
        return words.get(id);
    }

    /** Number of known words (the unknown id not counted). */
    public int size() {
        return words.size() - 1;
    }

    /** The known words in id order. */
    public List<String> words() {
        return List.copyOf(words.subList(1, words.size()));
    }

    public Vocabulary frozenCopy() {
        if (frozen) return this;
        TObjectIntHashMap<String> copy = new TObjectIntHashMap<>(Math.max(16, words.size() * 2), 0.5f, UNKNOWN);
        copy.putAll(ids);
        return new Vocabulary(copy, new ArrayList<>(words), true);
    }
}
