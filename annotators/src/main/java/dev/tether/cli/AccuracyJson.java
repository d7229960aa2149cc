package dev.tether.cli;

import com.fasterxml.jackson.core.JsonGenerator;
import dev.tether.evaluation.Accuracy;

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
}
