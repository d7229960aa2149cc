package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.SubTuple;
import dev.tether.counts.TupleCounts;
import dev.tether.counts.TupleKey;
import dev.tether.similarity.Thesaurus;

import java.util.Arrays;

/**
 * For one slot of the quadruple (verb, first noun or object), each thesaurus word and each preposition: which of the
 * word's nearest neighbours the quadruple counts ever saw in that slot with that preposition, one bit per neighbour
 * (bit j: the j-th nearest). Every quadruple is counted at every level, so a neighbour the single-word level never
 * saw is in no triple or quadruple either, and the similarity-smoothed back-off needs to look up the others only;
 * the constructor checks that the counts hold to this and, when they do not, gives every bit. Masks are stored per
 * thesaurus word, sorted by preposition, and found by binary search. Immutable and thread-safe.
 */
final class NeighbourMasks {
    /** At most this many neighbours get a bit. */
    static final int MASKED_NEIGHBOURS = 32;

    /** Null when the masks do not hold (every bit is then given). */
    private final int[] start;
    private final int[] prepositions;
    private final int[] masks;
    private final boolean hold;

    /**
     * @param slot      0 verb, 1 first noun, 2 object
     * @param wordClass the class of the thesaurus words that stand in for that slot
     * @param countIds  the thesaurus's words' ids in {@code counts}
     */
    NeighbourMasks(QuadrupleCounts counts, int slot, HeadClass wordClass, Thesaurus thesaurus, ThesaurusIds countIds, int neighbours) {
        SubTuple single = slot == 0 ? SubTuple.VERB : slot == 1 ? SubTuple.NOUN1 : SubTuple.NOUN2;
        int prepositionCount = counts.prepositions().size() + 1;
        int words = counts.words().size() + 1;
        this.hold = neighbours <= MASKED_NEIGHBOURS && everyTupleHasItsWord(counts, slot, single, prepositionCount);
        if (!hold) {
            start = null;
            prepositions = null;
            masks = null;
            return;
        }

        // The prepositions each word was seen with in the slot, in preposition order.
        int[] count = new int[words + 1];
        for (int p = 0; p < prepositionCount; p++) {
            TupleCounts t = counts.table(p, single);
            for (int i = 0; i < t.size(); i++) count[TupleKey.part(t.key(i), 1, 0) + 1]++;
        }
        for (int w = 0; w < words; w++) count[w + 1] += count[w];
        int[] fill = Arrays.copyOf(count, words);
        int[] seenWith = new int[count[words]];
        for (int p = 0; p < prepositionCount; p++) {
            TupleCounts t = counts.table(p, single);
            for (int i = 0; i < t.size(); i++) seenWith[fill[TupleKey.part(t.key(i), 1, 0)]++] = p;
        }

        int n = thesaurus.size();
        start = new int[n + 1];
        int[] accMask = new int[prepositionCount];
        boolean[] touched = new boolean[prepositionCount];
        int[] touchedList = new int[prepositionCount];
        int[] outP = new int[1024];
        int[] outMask = new int[1024];
        int size = 0;
        for (int entry = 0; entry < n; entry++) {
            start[entry] = size;
            if (thesaurus.wordClass(entry) != wordClass) continue;
            int touchedCount = 0;
            int k = Math.min(Math.min(neighbours, MASKED_NEIGHBOURS), thesaurus.neighbourCount(entry));
            for (int j = 0; j < k; j++) {
                int w = countIds.countId(thesaurus.neighbourId(entry, j));
                if (w == 0) continue;
                for (int e = count[w]; e < count[w + 1]; e++) {
                    int p = seenWith[e];
                    if (!touched[p]) {
                        touched[p] = true;
                        touchedList[touchedCount++] = p;
                    }
                    accMask[p] |= 1 << j;
                }
            }
            Arrays.sort(touchedList, 0, touchedCount);
            if (size + touchedCount > outP.length) {
                int grown = Math.max(size + touchedCount, outP.length * 2);
                outP = Arrays.copyOf(outP, grown);
                outMask = Arrays.copyOf(outMask, grown);
            }
            for (int i = 0; i < touchedCount; i++) {
                int p = touchedList[i];
                outP[size] = p;
                outMask[size] = accMask[p];
                size++;
                touched[p] = false;
                accMask[p] = 0;
            }
        }
        start[n] = size;
        prepositions = Arrays.copyOf(outP, size);
        masks = Arrays.copyOf(outMask, size);
    }

    /** The neighbours of thesaurus word {@code entry} that the counts saw in the slot with preposition {@code p}. */
    long mask(int entry, int p) {
        if (!hold) return -1L;
        int i = Arrays.binarySearch(prepositions, start[entry], start[entry + 1], p);
        return i < 0 ? 0 : masks[i] & 0xFFFFFFFFL;
    }

    /** Whether every triple and quadruple that holds the slot has the slot's word at the single-word level. */
    private static boolean everyTupleHasItsWord(QuadrupleCounts counts, int slot, SubTuple single, int prepositionCount) {
        for (int p = 0; p < prepositionCount; p++) {
            TupleCounts singles = counts.table(p, single);
            for (SubTuple part : new SubTuple[] {SubTuple.VERB_NOUN1_NOUN2, SubTuple.VERB_NOUN1, SubTuple.VERB_NOUN2, SubTuple.NOUN1_NOUN2}) {
                int position = position(part, slot);
                if (position < 0) continue;
                TupleCounts t = counts.table(p, part);
                for (int i = 0; i < t.size(); i++) {
                    int w = TupleKey.part(t.key(i), part.arity(), position);
                    if (singles.find(TupleKey.of(w)) == TupleCounts.ABSENT) return false;
                }
            }
        }
        return true;
    }

    /** Where the slot's word sits in a key of {@code part}, or -1 when the part does not hold the slot. */
    private static int position(SubTuple part, int slot) {
        switch (part) {
            case VERB_NOUN1_NOUN2: return slot;
            case VERB_NOUN1: return slot == 0 ? 0 : slot == 1 ? 1 : -1;
            case VERB_NOUN2: return slot == 0 ? 0 : slot == 2 ? 1 : -1;
            case NOUN1_NOUN2: return slot == 1 ? 0 : slot == 2 ? 1 : -1;
            default: return -1;
        }
    }
}
