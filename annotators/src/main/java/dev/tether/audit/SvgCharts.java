package dev.tether.audit;

import dev.tether.evaluation.CalibrationError;

import java.util.List;

/**
 * The report's pictures as inline SVG: horizontal bars with their counts written beside them, a histogram of
 * probabilities, and a reliability diagram. Marks differ by fill and line pattern, never by colour alone.
 */
final class SvgCharts {
    private static final String INK = "#1b1b1b";
    private static final String BAR = "#8a8a8a";

    private SvgCharts() {
    }

    /** One bar per label, longest for the largest value, each with "value (share)" beside it. */
    static void bars(StringBuilder out, String caption, List<String> labels, long[] values) {
        long max = 1;
        long total = 0;
        for (long v : values) {
            max = Math.max(max, v);
            total += v;
        }
        double labelWidth = 130;
        double barWidth = 200;
        double row = 18;
        double height = labels.size() * row + 6;
        double width = labelWidth + barWidth + 110;
        out.append("<figure><svg class=\"chart bars\" width=\"").append(Html.px(width)).append("\" height=\"").append(Html.px(height))
                .append("\" role=\"img\" aria-label=\"").append(Html.escape(caption)).append("\">");
        for (int i = 0; i < labels.size(); i++) {
            double y = 3 + i * row;
            double w = barWidth * values[i] / max;
            out.append("<text x=\"").append(Html.px(labelWidth - 6)).append("\" y=\"").append(Html.px(y + 12))
                    .append("\" font-size=\"12\" text-anchor=\"end\">").append(Html.escape(labels.get(i))).append("</text>")
                    .append("<rect x=\"").append(Html.px(labelWidth)).append("\" y=\"").append(Html.px(y + 2)).append("\" width=\"")
                    .append(Html.px(Math.max(w, 0.5))).append("\" height=\"12\" fill=\"").append(BAR).append("\" stroke=\"").append(INK)
                    .append("\" stroke-width=\"0.6\"/><text x=\"").append(Html.px(labelWidth + w + 5)).append("\" y=\"")
                    .append(Html.px(y + 12)).append("\" font-size=\"11\">").append(values[i]).append(" (")
                    .append(Html.percent(total == 0 ? 0 : (double) values[i] / total)).append(")</text>");
        }
        out.append("</svg><figcaption>").append(Html.escape(caption)).append("</figcaption></figure>\n");
    }

    /** Counts of probabilities in {@code counts.length} equal-width bins over [0, 1]. */
    static void histogram(StringBuilder out, String caption, String xLabel, long[] counts) {
        long max = 1;
        for (long c : counts) max = Math.max(max, c);
        double left = 40;
        double plotW = 300;
        double plotH = 140;
        double top = 14;
        double binW = plotW / counts.length;
        out.append("<figure><svg class=\"chart histogram\" width=\"").append(Html.px(left + plotW + 20)).append("\" height=\"")
                .append(Html.px(top + plotH + 40)).append("\" role=\"img\" aria-label=\"").append(Html.escape(caption)).append("\">");
        axes(out, left, top, plotW, plotH, xLabel, "decisions", max);
        for (int b = 0; b < counts.length; b++) {
            double h = plotH * counts[b] / max;
            double x = left + b * binW;
            out.append("<rect x=\"").append(Html.px(x + 1)).append("\" y=\"").append(Html.px(top + plotH - h)).append("\" width=\"")
                    .append(Html.px(binW - 2)).append("\" height=\"").append(Html.px(h)).append("\" fill=\"").append(BAR)
                    .append("\" stroke=\"").append(INK).append("\" stroke-width=\"0.6\"><title>")
                    .append(Html.fixed((double) b / counts.length, 1)).append("\u2013").append(Html.fixed((double) (b + 1) / counts.length, 1))
                    .append(": ").append(counts[b]).append("</title></rect>");
            if (counts[b] > 0) {
                out.append("<text x=\"").append(Html.px(x + binW / 2)).append("\" y=\"").append(Html.px(top + plotH - h - 3))
                        .append("\" font-size=\"9\" text-anchor=\"middle\">").append(counts[b]).append("</text>");
            }
        }
        out.append("</svg><figcaption>").append(Html.escape(caption)).append("</figcaption></figure>\n");
    }

