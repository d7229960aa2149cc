package dev.tether.benchmarks;

import dev.tether.io.QuadrupleReader;
import dev.tether.model.LoadedModels;
import dev.tether.model.ModelFile;
import dev.tether.model.ModelTrainer;
import dev.tether.pipeline.CollectionRun;
import dev.tether.pipeline.DocumentFiles;
import dev.tether.pipeline.TetherPipeline;
import dev.tether.preprocessing.TextPreprocessor;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;
import org.apache.uima.analysis_engine.AnalysisEngineDescription;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
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

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

/**
 * What {@code tether annotate} does, end to end from raw text files to XMI, ledger and manifest, over the same
 * documents (the {@code # text} sentences of a UD English EWT file, 20 per document file):
 * <ul>
 *   <li>{@link #previousReleaseOneThread}: one thread as the release before the ranker issue annotated: chunker on and
 *       the shipped OpenNLP tagger through OpenNLP's own decoder (the default model then carried no tagger of its
 *       own), resolved with the default
 *       model; this is the "today's single-thread throughput" the collection issue measures against;</li>
 *   <li>{@link #chunkedOneThread}: one thread with the chunker, as every run did before the chunker became optional;</li>
 *   <li>{@link #oneThread}: one thread, no chunker (the default now);</li>
 *   <li>{@link #twoThreads}: two threads (two pipelines sharing one loaded model), no chunker.</li>
 * </ul>
 * Each invocation is a fresh run ({@code --fresh}) into the same output folder, pipelines built included.
 * {@link CollectionThroughputMain} prints tokens per second and the ratios from the same JMH run.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class CollectionThroughput {
    /** A CoNLL-U file; defaults to the EWT dev split beside the project, else the slice shipped in test-corpora. */
    @Param({""})
    public String conllu;

    private Path folder;
    private DocumentFiles.Listing listing;
    private String modelId;
    /** A model with counts only (the RRR quadruples in test-corpora), so that its preprocessing uses the shipped tagger. */
    private Path taggerlessModel;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        Path file = conllu.isEmpty() ? ResolutionThroughput.defaultFile() : Path.of(conllu);
        folder = Files.createTempDirectory("tether-collection-benchmark");
        Path in = Files.createDirectory(folder.resolve("in"));
        StringBuilder doc = new StringBuilder();
        int inDoc = 0;
        int docs = 0;
        try (ConlluReader reader = ConlluReader.open(file)) {
            for (TreebankSentence s = reader.next(); s != null; s = reader.next()) {
                doc.append(s.text()).append('\n');
                if (++inDoc == 20) {
                    Files.writeString(in.resolve(String.format("doc-%04d.txt", docs++)), doc, StandardCharsets.UTF_8);
                    doc.setLength(0);
                    inDoc = 0;
                }
            }
        }
        if (inDoc > 0) Files.writeString(in.resolve(String.format("doc-%04d.txt", docs)), doc, StandardCharsets.UTF_8);
        listing = DocumentFiles.list(in);
        modelId = LoadedModels.get("default").id();
        Files.createDirectories(folder.resolve("out"));
        taggerlessModel = folder.resolve("counts-only.tether");
        ModelFile.write(new ModelTrainer().trainRanker(false)
                .addQuadruples(new QuadrupleReader(false).read(Path.of("test-corpora/data/rrr/training"))).build(),
                taggerlessModel);
    }

    private CollectionRun.Result annotate(int threads, AnalysisEngineDescription pipeline, boolean chunks)
            throws Exception {
        CollectionRun.Settings settings = new CollectionRun.Settings("default", modelId, chunks, threads, true, "benchmark");
        CollectionRun.Result r = new CollectionRun(listing, folder.resolve("out"), settings, done -> { }).run(pipeline);
        if (!r.failed().isEmpty()) throw new IllegalStateException("documents failed: " + r.failed());
        return r;
    }

    private CollectionRun.Result annotate(int threads, boolean chunks) throws Exception {
        return annotate(threads, TetherPipeline.forRawText("default", chunks), chunks);
    }

    @Benchmark
    public long previousReleaseOneThread() throws Exception {
        AnalysisEngineDescription pipeline = AnalysisEngineFactory.createEngineDescription(
                AnalysisEngineFactory.createEngineDescription(TextPreprocessor.class,
                        TextPreprocessor.PARAM_MODEL, taggerlessModel.toString(), TextPreprocessor.PARAM_CHUNK, true,
                        TextPreprocessor.PARAM_LIBRARY_TAGGER, true, TextPreprocessor.PARAM_LIBRARY_TOKENIZER, true),
                TetherPipeline.resolution("default"));
        return annotate(1, pipeline, true).decisions();
    }

    @Benchmark
    public long chunkedOneThread() throws Exception {
        return annotate(1, true).decisions();
    }

    @Benchmark
    public long oneThread() throws Exception {
        return annotate(1, false).decisions();
    }

    @Benchmark
    public long twoThreads() throws Exception {
        return annotate(2, false).decisions();
    }

    @TearDown(Level.Trial)
    public void tearDown() throws IOException {
        try (Stream<Path> all = Files.walk(folder)) {
            for (Path p : (Iterable<Path>) all.sorted(Comparator.reverseOrder())::iterator) Files.delete(p);
        }
    }
}
