package dev.tether.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static dev.tether.cli.AuditRuns.count;
import static dev.tether.cli.AuditRuns.lines;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The page of a long document stays small and readable: a generated 5,000-word maintenance log (invented, in the
 * ferry operator's scenario) gives a page under 2 MB with every sentence on a row of its own, and within each row no
 * two arcs on one side run along each other or end on the same point.
 */
class LongDocumentReportTest {
    private static final Pattern SVG = Pattern.compile("<svg class=\"sentence\".*?</svg>", Pattern.DOTALL);
    private static final Pattern ARC = Pattern.compile("<path class=\"arc ([a-z-]+)\" d=\"M([0-9.]+),([0-9.]+) V([0-9.]+) H([0-9.]+) V[0-9.]+\"");

    @TempDir
    Path dir;

    /** About {@code words} words of log lines from invented parts, places and actions, with a fixed seed. */
    static String ferryLog(int words) {
        String[] verbs = {"Replaced", "Inspected", "Tightened", "Cleaned", "Greased", "Renewed", "Checked", "Fitted", "Repaired", "Tested"};
        String[] parts = {"gasket", "impeller", "bilge pump", "winch brake", "ramp hinge", "fuel filter", "steering gear", "fire pump",
                "mooring line", "exhaust bracket", "shaft seal", "cooling hose", "battery bank", "radar mast", "life raft cradle"};
        String[] places = {"port engine", "starboard shaft", "car deck", "wheelhouse", "engine room", "passenger lounge", "bow door",
                "stern ramp", "crew mess", "aft deck"};
        String[] tools = {"a spare", "new bolts", "a torque wrench", "fresh grease", "a repair kit", "the shore crew", "solvent"};
        String[] sources = {"the Pellock workshop", "the Quayhead stores", "Kelby Yard", "the shore office", "Brinnow Pier"};
        String[] vessels = {"Tern Hollow", "Corrie Bell", "Wend Ansley", "Sorrel Gate"};
        Random r = new Random(20261202L);
        StringBuilder b = new StringBuilder("Gullcombe Sound Ferry Company\n\nEngineering log, MV ")
                .append(vessels[r.nextInt(vessels.length)]).append(", winter refit 2026.\n\n");
        int count = 0;
        while (count < words) {
            String s = verbs[r.nextInt(verbs.length)] + " the " + parts[r.nextInt(parts.length)] + " on the " + places[r.nextInt(places.length)]
                    + " with " + tools[r.nextInt(tools.length)] + " from " + sources[r.nextInt(sources.length)]
                    + (r.nextBoolean() ? " after the " + (r.nextBoolean() ? "morning" : "evening") + " sailing" : "")
                    + (r.nextInt(3) == 0 ? " and logged the " + parts[r.nextInt(parts.length)] + " in the safety book" : "") + ".";
            b.append(s).append(r.nextInt(4) == 0 ? "\n" : " ");
            count += s.split(" ").length;
        }
        return b.append('\n').toString();
    }

    @Test
    void aFiveThousandWordLogGivesAPageUnderTwoMegabytesWithNoArcsAlongEachOther() throws IOException {
        String text = ferryLog(5000);
        assertTrue(text.split("\\s+").length >= 5000, "at least 5,000 words");
        Path docs = Files.createDirectories(dir.resolve("docs"));
        Files.writeString(docs.resolve("refit-log.txt"), text, StandardCharsets.UTF_8);
        Path run = dir.resolve("run");
        AuditRuns.annotate(docs, run, "--report");

        Path page;
        try (Stream<Path> pages = Files.list(run.resolve("report").resolve("documents"))) {
            page = pages.findFirst().orElseThrow();
        }
        long size = Files.size(page);
        assertTrue(size < 2_000_000, "page of " + size + " bytes");
        String html = Files.readString(page);
        long decisions = lines(run.resolve("refit-log.txt.ledger.jsonl"));
        long coordinations = Files.readAllLines(run.resolve("refit-log.txt.ledger.jsonl")).stream()
                .filter(l -> l.contains("\"kind\":\"coordination\"")).count();
        assertTrue(decisions > 500, decisions + " decisions");
        assertEquals(decisions - coordinations, count(html, "<path class=\"arc chosen\""), "every attachment drawn");
        assertTrue(count(html, "<path class=\"arc conjunct\"") >= 2 * coordinations, "every coordination drawn with an arc per conjunct");
        assertEquals(decisions, count(html, "<tr id=\"d\\d+\""), "every decision in the table");
        int sentences = count(text, "\\.\\s");
        int rowCount = count(html, "<div class=\"row\"");
        assertTrue(rowCount >= sentences, rowCount + " rows for " + sentences + " log lines: a row per sentence");

        Matcher svg = SVG.matcher(html);
        int rows = 0;
        while (svg.find()) {
            rows++;
            List<double[]> above = new ArrayList<>();
            List<double[]> below = new ArrayList<>();
            Matcher arc = ARC.matcher(svg.group());
            while (arc.find()) {
                double foot = Double.parseDouble(arc.group(3));
                double level = Double.parseDouble(arc.group(4));
                double from = Double.parseDouble(arc.group(2));
                double to = Double.parseDouble(arc.group(5));
                (level < foot ? above : below).add(new double[] {level, Math.min(from, to), Math.max(from, to), from, to});
            }
            assertApart(above, svg.group());
            assertApart(below, svg.group());
        }
        assertTrue(rows >= sentences * 9 / 10, rows + " rows with arcs for " + sentences + " log lines");
    }

    /** No two arcs of one side share a stretch of one level, and no two end at one point. */
    private static void assertApart(List<double[]> arcs, String svg) {
        for (int i = 0; i < arcs.size(); i++) {
            for (int j = i + 1; j < arcs.size(); j++) {
                double[] a = arcs.get(i);
                double[] b = arcs.get(j);
                boolean sameLevel = Math.abs(a[0] - b[0]) < 0.05;
                assertTrue(!sameLevel || a[2] < b[1] || b[2] < a[1], "two arcs along one level in " + svg);
                for (double x : new double[] {a[3], a[4]}) {
                    assertTrue(Math.abs(x - b[3]) > 0.05 && Math.abs(x - b[4]) > 0.05, "two arcs end on one point in " + svg);
                }
            }
        }
    }
}