    /**
     * Reliability diagram: per bin, a bar up to the accuracy of the decisions in it, a cross at their mean stated
     * probability, and the diagonal where the two would agree.
     */
    static void reliability(StringBuilder out, String caption, CalibrationError c) {
        double left = 40;
        double plot = 260;
        double top = 14;
        double binW = plot / c.bins();
        out.append("<figure><svg class=\"chart reliability\" width=\"").append(Html.px(left + plot + 20)).append("\" height=\"")
                .append(Html.px(top + plot + 40)).append("\" role=\"img\" aria-label=\"").append(Html.escape(caption)).append("\">");
        axes(out, left, top, plot, plot, "stated probability", "accuracy", 0);
        out.append("<path d=\"M").append(Html.px(left)).append(',').append(Html.px(top + plot)).append(" L").append(Html.px(left + plot))
                .append(',').append(Html.px(top)).append("\" stroke=\"").append(INK).append("\" stroke-dasharray=\"4 3\" fill=\"none\"/>");
        for (int b = 0; b < c.bins(); b++) {
            if (c.count(b) == 0) continue;
            double x = left + b * binW;
            double h = plot * c.accuracy(b);
            out.append("<rect class=\"bin\" x=\"").append(Html.px(x + 1)).append("\" y=\"").append(Html.px(top + plot - h))
                    .append("\" width=\"").append(Html.px(binW - 2)).append("\" height=\"").append(Html.px(h)).append("\" fill=\"")
                    .append(BAR).append("\" stroke=\"").append(INK).append("\" stroke-width=\"0.6\"><title>")
                    .append(Html.fixed(c.lowerEdge(b), 1)).append("\u2013").append(Html.fixed(c.upperEdge(b), 1)).append(": ")
                    .append(c.count(b)).append(" decisions, accuracy ").append(Html.fixed(c.accuracy(b), 3))
                    .append(", mean stated ").append(Html.fixed(c.confidence(b), 3)).append("</title></rect>");
            double cx = left + plot * c.confidence(b);
            double cy = top + plot - plot * c.confidence(b);
            out.append("<path d=\"M").append(Html.px(cx - 3.5)).append(',').append(Html.px(cy - 3.5)).append(" l7,7 m0,-7 l-7,7\" stroke=\"")
                    .append(INK).append("\" stroke-width=\"1.4\"/>");
        }
        out.append("</svg><figcaption>").append(Html.escape(caption)).append("</figcaption></figure>\n");
    }

    /** Axes with ticks at 0, 0.5 and 1 on x; on y the fraction scale, or counts up to {@code maxCount} when positive. */
    private static void axes(StringBuilder out, double left, double top, double w, double h, String xLabel, String yLabel, long maxCount) {
        out.append("<path d=\"M").append(Html.px(left)).append(',').append(Html.px(top)).append(" V").append(Html.px(top + h))
                .append(" H").append(Html.px(left + w)).append("\" stroke=\"").append(INK).append("\" fill=\"none\"/>");
        for (int t = 0; t <= 2; t++) {
            double x = left + w * t / 2;
            out.append("<text x=\"").append(Html.px(x)).append("\" y=\"").append(Html.px(top + h + 13))
                    .append("\" font-size=\"10\" text-anchor=\"middle\">").append(Html.fixed(t / 2.0, 1)).append("</text>");
            double y = top + h - h * t / 2;
            String value = maxCount > 0 ? Long.toString(Math.round(maxCount * t / 2.0)) : Html.fixed(t / 2.0, 1);
            out.append("<text x=\"").append(Html.px(left - 4)).append("\" y=\"").append(Html.px(y + 3))
                    .append("\" font-size=\"10\" text-anchor=\"end\">").append(value).append("</text>");
        }
        out.append("<text x=\"").append(Html.px(left + w / 2)).append("\" y=\"").append(Html.px(top + h + 30))
                .append("\" font-size=\"11\" text-anchor=\"middle\">").append(Html.escape(xLabel)).append("</text>")
                .append("<text x=\"10\" y=\"").append(Html.px(top + h / 2)).append("\" font-size=\"11\" text-anchor=\"middle\" transform=\"rotate(-90 10 ")
                .append(Html.px(top + h / 2)).append(")\">").append(Html.escape(yLabel)).append("</text>");
    }
}
