package dev.tether.evaluation;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.tether.type.AttachmentDecision;
import dev.tether.type.ScoredHead;
import org.apache.uima.UIMAFramework;
import org.apache.uima.cas.CAS;
import org.apache.uima.cas.impl.XmiCasDeserializer;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
import org.apache.uima.resource.metadata.TypeSystemDescription;
import org.apache.uima.util.CasCreationUtils;
import org.apache.uima.util.XMLInputSource;
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
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The XMI that {@code tether annotate} writes for a demo document is valid UIMA XMI (XML Metadata Interchange
 * serialization of a CAS, as the OASIS Unstructured Information Management Architecture standard, 2009, defines it):
 * it loads back into a CAS built with plain UIMA from Tether's type system descriptor on the classpath, with the
 * document text and every attachment decision intact (the same decisions that the ledger lists). The demo document
 * is invented (data/demo/README.md).
 */
class DemoXmiRoundTripTest {
    private static final Path DEMO = Path.of("data/demo/log-01-tern-hollow.txt");

    @TempDir
    Path out;

    @Test
    void annotatedDemoDocumentLoadsBackIntoACasWithItsDecisions() throws Exception {
        CommandLineEntry run = CommandLineEntry.run("annotate", "--in", DEMO.toString(), "--out", out.toString());
        assertEquals(0, run.exitCode(), run::toString);
        Path xmi = out.resolve("log-01-tern-hollow.txt.xmi");
        Path ledger = out.resolve("log-01-tern-hollow.txt.ledger.jsonl");
        assertTrue(Files.isRegularFile(xmi), run::toString);

        TypeSystemDescription types = UIMAFramework.getXMLParser().parseTypeSystemDescription(new XMLInputSource(
                DemoXmiRoundTripTest.class.getResource("/dev/tether/types/TetherTypeSystem.xml")));
        types.resolveImports();
        CAS cas = CasCreationUtils.createCas(types, null, null);
        try (InputStream in = Files.newInputStream(xmi)) {
            XmiCasDeserializer.deserialize(in, cas, false);
        }
        JCas jcas = cas.getJCas();

        String text = Files.readString(DEMO, StandardCharsets.UTF_8);
        assertEquals(text, jcas.getDocumentText());

        List<AttachmentDecision> decisions = new ArrayList<>(JCasUtil.select(jcas, AttachmentDecision.class));
        List<JsonNode> lines = new ArrayList<>();
        int coordinationLines = 0;
        ObjectMapper json = new ObjectMapper();
        for (String line : Files.readAllLines(ledger, StandardCharsets.UTF_8)) {
            JsonNode record = json.readTree(line);
            String kind = record.path("kind").asText();
            if ("attachment".equals(kind)) lines.add(record);
            else if ("coordination".equals(kind)) coordinationLines++;
            else throw new AssertionError("ledger line of unknown kind '" + kind + "': " + line);
        }
        assertEquals(coordinationLines, JCasUtil.select(jcas, dev.tether.type.CoordinationDecision.class).size(),
                "coordination decisions in the XMI vs coordination lines in the ledger");
        // Every preposition of the document heads a phrase ("for", "from", "in", "of", "after", "on", "with", ...),
        // so an empty result would mean decisions were lost on the way.
        assertFalse(decisions.isEmpty(), "no decisions in the loaded XMI");
        assertEquals(lines.size(), decisions.size(), "attachment decisions in the XMI vs attachment lines in the ledger");

        for (int i = 0; i < decisions.size(); i++) {
            AttachmentDecision d = decisions.get(i);
            JsonNode l = lines.get(i);
            assertNotNull(d.getPreposition(), "decision " + i + " lost its preposition");
            assertNotNull(d.getHead(), "decision " + i + " lost its head");
            assertEquals(l.at("/preposition/begin").asInt(), d.getPreposition().getBegin(), "decision " + i);
            assertEquals(l.at("/preposition/text").asText(), d.getPreposition().getCoveredText(), "decision " + i);
            assertEquals(l.at("/head/begin").asInt(), d.getHead().getBegin(), "decision " + i);
            assertEquals(l.at("/head/text").asText(), d.getHead().getCoveredText(), "decision " + i);
            assertEquals(l.at("/head/class").asText(), d.getSiteClass(), "decision " + i);
            assertEquals(l.get("probability").asDouble(), d.getProbability(), 1e-4, "decision " + i);
            assertEquals(l.at("/evidence/model").asText(), d.getModelId(), "decision " + i);
            assertNotNull(d.getRanking(), "decision " + i + " lost its ranking");
            assertEquals(l.get("alternatives").size(), d.getRanking().size(), "decision " + i);
            ScoredHead first = (ScoredHead) d.getRanking().get(0);
            assertEquals(d.getHead().getBegin(), first.getHead().getBegin(), "the chosen head ranks first, decision " + i);
        }
    }
}
