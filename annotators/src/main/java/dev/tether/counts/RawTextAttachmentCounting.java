package dev.tether.counts;

import dev.tether.candidates.AttachmentCandidateFinder;
import dev.tether.pipeline.DocumentFiles;
import dev.tether.preprocessing.TextPreprocessor;
import dev.tether.similarity.RawTextCounting;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineDescription;
import org.apache.uima.analysis_engine.AnalysisEngineProcessException;
import org.apache.uima.fit.factory.AggregateBuilder;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
import org.apache.uima.jcas.JCas;
import org.apache.uima.resource.ResourceInitializationException;
import org.apache.uima.util.CasCreationUtils;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Counts raw text files for {@code tether train --raw}: on each of {@code threads} threads one UIMA flow, the
 * built-in preprocessing, the candidate finder and the {@link UnlabelledAttachmentCounter}, takes the next document,
 * and at the end each thread's counter writes its shard of counts; the shards are merged into one
 * {@link RawAttachmentCounts}. Which thread counted which document does not matter: the counts are whole numbers
 * with sorted ids, so 1 or 8 threads give the same bytes. Memory holds each thread's count tables and one document
 * per thread, not the corpus.
 *
 * <p>Files are read as {@link RawTextCounting#read} reads them: empty, binary and badly encoded files are skipped
 * and listed by reason.
 */
public final class RawTextAttachmentCounting {
    /** What was counted, and what was skipped (by reason, with file and reason, sorted). */
    public record Summary(RawAttachmentCounts counts, Map<RawTextCounting.Skip, List<String>> skipped, long notDocuments,
                          double seconds) {
        public int skippedCount() {
            int n = 0;
            for (List<String> files : skipped.values()) n += files.size();
            return n;
        }
    }

    private final int threads;
    private final boolean lineBreaksEndSentences;

    public RawTextAttachmentCounting(int threads) {
        this(threads, false);
    }

    /** With {@code lineBreaksEndSentences}, every line break ends a sentence (see {@link TextPreprocessor}). */
    public RawTextAttachmentCounting(int threads, boolean lineBreaksEndSentences) {
        if (threads < 1) throw new IllegalArgumentException("--threads must be at least 1, was " + threads);
        this.threads = threads;
        this.lineBreaksEndSentences = lineBreaksEndSentences;
    }

    /** Counts every document under {@code inputs} (files, or folders of {@code .txt} files). */
    public Summary count(List<Path> inputs) throws IOException {
        long start = System.nanoTime();
        List<Path> files = new ArrayList<>();
        long notDocuments = 0;
        for (Path p : inputs) {
            DocumentFiles.Listing listing = DocumentFiles.list(p);
            files.addAll(listing.documents());
            notDocuments += listing.skippedTotal();
        }
        Path shards = Files.createTempDirectory("tether-raw-counts");
        List<Path> shardFiles = new ArrayList<>();
        List<List<String[]>> skippedPerThread = new ArrayList<>();
        AtomicInteger next = new AtomicInteger();
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "raw-counting");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<?>> workers = new ArrayList<>();
            for (int k = 0; k < threads; k++) {
                Path shard = shards.resolve("shard-" + k + ".counts");
                shardFiles.add(shard);
                List<String[]> skipped = new ArrayList<>();
                skippedPerThread.add(skipped);
                workers.add(pool.submit(() -> {
                    countShard(files, next, shard, skipped, lineBreaksEndSentences);
                    return null;
                }));
            }
            for (Future<?> w : workers) take(w);
            RawAttachmentCountsBuilder merged = new RawAttachmentCountsBuilder();
            for (Path shard : shardFiles) merged.addAll(RawAttachmentCounts.read(shard));
            Map<RawTextCounting.Skip, List<String>> skipped = new EnumMap<>(RawTextCounting.Skip.class);
            for (List<String[]> perThread : skippedPerThread) {
                for (String[] s : perThread) {
                    skipped.computeIfAbsent(RawTextCounting.Skip.valueOf(s[0]), k -> new ArrayList<>()).add(s[1]);
                    merged.addSkippedDocument();
                }
            }
            for (List<String> reasons : skipped.values()) Collections.sort(reasons);
            return new Summary(merged.build(), skipped, notDocuments, (System.nanoTime() - start) / 1e9);
        } finally {
            pool.shutdownNow();
            for (Path shard : shardFiles) Files.deleteIfExists(shard);
            Files.deleteIfExists(shards);
        }
    }

    /**
     * The flow that prepares a raw document for counting: the built-in preprocessing (the shipped model's tagger, no
     * chunks) and the candidate finder, which writes the ambiguities that {@link UnlabelledAttachmentCounter} counts.
     * The Spark job runs the same flow. With {@code lineBreaksEndSentences} every line break ends a sentence.
     */
    public static AnalysisEngineDescription findingFlow(boolean lineBreaksEndSentences) throws ResourceInitializationException {
        AggregateBuilder flow = new AggregateBuilder();
        flow.add(AnalysisEngineFactory.createEngineDescription(TextPreprocessor.class, TextPreprocessor.PARAM_CHUNK, false,
                TextPreprocessor.PARAM_LINE_BREAKS_END_SENTENCES, lineBreaksEndSentences));
        flow.add(AnalysisEngineFactory.createEngineDescription(AttachmentCandidateFinder.class,
                AttachmentCandidateFinder.PARAM_TAGSET, "penn"));
        return flow.createAggregateDescription();
    }

    /**
     * Reads {@code file} and runs {@code engine} on it in {@code jcas}: {@code null} when it was processed, otherwise
     * the skip (its {@link RawTextCounting.Skip} name and the reason naming the file).
     */
    public static String[] process(AnalysisEngine engine, JCas jcas, Path file) {
        return process(engine, jcas, file.toString(), RawTextCounting.read(file));
    }

    /** The same for what {@code r} read of {@code file} (a path or a file system URI) elsewhere. */
    public static String[] process(AnalysisEngine engine, JCas jcas, String file, RawTextCounting.Reading r) {
        if (r.skip() != null) return new String[] {r.skip().name(), r.reason()};
        jcas.reset();
        jcas.setDocumentLanguage("en");
        jcas.setDocumentText(r.text());
        try {
            engine.process(jcas);
        } catch (AnalysisEngineProcessException | RuntimeException e) {
            return new String[] {RawTextCounting.Skip.UNREADABLE.name(), file + ": preprocessing failed (" + e.getMessage() + ")"};
        }
        return null;
    }

    /** One thread: its own flow and CAS, documents taken from the shared position until none is left. */
    private static void countShard(List<Path> files, AtomicInteger next, Path shard, List<String[]> skipped,
                                   boolean lineBreaksEndSentences)
            throws ResourceInitializationException, AnalysisEngineProcessException {
        AggregateBuilder flow = new AggregateBuilder();
        flow.add(findingFlow(lineBreaksEndSentences));
        flow.add(AnalysisEngineFactory.createEngineDescription(UnlabelledAttachmentCounter.class,
                UnlabelledAttachmentCounter.PARAM_COUNTS_FILE, shard.toString()));
        AnalysisEngine engine = flow.createAggregate();
        try {
            JCas jcas = CasCreationUtils.createCas(engine.getAnalysisEngineMetaData()).getJCas();
            for (int i = next.getAndIncrement(); i < files.size(); i = next.getAndIncrement()) {
                String[] skip = process(engine, jcas, files.get(i));
                if (skip != null) skipped.add(skip);
            }
            engine.collectionProcessComplete();
        } catch (org.apache.uima.cas.CASException e) {
            throw new ResourceInitializationException(e);
        } finally {
            engine.destroy();
        }
    }

    private static void take(Future<?> f) throws IOException {
        try {
            f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("counting interrupted", e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException r) throw r;
            if (cause instanceof IOException io) throw io;
            throw new IOException(cause.getMessage(), cause);
        }
    }
}
