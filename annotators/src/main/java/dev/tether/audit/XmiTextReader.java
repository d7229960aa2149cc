package dev.tether.audit;

import dev.tether.ledger.CodePointOffsets;

import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads a document's text and sentences back from the XMI that {@code tether annotate} wrote beside its ledger: the
 * {@code sofaString} of the initial view and the {@code begin}/{@code end} of every {@code dev.tether.type.Sentence}
 * in it (XMI namespace {@code http:///dev/tether/type.ecore}, as UIMA's XMI serializer names a type's package). A
 * streaming read of just those elements: building a whole CAS would cost several times as much.
 */
public final class XmiTextReader {
    private static final String TYPE_NAMESPACE = "http:///dev/tether/type.ecore";
    private static final String CAS_NAMESPACE = "http:///uima/cas.ecore";
    private static final String XMI_NAMESPACE = "http://www.omg.org/XMI";
    private static final String INITIAL_VIEW = "_InitialView";

    private final XMLInputFactory factory;

    public XmiTextReader() {
        factory = XMLInputFactory.newFactory();
        factory.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        factory.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
    }

    public DocumentText read(Path xmi) throws IOException {
        if (!Files.isRegularFile(xmi)) {
            throw new IOException("no " + xmi.getFileName() + " beside the ledger: the report needs the document text; "
                    + "re-run 'tether annotate' for this document");
        }
        String text = null;
        String sofaId = null;
        List<int[]> sentences = new ArrayList<>();
        List<String> sentenceSofas = new ArrayList<>();
        try (InputStream in = Files.newInputStream(xmi)) {
            XMLStreamReader r = factory.createXMLStreamReader(in);
            while (r.hasNext()) {
                if (r.next() != XMLStreamConstants.START_ELEMENT) continue;
                String ns = r.getNamespaceURI();
                if (CAS_NAMESPACE.equals(ns) && "Sofa".equals(r.getLocalName())
                        && INITIAL_VIEW.equals(r.getAttributeValue(null, "sofaID"))) {
                    text = r.getAttributeValue(null, "sofaString");
                    sofaId = r.getAttributeValue(XMI_NAMESPACE, "id");
                } else if (TYPE_NAMESPACE.equals(ns) && "Sentence".equals(r.getLocalName())) {
                    sentences.add(new int[] {offset(r, "begin", xmi), offset(r, "end", xmi)});
                    sentenceSofas.add(r.getAttributeValue(null, "sofa"));
                }
            }
            r.close();
        } catch (XMLStreamException e) {
            throw new IOException(xmi + " is not readable XMI (" + e.getMessage() + "); re-run 'tether annotate'", e);
        }
        if (text == null) throw new IOException(xmi + " holds no document text (no initial view); re-run 'tether annotate'");
        CodePointOffsets offsets = CodePointOffsets.of(text);
        List<int[]> inView = new ArrayList<>();
        for (int i = 0; i < sentences.size(); i++) {
            int[] s = sentences.get(i);
            if (sofaId != null && !sofaId.equals(sentenceSofas.get(i))) continue;
            if (s[0] < 0 || s[1] < s[0] || s[1] > text.length()) {
                throw new IOException(xmi + ": a sentence at " + s[0] + "-" + s[1] + " lies outside the document text");
            }
            inView.add(new int[] {offsets.codePoint(s[0]), offsets.codePoint(s[1])});
        }
        inView.sort((a, b) -> a[0] != b[0] ? Integer.compare(a[0], b[0]) : Integer.compare(a[1], b[1]));
        if (inView.isEmpty() && !text.isEmpty()) inView.add(new int[] {0, offsets.length()});
        int[] begins = new int[inView.size()];
        int[] ends = new int[inView.size()];
        for (int i = 0; i < begins.length; i++) {
            begins[i] = inView.get(i)[0];
            ends[i] = inView.get(i)[1];
        }
        return new DocumentText(offsets, begins, ends);
    }

    private static int offset(XMLStreamReader r, String name, Path xmi) throws IOException {
        String v = r.getAttributeValue(null, name);
        try {
            return Integer.parseInt(v);
        } catch (NumberFormatException e) {
            throw new IOException(xmi + ": a sentence has " + name + "='" + v + "', not a number; re-run 'tether annotate'");
        }
    }
}
