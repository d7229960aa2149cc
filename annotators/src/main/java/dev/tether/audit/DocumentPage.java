package dev.tether.audit;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The report page of one document: a legend, every sentence as a row with its decisions drawn as arcs
 * ({@link SentenceDrawing}), and a table of the decisions with probability, margin and the evidence in words.
 * Decisions are numbered in ledger order; each number links the arc to its table row.
 */
final class DocumentPage {
    /** A decision whose runner-up is within this much probability of the chosen head counts as low-confidence. */
    static final double LOW_MARGIN = 0.2;

    private DocumentPage() {
    }

    static boolean lowConfidence(LedgerEntry e) {
        return e.margin() < LOW_MARGIN;
    }

    /**
     * Writes the page of {@code doc}. {@code reviewed} maps a decision's anchor offset to the reviewer's verdict.
     * Fails, naming the ledger line, when a span's offsets do not give its text in the document.
     */
    static String render(AuditedRun.LedgerDocument doc, DocumentText text, Map<Integer, ReviewMark> reviewed) throws IOException {
        List<LedgerEntry> entries = doc.entries();
        for (LedgerEntry e : entries) check(doc.ledger(), e, text);
        StringBuilder out = new StringBuilder(4096 + 600 * entries.size() + 2 * text.text().text().length());
        Html.pageStart(out, doc.doc() + " — Tether audit");
        out.append("<p><a href=\"../index.html\">&larr; all documents of the run</a></p>\n<h1>")
                .append(Html.escape(doc.doc())).append("</h1>\n");
        long low = entries.stream().filter(DocumentPage::lowConfidence).count();
        out.append("<div class=\"facts\"><div><b>").append(entries.size()).append("</b>decisions</div><div><b>").append(low)
                .append("</b>low-confidence (margin &lt; ").append(Html.fixed(LOW_MARGIN, 2)).append(")</div><div><b>")
                .append(reviewed.size()).append("</b>reviewed</div><div><b>").append(text.sentences())
                .append("</b>sentences</div></div>\n");
        legend(out);
        SentenceDrawing.definitions(out);

        List<List<Integer>> bySentence = new ArrayList<>();
        for (int s = 0; s < text.sentences(); s++) bySentence.add(new ArrayList<>());
        int[] sentenceOf = new int[entries.size()];
        List<Integer> outside = new ArrayList<>();
        for (int i = 0; i < entries.size(); i++) {
            int s = text.sentenceAt(entries.get(i).anchor());
            sentenceOf[i] = s;
            if (s < 0 || !inside(entries.get(i), text, s)) outside.add(i);
            else bySentence.get(s).add(i);
        }
        out.append("<h2>Sentences</h2>\n<div class=\"rows\">\n");
        for (int s = 0; s < text.sentences(); s++) {
            int b = text.sentenceBegins()[s];
            String sentence = text.text().substring(b, text.sentenceEnds()[s]);
            out.append("<div class=\"row\" id=\"s").append(s + 1).append("\"><span class=\"no\">s").append(s + 1).append("</span>");
            if (bySentence.get(s).isEmpty()) {
                out.append("<p>").append(Html.escape(SentenceDrawing.visible(sentence))).append("</p></div>\n");
                continue;
            }
            List<SentenceDrawing.Arc> arcs = new ArrayList<>();
            for (int i : bySentence.get(s)) arcs(entries.get(i), i + 1, reviewed.get(entries.get(i).anchor()), arcs);
            out.append("<div class=\"draw\">");
            SentenceDrawing.draw(out, sentence, b, arcs, "sentence " + (s + 1) + " with " + bySentence.get(s).size() + " decisions");
            out.append("</div></div>\n");
        }
        out.append("</div>\n");
        if (!outside.isEmpty()) {
            out.append("<p>").append(outside.size()).append(" decisions reach outside their sentence and are listed in the table only.</p>\n");
        }
        table(out, entries, sentenceOf, reviewed);
        Html.pageEnd(out);
        return out.toString();
    }

    private static boolean inside(LedgerEntry e, DocumentText text, int s) {
        int b = text.sentenceBegins()[s];
        int end = text.sentenceEnds()[s];
        for (Span span : e.spans()) if (span.begin() < b || span.end() > end) return false;
        return true;
    }

