package dev.tether.benchmarks;

import dev.tether.attachment.AttachmentResolver;
import dev.tether.candidates.AttachmentCandidateFinder;
import dev.tether.type.Conjunct;
import dev.tether.type.CoordinationDecision;
import dev.tether.pipeline.TetherPipeline;
import dev.tether.preprocessing.TextPreprocessor;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;
import dev.tether.type.AttachmentAmbiguity;
import dev.tether.type.AttachmentDecision;
import dev.tether.type.QuadrupleCandidate;
import dev.tether.type.Token;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
import org.apache.uima.jcas.tcas.Annotation;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Time to run, on one thread, over the same documents: the candidate finder plus the attachment resolver alone on
 * CASes tagged beforehand ({@link #finderAndResolver}), the same with the count-based score in place of the learned
 * ranker ({@link #finderAndCountScore}), the coordination resolver alone on the same CASes
 * ({@link #coordinationResolver}), and the whole standalone pipeline from raw text ({@link #wholePipeline}). Documents are the {@code # text} sentences of a UD English EWT file, 20 per document.
 * Each invocation processes every document once; {@link ResolutionThroughputMain} turns the times into tokens per
 * second and the finder-plus-resolver share of the whole.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class ResolutionThroughput {
    /** A CoNLL-U file; defaults to the EWT dev split beside the project, else the slice shipped in test-corpora. */
    @Param({""})
    public String conllu;

    /** The model the resolvers and the whole pipeline load: "default" or a model file ({@code -p model=A,B} compares several in one run). */
    @Param({"default"})
    public String model;

    private final List<String> texts = new ArrayList<>();
    private final List<JCas> tagged = new ArrayList<>();
    private JCas scratch;
    private AnalysisEngine resolution;
    private AnalysisEngine countResolution;
    private AnalysisEngine coordination;
    private AnalysisEngine whole;
    /** Tokens over all documents, as the built-in preprocessing tokenizes them. */
    public long tokens;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        Path file = conllu.isEmpty() ? defaultFile() : Path.of(conllu);
        StringBuilder doc = new StringBuilder();
        int inDoc = 0;
        try (ConlluReader reader = ConlluReader.open(file)) {
            for (TreebankSentence s = reader.next(); s != null; s = reader.next()) {
                doc.append(s.text()).append('\n');
                if (++inDoc == 20) {
                    texts.add(doc.toString());
                    doc.setLength(0);
                    inDoc = 0;
                }
            }
        }
        if (inDoc > 0) texts.add(doc.toString());
        AnalysisEngine preprocessor = AnalysisEngineFactory.createEngine(TextPreprocessor.class);
        resolution = AnalysisEngineFactory.createEngine(AnalysisEngineFactory.createEngineDescription(
                AnalysisEngineFactory.createEngineDescription(AttachmentCandidateFinder.class),
                AnalysisEngineFactory.createEngineDescription(AttachmentResolver.class, AttachmentResolver.PARAM_MODEL, model)));
        countResolution = AnalysisEngineFactory.createEngine(AnalysisEngineFactory.createEngineDescription(
                AnalysisEngineFactory.createEngineDescription(AttachmentCandidateFinder.class),
                AnalysisEngineFactory.createEngineDescription(AttachmentResolver.class, AttachmentResolver.PARAM_MODEL, model,
                        AttachmentResolver.PARAM_SCORER, "counts")));
        coordination = AnalysisEngineFactory.createEngine(TetherPipeline.coordination(model));
        whole = TetherPipeline.createForRawText(model);
        for (String text : texts) {
            JCas jcas = preprocessor.newJCas();
            jcas.setDocumentLanguage("en");
            jcas.setDocumentText(text);
            preprocessor.process(jcas);
            tokens += JCasUtil.select(jcas, Token.class).size();
            tagged.add(jcas);
        }
        scratch = whole.newJCas();
        System.out.printf("%n[setup] %s: %d documents, %,d tokens%n", file, texts.size(), tokens);
    }

    static Path defaultFile() {
        Path shared = Path.of("../shared/datasets/ud-ewt/en_ewt-ud-dev.conllu");
        return Files.exists(shared) ? shared : Path.of("test-corpora/data/ud-ewt/en_ewt-ud-dev-slice.conllu");
    }

    @Benchmark
    public int finderAndResolver() throws Exception {
        return resolveAll(resolution);
    }

    /** The same with the count-based score instead of the learned ranker (the ranker's baseline). */
    @Benchmark
    public int finderAndCountScore() throws Exception {
        return resolveAll(countResolution);
    }

    /** The coordination resolver alone (its own candidates, ranking and evidence) on the same tagged CASes. */
    @Benchmark
    public int coordinationResolver() throws Exception {
        int decisions = 0;
        for (JCas jcas : tagged) {
            removeOutputs(jcas);
            coordination.process(jcas);
            decisions += JCasUtil.select(jcas, CoordinationDecision.class).size();
        }
        return decisions;
    }

    private int resolveAll(AnalysisEngine engine) throws Exception {
        int decisions = 0;
        for (JCas jcas : tagged) {
            removeOutputs(jcas);
            engine.process(jcas);
            decisions += JCasUtil.select(jcas, AttachmentDecision.class).size();
        }
        return decisions;
    }

    @Benchmark
    public int wholePipeline() throws Exception {
        int decisions = 0;
        for (String text : texts) {
            scratch.reset();
            scratch.setDocumentLanguage("en");
            scratch.setDocumentText(text);
            whole.process(scratch);
            decisions += JCasUtil.select(scratch, AttachmentDecision.class).size();
        }
        return decisions;
    }

    private static void removeOutputs(JCas jcas) {
        for (Class<? extends Annotation> type : List.of(AttachmentDecision.class, AttachmentAmbiguity.class, QuadrupleCandidate.class,
                CoordinationDecision.class, Conjunct.class)) {
            for (Annotation a : new ArrayList<>(JCasUtil.select(jcas, type))) a.removeFromIndexes();
        }
    }

    @TearDown(Level.Trial)
    public void tearDown() {
        resolution.destroy();
        countResolution.destroy();
        coordination.destroy();
        whole.destroy();
    }
}
