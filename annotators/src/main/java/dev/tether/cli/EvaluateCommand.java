package dev.tether.cli;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.DecisionBasis;
import dev.tether.evaluation.Accuracy;
import dev.tether.evaluation.QuadrupleEvaluation;
import dev.tether.evaluation.QuadrupleEvaluator;
import dev.tether.io.QuadrupleReader;
import dev.tether.io.QuadrupleSet;
import dev.tether.model.TetherModel;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.Map;
import java.util.Set;

/** {@code tether evaluate}: accuracy on labelled data, with baselines from the same run. */
final class EvaluateCommand implements Command {
    private static final String ALWAYS_NOUN = "always-noun";
    private static final String MAJORITY = "preposition-majority";

    @Override
    public String name() {
        return "evaluate";
    }

    @Override
    public String usage() {
        return "evaluate --model MODEL|default (--quadruples FILE [--skip-malformed] | --conllu FILE [--gold-tags] [--report FOLDER]) [--json]";
    }

    @Override
    public String help() {
        return "usage: tether " + usage() + "\n\n"
                + "Measures accuracy on labelled data, with baselines computed in the same run.\n\n"
                + "  --model MODEL|default  the model to evaluate\n"
                + "  --quadruples FILE      labelled quadruples (benchmark or Tether format): accuracy, both baselines,\n"
                + "                         lexical association, accuracy by back-off level\n"
                + "  --skip-malformed       skip and count quadruple lines that do not parse\n"
                + "  --conllu FILE          a treebank: the whole pipeline on its '# text' lines, scored against the trees\n"
                + "  --gold-tags            with --conllu: use the treebank's own tokens and tags instead\n"
                + "  --json                 print one JSON object instead of text\n";
    }

    @Override
    public int run(String[] args, PrintStream out, PrintStream err) throws UsageException, IOException {
        CommandArguments a = new CommandArguments(name(), args, 1, Set.of("model", "quadruples", "conllu", "report"), Set.of("json", "skip-malformed", "gold-tags"));
        String modelLocation = a.value("model", ModelLocator.DEFAULT);
        TetherModel model = ModelLocator.load(modelLocation);
        if (a.has("quadruples") == a.has("conllu")) {
            throw new UsageException("give the gold data with either --quadruples or --conllu");
        }
        if (a.has("conllu")) {
            Path conllu = Path.of(a.required("conllu"));
            Path report = a.has("report") ? Path.of(a.required("report")) : null;
            if (a.has("gold-tags")) return new GoldTagReport(model).run(conllu, a.has("json"), report, out);
            return new RunningTextReport(modelLocation, model).run(conllu, a.has("json"), report, out);
        }
        if (a.has("report")) throw new UsageException("--report draws calibration on running text; use it with --conllu");
        QuadrupleSet set = new QuadrupleReader(a.has("skip-malformed")).read(Path.of(a.required("quadruples")));
        QuadrupleEvaluation e = new QuadrupleEvaluator().evaluate(model, set.quadruples());
        if (a.has("json")) {
            writeJson(out, model, set, e);
        } else {
            writeText(out, model, set, e);
        }
        return Tether.OK;
    }