    private static void check(Path ledger, LedgerEntry e, DocumentText text) throws IOException {
        for (Span s : e.spans()) {
            if (s.end() > text.text().length()) {
                throw new IOException(ledger + ":" + e.line() + ": offsets " + s.begin() + "-" + s.end() + " lie beyond the end of the "
                        + "document text; the XMI and the ledger come from different runs, re-run 'tether annotate'");
            }
            String actual = text.text().substring(s.begin(), s.end());
            if (!actual.equals(s.text())) {
                throw new IOException(ledger + ":" + e.line() + ": offsets " + s.begin() + "-" + s.end() + " give '" + actual
                        + "' in the document text but the ledger says '" + s.text() + "'; the XMI and the ledger come from "
                        + "different runs, re-run 'tether annotate'");
            }
        }
    }

    private static String mark(ReviewMark r) {
        if (r == null) return "";
        return r.agrees() ? " \u2713" : " \u2260";
    }

    /** The arcs of one decision, by kind. */
    private static void arcs(LedgerEntry e, int number, ReviewMark review, List<SentenceDrawing.Arc> arcs) {
        String label = number + mark(review);
        if (e instanceof AttachmentEntry a) {
            Span p = a.preposition();
            arcs.add(new SentenceDrawing.Arc(p.begin(), p.end(), a.head().begin(), a.head().end(), SentenceDrawing.Style.CHOSEN,
                    number, label, lowConfidence(a), "#" + number + " '" + p.text() + " " + a.object().text() + "' attaches to '"
                    + a.head().text() + "' (" + a.headClass() + ", p " + Html.fixed(a.probability(), 2) + ")"));
            AttachmentEntry.Alternative r = a.runnerUp();
            if (r != null) {
                arcs.add(new SentenceDrawing.Arc(p.begin(), p.end(), r.head().begin(), r.head().end(),
                        SentenceDrawing.Style.RUNNER_UP, number, null, false, "#" + number + " runner-up '" + r.head().text()
                        + "' (" + r.headClass() + ", p " + Html.fixed(r.probability(), 2) + ")"));
            }
        } else if (e instanceof CoordinationEntry c) {
            Span k = c.coordinator();
            for (int j = 0; j < c.conjuncts().size(); j++) {
                Span h = c.conjuncts().get(j).head();
                arcs.add(new SentenceDrawing.Arc(k.begin(), k.end(), h.begin(), h.end(), SentenceDrawing.Style.CONJUNCT,
                        number, j == 0 ? label : null, lowConfidence(c), "#" + number + " conjunct " + (j + 1) + " of '" + k.text()
                        + "': '" + c.conjuncts().get(j).extent().text() + "' (p " + Html.fixed(c.probability(), 2) + ")"));
            }
        }
    }

    private static void legend(StringBuilder out) {
        out.append("<section class=\"legend\" aria-label=\"legend\"><b>How to read this page</b><dl>")
                .append("<dt><svg width=\"70\" height=\"16\"><path d=\"M4,15 V4 H62 V15\" fill=\"none\" stroke=\"#1b1b1b\" stroke-width=\"1.6\" marker-end=\"url(#tip)\"/></svg></dt>")
                .append("<dd>Solid arc above the words: from the preposition to the head Tether chose; the arrowhead marks the head.</dd>")
                .append("<dt><svg width=\"70\" height=\"16\"><path d=\"M4,1 V12 H62 V1\" fill=\"none\" stroke=\"#1b1b1b\" stroke-dasharray=\"5 3\" marker-end=\"url(#tip-open)\"/></svg></dt>")
                .append("<dd>Dashed arc below the words, open arrowhead: the runner-up, the head with the next highest probability.</dd>")
                .append("<dt><svg width=\"70\" height=\"16\"><path d=\"M4,15 V4 H62 V15\" fill=\"none\" stroke=\"#1b1b1b\" stroke-width=\"1.4\" stroke-dasharray=\"1.5 2.5\" marker-end=\"url(#tip)\"/></svg></dt>")
                .append("<dd>Dotted arc: from a coordinator to the head of each conjunct of the chosen reading.</dd>")
                .append("<dt><span class=\"tag\">12</span></dt><dd>The decision's number; it links to its row in the table below.</dd>")
                .append("<dt><span class=\"tag solid\">12</span></dt><dd>Low confidence: the runner-up is within ")
                .append(Html.fixed(LOW_MARGIN, 2)).append(" of the chosen head's probability (margin below ")
                .append(Html.fixed(LOW_MARGIN, 2)).append("). Marked \u201c!\u201d in the table.</dd>")
                .append("<dt><span class=\"tag\">12 \u2713</span> <span class=\"tag\">12 \u2260</span></dt>")
                .append("<dd>Reviewed: \u2713 the decision agrees with the reviewer, \u2260 it differs from the reviewer's choice.</dd>")
                .append("</dl>Arcs are stacked in levels so that no two run along each other; arcs that meet one word share its width. ")
                .append("Probabilities are the model's own; see the run's index for how they are spread.</section>\n");
    }

