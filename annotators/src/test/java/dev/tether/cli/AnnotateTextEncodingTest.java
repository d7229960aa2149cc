package dev.tether.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.tether.type.AttachmentDecision;
import dev.tether.type.Token;
import org.apache.uima.cas.impl.XmiCasDeserializer;
import org.apache.uima.fit.factory.JCasFactory;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
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
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Any valid Unicode text annotates (issue 7). Ledger offsets count Unicode code points (RFC 8259 JSON strings index
 * by code point in most readers; Python's str does), XMI keeps UIMA's UTF-16 offsets, a byte-order mark is not part
 * of the text (Unicode 15, section 23.8: U+FEFF at the start of a UTF-8 stream is a signature, not content), and
 * control characters that XML 1.0 forbids are written as XML 1.1 (W3C XML 1.1, section 2.2).
 */
class AnnotateTextEncodingTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    /** Invented log lines with an emoji and mathematical italic letters (U+1D458, U+1D454), both outside the BMP. */
    private static final String ASTRAL = "Replaced the gasket on the pump with a spare \uD83D\uDD27 from the stores.\n"
            + "Used 3 litres per \uD835\uDC58\uD835\uDC54 of oil in the gearbox of the Tern Hollow.\n";

    @TempDir
    Path dir;

    private Path annotate(String name, byte[] content) throws Exception {
        Path in = Files.createDirectories(dir.resolve("in"));
        Files.write(in.resolve(name), content);
        Path out = dir.resolve("out");
        CommandLineRun run = CommandLineRun.of("annotate", "--in", in.toString(), "--out", out.toString());
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        return out;
    }

    /** The ledger's spans, checked against {@code text} indexed by code point. */
    private static List<JsonNode> checkCodePointSpans(Path ledger, String text) throws Exception {
        int[] codePoints = text.codePoints().toArray();
        List<JsonNode> lines = new ArrayList<>();
        for (String line : Files.readAllLines(ledger, StandardCharsets.UTF_8)) {
            JsonNode d = JSON.readTree(line);
            for (String span : List.of("preposition", "object", "head")) {
                int begin = d.at("/" + span + "/begin").asInt();
                int end = d.at("/" + span + "/end").asInt();
                assertEquals(new String(codePoints, begin, end - begin), d.at("/" + span + "/text").asText(), line);
            }
            lines.add(d);
        }
        return lines;
    }

    @Test
    void textOutsideTheBasicPlaneAnnotatesWithCodePointOffsetsInTheLedgerAndUtf16InTheXmi() throws Exception {
        Path out = annotate("astral.txt", ASTRAL.getBytes(StandardCharsets.UTF_8));
        List<JsonNode> lines = checkCodePointSpans(out.resolve("astral.txt.ledger.jsonl"), ASTRAL);
        assertTrue(lines.size() >= 4, lines::toString);
        JsonNode from = lines.stream().filter(l -> l.at("/preposition/text").asText().equals("from")).findFirst().orElseThrow();
        // Worked by hand: 47 code points precede "from", 48 UTF-16 units (the emoji is one code point, two units).
        assertEquals(47, from.at("/preposition/begin").asInt());
        assertEquals(48, ASTRAL.indexOf("from"));

        JCas cas = JCasFactory.createJCas();
        try (InputStream xmi = Files.newInputStream(out.resolve("astral.txt.xmi"))) {
            XmiCasDeserializer.deserialize(xmi, cas.getCas());
        }
        assertEquals(ASTRAL, cas.getDocumentText());
        for (Token t : JCasUtil.select(cas, Token.class)) {
            assertFalse(Character.isLowSurrogate(ASTRAL.charAt(t.getBegin())), "no token starts inside a character: " + t);
            assertFalse(Character.isHighSurrogate(ASTRAL.charAt(t.getEnd() - 1)), "no token ends inside a character: " + t);
        }
        AttachmentDecision d = JCasUtil.select(cas, AttachmentDecision.class).stream()
                .filter(x -> x.getPreposition().getCoveredText().equals("from")).findFirst().orElseThrow();
        assertEquals(ASTRAL.indexOf("from"), d.getPreposition().getBegin(), "XMI offsets are UTF-16 units");
        JsonNode summary = JSON.readTree(out.resolve(AnnotateCommand.SUMMARY).toFile());
        assertEquals("unicode-code-points", summary.at("/offsets/ledger").asText());
        assertEquals(ASTRAL.codePointCount(0, ASTRAL.length()), summary.get("characters").asInt());
    }

    @Test
    void byteOrderMarkIsNotPartOfTheTextAndOffsetsMatchTheTextAReaderGets() throws Exception {
        String text = "Replaced the gasket on the pump with a spare from the stores.\n";
        byte[] body = text.getBytes(StandardCharsets.UTF_8);
        byte[] withMark = new byte[body.length + 3];
        withMark[0] = (byte) 0xEF;
        withMark[1] = (byte) 0xBB;
        withMark[2] = (byte) 0xBF;
        System.arraycopy(body, 0, withMark, 3, body.length);
        Path out = annotate("marked.txt", withMark);
        // A reader that drops the signature (Python's "utf-8-sig", Java's readers after stripping U+FEFF) gets `text`.
        List<JsonNode> lines = checkCodePointSpans(out.resolve("marked.txt.ledger.jsonl"), text);
        assertEquals(3, lines.size(), lines::toString);
        assertEquals(text.indexOf("on"), lines.get(0).at("/preposition/begin").asInt());
        assertFalse(Files.readString(out.resolve("marked.txt.xmi")).contains("\uFEFF"));
    }

    @Test
    void controlCharactersThatXml10ForbidsAreWrittenAsXml11AndLoadBack() throws Exception {
        String text = "Replaced the gasket on the pump with a spare.\f\nPage 2: logged the repair in the deck book.\u000B\n";
        Path out = annotate("paged.txt", text.getBytes(StandardCharsets.UTF_8));
        String xmi = Files.readString(out.resolve("paged.txt.xmi"), StandardCharsets.UTF_8);
        assertTrue(xmi.startsWith("<?xml version=\"1.1\""), xmi.substring(0, 60));
        JCas cas = JCasFactory.createJCas();
        try (InputStream in = Files.newInputStream(out.resolve("paged.txt.xmi"))) {
            XmiCasDeserializer.deserialize(in, cas.getCas());
        }
        assertEquals(text, cas.getDocumentText());
        checkCodePointSpans(out.resolve("paged.txt.ledger.jsonl"), text);
        Path plain = dir.resolve("plain");
        Files.createDirectories(plain);
        Files.writeString(plain.resolve("p.txt"), "Logged the repair in the deck book.\n");
        CommandLineRun run = CommandLineRun.of("annotate", "--in", plain.toString(), "--out", dir.resolve("out2").toString());
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        assertTrue(Files.readString(dir.resolve("out2/p.txt.xmi")).startsWith("<?xml version=\"1.0\""), "XML 1.0 otherwise");
    }

    @Test
    void noncharacterThatNoXmlCanCarryFailsTheDocumentNamingFileAndLine() throws Exception {
        Path in = Files.createDirectories(dir.resolve("in"));
        Files.writeString(in.resolve("odd.txt"), "Checked the pump.\nLogged \uFFFF in the book.\n", StandardCharsets.UTF_8);
        Path out = dir.resolve("out");
        CommandLineRun run = CommandLineRun.of("annotate", "--in", in.toString(), "--out", out.toString());
        assertEquals(Tether.SOME_FAILED, run.exitCode(), run::toString);
        assertTrue(run.out().contains("odd.txt:2") && run.out().contains("U+FFFF"), run::toString);
        assertFalse(Files.exists(out.resolve("odd.txt.xmi")));
    }
}
