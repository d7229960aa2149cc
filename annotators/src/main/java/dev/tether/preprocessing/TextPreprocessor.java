package dev.tether.preprocessing;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import java.util.function.UnaryOperator;

import org.apache.uima.UimaContext;
import org.apache.uima.analysis_engine.AnalysisEngineProcessException;
import org.apache.uima.fit.component.JCasAnnotator_ImplBase;
import org.apache.uima.fit.descriptor.ConfigurationParameter;
import org.apache.uima.fit.descriptor.ExternalResource;
import org.apache.uima.fit.descriptor.ResourceMetaData;
import org.apache.uima.fit.descriptor.TypeCapability;
import org.apache.uima.jcas.JCas;
import org.apache.uima.resource.ResourceInitializationException;
import org.apache.uima.util.Level;

import dev.tether.documents.DocumentLabel;
import dev.tether.model.LoadedModels;
import dev.tether.model.ModelHolder;
import dev.tether.model.TetherModel;
import dev.tether.type.Chunk;
import dev.tether.type.Sentence;
import dev.tether.type.Token;
import opennlp.tools.chunker.ChunkerME;
import opennlp.tools.postag.POSModel;
import opennlp.tools.postag.POSTagFormat;
import opennlp.tools.postag.POSTaggerME;
import opennlp.tools.sentdetect.SentenceDetectorME;
import opennlp.tools.tokenize.TokenizerME;
import opennlp.tools.util.Span;

/**
 * Built-in preprocessing for raw text: sentences, tokens with Penn Treebank part-of-speech tags, and base chunks,
 * written as {@link Sentence}, {@link Token} and {@link Chunk}. Uses the English OpenNLP models shared by the
 * process ({@link EnglishPreprocessingModels}); the OpenNLP tools themselves belong to this engine instance.
 *
 * <p><b>Tagger.</b> A Tether model trained from a treebank carries a part-of-speech tagger of its own (its
 * {@code tagger} section, see {@link ModelTaggers}). The preprocessor tags with the tagger of the model the pipeline
 * resolves with, bound as the shared resource {@link #RES_MODEL} or named by {@link #PARAM_MODEL}, and with the
 * shipped OpenNLP tagger when that model has none. Either way the tags are Penn Treebank tags.
 *
 * <p><b>Over-long sentences.</b> OpenNLP's taggers search a beam over the whole sequence they are given, and their
 * cost grows faster than the sentence length. A stretch of text without sentence punctuation (a table dump, a
 * 50,000-word log line) is therefore cut into consecutive windows of at most {@link #PARAM_MAX_SENTENCE_TOKENS}
 * tokens; each window is tagged, chunked and written as its own {@link Sentence}, and a warning is logged. No text
 * is dropped. Empty and blank documents produce no annotations.
 *
 * <p><b>Line breaks.</b> By default a line break is white space like any other and OpenNLP's sentence detector
 * decides where sentences end, so prose wrapped at a fixed width reads as whole sentences; a line without final
 * punctuation then runs on into the next. Text written one entry per line (a maintenance log, a list of findings, a
 * clinical note of short lines) wants {@link #PARAM_LINE_BREAKS_END_SENTENCES}: every line break (LF, CRLF, CR, NEL,
 * U+2028, U+2029) ends a sentence, and the detector still splits each line where it finds sentence punctuation.
 */
@ResourceMetaData(name = "Tether text preprocessor",
        description = "Sentences, Penn Treebank tagged tokens and chunks from raw English text (OpenNLP).")
@TypeCapability(outputs = {"dev.tether.type.Sentence", "dev.tether.type.Token", "dev.tether.type.Token:pos",
        "dev.tether.type.Chunk", "dev.tether.type.Chunk:label"})
public class TextPreprocessor extends JCasAnnotator_ImplBase {

    /**
     * Largest number of tokens tagged as one sequence. A longer sentence is written as several consecutive
     * {@link Sentence} annotations of at most this many tokens each, with a warning. Edited English sentences rarely
     * exceed 100 tokens (common practice), so the default of 300 only affects text without sentence punctuation.
     */
    public static final String PARAM_MAX_SENTENCE_TOKENS = "maxSentenceTokens";
    @ConfigurationParameter(name = PARAM_MAX_SENTENCE_TOKENS, mandatory = true, defaultValue = "300")
    private int maxSentenceTokens;

    /**
     * Whether every line break ends a sentence (off by default: line breaks are spaces and the sentence detector
     * decides). For text written one entry per line, where an entry often lacks final punctuation.
     */
    public static final String PARAM_LINE_BREAKS_END_SENTENCES = "lineBreaksEndSentences";
    @ConfigurationParameter(name = PARAM_LINE_BREAKS_END_SENTENCES, mandatory = true, defaultValue = "false")
    private boolean lineBreaksEndSentences;

