package dev.tether.attachment;

import static org.apache.uima.fit.factory.AnalysisEngineFactory.createEngine;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
import org.apache.uima.jcas.cas.FSArray;
import org.apache.uima.jcas.cas.IntegerArray;
import org.apache.uima.jcas.cas.StringArray;
import org.apache.uima.jcas.tcas.Annotation;
import org.apache.uima.resource.ResourceInitializationException;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import dev.tether.candidates.AttachmentCandidateFinder;
import dev.tether.model.LoadedModels;
import dev.tether.type.AttachmentAmbiguity;
import dev.tether.type.AttachmentDecision;
import dev.tether.type.ScoredHead;
import dev.tether.type.Token;

/**
 * The resolver on hand-tagged maintenance-log lines of the invented ferry operator (Tether's own types, tags assigned
 * by hand from the Penn Treebank tag set), with the shipped default model.
 */
class AttachmentResolverTest {
    /** Three prepositional phrases: 'on the port engine', 'with a spare', 'from the stores'. */
    static final String GASKET_LINE = "The/DT engineer/NN replaced/VBD the/DT gasket/NN on/IN the/DT port/JJ engine/NN "
            + "with/IN a/DT spare/NN from/IN the/DT stores/NNS ./.";

    private AnalysisEngine finder;

    @BeforeEach
    void createFinder() throws Exception {
        finder = createEngine(AttachmentCandidateFinder.class);
        RecordingResolver.CREATED.clear();
    }

    @Test
    void everyAmbiguityGetsOneSaneDecisionAmongItsOwnCandidates() throws Exception {
        AnalysisEngine resolver = createEngine(RecordingResolver.class);
        TaggedLogLine line = TaggedLogLine.of(GASKET_LINE);

        finder.process(line.jcas);
        resolver.process(line.jcas);

        List<AttachmentAmbiguity> ambiguities = new ArrayList<>(JCasUtil.select(line.jcas, AttachmentAmbiguity.class));
        List<AttachmentDecision> decisions = new ArrayList<>(JCasUtil.select(line.jcas, AttachmentDecision.class));
        assertEquals(3, ambiguities.size(), "the finder marks on, with, from");
        assertEquals(ambiguities.size(), decisions.size(), "one decision per ambiguity");
        String modelId = RecordingResolver.CREATED.get(0).model().id();
        for (int i = 0; i < decisions.size(); i++) {
            AttachmentDecision d = decisions.get(i);
            AttachmentAmbiguity a = ambiguities.get(i);
            DecisionChecks.assertSane(d);
            assertSame(a.getPreposition(), d.getPreposition(), "preposition token of " + a.getCoveredText());
            assertSame(a.getObject(), d.getObject(), "object token of " + a.getCoveredText());
            assertTrue(contains(a.getCandidates(), d.getHead()), "head among the finder's candidates: " + a.getCoveredText());
            assertSame(line.tokens.get(tokenIndex(line, d.getHead())), d.getHead(), "head is one of the line's tokens");
            assertEquals(modelId, d.getModelId(), "model id recorded with the decision");
            assertEquals(Math.min(5, a.getCandidates().size()), d.getRanking().size(), "default ranking size 5");
        }
        assertEquals(List.of("on", "with", "from"), decisions.stream().map(d -> d.getPreposition().getCoveredText()).toList());
        assertEquals(List.of("engine", "spare", "stores"), decisions.stream().map(d -> d.getObject().getCoveredText()).toList());
    }

    /**
     * A hand-built ambiguity (no finder): the head is chosen among exactly the given candidates; when the ranking keeps
     * every candidate its probabilities sum to 1, and {@code rankingSize} caps it.
     */
    @Test
    void rankingKeepsAllCandidatesOrTheConfiguredNumber() throws Exception {
        String line = "The/DT deckhand/NN secured/VBD the/DT chain/NN locker/NN near/IN the/DT bow/NN ./.";
        TaggedLogLine full = TaggedLogLine.of(line);
        ambiguity(full, "near", "bow", "locker", "chain", "secured", "deckhand");
        createEngine(AttachmentResolver.class).process(full.jcas);
        AttachmentDecision all = JCasUtil.selectSingle(full.jcas, AttachmentDecision.class);
        DecisionChecks.assertSane(all);
        assertEquals(4, all.getRanking().size());
        double sum = 0;
        for (ScoredHead s : all.getRanking()) sum += s.getProbability();
        assertEquals(1.0, sum, 1e-9, "probabilities over all candidates");

        TaggedLogLine capped = TaggedLogLine.of(line);
        ambiguity(capped, "near", "bow", "locker", "chain", "secured", "deckhand");
        createEngine(AttachmentResolver.class, AttachmentResolver.PARAM_RANKING_SIZE, 2).process(capped.jcas);
        AttachmentDecision two = JCasUtil.selectSingle(capped.jcas, AttachmentDecision.class);
        DecisionChecks.assertSane(two);
        assertEquals(2, two.getRanking().size());
        assertEquals(all.getHead().getBegin(), two.getHead().getBegin(), "same choice whatever the ranking size");
        assertEquals(all.getRanking(1).getHead().getBegin(), two.getRanking(1).getHead().getBegin());
    }

