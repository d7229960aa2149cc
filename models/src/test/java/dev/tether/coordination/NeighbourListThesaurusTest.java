package dev.tether.coordination;

import dev.tether.similarity.FerryLogCorpus;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.WordNormalizer;
import org.junit.jupiter.api.Test;

import java.util.EnumSet;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The coordination features weigh the similarity of any two conjunct heads, which only a thesaurus with its vectors
 * gives; a thesaurus of neighbour lists only (what attachment needs, and what a compact model carries) must count as
 * none, so that a model carrying one still writes coordination decisions instead of failing on the first sentence.
 */
class NeighbourListThesaurusTest {
    @Test
    void aThesaurusOfNeighbourListsOnlyCountsAsNone() {
        Thesaurus full = FerryLogCorpus.thesaurus(300, 5);
        Thesaurus lists = full.listsOnly(5);
        CoordinationCounts counts = new CoordinationCountsBuilder(1).build();
        EnumSet<CoordinationFeatureFamily> all = EnumSet.allOf(CoordinationFeatureFamily.class);
        assertTrue(new CoordinationFeatureExtractor(counts, full, new WordNormalizer(), all).hasThesaurus());
        assertFalse(new CoordinationFeatureExtractor(counts, lists, new WordNormalizer(), all).hasThesaurus());
        assertTrue(new CoordinationRanker(null, null, all, counts, full).hasThesaurus());
        assertFalse(new CoordinationRanker(null, null, all, counts, full).withThesaurus(lists).hasThesaurus());
    }
}
