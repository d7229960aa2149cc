package dev.tether.pipeline;

import dev.tether.type.Chunk;
import dev.tether.type.Token;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineDescription;
import org.apache.uima.fit.component.JCasAnnotator_ImplBase;
import org.apache.uima.fit.descriptor.TypeCapability;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The chunker runs only when asked (issue 7): not in the default raw-text flow, but when a later stage declares
 * chunks among its inputs (a UIMA capability) or the caller asks for them.
 */
class TetherPipelineChunksTest {
    private static final String LOG = "The engineer replaced the gasket on the port engine with a spare from the stores.";

    /** A later stage that reads chunks. */
    @TypeCapability(inputs = "dev.tether.type.Chunk")
    public static class ChunkReader extends JCasAnnotator_ImplBase {
        @Override
        public void process(JCas jcas) {
        }
    }

    /** A later stage that reads only tokens. */
    @TypeCapability(inputs = "dev.tether.type.Token")
    public static class TokenReader extends JCasAnnotator_ImplBase {
        @Override
        public void process(JCas jcas) {
        }
    }

    private static JCas run(AnalysisEngineDescription flow) throws Exception {
        AnalysisEngine engine = AnalysisEngineFactory.createEngine(flow);
        JCas jcas = engine.newJCas();
        jcas.setDocumentLanguage("en");
        jcas.setDocumentText(LOG);
        engine.process(jcas);
        assertFalse(JCasUtil.select(jcas, Token.class).isEmpty());
        return jcas;
    }

    @Test
    void chunksOnlyWhenAStageNeedsThemOrTheCallerAsks() throws Exception {
        assertTrue(JCasUtil.select(run(TetherPipeline.forRawText("default")), Chunk.class).isEmpty());
        assertTrue(JCasUtil.select(run(TetherPipeline.forRawText("default",
                AnalysisEngineFactory.createEngineDescription(TokenReader.class))), Chunk.class).isEmpty());
        AnalysisEngineDescription nested = AnalysisEngineFactory.createEngineDescription(
                AnalysisEngineFactory.createEngineDescription(TokenReader.class),
                AnalysisEngineFactory.createEngineDescription(ChunkReader.class));
        assertFalse(JCasUtil.select(run(TetherPipeline.forRawText("default", nested)), Chunk.class).isEmpty());
        assertFalse(JCasUtil.select(run(TetherPipeline.forRawText("default", true)), Chunk.class).isEmpty());
    }
}
