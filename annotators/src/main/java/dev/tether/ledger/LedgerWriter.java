package dev.tether.ledger;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import dev.tether.type.AttachmentDecision;
import dev.tether.type.ScoredHead;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
import org.apache.uima.jcas.cas.FSArray;
import org.apache.uima.jcas.tcas.Annotation;

import java.io.IOException;
import java.io.Writer;

/**
 * Writes a document's decisions as JSON Lines, one object per decision, in document order:
 * <pre>
 * {"doc":…, "kind":"attachment", "preposition":{"begin","end","text"}, "object":{…}, "head":{…, "class"},
 *  "probability":…, "margin":…, "alternatives":[{"head":{…}, "class":…, "probability":…}, …],
 *  "evidence":{"level":…, "counts":"hits/trials", "text":…, "model":…}}
 * </pre>
 * Offsets {@code begin} and {@code end} count Unicode code points from the start of the document text (a character
 * outside the Basic Multilingual Plane counts once, as in Python or JSON tools; UIMA's own offsets, kept in the XMI,
 * count UTF-16 code units and count it twice). Alternatives are ranked, the chosen head first.
 */
public final class LedgerWriter {
    private static final JsonFactory JSON = new JsonFactory();

    /** The unit of the ledger's offsets, as named in run summaries. */
    public static final String OFFSET_UNIT = "unicode-code-points";

    /** Writes every decision of {@code jcas}; returns how many. */
    public int write(JCas jcas, String doc, Writer out) throws IOException {
        int n = 0;
        CodePointOffsets offsets = CodePointOffsets.of(jcas.getDocumentText());
        for (AttachmentDecision d : JCasUtil.select(jcas, AttachmentDecision.class)) {
            try (JsonGenerator g = JSON.createGenerator(out)) {
                g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
                g.writeStartObject();
                g.writeStringField("doc", doc);
                g.writeStringField("kind", "attachment");
                span(g, "preposition", d.getPreposition(), offsets);
                span(g, "object", d.getObject(), offsets);
                g.writeFieldName("head");
                g.writeStartObject();
                spanFields(g, d.getHead(), offsets);
                g.writeStringField("class", d.getSiteClass());
                g.writeEndObject();
                g.writeNumberField("probability", round(d.getProbability()));
                g.writeNumberField("margin", round(d.getMargin()));
                g.writeArrayFieldStart("alternatives");
                FSArray<?> ranking = d.getRanking();
                for (int i = 0; ranking != null && i < ranking.size(); i++) {
                    ScoredHead s = (ScoredHead) ranking.get(i);
                    g.writeStartObject();
                    span(g, "head", s.getHead(), offsets);
                    g.writeStringField("class", s.getSiteClass());
                    g.writeNumberField("probability", round(s.getProbability()));
                    g.writeEndObject();
                }
                g.writeEndArray();
                g.writeObjectFieldStart("evidence");
                g.writeStringField("level", d.getEvidenceLevel());
                g.writeStringField("counts", d.getEvidenceCounts());
                g.writeStringField("text", d.getEvidence());
                g.writeStringField("model", d.getModelId());
                g.writeEndObject();
                g.writeEndObject();
            }
            out.write('\n');
            n++;
        }
        return n;
    }

    private static double round(double x) {
        return Math.round(x * 1e4) / 1e4;
    }

    private static void span(JsonGenerator g, String name, Annotation a, CodePointOffsets offsets) throws IOException {
        g.writeFieldName(name);
        g.writeStartObject();
        spanFields(g, a, offsets);
        g.writeEndObject();
    }

    private static void spanFields(JsonGenerator g, Annotation a, CodePointOffsets offsets) throws IOException {
        if (a == null) return;
        g.writeNumberField("begin", offsets.codePoint(a.getBegin()));
        g.writeNumberField("end", offsets.codePoint(a.getEnd()));
        g.writeStringField("text", a.getCoveredText());
    }
}
