package dev.tether.preprocessing;

import java.io.IOException;
import java.io.InputStream;

import opennlp.tools.chunker.ChunkerModel;
import opennlp.tools.postag.POSModel;
import opennlp.tools.sentdetect.SentenceModel;
import opennlp.tools.tokenize.TokenizerModel;

/**
 * The four English OpenNLP models of the built-in preprocessing (sentence, token, part-of-speech, chunk), read from
 * the classpath once per process. OpenNLP models are immutable and may be shared by any number of threads; the
 * {@code *ME} tools built on them are not, so each engine instance creates its own.
 *
 * <p>The models come from the Maven Central artifacts {@code edu.washington.cs.knowitall:opennlp-*-models:1.5},
 * which hold them at the root of the jar. Their part-of-speech tags are those of the Penn Treebank tag set
 * (Marcus et al. 1993).
 */
public final class EnglishPreprocessingModels {

    /** Classpath location of the sentence model (artifact {@code opennlp-sent-models}). */
    public static final String SENTENCE_MODEL = "/en-sent.bin";
    /** Classpath location of the tokenizer model (artifact {@code opennlp-tokenize-models}). */
    public static final String TOKEN_MODEL = "/en-token.bin";
    /** Classpath location of the part-of-speech model (artifact {@code opennlp-postag-models}). */
    public static final String POS_MODEL = "/en-pos-maxent.bin";
    /** Classpath location of the chunker model (artifact {@code opennlp-chunk-models}). */
    public static final String CHUNK_MODEL = "/en-chunker.bin";

    private static EnglishPreprocessingModels shared;

    private final SentenceModel sentenceModel;
    private final TokenizerModel tokenizerModel;
    private final POSModel posModel;
    private final ChunkerModel chunkerModel;

    private EnglishPreprocessingModels() throws IOException {
        try (InputStream sent = open(SENTENCE_MODEL, "opennlp-sent-models");
             InputStream token = open(TOKEN_MODEL, "opennlp-tokenize-models");
             InputStream pos = open(POS_MODEL, "opennlp-postag-models");
             InputStream chunk = open(CHUNK_MODEL, "opennlp-chunk-models")) {
            this.sentenceModel = read(SENTENCE_MODEL, () -> new SentenceModel(sent));
            this.tokenizerModel = read(TOKEN_MODEL, () -> new TokenizerModel(token));
            this.posModel = read(POS_MODEL, () -> new POSModel(pos));
            this.chunkerModel = read(CHUNK_MODEL, () -> new ChunkerModel(chunk));
        }
    }

    /**
     * The process-wide models, read on first use. A failed read is not cached, so a later call tries again.
     *
     * @throws IOException naming the classpath resource and the Maven artifact that should provide it
     */
    public static synchronized EnglishPreprocessingModels shared() throws IOException {
        if (shared == null) {
            shared = new EnglishPreprocessingModels();
        }
        return shared;
    }

    public SentenceModel sentenceModel() { return sentenceModel; }
    public TokenizerModel tokenizerModel() { return tokenizerModel; }
    public POSModel posModel() { return posModel; }
    public ChunkerModel chunkerModel() { return chunkerModel; }

    private static InputStream open(String resource, String artifact) throws IOException {
        InputStream in = EnglishPreprocessingModels.class.getResourceAsStream(resource);
        if (in == null) {
            throw new IOException("OpenNLP model " + resource + " is not on the classpath; add the Maven artifact "
                    + "edu.washington.cs.knowitall:" + artifact + ":1.5 to the runtime classpath");
        }
        return in;
    }

    private interface ModelReader<M> {
        M read() throws IOException;
    }

    private static <M> M read(String resource, ModelReader<M> reader) throws IOException {
        try {
            return reader.read();
        } catch (IOException | RuntimeException e) {
            throw new IOException("OpenNLP model " + resource + " on the classpath could not be read: " + e.getMessage(), e);
        }
    }
}
