package dev.tether.audit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Tether's review sheet: the least certain attachment decisions of a run, one per line, with the heads that were
 * offered, for a reviewer to mark in a plain-text editor. Least certain means smallest margin between the chosen
 * head and the runner-up (ties: smaller probability, then document and position). Layout, format {@link #FORMAT}:
 * <pre>
 * # tether review sheet, format 1
 * # ...comment lines explaining the marks...
 * mark TAB document TAB preposition@offset TAB object@offset TAB margin TAB 1:word/class@offset probability TAB 2:...
 * </pre>
 * Marks: {@code ?} not reviewed, {@code =} the chosen head (choice 1) is right, a number: that choice is right,
 * {@code x}: none of the offered heads is right. Offsets count code points; a tab, line break or backslash inside
 * a value is written {@code \t}, {@code \n}, {@code \r}, {@code \\}.
 */
public final class ReviewSheet {
    public static final int FORMAT = 1;
    public static final String HEADER = "# tether review sheet, format " + FORMAT;
    public static final String FILE = "review-sheet.tsv";

    private ReviewSheet() {
    }

    /** A decision with its document, for ordering across documents. */
    private record Candidate(int docIndex, String doc, AttachmentEntry entry) {
    }

    /** The sheet of the {@code n} least certain attachment decisions of {@code run}. */
    public static String write(AuditedRun run, int n) {
        List<Candidate> all = new ArrayList<>();
        for (int i = 0; i < run.documents().size(); i++) {
            AuditedRun.LedgerDocument d = run.documents().get(i);
            for (LedgerEntry e : d.entries()) {
                if (e instanceof AttachmentEntry a) all.add(new Candidate(i, d.doc(), a));
            }
        }
        all.sort(Comparator.<Candidate>comparingDouble(c -> c.entry().margin())
                .thenComparingDouble(c -> c.entry().probability())
                .thenComparingInt(Candidate::docIndex)
                .thenComparingInt(c -> c.entry().anchor()));
        List<Candidate> chosen = all.subList(0, Math.min(n, all.size()));
        StringBuilder out = new StringBuilder(256 * (chosen.size() + 12));
        out.append(HEADER).append('\n')
                .append("# model ").append(run.modelId()).append("; the ").append(chosen.size()).append(" least certain of ")
                .append(all.size()).append(" attachment decisions, smallest margin first (ties: smaller probability)\n")
                .append("# Put one mark in the first column of a line and save. Then 'tether train --corrections FILE ...'\n")
                .append("# learns from the marked lines, and 'tether audit --corrections FILE ...' shows them in the report.\n")
                .append("#   ?   not reviewed (the line is ignored)\n")
                .append("#   =   the chosen head, choice 1, is right\n")
                .append("#   N   choice N is right (one of the numbers offered on the line)\n")
                .append("#   x   none of the offered heads is right\n")
                .append("# Columns (tab-separated): mark, document, preposition@offset, object@offset, margin, then each\n")
                .append("# choice offered as N:word/class@offset probability. Offsets count code points of the document.\n");
        for (Candidate c : chosen) {
            AttachmentEntry a = c.entry();
            out.append('?').append('\t').append(escape(c.doc())).append('\t').append(at(a.preposition())).append('\t')
                    .append(at(a.object())).append('\t').append(Html.fixed(a.margin(), 4));
            List<AttachmentEntry.Alternative> offered = offered(a);
            for (int k = 0; k < offered.size(); k++) {
                AttachmentEntry.Alternative o = offered.get(k);
                out.append('\t').append(k + 1).append(':').append(escape(o.head().text())).append('/').append(o.headClass())
                        .append('@').append(o.head().begin()).append(' ').append(Html.fixed(o.probability(), 4));
            }
            out.append('\n');
        }
        return out.toString();
    }

    /** The heads offered to the reviewer: the chosen one first, then the other alternatives in rank order. */
    static List<AttachmentEntry.Alternative> offered(AttachmentEntry a) {
        List<AttachmentEntry.Alternative> offered = new ArrayList<>();
        offered.add(new AttachmentEntry.Alternative(a.head(), a.headClass(), a.probability()));
        for (AttachmentEntry.Alternative o : a.alternatives()) {
            if (o.head().begin() != a.head().begin()) offered.add(o);
        }
        return offered;
    }

    private static String at(Span s) {
        return escape(s.text()) + "@" + s.begin();
    }

    static String escape(String s) {
        return s.replace("\\", "\\\\").replace("\t", "\\t").replace("\n", "\\n").replace("\r", "\\r");
    }

    static String unescape(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '\\' && i + 1 < s.length()) {
                char n = s.charAt(++i);
                b.append(n == 't' ? '\t' : n == 'n' ? '\n' : n == 'r' ? '\r' : n);
            } else {
                b.append(c);
            }
        }
        return b.toString();
    }
}
