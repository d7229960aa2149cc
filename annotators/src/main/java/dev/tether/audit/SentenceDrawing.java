package dev.tether.audit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Draws one sentence as inline SVG: the words in a monospaced line (so a code point has a fixed width), chosen
 * heads as solid arcs above the line from the phrase to its head with an arrowhead at the head, runners-up as
 * dashed arcs below it, conjuncts as dotted arcs above. Arcs on each side are stacked by {@link ArcLevels}; several
 * arcs that meet one word spread over its width, so no two lines coincide. Each chosen arc carries the decision's
 * number, a link to its row in the table.
 */
final class SentenceDrawing {
    /** Advance of one code point at 14px in a monospaced font (0.6 em, common practice for such fonts). */
    static final double ADVANCE = 8.4;
    private static final double PAD = 6;
    private static final double LEVEL = 13;
    private static final double LABEL_HEIGHT = 12;

    enum Style { CHOSEN, RUNNER_UP, CONJUNCT }

    /**
     * One arc between two words, offsets in code points of the document. {@code number} is the decision's number,
     * {@code label} what its tag shows (null: no tag), {@code emphasised} a low-confidence decision (its tag drawn solid).
     */
    record Arc(int fromBegin, int fromEnd, int toBegin, int toEnd, Style style, int number, String label, boolean emphasised,
               String title) {
        boolean below() {
            return style == Style.RUNNER_UP;
        }
    }

    private SentenceDrawing() {
    }

    /** The shared arrowheads, written once per page before any sentence. */
    static void definitions(StringBuilder out) {
        out.append("<svg width=\"0\" height=\"0\" style=\"position:absolute\" aria-hidden=\"true\"><defs>")
                .append("<marker id=\"tip\" viewBox=\"0 0 8 8\" refX=\"8\" refY=\"4\" markerWidth=\"7\" markerHeight=\"7\" orient=\"auto\">")
                .append("<path d=\"M0,0 L8,4 L0,8 z\" fill=\"#1b1b1b\"/></marker>")
                .append("<marker id=\"tip-open\" viewBox=\"0 0 8 8\" refX=\"8\" refY=\"4\" markerWidth=\"7\" markerHeight=\"7\" orient=\"auto\">")
                .append("<path d=\"M0.5,0.5 L7.5,4 L0.5,7.5 z\" fill=\"#fff\" stroke=\"#1b1b1b\"/></marker>")
                .append("</defs></svg>\n");
    }

