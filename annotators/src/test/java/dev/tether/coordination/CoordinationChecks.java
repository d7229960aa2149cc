package dev.tether.coordination;

import dev.tether.type.Conjunct;
import dev.tether.type.CoordinationDecision;
import dev.tether.type.CoordinationReading;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** What every coordination decision must hold, whatever the text. */
public final class CoordinationChecks {
    private CoordinationChecks() {
    }

    public static void assertSane(CoordinationDecision d) {
        String where = d.getCAS().getDocumentText();
        assertNotNull(d.getCoordinator(), where);
        assertTrue(d.getConjuncts().size() >= 2, "at least two conjuncts: " + where);
        int previousEnd = -1;
        for (int i = 0; i < d.getConjuncts().size(); i++) {
            Conjunct c = (Conjunct) d.getConjuncts().get(i);
            assertNotNull(c.getHead(), where);
            assertTrue(c.getBegin() <= c.getHead().getBegin() && c.getHead().getEnd() <= c.getEnd(), "head inside its conjunct: " + where);
            assertTrue(c.getBegin() >= previousEnd, "conjuncts in text order, not overlapping: " + where);
            previousEnd = c.getEnd();
            assertFalse(c.getWordClass() == null || c.getWordClass().isEmpty(), where);
        }
        Conjunct first = (Conjunct) d.getConjuncts().get(0);
        Conjunct last = (Conjunct) d.getConjuncts().get(d.getConjuncts().size() - 1);
        assertTrue(first.getEnd() <= d.getCoordinator().getBegin() && d.getCoordinator().getEnd() <= last.getBegin(),
                "the coordinator between the first and the last conjunct: " + where);
        assertTrue(d.getProbability() > 0 && d.getProbability() <= 1, "probability " + d.getProbability());
        assertTrue(d.getMargin() >= 0 && d.getMargin() <= d.getProbability() + 1e-9, "margin " + d.getMargin());
        double previous = d.getProbability();
        for (int r = 0; r < d.getAlternatives().size(); r++) {
            CoordinationReading a = (CoordinationReading) d.getAlternatives().get(r);
            assertTrue(a.getProbability() <= previous + 1e-12, "alternatives best first");
            previous = a.getProbability();
            assertTrue(a.getConjuncts().size() >= 2);
        }
        assertEquals(d.getProbability() - (d.getAlternatives().size() > 0
                ? ((CoordinationReading) d.getAlternatives().get(0)).getProbability() : 0), d.getMargin(), 1e-9);
        assertFalse(d.getEvidence() == null || d.getEvidence().isEmpty());
        assertFalse(d.getModelId() == null || d.getModelId().isEmpty());
    }
}
