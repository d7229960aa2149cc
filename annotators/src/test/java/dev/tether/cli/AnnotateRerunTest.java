package dev.tether.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.tether.output.RunManifest;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Interrupting and re-running {@code tether annotate} (issue 7): what a killed run leaves (a temporary file cut
 * short, a manifest whose last line is torn, a summary from an earlier run, missing outputs) is finished by running
 * the same command again, which ends with exactly the files of a clean run; changed inputs are redone, a document
 * that now fails loses its old outputs, {@code --fresh} starts over, and the thread count never changes the bytes.
 * Documents are invented maintenance logs of the fictional ferry operator.
 */
class AnnotateRerunTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final List<String> LOGS = List.of(
            "Replaced the cracked gasket on the cooling pump with a spare from the stores.\n",
            "Found a slow leak in the fuel line near the starboard engine.\n",
            "The chief engineer signed the work order after the sea trial.\n",
            "Greased the hinges of the loading ramp before the morning sailing.\n",
            "Checked the mooring lines for chafe at the bow fairlead and logged it in the deck book.\n",
            "Fitted a new impeller to the bilge pump of the Tern Hollow with help from the yard.\n");

    @TempDir
    Path dir;
    private Path in;

    @BeforeEach
    void writeLogs() throws Exception {
        in = Files.createDirectory(dir.resolve("logs"));
        for (int i = 0; i < LOGS.size(); i++) {
            Files.writeString(in.resolve(String.format("log-%02d.txt", i + 1)), LOGS.get(i), StandardCharsets.UTF_8);
        }
    }

    private CommandLineRun annotate(Path out, String... more) {
        List<String> args = new ArrayList<>(List.of("annotate", "--in", in.toString(), "--out", out.toString()));
        args.addAll(List.of(more));
        return CommandLineRun.of(args.toArray(new String[0]));
    }

    private static JsonNode summary(Path out) throws Exception {
        return JSON.readTree(out.resolve(AnnotateCommand.SUMMARY).toFile());
    }

    @Test
    void rerunFinishesAKilledRunWithExactlyTheOutputOfACleanRun() throws Exception {
        Path clean = dir.resolve("clean");
        assertEquals(Tether.OK, annotate(clean, "--threads", "1").exitCode());
        Map<String, String> expected = OutputFiles.of(clean);
        assertTrue(expected.containsKey(RunManifest.FILE), expected::toString);
        assertEquals(2 * LOGS.size() + 1, expected.size(), expected::toString);

        // What a run killed during the fourth document leaves behind.
        Path killed = dir.resolve("killed");
        assertEquals(Tether.OK, annotate(killed, "--threads", "1").exitCode());
        Files.delete(killed.resolve("log-04.txt.xmi"));
        Files.delete(killed.resolve("log-04.txt.ledger.jsonl"));
        Files.writeString(killed.resolve(".log-04.txt.xmi.tether-partial"), "<?xml version=\"1.0\" encoding=\"UTF-8\"?><xmi:XM");
        for (String later : List.of("log-05.txt", "log-06.txt")) {
            Files.delete(killed.resolve(later + ".xmi"));
            Files.delete(killed.resolve(later + ".ledger.jsonl"));
        }
        List<String> manifest = Files.readAllLines(killed.resolve(RunManifest.FILE));
        String torn = String.join("\n", manifest.subList(0, 3)) + "\n" + manifest.get(3).substring(0, 40);
        Files.writeString(killed.resolve(RunManifest.FILE), torn);
        // The summary of the earlier, complete run is still there.

        CommandLineRun rerun = annotate(killed, "--threads", "2");
        assertEquals(Tether.OK, rerun.exitCode(), rerun::toString);
        assertEquals(expected, OutputFiles.of(killed), "the re-run ends with the clean run's files, byte for byte");
        JsonNode s = summary(killed);
        assertEquals(3, s.get("reused").asInt(), s::toString);
        assertEquals(3, s.get("annotated").asInt(), s::toString);
        assertEquals(LOGS.size(), s.get("written").asInt(), s::toString);
        assertEquals(1, s.get("temporaryFilesRemoved").asInt(), s::toString);
        assertEquals(summary(clean).get("decisions"), s.get("decisions"), "totals count reused documents too");
        assertTrue(rerun.out().contains("3 reused"), rerun::toString);
    }

    @Test
    void changedInputsAreRedoneAndADocumentThatNowFailsLosesItsOldOutputs() throws Exception {
        Path out = dir.resolve("out");
        assertEquals(Tether.OK, annotate(out).exitCode());
        Files.writeString(in.resolve("log-02.txt"), "Found a crack in the hull plating near the bow thruster.\n");
        Files.write(in.resolve("log-03.txt"), new byte[] {'P', 'K', 3, 4, 0, 0, 0}); // now a zip archive: binary
        Files.delete(in.resolve("log-06.txt"));

        CommandLineRun rerun = annotate(out);
        assertEquals(Tether.SOME_FAILED, rerun.exitCode(), rerun::toString);
        JsonNode s = summary(out);
        assertEquals(3, s.get("reused").asInt(), s::toString);
        assertEquals(1, s.get("annotated").asInt(), s::toString);
        assertEquals(1, s.get("failed").size(), s::toString);
        assertEquals("log-03.txt", s.at("/failed/0/doc").asText());
        assertEquals(2, s.get("staleOutputsRemoved").asInt(), "log-03 (fails now) and log-06 (gone): " + s);
        for (String gone : List.of("log-03.txt", "log-06.txt")) {
            assertFalse(Files.exists(out.resolve(gone + ".xmi")), gone);
            assertFalse(Files.exists(out.resolve(gone + ".ledger.jsonl")), gone);
        }
        assertTrue(Files.readString(out.resolve("log-02.txt.ledger.jsonl")).contains("thruster"), "log-02 was redone");

        // The folder now holds what a clean run over the changed input gives.
        Path clean = dir.resolve("clean");
        annotate(clean);
        assertEquals(OutputFiles.of(clean), OutputFiles.of(out));
    }

    @Test
    void freshStartsOverAndAnotherModelRedoesEverything() throws Exception {
        Path out = dir.resolve("out");
        assertEquals(Tether.OK, annotate(out).exitCode());
        assertEquals(Tether.OK, annotate(out).exitCode());
        assertEquals(LOGS.size(), summary(out).get("reused").asInt());
        assertEquals(Tether.OK, annotate(out, "--fresh").exitCode());
        assertEquals(0, summary(out).get("reused").asInt());
        assertEquals(LOGS.size(), summary(out).get("annotated").asInt());
        // Chunks change the XMI: documents annotated without them are not reused.
        assertEquals(Tether.OK, annotate(out, "--chunks").exitCode());
        assertEquals(0, summary(out).get("reused").asInt());
        assertTrue(Files.readString(out.resolve("log-01.txt.xmi")).contains("Chunk"));
    }

    @Test
    void anOutputThatWasEditedIsWrittenAgain() throws Exception {
        Path out = dir.resolve("out");
        annotate(out);
        Map<String, String> expected = OutputFiles.of(out);
        Files.writeString(out.resolve("log-01.txt.ledger.jsonl"), "");
        assertEquals(Tether.OK, annotate(out).exitCode());
        assertEquals(LOGS.size() - 1, summary(out).get("reused").asInt());
        assertEquals(expected, OutputFiles.of(out));
    }

    @Test
    void theThreadCountDoesNotChangeTheOutputBytes() throws Exception {
        Path one = dir.resolve("one");
        Path two = dir.resolve("two");
        Path three = dir.resolve("three");
        assertEquals(Tether.OK, annotate(one, "--threads", "1").exitCode());
        assertEquals(Tether.OK, annotate(two, "--threads", "2").exitCode());
        assertEquals(Tether.OK, annotate(three, "--threads", "3").exitCode());
        assertEquals(OutputFiles.of(one), OutputFiles.of(two));
        assertEquals(OutputFiles.of(one), OutputFiles.of(three));
        assertEquals(2, summary(two).get("threads").asInt());
        // The manifest lists the documents in their sorted order.
        List<String> docs = Files.readAllLines(two.resolve(RunManifest.FILE)).stream()
                .map(l -> l.substring(l.indexOf("\"doc\":\"") + 7, l.indexOf("\",\""))).toList();
        assertEquals(List.of("log-01.txt", "log-02.txt", "log-03.txt", "log-04.txt", "log-05.txt", "log-06.txt"), docs);
    }

    @Test
    void lineSentencesSplitEntriesWithoutPunctuationAndChangingTheOptionRedoesEveryDocument() throws Exception {
        // Two log entries on two lines, neither with final punctuation.
        Files.writeString(in.resolve("log-01.txt"), "Replaced the impeller on the bilge pump\nChecked the seals with the chief engineer\n",
                StandardCharsets.UTF_8);
        Path out = dir.resolve("out");
        assertEquals(Tether.OK, annotate(out, "--threads", "1").exitCode());
        assertFalse(summary(out).get("lineBreaksEndSentences").asBoolean());
        String joined = Files.readString(out.resolve("log-01.txt.xmi"));
        assertEquals(Tether.OK, annotate(out, "--threads", "1", "--line-sentences").exitCode());
        assertEquals(0, summary(out).get("reused").asInt(), "the option changes the output, so nothing may be reused");
        assertTrue(summary(out).get("lineBreaksEndSentences").asBoolean());
        String split = Files.readString(out.resolve("log-01.txt.xmi"));
        assertEquals(1, occurrences(joined, "<type:Sentence "), joined);
        assertEquals(2, occurrences(split, "<type:Sentence "), split);
        assertEquals(Tether.OK, annotate(out, "--threads", "1", "--line-sentences").exitCode());
        assertEquals(LOGS.size(), summary(out).get("reused").asInt());
    }

    private static int occurrences(String text, String part) {
        int n = 0;
        for (int at = text.indexOf(part); at >= 0; at = text.indexOf(part, at + 1)) n++;
        return n;
    }
}
