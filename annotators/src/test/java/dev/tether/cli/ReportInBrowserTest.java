package dev.tether.cli;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import static dev.tether.cli.AuditRuns.count;
import static dev.tether.cli.AuditRuns.lines;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

/**
 * A report page rendered by a real browser, headless Chromium (Debian package {@code chromium}, which {@code .ci/run}
 * installs): it takes a screenshot and the DOM the browser built, which must hold the arcs and the table. Without
 * Chromium the test is skipped on a developer's machine and fails in CI ({@code CI=true}).
 */
class ReportInBrowserTest {
    @TempDir
    static Path dir;
    private static Path run;
    private static Path browser;

    @BeforeAll
    static void annotate() throws IOException {
        browser = findChromium();
        if (browser == null) {
            if ("true".equals(System.getenv("CI"))) fail("headless Chromium is needed in CI: apt-get install -y chromium (.ci/run does this)");
            Assumptions.assumeTrue(false, "no chromium on PATH; install the Debian package chromium to run this test");
        }
        Path docs = AuditRuns.demoDocuments(dir.resolve("docs"));
        Files.writeString(docs.resolve("log-32-markup.txt"), "Gullcombe Sound Ferry Company\n\n"
                + "Fitted a seal on the <script>document.title='x'</script> pump with a gasket from the stores.\n", StandardCharsets.UTF_8);
        run = dir.resolve("run");
        AuditRuns.annotate(docs, run, "--report");
    }

    private static Path findChromium() {
        for (String d : System.getenv().getOrDefault("PATH", "").split(File.pathSeparator)) {
            for (String name : List.of("chromium", "chromium-browser")) {
                Path p = Path.of(d, name);
                if (Files.isExecutable(p)) return p;
            }
        }
        return null;
    }

    /** Runs headless Chromium on {@code page} with {@code action} (a flag); returns what it printed on standard output. */
    private static String chromium(Path page, String... action) throws IOException, InterruptedException {
        Path profile = Files.createTempDirectory(dir, "profile");
        List<String> command = new ArrayList<>(List.of(browser.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run",
                "--user-data-dir=" + profile, "--window-size=1280,1400"));
        command.addAll(List.of(action));
        command.add(page.toUri().toString());
        Path stdout = Files.createTempFile(dir, "chromium", ".out");
        Process p = new ProcessBuilder(command).redirectOutput(stdout.toFile()).redirectError(ProcessBuilder.Redirect.DISCARD).start();
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.descendants().forEach(ProcessHandle::destroyForcibly);
            p.destroyForcibly();
            fail("chromium did not finish within 120 s on " + page);
        }
        assertEquals(0, p.exitValue(), "chromium's exit code on " + page);
        return Files.readString(stdout, StandardCharsets.UTF_8);
    }

    private static Path page(String doc) throws IOException {
        try (Stream<Path> pages = Files.list(run.resolve("report").resolve("documents"))) {
            return pages.filter(p -> p.getFileName().toString().endsWith("-" + doc + ".html")).findFirst().orElseThrow();
        }
    }

    @Test
    void theBrowserDrawsTheArcsAndTheTable() throws Exception {
        String doc = AuditRuns.DEMO[0];
        Path page = page(doc);
        Path ledger = run.resolve(doc + ".ledger.jsonl");
        long decisions = lines(ledger);
        long attachments = lines(ledger, "attachment");
        long coordinations = lines(ledger, "coordination");
        assertEquals(decisions, attachments + coordinations, "every ledger line is an attachment or a coordination");

        Path png = dir.resolve("page.png");
        chromium(page, "--screenshot=" + png, "--hide-scrollbars");
        byte[] bytes = Files.readAllBytes(png);
        assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G'}, java.util.Arrays.copyOf(bytes, 4), "a PNG screenshot");
        assertTrue(bytes.length > 20_000, "the screenshot shows a drawn page, not a blank one: " + bytes.length + " bytes");

        String dom = chromium(page, "--dump-dom");
        assertTrue(dom.contains("<svg class=\"sentence\""), "sentences are SVG in the browser's DOM");
        assertEquals(attachments, count(dom, "<path class=\"arc chosen\""), "every chosen attachment arc is in the DOM");
        assertTrue(count(dom, "<path class=\"arc conjunct\"") >= 2 * coordinations,
                "every coordination draws an arc to each of its (at least two) conjuncts");
        assertTrue(count(dom, "<path class=\"arc runner-up\"") > 0, "runner-up arcs are in the DOM");
        assertTrue(dom.contains("<table class=\"decisions\">"), "the decision table is in the DOM");
        assertEquals(decisions, count(dom, "<tr id=\"d\\d+\""), "a row per decision");
        assertTrue(dom.contains("aria-label=\"legend\""), "the legend");
    }

    @Test
    void markupInADocumentStaysTextInTheBrowser() throws Exception {
        String dom = chromium(page("log-32-markup.txt"), "--dump-dom");
        assertFalse(dom.contains("<script"), "the browser built no script element from the document");
        assertTrue(dom.contains("&lt;script&gt;document.title="), "the markup shows as text");
        assertTrue(dom.contains("<title>log-32-markup.txt"), "the title is the page's own");
    }
}
