package dev.tether.audit;

import dev.tether.output.AtomicFile;
import dev.tether.evaluation.CalibrationError;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The page {@code evaluate --report DIR} writes: a reliability diagram (accuracy against stated probability in
 * equal-width bins), the expected calibration error, and the bins as a table.
 */
public final class CalibrationPage {
    public static final String FILE = "calibration.html";

    private CalibrationPage() {
    }

    /** Writes {@code dir/calibration.html} atomically; returns its path. */
    public static Path write(Path dir, String model, String data, String setting, double accuracy, CalibrationError c) throws IOException {
        if (Files.exists(dir) && !Files.isDirectory(dir)) throw new IOException(dir + " exists and is not a folder; give a folder for --report");
        StringBuilder out = new StringBuilder(8192);
        Html.pageStart(out, "Tether calibration — " + data);
        out.append("<h1>Calibration on ").append(Html.escape(data)).append("</h1>\n<p>Model <b>").append(Html.escape(model))
                .append("</b>; ").append(Html.escape(setting)).append(".</p>\n<div class=\"facts\"><div><b>")
                .append(Html.fixed(c.ece(), 4)).append("</b>expected calibration error (").append(c.bins())
                .append(" equal-width bins)</div><div><b>").append(c.total()).append("</b>decisions with a stated probability</div><div><b>")
                .append(Html.percent(accuracy)).append("</b>attachment accuracy</div></div>\n");
        out.append("<div class=\"charts\">");
        SvgCharts.reliability(out, "Reliability: bars rise to the accuracy of the decisions in each bin; a cross marks their "
                + "mean stated probability; on the dashed diagonal the two agree", c);
        long[] counts = new long[c.bins()];
        for (int b = 0; b < counts.length; b++) counts[b] = c.count(b);
        SvgCharts.histogram(out, "Decisions per bin of stated probability", "stated probability", counts);
        out.append("</div>\n<table class=\"bins\"><thead><tr><th>stated probability</th><th>decisions</th><th>right</th>")
                .append("<th>accuracy</th><th>mean stated</th><th>gap</th></tr></thead><tbody>\n");
        for (int b = 0; b < c.bins(); b++) {
            out.append("<tr><td>").append(b == 0 ? "[" : "(").append(Html.fixed(c.lowerEdge(b), 1)).append(", ")
                    .append(Html.fixed(c.upperEdge(b), 1)).append("]</td><td class=\"num\">").append(c.count(b))
                    .append("</td><td class=\"num\">").append(c.correct(b)).append("</td><td class=\"num\">")
                    .append(c.count(b) == 0 ? "" : Html.fixed(c.accuracy(b), 3)).append("</td><td class=\"num\">")
                    .append(c.count(b) == 0 ? "" : Html.fixed(c.confidence(b), 3)).append("</td><td class=\"num\">")
                    .append(c.count(b) == 0 ? "" : Html.fixed(c.accuracy(b) - c.confidence(b), 3)).append("</td></tr>\n");
        }
        out.append("</tbody></table>\n<p>The expected calibration error is the mean of |accuracy &minus; mean stated| over the ")
                .append("bins, weighted by their decisions (Naeini et al. 2015; Guo et al. 2017). A gold attachment whose ")
                .append("preposition got no decision states no probability and is not counted here; it counts as wrong in the accuracy.</p>\n");
        Html.pageEnd(out);
        Path file = dir.resolve(FILE);
        AtomicFile.writeString(file, out.toString());
        return file;
    }
}
