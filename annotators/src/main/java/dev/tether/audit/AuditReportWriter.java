package dev.tether.audit;

import dev.tether.output.AtomicFile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;

/**
 * Writes the static HTML report of an annotate run: {@code index.html} (the documents, the share of low-confidence
 * decisions, failures, and the run summary in pictures) and {@code documents/NNN-name.html} per document
 * ({@link DocumentPage}). Every file is written atomically; the same run and reviews give the same bytes. Pages of
 * documents no longer in the run are removed. A document whose text cannot be read fails alone and is listed.
 */
public final class AuditReportWriter {
    public static final String INDEX = "index.html";
    public static final String PAGES = "documents";

    private final Map<String, Map<Integer, ReviewMark>> reviewed;
    private String reviewSheet;

    /** {@code reviewed}: per document, the reviewer's verdicts by decision anchor (empty when nothing was reviewed). */
    public AuditReportWriter(Map<String, Map<Integer, ReviewMark>> reviewed) {
        this.reviewed = reviewed;
    }

    /** Names a review sheet written beside the report, linked from the index. */
    public AuditReportWriter withReviewSheet(String fileName) {
        this.reviewSheet = fileName;
        return this;
    }

    /** What was written: pages, and documents that got none with the reason. */
    public record Written(int pages, Map<String, String> failed) {
    }

    public Written write(AuditedRun run, Path out) throws IOException {
        Files.createDirectories(out.resolve(PAGES));
        XmiTextReader texts = new XmiTextReader();
        Map<String, String> failed = new LinkedHashMap<>();
        List<String> pageNames = new ArrayList<>();
        RunSummary summary = new RunSummary();
        Set<String> written = new HashSet<>();
        List<AuditedRun.LedgerDocument> documents = run.documents();
        for (int i = 0; i < documents.size(); i++) {
            AuditedRun.LedgerDocument d = documents.get(i);
            d.entries().forEach(summary::add);
            String name = pageName(i, d.doc());
            try {
                Path xmi = run.folder().resolve(d.doc() + ".xmi");
                String page = DocumentPage.render(d, texts.read(xmi), reviewed.getOrDefault(d.doc(), Map.of()));
                AtomicFile.writeString(out.resolve(PAGES).resolve(name), page);
                written.add(name);
                pageNames.add(name);
            } catch (IOException e) {
                failed.put(d.doc(), e.getMessage());
                pageNames.add(null);
            }
        }
        try (Stream<Path> old = Files.list(out.resolve(PAGES))) {
            for (Path p : old.toList()) {
                String f = p.getFileName().toString();
                if (f.endsWith(".html") && !written.contains(f)) Files.delete(p);
            }
        }
        AtomicFile.writeString(out.resolve(INDEX), index(run, summary, pageNames, failed));
        return new Written(written.size(), failed);
    }

    /** {@code documents/NNN-name.html}: the document's place in the run and its name with anything unusual replaced. */
    static String pageName(int index, String doc) {
        String safe = doc.replaceAll("[^A-Za-z0-9._-]", "_");
        if (safe.length() > 80) safe = safe.substring(safe.length() - 80);
        return String.format(java.util.Locale.ROOT, "%03d-%s.html", index + 1, safe);
    }