    /** Draws {@code text} (the sentence, starting at code point {@code begin} of the document) with its arcs. */
    static void draw(StringBuilder out, String text, int begin, List<Arc> arcs, String caption) {
        int length = text.codePointCount(0, text.length());
        int n = arcs.size();
        double[] fromX = new double[n];
        double[] toX = new double[n];
        spread(arcs, begin, fromX, toX);

        int[] level = new int[n];
        int above = levels(arcs, fromX, toX, false, level);
        int below = levels(arcs, fromX, toX, true, level);

        double textTop = above == 0 ? 4 : 4 + LABEL_HEIGHT / 2 + 10 + (above - 1) * LEVEL;
        double baseline = textTop + 13;
        double textBottom = textTop + 17;
        double height = below == 0 ? textBottom + 4 : textBottom + 8 + (below - 1) * LEVEL + 5;
        double width = Math.max(2 * PAD + length * ADVANCE, 60);

        out.append("<svg class=\"sentence\" width=\"").append(Html.px(width)).append("\" height=\"").append(Html.px(height))
                .append("\" viewBox=\"0 0 ").append(Html.px(width)).append(' ').append(Html.px(height))
                .append("\" role=\"img\" aria-label=\"").append(Html.escape(caption)).append("\">");
        out.append("<text class=\"line\" x=\"").append(Html.px(PAD)).append("\" y=\"").append(Html.px(baseline))
                .append("\" font-size=\"14\"");
        if (length > 0) out.append(" textLength=\"").append(Html.px(length * ADVANCE)).append("\" lengthAdjust=\"spacing\"");
        out.append('>').append(Html.escape(visible(text))).append("</text>");
        for (int i = 0; i < n; i++) {
            Arc a = arcs.get(i);
            boolean down = a.below();
            double foot = down ? textBottom : textTop;
            double y = down ? textBottom + 8 + level[i] * LEVEL : textTop - 10 - level[i] * LEVEL;
            out.append("<path class=\"arc ").append(a.style().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'))
                    .append("\" d=\"M").append(Html.px(fromX[i])).append(',').append(Html.px(foot))
                    .append(" V").append(Html.px(y)).append(" H").append(Html.px(toX[i])).append(" V").append(Html.px(foot))
                    .append("\" fill=\"none\" stroke=\"#1b1b1b\"").append(stroke(a.style()))
                    .append(" marker-end=\"url(#").append(a.style() == Style.RUNNER_UP ? "tip-open" : "tip").append(")\"><title>")
                    .append(Html.escape(a.title())).append("</title></path>");
            if (a.label() != null) label(out, a, (fromX[i] + toX[i]) / 2, y);
        }
        out.append("</svg>");
    }

    private static String stroke(Style s) {
        switch (s) {
            case CHOSEN: return " stroke-width=\"1.6\"";
            case RUNNER_UP: return " stroke-width=\"1\" stroke-dasharray=\"5 3\"";
            default: return " stroke-width=\"1.4\" stroke-dasharray=\"1.5 2.5\"";
        }
    }

    private static void label(StringBuilder out, Arc a, double x, double y) {
        double w = labelWidth(a.label());
        out.append("<a href=\"#d").append(a.number()).append("\"><rect x=\"")
                .append(Html.px(x - w / 2)).append("\" y=\"").append(Html.px(y - LABEL_HEIGHT / 2)).append("\" width=\"")
                .append(Html.px(w)).append("\" height=\"").append(Html.px(LABEL_HEIGHT)).append("\" rx=\"2\" fill=\"")
                .append(a.emphasised() ? "#1b1b1b" : "#fff").append("\" stroke=\"#1b1b1b\" stroke-width=\"0.8\"/>")
                .append("<text class=\"label\" x=\"").append(Html.px(x)).append("\" y=\"").append(Html.px(y + 3.5))
                .append("\" font-size=\"10\" text-anchor=\"middle\" fill=\"").append(a.emphasised() ? "#fff" : "#1b1b1b")
                .append("\">").append(Html.escape(a.label())).append("</text></a>");
    }

    private static double labelWidth(String label) {
        return label.codePointCount(0, label.length()) * 6.2 + 6;
    }

    /** Spreads the ends of all arcs that meet one word (on one side of the line) over the word's width. */
    private static void spread(List<Arc> arcs, int begin, double[] fromX, double[] toX) {
        record End(int arc, boolean from, double other) {
        }
        Map<String, List<End>> byWord = new LinkedHashMap<>();
        Map<String, double[]> box = new LinkedHashMap<>();
        for (int i = 0; i < arcs.size(); i++) {
            Arc a = arcs.get(i);
            double fromMid = PAD + ((a.fromBegin() + a.fromEnd()) / 2.0 - begin) * ADVANCE;
            double toMid = PAD + ((a.toBegin() + a.toEnd()) / 2.0 - begin) * ADVANCE;
            String side = a.below() ? "b" : "a";
            String fromKey = side + a.fromBegin();
            String toKey = side + a.toBegin();
            box.putIfAbsent(fromKey, new double[] {x(a.fromBegin(), begin), x(a.fromEnd(), begin)});
            box.putIfAbsent(toKey, new double[] {x(a.toBegin(), begin), x(a.toEnd(), begin)});
            byWord.computeIfAbsent(fromKey, k -> new ArrayList<>()).add(new End(i, true, toMid));
            byWord.computeIfAbsent(toKey, k -> new ArrayList<>()).add(new End(i, false, fromMid));
        }
        for (Map.Entry<String, List<End>> w : byWord.entrySet()) {
            List<End> ends = w.getValue();
            ends.sort(Comparator.comparingDouble(End::other).thenComparingInt(End::arc));
            double[] b = box.get(w.getKey());
            for (int k = 0; k < ends.size(); k++) {
                double x = b[0] + (b[1] - b[0]) * (k + 1) / (ends.size() + 1);
                End e = ends.get(k);
                if (e.from()) fromX[e.arc()] = x;
                else toX[e.arc()] = x;
            }
        }
    }

    private static double x(int offset, int begin) {
        return PAD + (offset - begin) * ADVANCE;
    }

    /** Assigns levels to the arcs of one side; returns how many levels that side needs. */
    private static int levels(List<Arc> arcs, double[] fromX, double[] toX, boolean below, int[] level) {
        List<Integer> side = new ArrayList<>();
        for (int i = 0; i < arcs.size(); i++) if (arcs.get(i).below() == below) side.add(i);
        double[] left = new double[side.size()];
        double[] right = new double[side.size()];
        for (int k = 0; k < side.size(); k++) {
            int i = side.get(k);
            Arc a = arcs.get(i);
            double l = Math.min(fromX[i], toX[i]);
            double r = Math.max(fromX[i], toX[i]);
            if (a.label() != null) {
                double mid = (l + r) / 2;
                double half = labelWidth(a.label()) / 2;
                l = Math.min(l, mid - half);
                r = Math.max(r, mid + half);
            }
            left[k] = l - 1.5;
            right[k] = r + 1.5;
        }
        int[] assigned = ArcLevels.assign(left, right);
        int count = 0;
        for (int k = 0; k < side.size(); k++) {
            level[side.get(k)] = assigned[k];
            count = Math.max(count, assigned[k] + 1);
        }
        return count;
    }

    /** The sentence with every line break, tab or control character shown as one space, so offsets keep their place. */
    static String visible(String text) {
        StringBuilder b = new StringBuilder(text.length());
        text.codePoints().forEach(c -> {
            if (Character.isWhitespace(c) || Character.isISOControl(c)) b.append(' ');
            else b.appendCodePoint(c);
        });
        return b.toString();
    }
}
