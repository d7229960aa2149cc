package dev.tether.cli;

import com.fasterxml.jackson.core.JsonGenerator;
import dev.tether.evaluation.Accuracy;
import dev.tether.evaluation.CoordinationEvaluation;

import java.io.IOException;
import java.io.PrintStream;
import java.util.Map;

/** How both {@code evaluate --conllu} reports write the coordination scores and their same-run baselines. */
final class CoordinationReport {
    static final String NEAREST_OF_CLASS = "nearest-of-class";
    static final String ALWAYS_SHARED = "always-shared";
    static final String NEVER_SHARED = "never-shared";

    private CoordinationReport() {
    }

    /** The field {@code coordination}: accuracy (both heads right), spans, shared modifiers, by class, baselines. */
    static void json(JsonGenerator g, CoordinationEvaluation e, boolean hasRanker) throws IOException {
        g.writeObjectFieldStart("coordination");
        AccuracyJson.fields(g, e.heads());
        g.writeBooleanField("ranker", hasRanker);
        AccuracyJson.write(g, "span_exact_match", e.spans());
        g.writeObjectFieldStart("shared_modifier");
        AccuracyJson.fields(g, e.scope());
        g.writeNumberField("coverage", e.scopeCoverage().value());
        g.writeNumberField("gold", e.goldModifiers());
        g.writeObjectFieldStart("baselines");
        AccuracyJson.write(g, ALWAYS_SHARED, e.alwaysShared());
        AccuracyJson.write(g, NEVER_SHARED, e.neverShared());
        g.writeEndObject();
        g.writeEndObject();
        g.writeObjectFieldStart("byClass");
        for (Map.Entry<String, Accuracy[]> c : e.byClass().entrySet()) {
            g.writeObjectFieldStart(c.getKey());
            AccuracyJson.fields(g, c.getValue()[0]);
            g.writeNumberField(NEAREST_OF_CLASS, c.getValue()[1].value());
            g.writeEndObject();
        }
        g.writeEndObject();
        g.writeObjectFieldStart("baselines");
        AccuracyJson.write(g, NEAREST_OF_CLASS, e.nearestOfClass());
        g.writeEndObject();
        g.writeEndObject();
    }

    static void text(PrintStream out, CoordinationEvaluation e, boolean hasRanker) {
        out.println();
        Accuracy h = e.heads();
        double[] ci = h.interval95();
        out.printf("coordination: %,d gold coordinations%s%n", h.total(), hasRanker ? "" : " (the model has no coordination ranker: no decisions)");
        out.printf("%-28s %7.2f%%  [%.2f, %.2f]  <- model (both conjunct heads right)%n", "coordination", 100 * h.value(), 100 * ci[0], 100 * ci[1]);
        out.printf("%-28s %7.2f%%%n", NEAREST_OF_CLASS, 100 * e.nearestOfClass().value());
        out.printf("%-28s %7.2f%%%n", "conjunct spans exact", 100 * e.spans().value());
        out.printf("%-28s %7.2f%%  (%,d decided of %,d gold modifiers, coverage %.2f%%)%n", "shared modifier",
                100 * e.scope().value(), e.scope().total(), e.goldModifiers(), 100 * e.scopeCoverage().value());
        out.printf("%-28s %7.2f%%%n", ALWAYS_SHARED, 100 * e.alwaysShared().value());
        out.printf("%-28s %7.2f%%%n", NEVER_SHARED, 100 * e.neverShared().value());
        out.printf("by gold class of the last conjunct%n%-12s %6s %9s %9s%n", "class", "n", "accuracy", NEAREST_OF_CLASS);
        for (Map.Entry<String, Accuracy[]> c : e.byClass().entrySet()) {
            out.printf("%-12s %6d %8.2f%% %8.2f%%%n", c.getKey(), c.getValue()[0].total(), 100 * c.getValue()[0].value(),
                    100 * c.getValue()[1].value());
        }
    }
}
