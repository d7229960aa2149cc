package dev.tether.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@code tether annotate} on invented maintenance logs of a fictional ferry operator: per-document XMI and JSON Lines
 * ledger in the shape DESIGN.md gives, the run summary, and the bad input of issue 3 (empty, binary and non-UTF-8
 * documents, a very long sentence with no punctuation, wrong paths). Exit codes as documented on {@link Tether}.
 */
class AnnotateCommandTest {
    private static final String ENGINE_ROOM = """
            Maintenance log, MV Kittiwake Reach, 14 March 2026.
            Replaced the cracked gasket on the cooling pump with a spare from the stores.
            Found a slow leak in the fuel line near the starboard engine.
            The chief engineer signed the work order after the sea trial.
            """;
    private static final String RAMP = """
            Greased the hinges of the loading ramp before the morning sailing.
            Checked the mooring lines for chafe at the bow fairlead and logged it in the deck book.
            """;
    /**
     * Most candidate heads per preposition: six before it and, for a fronted phrase, a following verb and its
     * predicate (the bounds documented on HeadCandidateProposer).
     */
    private static final int MAX_ALTERNATIVES = 8;
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    @Test
    void folderGivesXmiAndLedgerPerTextDocumentWithOffsetsIntoTheText() throws Exception {
        Path in = Files.createDirectory(dir.resolve("logs"));
        Files.writeString(in.resolve("engine-room.txt"), ENGINE_ROOM, StandardCharsets.UTF_8);
        Path deck = Files.createDirectory(in.resolve("deck"));
        Files.writeString(deck.resolve("ramp.txt"), RAMP, StandardCharsets.UTF_8);
        // Not a .txt file: a folder run takes plain-text documents only.
        Files.writeString(deck.resolve("crew-roster.csv"), "name,role\nA. Penhale,bosun\n", StandardCharsets.UTF_8);
        Path out = dir.resolve("annotated");

        CommandLineRun run = CommandLineRun.of("annotate", "--in", in.toString(), "--out", out.toString());
        assertEquals(Tether.OK, run.exitCode(), run::toString);

        Map<String, String> documents = Map.of("engine-room.txt", ENGINE_ROOM, "deck/ramp.txt", RAMP);
        int ledgerLines = 0;
        for (Map.Entry<String, String> d : documents.entrySet()) {
            Path xmi = out.resolve(d.getKey() + ".xmi");
            assertTrue(Files.isRegularFile(xmi), () -> xmi + " missing\n" + run);
            assertTrue(Files.readString(xmi, StandardCharsets.UTF_8).contains("xmi:XMI"), xmi::toString);
            List<JsonNode> lines = ledger(out.resolve(d.getKey() + ".ledger.jsonl"));
            assertFalse(lines.isEmpty(), () -> "no decisions for " + d.getKey());
            for (JsonNode line : lines) checkLedgerLine(line, d.getKey(), d.getValue());
            ledgerLines += lines.size();
        }
        assertFalse(Files.exists(out.resolve("deck/crew-roster.csv.xmi")), "a .csv file was annotated");

        JsonNode summary = summary(out);
        assertEquals(2, summary.get("documents").asInt(), summary::toString);
        assertEquals(2, summary.get("written").asInt());
        assertEquals(ledgerLines, summary.get("decisions").asInt());
        assertEquals(0, summary.get("failed").size());
        assertEquals(ENGINE_ROOM.length() + RAMP.length(), summary.get("characters").asInt());
        assertEquals(1, summary.at("/skipped/other-extension").asInt(), "the .csv file is counted, not dropped silently");
    }

    /** A coordination object: the coordinator and every conjunct with its head, by offsets into the text, in order. */
    private static void checkCoordinationLine(JsonNode line, String text, String where) {
        JsonNode coordinator = line.get("coordinator");
        assertSpan(coordinator, text, where);
        JsonNode conjuncts = line.get("conjuncts");
        assertTrue(conjuncts.size() >= 2, where);
        for (JsonNode c : conjuncts) {
            assertSpan(c, text, where);
            assertSpan(c.get("head"), text, where);
            assertTrue(c.get("begin").asInt() <= c.get("head").get("begin").asInt()
                    && c.get("head").get("end").asInt() <= c.get("end").asInt(), "head inside its conjunct: " + where);
        }
        assertTrue(conjuncts.get(0).get("end").asInt() <= coordinator.get("begin").asInt(), where);
        assertTrue(coordinator.get("end").asInt() <= conjuncts.get(conjuncts.size() - 1).get("begin").asInt(), where);
        double p = line.get("probability").asDouble();
        assertTrue(p > 0 && p <= 1, where);
        assertTrue(line.get("alternatives").isArray(), where);
        assertFalse(line.get("evidence").get("text").asText().isEmpty(), where);
    }

    private static void assertSpan(JsonNode span, String text, String where) {
        assertNotNull(span, where);
        int begin = span.get("begin").asInt();
        int end = span.get("end").asInt();
        assertTrue(0 <= begin && begin < end && end <= text.length(), where);
        assertEquals(text.substring(begin, end), span.get("text").asText(), where);
    }