    /** Resource bundle of this engine's exception messages (UIMA exceptions take their message from a bundle). */
    private static final String MESSAGES = "dev.tether.preprocessing.PreprocessorMessages";

    /**
     * Whether to write base chunks. Off by default: Tether's own engines do not read them, and the chunker takes
     * most of the preprocessing time. Switch it on for a later stage that reads {@link Chunk}s.
     */
    public static final String PARAM_CHUNK = "chunk";
    @ConfigurationParameter(name = PARAM_CHUNK, mandatory = true, defaultValue = "false")
    private boolean chunk;

    /**
     * The Tether model whose tagger tags the text: {@code default} for the shipped model, or the path of a model
     * file. A model without a tagger leaves the shipped OpenNLP tagger in use. Ignored when {@link #RES_MODEL} is bound.
     */
    public static final String PARAM_MODEL = "model";
    @ConfigurationParameter(name = PARAM_MODEL, mandatory = false, defaultValue = LoadedModels.DEFAULT)
    private String modelLocation;

    /**
     * Tag with OpenNLP's own {@code POSTaggerME} instead of {@link MemoizedBeamTagger}, which gives the same tags at
     * less cost; for comparison, and used anyway for a part-of-speech model that is not a maximum entropy model.
     */
    public static final String PARAM_LIBRARY_TAGGER = "libraryTagger";
    @ConfigurationParameter(name = PARAM_LIBRARY_TAGGER, mandatory = true, defaultValue = "false")
    private boolean libraryTagger;

    /**
     * Tokenize with OpenNLP's own {@code TokenizerME} instead of {@link MemoizedTokenizer}, which gives the same spans at
     * less cost; for comparison.
     */
    public static final String PARAM_LIBRARY_TOKENIZER = "libraryTokenizer";
    @ConfigurationParameter(name = PARAM_LIBRARY_TOKENIZER, mandatory = true, defaultValue = "false")
    private boolean libraryTokenizer;

    /** Key of the optional shared model resource ({@link ModelHolder}), the same one the resolver binds. */
    public static final String RES_MODEL = "sharedModel";
    @ExternalResource(key = RES_MODEL, mandatory = false)
    private ModelHolder sharedModel;

    private SentenceDetectorME sentenceDetector;
    private Function<String, Span[]> tokenizer;
    private UnaryOperator<String[]> tagger;
    private ChunkerME chunker;

    private long documents;
    private long sentencesWritten;
    private long tokensWritten;
    private long sentencesSplit;

    @Override
    public void initialize(UimaContext context) throws ResourceInitializationException {
        super.initialize(context);
        if (maxSentenceTokens < 1) {
            throw new ResourceInitializationException(MESSAGES, "problem", new Object[] {
                    "Parameter " + PARAM_MAX_SENTENCE_TOKENS + " of " + getClass().getSimpleName()
                            + " must be at least 1, was " + maxSentenceTokens});
        }
        EnglishPreprocessingModels models;
        try {
            models = EnglishPreprocessingModels.shared();
        } catch (IOException e) {
            throw new ResourceInitializationException(MESSAGES, "problem", new Object[] {e.getMessage()}, e);
        }
        POSModel posModel;
        try {
            TetherModel model = sharedModel != null ? sharedModel.model() : LoadedModels.get(modelLocation);
            posModel = ModelTaggers.of(model).orElse(models.posModel());
            getLogger().log(Level.CONFIG, "text preprocessor tags with " + (posModel == models.posModel()
                    ? "the shipped OpenNLP tagger " + EnglishPreprocessingModels.POS_MODEL
                    : "the tagger of model " + model.id()));
        } catch (IOException e) {
            throw new ResourceInitializationException(MESSAGES, "problem", new Object[] {
                    "cannot set up the tagger of the model given by parameter " + PARAM_MODEL + ": " + e.getMessage()}, e);
        }
        sentenceDetector = new SentenceDetectorME(models.sentenceModel());
        // OpenNLP's tokenizer, each distinct white-space token asked once (the same spans; see MemoizedTokenizer).
        tokenizer = libraryTokenizer ? new TokenizerME(models.tokenizerModel())::tokenizePos
                : new MemoizedTokenizer(models.tokenizerModel())::tokenizePos;
        // The model's own Penn Treebank tags, as OpenNLP's POSTaggerME gives them with POSTagFormat.PENN (its default
        // maps them to Universal Dependencies tags, which the 1.5 chunker model was not trained on), decoded at less cost.
        if (libraryTagger || !MemoizedBeamTagger.decodes(posModel)) {
            POSTaggerME library = new POSTaggerME(posModel, POSTagFormat.PENN);
            tagger = library::tag;
        } else {
            tagger = new MemoizedBeamTagger(posModel)::tag;
        }
        chunker = chunk ? new ChunkerME(models.chunkerModel()) : null;
    }

