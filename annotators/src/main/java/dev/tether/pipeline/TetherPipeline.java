package dev.tether.pipeline;

import dev.tether.attachment.AttachmentResolver;
import dev.tether.coordination.CoordinationResolver;
import dev.tether.candidates.AttachmentCandidateFinder;
import dev.tether.preprocessing.TextPreprocessor;
import dev.tether.type.Chunk;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineDescription;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
import org.apache.uima.resource.ResourceInitializationException;
import org.apache.uima.resource.ResourceSpecifier;
import org.apache.uima.resource.metadata.Capability;
import org.apache.uima.analysis_engine.TypeOrFeature;
import org.apache.uima.util.InvalidXMLException;

import java.util.ArrayList;
import java.util.List;

/**
 * The standalone flow for raw text: built-in preprocessing, candidate finder, attachment resolver, coordination resolver. Pipelines that
 * bring their own tokens and tags use the finder and resolver alone (see {@link #resolution}).
 *
 * <p>The preprocessing writes base chunks only when asked: none of Tether's engines reads them, and the chunker
 * takes most of the preprocessing time. {@link #forRawText(String, AnalysisEngineDescription...)} switches it on
 * when a later stage declares {@code dev.tether.type.Chunk} among its inputs.
 */
public final class TetherPipeline {
    private TetherPipeline() {
    }

    /**
     * Raw text in, attachment decisions out. {@code model} is {@code default} or a model file; the preprocessing tags
     * with that model's tagger when it has one. No chunks.
     */
    public static AnalysisEngineDescription forRawText(String model) throws ResourceInitializationException {
        return forRawText(model, false);
    }

    /** Raw text in, attachment decisions out; {@code chunks} adds base chunks to the CAS. */
    public static AnalysisEngineDescription forRawText(String model, boolean chunks) throws ResourceInitializationException {
        return forRawText(model, chunks, false);
    }

    /**
     * Raw text in, attachment decisions out; {@code chunks} adds base chunks to the CAS, and with
     * {@code lineBreaksEndSentences} every line break ends a sentence (see {@link TextPreprocessor#PARAM_LINE_BREAKS_END_SENTENCES}).
     */
    public static AnalysisEngineDescription forRawText(String model, boolean chunks, boolean lineBreaksEndSentences)
            throws ResourceInitializationException {
        return AnalysisEngineFactory.createEngineDescription(
                AnalysisEngineFactory.createEngineDescription(TextPreprocessor.class, TextPreprocessor.PARAM_MODEL, model,
                        TextPreprocessor.PARAM_CHUNK, chunks,
                        TextPreprocessor.PARAM_LINE_BREAKS_END_SENTENCES, lineBreaksEndSentences),
                resolution(model));
    }

    /**
     * Raw text in, then Tether's engines, then {@code laterStages}; chunks are written when any later stage (or one
     * of its delegates) declares {@code dev.tether.type.Chunk} as an input capability.
     */
    public static AnalysisEngineDescription forRawText(String model, AnalysisEngineDescription... laterStages)
            throws ResourceInitializationException {
        boolean chunks = false;
        for (AnalysisEngineDescription stage : laterStages) chunks |= readsChunks(stage);
        List<AnalysisEngineDescription> all = new ArrayList<>();
        all.add(forRawText(model, chunks));
        all.addAll(List.of(laterStages));
        return AnalysisEngineFactory.createEngineDescription(all.toArray(new AnalysisEngineDescription[0]));
    }

    /** Whether {@code stage} or one of its delegates declares chunks as an input. */
    static boolean readsChunks(AnalysisEngineDescription stage) throws ResourceInitializationException {
        for (Capability c : stage.getAnalysisEngineMetaData().getCapabilities()) {
            for (TypeOrFeature t : c.getInputs()) {
                if (t.getName().equals(Chunk.class.getName()) || t.getName().startsWith(Chunk.class.getName() + ":")) return true;
            }
        }
        if (stage.isPrimitive()) return false;
        try {
            for (ResourceSpecifier delegate : stage.getDelegateAnalysisEngineSpecifiers().values()) {
                if (delegate instanceof AnalysisEngineDescription d && readsChunks(d)) return true;
            }
        } catch (InvalidXMLException e) {
            throw new ResourceInitializationException(e);
        }
        return false;
    }

    /**
     * Candidate finder, attachment resolver and coordination resolver, for CASes that already hold Tether's sentences
     * and tagged tokens.
     */
    public static AnalysisEngineDescription resolution(String model) throws ResourceInitializationException {
        return AnalysisEngineFactory.createEngineDescription(
                AnalysisEngineFactory.createEngineDescription(AttachmentCandidateFinder.class),
                AnalysisEngineFactory.createEngineDescription(AttachmentResolver.class, AttachmentResolver.PARAM_MODEL, model),
                coordination(model));
    }

    /** The coordination resolver alone (it reads Tether's sentences and tagged tokens). */
    public static AnalysisEngineDescription coordination(String model) throws ResourceInitializationException {
        return AnalysisEngineFactory.createEngineDescription(CoordinationResolver.class, CoordinationResolver.PARAM_MODEL, model);
    }

    /** Like {@link #resolution(String)}, the resolver set to the given {@link AttachmentResolver#PARAM_SCORER}. */
    public static AnalysisEngineDescription resolution(String model, String scorer) throws ResourceInitializationException {
        return AnalysisEngineFactory.createEngineDescription(
                AnalysisEngineFactory.createEngineDescription(AttachmentCandidateFinder.class),
                AnalysisEngineFactory.createEngineDescription(AttachmentResolver.class, AttachmentResolver.PARAM_MODEL, model,
                        AttachmentResolver.PARAM_SCORER, scorer),
                coordination(model));
    }

    public static AnalysisEngine createForRawText(String model) throws ResourceInitializationException {
        return AnalysisEngineFactory.createEngine(forRawText(model));
    }
}
