package dev.tether.pipeline;

import dev.tether.attachment.AttachmentResolver;
import dev.tether.candidates.AttachmentCandidateFinder;
import dev.tether.preprocessing.TextPreprocessor;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineDescription;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
import org.apache.uima.resource.ResourceInitializationException;

/**
 * The standalone flow for raw text: built-in preprocessing, candidate finder, attachment resolver. Pipelines that
 * bring their own tokens and tags use the finder and resolver alone (see {@link #resolution}).
 */
public final class TetherPipeline {
    private TetherPipeline() {
    }

    /**
     * Raw text in, attachment decisions out. {@code model} is {@code default} or a model file; the preprocessing tags
     * with that model's tagger when it has one.
     */
    public static AnalysisEngineDescription forRawText(String model) throws ResourceInitializationException {
        return AnalysisEngineFactory.createEngineDescription(
                AnalysisEngineFactory.createEngineDescription(TextPreprocessor.class, TextPreprocessor.PARAM_MODEL, model),
                resolution(model));
    }

    /** Candidate finder and resolver, for CASes that already hold Tether's sentences and tagged tokens. */
    public static AnalysisEngineDescription resolution(String model) throws ResourceInitializationException {
        return AnalysisEngineFactory.createEngineDescription(
                AnalysisEngineFactory.createEngineDescription(AttachmentCandidateFinder.class),
                AnalysisEngineFactory.createEngineDescription(AttachmentResolver.class, AttachmentResolver.PARAM_MODEL, model));
    }

    /** Like {@link #resolution(String)}, the resolver set to the given {@link AttachmentResolver#PARAM_SCORER}. */
    public static AnalysisEngineDescription resolution(String model, String scorer) throws ResourceInitializationException {
        return AnalysisEngineFactory.createEngineDescription(
                AnalysisEngineFactory.createEngineDescription(AttachmentCandidateFinder.class),
                AnalysisEngineFactory.createEngineDescription(AttachmentResolver.class, AttachmentResolver.PARAM_MODEL, model,
                        AttachmentResolver.PARAM_SCORER, scorer));
    }

    public static AnalysisEngine createForRawText(String model) throws ResourceInitializationException {
        return AnalysisEngineFactory.createEngine(forRawText(model));
    }
}
