package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.HeadChoiceCounts.Part;
import dev.tether.counts.TupleCounts;
import dev.tether.counts.TupleKey;
import dev.tether.similarity.Thesaurus;

import java.util.Arrays;

/**
 * The similar-words pools of the two-word count levels, summed once when a model is loaded instead of once per
 * candidate: for every thesaurus word and preposition, the cases of "head ... preposition" over the word's nearest
 * neighbours as heads of its own class ({@link Part#HEAD}), and of "class ... preposition object" over its
 * neighbours as objects, for every head class ({@link Part#CLASS_OBJECT}), each case weighted by the neighbour's
 * similarity, summed in neighbour order: exactly the doubles the per-candidate sum gives. Each pool also records,
 * as a bit per neighbour, which neighbours had cases; a neighbour without a two-word entry has no three-word entry
 * either (every event is counted at every level, which the constructor checks), so the pools over
 * {@link Part#HEAD_OBJECT} need to look up those neighbours only.
 *
 * <p>Pools are stored per thesaurus word, sorted by preposition and class, and found by binary search. Immutable
 * and thread-safe.
 */
final class SimilarWordPools {
    /** At most this many neighbours get a bit in a pool's mask (as in {@link NeighbourMasks}); with more, {@link #mask} gives all bits set. */
    static final int MASKED_NEIGHBOURS = NeighbourMasks.MASKED_NEIGHBOURS;
    private static final int CLASSES = HeadClass.values().length + 1;

    private final Pools heads;
    private final Pools objects;
    private final boolean masksHold;

    /**
     * @param statisticsIds the thesaurus's words' ids in {@code statistics}
     * @param neighbours    the nearest neighbours pooled per word
     */
    SimilarWordPools(HeadChoiceCounts statistics, Thesaurus thesaurus, ThesaurusIds statisticsIds, int neighbours) {
        int prepositions = statistics.prepositions().size() + 1;
        this.heads = new Pools(statistics, Part.HEAD, thesaurus, statisticsIds, neighbours, prepositions);
        this.objects = new Pools(statistics, Part.CLASS_OBJECT, thesaurus, statisticsIds, neighbours, prepositions);
        this.masksHold = neighbours <= MASKED_NEIGHBOURS && everyTripleHasItsPairs(statistics, prepositions);
    }

    /** The pool of slot {@link Part#HEAD} for thesaurus word {@code entry} as a head of class {@code c}, or -1. */
    int head(int entry, int sp, int c) {
        return heads.find(entry, sp, c + 1);
    }

    /** The pool of slot {@link Part#CLASS_OBJECT} for thesaurus word {@code entry} as the object of a head of class {@code c}, or -1. */
    int object(int entry, int sp, int c) {
        return objects.find(entry, sp, c + 1);
    }

    double headHits(int pool) { return heads.hits[pool]; }
    double headTrials(int pool) { return heads.trials[pool]; }
    double objectHits(int pool) { return objects.hits[pool]; }
    double objectTrials(int pool) { return objects.trials[pool]; }

    /**
     * The neighbours (bit j: the j-th nearest) that can have three-word cases for a head pool ({@code ofHead}) or an
     * object pool: none for pool -1; all bits when the masks cannot be trusted.
     */
    long mask(boolean ofHead, int pool) {
        if (!masksHold) return -1L;
        if (pool < 0) return 0;
        return (ofHead ? heads.mask[pool] : objects.mask[pool]) & 0xFFFFFFFFL;
    }

    /** Whether every three-word entry has its two two-word entries (so a missing pair rules its triples out). */
    boolean pairsHold() {
        return masksHold;
    }

    /** Approximate heap bytes of the pools. */
    long approximateBytes() {
        return heads.approximateBytes() + objects.approximateBytes();
    }

    /** Number of pools stored (heads, objects). */
    int size() {
        return heads.hits.length + objects.hits.length;
    }

    /** Whether every three-word entry has its two two-word entries, which the masks rely on. */
    private static boolean everyTripleHasItsPairs(HeadChoiceCounts statistics, int prepositions) {
        for (int sp = 0; sp < prepositions; sp++) {
            TupleCounts triples = statistics.lexical(sp, Part.HEAD_OBJECT);
            TupleCounts headPairs = statistics.lexical(sp, Part.HEAD);
            TupleCounts objectPairs = statistics.lexical(sp, Part.CLASS_OBJECT);
            for (int i = 0; i < triples.size(); i++) {
                long key = triples.key(i);
                int h = TupleKey.part(key, 3, 0), c = TupleKey.part(key, 3, 1), o = TupleKey.part(key, 3, 2);
                if (headPairs.find(TupleKey.of(h, c)) == TupleCounts.ABSENT || objectPairs.find(TupleKey.of(c, o)) == TupleCounts.ABSENT) {
                    return false;
                }
            }
        }
        return true;
    }