    /** One ledger object: the DESIGN keys, offsets that index the document text, a ranked list led by the choice. */
    private static void checkLedgerLine(JsonNode line, String doc, String text) {
        String where = doc + ": " + line;
        assertEquals(doc, line.get("doc").asText(), where);
        if (line.get("kind").asText().equals("coordination")) {
            checkCoordinationLine(line, text, where);
            return;
        }
        assertEquals("attachment", line.get("kind").asText(), where);
        JsonNode preposition = line.get("preposition");
        JsonNode object = line.get("object");
        JsonNode head = line.get("head");
        for (JsonNode span : new JsonNode[] {preposition, object, head}) {
            assertNotNull(span, where);
            int begin = span.get("begin").asInt();
            int end = span.get("end").asInt();
            assertTrue(0 <= begin && begin < end && end <= text.length(), where);
            assertEquals(text.substring(begin, end), span.get("text").asText(), where);
        }
        assertTrue(preposition.get("end").asInt() <= object.get("begin").asInt(), "the object follows its preposition: " + where);
        assertFalse(head.get("begin").asInt() == preposition.get("begin").asInt(), "a preposition is not its own head: " + where);
        double probability = line.get("probability").asDouble();
        assertTrue(probability > 0 && probability <= 1, where);
        JsonNode alternatives = line.get("alternatives");
        assertTrue(alternatives.isArray() && alternatives.size() >= 1 && alternatives.size() <= MAX_ALTERNATIVES, where);
        assertEquals(head.get("begin").asInt(), alternatives.get(0).at("/head/begin").asInt(), "chosen head ranks first: " + where);
        assertEquals(probability, alternatives.get(0).get("probability").asDouble(), 1e-9, where);
        for (int i = 1; i < alternatives.size(); i++) {
            assertTrue(alternatives.get(i).get("probability").asDouble() <= alternatives.get(i - 1).get("probability").asDouble(),
                    "alternatives ranked: " + where);
            JsonNode h = alternatives.get(i).get("head");
            assertEquals(text.substring(h.get("begin").asInt(), h.get("end").asInt()), h.get("text").asText(), where);
        }
        JsonNode evidence = line.get("evidence");
        assertTrue(evidence != null && evidence.isObject() && !evidence.get("model").asText().isEmpty(), where);
    }

