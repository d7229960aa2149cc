package dev.tether.cli;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import static dev.tether.cli.AuditRuns.count;
import static dev.tether.cli.AuditRuns.lines;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The HTML report of {@code annotate --report} and {@code audit}: structure, escaping, determinism, bad input. */
class AuditReportTest {
    /** An invented log entry whose text and name carry markup that must reach the page as text. */
    private static final String MARKUP_DOC = "log-31-<i onfocus='x'>sorrel&gate.txt";
    private static final String MARKUP_TEXT = "Gullcombe Sound Ferry Company\n\n"
            + "Fitted a new seal on the <script>alert(\"deck\")</script> pump with a gasket from the <b onclick='x'>stores</b> & bay.\n"
            + "Replaced the hose on the \"aft\" winch with a spare from the <img src=x> locker.\n";

    @TempDir
    static Path dir;
    private static Path run;

    @BeforeAll
    static void annotateOnce() throws IOException {
        Path docs = AuditRuns.demoDocuments(dir.resolve("docs"));
        Files.writeString(docs.resolve(MARKUP_DOC), MARKUP_TEXT, StandardCharsets.UTF_8);
        run = dir.resolve("run");
        AuditRuns.annotate(docs, run, "--report");
    }

    private static Path page(Path report, String doc) throws IOException {
        try (Stream<Path> pages = Files.list(report.resolve("documents"))) {
            String safe = doc.replaceAll("[^A-Za-z0-9._-]", "_");
            return pages.filter(p -> p.getFileName().toString().endsWith("-" + safe + ".html")).findFirst().orElseThrow();
        }
    }

    @Test
    void everyDecisionIsAnArcOnItsSentenceAndARowOfTheTable() throws IOException {
        Path report = run.resolve("report");
        String index = Files.readString(report.resolve("index.html"));
        for (String doc : AuditRuns.DEMO) {
            long decisions = lines(run.resolve(doc + ".ledger.jsonl"));
            long attachments = Files.readAllLines(run.resolve(doc + ".ledger.jsonl")).stream()
                    .filter(l -> l.contains("\"kind\":\"attachment\"")).count();
            assertTrue(attachments > 5, doc);
            String page = Files.readString(page(report, doc));
            assertEquals(attachments, count(page, "<path class=\"arc chosen\""), doc + ": one chosen arc per attachment");
            assertTrue(count(page, "<path class=\"arc conjunct\"") >= 2 * (decisions - attachments), doc + ": conjunct arcs of every coordination");
            assertEquals(decisions, count(page, "<tr id=\"d\\d+\""), doc + ": one table row per decision");
            assertTrue(count(page, "<path class=\"arc runner-up\"") > 0, doc + ": runners-up drawn");
            assertTrue(page.contains("aria-label=\"legend\""), "a legend");
            assertTrue(page.contains("<th class=\"num\">probability</th><th class=\"num\">margin</th>"), "probability and margin columns");
            assertTrue(index.contains("documents/" + page(report, doc).getFileName()), "index links " + doc);
        }
        assertTrue(index.contains("Attachment decisions per preposition"));
        assertTrue(index.contains("class=\"chart histogram\""));
        assertTrue(index.contains("Share decided at each evidence level"));
    }

    @Test
    void noMarkupFromADocumentReachesThePageAsMarkup() throws IOException {
        Path report = run.resolve("report");
        String page = Files.readString(page(report, MARKUP_DOC));
        String index = Files.readString(report.resolve("index.html"));
        assertTrue(lines(run.resolve(MARKUP_DOC + ".ledger.jsonl")) > 0, "the document has decisions");
        for (String html : List.of(page, index)) {
            assertFalse(html.contains("<script"), "no script element");
            assertFalse(html.contains("<b onclick"), "no bold element from the document");
            assertFalse(html.contains("<img"), "no image element");
            assertFalse(html.contains("<i "), "no element from the document's name");
            assertFalse(html.contains("onclick='") || html.contains("onfocus='"), "no handler attribute");
        }
        assertTrue(page.contains("&lt;script&gt;alert(&quot;deck&quot;)&lt;/script&gt;"), "the text is shown, escaped");
        assertTrue(page.contains("&lt;b onclick=&#39;x&#39;&gt;stores&lt;/b&gt; &amp; bay"));
        assertTrue(index.contains("log-31-&lt;i onfocus=&#39;x&#39;&gt;sorrel&amp;gate.txt"), "the document's name, escaped");
    }

    @Test
    void theReportNeedsNothingFromOutsideAndNoScript() throws IOException {
        for (Path f : files(run.resolve("report"))) {
            String html = Files.readString(f);
            assertFalse(html.contains("<script"), f + ": no script");
            assertFalse(html.contains("<link"), f + ": no linked stylesheet");
            assertFalse(html.contains(" src=\""), f + ": no loaded resource");
            assertFalse(html.contains("http://") || html.contains("https://"), f + ": no address outside the report");
            assertTrue(html.startsWith("<!DOCTYPE html>") && html.endsWith("</html>\n"), f + ": a whole page");
        }
    }

