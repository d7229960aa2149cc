package dev.tether.candidates;

import static org.apache.uima.fit.factory.AnalysisEngineFactory.createEngine;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
import org.apache.uima.jcas.tcas.Annotation;
import org.junit.jupiter.api.Test;

import dev.tether.type.AttachmentAmbiguity;
import dev.tether.type.QuadrupleCandidate;

/**
 * The finder on hand-tagged maintenance-log sentences (invented; tags from the Penn Treebank tag set, Marcus et al.
 * 1993), in Tether's own types and in a foreign host type system.
 */
class AttachmentCandidateFinderTest {

    @Test
    void findsEveryPrepositionWithItsCandidatesInTetherTypes() throws Exception {
        HandTaggedText sentence = HandTaggedText.gasketSentence();
        TetherTypedCas cas = TetherTypedCas.of(sentence);

        createEngine(AttachmentCandidateFinder.class).process(cas.jcas);

        List<AttachmentAmbiguity> found = new ArrayList<>(JCasUtil.select(cas.jcas, AttachmentAmbiguity.class));
        assertEquals(List.of("on", "with", "from"), coveredTexts(prepositions(found)));
        assertEquals(List.of("engine", "spare", "stores"), coveredTexts(objects(found)));

        AttachmentAmbiguity on = found.get(0);
        assertEquals("on the port engine", on.getCoveredText());
        assertSame(cas.tokens.get(4), on.getCandidates(0), "nearest candidate first: 'gasket'");
        assertEquals("noun", on.getCandidateClasses(0));
        int verb = indexOf(on, cas.tokens.get(2));
        assertTrue(verb > 0, "'replaced' is a candidate of 'on', after the nearer noun");
        assertEquals("verb", on.getCandidateClasses(verb));
        assertEquals(on.getCandidates().size(), on.getCandidateClasses().size());
        assertSame(cas.tokens.get(2), on.getQuadrupleVerb());
        assertSame(cas.tokens.get(4), on.getQuadrupleNoun());

        AttachmentAmbiguity with = found.get(1);
        for (int head : new int[] {2, 4, 8}) { // replaced, gasket, engine
            assertTrue(indexOf(with, cas.tokens.get(head)) >= 0,
                    "'" + cas.tokens.get(head).getCoveredText() + "' is a candidate of 'with'");
        }

        QuadrupleCandidate quadruple = JCasUtil.select(cas.jcas, QuadrupleCandidate.class).stream()
                .filter(q -> q.getPreposition() == cas.tokens.get(5)).findFirst().orElse(null);
        assertNotNull(quadruple, "replaced gasket on engine is a verb-noun-preposition-noun quadruple");
        assertSame(cas.tokens.get(2), quadruple.getVerb());
        assertSame(cas.tokens.get(4), quadruple.getNoun1());
        assertSame(cas.tokens.get(8), quadruple.getNoun2());
    }

    @Test
    void dropInReadsAForeignTypeSystemThroughAFeaturePath() throws Exception {
        HandTaggedText sentence = HandTaggedText.gasketSentence();
        HarbourHostCas host = HarbourHostCas.of(sentence);
        AnalysisEngine finder = createEngine(AttachmentCandidateFinder.class,
                AttachmentCandidateFinder.PARAM_SENTENCE_TYPE, HarbourHostCas.SEGMENT,
                AttachmentCandidateFinder.PARAM_TOKEN_TYPE, HarbourHostCas.WORD,
                AttachmentCandidateFinder.PARAM_POS_FEATURE_PATH, HarbourHostCas.TAG_PATH);

        finder.process(host.jcas);

        List<AttachmentAmbiguity> found = new ArrayList<>(JCasUtil.select(host.jcas, AttachmentAmbiguity.class));
        assertEquals(List.of("on", "with", "from"), coveredTexts(prepositions(found)));
        for (AttachmentAmbiguity ambiguity : found) {
            assertTrue(host.words.contains(ambiguity.getPreposition()), "preposition is the host's own word annotation");
            assertTrue(host.words.contains(ambiguity.getObject()), "object is the host's own word annotation");
            assertFalse(ambiguity.getCandidates().isEmpty());
            for (Annotation candidate : ambiguity.getCandidates()) {
                assertEquals(HarbourHostCas.WORD, candidate.getType().getName());
                assertTrue(host.words.contains(candidate));
            }
        }
        AttachmentAmbiguity on = found.get(0);
        assertSame(host.words.get(4), on.getCandidates(0), "nearest candidate first: 'gasket'");
        assertSame(host.words.get(2), on.getQuadrupleVerb());
        QuadrupleCandidate quadruple = JCasUtil.select(host.jcas, QuadrupleCandidate.class).stream()
                .filter(q -> q.getPreposition() == host.words.get(5)).findFirst().orElse(null);
        assertNotNull(quadruple, "replaced gasket on engine is a verb-noun-preposition-noun quadruple");
        assertSame(host.words.get(2), quadruple.getVerb());
        assertSame(host.words.get(4), quadruple.getNoun1());
        assertSame(host.words.get(8), quadruple.getNoun2());
    }

