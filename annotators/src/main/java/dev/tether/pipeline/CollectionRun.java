package dev.tether.pipeline;

import dev.tether.output.AtomicFile;
import dev.tether.output.IoFailure;
import dev.tether.output.OutputFolder;
import dev.tether.output.RunManifest;
import org.apache.uima.analysis_engine.AnalysisEngineDescription;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.IntConsumer;

/**
 * Annotates a collection of plain-text documents into an output folder: per document {@code <name>.xmi} and
 * {@code <name>.ledger.jsonl}, and the folder's {@link RunManifest}.
 *
 * <p><b>Safe to interrupt and re-run.</b> Every output file is written under a temporary name and renamed when
 * complete; a document enters the manifest (with the SHA-256 of its input) only when all its files are in place.
 * Run again into the same folder, a document whose input, model and options are unchanged and whose outputs are
 * intact is reused; every other document is done again; a document that now fails loses its old outputs; and the
 * outputs of documents no longer in the input are removed. Temporary files left by a killed run are deleted first.
 * A finished run therefore leaves exactly the files a clean run leaves. {@code fresh} forgets the manifest.
 *
 * <p><b>Parallel.</b> {@code threads} pipelines, each with its own CAS, share the loaded models (the attachment
 * model through {@code LoadedModels}, the OpenNLP models through {@code EnglishPreprocessingModels}). Documents are
 * committed (renamed, entered in the manifest) in their sorted order, whatever the thread that did them, and at
 * most a few documents per thread are in flight, so memory grows with the largest document, not with the
 * collection. The output bytes do not depend on the thread count.
 *
 * <p><b>Elsewhere.</b> {@link #run(Elsewhere)} keeps everything above but hands the documents to another runner (the
 * Spark job, {@code dev.tether.spark}), whose {@link DocumentAnnotator}s do the same work per document; the outcomes
 * come back and are recorded in document order, so the folder ends byte for byte as after a run on threads.
 */
public final class CollectionRun {
    public static final String XMI = ".xmi";
    public static final String LEDGER = ".ledger.jsonl";

    /**
     * What shapes the output: the model location and id, the chunk option, whether line breaks end sentences,
     * Tether's version.
     */
    public record Settings(String model, String modelId, boolean chunks, boolean lineBreaksEndSentences, int threads,
                           boolean fresh, String version) {
        /** Settings with line breaks as spaces (the default). */
        public Settings(String model, String modelId, boolean chunks, int threads, boolean fresh, String version) {
            this(model, modelId, chunks, false, threads, fresh, version);
        }

        /**
         * The part of the settings that the output depends on, as recorded in the manifest (the line-break option only
         * when on, so that manifests written before it existed still match).
         */
        public String fingerprint() {
            return "tether " + version + "; model " + modelId + "; chunks " + chunks
                    + (lineBreaksEndSentences ? "; line breaks end sentences" : "");
        }
    }

    /** A document that failed, and why. */
    public record Failure(String doc, String reason) {
    }

    /** What the run did. Counts of decisions and characters cover every complete document, reused or new. */
    public record Result(int documents, int annotated, int reused, List<Failure> failed, int staleRemoved,
                         int temporaryRemoved, long decisions, long characters, double seconds) {
        public int complete() {
            return annotated + reused;
        }
    }

    private final DocumentFiles.Listing listing;
    private final Path out;
    private final Settings settings;
    private final IntConsumer progress;

    // Per-document outcome, filled by workers, consumed in document order by commit().
    private final DocumentOutcome[] outcomes;
    private static final DocumentOutcome DONE = DocumentOutcome.failed(-1, null);
    private int nextToCommit;
    private int nextToTake;
    private final int window;
    private RunManifest manifest;

    private int annotated;
    private int reused;
    private int staleRemoved;
    private final List<Failure> failed = new ArrayList<>();

    /** {@code progress} is told the number of documents committed so far. */
    public CollectionRun(DocumentFiles.Listing listing, Path out, Settings settings, IntConsumer progress) {
        this.listing = listing;
        this.out = out;
        this.settings = settings;
        this.progress = progress;
        this.outcomes = new DocumentOutcome[listing.documents().size()];
        this.window = 4 * Math.max(1, settings.threads());
    }

    /** Runs the whole collection; the output folder must exist and be writable ({@link OutputFolder#prepare}). */
    public Result run(AnalysisEngineDescription pipeline) throws IOException {
        return run(() -> runWorkers(pipeline));
    }

    /**
     * Runs the whole collection with the documents annotated elsewhere (the Spark job): {@code elsewhere} is given
     * every document, in sorted order with what an earlier run completed for it, and returns one outcome per document
     * (any order). Outcomes whose files are still temporary are committed here; all are recorded in document order,
     * exactly as the threads of {@link #run(AnalysisEngineDescription)} record theirs, so the folder ends the same.
     */
    public Result run(Elsewhere elsewhere) throws IOException {
        return run(() -> {
            List<DocumentTask> tasks = new ArrayList<>(outcomes.length);
            for (int i = 0; i < outcomes.length; i++) {
                Path file = listing.documents().get(i);
                String doc = listing.name(file);
                tasks.add(new DocumentTask(i, file.toString(), doc, manifest.get(doc)));
            }
            DocumentOutcome[] byIndex = new DocumentOutcome[outcomes.length];
            for (DocumentOutcome o : elsewhere.annotate(List.copyOf(tasks), settings.fingerprint())) {
                if (o.index() < 0 || o.index() >= byIndex.length || byIndex[o.index()] != null) {
                    throw new IOException("the job returned a second outcome, or one for no document, at index " + o.index());
                }
                byIndex[o.index()] = o;
            }
            for (int i = 0; i < byIndex.length; i++) {
                if (byIndex[i] == null) throw new IOException("the job returned no outcome for " + tasks.get(i).doc());
                commit(i, byIndex[i]);
            }
            // Temporary files of attempts whose process died before it could delete them (a lost executor).
            OutputFolder.removeTemporaryFiles(out);
        });
    }

