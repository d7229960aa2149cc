package dev.tether.audit;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Finds the decisions of a run that a review sheet speaks about — same document, same preposition at the same
 * offset, same object — and says whether each now agrees with the reviewer. A reviewed line with no such decision
 * in the run (the document changed, or the phrase is no longer decided) is reported with its line number.
 */
public final class ReviewedDecisions {
    private final Map<String, Map<Integer, ReviewMark>> marks = new TreeMap<>();
    private final List<String> problems = new ArrayList<>();

    public ReviewedDecisions(AuditedRun run, ReviewSheetReader.Sheet sheet) {
        Map<String, Map<Integer, AttachmentEntry>> byAnchor = new HashMap<>();
        for (AuditedRun.LedgerDocument d : run.documents()) {
            Map<Integer, AttachmentEntry> m = new HashMap<>();
            for (LedgerEntry e : d.entries()) if (e instanceof AttachmentEntry a) m.put(a.anchor(), a);
            byAnchor.put(d.doc(), m);
        }
        for (ReviewSheetReader.ReviewedLine r : sheet.reviewed()) {
            AttachmentEntry a = byAnchor.getOrDefault(r.doc(), Map.of()).get(r.preposition().begin());
            if (a == null || !a.preposition().text().equals(r.preposition().text()) || !a.object().text().equals(r.object().text())) {
                problems.add(sheet.file() + ":" + r.line() + ": no decision for '" + r.preposition().text() + " ... "
                        + r.object().text() + "' at " + r.preposition().begin() + " of " + r.doc()
                        + " in this run (the document changed or the phrase is no longer decided); line skipped");
                continue;
            }
            ReviewSheetReader.Offered chosen = r.chosen() < 0 ? null : r.offered().get(r.chosen());
            boolean agrees = chosen != null && chosen.head().begin() == a.head().begin();
            marks.computeIfAbsent(r.doc(), k -> new TreeMap<>()).put(a.anchor(),
                    new ReviewMark(r.line(), chosen == null ? null : chosen.head().text(), chosen == null ? -1 : chosen.head().begin(), agrees));
        }
    }

    /** Per document, the verdicts by decision anchor. */
    public Map<String, Map<Integer, ReviewMark>> marks() {
        return marks;
    }

    public List<String> problems() {
        return problems;
    }
}