    @Test
    void emptyBinaryAndNonUtf8DocumentsFailAloneOrPassAndTheRestIsWritten() throws Exception {
        Path in = Files.createDirectory(dir.resolve("logs"));
        Files.writeString(in.resolve("a-engine-room.txt"), ENGINE_ROOM, StandardCharsets.UTF_8);
        Files.writeString(in.resolve("b-empty.txt"), "", StandardCharsets.UTF_8);
        // A PNG header saved under a .txt name: NUL bytes on its second line.
        Files.write(in.resolve("c-photo.txt"), new byte[] {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n', 0, 0, 0, 13, 'I', 'H', 'D', 'R'});
        // Line 2 in ISO-8859-1: the byte of the ring-A is not valid UTF-8 there.
        Files.write(in.resolve("d-latin1.txt"), "Ordered a new impeller.\nDelivered from \u00c5rdal stores by the morning boat.\n"
                .getBytes(StandardCharsets.ISO_8859_1));
        Files.writeString(in.resolve("e-ramp.txt"), RAMP, StandardCharsets.UTF_8);
        Path out = dir.resolve("annotated");

        CommandLineRun run = CommandLineRun.of("annotate", "--in", in.toString(), "--out", out.toString());
        assertEquals(Tether.SOME_FAILED, run.exitCode(), run::toString);

        for (String good : List.of("a-engine-room.txt", "e-ramp.txt")) {
            assertTrue(Files.isRegularFile(out.resolve(good + ".xmi")), good);
            assertFalse(ledger(out.resolve(good + ".ledger.jsonl")).isEmpty(), good);
        }
        assertTrue(Files.isRegularFile(out.resolve("b-empty.txt.xmi")), "the empty document is written");
        assertEquals(List.of(), ledger(out.resolve("b-empty.txt.ledger.jsonl")), "the empty document has no decisions");

        JsonNode summary = summary(out);
        assertEquals(5, summary.get("documents").asInt(), summary::toString);
        assertEquals(3, summary.get("written").asInt(), summary::toString);
        Map<String, String> failed = new HashMap<>();
        for (JsonNode f : summary.get("failed")) failed.put(f.get("doc").asText(), f.get("reason").asText());
        assertEquals(2, failed.size(), summary::toString);
        assertTrue(failed.get("c-photo.txt").contains("binary"), failed::toString);
        assertTrue(failed.get("d-latin1.txt").contains("d-latin1.txt:2"), () -> "the reason names the line: " + failed);
        assertTrue(failed.get("d-latin1.txt").contains("UTF-8"), failed::toString);
        assertFalse(Files.exists(out.resolve("c-photo.txt.xmi")));
        assertFalse(Files.exists(out.resolve("d-latin1.txt.xmi")));
        assertTrue(run.out().contains("c-photo.txt") && run.out().contains("d-latin1.txt"), "failures shown on the terminal: " + run);
    }

    @Test
    void lineOfSixtyThousandWordsWithoutPunctuationCompletesWithBoundedOutput() throws Exception {
        String[] phrase = "the deckhand replaced the worn gasket on the bilge pump with a spare from the stores".split(" ");
        int tokens = 60_000;
        StringBuilder text = new StringBuilder(tokens * 6);
        int count = 0;
        for (int i = 0; i < tokens; i++) {
            String word = phrase[i % phrase.length];
            if (word.equals("on") || word.equals("with") || word.equals("from")) count++;
            text.append(word).append(i + 1 < tokens ? ' ' : '\n');
        }
        final int prepositions = count;
        Path in = Files.createDirectory(dir.resolve("logs"));
        Path doc = Files.writeString(in.resolve("run-on.txt"), text, StandardCharsets.UTF_8);
        Path out = dir.resolve("annotated");

        long start = System.nanoTime();
        CommandLineRun run = CommandLineRun.of("annotate", "--in", doc.toString(), "--out", out.toString(), "--threads", "1");
        // Reported, not asserted (speed belongs in benchmarks): the figure README gives for this document.
        System.out.printf("one line of %,d words annotated in %.1f s%n", tokens, (System.nanoTime() - start) / 1e9);
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        List<JsonNode> lines = ledger(out.resolve("run-on.txt.ledger.jsonl"));
        // At most one decision per preposition, each with a bounded ranking: output grows linearly with the text.
        assertFalse(lines.isEmpty());
        assertTrue(lines.size() <= prepositions, () -> lines.size() + " decisions for " + prepositions + " prepositions");
        String content = text.toString();
        for (JsonNode line : lines) {
            assertTrue(line.get("alternatives").size() <= MAX_ALTERNATIVES, line::toString);
            JsonNode p = line.get("preposition");
            assertEquals(content.substring(p.get("begin").asInt(), p.get("end").asInt()), p.get("text").asText());
        }
        assertEquals(lines.size(), summary(out).get("decisions").asInt());
    }

    @Test
    void missingInputIsAnInputErrorNamingIt() {
        Path missing = dir.resolve("no-such-logs");
        Path out = dir.resolve("annotated");
        CommandLineRun run = CommandLineRun.of("annotate", "--in", missing.toString(), "--out", out.toString());
        assertEquals(Tether.INPUT, run.exitCode(), run::toString);
        assertTrue(run.err().contains(missing.toString()), run::toString);
        assertFalse(Files.exists(out.resolve(AnnotateCommand.SUMMARY)));
    }

    @Test
    void outputThatIsAnExistingFileIsAnInputErrorNamingIt() throws Exception {
        Path in = Files.writeString(dir.resolve("engine-room.txt"), ENGINE_ROOM, StandardCharsets.UTF_8);
        Path out = Files.writeString(dir.resolve("annotated"), "a file, not a folder\n", StandardCharsets.UTF_8);
        CommandLineRun run = CommandLineRun.of("annotate", "--in", in.toString(), "--out", out.toString());
        assertEquals(Tether.INPUT, run.exitCode(), run::toString);
        assertTrue(run.err().contains(out.toString()), run::toString);
        assertEquals("a file, not a folder\n", Files.readString(out, StandardCharsets.UTF_8), "the file is left as it was");
    }

    @Test
    void badModelPathIsAnInputErrorNamingTheFile() throws Exception {
        Path in = Files.writeString(dir.resolve("engine-room.txt"), ENGINE_ROOM, StandardCharsets.UTF_8);
        Path notAModel = Files.writeString(dir.resolve("ferry.tether"), "not a model\n", StandardCharsets.UTF_8);
        Path missing = dir.resolve("missing.tether");
        for (Path model : List.of(notAModel, missing)) {
            Path out = dir.resolve("annotated-" + model.getFileName());
            CommandLineRun run = CommandLineRun.of("annotate", "--in", in.toString(), "--out", out.toString(), "--model", model.toString());
            assertEquals(Tether.INPUT, run.exitCode(), run::toString);
            assertTrue(run.err().contains(model.toString()), run::toString);
            assertFalse(Files.exists(out.resolve("engine-room.txt.xmi")), run::toString);
        }
    }

    private static List<JsonNode> ledger(Path file) throws IOException {
        assertTrue(Files.isRegularFile(file), () -> file + " missing");
        List<JsonNode> lines = new ArrayList<>();
        for (String line : Files.readAllLines(file, StandardCharsets.UTF_8)) lines.add(JSON.readTree(line));
        return lines;
    }

    private static JsonNode summary(Path out) throws IOException {
        Path file = out.resolve(AnnotateCommand.SUMMARY);
        assertTrue(Files.isRegularFile(file), () -> file + " missing");
        return JSON.readTree(file.toFile());
    }
}
