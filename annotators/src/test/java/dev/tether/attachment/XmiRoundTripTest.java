package dev.tether.attachment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.cas.impl.XmiCasDeserializer;
import org.apache.uima.cas.impl.XmiCasSerializer;
import org.apache.uima.fit.factory.JCasFactory;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
import org.apache.uima.jcas.tcas.Annotation;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.xml.sax.SAXException;

import dev.tether.pipeline.TetherPipeline;
import dev.tether.type.AttachmentDecision;
import dev.tether.type.ScoredHead;
import dev.tether.type.Token;

/**
 * The decisions written as XMI (UIMA XMI, OASIS standard) load back, strictly (unknown types are an error), into a
 * fresh CAS built from Tether's type system, and every decision feature survives: the same tokens at the same offsets, the same ranking, probabilities and evidence.
 * No byte-level golden file: the comparison is feature by feature against the CAS that was written, so it checks
 * the serialization and stays valid when the model is retrained.
 */
class XmiRoundTripTest {
    /** An invented maintenance-log entry of the fictional ferry operator. */
    static final String LOG_ENTRY = "The engineer replaced the gasket on the port engine with a spare from the stores. "
            + "The mate logged a leak in the forward ballast tank of the Tern Hollow after the crossing.";

    private static JCas written;
    private static byte[] xmi;

    @BeforeAll
    static void annotateAndSerialize() throws Exception {
        AnalysisEngine pipeline = TetherPipeline.createForRawText("default");
        written = JCasFactory.createJCas();
        written.setDocumentText(LOG_ENTRY);
        written.setDocumentLanguage("en");
        pipeline.process(written);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        XmiCasSerializer.serialize(written.getCas(), out);
        xmi = out.toByteArray();
    }

    @Test
    void decisionsSurviveWithIdenticalOffsetsAndFeatures() throws Exception {
        JCas loaded = JCasFactory.createJCas();
        XmiCasDeserializer.deserialize(new ByteArrayInputStream(xmi), loaded.getCas(), false);

        assertEquals(written.getDocumentText(), loaded.getDocumentText());
        assertEquals(offsets(JCasUtil.select(written, Token.class)), offsets(JCasUtil.select(loaded, Token.class)));
        List<AttachmentDecision> before = new ArrayList<>(JCasUtil.select(written, AttachmentDecision.class));
        List<AttachmentDecision> after = new ArrayList<>(JCasUtil.select(loaded, AttachmentDecision.class));
        assertTrue(before.size() >= 4, "the entry has at least on, with, from, in, of: " + before.size() + " decisions");
        assertEquals(before.size(), after.size());
        for (int i = 0; i < before.size(); i++) {
            AttachmentDecision b = before.get(i);
            AttachmentDecision a = after.get(i);
            DecisionChecks.assertSane(a);
            assertEquals(describe(b), describe(a), "decision " + i + " after the round trip");
            assertTrue(JCasUtil.selectAt(loaded, Token.class, a.getHead().getBegin(), a.getHead().getEnd()).contains(a.getHead()),
                    "the head still points at an indexed token of the loaded CAS");
        }
    }

    @Test
    void theXmiIsRefusedByACasWithoutTetherTypes() throws Exception {
        var bare = org.apache.uima.util.CasCreationUtils.createCas(
                org.apache.uima.UIMAFramework.getResourceSpecifierFactory().createTypeSystemDescription(), null, null);
        assertThrows(SAXException.class,
                () -> XmiCasDeserializer.deserialize(new ByteArrayInputStream(xmi), bare, false),
                "strict loading checks the types against the type system");
        String text = new String(xmi, StandardCharsets.UTF_8);
        assertTrue(text.contains("xmlns:xmi=\"http://www.omg.org/XMI\""), "an XMI document");
    }

    /** Every feature of a decision, with tokens as offsets and text, in a form that compares with equals. */
    private static String describe(AttachmentDecision d) {
        StringBuilder s = new StringBuilder();
        s.append(span(d)).append(" p=").append(span(d.getPreposition())).append(" o=").append(span(d.getObject()))
                .append(" h=").append(span(d.getHead())).append(' ').append(d.getSiteClass())
                .append(" prob=").append(d.getProbability()).append(" margin=").append(d.getMargin()).append(" [");
        for (ScoredHead r : d.getRanking()) {
            s.append(span(r.getHead())).append(' ').append(r.getSiteClass()).append(' ').append(r.getProbability()).append("; ");
        }
        return s.append("] ").append(d.getEvidenceLevel()).append(' ').append(d.getEvidenceCounts()).append(' ')
                .append(d.getEvidence()).append(' ').append(d.getModelId()).toString();
    }

    private static String span(Annotation a) {
        return a.getBegin() + ".." + a.getEnd() + "'" + a.getCoveredText() + "'";
    }

    private static List<String> offsets(Iterable<? extends Annotation> annotations) {
        List<String> spans = new ArrayList<>();
        for (Annotation a : annotations) spans.add(span(a));
        return spans;
    }
}
