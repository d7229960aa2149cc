package dev.tether.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import static dev.tether.cli.AuditRuns.count;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The review loop on invented ferry logs: the queue of least certain decisions, a reviewer's marks, training on
 * them, and a re-run whose report shows the reviewed decisions.
 */
class ReviewCorrectionsTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    static Path dir;
    private static Path docs;
    private static Path firstRun;
    /** The sheet as the queue wrote it; each test marks a copy of its own. */
    private static Path queue;

    @BeforeAll
    static void annotateAndQueue() throws IOException {
        docs = AuditRuns.demoDocuments(dir.resolve("docs"));
        firstRun = dir.resolve("run-1");
        AuditRuns.annotate(docs, firstRun);
        Path audit = dir.resolve("audit-1");
        CommandLineRun q = CommandLineRun.of("audit", "--ledger", firstRun.toString(), "--queue", "8", "--out", audit.toString());
        assertEquals(0, q.exitCode(), q.toString());
        queue = audit.resolve("review-sheet.tsv");
    }

    private static List<String> sheetLines() throws IOException {
        return new ArrayList<>(Files.readAllLines(queue));
    }

    @Test
    void theQueueHoldsTheLeastCertainDecisionsWithTheirAlternatives() throws IOException {
        List<String> lines = sheetLines();
        assertEquals("# tether review sheet, format 1", lines.get(0));
        List<String> decisions = lines.stream().filter(l -> !l.startsWith("#")).toList();
        assertEquals(8, decisions.size());
        double largestQueued = 0;
        for (String l : decisions) {
            String[] cols = l.split("\t");
            assertEquals("?", cols[0]);
            assertTrue(cols.length >= 7, "at least two heads offered: " + l);
            largestQueued = Math.max(largestQueued, Double.parseDouble(cols[4]));
        }
        int smaller = 0;
        for (Path ledger : ledgers(firstRun)) {
            for (String l : Files.readAllLines(ledger)) {
                JsonNode o = JSON.readTree(l);
                // The review sheet queues attachment decisions; coordination decisions are audited on the page.
                if (o.get("kind").asText().equals("attachment") && o.get("margin").asDouble() < largestQueued) smaller++;
            }
        }
        assertTrue(smaller <= 8, "no decision outside the queue has a smaller margin than one in it");
    }

    /** Preposition and object words of a sheet line, without offsets. */
    private static String context(String[] cols) {
        return cols[2].substring(0, cols[2].indexOf('@')) + " " + cols[3].substring(0, cols[3].indexOf('@'));
    }

    @Test
    void correctionsRetrainTheModelAndTheReRunShowsThemReviewed() throws IOException {
        List<String> lines = sheetLines();
        List<Integer> data = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) if (!lines.get(i).startsWith("#")) data.add(i);
        List<String[]> corrected = new ArrayList<>();
        for (int k : List.of(0, 2, 3)) {
            String[] cols = lines.get(data.get(k)).split("\t");
            cols[0] = "2";
            lines.set(data.get(k), String.join("\t", cols));
            corrected.add(cols);
        }
        // The accepted decision is the first of another context (preposition and object words): the demo repeats whole
        // sentences across logs, and a reviewer who corrects one copy and accepts another contradicts themself.
        int acceptedAt = -1;
        int unknownAt = data.get(data.size() - 1);
        for (int k = 1; k < data.size() - 1 && acceptedAt < 0; k++) {
            String[] cols = lines.get(data.get(k)).split("\t");
            if (corrected.stream().noneMatch(c -> context(c).equals(context(cols)))) acceptedAt = data.get(k);
        }
        assertTrue(acceptedAt >= 0, "the queue holds a second context");
        String[] acceptedCols = lines.get(acceptedAt).split("\t");
        acceptedCols[0] = "=";
        lines.set(acceptedAt, String.join("\t", acceptedCols));
        String[] accepted = acceptedCols;
        String[] unknownChoice = lines.get(unknownAt).split("\t");
        unknownChoice[0] = "9";
        lines.set(unknownAt, String.join("\t", unknownChoice));
        lines.add("= this line lost its columns");
        int unknownLine = unknownAt + 1;
        int brokenLine = lines.size();
        Path sheet = dir.resolve("reviewed.tsv");
        Files.write(sheet, lines);

        Path model = dir.resolve("reviewed.tether");
        CommandLineRun train = CommandLineRun.of("train", "--base", "default", "--corrections", sheet.toString(), "--out", model.toString());
        assertEquals(1, train.exitCode(), "some lines could not be used: " + train);
        assertTrue(train.err().contains(sheet + ":" + unknownLine + ": choice 9 is not one of the"), train.err());
        assertTrue(train.err().contains(sheet + ":" + brokenLine + ": expected at least 6 tab-separated columns"), train.err());
        assertTrue(train.out().contains("4 reviewed decisions (1 accepted, 3 corrected), weight 1.0"), train.out());
        CommandLineRun inspect = CommandLineRun.of("inspect", model.toString());
        assertTrue(inspect.out().contains("corrections"), "the sheet is a source of kind corrections: " + inspect.out());

        Path secondRun = dir.resolve("run-2");
        AuditRuns.annotate(docs, secondRun, "--model", model.toString());
        Map<String, JsonNode> before = decisions(firstRun);
        Map<String, JsonNode> after = decisions(secondRun);
        for (String[] c : corrected) {
            String key = key(c);
            int wanted = Integer.parseInt(c[6].substring(c[6].lastIndexOf('@') + 1, c[6].lastIndexOf(' ')));
            assertTrue(before.get(key).get("head").get("begin").asInt() != wanted, "decided otherwise before: " + key);
            assertEquals(wanted, after.get(key).get("head").get("begin").asInt(), "follows the reviewer after retraining: " + key);
        }
        int acceptedHead = Integer.parseInt(accepted[5].substring(accepted[5].lastIndexOf('@') + 1, accepted[5].lastIndexOf(' ')));
        assertEquals(acceptedHead, after.get(key(accepted)).get("head").get("begin").asInt(), "an accepted decision stays");

        Path reviewedBefore = dir.resolve("audit-before");
        CommandLineRun b = CommandLineRun.of("audit", "--ledger", firstRun.toString(), "--corrections", sheet.toString(),
                "--out", reviewedBefore.toString());
        assertEquals(1, b.exitCode(), "the sheet's bad lines are reported: " + b);
        assertTrue(b.out().contains("reviews shown: 4 decisions"), b.out());
        assertEquals(3, countInPages(reviewedBefore, "reviewed \u2260 reviewer chose"), "before retraining: three differ");
        assertEquals(1, countInPages(reviewedBefore, "reviewed \u2713 agrees"));

        Path reviewedAfter = dir.resolve("audit-after");
        CommandLineRun r = CommandLineRun.of("audit", "--ledger", secondRun.toString(), "--corrections", sheet.toString(),
                "--out", reviewedAfter.toString());
        assertTrue(r.out().contains("reviews shown: 4 decisions"), r.toString());
        assertEquals(4, countInPages(reviewedAfter, "reviewed \u2713 agrees"), "after retraining: all four agree");
        assertEquals(4, countInPages(reviewedAfter, "\u2713</text>"), "and their arcs carry the mark");
    }

    @Test
    void aReviewedLineThatNoLongerMatchesADecisionIsReportedAndTheRestShown() throws IOException {
        List<String> lines = sheetLines();
        List<String> marked = new ArrayList<>();
        int moved = -1;
        for (int i = 0; i < lines.size(); i++) {
            String l = lines.get(i);
            if (l.startsWith("#") || !l.startsWith("?")) {
                marked.add(l);
                continue;
            }
            String[] cols = l.split("\t");
            cols[0] = "=";
            if (moved < 0) {
                cols[2] = cols[2].replaceAll("@(\\d+)$", "@99999");
                moved = i + 1;
            }
            marked.add(String.join("\t", cols));
        }
        Path stale = dir.resolve("stale.tsv");
        Files.write(stale, marked);
        Path out = dir.resolve("audit-stale");
        CommandLineRun r = CommandLineRun.of("audit", "--ledger", firstRun.toString(), "--corrections", stale.toString(), "--out", out.toString());
        assertEquals(1, r.exitCode(), r.toString());
        assertTrue(r.err().contains(stale + ":" + moved + ": no decision for"), r.err());
        assertTrue(r.out().contains("reviews shown: 7 decisions"), r.out());
    }

    private static String key(String[] cols) {
        return cols[1] + "@" + cols[2].substring(cols[2].lastIndexOf('@') + 1);
    }

    private static Map<String, JsonNode> decisions(Path run) throws IOException {
        Map<String, JsonNode> all = new HashMap<>();
        for (Path ledger : ledgers(run)) {
            String doc = run.relativize(ledger).toString().replace(".ledger.jsonl", "");
            for (String l : Files.readAllLines(ledger)) {
                JsonNode o = JSON.readTree(l);
                if (!o.get("kind").asText().equals("attachment")) continue;
                all.put(doc + "@" + o.get("preposition").get("begin").asInt(), o);
            }
        }
        return all;
    }

    private static List<Path> ledgers(Path run) throws IOException {
        try (Stream<Path> s = Files.list(run)) {
            return s.filter(p -> p.toString().endsWith(".ledger.jsonl")).sorted().toList();
        }
    }

    private static int countInPages(Path report, String text) throws IOException {
        int n = 0;
        try (Stream<Path> s = Files.list(report.resolve("documents"))) {
            for (Path p : s.toList()) n += count(Files.readString(p), java.util.regex.Pattern.quote(text));
        }
        return n;
    }
}