    @Test
    void fiftyThousandTokenSentenceIsAnalysedInWindows() throws Exception {
        // A run-on log line without punctuation, 50,000 tokens in one sentence.
        String pattern = "crew/NNS checked/VBD valve/NN on/IN deck/NN with/IN wrench/NN near/IN hull/NN ";
        StringBuilder pairs = new StringBuilder();
        int tokens = 0;
        int prepositions = 0;
        while (tokens < 50_000) {
            for (String pair : pattern.trim().split(" ")) {
                if (tokens == 50_000) break;
                pairs.append(pair).append(' ');
                tokens++;
                if (pair.endsWith("/IN")) prepositions++;
            }
        }
        HandTaggedText sentence = new HandTaggedText(pairs.toString());
        TetherTypedCas cas = TetherTypedCas.of(sentence);
        int window = 250;

        createEngine(AttachmentCandidateFinder.class,
                AttachmentCandidateFinder.PARAM_MAX_SENTENCE_TOKENS, window).process(cas.jcas);

        Map<Annotation, Integer> position = new HashMap<>();
        for (int i = 0; i < cas.tokens.size(); i++) position.put(cas.tokens.get(i), i);
        List<AttachmentAmbiguity> found = new ArrayList<>(JCasUtil.select(cas.jcas, AttachmentAmbiguity.class));
        assertTrue(found.size() > prepositions / 2, "most prepositions are found: " + found.size() + " of " + prepositions);
        assertTrue(found.size() <= prepositions, "at most one ambiguity per preposition");
        for (AttachmentAmbiguity ambiguity : found) {
            int p = position.get(ambiguity.getPreposition());
            assertTrue(ambiguity.getCandidates().size() < window, "candidates bounded by the window");
            for (Annotation candidate : ambiguity.getCandidates()) {
                assertEquals(p / window, position.get(candidate) / window, "no candidate across a window boundary");
            }
        }
    }

    @Test
    void emptyAndBlankDocumentsProduceNothing() throws Exception {
        AnalysisEngine finder = createEngine(AttachmentCandidateFinder.class);
        for (String text : new String[] {"", "  \n\t "}) {
            JCas jcas = finder.newJCas();
            jcas.setDocumentText(text);
            finder.process(jcas);
            assertTrue(JCasUtil.select(jcas, AttachmentAmbiguity.class).isEmpty());
            assertTrue(JCasUtil.select(jcas, QuadrupleCandidate.class).isEmpty());
        }
    }

    private static int indexOf(AttachmentAmbiguity ambiguity, Annotation token) {
        for (int i = 0; i < ambiguity.getCandidates().size(); i++) {
            if (ambiguity.getCandidates(i) == token) return i;
        }
        return -1;
    }

    private static List<Annotation> prepositions(List<AttachmentAmbiguity> found) {
        List<Annotation> result = new ArrayList<>();
        for (AttachmentAmbiguity a : found) result.add(a.getPreposition());
        return result;
    }

    private static List<Annotation> objects(List<AttachmentAmbiguity> found) {
        List<Annotation> result = new ArrayList<>();
        for (AttachmentAmbiguity a : found) result.add(a.getObject());
        return result;
    }

    private static List<String> coveredTexts(List<Annotation> annotations) {
        List<String> result = new ArrayList<>();
        for (Annotation a : annotations) result.add(a.getCoveredText());
        return result;
    }
}
