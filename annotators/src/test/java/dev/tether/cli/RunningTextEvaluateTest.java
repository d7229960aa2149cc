package dev.tether.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@code tether evaluate --conllu} on six sentences cut from the development split of Universal Dependencies English
 * EWT (Silveira et al. 2014; CC BY-SA 4.0; provenance and the hand count of their 12 gold attachments in
 * {@code README.md} beside the fixture): the JSON report's keys and their consistency, and a broken line.
 */
class RunningTextEvaluateTest {
    private static final String FIXTURE = "ewt-dev-six-sentences.conllu";
    /** Counted by hand from the fixture's HEAD and DEPREL columns (README.md beside it): 7 verb sites, 5 noun sites. */
    private static final int GOLD_ATTACHMENTS = 12;

    @TempDir
    Path dir;
    private Path conllu;

    @BeforeEach
    void copyFixture() throws Exception {
        conllu = dir.resolve(FIXTURE);
        try (InputStream in = RunningTextEvaluateTest.class.getResourceAsStream(FIXTURE)) {
            assertNotNull(in, FIXTURE);
            Files.copy(in, conllu);
        }
    }

    @Test
    void jsonReportHasTheDocumentedKeysWithConsistentFigures() throws Exception {
        CommandLineRun run = CommandLineRun.of("evaluate", "--model", "default", "--conllu", conllu.toString(), "--json");
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        JsonNode json = new ObjectMapper().readTree(run.out());

        assertEquals(GOLD_ATTACHMENTS, json.get("n").asInt(), run::toString);
        assertEquals(6, json.get("sentences").asInt());
        JsonNode attachment = json.get("attachment");
        assertNotNull(attachment, run::toString);
        double accuracy = attachment.get("accuracy").asDouble();
        assertTrue(accuracy >= 0 && accuracy <= 1, "accuracy is a fraction: " + accuracy);
        assertEquals(GOLD_ATTACHMENTS, attachment.get("n").asInt());
        assertEquals((double) attachment.get("correct").asInt() / GOLD_ATTACHMENTS, accuracy, 1e-12);

        double recall = attachment.get("candidateRecall").asDouble();
        assertTrue(recall >= 0 && recall <= 1, "candidate recall is a fraction: " + recall);
        // A decision is right only when its head was among the candidates.
        assertTrue(accuracy <= recall + 1e-12, () -> "accuracy " + accuracy + " above candidate recall " + recall);

        // The paired comparison with the count-based score adds up with both accuracies of the same run.
        JsonNode versus = attachment.get("versusCountScore");
        assertNotNull(versus, run::toString);
        int countCorrect = json.at("/baselines/count-score/correct").asInt();
        assertEquals(attachment.get("correct").asInt() - countCorrect,
                versus.get("modelOnlyRight").asInt() - versus.get("countScoreOnlyRight").asInt(), versus::toString);
        double p = versus.get("mcnemarP").asDouble();
        assertTrue(p > 0 && p <= 1, "a p-value: " + p);

        JsonNode byHeadClass = attachment.get("byHeadClass");
        assertNotNull(byHeadClass, run::toString);
        assertEquals(7, byHeadClass.at("/verb/n").asInt(), byHeadClass::toString);
        assertEquals(5, byHeadClass.at("/noun/n").asInt(), byHeadClass::toString);
        int classCorrect = 0;
        int classTotal = 0;
        for (JsonNode c : byHeadClass) {
            classCorrect += c.get("correct").asInt();
            classTotal += c.get("n").asInt();
        }
        assertEquals(GOLD_ATTACHMENTS, classTotal, "every gold attachment has one head class");
        assertEquals(attachment.get("correct").asInt(), classCorrect, "per-class counts add up to the total");

        for (String baseline : List.of("nearest-noun-or-verb", "verb-or-first-noun")) {
            JsonNode b = json.at("/baselines/" + baseline);
            assertFalse(b.isMissingNode(), () -> "baselines." + baseline + " missing in\n" + run.out());
            double value = b.get("accuracy").asDouble();
            assertTrue(value >= 0 && value <= 1, baseline + " " + value);
            assertEquals(GOLD_ATTACHMENTS, b.get("n").asInt(), baseline);
            assertTrue(value <= recall + 1e-12, baseline + " above candidate recall");
        }
        JsonNode interval = attachment.get("interval95");
        assertTrue(interval.get(0).asDouble() <= accuracy && accuracy <= interval.get(1).asDouble(), interval::toString);
    }

    @Test
    void textReportNamesTheBaselinesAndAccuracy() {
        CommandLineRun run = CommandLineRun.of("evaluate", "--conllu", conllu.toString());
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        assertTrue(run.out().contains("nearest-noun-or-verb") && run.out().contains("verb-or-first-noun"), run::toString);
        assertTrue(run.out().contains("candidate recall"), run::toString);
        assertTrue(run.out().contains(GOLD_ATTACHMENTS + " gold prepositional attachments"), run::toString);
    }

    @Test
    void brokenLineFailsNamingFileAndLine() throws Exception {
        List<String> lines = new ArrayList<>(Files.readAllLines(conllu, StandardCharsets.UTF_8));
        // Break the first word line of the second sentence: its columns separated by spaces instead of tabs.
        int text = lines.indexOf("# text = The sheikh in wheel-chair has been attacked with a F-16-launched bomb.");
        assertTrue(text > 0, "fixture changed");
        int broken = text + 1;
        assertTrue(lines.get(broken).startsWith("1\tThe\t"), lines.get(broken));
        lines.set(broken, lines.get(broken).replace('\t', ' '));
        Path bad = dir.resolve("broken.conllu");
        Files.write(bad, lines, StandardCharsets.UTF_8);

        CommandLineRun run = CommandLineRun.of("evaluate", "--conllu", bad.toString(), "--json");
        assertNotEquals(Tether.OK, run.exitCode(), run::toString);
        assertEquals(Tether.INPUT, run.exitCode(), run::toString);
        int lineNumber = broken + 1;
        assertTrue(run.err().contains(bad + ":" + lineNumber), () -> "expected " + bad + ":" + lineNumber + " in\n" + run);
        assertFalse(run.out().contains("\"accuracy\""), "no report for a file that could not be read");
    }

    @Test
    void missingConlluFileIsAnInputErrorNamingIt() {
        Path missing = dir.resolve("no-such-treebank.conllu");
        CommandLineRun run = CommandLineRun.of("evaluate", "--conllu", missing.toString(), "--json");
        assertEquals(Tether.INPUT, run.exitCode(), run::toString);
        assertTrue(run.err().contains(missing.toString()), run::toString);
    }
}
