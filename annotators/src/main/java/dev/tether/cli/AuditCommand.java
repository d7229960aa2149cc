package dev.tether.cli;

import dev.tether.audit.AuditReportWriter;
import dev.tether.audit.AuditedRun;
import dev.tether.audit.LedgerReader;
import dev.tether.output.AtomicFile;
import dev.tether.audit.ReviewMark;
import dev.tether.audit.ReviewSheet;
import dev.tether.audit.ReviewSheetReader;
import dev.tether.audit.ReviewedDecisions;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * {@code tether audit}: the HTML report of an annotate run from its output folder, optionally a review sheet of the
 * least certain decisions, and the reviews of a marked sheet shown on the pages.
 */
final class AuditCommand implements Command {
    @Override
    public String name() {
        return "audit";
    }

    @Override
    public String usage() {
        return "audit --ledger FOLDER --out FOLDER [--queue N] [--corrections SHEET]";
    }

    @Override
    public int run(String[] args, PrintStream out, PrintStream err) throws UsageException, IOException {
        CommandArguments a = new CommandArguments(name(), args, 1, Set.of("ledger", "out", "queue", "corrections"), Set.of());
        if (!a.positional().isEmpty()) throw new UsageException("unexpected words " + a.positional());
        Path ledger = Path.of(a.required("ledger"));
        Path target = Path.of(a.required("out"));
        int queue = -1;
        if (a.has("queue")) {
            String q = a.required("queue");
            try {
                queue = Integer.parseInt(q);
            } catch (NumberFormatException e) {
                throw new UsageException("--queue takes a number of decisions, got '" + q + "'");
            }
            if (queue < 1) throw new UsageException("--queue takes a positive number of decisions, got " + queue);
        }
        String corrections = a.value("corrections", null);
        return report(ledger, target, queue, corrections == null ? null : Path.of(corrections), out, err);
    }

    /** Writes the report of the run in {@code ledger} into {@code target}; returns the exit code. */
    static int report(Path ledger, Path target, int queue, Path corrections, PrintStream out, PrintStream err) throws IOException {
        if (Files.exists(target) && !Files.isDirectory(target)) {
            throw new IOException(target + " exists and is not a folder; give a folder for the report");
        }
        long start = System.nanoTime();
        AuditedRun run = new LedgerReader().read(ledger);
        Map<String, Map<Integer, ReviewMark>> marks = Map.of();
        List<String> problems = List.of();
        if (corrections != null) {
            ReviewSheetReader.Sheet sheet = new ReviewSheetReader().read(corrections);
            ReviewedDecisions reviewed = new ReviewedDecisions(run, sheet);
            marks = reviewed.marks();
            problems = new ArrayList<>(sheet.problems());
            problems.addAll(reviewed.problems());
        }
        AuditReportWriter writer = new AuditReportWriter(marks);
        Files.createDirectories(target);
        if (queue > 0) {
            AtomicFile.writeString(target.resolve(ReviewSheet.FILE), ReviewSheet.write(run, queue));
            writer.withReviewSheet(ReviewSheet.FILE);
        }
        AuditReportWriter.Written written = writer.write(run, target);
        double seconds = (System.nanoTime() - start) / 1e9;
        out.printf("report: %s  (%,d documents, %,d decisions, %.2f s)%n", target.resolve(AuditReportWriter.INDEX),
                written.pages(), run.decisions(), seconds);
        if (queue > 0) out.printf("review sheet: %s  (the %,d least certain decisions)%n", target.resolve(ReviewSheet.FILE), queue);
        int reviewedCount = marks.values().stream().mapToInt(Map::size).sum();
        if (corrections != null) out.printf("reviews shown: %,d decisions from %s%n", reviewedCount, corrections);
        for (String p : problems) err.println(p);
        written.failed().forEach((doc, why) -> err.println(doc + ": no page: " + why));
        return problems.isEmpty() && written.failed().isEmpty() ? Tether.OK : Tether.SOME_FAILED;
    }
}
