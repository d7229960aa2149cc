package dev.tether.candidates;

import static org.apache.uima.fit.factory.AnalysisEngineFactory.createEngine;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineProcessException;
import org.apache.uima.fit.factory.JCasFactory;
import org.apache.uima.jcas.JCas;
import org.apache.uima.resource.ResourceInitializationException;
import org.junit.jupiter.api.Test;

import dev.tether.type.Sentence;
import dev.tether.type.Token;

/**
 * Misconfigured types and missing upstream annotations fail with a message naming the type or feature and the
 * parameter to set (DESIGN: "Missing upstream annotations: an error naming the type and the parameter that maps it").
 */
class AttachmentCandidateFinderInputErrorTest {

    @Test
    void unknownSentenceTypeNamesTheTypeAndTheParameter() throws Exception {
        String message = failureOnHarbourCas(HarbourHostCas.SEGMENT.replace("Segment", "Sentence"),
                HarbourHostCas.WORD, HarbourHostCas.TAG_PATH);
        assertMentions(message, "org.example.harbour.Sentence", AttachmentCandidateFinder.PARAM_SENTENCE_TYPE);
    }

    @Test
    void unknownTokenTypeNamesTheTypeAndTheParameter() throws Exception {
        String message = failureOnHarbourCas(HarbourHostCas.SEGMENT, "org.example.harbour.Token", HarbourHostCas.TAG_PATH);
        assertMentions(message, "org.example.harbour.Token", AttachmentCandidateFinder.PARAM_TOKEN_TYPE);
    }

    @Test
    void sentenceTypeThatIsNotAnAnnotationIsRejected() throws Exception {
        String message = failureOnHarbourCas("uima.cas.TOP", HarbourHostCas.WORD, HarbourHostCas.TAG_PATH);
        assertMentions(message, "uima.cas.TOP", AttachmentCandidateFinder.PARAM_SENTENCE_TYPE, "not an annotation type");
    }

    @Test
    void missingFeatureOnThePathNamesTheTypeTheFeatureAndTheParameter() throws Exception {
        String message = failureOnHarbourCas(HarbourHostCas.SEGMENT, HarbourHostCas.WORD, "posTag/tag");
        assertMentions(message, HarbourHostCas.WORD_CATEGORY, "'tag'", AttachmentCandidateFinder.PARAM_POS_FEATURE_PATH);
    }

    @Test
    void pathEndingOnAnAnnotationInsteadOfAStringIsRejected() throws Exception {
        String message = failureOnHarbourCas(HarbourHostCas.SEGMENT, HarbourHostCas.WORD, "posTag");
        assertMentions(message, HarbourHostCas.WORD + ":posTag", "not a string",
                AttachmentCandidateFinder.PARAM_POS_FEATURE_PATH);
    }

    @Test
    void pathContinuingPastAStringIsRejected() throws Exception {
        String message = failureOnHarbourCas(HarbourHostCas.SEGMENT, HarbourHostCas.WORD, "lemma/value");
        assertMentions(message, HarbourHostCas.WORD + ":lemma", "uima.cas.String",
                AttachmentCandidateFinder.PARAM_POS_FEATURE_PATH);
    }

    @Test
    void documentWithoutSentencesNamesTheSentenceTypeAndTheParameter() throws Exception {
        JCas jcas = JCasFactory.createJCas();
        jcas.setDocumentText("Deckhand greased the ramp hinges.");
        new Token(jcas, 0, 8).addToIndexes();
        String message = processFailure(createEngine(AttachmentCandidateFinder.class), jcas);
        assertMentions(message, Sentence.class.getName(), AttachmentCandidateFinder.PARAM_SENTENCE_TYPE,
                "Deckhand greased");
    }

    @Test
    void documentWithoutTokensNamesTheTokenTypeAndTheParameter() throws Exception {
        JCas jcas = JCasFactory.createJCas();
        jcas.setDocumentText("Deckhand greased the ramp hinges.");
        new Sentence(jcas, 0, 33).addToIndexes();
        String message = processFailure(createEngine(AttachmentCandidateFinder.class), jcas);
        assertMentions(message, Token.class.getName(), AttachmentCandidateFinder.PARAM_TOKEN_TYPE);
    }

    @Test
    void documentWithoutTagsNamesTheFeaturePathAndTheParameter() throws Exception {
        JCas jcas = JCasFactory.createJCas();
        jcas.setDocumentText("Deckhand greased the ramp hinges.");
        new Sentence(jcas, 0, 33).addToIndexes();
        new Token(jcas, 0, 8).addToIndexes();
        new Token(jcas, 9, 16).addToIndexes();
        String message = processFailure(createEngine(AttachmentCandidateFinder.class), jcas);
        assertMentions(message, "'pos'", Token.class.getName(), AttachmentCandidateFinder.PARAM_POS_FEATURE_PATH);
    }

    @Test
    void windowShorterThanAPrepositionAndItsObjectIsRejected() {
        ResourceInitializationException e = assertThrows(ResourceInitializationException.class, () ->
                createEngine(AttachmentCandidateFinder.class, AttachmentCandidateFinder.PARAM_MAX_SENTENCE_TOKENS, 1));
        assertMentions(messages(e), "Parameter " + AttachmentCandidateFinder.PARAM_MAX_SENTENCE_TOKENS, "at least 2");
    }

    private static String failureOnHarbourCas(String sentenceType, String tokenType, String tagPath) throws Exception {
        HarbourHostCas host = HarbourHostCas.of(HandTaggedText.gasketSentence());
        AnalysisEngine finder = createEngine(AttachmentCandidateFinder.class,
                AttachmentCandidateFinder.PARAM_SENTENCE_TYPE, sentenceType,
                AttachmentCandidateFinder.PARAM_TOKEN_TYPE, tokenType,
                AttachmentCandidateFinder.PARAM_POS_FEATURE_PATH, tagPath);
        return processFailure(finder, host.jcas);
    }

    private static String processFailure(AnalysisEngine engine, JCas jcas) {
        AnalysisEngineProcessException e = assertThrows(AnalysisEngineProcessException.class, () -> engine.process(jcas));
        return e.getMessage();
    }

    /**
     * The messages of an exception and its causes. UIMA reports an initialization failure as "Initialization of
     * annotator class ... failed" and keeps the engine's own exception, with its message, as the cause.
     */
    static String messages(Throwable e) {
        StringBuilder all = new StringBuilder();
        for (Throwable t = e; t != null; t = t.getCause()) {
            all.append(t.getMessage()).append('\n');
        }
        return all.toString();
    }

    private static void assertMentions(String message, String... parts) {
        for (String part : parts) {
            assertTrue(message.contains(part), "message names " + part + ":\n" + message);
        }
    }
}
