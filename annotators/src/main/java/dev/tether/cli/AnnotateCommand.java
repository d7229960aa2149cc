package dev.tether.cli;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import dev.tether.ledger.LedgerWriter;
import dev.tether.model.TetherModel;
import dev.tether.output.AtomicFile;
import dev.tether.output.OutputFolder;
import dev.tether.output.RunManifest;
import dev.tether.pipeline.CollectionRun;
import dev.tether.pipeline.DocumentFiles;
import dev.tether.pipeline.TetherPipeline;
import dev.tether.spark.SparkJob;
import dev.tether.spark.SparkLibraries;
import dev.tether.spark.SparkMaster;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import org.apache.uima.analysis_engine.AnalysisEngineDescription;
import org.apache.uima.resource.ResourceInitializationException;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * {@code tether annotate}: runs the standalone pipeline over plain-text files and writes, per document, an XMI file
 * and a JSON Lines ledger of decisions, plus {@code run-manifest.jsonl} (the complete documents) and
 * {@code run-summary.json}. A document that cannot be read or processed fails alone: it is listed in the summary,
 * the others are written, and the exit code is 1. Re-running the same command finishes an interrupted run; see
 * {@link CollectionRun}.
 *
 * <p>Checked before any output appears: the command line, the input (an input without documents is an error that
 * names the file ending looked for), the model (a model that cannot be loaded creates no output folder), and that
 * the output folder can be written.
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
        return "annotate --in FILE|FOLDER --out FOLDER [--model MODEL|default] [--threads N | --spark MASTER] [--chunks] [--line-sentences] [--fresh] [--report]";
    }

    @Override
    public String help() {
        return "usage: tether " + usage() + "\n\n"
                + "Annotates plain UTF-8 text: per document <name>.xmi (UIMA XMI, UTF-16 offsets) and\n"
                + "<name>.ledger.jsonl (one JSON object per decision, offsets in Unicode code points), plus\n"
                + RunManifest.FILE + " (the complete documents) and " + SUMMARY + ".\n\n"
                + "  --in FILE|FOLDER   a text file, or a folder: every *" + DocumentFiles.EXTENSION + " file below it (any letter case),\n"
                + "                     in sorted order; hidden files, links inside the folder and other\n"
                + "                     endings are skipped and counted in the summary\n"
                + "  --out FOLDER       where the output goes; created if needed\n"
                + "  --model M          'default' (the shipped model) or a model file from 'tether train'\n"
                + "  --threads N        pipelines run side by side, sharing one loaded model (default: the\n"
                + "                     number of cores, " + Runtime.getRuntime().availableProcessors() + " here); the output does not depend on N\n"
                + "  --spark MASTER     run on Apache Spark: local[N] (embedded, N pipelines), spark://host:port, yarn,\n"
                + "                     k8s://...; the output is byte for byte that of a run on threads\n"
                + "  --chunks           also write base chunks into the XMI (slower; Tether does not need them)\n"
                + "  --line-sentences   every line break ends a sentence, for text written one entry per line\n"
                + "                     (logs, lists, notes); by default a line break is a space and the\n"
                + "                     sentence detector decides, which suits prose wrapped at a fixed width\n"
                + "  --fresh            start over: forget what an earlier run into --out completed\n"
                + "  --report           also write the HTML audit report into --out/" + REPORT + "/ (see 'tether audit')\n\n"
                + "Re-running the same command into the same folder finishes an interrupted run: documents whose\n"
                + "input, model and options are unchanged are reused, the rest are done again, and the folder ends\n"
                + "with exactly the output of a clean run.\n"
                + "Exit codes: 0 all documents written; 1 some failed (listed); 2 wrong command line;\n"
                + "3 the input, the model or the output folder cannot be used.\n";
    }

    @Override
    public int run(String[] args, PrintStream out, PrintStream err) throws UsageException, IOException {
        CommandArguments a = new CommandArguments(name(), args, 1, Set.of("in", "out", "model", "threads", "spark"),
                Set.of("chunks", "line-sentences", "fresh", "report"));
        SparkMaster spark = SparkOption.master(a.value("spark", null));
        if (spark != null && a.has("threads")) {
            throw new UsageException("--threads and --spark exclude each other: on Spark the master sets how many"
                    + " pipelines run side by side (local[N], or the cluster's executor cores)");
        }
        Path in = Path.of(a.required("in"));
        Path outDir = Path.of(a.required("out"));
        String model = a.value("model", ModelLocator.DEFAULT);
        int threads = a.integer("threads", 1, Runtime.getRuntime().availableProcessors());
        boolean chunks = a.has("chunks");
        boolean lineSentences = a.has("line-sentences");
        if (Files.exists(outDir) && !Files.isDirectory(outDir)) {
            throw new IOException(outDir + " exists and is not a folder; give a folder for --out");
        }
        DocumentFiles.Listing listing = DocumentFiles.list(in);
        if (listing.documents().isEmpty()) {
            throw new IOException("no documents in " + in + ": looked for files ending in " + DocumentFiles.EXTENSION
                    + " (any letter case)" + (listing.skippedTotal() > 0 ? " (skipped: " + skippedText(listing) + ")" : "")
                    + "; give a folder of plain-text "
                    + DocumentFiles.EXTENSION + " files, or one file");
        }
        TetherModel loaded = ModelLocator.load(model); // fails with the model's own message, before any output
        AnalysisEngineDescription pipeline;
        try {
            pipeline = TetherPipeline.forRawText(model, chunks, lineSentences);
        } catch (ResourceInitializationException e) {
            throw new IOException("cannot build the pipeline: " + CollectionRun.rootMessage(e), e);
        }
        CollectionRun.Settings settings;
        CollectionRun.Result result;
        if (spark == null) {
            OutputFolder.prepare(outDir);
            // An old summary would claim the folder is complete while this run is under way.
            Files.deleteIfExists(outDir.resolve(SUMMARY));
            settings = new CollectionRun.Settings(model, loaded.id(), chunks, lineSentences, threads, a.has("fresh"),
                    Tether.version());
            result = runWithProgress(listing, outDir, settings, err, run -> run.run(pipeline));
        } else {
            SparkLibraries.require();
            try (SparkJob job = SparkJob.start(spark, "tether annotate")) {
                job.checkExecutors(List.of(in.toString()), model, loaded.id(), outDir); // before any output, like the checks above
                OutputFolder.prepare(outDir);
                Files.deleteIfExists(outDir.resolve(SUMMARY));
                settings = new CollectionRun.Settings(model, loaded.id(), chunks, lineSentences, job.parallelism(),
                        a.has("fresh"), Tether.version());
                CollectionRun.Elsewhere onSpark = job.annotation(model, loaded.id(), chunks, lineSentences, outDir);
                result = runWithProgress(listing, outDir, settings, err, run -> run.run(onSpark));
            }
        }
        writeSummary(outDir.resolve(SUMMARY), settings, listing, result);

        int total = listing.documents().size();
        out.printf("annotated %,d of %,d documents (%,d reused from an earlier run), %,d attachment decisions, %.1f s%n",
                result.complete(), total, result.reused(), result.decisions(), result.seconds());
        if (listing.skippedTotal() > 0) out.println("skipped: " + skippedText(listing));
        if (result.temporaryRemoved() > 0) {
            out.printf("removed %,d temporary files left by an interrupted run%n", result.temporaryRemoved());
        }
        if (result.staleRemoved() > 0) {
            out.printf("removed the earlier outputs of %,d documents that failed now or are no longer in the input%n",
                    result.staleRemoved());
        }
        out.printf("output: %s  (per document: .xmi and .ledger.jsonl; %s; summary: %s)%n", outDir, RunManifest.FILE, SUMMARY);
        int reported = a.has("report") ? AuditCommand.report(outDir, outDir.resolve(REPORT), -1, null, out, err) : Tether.OK;
        if (!result.failed().isEmpty()) {
            out.printf("%,d documents failed:%n", result.failed().size());
            for (CollectionRun.Failure f : result.failed()) out.println("  " + f.doc() + ": " + f.reason());
            return Tether.SOME_FAILED;
        }
        return reported;
    }

    @FunctionalInterface
    private interface Runner {
        CollectionRun.Result run(CollectionRun run) throws IOException;
    }

    private static CollectionRun.Result runWithProgress(DocumentFiles.Listing listing, Path outDir,
                                                        CollectionRun.Settings settings, PrintStream err, Runner runner)
            throws IOException {
        int total = listing.documents().size();
        boolean showProgress = System.console() != null && total > 1;
        try (ProgressBar bar = showProgress ? new ProgressBarBuilder().setTaskName("annotating").setInitialMax(total)
                .setStyle(ProgressBarStyle.ASCII).setConsumer(new ConsoleProgressBarConsumer(err)).build() : null) {
            return runner.run(new CollectionRun(listing, outDir, settings, done -> {
                if (bar != null) bar.stepTo(done);
            }));
        }
    }

    /** "3 with other endings, 1 hidden, 2 symbolic links (not followed)": what the listing left out. */
    private static String skippedText(DocumentFiles.Listing listing) {
        List<String> parts = new ArrayList<>();
        long other = listing.skipped(DocumentFiles.Skip.OTHER_EXTENSION);
        long hidden = listing.skipped(DocumentFiles.Skip.HIDDEN);
        long links = listing.skipped(DocumentFiles.Skip.LINK);
        long unreadable = listing.skipped(DocumentFiles.Skip.UNREADABLE);
        if (other > 0) parts.add(other + " with other endings");
        if (hidden > 0) parts.add(hidden + " hidden");
        if (links > 0) parts.add(links + " symbolic links (not followed)");
        if (unreadable > 0) parts.add(unreadable + " unreadable or not regular files");
        return String.join(", ", parts);
    }

    private static void writeSummary(Path file, CollectionRun.Settings settings, DocumentFiles.Listing listing,
                                     CollectionRun.Result r) throws IOException {
        AtomicFile.write(file, o -> {
            try (JsonGenerator g = new JsonFactory().createGenerator(o).useDefaultPrettyPrinter()) {
                g.writeStartObject();
                g.writeStringField("model", settings.model());
                g.writeStringField("modelId", settings.modelId());
                g.writeNumberField("ledgerFormat", LedgerWriter.FORMAT);
                g.writeNumberField("documents", r.documents());
                g.writeNumberField("written", r.complete());
                g.writeNumberField("annotated", r.annotated());
                g.writeNumberField("reused", r.reused());
                g.writeNumberField("decisions", r.decisions());
                g.writeNumberField("characters", r.characters());
                g.writeObjectFieldStart("skipped");
                for (DocumentFiles.Skip kind : DocumentFiles.Skip.values()) g.writeNumberField(kind.label(), listing.skipped(kind));
                g.writeEndObject();
                g.writeNumberField("staleOutputsRemoved", r.staleRemoved());
                g.writeNumberField("temporaryFilesRemoved", r.temporaryRemoved());
                g.writeObjectFieldStart("offsets");
                g.writeStringField("ledger", LedgerWriter.OFFSET_UNIT);
                g.writeStringField("xmi", "utf-16-code-units");
                g.writeStringField("byteOrderMark", "not part of the text: offsets start after it");
                g.writeEndObject();
                g.writeBooleanField("chunks", settings.chunks());
                g.writeBooleanField("lineBreaksEndSentences", settings.lineBreaksEndSentences());
                g.writeNumberField("threads", settings.threads());
                g.writeNumberField("seconds", Math.round(r.seconds() * 100) / 100.0);
                g.writeArrayFieldStart("failed");
                for (CollectionRun.Failure f : r.failed()) {
                    g.writeStartObject();
                    g.writeStringField("doc", f.doc());
                    g.writeStringField("reason", f.reason());
                    g.writeEndObject();
                }
                g.writeEndArray();
                g.writeEndObject();
            }
        });
    }
}
