package dev.tether.evaluation;

import dev.tether.io.WordPairReader.WordPair;
import dev.tether.similarity.ContextCounter;
import dev.tether.similarity.Thesaurus;
import dev.tether.similarity.ThesaurusBuilder;
import dev.tether.similarity.ThesaurusSettings;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SimilarityEvaluatorTest {
    /** Two slots: parts after "replaced the", crew before "replaced"; "hose" shares a little of both. */
    private static Thesaurus thesaurus() {
        ContextCounter c = new ContextCounter();
        String[][] sentences = {
                {"The engineer replaced the gasket .", "DT NN VBD DT NN ."},
                {"The deckhand replaced the valve .", "DT NN VBD DT NN ."},
                {"The engineer replaced the valve .", "DT NN VBD DT NN ."},
                {"The deckhand replaced the gasket .", "DT NN VBD DT NN ."},
                {"The hose replaced the gasket .", "DT NN VBD DT NN ."},
                {"The engineer cleaned the hose .", "DT NN VBD DT NN ."},
        };
        for (int i = 0; i < 3; i++) {
            for (String[] s : sentences) c.addSentence(s[0].split(" "), s[1].split(" "));
        }
        return ThesaurusBuilder.build(c, ThesaurusSettings.DEFAULT.withMinFrequency(2), 1);
    }

    @Test
    void spearmanMatchesTheTextbookFormulaOverCoveredPairs() {
        Thesaurus t = thesaurus();
        SimilarityEvaluator e = new SimilarityEvaluator();
        List<WordPair> pairs = List.of(new WordPair("gasket", "valve", 9), new WordPair("engineer", "deckhand", 8),
                new WordPair("gaskets", "hose", 5), new WordPair("engineer", "valve", 1),
                new WordPair("gasket", "lifeboat", 6)); // "lifeboat" is not in the thesaurus
        SimilarityEvaluation r = e.evaluate(t, pairs);
        assertEquals(4, r.covered());
        assertEquals(5, r.pairs());
        assertEquals(0.8, r.coverage(), 1e-12);
        // Spearman without ties: 1 - 6 sum d^2 / (n (n^2 - 1)), ranks of human scores 1..4 against the thesaurus's.
        double[] s = new double[4];
        for (int i = 0; i < 4; i++) s[i] = e.similarity(t, pairs.get(i).first(), pairs.get(i).second());
        double d2 = 0;
        for (int i = 0; i < 4; i++) {
            int rank = 1;
            for (int j = 0; j < 4; j++) if (s[j] > s[i]) rank++;
            d2 += (rank - (i + 1)) * (rank - (i + 1));
        }
        assertTrue(s[0] != s[1] && s[1] != s[2] && s[2] != s[3] && s[0] != s[3], java.util.Arrays.toString(s));
        assertEquals(1 - 6 * d2 / (4 * 15.0), r.spearman(), 1e-12);
        assertTrue(Double.isNaN(e.similarity(t, "gasket", "lifeboat")));
    }

    @Test
    void fewerThanTwoCoveredPairsGiveNoCorrelation() {
        SimilarityEvaluation r = new SimilarityEvaluator().evaluate(thesaurus(), List.of(new WordPair("gasket", "valve", 9)));
        assertTrue(Double.isNaN(r.spearman()));
        assertEquals(1, r.covered());
    }
}
