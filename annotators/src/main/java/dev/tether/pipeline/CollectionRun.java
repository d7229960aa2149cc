package dev.tether.pipeline;

import dev.tether.documents.DocumentLabel;
import dev.tether.io.Sha256;
import dev.tether.ledger.LedgerWriter;
import dev.tether.output.AtomicFile;
import dev.tether.output.IoFailure;
import dev.tether.output.OutputFolder;
import dev.tether.output.RunManifest;
import dev.tether.output.XmiDocumentWriter;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineDescription;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
import org.apache.uima.jcas.JCas;
import org.apache.uima.util.CasCreationUtils;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.DigestOutputStream;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
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
 */
public final class CollectionRun {
    public static final String XMI = ".xmi";
    public static final String LEDGER = ".ledger.jsonl";

    /** What shapes the output: the model location and id, the chunk option, Tether's version. */
    public record Settings(String model, String modelId, boolean chunks, int threads, boolean fresh, String version) {
        /** The part of the settings that the output depends on, as recorded in the manifest. */
        String fingerprint() {
            return "tether " + version + "; model " + modelId + "; chunks " + chunks;
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
    private final Outcome[] outcomes;
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
        this.outcomes = new Outcome[listing.documents().size()];
        this.window = 4 * Math.max(1, settings.threads());
    }

    /** Runs the whole collection; the output folder must exist and be writable ({@link OutputFolder#prepare}). */
    public Result run(AnalysisEngineDescription pipeline) throws IOException {
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
            runWorkers(pipeline);
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
        AnalysisEngine engine = AnalysisEngineFactory.createEngine(pipeline);
        try {
            JCas jcas = CasCreationUtils.createCas(engine.getAnalysisEngineMetaData()).getJCas();
            LedgerWriter ledger = new LedgerWriter();
            for (int i = take(); i >= 0; i = take()) {
                Outcome outcome;
                try {
                    outcome = annotate(listing.documents().get(i), engine, jcas, ledger);
                } catch (Throwable e) { // one document fails alone, whatever went wrong with it
                    outcome = Outcome.failed(reason(listing.documents().get(i), e));
                }
                commit(i, outcome);
            }
            engine.collectionProcessComplete();
        } finally {
            engine.destroy();
        }
        return null;
    }

    /** The next document to do, or -1; waits while too many documents are done but not yet committed. */
    private synchronized int take() throws InterruptedException {
        while (nextToTake < outcomes.length && nextToTake >= nextToCommit + window) wait();
        return nextToTake < outcomes.length ? nextToTake++ : -1;
    }

    /** Records the outcome of document {@code i} and commits every document, in order, whose outcome is known. */
    private synchronized void commit(int i, Outcome outcome) throws IOException {
        outcomes[i] = outcome;
        while (nextToCommit < outcomes.length && outcomes[nextToCommit] != null) {
            String doc = listing.name(listing.documents().get(nextToCommit));
            Outcome o = outcomes[nextToCommit];
            if (o.entry != null && o.reused) {
                reused++;
            } else if (o.entry != null) {
                try {
                    for (String file : o.entry.outputs().keySet()) AtomicFile.commit(out.resolve(file));
                    manifest.complete(o.entry);
                    annotated++;
                } catch (IOException e) {
                    fail(doc, IoFailure.describe(e));
                }
            } else {
                fail(doc, o.reason);
            }
            outcomes[nextToCommit] = Outcome.DONE; // let the document's data go
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

    private Outcome annotate(Path file, AnalysisEngine engine, JCas jcas, LedgerWriter ledger) throws Exception {
        String doc = listing.name(file);
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            return Outcome.failed(file + ": no such file (it was listed at the start of the run and has gone since)");
        }
        String inputSha = Sha256.hex(bytes);
        RunManifest.Entry before = manifest.get(doc);
        if (before != null && before.inputSha256().equals(inputSha) && before.settings().equals(settings.fingerprint())
                && outputsIntact(before)) {
            return Outcome.reused(before);
        }
        String text = DocumentText.decode(file, bytes);
        jcas.reset();
        jcas.setDocumentLanguage("en");
        jcas.setDocumentText(text);
        DocumentLabel.set(jcas, doc);
        engine.process(jcas);
        Map<String, String> outputs = new LinkedHashMap<>();
        long[] decisions = {0};
        outputs.put(doc + XMI, writeTemporary(out.resolve(doc + XMI), o -> XmiDocumentWriter.write(jcas.getCas(), o)));
        outputs.put(doc + LEDGER, writeTemporary(out.resolve(doc + LEDGER), o -> {
            Writer w = new OutputStreamWriter(o, StandardCharsets.UTF_8);
            decisions[0] = ledger.write(jcas, doc, w);
            w.flush();
        }));
        jcas.reset();
        return Outcome.written(new RunManifest.Entry(doc, inputSha, settings.fingerprint(), outputs, decisions[0],
                text.codePointCount(0, text.length())));
    }

    /** Writes a temporary file for {@code target}; returns the SHA-256 of what was written. */
    private static String writeTemporary(Path target, AtomicFile.Content content) throws IOException {
        MessageDigest digest = Sha256.newDigest();
        AtomicFile.writeTemporary(target, o -> {
            DigestOutputStream d = new DigestOutputStream(o, digest);
            content.writeTo(d);
            d.flush();
        });
        return HexFormat.of().formatHex(digest.digest());
    }

    private boolean outputsIntact(RunManifest.Entry e) throws IOException {
        for (Map.Entry<String, String> o : e.outputs().entrySet()) {
            Path file = out.resolve(o.getKey());
            if (!Files.isRegularFile(file)) return false;
            MessageDigest digest = Sha256.newDigest();
            try (var in = Files.newInputStream(file)) {
                byte[] buffer = new byte[1 << 16];
                for (int n = in.read(buffer); n > 0; n = in.read(buffer)) digest.update(buffer, 0, n);
            }
            if (!HexFormat.of().formatHex(digest.digest()).equals(o.getValue())) return false;
        }
        return true;
    }

    private static String reason(Path file, Throwable e) {
        if (e instanceof dev.tether.io.InputFormatException) return e.getMessage();
        if (e instanceof IOException) return IoFailure.describe(e);
        if (e instanceof OutOfMemoryError) return file + ": not enough memory for this document; give Java more (-Xmx) or split the file";
        return rootMessage(e);
    }

    public static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) t = t.getCause();
        if (t instanceof IOException && !(t instanceof dev.tether.io.InputFormatException)) return IoFailure.describe(t);
        String m = t.getMessage();
        return m != null ? m : t.getClass().getSimpleName();
    }

    /** A document's outcome: written (entry, files still temporary), reused (entry), or failed (reason). */
    private record Outcome(RunManifest.Entry entry, boolean reused, String reason) {
        static final Outcome DONE = new Outcome(null, false, null);

        static Outcome written(RunManifest.Entry e) {
            return new Outcome(e, false, null);
        }

        static Outcome reused(RunManifest.Entry e) {
            return new Outcome(e, true, null);
        }

        static Outcome failed(String reason) {
            return new Outcome(null, false, reason);
        }
    }
}