    private static void writeText(PrintStream out, TetherModel model, QuadrupleSet set, QuadrupleEvaluation e) {
        Accuracy main = e.main();
        double[] ci = main.interval95();
        out.printf("model %s on %s: %,d quadruples%s%n", model.id(), set.name(), main.total(),
                set.skipped() > 0 ? String.format(" (%,d malformed lines skipped)", set.skipped()) : "");
        out.printf("%-24s %8s  %s%n", "scorer", "accuracy", "95% interval");
        for (Map.Entry<String, Accuracy> s : e.byScorer().entrySet()) {
            double[] i = s.getValue().interval95();
            out.printf("%-24s %7.2f%%  [%.2f, %.2f]%s%n", s.getKey(), 100 * s.getValue().value(), 100 * i[0], 100 * i[1],
                    s.getKey().equals(e.mainScorer()) ? "  <- model" : "");
        }
        out.println();
        out.printf("%s by back-off level%n%-14s %8s %8s %9s%n", e.mainScorer(), "level", "share", "n", "accuracy");
        for (Map.Entry<DecisionBasis, Accuracy> b : e.byBasis().entrySet()) {
            out.printf("%-14s %7.1f%% %8d %8.2f%%%n", b.getKey().label(), 100.0 * b.getValue().total() / main.total(),
                    b.getValue().total(), 100 * b.getValue().value());
        }
        if (!e.smoothingByLevel().isEmpty()) {
            out.println();
            out.printf("%s against the plain back-off, by the level the plain back-off decided at (same items)%n%-14s %8s %9s %9s %7s%n",
                    e.mainScorer(), "plain level", "n", "plain", "model", "gain");
            for (Map.Entry<DecisionBasis, Accuracy[]> b : e.smoothingByLevel().entrySet()) {
                Accuracy[] pair = b.getValue();
                out.printf("%-14s %8d %8.2f%% %8.2f%% %+6.2f%n", b.getKey().label(), pair[0].total(), 100 * pair[0].value(),
                        100 * pair[1].value(), 100 * (pair[1].value() - pair[0].value()));
            }
        }
        out.println();
        out.printf("confusion (rows gold, columns chosen)%n%-10s %8s %8s%n", "", "noun", "verb");
        for (AttachmentSite gold : AttachmentSite.values()) {
            out.printf("%-10s %8d %8d%n", gold.name().toLowerCase(), e.confusion(gold, AttachmentSite.NOUN), e.confusion(gold, AttachmentSite.VERB));
        }
        if (e.unknownPrepositions() > 0) out.printf("%n%,d quadruples have a preposition the model never saw%n", e.unknownPrepositions());
        out.printf("accuracy %.4f (95%% interval %.4f-%.4f)%n", main.value(), ci[0], ci[1]);
    }

    private static void writeJson(PrintStream out, TetherModel model, QuadrupleSet set, QuadrupleEvaluation e) throws IOException {
        try (JsonGenerator g = new JsonFactory().createGenerator(out).useDefaultPrettyPrinter()) {
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            Accuracy main = e.main();
            g.writeStartObject();
            g.writeStringField("model", model.id());
            g.writeStringField("data", set.name());
            g.writeStringField("scorer", e.mainScorer());
            AccuracyJson.fields(g, main);
            g.writeNumberField("skipped", set.skipped());
            g.writeNumberField("unknownPrepositions", e.unknownPrepositions());
            g.writeObjectFieldStart("baselines");
            AccuracyJson.write(g, ALWAYS_NOUN, e.byScorer().get(ALWAYS_NOUN));
            AccuracyJson.write(g, MAJORITY, e.byScorer().get(MAJORITY));
            g.writeEndObject();
            g.writeObjectFieldStart("scorers");
            for (Map.Entry<String, Accuracy> s : e.byScorer().entrySet()) AccuracyJson.write(g, s.getKey(), s.getValue());
            g.writeEndObject();
            g.writeObjectFieldStart("byLevel");
            for (Map.Entry<DecisionBasis, Accuracy> b : e.byBasis().entrySet()) {
                g.writeObjectFieldStart(b.getKey().label());
                g.writeNumberField("n", b.getValue().total());
                g.writeNumberField("share", (double) b.getValue().total() / main.total());
                g.writeNumberField("accuracy", b.getValue().value());
                g.writeEndObject();
            }
            g.writeEndObject();
            g.writeObjectFieldStart("confusion");
            for (AttachmentSite gold : AttachmentSite.values()) {
                g.writeObjectFieldStart(gold.name().toLowerCase());
                for (AttachmentSite chosen : AttachmentSite.values()) {
                    g.writeNumberField(chosen.name().toLowerCase(), e.confusion(gold, chosen));
                }
                g.writeEndObject();
            }
            g.writeEndObject();
            g.writeEndObject();
        }
        out.println();
    }
}
