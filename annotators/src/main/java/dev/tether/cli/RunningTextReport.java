package dev.tether.cli;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import dev.tether.audit.CalibrationPage;
import dev.tether.evaluation.Accuracy;
import dev.tether.evaluation.RunningTextEvaluation;
import dev.tether.evaluation.RunningTextEvaluator;
import dev.tether.model.TetherModel;
import dev.tether.pipeline.TetherPipeline;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineProcessException;
import org.apache.uima.resource.ResourceInitializationException;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

/** {@code tether evaluate --conllu}: the whole pipeline on running text, scored against gold trees. */
final class RunningTextReport {
    private final String modelLocation;
    private final TetherModel model;

    RunningTextReport(String modelLocation, TetherModel model) {
        this.modelLocation = modelLocation;
        this.model = model;
    }

    int run(Path conllu, boolean json, Path report, PrintStream out) throws IOException {
        if (Files.isDirectory(conllu)) throw new IOException(conllu + " is a directory; give a CoNLL-U file");
        RunningTextEvaluation e;
        try {
            AnalysisEngine pipeline = TetherPipeline.createForRawText(modelLocation);
            e = new RunningTextEvaluator(pipeline, model).evaluate(conllu);
            pipeline.destroy();
        } catch (ResourceInitializationException | AnalysisEngineProcessException ex) {
            throw new IOException("the pipeline failed on " + conllu + ": " + dev.tether.pipeline.CollectionRun.rootMessage(ex), ex);
        }
        if (json) {
            writeJson(out, conllu, e);
        } else {
            writeText(out, conllu, e);
        }
        if (report != null) {
            Path page = CalibrationPage.write(report, model.id(), conllu.getFileName().toString(),
                    "raw text through the whole pipeline", e.attachment().value(), e.calibration());
            (json ? System.err : out).println("calibration report: " + page);
        }
        return Tether.OK;
    }

    private void writeText(PrintStream out, Path conllu, RunningTextEvaluation e) {
        Accuracy a = e.attachment();
        double[] ci = a.interval95();
        out.printf("model %s on %s: %,d sentences, %,d tokens, %,d gold prepositional attachments (%.1f s)%n", model.id(),
                conllu.getFileName(), e.sentences(), e.tokens(), a.total(), e.seconds());
        out.printf("%-28s %8s  %s%n", "", "accuracy", "95% interval");
        out.printf("%-28s %7.2f%%  [%.2f, %.2f]  <- model%n", "attachment", 100 * a.value(), 100 * ci[0], 100 * ci[1]);
        for (Map.Entry<String, Accuracy> b : e.baselines().entrySet()) {
            double[] i = b.getValue().interval95();
            out.printf("%-28s %7.2f%%  [%.2f, %.2f]%n", b.getKey(), 100 * b.getValue().value(), 100 * i[0], 100 * i[1]);
        }
        out.println(AccuracyJson.versusCountScoreLine(e.versusCountScore()));
        out.printf("%-28s %7.2f%%%n", "candidate recall", 100 * e.candidateRecall().value());
        out.printf("%-28s %8d%n", "prepositions not decided", e.missedPrepositions());
        out.printf("%-28s %8.4f  (%d equal-width bins, %,d decisions)%n", "expected calibration error", e.calibration().ece(),
                e.calibration().bins(), e.calibration().total());
        out.println();
        out.printf("by gold head class%n%-12s %6s %9s%n", "class", "n", "accuracy");
        for (Map.Entry<String, Accuracy> c : e.byHeadClass().entrySet()) {
            out.printf("%-12s %6d %8.2f%%%n", c.getKey(), c.getValue().total(), 100 * c.getValue().value());
        }
        CoordinationReport.text(out, e.coordination(), model.coordinationRanker().isPresent());
        out.printf("accuracy %.4f (95%% interval %.4f-%.4f)%n", a.value(), ci[0], ci[1]);
    }

    private void writeJson(PrintStream out, Path conllu, RunningTextEvaluation e) throws IOException {
        try (JsonGenerator g = new JsonFactory().createGenerator(out).useDefaultPrettyPrinter()) {
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            Accuracy a = e.attachment();
            g.writeStartObject();
            g.writeStringField("model", model.id());
            g.writeStringField("data", conllu.getFileName().toString());
            g.writeNumberField("sentences", e.sentences());
            g.writeNumberField("tokens", e.tokens());
            g.writeNumberField("seconds", e.seconds());
            g.writeNumberField("n", a.total());
            g.writeObjectFieldStart("attachment");
            AccuracyJson.fields(g, a);
            g.writeNumberField("candidateRecall", e.candidateRecall().value());
            g.writeNumberField("calibration_error", e.calibration().ece());
            AccuracyJson.versusCountScore(g, e.versusCountScore());
            g.writeNumberField("missedPrepositions", e.missedPrepositions());
            g.writeNumberField("decisions", e.decisions());
            g.writeObjectFieldStart("byHeadClass");
            for (Map.Entry<String, Accuracy> c : e.byHeadClass().entrySet()) AccuracyJson.write(g, c.getKey(), c.getValue());
            g.writeEndObject();
            g.writeEndObject();
            CoordinationReport.json(g, e.coordination(), model.coordinationRanker().isPresent());
            writeBaselines(g, e);
            g.writeEndObject();
        }
        out.println();
    }

    private static void writeBaselines(JsonGenerator g, RunningTextEvaluation e) throws IOException {
        g.writeObjectFieldStart("baselines");
        for (Map.Entry<String, Accuracy> b : e.baselines().entrySet()) AccuracyJson.write(g, b.getKey(), b.getValue());
        g.writeEndObject();
    }
}