    /** Annotates the documents of a run somewhere else; see {@link #run(Elsewhere)}. */
    @FunctionalInterface
    public interface Elsewhere {
        /** One outcome per task; {@code fingerprint} is the settings' fingerprint each entry must carry. */
        List<DocumentOutcome> annotate(List<DocumentTask> tasks, String fingerprint) throws IOException;
    }

    @FunctionalInterface
    private interface Body {
        void run() throws IOException;
    }

    private Result run(Body body) throws IOException {
        long start = System.nanoTime();
        int temporaryRemoved = OutputFolder.removeTemporaryFiles(out);
        manifest = RunManifest.open(out);
        try {
            if (settings.fresh()) {
                for (RunManifest.Entry e : manifest.entries().values()) deleteOutputs(e.doc());
                manifest.clear();
                Files.deleteIfExists(out.resolve(RunManifest.FILE));
            }
            removeDocumentsNoLongerInTheInput();
            body.run();
            manifest.compact();
        } finally {
            manifest.close();
        }
        long decisions = 0;
        long characters = 0;
        for (RunManifest.Entry e : manifest.entries().values()) {
            decisions += e.decisions();
            characters += e.characters();
        }
        return new Result(outcomes.length, annotated, reused, List.copyOf(failed), staleRemoved, temporaryRemoved,
                decisions, characters, (System.nanoTime() - start) / 1e9);
    }

    private void removeDocumentsNoLongerInTheInput() throws IOException {
        Set<String> current = new HashSet<>();
        for (Path p : listing.documents()) current.add(listing.name(p));
        for (RunManifest.Entry e : manifest.entries().values()) {
            if (!current.contains(e.doc())) {
                if (deleteOutputs(e.doc())) staleRemoved++;
                manifest.withdraw(e.doc());
            }
        }
    }

    private void runWorkers(AnalysisEngineDescription pipeline) throws IOException {
        int threads = Math.max(1, Math.min(settings.threads(), outcomes.length));
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "tether-annotate");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<?>> workers = new ArrayList<>();
            for (int t = 0; t < threads; t++) workers.add(pool.submit(() -> work(pipeline)));
            for (Future<?> w : workers) {
                try {
                    w.get();
                } catch (ExecutionException e) {
                    Throwable cause = e.getCause();
                    if (cause instanceof IOException io) throw io;
                    throw new IOException("cannot run the pipeline: " + rootMessage(cause), cause);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new IOException("interrupted", e);
                }
            }
        } finally {
            pool.shutdownNow();
        }
    }

    /** One worker: its own engine and CAS; takes documents in order until none is left. */
    private Void work(AnalysisEngineDescription pipeline) throws Exception {
        try (DocumentAnnotator annotator = new DocumentAnnotator(pipeline)) {
            String fingerprint = settings.fingerprint();
            for (int i = take(); i >= 0; i = take()) {
                Path file = listing.documents().get(i);
                String doc = listing.name(file);
                commit(i, annotator.annotate(new DocumentTask(i, file.toString(), doc, manifest.get(doc)), out, fingerprint, null));
            }
        }
        return null;
    }

    /** The next document to do, or -1; waits while too many documents are done but not yet committed. */
    private synchronized int take() throws InterruptedException {
        while (nextToTake < outcomes.length && nextToTake >= nextToCommit + window) wait();
        return nextToTake < outcomes.length ? nextToTake++ : -1;
    }

    /** Records the outcome of document {@code i} and commits every document, in order, whose outcome is known. */
    private synchronized void commit(int i, DocumentOutcome outcome) throws IOException {
        outcomes[i] = outcome;
        while (nextToCommit < outcomes.length && outcomes[nextToCommit] != null) {
            String doc = listing.name(listing.documents().get(nextToCommit));
            DocumentOutcome o = outcomes[nextToCommit];
            if (!o.isFailure() && o.reused()) {
                reused++;
            } else if (!o.isFailure()) {
                try {
                    if (!o.committed()) for (String file : o.entry().outputs().keySet()) AtomicFile.commit(out.resolve(file));
                    manifest.complete(o.entry());
                    annotated++;
                } catch (IOException e) {
                    fail(doc, IoFailure.describe(e));
                }
            } else {
                fail(doc, o.reason());
            }
            outcomes[nextToCommit] = DONE; // let the document's data go
            nextToCommit++;
            progress.accept(nextToCommit);
        }
        notifyAll();
    }

    private void fail(String doc, String reason) throws IOException {
        failed.add(new Failure(doc, reason));
        if (deleteOutputs(doc)) staleRemoved++;
        manifest.withdraw(doc);
    }

    /** Deletes the outputs (and temporary files) of {@code doc}; whether any output existed. */
    private boolean deleteOutputs(String doc) throws IOException {
        boolean any = false;
        for (String suffix : List.of(XMI, LEDGER)) {
            Path file = out.resolve(doc + suffix);
            any |= Files.deleteIfExists(file);
            Files.deleteIfExists(AtomicFile.temporaryFor(file));
        }
        return any;
    }

    public static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) t = t.getCause();
        if (t instanceof IOException && !(t instanceof dev.tether.io.InputFormatException)) return IoFailure.describe(t);
        String m = t.getMessage();
        return m != null ? m : t.getClass().getSimpleName();
    }
}