    @Test
    void theSameRunGivesTheSameBytesAndNoPartialFiles() throws IOException {
        Path a = dir.resolve("audit-a");
        Path b = dir.resolve("audit-b");
        assertEquals(0, CommandLineRun.of("audit", "--ledger", run.toString(), "--out", a.toString()).exitCode());
        assertEquals(0, CommandLineRun.of("audit", "--ledger", run.toString(), "--out", b.toString()).exitCode());
        CommandLineRun again = CommandLineRun.of("audit", "--ledger", run.toString(), "--out", b.toString());
        assertEquals(0, again.exitCode(), again.toString());
        List<Path> fa = files(a);
        List<Path> fb = files(b);
        assertEquals(AuditRuns.DEMO.length + 2, fa.size(), "index and four pages: " + fa);
        assertEquals(fa.stream().map(a::relativize).toList(), fb.stream().map(b::relativize).toList());
        for (Path f : fa) {
            assertArrayEquals(Files.readAllBytes(f), Files.readAllBytes(b.resolve(a.relativize(f))), f.toString());
            assertArrayEquals(Files.readAllBytes(f), Files.readAllBytes(run.resolve("report").resolve(a.relativize(f))),
                    "audit and annotate --report agree: " + f);
        }
    }

    @Test
    void aLedgerLineThatIsNotJsonNamesFileAndLine() throws IOException {
        Path copy = copyRun("not-json");
        Path ledger = copy.resolve(AuditRuns.DEMO[0] + ".ledger.jsonl");
        editLine(ledger, 1, line -> line.substring(0, 40));
        CommandLineRun r = CommandLineRun.of("audit", "--ledger", copy.toString(), "--out", dir.resolve("out-not-json").toString());
        assertEquals(3, r.exitCode(), r.toString());
        assertTrue(r.err().contains(ledger + ":2: not JSON"), r.err());
    }

    @Test
    void aLedgerOfAnotherFormatOrModelIsRefused() throws IOException {
        Path other = copyRun("format-2");
        Path summary = other.resolve("run-summary.json");
        Files.writeString(summary, Files.readString(summary).replace("\"ledgerFormat\" : 1", "\"ledgerFormat\" : 2"));
        CommandLineRun r = CommandLineRun.of("audit", "--ledger", other.toString(), "--out", dir.resolve("out-2").toString());
        assertEquals(3, r.exitCode(), r.toString());
        assertTrue(r.err().contains("ledger format 2, this Tether reads format 1"), r.err());

        Path old = copyRun("no-format");
        summary = old.resolve("run-summary.json");
        Files.writeString(summary, Files.readString(summary).replace("\"ledgerFormat\" : 1,", ""));
        r = CommandLineRun.of("audit", "--ledger", old.toString(), "--out", dir.resolve("out-old").toString());
        assertEquals(3, r.exitCode(), r.toString());
        assertTrue(r.err().contains("states no ledgerFormat"), r.err());

        Path mixed = copyRun("mixed-models");
        Path ledger = mixed.resolve(AuditRuns.DEMO[1] + ".ledger.jsonl");
        editLine(ledger, 2, line -> line.replaceAll("\"model\":\"[0-9a-f]+\"", "\"model\":\"0123456789ab\""));
        r = CommandLineRun.of("audit", "--ledger", mixed.toString(), "--out", dir.resolve("out-mixed").toString());
        assertEquals(3, r.exitCode(), r.toString());
        assertTrue(r.err().contains(ledger + ":3: decided by model 0123456789ab"), r.err());
    }

    @Test
    void aKindThisTetherDoesNotKnowIsRefusedWithItsLine() throws IOException {
        Path copy = copyRun("unknown-kind");
        Path ledger = copy.resolve(AuditRuns.DEMO[0] + ".ledger.jsonl");
        int first = 0;
        while (!Files.readAllLines(ledger).get(first).contains("\"kind\":\"attachment\"")) first++;
        editLine(ledger, first, line -> line.replace("\"kind\":\"attachment\"", "\"kind\":\"ellipsis\""));
        CommandLineRun r = CommandLineRun.of("audit", "--ledger", copy.toString(), "--out", dir.resolve("out-kind").toString());
        assertEquals(3, r.exitCode(), r.toString());
        assertTrue(r.err().contains(ledger + ":" + (first + 1) + ": kind 'ellipsis' is not one this Tether reads"), r.err());
    }