    @Override
    public void process(JCas jcas) throws AnalysisEngineProcessException {
        documents++;
        String text = jcas.getDocumentText();
        if (text == null || text.isBlank()) {
            return;
        }
        for (Span sentence : sentences(text)) {
            String sentenceText = sentence.getCoveredText(text).toString();
            Span[] tokens = CodePointSpans.align(tokenizer.apply(sentenceText), sentenceText);
            if (tokens.length == 0) {
                continue;
            }
            int offset = sentence.getStart();
            if (tokens.length > maxSentenceTokens) {
                sentencesSplit++;
                int windows = (tokens.length + maxSentenceTokens - 1) / maxSentenceTokens;
                getLogger().log(Level.WARNING, "Sentence at characters " + sentence.getStart() + "-"
                        + sentence.getEnd() + " of " + DocumentLabel.of(jcas.getCas()) + " has " + tokens.length
                        + " tokens, more than " + PARAM_MAX_SENTENCE_TOKENS + "=" + maxSentenceTokens + "; it is tagged and written as " + windows
                        + " consecutive sentences of at most " + maxSentenceTokens + " tokens");
            }
            for (int start = 0; start < tokens.length; start += maxSentenceTokens) {
                int end = Math.min(tokens.length, start + maxSentenceTokens);
                annotateWindow(jcas, sentenceText, offset, tokens, start, end);
            }
        }
    }

    /** The sentences of {@code text}, as the detector finds them in the whole text or in each line. */
    private Span[] sentences(String text) {
        if (!lineBreaksEndSentences) return CodePointSpans.align(sentenceDetector.sentPosDetect(text), text);
        List<Span> all = new ArrayList<>();
        int start = 0;
        while (start < text.length()) {
            int end = start;
            while (end < text.length() && !isLineBreak(text.charAt(end))) end++;
            if (end > start) {
                String line = text.substring(start, end);
                for (Span s : CodePointSpans.align(sentenceDetector.sentPosDetect(line), line)) {
                    all.add(new Span(start + s.getStart(), start + s.getEnd()));
                }
            }
            start = end + 1; // CRLF: the LF is an empty line of its own, which gives no sentence
        }
        return all.toArray(new Span[0]);
    }

    /** LF, CR, NEL and the Unicode line and paragraph separators. */
    static boolean isLineBreak(char c) {
        return c == '\n' || c == '\r' || c == '\u0085' || c == '\u2028' || c == '\u2029';
    }

    /** Tags, chunks and writes tokens {@code [start, end)} of one sentence as one {@link Sentence}. */
    private void annotateWindow(JCas jcas, String sentenceText, int offset, Span[] tokens, int start, int end) {
        int n = end - start;
        String[] words = new String[n];
        Token[] written = new Token[n];
        for (int i = 0; i < n; i++) {
            words[i] = tokens[start + i].getCoveredText(sentenceText).toString();
        }
        String[] tags = tagger.apply(words);
        for (int i = 0; i < n; i++) {
            Span span = tokens[start + i];
            Token token = new Token(jcas, offset + span.getStart(), offset + span.getEnd());
            token.setPos(tags[i]);
            token.addToIndexes();
            written[i] = token;
        }
        if (chunker != null) {
            for (Span chunkSpan : chunker.chunkAsSpans(words, tags)) {
                Chunk chunk = new Chunk(jcas, written[chunkSpan.getStart()].getBegin(),
                        written[chunkSpan.getEnd() - 1].getEnd());
                chunk.setLabel(chunkSpan.getType());
                chunk.addToIndexes();
            }
        }
        new Sentence(jcas, written[0].getBegin(), written[n - 1].getEnd()).addToIndexes();
        sentencesWritten++;
        tokensWritten += n;
    }

    @Override
    public void collectionProcessComplete() throws AnalysisEngineProcessException {
        super.collectionProcessComplete();
        getLogger().log(Level.INFO, "Preprocessed " + documents + " documents: " + sentencesWritten + " sentences, "
                + tokensWritten + " tokens; " + sentencesSplit + " over-long sentences split into windows of "
                + maxSentenceTokens + " tokens");
    }
}