    private static void table(StringBuilder out, List<LedgerEntry> entries, int[] sentenceOf, Map<Integer, ReviewMark> reviewed) {
        out.append("<h2>Decisions</h2>\n<table class=\"decisions\">\n<thead><tr><th>#</th><th>sentence</th><th>kind</th>")
                .append("<th>phrase</th><th>chosen</th><th class=\"num\">probability</th><th class=\"num\">margin</th><th>runner-up</th>")
                .append("<th>evidence</th><th>review</th></tr></thead>\n<tbody>\n");
        for (int i = 0; i < entries.size(); i++) {
            LedgerEntry e = entries.get(i);
            out.append("<tr id=\"d").append(i + 1).append('"').append(lowConfidence(e) ? " class=\"low\"" : "").append("><td>")
                    .append(i + 1).append("</td><td>");
            if (sentenceOf[i] >= 0) out.append("<a href=\"#s").append(sentenceOf[i] + 1).append("\">s").append(sentenceOf[i] + 1).append("</a>");
            out.append("</td><td>").append(e.kind()).append("</td>");
            if (e instanceof AttachmentEntry a) {
                out.append("<td>").append(Html.escape(a.preposition().text() + " \u2026 " + a.object().text())).append("</td><td>")
                        .append(Html.escape(a.head().text())).append(" <small>(").append(Html.escape(a.headClass()))
                        .append(")</small></td>");
                cells(out, e);
                AttachmentEntry.Alternative r = a.runnerUp();
                out.append("<td>");
                if (r != null) {
                    out.append(Html.escape(r.head().text())).append(" <small>(").append(Html.escape(r.headClass()))
                            .append(", ").append(Html.fixed(r.probability(), 3)).append(")</small>");
                }
                out.append("</td><td><b>").append(Html.escape(EvidenceLevels.describe(a.evidenceLevel()))).append(".</b> ")
                        .append(Html.escape(a.evidenceText())).append("</td>");
            } else if (e instanceof CoordinationEntry c) {
                StringBuilder conjuncts = new StringBuilder();
                for (CoordinationEntry.Conjunct k : c.conjuncts()) {
                    if (conjuncts.length() > 0) conjuncts.append(" | ");
                    conjuncts.append(k.extent().text());
                }
                out.append("<td>").append(Html.escape(c.coordinator().text())).append("</td><td>")
                        .append(Html.escape(conjuncts.toString())).append("</td>");
                cells(out, e);
                out.append("<td></td><td>").append(Html.escape(c.evidenceText())).append("</td>");
            }
            ReviewMark r = reviewed.get(e.anchor());
            out.append("<td>");
            if (r != null) {
                out.append(r.agrees() ? "reviewed \u2713 agrees" : "reviewed \u2260 reviewer chose ")
                        .append(r.agrees() ? "" : r.chosenHead() == null ? "none of the offered heads" : "'" + Html.escape(r.chosenHead()) + "'")
                        .append(" <small>(sheet line ").append(r.sheetLine()).append(")</small>");
            }
            out.append("</td></tr>\n");
        }
        out.append("</tbody>\n</table>\n");
    }

    private static void cells(StringBuilder out, LedgerEntry e) {
        out.append("<td class=\"num\">").append(Html.fixed(e.probability(), 3)).append("</td><td class=\"num\">")
                .append(Html.fixed(e.margin(), 3)).append("</td>");
    }
}
