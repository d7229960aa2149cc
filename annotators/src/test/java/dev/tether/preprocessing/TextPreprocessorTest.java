package dev.tether.preprocessing;

import static org.apache.uima.fit.factory.AnalysisEngineFactory.createEngine;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
import org.apache.uima.resource.ResourceInitializationException;
import org.junit.jupiter.api.Test;

import dev.tether.type.Chunk;
import dev.tether.type.Sentence;
import dev.tether.type.Token;

/** Built-in preprocessing on invented maintenance-log text of a fictional ferry operator. */
class TextPreprocessorTest {

    /**
     * The 45 tags of the Penn Treebank tag set (Marcus, Santorini and Marcinkiewicz 1993, table 2), which the
     * OpenNLP 1.5 English models emit. Universal Dependencies tags (NOUN, VERB, ADP...) are not among them.
     */
    static final Set<String> PENN_TREEBANK_TAGS = Set.of("CC", "CD", "DT", "EX", "FW", "IN", "JJ", "JJR", "JJS",
            "LS", "MD", "NN", "NNS", "NNP", "NNPS", "PDT", "POS", "PRP", "PRP$", "RB", "RBR", "RBS", "RP", "SYM", "TO",
            "UH", "VB", "VBD", "VBG", "VBN", "VBP", "VBZ", "WDT", "WP", "WP$", "WRB", "#", "$", ".", ",", ":", "(", ")",
            "``", "''", "-LRB-", "-RRB-");

    @Test
    void writesSentencesPennTaggedTokensAndChunks() throws Exception {
        AnalysisEngine preprocessor = createEngine(TextPreprocessor.class, TextPreprocessor.PARAM_CHUNK, true);
        JCas jcas = preprocessor.newJCas();
        jcas.setDocumentText("The engineer replaced the gasket on the port engine with a spare from the stores. "
                + "The deckhand checked the bilge pump before departure.");

        preprocessor.process(jcas);

        List<Sentence> sentences = new ArrayList<>(JCasUtil.select(jcas, Sentence.class));
        assertEquals(2, sentences.size());
        assertEquals("The deckhand checked the bilge pump before departure.", sentences.get(1).getCoveredText());

        List<Token> first = JCasUtil.selectCovered(Token.class, sentences.get(0));
        assertEquals(List.of("The", "engineer", "replaced", "the", "gasket", "on", "the", "port", "engine", "with",
                "a", "spare", "from", "the", "stores", "."), first.stream().map(Token::getCoveredText).toList());
        for (Token token : JCasUtil.select(jcas, Token.class)) {
            assertTrue(PENN_TREEBANK_TAGS.contains(token.getPos()),
                    "Penn Treebank tag for '" + token.getCoveredText() + "': " + token.getPos());
        }
        Map<String, String> tagOf = first.stream()
                .collect(Collectors.toMap(Token::getCoveredText, Token::getPos, (a, b) -> a));
        // Unambiguous words of the sentence, tagged as in the Penn Treebank guidelines (Santorini 1990).
        assertEquals("VBD", tagOf.get("replaced"));
        assertEquals("IN", tagOf.get("on"));
        assertEquals("IN", tagOf.get("with"));
        assertEquals("NN", tagOf.get("gasket"));
        assertEquals("NNS", tagOf.get("stores"));

        List<String> chunks = JCasUtil.selectCovered(Chunk.class, sentences.get(0)).stream()
                .map(c -> c.getLabel() + ":" + c.getCoveredText()).toList();
        assertTrue(chunks.contains("NP:the gasket"), chunks.toString());
        assertTrue(chunks.contains("PP:on"), chunks.toString());
        assertTrue(chunks.contains("VP:replaced"), chunks.toString());
    }

