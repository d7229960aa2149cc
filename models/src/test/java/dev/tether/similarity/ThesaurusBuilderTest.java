package dev.tether.similarity;

import dev.tether.candidates.HeadClass;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ThesaurusBuilderTest {
    private static final ThesaurusSettings SETTINGS = ThesaurusSettings.DEFAULT.withMinFrequency(3).withMaxContextWords(1000)
            .withNeighbours(4);

    @Test
    void partsHaveTheOtherPartsAsNearestNeighbours() {
        Thesaurus t = ThesaurusBuilder.build(FerryLogCorpus.count(600, 7), SETTINGS, 1);
        for (String part : FerryLogCorpus.PARTS) {
            Neighbours n = t.neighbours(HeadClass.NOUN, part);
            assertEquals(4, n.size(), part);
            for (int i = 0; i < n.size(); i++) {
                assertTrue(Arrays.asList(FerryLogCorpus.PARTS).contains(n.key(i)), part + " -> " + n.key(i));
                assertEquals(HeadClass.NOUN, t.wordClass(n.id(i)));
            }
        }
        assertTrue(t.neighbours(HeadClass.VERB, "replac").size() > 0);
        assertEquals(0, t.neighbours(HeadClass.NOUN, "lifeboat").size());
    }

    /** The inverted-index search gives exactly the ranking that scoring every pair of a class gives. */
    @Test
    void invertedIndexAgreesWithScoringEveryPair() {
        ContextCounter counts = FerryLogCorpus.count(300, 11);
        for (Weighting w : Weighting.values()) {
            for (SimilarityMeasure m : SimilarityMeasure.values()) {
                Thesaurus t = ThesaurusBuilder.build(counts, SETTINGS.withWeighting(w).withMeasure(m).withContexts(ContextChoice.ALL), 2);
                for (int a = 0; a < t.size(); a++) {
                    List<int[]> expected = bruteForce(t, a);
                    Neighbours n = t.neighbours(a);
                    assertEquals(expected.size(), n.size(), w + "/" + m + " " + t.key(a));
                    for (int i = 0; i < n.size(); i++) {
                        assertEquals(expected.get(i)[0], n.id(i), w + "/" + m + " " + t.key(a) + " #" + i);
                        assertEquals((float) t.similarity(a, n.id(i)), n.score(i));
                    }
                }
            }
        }
    }

    private static List<int[]> bruteForce(Thesaurus t, int a) {
        List<int[]> all = new ArrayList<>();
        for (int b = 0; b < t.size(); b++) {
            if (b != a && t.wordClass(b) == t.wordClass(a) && t.similarity(a, b) > 0) all.add(new int[] {b});
        }
        all.sort((x, y) -> {
            int c = Double.compare(t.similarity(a, y[0]), t.similarity(a, x[0]));
            return c != 0 ? c : Integer.compare(x[0], y[0]);
        });
        return all.subList(0, Math.min(t.settings().neighbours(), all.size()));
    }

    @Test
    void theThreadCountDoesNotChangeTheBytes() throws IOException {
        ContextCounter counts = FerryLogCorpus.count(400, 3);
        byte[] one = ThesaurusFile.encode(ThesaurusBuilder.build(counts, SETTINGS, 1));
        byte[] three = ThesaurusFile.encode(ThesaurusBuilder.build(counts, SETTINGS, 3));
        assertArrayEquals(one, three);
        assertArrayEquals(one, ThesaurusFile.encode(ThesaurusBuilder.build(FerryLogCorpus.count(400, 3), SETTINGS, 2)));
    }

    @Test
    void theFrequencyFloorLeavesRareWordsOut() {
        ContextCounter counts = FerryLogCorpus.count(200, 5);
        counts.addSentence("The purser counted the lifejackets .".split(" "), "DT NN VBD DT NNS .".split(" "));
        assertEquals(Thesaurus.UNKNOWN, ThesaurusBuilder.build(counts, SETTINGS, 1).id(HeadClass.NOUN, "purser"));
        assertTrue(ThesaurusBuilder.build(counts, SETTINGS.withMinFrequency(1), 1).id(HeadClass.NOUN, "purser") >= 0);
    }

    @Test
    void contextsSharedByTooManyWordsArePruned() {
        ContextCounter counts = FerryLogCorpus.count(300, 9);
        Thesaurus all = ThesaurusBuilder.build(counts, SETTINGS, 1);
        Thesaurus pruned = ThesaurusBuilder.build(counts, SETTINGS.withMaxContextWords(4), 1);
        assertTrue(pruned.contexts() < all.contexts(), pruned.contexts() + " vs " + all.contexts());
        // "the" follows or precedes every noun, verb and adjective: far more than 4 words share it.
        assertTrue(pruned.vectorEntries() < all.vectorEntries());
    }

    @Test
    void contextChoicesSelectTheirRelations() {
        ContextCounter counts = FerryLogCorpus.count(300, 13);
        Thesaurus window = ThesaurusBuilder.build(counts, SETTINGS.withContexts(ContextChoice.WINDOW), 1);
        Thesaurus grammatical = ThesaurusBuilder.build(counts, SETTINGS.withContexts(ContextChoice.GRAMMATICAL), 1);
        Thesaurus all = ThesaurusBuilder.build(counts, SETTINGS.withContexts(ContextChoice.ALL), 1);
        assertTrue(window.contexts() > 0 && grammatical.contexts() > 0);
        assertEquals(all.contexts(), window.contexts() + grammatical.contexts());
    }
}
