package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.Vocabulary;

/**
 * The ids of one thesaurus's words in one count vocabulary, both ways: for each thesaurus id the word's count id
 * (0 when the counts never saw it), and for each head class the thesaurus holds and each count id the word's
 * thesaurus id, so that a word the counts saw is found without a string lookup. Built once per scorer or extractor;
 * immutable and thread-safe.
 */
final class ThesaurusIds {
    private final Thesaurus thesaurus;
    private final int[] countIds;
    /** [class ordinal][count id] → thesaurus id; null for a class the thesaurus does not hold. */
    private final int[][] entries;

    ThesaurusIds(Vocabulary words, Thesaurus thesaurus) {
        this.thesaurus = thesaurus;
        this.countIds = new int[thesaurus.size()];
        for (int t = 0; t < countIds.length; t++) countIds[t] = Math.max(0, words.id(thesaurus.key(t)));
        this.entries = new int[HeadClass.values().length][];
        for (HeadClass c : HeadClass.values()) {
            if (thesaurus.size(c) == 0) continue;
            int[] of = new int[words.size() + 1];
            of[0] = Thesaurus.UNKNOWN;
            for (int w = 1; w < of.length; w++) of[w] = thesaurus.id(c, words.word(w));
            entries[c.ordinal()] = of;
        }
    }

    /** The count id of thesaurus word {@code entry}, 0 when the counts never saw it. */
    int countId(int entry) {
        return countIds[entry];
    }

    /**
     * The thesaurus id of a word of class {@code c}, by its count id when it has one ({@code countId > 0}), else by
     * its normalized key; {@link Thesaurus#UNKNOWN} when the thesaurus does not hold it.
     */
    int entry(HeadClass c, int countId, String key) {
        int[] of = entries[c.ordinal()];
        if (of == null) return Thesaurus.UNKNOWN;
        return countId > 0 ? of[countId] : thesaurus.id(c, key);
    }
}