    /** The pools of one two-word level, per thesaurus word: sorted codes (preposition x class) and their sums. */
    private static final class Pools {
        final int[] start;
        final int[] codes;
        final double[] hits;
        final double[] trials;
        final int[] mask;

        Pools(HeadChoiceCounts statistics, Part part, Thesaurus thesaurus, ThesaurusIds statisticsIds, int neighbours, int prepositions) {
            boolean byHead = part == Part.HEAD;
            // The level's entries grouped by word (the head, or the object), each group in preposition then class order.
            int words = statistics.words().size() + 1;
            int[] count = new int[words + 1];
            for (int sp = 0; sp < prepositions; sp++) {
                TupleCounts t = statistics.lexical(sp, part);
                for (int i = 0; i < t.size(); i++) count[word(t.key(i), byHead) + 1]++;
            }
            for (int w = 0; w < words; w++) count[w + 1] += count[w];
            int[] fill = Arrays.copyOf(count, words);
            int[] entryCode = new int[count[words]];
            double[] entryHits = new double[entryCode.length];
            double[] entryTrials = new double[entryCode.length];
            for (int sp = 0; sp < prepositions; sp++) {
                TupleCounts t = statistics.lexical(sp, part);
                for (int i = 0; i < t.size(); i++) {
                    long key = t.key(i);
                    int at = fill[word(key, byHead)]++;
                    entryCode[at] = sp * CLASSES + TupleKey.part(key, 2, byHead ? 1 : 0);
                    entryHits[at] = t.hitsAt(i);
                    entryTrials[at] = t.trialsAt(i);
                }
            }

            int n = thesaurus.size();
            start = new int[n + 1];
            int[] outCodes = new int[1024];
            double[] outHits = new double[1024];
            double[] outTrials = new double[1024];
            int[] outMask = new int[1024];
            double[] accHits = new double[prepositions * CLASSES];
            double[] accTrials = new double[accHits.length];
            int[] accMask = new int[accHits.length];
            boolean[] touched = new boolean[accHits.length];
            int[] touchedCodes = new int[accHits.length];
            int size = 0;
            for (int entry = 0; entry < n; entry++) {
                start[entry] = size;
                HeadClass wordClass = thesaurus.wordClass(entry);
                if (!byHead && wordClass != HeadClass.NOUN) continue;
                int onlyClass = byHead ? wordClass.ordinal() + 1 : -1;
                int touchedCount = 0;
                int k = Math.min(neighbours, thesaurus.neighbourCount(entry));
                for (int j = 0; j < k; j++) {
                    double s = thesaurus.neighbourScore(entry, j);
                    if (!(s > 0)) continue;
                    int w = statisticsIds.countId(thesaurus.neighbourId(entry, j));
                    if (w == 0) continue;
                    for (int e = count[w]; e < count[w + 1]; e++) {
                        int code = entryCode[e];
                        if (onlyClass >= 0 && code % CLASSES != onlyClass) continue;
                        if (!touched[code]) {
                            touched[code] = true;
                            touchedCodes[touchedCount++] = code;
                        }
                        accHits[code] += s * entryHits[e];
                        accTrials[code] += s * entryTrials[e];
                        if (j < MASKED_NEIGHBOURS) accMask[code] |= 1 << j;
                    }
                }
                Arrays.sort(touchedCodes, 0, touchedCount);
                if (size + touchedCount > outCodes.length) {
                    int grown = Math.max(size + touchedCount, outCodes.length * 2);
                    outCodes = Arrays.copyOf(outCodes, grown);
                    outHits = Arrays.copyOf(outHits, grown);
                    outTrials = Arrays.copyOf(outTrials, grown);
                    outMask = Arrays.copyOf(outMask, grown);
                }
                for (int i = 0; i < touchedCount; i++) {
                    int code = touchedCodes[i];
                    outCodes[size] = code;
                    outHits[size] = accHits[code];
                    outTrials[size] = accTrials[code];
                    outMask[size] = accMask[code];
                    size++;
                    touched[code] = false;
                    accHits[code] = 0;
                    accTrials[code] = 0;
                    accMask[code] = 0;
                }
            }
            start[n] = size;
            codes = Arrays.copyOf(outCodes, size);
            hits = Arrays.copyOf(outHits, size);
            trials = Arrays.copyOf(outTrials, size);
            mask = Arrays.copyOf(outMask, size);
        }

        private static int word(long key, boolean byHead) {
            return TupleKey.part(key, 2, byHead ? 0 : 1);
        }

        int find(int entry, int sp, int classCode) {
            int i = Arrays.binarySearch(codes, start[entry], start[entry + 1], sp * CLASSES + classCode);
            return i >= 0 ? i : -1;
        }

        long approximateBytes() {
            return 4L * start.length + 24L * codes.length;
        }
    }
}
