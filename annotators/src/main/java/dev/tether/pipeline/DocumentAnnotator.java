package dev.tether.pipeline;

import dev.tether.documents.DocumentLabel;
import dev.tether.io.InputFormatException;
import dev.tether.io.Sha256;
import dev.tether.ledger.LedgerWriter;
import dev.tether.output.AtomicFile;
import dev.tether.output.IoFailure;
import dev.tether.output.RunManifest;
import dev.tether.output.XmiDocumentWriter;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineDescription;
import org.apache.uima.analysis_engine.AnalysisEngineProcessException;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
import org.apache.uima.jcas.JCas;
import org.apache.uima.resource.ResourceInitializationException;
import org.apache.uima.util.CasCreationUtils;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.DigestOutputStream;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One pipeline with its own CAS: annotates one document at a time into temporary files of an output folder, the
 * unit of work of a {@link CollectionRun} (one per worker thread) and of the Spark job (one per executor slot).
 * A document that fails gives a failed {@link DocumentOutcome} with the reason; it never stops the annotator.
 * Not thread-safe; the models behind the pipeline are shared.
 */
public final class DocumentAnnotator implements AutoCloseable {
    private final AnalysisEngine engine;
    private final JCas jcas;
    private final LedgerWriter ledger = new LedgerWriter();

    public DocumentAnnotator(AnalysisEngineDescription pipeline) throws ResourceInitializationException {
        engine = AnalysisEngineFactory.createEngine(pipeline);
        try {
            jcas = CasCreationUtils.createCas(engine.getAnalysisEngineMetaData()).getJCas();
        } catch (ResourceInitializationException e) {
            engine.destroy();
            throw e;
        } catch (Exception e) {
            engine.destroy();
            throw new ResourceInitializationException(e);
        }
    }

    /**
     * Annotates {@code task}'s document into temporary files of {@code out} (named with {@code attempt}, see
     * {@link AtomicFile#temporaryFor(Path, String)}; {@code null} for the plain temporary names), or reuses its
     * earlier outputs when its input, the {@code fingerprint} of the settings and the outputs are unchanged.
     */
    public DocumentOutcome annotate(DocumentTask task, Path out, String fingerprint, String attempt) {
        Path file = Path.of(task.file());
        try {
            return annotate(task, file, out, fingerprint, attempt);
        } catch (Throwable e) { // one document fails alone, whatever went wrong with it
            try {
                jcas.reset();
            } catch (RuntimeException ignored) {
                // the next document resets again
            }
            return DocumentOutcome.failed(task.index(), reason(file, e));
        }
    }

    private DocumentOutcome annotate(DocumentTask task, Path file, Path out, String fingerprint, String attempt)
            throws Exception {
        String doc = task.doc();
        RunManifest.Entry before = task.earlier();
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            return DocumentOutcome.failed(task.index(), file + ": no such file (it was listed at the start of the run and has gone since)");
        }
        String inputSha = Sha256.hex(bytes);
        if (before != null && before.inputSha256().equals(inputSha) && before.settings().equals(fingerprint)
                && outputsIntact(out, before)) {
            return DocumentOutcome.reused(task.index(), before);
        }
        String text = DocumentText.decode(file, bytes);
        jcas.reset();
        jcas.setDocumentLanguage("en");
        jcas.setDocumentText(text);
        DocumentLabel.set(jcas, doc);
        engine.process(jcas);
        Map<String, String> outputs = new LinkedHashMap<>();
        long[] decisions = {0};
        outputs.put(doc + CollectionRun.XMI, writeTemporary(out.resolve(doc + CollectionRun.XMI), attempt,
                o -> XmiDocumentWriter.write(jcas.getCas(), o)));
        outputs.put(doc + CollectionRun.LEDGER, writeTemporary(out.resolve(doc + CollectionRun.LEDGER), attempt, o -> {
            Writer w = new OutputStreamWriter(o, StandardCharsets.UTF_8);
            decisions[0] = ledger.write(jcas, doc, w);
            w.flush();
        }));
        jcas.reset();
        return DocumentOutcome.written(task.index(), new RunManifest.Entry(doc, inputSha, fingerprint, outputs, decisions[0],
                text.codePointCount(0, text.length())));
    }

    /** Tells the engines that the collection is complete (their summaries) and releases them. */
    @Override
    public void close() {
        try {
            engine.collectionProcessComplete();
        } catch (AnalysisEngineProcessException e) {
            throw new IllegalStateException("the pipeline failed at the end of the collection: "
                    + CollectionRun.rootMessage(e), e);
        } finally {
            engine.destroy();
        }
    }

    /** Writes a temporary file for {@code target}; returns the SHA-256 of what was written. */
    private static String writeTemporary(Path target, String attempt, AtomicFile.Content content) throws IOException {
        MessageDigest digest = Sha256.newDigest();
        AtomicFile.writeTemporary(target, attempt, o -> {
            DigestOutputStream d = new DigestOutputStream(o, digest);
            content.writeTo(d);
            d.flush();
        });
        return HexFormat.of().formatHex(digest.digest());
    }

    private static boolean outputsIntact(Path out, RunManifest.Entry e) throws IOException {
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
        if (e instanceof InputFormatException) return e.getMessage();
        if (e instanceof IOException) return IoFailure.describe(e);
        if (e instanceof OutOfMemoryError) return file + ": not enough memory for this document; give Java more (-Xmx) or split the file";
        return CollectionRun.rootMessage(e);
    }
}
