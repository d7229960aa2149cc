package dev.tether.similarity;

import dev.tether.preprocessing.TextPreprocessor;
import dev.tether.type.Sentence;
import dev.tether.type.Token;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineProcessException;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
import org.apache.uima.resource.ResourceInitializationException;
import org.apache.uima.util.CasCreationUtils;

import java.util.ArrayList;
import java.util.List;

/**
 * Sentences of raw text with Penn Treebank tags, from the built-in preprocessing ({@link TextPreprocessor} with
 * its chunker off, since contexts need tags only). One tagger per thread: it owns its engine and CAS.
 */
public final class RawTextTagger implements AutoCloseable {
    private final AnalysisEngine engine;
    private final JCas jcas;

    /** With {@code lineBreaksEndSentences}, every line break ends a sentence (see {@link TextPreprocessor}). */
    public RawTextTagger(boolean lineBreaksEndSentences) throws ResourceInitializationException {
        engine = AnalysisEngineFactory.createEngine(TextPreprocessor.class, TextPreprocessor.PARAM_CHUNK, false,
                TextPreprocessor.PARAM_LINE_BREAKS_END_SENTENCES, lineBreaksEndSentences);
        try {
            jcas = CasCreationUtils.createCas(engine.getAnalysisEngineMetaData()).getJCas();
        } catch (org.apache.uima.cas.CASException e) {
            throw new ResourceInitializationException(e);
        }
    }

    /** The tagged sentences of {@code text}: for each, its words and their tags. */
    public TaggedText tag(String text) throws AnalysisEngineProcessException {
        jcas.reset();
        jcas.setDocumentLanguage("en");
        jcas.setDocumentText(text);
        engine.process(jcas);
        List<String[]> words = new ArrayList<>();
        List<String[]> tags = new ArrayList<>();
        for (Sentence s : JCasUtil.select(jcas, Sentence.class)) {
            List<Token> tokens = JCasUtil.selectCovered(Token.class, s);
            String[] w = new String[tokens.size()];
            String[] t = new String[tokens.size()];
            for (int i = 0; i < w.length; i++) {
                w[i] = tokens.get(i).getCoveredText();
                t[i] = tokens.get(i).getPos();
            }
            words.add(w);
            tags.add(t);
        }
        return new TaggedText(words, tags);
    }

    @Override
    public void close() {
        engine.destroy();
    }

    /** The sentences of one document: {@code words.get(i)} and {@code tags.get(i)} are the i-th sentence. */
    public record TaggedText(List<String[]> words, List<String[]> tags) {
        public long tokens() {
            long n = 0;
            for (String[] w : words) n += w.length;
            return n;
        }
    }
}