    @Test
    void anAmbiguityWithoutCandidatesGetsNoDecision() throws Exception {
        TaggedLogLine line = TaggedLogLine.of("Near/IN the/DT bow/NN ./.");
        ambiguity(line, "Near", "bow");
        createEngine(AttachmentResolver.class).process(line.jcas);
        assertTrue(JCasUtil.select(line.jcas, AttachmentDecision.class).isEmpty());
    }

    @Test
    void aRankingSizeBelowOneIsRefusedNamingTheParameter() {
        ResourceInitializationException e = assertThrows(ResourceInitializationException.class,
                () -> createEngine(AttachmentResolver.class, AttachmentResolver.PARAM_RANKING_SIZE, 0));
        assertTrue(ModelLoadingErrorTest.messageChain(e).contains("rankingSize must be at least 1"),
                ModelLoadingErrorTest.messageChain(e));
    }

    /**
     * Two lines with the same frame, verb - noun - preposition - noun, where the preposition decides.
     * 'of' attaches to the preceding noun in the vast majority of cases (common practice), so "inspected the gasket of
     * the pump" attaches to gasket; "replaced X with Y" names the replacement, so "replaced the gasket with a spare"
     * attaches to the verb (common practice). The shipped model gets both right by a clear margin.
     */
    @Test
    void workedExampleOfAttachesToTheNounWithASpareToTheVerb() throws Exception {
        AnalysisEngine resolver = createEngine(AttachmentResolver.class);

        TaggedLogLine withSpare = TaggedLogLine.of("The/DT engineer/NN replaced/VBD the/DT gasket/NN with/IN a/DT spare/NN ./.");
        finder.process(withSpare.jcas);
        resolver.process(withSpare.jcas);
        AttachmentDecision with = JCasUtil.selectSingle(withSpare.jcas, AttachmentDecision.class);
        assertEquals("replaced", with.getHead().getCoveredText(), with.getEvidence());
        assertEquals("verb", with.getSiteClass());
        assertEquals("gasket", with.getRanking(1).getHead().getCoveredText(), "the noun is the runner-up");

        TaggedLogLine ofPump = TaggedLogLine.of("The/DT engineer/NN inspected/VBD the/DT gasket/NN of/IN the/DT pump/NN ./.");
        finder.process(ofPump.jcas);
        resolver.process(ofPump.jcas);
        AttachmentDecision of = JCasUtil.selectSingle(ofPump.jcas, AttachmentDecision.class);
        assertEquals("gasket", of.getHead().getCoveredText(), of.getEvidence());
        assertEquals("noun", of.getSiteClass());
        assertTrue(of.getMargin() > 0.5, "'of' to the noun is a clear call: margin " + of.getMargin());
    }

    @Test
    void theResolverScoresWithTheModelItWasGiven() throws Exception {
        createEngine(RecordingResolver.class);
        assertSame(LoadedModels.get(LoadedModels.DEFAULT), RecordingResolver.CREATED.get(0).model());
    }

    /** Adds an ambiguity for {@code preposition} with its {@code object} and candidates in the given order (nearest first). */
    private static void ambiguity(TaggedLogLine line, String preposition, String object, String... heads) {
        JCas jcas = line.jcas;
        Token p = line.token(preposition);
        Token o = line.token(object);
        AttachmentAmbiguity a = new AttachmentAmbiguity(jcas, p.getBegin(), o.getEnd());
        a.setPreposition(p);
        a.setObject(o);
        FSArray<Annotation> candidates = new FSArray<>(jcas, heads.length);
        StringArray classes = new StringArray(jcas, heads.length);
        IntegerArray distances = new IntegerArray(jcas, heads.length);
        int at = tokenIndex(line, p);
        for (int i = 0; i < heads.length; i++) {
            Token h = line.token(heads[i]);
            candidates.set(i, h);
            classes.set(i, h.getPos().startsWith("VB") ? "verb" : "noun");
            distances.set(i, at - tokenIndex(line, h));
        }
        a.setCandidates(candidates);
        a.setCandidateClasses(classes);
        a.setCandidateDistances(distances);
        a.addToIndexes();
    }

    private static int tokenIndex(TaggedLogLine line, Annotation token) {
        for (int i = 0; i < line.tokens.size(); i++) {
            if (line.tokens.get(i).getBegin() == token.getBegin()) return i;
        }
        throw new AssertionError("not a token of the line: " + token.getCoveredText());
    }

    private static boolean contains(FSArray<?> candidates, Annotation head) {
        for (int i = 0; i < candidates.size(); i++) {
            if (candidates.get(i) == head) return true;
        }
        return false;
    }
}
