package dev.tether.similarity;

import dev.tether.candidates.HeadClass;
import gnu.trove.map.hash.TObjectIntHashMap;

/**
 * A distributional thesaurus: for every noun, verb and adjective above a frequency floor, its weighted context
 * vector and its k nearest neighbours among words of the same class. A thesaurus may keep its neighbour lists only
 * ({@link #listsOnly}): a fraction of the size, enough for the attachment ranker's similar-words features and the
 * similarity-smoothed back-off, which read neighbours and their scores; {@link #similarity} of any pair then needs the
 * full thesaurus ({@link #hasVectors}).
 *
 * <p><b>Keys.</b> A word is looked up by its class and its normalized key, exactly as the model's count tables key
 * heads: nouns by {@link dev.tether.vocabulary.WordNormalizer#noun}, verbs by
 * {@link dev.tether.vocabulary.WordNormalizer#verb}, adjectives by {@link dev.tether.vocabulary.WordNormalizer#other}
 * ({@code neighbours(HeadClass.VERB, normalizer.verb("replaced"))}). Ids run from 0 to {@link #size()}{@code - 1},
 * grouped by class ({@link HeadClass} order) and sorted by key within a class.
 *
 * <p>Immutable and safe to share across threads. Lookups by id allocate nothing; {@link #neighbours} returns a view.
 */
public final class Thesaurus {
    /** The id {@link #id} returns for a word the thesaurus does not hold. */
    public static final int UNKNOWN = -1;

    private final String normalizerVersion;
    private final ThesaurusSettings settings;
    private final long sentences;
    private final long tokens;
    private final String[] keys;
    private final HeadClass[] classes;
    private final TObjectIntHashMap<String>[] ids;
    /** Null when the thesaurus keeps its neighbour lists only. */
    private final ContextVectors vectors;
    private final int[] neighbourStart;
    private final int[] neighbourIds;
    private final float[] neighbourScores;

    @SuppressWarnings("unchecked")
    Thesaurus(String normalizerVersion, ThesaurusSettings settings, long sentences, long tokens, String[] keys,
              HeadClass[] classes, ContextVectors vectors, int[] neighbourStart, int[] neighbourIds, float[] neighbourScores) {
        this.normalizerVersion = normalizerVersion;
        this.settings = settings;
        this.sentences = sentences;
        this.tokens = tokens;
        this.keys = keys;
        this.classes = classes;
        this.vectors = vectors;
        this.neighbourStart = neighbourStart;
        this.neighbourIds = neighbourIds;
        this.neighbourScores = neighbourScores;
        this.ids = new TObjectIntHashMap[HeadClass.values().length];
        for (int c = 0; c < ids.length; c++) ids[c] = new TObjectIntHashMap<>(16, 0.5f, UNKNOWN);
        for (int w = 0; w < keys.length; w++) ids[classes[w].ordinal()].put(keys[w], w);
    }

    /** The id of the word of class {@code wordClass} with normalized key {@code key}, or {@link #UNKNOWN}. */
    public int id(HeadClass wordClass, String key) {
        return ids[wordClass.ordinal()].get(key);
    }

    /** The neighbours of word {@code id}, best first. */
    public Neighbours neighbours(int id) {
        checkId(id);
        return new Neighbours(this, neighbourStart[id], neighbourStart[id + 1] - neighbourStart[id]);
    }

    /** The neighbours of a word by class and normalized key; none for a word the thesaurus does not hold. */
    public Neighbours neighbours(HeadClass wordClass, String key) {
        int id = id(wordClass, key);
        return id == UNKNOWN ? Neighbours.NONE : neighbours(id);
    }

    /**
     * The similarity of words {@code a} and {@code b} by the thesaurus's measure, computed from their vectors (so it
     * is defined for any pair, not only for neighbours; a stored neighbour's score is this value as a float).
     */
    public double similarity(int a, int b) {
        checkId(a);
        checkId(b);
        if (vectors == null) {
            throw new IllegalStateException("this thesaurus keeps its neighbour lists only, so the similarity of any two words "
                    + "cannot be computed; use a thesaurus built without --lists-only ('tether thesaurus build')");
        }
        return vectors.similarity(settings.measure(), a, b);
    }

