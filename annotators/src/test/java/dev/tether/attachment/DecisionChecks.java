package dev.tether.attachment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.uima.jcas.cas.FSArray;
import org.apache.uima.jcas.tcas.Annotation;

import dev.tether.type.AttachmentDecision;
import dev.tether.type.ScoredHead;

/** What every attachment decision must satisfy, whatever the model decided. */
public final class DecisionChecks {
    /** Tolerance for sums of probabilities computed in floating point. */
    static final double ROUNDING = 1e-9;

    private DecisionChecks() {
    }

    /**
     * Preposition, object and head are set; the decision spans preposition..object; the probability is in (0, 1];
     * the margin is in [0, probability]; the ranking is non-empty, sorted by probability, sums to at most 1 and starts
     * with the chosen head; evidence and model id are filled in.
     */
    public static void assertSane(AttachmentDecision d) {
        String where = "decision '" + d.getCoveredText() + "' in: " + d.getCAS().getDocumentText();
        assertNotNull(d.getPreposition(), "preposition of " + where);
        assertNotNull(d.getObject(), "object of " + where);
        assertNotNull(d.getHead(), "head of " + where);
        assertEquals(d.getPreposition().getBegin(), d.getBegin(), "decision starts at its preposition: " + where);
        assertEquals(d.getObject().getEnd(), d.getEnd(), "decision ends at its object: " + where);
        assertTrue(d.getProbability() > 0 && d.getProbability() <= 1, "probability in (0,1]: " + d.getProbability() + ", " + where);
        assertTrue(d.getMargin() >= 0 && d.getMargin() <= d.getProbability() + ROUNDING,
                "margin in [0, probability]: " + d.getMargin() + ", " + where);
        assertTrue(d.getSiteClass() != null && d.getSiteClass().matches("verb|noun|adjective|adverb"),
                "site class: " + d.getSiteClass() + ", " + where);

        FSArray<ScoredHead> ranking = d.getRanking();
        assertTrue(ranking != null && ranking.size() > 0, "ranking present: " + where);
        assertTrue(indexIn(ranking, d.getHead()) >= 0, "head among the ranking: " + where);
        assertEquals(d.getHead(), d.getRanking(0).getHead(), "ranking starts with the chosen head: " + where);
        assertEquals(d.getProbability(), d.getRanking(0).getProbability(), 0.0, "chosen head's probability: " + where);
        double sum = 0;
        for (int i = 0; i < ranking.size(); i++) {
            ScoredHead s = ranking.get(i);
            assertNotNull(s.getHead(), "ranked head " + i + " of " + where);
            assertTrue(s.getProbability() >= 0, "ranked probability " + i + " of " + where);
            if (i > 0) {
                assertTrue(d.getRanking(i - 1).getProbability() >= s.getProbability(), "ranking sorted by probability: " + where);
            }
            sum += s.getProbability();
        }
        assertTrue(sum <= 1 + ROUNDING, "ranked probabilities sum to at most 1 (" + sum + "): " + where);

        assertFalse(d.getEvidence() == null || d.getEvidence().isBlank(), "evidence text: " + where);
        assertFalse(d.getEvidenceLevel() == null || d.getEvidenceLevel().isBlank(), "evidence level: " + where);
        assertTrue(d.getEvidenceCounts() != null && d.getEvidenceCounts().matches("\\d+/\\d+"),
                "evidence counts hits/trials: " + d.getEvidenceCounts() + ", " + where);
        assertFalse(d.getModelId() == null || d.getModelId().isBlank(), "model id: " + where);
    }

    /** Position of {@code head} in {@code ranking}, -1 when absent. */
    static int indexIn(FSArray<ScoredHead> ranking, Annotation head) {
        for (int i = 0; i < ranking.size(); i++) {
            ScoredHead s = ranking.get(i);
            if (s.getHead() == head) return i;
        }
        return -1;
    }
}
