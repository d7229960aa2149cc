package dev.tether.candidates;

import dev.tether.attachment.AttachmentResolver;
import dev.tether.type.AttachmentDecision;
import dev.tether.type.ScoredHead;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.fit.factory.AggregateBuilder;
import org.apache.uima.fit.util.JCasUtil;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.apache.uima.fit.factory.AnalysisEngineFactory.createEngineDescription;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The drop-in of issue 3: finder and resolver together on a CAS typed only with a foreign, test-only host type
 * system (segments, words, and tags on a separate annotation reached by a feature path). Every decision must point
 * at the host's own word annotations.
 */
class HostPipelineDropInTest {
    @Test
    void finderAndResolverDecideOverTheHostsOwnWords() throws Exception {
        HandTaggedText sentence = HandTaggedText.gasketSentence();
        HarbourHostCas host = HarbourHostCas.of(sentence);
        AggregateBuilder flow = new AggregateBuilder();
        flow.add(createEngineDescription(AttachmentCandidateFinder.class,
                AttachmentCandidateFinder.PARAM_SENTENCE_TYPE, HarbourHostCas.SEGMENT,
                AttachmentCandidateFinder.PARAM_TOKEN_TYPE, HarbourHostCas.WORD,
                AttachmentCandidateFinder.PARAM_POS_FEATURE_PATH, HarbourHostCas.TAG_PATH));
        flow.add(createEngineDescription(AttachmentResolver.class, AttachmentResolver.PARAM_MODEL, "default"));
        AnalysisEngine engine = flow.createAggregate();

        engine.process(host.jcas);

        List<AttachmentDecision> decisions = new ArrayList<>(JCasUtil.select(host.jcas, AttachmentDecision.class));
        assertEquals(3, decisions.size(), "one decision per preposition: on, with, from");
        for (AttachmentDecision d : decisions) {
            assertTrue(host.words.contains(d.getPreposition()), "preposition is a host word");
            assertTrue(host.words.contains(d.getObject()), "object is a host word");
            assertTrue(host.words.contains(d.getHead()), "head is a host word");
            assertEquals(HarbourHostCas.WORD, d.getHead().getType().getName());
            assertTrue(d.getHead().getBegin() < d.getPreposition().getBegin(), "every head here precedes its preposition");
            ScoredHead best = (ScoredHead) d.getRanking().get(0);
            assertTrue(best.getHead() == d.getHead(), "the chosen head ranks first");
        }
        engine.destroy();
    }
}