    @Test
    void chunksOnlyWhenAskedAndSentencesAndTagsAreTheSameEitherWay() throws Exception {
        String text = "The engineer replaced the gasket on the port engine with a spare from the stores. "
                + "The deckhand checked the bilge pump before departure.";
        AnalysisEngine withChunks = createEngine(TextPreprocessor.class, TextPreprocessor.PARAM_CHUNK, true);
        AnalysisEngine withoutChunks = createEngine(TextPreprocessor.class); // the default: no chunker
        JCas a = withChunks.newJCas();
        a.setDocumentText(text);
        withChunks.process(a);
        JCas b = withoutChunks.newJCas();
        b.setDocumentText(text);
        withoutChunks.process(b);

        assertTrue(JCasUtil.select(b, Chunk.class).isEmpty());
        assertFalse(JCasUtil.select(a, Chunk.class).isEmpty());
        assertEquals(2, JCasUtil.select(b, Sentence.class).size());
        List<String> tagged = JCasUtil.select(a, Token.class).stream().map(t -> t.getCoveredText() + "/" + t.getPos()).toList();
        assertEquals(tagged, JCasUtil.select(b, Token.class).stream().map(t -> t.getCoveredText() + "/" + t.getPos()).toList());
    }

    @Test
    void theLibrarysTaggerAndTethersDecoderWriteTheSameTags() throws Exception {
        // The word-for-word check over UD English EWT is MemoizedBeamTaggerEwtTest (test-corpora); this one checks
        // that the parameter picks the decoder and that both write the same CAS.
        String text = "The engineer replaced the gasket on the port engine with a spare from the stores. "
                + "Seals and bearings on the bow thruster were worn, so the crew ordered new ones before the crossing.";
        List<String> byTether = tagged(createEngine(TextPreprocessor.class), text);
        List<String> byLibrary = tagged(createEngine(TextPreprocessor.class, TextPreprocessor.PARAM_LIBRARY_TAGGER, true), text);
        assertEquals(byLibrary, byTether);
        assertTrue(byTether.contains("gasket/NN") && byTether.contains("replaced/VBD"), byTether.toString());
    }

    private static List<String> tagged(AnalysisEngine engine, String text) throws Exception {
        JCas jcas = engine.newJCas();
        jcas.setDocumentText(text);
        engine.process(jcas);
        return JCasUtil.select(jcas, Token.class).stream().map(t -> t.getCoveredText() + "/" + t.getPos()).toList();
    }

    @Test
    void emptyAndBlankDocumentsProduceNothing() throws Exception {
        AnalysisEngine preprocessor = createEngine(TextPreprocessor.class);
        for (String text : new String[] {"", " \n\t  \n"}) {
            JCas jcas = preprocessor.newJCas();
            jcas.setDocumentText(text);
            preprocessor.process(jcas);
            assertTrue(JCasUtil.select(jcas, Sentence.class).isEmpty());
            assertTrue(JCasUtil.select(jcas, Token.class).isEmpty());
            assertTrue(JCasUtil.select(jcas, Chunk.class).isEmpty());
        }
    }

    @Test
    void fiftyThousandTokensWithoutPunctuationAreTaggedInBoundedWindows() throws Exception {
        String[] words = {"crew", "checked", "the", "valve", "on", "deck", "with", "a", "wrench", "near", "hull"};
        StringBuilder text = new StringBuilder();
        for (int i = 0; i < 50_000; i++) {
            text.append(words[i % words.length]).append(' ');
        }
        int window = 300;
        AnalysisEngine preprocessor = createEngine(TextPreprocessor.class,
                TextPreprocessor.PARAM_MAX_SENTENCE_TOKENS, window, TextPreprocessor.PARAM_CHUNK, true);
        JCas jcas = preprocessor.newJCas();
        jcas.setDocumentText(text.toString());

        preprocessor.process(jcas);

        assertEquals(50_000, JCasUtil.select(jcas, Token.class).size(), "no token dropped");
        List<Sentence> sentences = new ArrayList<>(JCasUtil.select(jcas, Sentence.class));
        assertEquals((50_000 + window - 1) / window, sentences.size());
        for (Sentence sentence : sentences) {
            assertTrue(JCasUtil.selectCovered(Token.class, sentence).size() <= window);
        }
        for (Chunk chunk : JCasUtil.select(jcas, Chunk.class)) {
            assertTrue(JCasUtil.selectCovered(Token.class, chunk).size() <= window);
        }
    }

    @Test
    void engineInstancesShareOneSetOfModels() throws Exception {
        createEngine(TextPreprocessor.class);
        EnglishPreprocessingModels first = EnglishPreprocessingModels.shared();
        createEngine(TextPreprocessor.class);
        assertSame(first, EnglishPreprocessingModels.shared());
    }

