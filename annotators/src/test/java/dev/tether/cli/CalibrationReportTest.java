package dev.tether.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@code evaluate --conllu ... --json} states {@code attachment.calibration_error}, and {@code --report FOLDER} draws
 * the reliability diagram with the same figure, on the six sentences of UD English EWT dev (Silveira et al. 2014) in
 * this package's fixture. The metric itself is checked on a worked example in {@code CalibrationErrorTest}.
 */
class CalibrationReportTest {
    private static final Pattern BIN_ROW = Pattern.compile("<tr><td>[\\[(][0-9.]+, [0-9.]+\\]</td><td class=\"num\">(\\d+)</td>");

    @TempDir
    Path dir;

    private Path fixture() throws Exception {
        Path conllu = dir.resolve("six.conllu");
        try (InputStream in = CalibrationReportTest.class.getResourceAsStream("ewt-dev-six-sentences.conllu")) {
            assertNotNull(in);
            Files.copy(in, conllu);
        }
        return conllu;
    }

    @Test
    void bothSettingsStateTheCalibrationErrorAndDrawIt() throws Exception {
        Path conllu = fixture();
        for (boolean goldTags : new boolean[] {false, true}) {
            Path report = dir.resolve(goldTags ? "gold" : "raw");
            CommandLineRun run = goldTags
                    ? CommandLineRun.of("evaluate", "--conllu", conllu.toString(), "--gold-tags", "--json", "--report", report.toString())
                    : CommandLineRun.of("evaluate", "--conllu", conllu.toString(), "--json", "--report", report.toString());
            assertEquals(Tether.OK, run.exitCode(), run::toString);
            JsonNode attachment = new ObjectMapper().readTree(run.out()).get("attachment");
            double ece = attachment.get("calibration_error").asDouble();
            assertTrue(ece >= 0 && ece <= 1, run.out());

            String page = Files.readString(report.resolve("calibration.html"));
            assertTrue(page.contains("class=\"chart reliability\""), "a reliability diagram");
            assertTrue(page.contains("<b>" + String.format(java.util.Locale.ROOT, "%.4f", ece) + "</b>expected calibration error"),
                    "the page states the JSON's figure");
            Matcher m = BIN_ROW.matcher(page);
            int bins = 0;
            long decisions = 0;
            while (m.find()) {
                bins++;
                decisions += Long.parseLong(m.group(1));
            }
            assertEquals(10, bins, "ten equal-width bins");
            assertTrue(decisions > 0 && decisions <= attachment.get("n").asLong(),
                    "every decision with a stated probability, at most one per gold attachment: " + decisions);
        }
    }

    @Test
    void reportIsForRunningTextOnly() throws Exception {
        Path quads = Files.writeString(dir.resolve("q.tsv"), FerryLogs.EVALUATION);
        CommandLineRun run = CommandLineRun.of("evaluate", "--quadruples", quads.toString(), "--report", dir.resolve("r").toString());
        assertEquals(Tether.USAGE, run.exitCode(), run::toString);
    }
}