    private String index(AuditedRun run, RunSummary s, List<String> pageNames, Map<String, String> failed) {
        StringBuilder out = new StringBuilder(16384);
        Html.pageStart(out, "Tether audit — " + run.modelId());
        out.append("<h1>Audit of an annotate run</h1>\n<p>Model <b>").append(Html.escape(run.modelId())).append("</b>")
                .append(run.model().isEmpty() ? "" : " (" + Html.escape(run.model()) + ")").append(".</p>\n");
        int reviewedCount = 0;
        for (Map<Integer, ReviewMark> m : reviewed.values()) reviewedCount += m.size();
        out.append("<div class=\"facts\"><div><b>").append(run.documents().size()).append("</b>documents</div><div><b>")
                .append(s.decisions).append("</b>decisions</div><div><b>")
                .append(Html.percent(s.decisions == 0 ? 0 : (double) s.lowConfidence / s.decisions))
                .append("</b>low-confidence (margin &lt; ").append(Html.fixed(DocumentPage.LOW_MARGIN, 2)).append(")</div><div><b>")
                .append(reviewedCount).append("</b>reviewed</div><div><b>").append(run.failed().size() + failed.size())
                .append("</b>failures</div></div>\n");
        if (reviewSheet != null) {
            out.append("<p>Review sheet of the least certain decisions: <a href=\"").append(Html.escape(reviewSheet)).append("\">")
                    .append(Html.escape(reviewSheet)).append("</a></p>\n");
        }
        out.append("<h2>Documents</h2>\n<table class=\"documents\"><thead><tr><th>document</th><th class=\"num\">decisions</th>")
                .append("<th class=\"num\">low-confidence</th><th class=\"num\">reviewed</th><th class=\"num\">mean probability</th></tr></thead>\n<tbody>\n");
        for (int i = 0; i < run.documents().size(); i++) {
            AuditedRun.LedgerDocument d = run.documents().get(i);
            long low = d.entries().stream().filter(DocumentPage::lowConfidence).count();
            double mean = d.entries().stream().mapToDouble(LedgerEntry::probability).average().orElse(0);
            out.append("<tr><td>");
            if (pageNames.get(i) != null) {
                out.append("<a href=\"").append(PAGES).append('/').append(Html.escape(pageNames.get(i))).append("\">")
                        .append(Html.escape(d.doc())).append("</a>");
            } else {
                out.append(Html.escape(d.doc())).append(" <small>(no page)</small>");
            }
            out.append("</td><td class=\"num\">").append(d.entries().size()).append("</td><td class=\"num\">").append(low)
                    .append("</td><td class=\"num\">").append(reviewed.getOrDefault(d.doc(), Map.of()).size())
                    .append("</td><td class=\"num\">").append(Html.fixed(mean, 3)).append("</td></tr>\n");
        }
        out.append("</tbody></table>\n");
        if (!run.failed().isEmpty() || !failed.isEmpty()) {
            out.append("<h2>Failures</h2>\n<table class=\"failures\"><thead><tr><th>document</th><th>stage</th><th>reason</th></tr></thead><tbody>\n");
            run.failed().entrySet().stream().sorted(Map.Entry.comparingByKey()).forEach(f -> out.append("<tr><td>")
                    .append(Html.escape(f.getKey())).append("</td><td>annotate</td><td>").append(Html.escape(f.getValue())).append("</td></tr>\n"));
            failed.forEach((doc, why) -> out.append("<tr><td>").append(Html.escape(doc)).append("</td><td>report</td><td>")
                    .append(Html.escape(why)).append("</td></tr>\n"));
            out.append("</tbody></table>\n");
        }
        out.append("<h2>The run in pictures</h2>\n<div class=\"charts\">\n");
        List<Map.Entry<String, Long>> preps = s.topPrepositions();
        SvgCharts.bars(out, "Attachment decisions per preposition", RunSummary.labels(preps), RunSummary.values(preps));
        List<Map.Entry<String, Long>> classes = new ArrayList<>(s.bySiteClass.entrySet());
        SvgCharts.bars(out, "Attachment decisions per class of the chosen head", RunSummary.labels(classes), RunSummary.values(classes));
        List<Map.Entry<String, Long>> levels = new ArrayList<>(s.byLevel.entrySet());
        SvgCharts.bars(out, "Share decided at each evidence level, most specific first", RunSummary.labels(levels), RunSummary.values(levels));
        SvgCharts.histogram(out, "Probability of the chosen head, all decisions, in bins of 0.1", "probability of the chosen head",
                s.probabilities);
        if (s.byKind.size() > 1) {
            List<Map.Entry<String, Long>> kinds = new ArrayList<>(s.byKind.entrySet());
            SvgCharts.bars(out, "Decisions per kind", RunSummary.labels(kinds), RunSummary.values(kinds));
        }
        out.append("</div>\n<section class=\"legend\"><b>Evidence levels</b><dl>");
        for (String level : EvidenceLevels.ORDER) {
            out.append("<dt>").append(level).append("</dt><dd>").append(Html.escape(EvidenceLevels.describe(level))).append(".</dd>");
        }
        out.append("</dl>Bars carry their counts and shares in figures, so they read the same in grey print.</section>\n");
        Html.pageEnd(out);
        return out.toString();
    }
}
