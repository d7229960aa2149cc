package dev.tether.ledger;

import static org.apache.uima.fit.factory.AnalysisEngineFactory.createEngine;
import static org.apache.uima.fit.factory.AnalysisEngineFactory.createEngineDescription;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;

import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.tcas.Annotation;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import dev.tether.attachment.AttachmentResolver;
import dev.tether.attachment.TaggedLogLine;
import dev.tether.candidates.AttachmentCandidateFinder;
import dev.tether.type.AttachmentDecision;
import dev.tether.type.ScoredHead;

/**
 * The JSON Lines ledger (one JSON object per line, RFC 8259 JSON) in the shape DESIGN.md gives: per decision
 * {@code doc}, {@code kind}, {@code preposition}, {@code object} and {@code head} with character offsets into the
 * document text, {@code probability}, ranked {@code alternatives} and {@code evidence}.
 */
class LedgerWriterTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static AnalysisEngine finderAndResolver;

    @BeforeAll
    static void createEngines() throws Exception {
        finderAndResolver = createEngine(createEngineDescription(
                createEngineDescription(AttachmentCandidateFinder.class), createEngineDescription(AttachmentResolver.class)));
    }

    @Test
    void oneObjectPerDecisionWithOffsetsIntoTheDocumentText() throws Exception {
        TaggedLogLine line = TaggedLogLine.of("The/DT engineer/NN replaced/VBD the/DT gasket/NN on/IN the/DT port/JJ "
                + "engine/NN with/IN a/DT spare/NN from/IN the/DT stores/NNS ./.");
        finderAndResolver.process(line.jcas);
        List<AttachmentDecision> decisions = new ArrayList<>(JCasUtil.select(line.jcas, AttachmentDecision.class));
        String text = line.jcas.getDocumentText();

        StringWriter out = new StringWriter();
        int written = new LedgerWriter().write(line.jcas, "logs/tern-hollow/2026-11-03.txt", out);

        String[] lines = out.toString().split("\n", -1);
        assertEquals("", lines[lines.length - 1], "every object ends with a newline");
        assertEquals(decisions.size(), written);
        assertEquals(decisions.size(), lines.length - 1, "one line per decision");
        assertEquals(3, written);
        for (int i = 0; i < written; i++) {
            JsonNode o = JSON.readTree(lines[i]);
            AttachmentDecision d = decisions.get(i);
            assertTrue(o.isObject(), lines[i]);
            assertTrue(fieldNames(o).containsAll(Set.of("doc", "kind", "preposition", "object", "head", "probability",
                    "alternatives", "evidence")), "keys of " + lines[i]);
            assertEquals("logs/tern-hollow/2026-11-03.txt", o.get("doc").asText());
            assertEquals("attachment", o.get("kind").asText());
            assertSpan(text, o.get("preposition"), d.getPreposition());
            assertSpan(text, o.get("object"), d.getObject());
            assertSpan(text, o.get("head"), d.getHead());
            assertEquals(d.getSiteClass(), o.get("head").get("class").asText());
            double probability = o.get("probability").asDouble();
            assertEquals(d.getProbability(), probability, 1e-4);
            assertTrue(probability > 0 && probability <= 1, lines[i]);

            JsonNode alternatives = o.get("alternatives");
            assertTrue(alternatives.isArray() && alternatives.size() == d.getRanking().size(), lines[i]);
            assertEquals(o.get("head").get("begin").asInt(), alternatives.get(0).get("head").get("begin").asInt(),
                    "the chosen head ranks first");
            for (int r = 0; r < alternatives.size(); r++) {
                JsonNode alternative = alternatives.get(r);
                ScoredHead scored = d.getRanking().get(r);
                assertSpan(text, alternative.get("head"), scored.getHead());
                assertEquals(scored.getSiteClass(), alternative.get("class").asText());
                if (r > 0) {
                    assertTrue(alternatives.get(r - 1).get("probability").asDouble() >= alternative.get("probability").asDouble(),
                            "ranked by probability: " + lines[i]);
                }
            }

            JsonNode evidence = o.get("evidence");
            assertTrue(evidence.isObject(), lines[i]);
            for (String key : List.of("level", "counts", "text", "model")) {
                assertFalse(evidence.path(key).asText().isBlank(), "evidence." + key + " in " + lines[i]);
            }
            assertEquals(d.getEvidence(), evidence.get("text").asText());
            assertEquals(d.getModelId(), evidence.get("model").asText());
        }
    }

    @Test
    void aDocumentNameThatNeedsEscapingStaysValidJson() throws Exception {
        TaggedLogLine line = TaggedLogLine.of("The/DT crew/NN checked/VBD the/DT level/NN of/IN the/DT oil/NN ./.");
        finderAndResolver.process(line.jcas);
        String doc = "logs/\"Corrie Bell\"\\deck\tlog.txt";

        StringWriter out = new StringWriter();
        int written = new LedgerWriter().write(line.jcas, doc, out);

        assertEquals(1, written);
        assertEquals(1, out.toString().lines().count(), "still one line: control characters are escaped");
        assertEquals(doc, JSON.readTree(out.toString()).get("doc").asText());
    }

    @Test
    void aDocumentWithoutDecisionsWritesNothing() throws Exception {
        TaggedLogLine line = TaggedLogLine.of("Engines/NNS started/VBD ./.");
        finderAndResolver.process(line.jcas);

        StringWriter out = new StringWriter();
        assertEquals(0, new LedgerWriter().write(line.jcas, "logs/short.txt", out));
        assertEquals("", out.toString());
    }

    /** {@code begin}/{@code end} index the document text and give the token's text; {@code text} repeats it. */
    private static void assertSpan(String text, JsonNode span, Annotation token) {
        int begin = span.get("begin").asInt();
        int end = span.get("end").asInt();
        assertEquals(token.getBegin(), begin);
        assertEquals(token.getEnd(), end);
        assertEquals(token.getCoveredText(), text.substring(begin, end));
        assertEquals(text.substring(begin, end), span.get("text").asText());
    }

    private static Set<String> fieldNames(JsonNode o) {
        Set<String> names = new TreeSet<>();
        o.fieldNames().forEachRemaining(names::add);
        return names;
    }
}
