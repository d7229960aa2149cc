package dev.tether.ledger;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import dev.tether.type.AttachmentDecision;
import dev.tether.type.Conjunct;
import dev.tether.type.CoordinationDecision;
import dev.tether.type.CoordinationReading;
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
 * {"doc":…, "kind":"coordination", "coordinator":{"begin","end","text"},
 *  "conjuncts":[{"begin","end","text", "head":{…}, "class"}, …], "shared":[{…}, …], "unshared":[{…}, …],
 *  "probability":…, "margin":…, "alternatives":[{"conjuncts":[…], "shared":[…], "probability":…}, …],
 *  "evidence":{"text":…, "model":…}}
 * </pre>
 * Decisions of both kinds are written in the order of their preposition or coordinator in the text.
 * Offsets count Unicode code points of the document text (UIMA's own offsets count UTF-16 units; they differ only
 * after a character outside the Basic Multilingual Plane). Alternatives are ranked, the chosen head first. The
 * layout is format {@link #FORMAT}, which {@code run-summary.json} states as {@code ledgerFormat}.
 */
public final class LedgerWriter {
    /** Version of the ledger's layout; raise it whenever a field changes meaning or goes away. */
    public static final int FORMAT = 1;
    private static final JsonFactory JSON = new JsonFactory();

    /** The unit of the ledger's offsets, as named in run summaries. */
    public static final String OFFSET_UNIT = "unicode-code-points";

    /** Writes every decision of {@code jcas}; returns how many. */
    public int write(JCas jcas, String doc, Writer out) throws IOException {
        int n = 0;
        CodePointOffsets offsets = CodePointOffsets.of(jcas.getDocumentText() == null ? "" : jcas.getDocumentText());
        java.util.List<AttachmentDecision> attachments = new java.util.ArrayList<>(JCasUtil.select(jcas, AttachmentDecision.class));
        java.util.List<CoordinationDecision> coordinations = new java.util.ArrayList<>(JCasUtil.select(jcas, CoordinationDecision.class));
        int ci = 0;
        for (AttachmentDecision d : attachments) {
            while (ci < coordinations.size() && coordinations.get(ci).getCoordinator().getBegin() < d.getPreposition().getBegin()) {
                coordination(coordinations.get(ci++), doc, offsets, out);
                n++;
            }
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
        for (; ci < coordinations.size(); ci++) {
            coordination(coordinations.get(ci), doc, offsets, out);
            n++;
        }
        return n;
    }

    private static void coordination(CoordinationDecision d, String doc, CodePointOffsets offsets, Writer out) throws IOException {
        try (JsonGenerator g = JSON.createGenerator(out)) {
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            g.writeStartObject();
            g.writeStringField("doc", doc);
            g.writeStringField("kind", "coordination");
            span(g, "coordinator", d.getCoordinator(), offsets);
            conjuncts(g, d.getConjuncts(), offsets);
            modifiers(g, "shared", d.getSharedModifiers(), offsets);
            modifiers(g, "unshared", d.getUnsharedModifiers(), offsets);
            g.writeNumberField("probability", round(d.getProbability()));
            g.writeNumberField("margin", round(d.getMargin()));
            g.writeArrayFieldStart("alternatives");
            FSArray<?> alternatives = d.getAlternatives();
            for (int i = 0; alternatives != null && i < alternatives.size(); i++) {
                CoordinationReading r = (CoordinationReading) alternatives.get(i);
                g.writeStartObject();
                conjuncts(g, r.getConjuncts(), offsets);
                modifiers(g, "shared", r.getSharedModifiers(), offsets);
                g.writeNumberField("probability", round(r.getProbability()));
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeObjectFieldStart("evidence");
            g.writeStringField("text", d.getEvidence());
            g.writeStringField("model", d.getModelId());
            g.writeEndObject();
            g.writeEndObject();
        }
        out.write('\n');
    }

    private static void conjuncts(JsonGenerator g, FSArray<?> conjuncts, CodePointOffsets offsets) throws IOException {
        g.writeArrayFieldStart("conjuncts");
        for (int i = 0; conjuncts != null && i < conjuncts.size(); i++) {
            Conjunct c = (Conjunct) conjuncts.get(i);
            g.writeStartObject();
            spanFields(g, c, offsets);
            span(g, "head", c.getHead(), offsets);
            g.writeStringField("class", c.getWordClass());
            g.writeEndObject();
        }
        g.writeEndArray();
    }

    private static void modifiers(JsonGenerator g, String name, FSArray<?> modifiers, CodePointOffsets offsets) throws IOException {
        g.writeArrayFieldStart(name);
        for (int i = 0; modifiers != null && i < modifiers.size(); i++) {
            g.writeStartObject();
            spanFields(g, (Annotation) modifiers.get(i), offsets);
            g.writeEndObject();
        }
        g.writeEndArray();
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