    @Test
    void windowOfNoTokensIsRejectedNamingTheParameter() {
        ResourceInitializationException e = assertThrows(ResourceInitializationException.class,
                () -> createEngine(TextPreprocessor.class, TextPreprocessor.PARAM_MAX_SENTENCE_TOKENS, 0));
        // UIMA reports "Initialization of annotator class ... failed" with the engine's own exception as the cause.
        StringBuilder messages = new StringBuilder();
        for (Throwable t = e; t != null; t = t.getCause()) messages.append(t.getMessage()).append('\n');
        assertTrue(messages.toString().contains("Parameter " + TextPreprocessor.PARAM_MAX_SENTENCE_TOKENS),
                messages.toString());
    }

    /** The covered texts of the sentences that {@code preprocessor} finds in {@code text}. */
    private static List<String> sentenceTexts(AnalysisEngine preprocessor, String text) throws Exception {
        JCas jcas = preprocessor.newJCas();
        jcas.setDocumentText(text);
        preprocessor.process(jcas);
        return JCasUtil.select(jcas, Sentence.class).stream().map(Sentence::getCoveredText).toList();
    }

    @Test
    void lineBreaksAreSpacesUnlessTheyAreAskedToEndSentences() throws Exception {
        // Log entries one per line, without final punctuation.
        String text = "Replaced the impeller on the bilge pump\nChecked the seals with the chief engineer\n"
                + "Found oil in the bilge near the gearbox\n";
        assertEquals(List.of(text.strip()), sentenceTexts(createEngine(TextPreprocessor.class), text));
        AnalysisEngine byLine = createEngine(TextPreprocessor.class, TextPreprocessor.PARAM_LINE_BREAKS_END_SENTENCES, true);
        JCas jcas = byLine.newJCas();
        jcas.setDocumentText(text);
        byLine.process(jcas);
        List<Sentence> sentences = new ArrayList<>(JCasUtil.select(jcas, Sentence.class));
        assertEquals(List.of("Replaced the impeller on the bilge pump", "Checked the seals with the chief engineer",
                "Found oil in the bilge near the gearbox"), sentences.stream().map(Sentence::getCoveredText).toList());
        assertEquals(40, sentences.get(1).getBegin());
        assertEquals(82, sentences.get(2).getBegin());
        for (Sentence s : sentences) {
            List<Token> tokens = JCasUtil.selectCovered(Token.class, s);
            assertEquals(s.getBegin(), tokens.get(0).getBegin());
            assertEquals(s.getEnd(), tokens.get(tokens.size() - 1).getEnd());
        }
    }

    @Test
    void everyKindOfLineBreakEndsASentenceAndALineStillSplitsAtItsOwnPunctuation() throws Exception {
        AnalysisEngine byLine = createEngine(TextPreprocessor.class, TextPreprocessor.PARAM_LINE_BREAKS_END_SENTENCES, true);
        String text = "Replaced the seal. Checked the pump on deck\r\n\r\n   \r\nFound a leak\rLogged it\u0085"
                + "Fitted a spare \uD83D\uDD27 on the pump\u2028Tested the alarm\u2029Closed the valve";
        assertEquals(List.of("Replaced the seal.", "Checked the pump on deck", "Found a leak", "Logged it",
                "Fitted a spare \uD83D\uDD27 on the pump", "Tested the alarm", "Closed the valve"), sentenceTexts(byLine, text));
        assertEquals(List.of(), sentenceTexts(byLine, "\n\r\n  \n"));
    }

    @Test
    void anOverLongLineIsStillCutIntoWindows() throws Exception {
        AnalysisEngine byLine = createEngine(TextPreprocessor.class, TextPreprocessor.PARAM_LINE_BREAKS_END_SENTENCES, true,
                TextPreprocessor.PARAM_MAX_SENTENCE_TOKENS, 4);
        assertEquals(List.of("checked the pump on", "the port engine", "Logged it"),
                sentenceTexts(byLine, "checked the pump on the port engine\nLogged it"));
    }
}
