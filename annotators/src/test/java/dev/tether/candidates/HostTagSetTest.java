package dev.tether.candidates;

import dev.tether.attachment.AttachmentResolver;
import dev.tether.documents.StandardErrorCapture;
import dev.tether.type.AttachmentDecision;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.fit.factory.AggregateBuilder;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.resource.ResourceInitializationException;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.apache.uima.fit.factory.AnalysisEngineFactory.createEngine;
import static org.apache.uima.fit.factory.AnalysisEngineFactory.createEngineDescription;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Host tag sets (issue 7): a host whose tagger writes Universal Dependencies UPOS tags gets the decisions it would
 * get with Penn Treebank tags, and tags from neither set give one warning per document that names the feature path
 * and shows the tags seen. The UD tagging of the sentence follows the UD v2 guidelines for English (determiners
 * DET, the prepositions ADP, "port" as an adjectival modifier ADJ, the full stop PUNCT).
 */
class HostTagSetTest {
    private static final HandTaggedText PENN = HandTaggedText.gasketSentence();
    private static final HandTaggedText UD = new HandTaggedText("The/DET engineer/NOUN replaced/VERB the/DET "
            + "gasket/NOUN on/ADP the/DET port/ADJ engine/NOUN with/ADP a/DET spare/NOUN from/ADP the/DET stores/NOUN ./PUNCT");
    /** An invented host tag set that is neither Penn nor UD. */
    private static final HandTaggedText OTHER = new HandTaggedText("The/ART engineer/SUBST replaced/VFIN the/ART "
            + "gasket/SUBST on/PRAEP the/ART port/ADJA engine/SUBST with/PRAEP a/ART spare/SUBST from/PRAEP the/ART stores/SUBST ./SENT");

    private static List<String> decide(HandTaggedText sentence, String tagset) throws Exception {
        AggregateBuilder flow = new AggregateBuilder();
        flow.add(createEngineDescription(AttachmentCandidateFinder.class, AttachmentCandidateFinder.PARAM_TAGSET, tagset));
        flow.add(createEngineDescription(AttachmentResolver.class));
        AnalysisEngine engine = flow.createAggregate();
        TetherTypedCas cas = TetherTypedCas.of(sentence);
        engine.process(cas.jcas);
        return JCasUtil.select(cas.jcas, AttachmentDecision.class).stream()
                .map(d -> d.getPreposition().getCoveredText() + "->" + d.getHead().getCoveredText()).toList();
    }

    @Test
    void universalTagsGiveTheDecisionsOfPennTags() throws Exception {
        List<String> penn = decide(PENN, "penn");
        assertEquals(3, penn.size(), penn::toString);
        assertEquals(penn, decide(UD, "ud"));
        assertEquals(penn, decide(UD, "auto"));
        assertEquals(penn, decide(PENN, "auto"));
    }

    @Test
    void tagsOfNeitherSetWarnOncePerDocumentNamingTheFeaturePathAndTheTags() throws Exception {
        String log = StandardErrorCapture.during(() -> assertEquals(List.of(), decide(OTHER, "auto")));
        assertEquals(1, StandardErrorCapture.count(log, "are mostly not"), log);
        assertTrue(log.contains("feature path 'pos'"), log);
        assertTrue(log.contains("ART") && log.contains("SUBST"), "examples of the tags seen: " + log);
        String quiet = StandardErrorCapture.during(() -> decide(UD, "auto"));
        assertFalse(quiet.contains("are mostly not"), quiet);
        String named = StandardErrorCapture.during(() -> decide(UD, "penn"));
        assertTrue(named.contains("not from the PENN tag set"), "UD tags where Penn tags were configured: " + named);
    }

    @Test
    void tagsetParameterTakesPennUdOrAuto() {
        ResourceInitializationException e = assertThrows(ResourceInitializationException.class,
                () -> createEngine(AttachmentCandidateFinder.class, AttachmentCandidateFinder.PARAM_TAGSET, "brown"));
        StringBuilder messages = new StringBuilder();
        for (Throwable t = e; t != null; t = t.getCause()) messages.append(t.getMessage()).append('\n');
        assertTrue(messages.toString().contains("tagset") && messages.toString().contains("'brown'"), messages::toString);
    }

    /** Pairs from the UD project's English Penn-to-UPOS conversion table (universaldependencies.org, tagset conversion). */
    @Test
    void universalTagsMapToTheirPennCounterparts() {
        String[][] pairs = {{"NOUN", "pump", "NN"}, {"PROPN", "Kittiwake", "NNP"}, {"ADP", "with", "IN"},
                {"SCONJ", "because", "IN"}, {"PART", "to", "TO"}, {"PART", "'s", "POS"}, {"AUX", "should", "MD"},
                {"AUX", "was", "VB"}, {"NUM", "14", "CD"}, {"PUNCT", ".", "."}, {"PUNCT", ",", ","}, {"SYM", "$", "$"}};
        for (String[] p : pairs) assertEquals(p[2], TagSet.UD.toPenn(p[0], p[1]), () -> p[0] + " " + p[1]);
        assertEquals("VBD", TagSet.PENN.toPenn("VBD", "replaced"));
    }
}
