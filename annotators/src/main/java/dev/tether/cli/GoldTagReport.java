package dev.tether.cli;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import dev.tether.audit.CalibrationPage;
import dev.tether.candidates.HeadCandidateProposer;
import dev.tether.evaluation.Accuracy;
import dev.tether.evaluation.CoordinationEvaluation;
import dev.tether.evaluation.CoordinationGoldTagEvaluator;
import dev.tether.evaluation.GoldTagEvaluation;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;
import dev.tether.evaluation.GoldTagEvaluator;
import dev.tether.model.TetherModel;
import dev.tether.treebank.TreebankExampleExtractor;
import dev.tether.treebank.TreebankExamples;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

/** {@code tether evaluate --conllu FILE --gold-tags}: head choice on the treebank's own tokens and tags. */
final class GoldTagReport {
    private final TetherModel model;

    GoldTagReport(TetherModel model) {
        this.model = model;
    }

    int run(Path conllu, boolean json, Path report, PrintStream out) throws IOException {
        if (Files.isDirectory(conllu)) throw new IOException(conllu + " is a directory; give a CoNLL-U file");
        TreebankExamples examples = new TreebankExampleExtractor(new HeadCandidateProposer()).extract(conllu);
        GoldTagEvaluation e = new GoldTagEvaluator().evaluate(model, examples);
        Accuracy a = e.attachment();
        CoordinationEvaluation coordination = new CoordinationEvaluation();
        CoordinationGoldTagEvaluator coordinationEvaluator = new CoordinationGoldTagEvaluator();
        try (ConlluReader reader = ConlluReader.open(conllu)) {
            for (TreebankSentence s = reader.next(); s != null; s = reader.next()) {
                coordinationEvaluator.add(s, model.coordinationRanker().orElse(null), coordination);
            }
        }
        boolean hasRanker = model.coordinationRanker().isPresent();
        if (json) {
            try (JsonGenerator g = new JsonFactory().createGenerator(out).useDefaultPrettyPrinter()) {
                g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
                g.writeStartObject();
                g.writeStringField("model", model.id());
                g.writeStringField("data", conllu.getFileName().toString());
                g.writeStringField("tags", "gold");
                g.writeNumberField("n", a.total());
                g.writeObjectFieldStart("attachment");
                AccuracyJson.fields(g, a);
                g.writeNumberField("candidateRecall", e.candidateRecall().value());
                g.writeNumberField("calibration_error", e.calibration().ece());
                AccuracyJson.versusCountScore(g, e.versusCountScore());
                g.writeEndObject();
                CoordinationReport.json(g, coordination, hasRanker);
                g.writeObjectFieldStart("baselines");
                for (Map.Entry<String, Accuracy> c : e.comparisons().entrySet()) AccuracyJson.write(g, c.getKey(), c.getValue());
                g.writeEndObject();
                g.writeEndObject();
            }
            out.println();
        } else {
            double[] ci = a.interval95();
            out.printf("model %s on %s with gold tokens and tags: %,d gold prepositional attachments%n", model.id(),
                    conllu.getFileName(), a.total());
            out.printf("%-28s %7.2f%%  [%.2f, %.2f]  <- model%n", "attachment", 100 * a.value(), 100 * ci[0], 100 * ci[1]);
            for (Map.Entry<String, Accuracy> c : e.comparisons().entrySet()) {
                out.printf("%-28s %7.2f%%  (%,d of %,d)%n", c.getKey(), 100 * c.getValue().value(), c.getValue().correct(), c.getValue().total());
            }
            out.println(AccuracyJson.versusCountScoreLine(e.versusCountScore()));
        out.printf("%-28s %7.2f%%%n", "candidate recall", 100 * e.candidateRecall().value());
            out.printf("%-28s %8.4f  (%d equal-width bins)%n", "expected calibration error", e.calibration().ece(), e.calibration().bins());
            CoordinationReport.text(out, coordination, hasRanker);
        }
        if (report != null) {
            Path page = CalibrationPage.write(report, model.id(), conllu.getFileName().toString(),
                    "gold tokens and tags", a.value(), e.calibration());
            (json ? System.err : out).println("calibration report: " + page);
        }
        return Tether.OK;
    }
}