    @Test
    void aDocumentWithoutItsXmiFailsAloneAndIsListed() throws IOException {
        Path copy = copyRun("no-xmi");
        Files.delete(copy.resolve(AuditRuns.DEMO[2] + ".xmi"));
        Path out = dir.resolve("out-no-xmi");
        CommandLineRun r = CommandLineRun.of("audit", "--ledger", copy.toString(), "--out", out.toString());
        assertEquals(1, r.exitCode(), r.toString());
        assertTrue(r.err().contains(AuditRuns.DEMO[2] + ": no page: no " + AuditRuns.DEMO[2] + ".xmi beside the ledger"), r.err());
        assertEquals(AuditRuns.DEMO.length, files(out.resolve("documents")).size(), "the other pages are written");
        assertTrue(Files.readString(out.resolve("index.html")).contains("<h2>Failures</h2>"));
    }

    @Test
    void documentsTheAnnotationCouldNotReadAreListedOnTheIndex() throws IOException {
        Path copy = copyRun("annotate-failed");
        Path summary = copy.resolve("run-summary.json");
        Files.writeString(summary, Files.readString(summary).replace("\"failed\" : [ ]",
                "\"failed\" : [ { \"doc\" : \"log-33-<bilge>.txt\", \"reason\" : \"not UTF-8 text\" } ]"));
        Path out = dir.resolve("out-annotate-failed");
        CommandLineRun r = CommandLineRun.of("audit", "--ledger", copy.toString(), "--out", out.toString());
        assertEquals(0, r.exitCode(), "the report itself is complete: " + r);
        String index = Files.readString(out.resolve("index.html"));
        assertTrue(index.contains("<tr><td>log-33-&lt;bilge&gt;.txt</td><td>annotate</td><td>not UTF-8 text</td></tr>"), index);
        assertTrue(index.contains("<b>1</b>failures"));
    }

    @Test
    void aCoordinationDecisionIsDrawnBesideTheAttachments() throws IOException {
        Path copy = copyRun("coordination");
        String doc = AuditRuns.DEMO[0];
        int before = count(Files.readString(page(run.resolve("report"), doc)), "<path class=\"arc conjunct\"");
        String text = Files.readString(dir.resolve("docs").resolve(doc));
        int filters = text.indexOf("filters and gaskets");
        int and = filters + "filters ".length();
        int gaskets = and + "and ".length();
        String model = Files.readString(copy.resolve("run-summary.json")).replaceAll("(?s).*\"modelId\" : \"([0-9a-f]+)\".*", "$1");
        String line = "{\"doc\":\"" + doc + "\",\"kind\":\"coordination\",\"coordinator\":{\"begin\":" + and + ",\"end\":" + (and + 3)
                + ",\"text\":\"and\"},\"conjuncts\":[{\"begin\":" + filters + ",\"end\":" + (filters + 7) + ",\"text\":\"filters\","
                + "\"head\":{\"begin\":" + filters + ",\"end\":" + (filters + 7) + ",\"text\":\"filters\"}},{\"begin\":" + gaskets
                + ",\"end\":" + (gaskets + 7) + ",\"text\":\"gaskets\",\"head\":{\"begin\":" + gaskets + ",\"end\":" + (gaskets + 7)
                + ",\"text\":\"gaskets\"}}],\"probability\":0.9,\"margin\":0.8,\"alternatives\":[],"
                + "\"evidence\":{\"level\":\"similarity\",\"text\":\"the two heads are near neighbours\",\"model\":\"" + model + "\"}}\n";
        Files.writeString(copy.resolve(doc + ".ledger.jsonl"), line, java.nio.file.StandardOpenOption.APPEND);
        Path out = dir.resolve("out-coordination");
        CommandLineRun r = CommandLineRun.of("audit", "--ledger", copy.toString(), "--out", out.toString());
        assertEquals(0, r.exitCode(), r.toString());
        String page = Files.readString(page(out, doc));
        assertEquals(before + 2, count(page, "<path class=\"arc conjunct\""), "one dotted arc per conjunct of the added decision");
        assertTrue(page.contains("<td>coordination</td><td>and</td><td>filters | gaskets</td>"), "a row of its own");
        assertTrue(Files.readString(out.resolve("index.html")).contains("Decisions per kind"));
    }

    /** Replaces line {@code index} (0-based) of {@code ledger} by what {@code edit} makes of it. */
    private static void editLine(Path ledger, int index, java.util.function.UnaryOperator<String> edit) throws IOException {
        List<String> lines = new ArrayList<>(Files.readAllLines(ledger));
        lines.set(index, edit.apply(lines.get(index)));
        Files.write(ledger, lines);
    }

    private static Path copyRun(String name) throws IOException {
        Path copy = dir.resolve("copy-" + name);
        try (Stream<Path> all = Files.walk(run)) {
            for (Path p : all.toList()) {
                Path target = copy.resolve(run.relativize(p).toString());
                if (Files.isDirectory(p)) Files.createDirectories(target);
                else Files.copy(p, target);
            }
        }
        return copy;
    }

    private static List<Path> files(Path root) throws IOException {
        try (Stream<Path> all = Files.walk(root)) {
            return all.filter(Files::isRegularFile).sorted().toList();
        }
    }
}
