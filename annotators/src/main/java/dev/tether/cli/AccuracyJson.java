package dev.tether.cli;

import com.fasterxml.jackson.core.JsonGenerator;
import dev.tether.evaluation.Accuracy;
import dev.tether.evaluation.PairedComparison;

import java.io.IOException;

/** How every evaluation report writes an accuracy: {@code accuracy} (a fraction), {@code correct}, {@code n}, {@code interval95}. */
final class AccuracyJson {
    private AccuracyJson() {
    }

    /** The accuracy as an object field called {@code name}. */
    static void write(JsonGenerator g, String name, Accuracy a) throws IOException {
        g.writeObjectFieldStart(name);
        fields(g, a);
        g.writeEndObject();
    }

    /** The accuracy's fields inside the object being written. */
    static void fields(JsonGenerator g, Accuracy a) throws IOException {
        g.writeNumberField("accuracy", a.value());
        g.writeNumberField("correct", a.correct());
        g.writeNumberField("n", a.total());
        double[] i = a.interval95();
        g.writeArrayFieldStart("interval95");
        g.writeNumber(i[0]);
        g.writeNumber(i[1]);
        g.writeEndArray();
    }

    /** The model against the count-based score on the same items: who alone was right, and the McNemar p-value. */
    static void versusCountScore(JsonGenerator g, PairedComparison c) throws IOException {
        g.writeObjectFieldStart("versusCountScore");
        g.writeNumberField("modelOnlyRight", c.firstOnly());
        g.writeNumberField("countScoreOnlyRight", c.secondOnly());
        g.writeNumberField("mcnemarP", c.pValue());
        g.writeEndObject();
    }

    /** The same as one line of a text report. */
    static String versusCountScoreLine(PairedComparison c) {
        return String.format(java.util.Locale.ROOT, "%-28s model alone right %,d, count-score alone right %,d (exact McNemar p = %.2g)",
                "versus count-score", c.firstOnly(), c.secondOnly(), c.pValue());
    }
}
