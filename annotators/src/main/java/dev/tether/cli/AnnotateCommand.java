package dev.tether.cli;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import dev.tether.ledger.LedgerWriter;
import dev.tether.pipeline.DocumentFiles;
import dev.tether.pipeline.DocumentText;
import dev.tether.pipeline.TetherPipeline;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineProcessException;
import org.apache.uima.cas.impl.XmiCasSerializer;
import org.apache.uima.jcas.JCas;
import org.apache.uima.resource.ResourceInitializationException;
import org.apache.uima.util.CasCreationUtils;
import org.xml.sax.SAXException;

import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintStream;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * {@code tether annotate}: runs the standalone pipeline over plain-text files and writes, per document, an XMI file
 * and a JSON Lines ledger of decisions, plus {@code run-summary.json}. A document that cannot be read or processed
 * fails alone: it is listed in the summary, the others are written, and the exit code is 1.
 */
final class AnnotateCommand implements Command {
    static final String SUMMARY = "run-summary.json";
    /** Folder of the HTML report inside the output folder, with {@code --report}. */
    static final String REPORT = "report";

    @Override
    public String name() {
        return "annotate";
    }

    @Override
    public String usage() {
        return "annotate --in FILE|FOLDER --out FOLDER [--model MODEL|default] [--report]";
    }

    @Override
    public int run(String[] args, PrintStream out, PrintStream err) throws UsageException, IOException {
        CommandArguments a = new CommandArguments(name(), args, 1, Set.of("in", "out", "model"), Set.of("report"));
        Path in = Path.of(a.required("in"));
        Path outDir = Path.of(a.required("out"));
        String model = a.value("model", ModelLocator.DEFAULT);
        if (Files.exists(outDir) && !Files.isDirectory(outDir)) {
            throw new IOException(outDir + " exists and is not a folder; give a folder for --out");
        }
        List<Path> files = DocumentFiles.under(in);
        Path base = Files.isDirectory(in) ? in : in.toAbsolutePath().getParent();
        Files.createDirectories(outDir);

        String modelId = ModelLocator.load(model).id(); // fail early, with the model's own message, before building the pipeline
        AnalysisEngine engine;
        JCas jcas;
        try {
            engine = TetherPipeline.createForRawText(model);
            jcas = CasCreationUtils.createCas(engine.getAnalysisEngineMetaData()).getJCas();
        } catch (ResourceInitializationException | org.apache.uima.cas.CASException e) {
            throw new IOException("cannot build the pipeline: " + rootMessage(e), e);
        }
        LedgerWriter ledger = new LedgerWriter();
        Map<String, String> failed = new LinkedHashMap<>();
        long decisions = 0;
        long characters = 0;
        int written = 0;
        long start = System.nanoTime();
        boolean showProgress = System.console() != null && files.size() > 1;
        try (ProgressBar bar = showProgress ? new ProgressBarBuilder().setTaskName("annotating").setInitialMax(files.size())
                .setStyle(ProgressBarStyle.ASCII).setConsumer(new me.tongfei.progressbar.ConsoleProgressBarConsumer(err)).build() : null) {
            for (Path file : files) {
                String doc = base.toAbsolutePath().relativize(file.toAbsolutePath()).toString().replace('\\', '/');
                try {
                    String text = DocumentText.read(file);
                    jcas.reset();
                    jcas.setDocumentLanguage("en");
                    jcas.setDocumentText(text);
                    engine.process(jcas);
                    Path xmi = outDir.resolve(doc + ".xmi");
                    Path jsonl = outDir.resolve(doc + ".ledger.jsonl");
                    Files.createDirectories(xmi.getParent());
                    try (OutputStream o = Files.newOutputStream(xmi)) {
                        XmiCasSerializer.serialize(jcas.getCas(), null, o, true, null);
                    }
                    try (Writer w = Files.newBufferedWriter(jsonl, StandardCharsets.UTF_8)) {
                        decisions += ledger.write(jcas, doc, w);
                    }
                    characters += text.length();
                    written++;
                } catch (IOException | AnalysisEngineProcessException | SAXException | RuntimeException e) {
                    failed.put(doc, rootMessage(e));
                }
                if (bar != null) bar.step();
            }
        }
        try {
            engine.collectionProcessComplete();
        } catch (AnalysisEngineProcessException e) {
            failed.put("(end of run)", rootMessage(e));
        }
        engine.destroy();
        double seconds = (System.nanoTime() - start) / 1e9;
        writeSummary(outDir.resolve(SUMMARY), model, modelId, files.size(), written, decisions, characters, seconds, failed);
        out.printf("annotated %,d of %,d documents, %,d attachment decisions, %.1f s%n", written, files.size(), decisions, seconds);
        out.printf("output: %s  (per document: .xmi and .ledger.jsonl; summary: %s)%n", outDir, SUMMARY);
        int reported = a.has("report") ? AuditCommand.report(outDir, outDir.resolve(REPORT), -1, null, out, err) : Tether.OK;
        if (!failed.isEmpty()) {
            out.printf("%,d documents failed:%n", failed.size());
            failed.forEach((doc, why) -> out.println("  " + doc + ": " + why));
            return Tether.SOME_FAILED;
        }
        return reported;
    }

    private static void writeSummary(Path file, String model, String modelId, int documents, int written, long decisions, long characters,
                                     double seconds, Map<String, String> failed) throws IOException {
        try (OutputStream o = Files.newOutputStream(file);
             JsonGenerator g = new JsonFactory().createGenerator(o).useDefaultPrettyPrinter()) {
            g.writeStartObject();
            g.writeStringField("model", model);
            g.writeStringField("modelId", modelId);
            g.writeNumberField("ledgerFormat", LedgerWriter.FORMAT);
            g.writeNumberField("documents", documents);
            g.writeNumberField("written", written);
            g.writeNumberField("decisions", decisions);
            g.writeNumberField("characters", characters);
            g.writeNumberField("seconds", Math.round(seconds * 100) / 100.0);
            g.writeArrayFieldStart("failed");
            for (Map.Entry<String, String> f : failed.entrySet()) {
                g.writeStartObject();
                g.writeStringField("doc", f.getKey());
                g.writeStringField("reason", f.getValue());
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeEndObject();
        }
    }

    static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) t = t.getCause();
        String m = t.getMessage();
        return m != null ? m : t.getClass().getSimpleName();
    }
}
