package dev.tether.counts;

import dev.tether.attachment.AttachmentResolver;
import dev.tether.documents.DocumentLabel;
import dev.tether.type.AttachmentAmbiguity;
import dev.tether.type.Sentence;
import dev.tether.type.Token;
import org.apache.uima.UimaContext;
import org.apache.uima.analysis_engine.AnalysisEngineProcessException;
import org.apache.uima.fit.component.JCasAnnotator_ImplBase;
import org.apache.uima.fit.descriptor.ConfigurationParameter;
import org.apache.uima.fit.descriptor.ResourceMetaData;
import org.apache.uima.fit.descriptor.TypeCapability;
import org.apache.uima.jcas.JCas;
import org.apache.uima.resource.ResourceInitializationException;
import org.apache.uima.util.Level;

import java.io.IOException;
import java.nio.file.Path;

/**
 * A consumer that learns attachment statistics from unlabelled text: it reads the {@link AttachmentAmbiguity}
 * annotations the candidate finder wrote (so it runs after {@code AttachmentCandidateFinder}, in Tether's flow or a
 * host's) and counts each preposition into a {@link RawAttachmentCountsBuilder}: the unambiguous ones (one candidate
 * head) as attachment events, every candidate as head–preposition–object co-occurrence, and the ambiguous
 * verb–noun–preposition–noun configurations for re-estimation. It writes nothing into the CAS.
 *
 * <p>At the end of the collection the counts of every document this instance saw are written to
 * {@link #PARAM_COUNTS_FILE} (atomically); {@code tether train --raw-counts FILE...} merges such files (from several
 * threads, machines or runs) into a model, and so does {@code ModelTrainer.addRawCounts}. Counts are whole numbers
 * and written with sorted ids, so merging the files of any split of the documents, in any order, gives the same
 * model bytes. {@link #count(JCas)} gives one CAS's counts, for callers that merge per document.
 *
 * <p>Sentences and tokens are tallied from Tether's own types, and so are the occurrences of nouns and verbs (by
 * their Penn tags) that the domain report compares with a base model's vocabulary; in a host flow with its own
 * types they read 0.
 */
@ResourceMetaData(name = "Tether unlabelled attachment counter",
        description = "Counts unambiguous attachments and head-preposition-object co-occurrence of unlabelled text into a raw counts file.")
@TypeCapability(inputs = {"dev.tether.type.AttachmentAmbiguity"})
public class UnlabelledAttachmentCounter extends JCasAnnotator_ImplBase {

    /**
     * The raw counts file written when the collection ends (atomically; its folder must exist). Empty, the default:
     * write nothing (the counts are then only logged).
     */
    public static final String PARAM_COUNTS_FILE = "countsFile";
    @ConfigurationParameter(name = PARAM_COUNTS_FILE, mandatory = false, defaultValue = "")
    private String countsFile;

    private RawAttachmentCountsBuilder counts;

    @Override
    public void initialize(UimaContext context) throws ResourceInitializationException {
        super.initialize(context);
        counts = new RawAttachmentCountsBuilder();
    }

    @Override
    public void process(JCas jcas) throws AnalysisEngineProcessException {
        try {
            countInto(jcas, counts);
        } catch (RuntimeException e) {
            throw new AnalysisEngineProcessException(new IllegalStateException(
                    "counting the prepositions of " + DocumentLabel.of(jcas.getCas()) + " failed: " + e.getMessage(), e));
        }
    }

    /** Counts one CAS (its ambiguities, sentences and tokens) into {@code builder}. */
    public static void countInto(JCas jcas, RawAttachmentCountsBuilder builder) {
        for (AttachmentAmbiguity a : jcas.select(AttachmentAmbiguity.class)) builder.add(AttachmentResolver.query(a));
        long tokens = 0;
        for (Token t : jcas.select(Token.class)) {
            builder.addToken(t.getCoveredText(), t.getPos());
            tokens++;
        }
        builder.addDocument(jcas.select(Sentence.class).count(), tokens);
    }

    /** The counts of one CAS alone. */
    public static RawAttachmentCounts count(JCas jcas) {
        RawAttachmentCountsBuilder b = new RawAttachmentCountsBuilder();
        countInto(jcas, b);
        return b.build();
    }

    @Override
    public void collectionProcessComplete() throws AnalysisEngineProcessException {
        super.collectionProcessComplete();
        RawAttachmentCounts result = counts.build();
        RawAttachmentCounts.Tally t = result.tally();
        getLogger().log(Level.INFO, "Unlabelled attachment counter: " + t.documents() + " documents, " + t.tokens()
                + " tokens, " + t.prepositions() + " prepositions with candidates, " + t.unambiguous() + " unambiguous, "
                + t.ambiguousQuadruples() + " ambiguous quadruple configurations");
        if (!countsFile.isEmpty()) {
            try {
                result.write(Path.of(countsFile));
            } catch (IOException e) {
                throw new AnalysisEngineProcessException(new IOException("cannot write the raw counts to " + countsFile
                        + " (parameter " + PARAM_COUNTS_FILE + "): " + e.getMessage() + "; check that its folder exists and is writable", e));
            }
        }
    }
}
