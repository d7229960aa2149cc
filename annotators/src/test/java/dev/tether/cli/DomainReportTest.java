package dev.tether.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The domain report of a model trained with raw text (issue 8, point 4), on an invented ferry maintenance log
 * counted on top of a small base model trained in the test. Every figure below is worked out by hand from the two
 * inputs:
 * <pre>
 *   base quadruples (6): with 2 noun / 1 verb, in 1 noun / 0 verb, of 1 noun, for 1 verb; its vocabulary is the 18
 *   words of the quadruples (6 verbs, 12 nouns, normalized: replac(e), fit, clean, find, log, check; gasket, spare,
 *   valve, seal, filter, solvent, crack, bulkhead, hour, engine, pump, leak).
 *
 *   raw log (3 documents, 6 sentences, 40 tokens counting the full stops):
 *     log-1  "The crew worked with care. The bosun painted with primer."         12 tokens
 *     log-2  "The engineer welded with rods. The crew scrubbed with brushes."    12 tokens
 *     log-3  "Ballast pumps failed in heavy seas. The fitter replaced the gasket with a seal."   7 + 9 tokens
 *   prepositions: 6, each with an object. Five follow their verb directly (nothing between the verb and the
 *   preposition), so they are unambiguous verb attachments: with care / primer / rods / brushes, in seas.
 *   "replaced the gasket with a seal" has a verb and a noun before the preposition: one ambiguous configuration.
 *   co-occurrence: every noun and verb before the preposition in its sentence is a candidate head, so
 *   2 (the subject and the verb) x 4 + 3 (ballast, pumps, failed) + 3 (fitter, replaced, gasket) = 14 candidate heads.
 *   re-estimation (1 round): replac-gasket-with-seal has no triple or pair in the raw events, so the back-off reaches
 *   the preposition: with is 0 noun of 4 raw events, so the configuration goes to the verb: 0 to the noun, 1 to the
 *   verb.
 *   noun and verb vocabulary of the raw text: nouns crew (2), care, bosun, primer, engineer, rod, brush, ballast, pump,
 *   sea, fitter, gasket, seal; verbs work, paint, weld, scrub, fail, replace: 19 forms, 20 tokens. In the base:
 *   pump, gasket, seal, replace: 4 forms, 4 tokens (21.1% of the forms, 20.0% of the tokens). Most frequent new
 *   word: crew (2); the others once, in alphabetical order.
 *   prepositions: with 2 noun / 1 verb -> 2 noun / (1 + 4 + 1) verb: now verb; in 1 noun / 0 verb -> 1 / 1: even,
 *   a change; of and for keep their side: 2 of 4 compared changed.
 * </pre>
 */
class DomainReportTest {
    static final String BASE = """
            1 replaced gasket with spare N
            2 fitted valve with seal N
            3 cleaned filters with solvent V
            4 found crack in bulkhead N
            5 logged hours of engine N
            6 checked pumps for leaks V
            """;

    @TempDir
    Path dir;

    static Path writeLog(Path folder) throws Exception {
        Files.createDirectories(folder);
        FerryLogs.write(folder, "log-1.txt", "The crew worked with care. The bosun painted with primer.\n");
        FerryLogs.write(folder, "log-2.txt", "The engineer welded with rods. The crew scrubbed with brushes.\n");
        FerryLogs.write(folder, "log-3.txt", "Ballast pumps failed in heavy seas. The fitter replaced the gasket with a seal.\n");
        return folder;
    }

    @Test
    void trainAndInspectShowWhatTheRawTextChangedAgainstTheBase() throws Exception {
        Path baseQuadruples = FerryLogs.write(dir, "base.txt", BASE);
        Path base = dir.resolve("base.tether");
        CommandLineRun b = CommandLineRun.of("train", "--quadruples", baseQuadruples.toString(), "--out", base.toString());
        assertEquals(Tether.OK, b.exitCode(), b::toString);
        Path logs = writeLog(dir.resolve("logs"));
        Path model = dir.resolve("ferry.tether");
        Path counts = dir.resolve("logs.counts");
        CommandLineRun train = CommandLineRun.of("train", "--raw", logs.toString(), "--base", base.toString(),
                "--save-raw-counts", counts.toString(), "--out", model.toString());
        assertEquals(Tether.OK, train.exitCode(), train::toString);

        String report = train.out().substring(train.out().indexOf("domain report"));
        assertTrue(report.startsWith("domain report (raw text against the base model base.tether)"), report);
        assertContains(report, "raw source logs: 3 documents, 40 tokens, 6 prepositions with candidates, weight 1");
        assertContains(report, "unambiguous    5 prepositions: 5 attachment events, 5 to a verb and 0 to a noun (0 to an adjective");
        assertContains(report, "co-occurrence  14 candidate heads");
        assertContains(report, "re-estimated   1 ambiguous verb-noun configurations split in 1 round: 0 to the noun, 1 to the verb");
        assertContains(report, "vocabulary     19 noun and verb forms in the raw text, 4 (21.1%) counted in the base (18 words);");
        assertContains(report, "they cover 4 of the raw text's 20 noun and verb tokens (20.0%)");
        assertContains(report, "most frequent new words  crew 2, ballast 1, bosun 1, brush 1, care 1, engineer 1, fail 1, fitter 1, paint 1, primer 1\n");
        assertContains(report, "prepositions   2 of 4 compared changed majority attachment");
        assertContains(report, "    in           noun 1 / verb 0  ->  noun 1 / verb 1   now even\n");
        assertContains(report, "    with         noun 2 / verb 1  ->  noun 2 / verb 6   now verb\n");

        // inspect shows the same report later, from what the model stores.
        CommandLineRun inspect = CommandLineRun.of("inspect", model.toString());
        assertEquals(Tether.OK, inspect.exitCode(), inspect::toString);
        assertEquals(report, inspect.out().substring(inspect.out().indexOf("domain report")));

        // A model without raw text (or from before the report) says so.
        CommandLineRun plain = CommandLineRun.of("inspect", base.toString());
        assertContains(plain.out(), "domain report  none: the model was trained without raw text");

        // Same inputs, same bytes, report included (here from the saved counts, without counting again).
        Path again = dir.resolve("again.tether");
        CommandLineRun second = CommandLineRun.of("train", "--raw-counts", counts.toString(), "--base", base.toString(),
                "--out", again.toString());
        assertEquals(Tether.OK, second.exitCode(), second::toString);
        Path third = dir.resolve("third.tether");
        CommandLineRun thirdRun = CommandLineRun.of("train", "--raw-counts", counts.toString(), "--base", base.toString(), "--out", third.toString());
        assertEquals(Tether.OK, thirdRun.exitCode(), thirdRun::toString);
        assertArrayEquals(Files.readAllBytes(again), Files.readAllBytes(third));

        // Without a base model: the events per source, and no comparison.
        Path alone = dir.resolve("alone.tether");
        CommandLineRun rawOnly = CommandLineRun.of("train", "--raw-counts", counts.toString(), "--reestimate", "0",
                "--out", alone.toString());
        assertEquals(Tether.OK, rawOnly.exitCode(), rawOnly::toString);
        assertContains(rawOnly.out(), "domain report (raw text)\n");
        assertContains(rawOnly.out(), "re-estimated   none (--reestimate 0");
        assertContains(rawOnly.out(), "vocabulary and prepositions: no base model to compare with");
    }

    private static void assertContains(String text, String part) {
        assertTrue(text.contains(part), () -> "expected to find\n" + part + "\nin\n" + text);
    }
}