    /** Whether the thesaurus keeps its words' context vectors (and so gives {@link #similarity} of any pair). */
    public boolean hasVectors() {
        return vectors != null;
    }

    /**
     * This thesaurus without its context vectors and with at most {@code k} neighbours per word (the nearest; the
     * same words, ids and scores). The neighbour lists of the result are a prefix of this one's, so any reader that
     * consults at most {@code k} neighbours sees exactly what it sees here.
     */
    public Thesaurus listsOnly(int k) {
        if (k < 1) throw new IllegalArgumentException("a thesaurus keeps at least 1 neighbour per word, was " + k);
        int kept = Math.min(k, settings.neighbours());
        int[] start = new int[keys.length + 1];
        for (int w = 0; w < keys.length; w++) start[w + 1] = start[w] + Math.min(kept, neighbourCount(w));
        int[] ids = new int[start[keys.length]];
        float[] scores = new float[ids.length];
        for (int w = 0; w < keys.length; w++) {
            int n = start[w + 1] - start[w];
            System.arraycopy(neighbourIds, neighbourStart[w], ids, start[w], n);
            System.arraycopy(neighbourScores, neighbourStart[w], scores, start[w], n);
        }
        return new Thesaurus(normalizerVersion, settings.withNeighbours(kept), sentences, tokens, keys, classes, null,
                start, ids, scores);
    }

    /** Number of words. */
    public int size() {
        return keys.length;
    }

    public String key(int id) {
        checkId(id);
        return keys[id];
    }

    public HeadClass wordClass(int id) {
        checkId(id);
        return classes[id];
    }

    /** Number of words of one class. */
    public int size(HeadClass wordClass) {
        return ids[wordClass.ordinal()].size();
    }

    public ThesaurusSettings settings() { return settings; }
    public String normalizerVersion() { return normalizerVersion; }
    /** Sentences and tokens of the text the thesaurus was built from. */
    public long sentences() { return sentences; }
    public long tokens() { return tokens; }
    /** Number of distinct contexts kept in the vectors (0 for a thesaurus of neighbour lists only). */
    public int contexts() { return vectors == null ? 0 : vectors.contexts(); }
    /** Number of non-zero word–context weights (0 for a thesaurus of neighbour lists only). */
    public long vectorEntries() { return vectors == null ? 0 : vectors.entries(); }
    /** Approximate heap bytes of vectors and neighbour lists. */
    public long approximateBytes() {
        return (vectors == null ? 0 : vectors.approximateBytes()) + 8L * neighbourIds.length + 4L * neighbourStart.length;
    }

    /** Number of stored neighbours of word {@code id}; with {@link #neighbourId} and {@link #neighbourScore}, no allocation. */
    public int neighbourCount(int id) {
        checkId(id);
        return neighbourStart[id + 1] - neighbourStart[id];
    }

    /** The id of the {@code i}-th nearest neighbour of word {@code id}. */
    public int neighbourId(int id, int i) {
        return neighbourIds[slot(id, i)];
    }

    /** The score of the {@code i}-th nearest neighbour of word {@code id}. */
    public float neighbourScore(int id, int i) {
        return neighbourScores[slot(id, i)];
    }

    private int slot(int id, int i) {
        if (i < 0 || i >= neighbourCount(id)) throw new IndexOutOfBoundsException("neighbour " + i + " of " + neighbourCount(id));
        return neighbourStart[id] + i;
    }

    int neighbourIdAt(int slot) { return neighbourIds[slot]; }
    float neighbourScoreAt(int slot) { return neighbourScores[slot]; }
    /** Null for a thesaurus of neighbour lists only. */
    ContextVectors vectors() { return vectors; }

    private void checkId(int id) {
        if (id < 0 || id >= keys.length) throw new IndexOutOfBoundsException("word id " + id + " outside 0.." + (keys.length - 1));
    }
}
