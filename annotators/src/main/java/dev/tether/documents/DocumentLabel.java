package dev.tether.documents;

import org.apache.uima.cas.CAS;
import org.apache.uima.cas.CASException;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;

import dev.tether.type.DocumentOrigin;

/**
 * How engines name the document of a CAS in warnings and errors: its {@link DocumentOrigin} name when the pipeline
 * set one ({@code document 'deck/ramp.txt'}), otherwise its length and first words.
 */
public final class DocumentLabel {
    private DocumentLabel() {
    }

    /** Records {@code name} as the origin of the document in {@code jcas}. */
    public static void set(JCas jcas, String name) {
        DocumentOrigin origin = new DocumentOrigin(jcas);
        origin.setName(name);
        origin.addToIndexes();
    }

    /** The document's name, or {@code null} when the pipeline did not set one. */
    public static String name(CAS cas) {
        try {
            JCas jcas = cas.getJCas();
            if (jcas.getTypeSystem().getType(DocumentOrigin.class.getName()) == null) return null;
            for (DocumentOrigin origin : JCasUtil.select(jcas, DocumentOrigin.class)) return origin.getName();
            return null;
        } catch (CASException | IllegalArgumentException e) {
            return null;
        }
    }

    /** A label for messages: {@code document 'name'}, or the document's length and first words. */
    public static String of(CAS cas) {
        String name = name(cas);
        if (name != null) return "document '" + name + "'";
        String text = cas.getDocumentText() == null ? "" : cas.getDocumentText();
        String start = text.strip();
        if (start.length() > 40) {
            int cut = Character.isHighSurrogate(start.charAt(39)) ? 39 : 40;
            start = start.substring(0, cut) + "...";
        }
        return "the document of " + text.length() + " characters beginning \"" + start.replaceAll("\\s+", " ") + "\"";
    }
}
