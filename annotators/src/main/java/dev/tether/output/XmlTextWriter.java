package dev.tether.output;

import java.io.IOException;
import java.io.OutputStream;
import java.util.Locale;

import org.xml.sax.Attributes;
import org.xml.sax.ContentHandler;
import org.xml.sax.Locator;
import org.xml.sax.SAXException;

/**
 * A SAX content handler that writes the events it gets as UTF-8 XML text, straight to a stream: what UIMA's XMI
 * serializer produces, without the JDK's general-purpose identity transformer in between (which checks namespaces,
 * copies attributes and encodes through several layers; it was two fifths of the time of writing an XMI file).
 *
 * <p>What it writes: the XML declaration with the version asked for; elements and attributes by their qualified
 * names, in the order given (the XMI serializer declares its namespaces as {@code xmlns:} attributes itself, so
 * prefix mappings need no output); an element with no content as an empty-element tag. Escaped so that a conforming
 * parser reads back exactly the characters given (W3C XML 1.0 and 1.1, sections 2.4, 2.11 and 3.3.3): {@code &} and
 * {@code <} always, {@code >} always, {@code "} in attribute values, carriage return always (parsers turn line ends
 * into line feeds), tab and line feed in attribute values (attribute-value normalisation turns them into spaces), and
 * in XML 1.1 the control characters, U+007F–U+009F and U+2028 as character references (1.1 forbids the first
 * literally and reads U+0085 and U+2028 as line ends). A character that no XML can carry (NUL, an unpaired surrogate,
 * U+FFFE, U+FFFF, and in XML 1.0 the C0 controls) is an error naming it; no output is then usable, as the caller's
 * temporary file is not committed.
 *
 * <p>The characters are encoded as UTF-8 here, into a buffer of its own that goes to the stream when full: a
 * {@code BufferedWriter} in front of the JDK's encoder took a lock and a bounds check for every one of the many short
 * writes of markup, and was the largest single cost of writing XMI.
 *
 * <p>For one document; not thread-safe.
 */
final class XmlTextWriter implements ContentHandler {
    private final Utf8Buffer out;
    private final boolean xml11;
    /** Whether the last start tag is still open (its {@code >} or {@code />} not yet written). */
    private boolean open;

    XmlTextWriter(OutputStream stream, boolean xml11) {
        this.out = new Utf8Buffer(stream);
        this.xml11 = xml11;
    }

    /**
     * Characters encoded as UTF-8 into a byte buffer that is written to the stream when full and on {@link #flush}. A
     * surrogate pair is encoded as its one code point; the writer has checked before that every surrogate is paired.
     */
    static final class Utf8Buffer {
        private final OutputStream stream;
        private final byte[] bytes = new byte[1 << 15];
        private int size;

        Utf8Buffer(OutputStream stream) {
            this.stream = stream;
        }

        void write(char c) throws IOException {
            if (c < 0x80) {
                if (size == bytes.length) drain();
                bytes[size++] = (byte) c;
            } else {
                write(String.valueOf(c), 0, 1);
            }
        }

        void write(String s) throws IOException {
            write(s, 0, s.length());
        }

        /** Writes the {@code length} characters of {@code s} from {@code from}. */
        void write(String s, int from, int length) throws IOException {
            int end = from + length;
            for (int i = from; i < end; i++) {
                char c = s.charAt(i);
                if (size > bytes.length - 4) drain();
                if (c < 0x80) {
                    bytes[size++] = (byte) c;
                } else if (c < 0x800) {
                    bytes[size++] = (byte) (0xC0 | c >> 6);
                    bytes[size++] = (byte) (0x80 | c & 0x3F);
                } else if (Character.isHighSurrogate(c) && i + 1 < end && Character.isLowSurrogate(s.charAt(i + 1))) {
                    int cp = Character.toCodePoint(c, s.charAt(++i));
                    bytes[size++] = (byte) (0xF0 | cp >> 18);
                    bytes[size++] = (byte) (0x80 | cp >> 12 & 0x3F);
                    bytes[size++] = (byte) (0x80 | cp >> 6 & 0x3F);
                    bytes[size++] = (byte) (0x80 | cp & 0x3F);
                } else if (Character.isSurrogate(c)) {
                    throw new IOException(String.format(Locale.ROOT, "unpaired surrogate U+%04X cannot be encoded as UTF-8", (int) c));
                } else {
                    bytes[size++] = (byte) (0xE0 | c >> 12);
                    bytes[size++] = (byte) (0x80 | c >> 6 & 0x3F);
                    bytes[size++] = (byte) (0x80 | c & 0x3F);
                }
            }
        }

        private void drain() throws IOException {
            stream.write(bytes, 0, size);
            size = 0;
        }

        void flush() throws IOException {
            drain();
            stream.flush();
        }
    }

    @Override
    public void startDocument() throws SAXException {
        write(xml11 ? "<?xml version=\"1.1\" encoding=\"UTF-8\"?>" : "<?xml version=\"1.0\" encoding=\"UTF-8\"?>");
    }

    @Override
    public void endDocument() throws SAXException {
        closeStartTag();
        try {
            out.flush();
        } catch (IOException e) {
            throw new SAXException(e);
        }
    }

    @Override
    public void startElement(String uri, String localName, String qName, Attributes atts) throws SAXException {
        closeStartTag();
        try {
            out.write('<');
            out.write(qName);
            for (int i = 0; i < atts.getLength(); i++) {
                out.write(' ');
                out.write(atts.getQName(i));
                out.write("=\"");
                escape(atts.getValue(i), true);
                out.write('"');
            }
        } catch (IOException e) {
            throw new SAXException(e);
        }
        open = true;
    }

    @Override
    public void endElement(String uri, String localName, String qName) throws SAXException {
        if (open) {
            open = false;
            write("/>");
        } else {
            write("</");
            write(qName);
            write(">");
        }
    }

    @Override
    public void characters(char[] ch, int start, int length) throws SAXException {
        closeStartTag();
        escape(new String(ch, start, length), false);
    }

    @Override
    public void ignorableWhitespace(char[] ch, int start, int length) throws SAXException {
        characters(ch, start, length);
    }

    @Override
    public void setDocumentLocator(Locator locator) {
    }

    @Override
    public void startPrefixMapping(String prefix, String uri) {
    }

    @Override
    public void endPrefixMapping(String prefix) {
    }

    @Override
    public void processingInstruction(String target, String data) throws SAXException {
        throw new SAXException("an XMI file has no processing instructions (got <?" + target + " ...?>)");
    }

    @Override
    public void skippedEntity(String name) throws SAXException {
        throw new SAXException("an XMI file has no entity references (got &" + name + ";)");
    }

    private void closeStartTag() throws SAXException {
        if (open) {
            open = false;
            write(">");
        }
    }

    private void write(String s) throws SAXException {
        try {
            out.write(s);
        } catch (IOException e) {
            throw new SAXException(e);
        }
    }

    /** Writes {@code s} escaped for an attribute value ({@code attribute}) or for element content. */
    private void escape(String s, boolean attribute) throws SAXException {
        try {
            int plain = 0;
            for (int i = 0; i < s.length(); i++) {
                char c = s.charAt(i);
                String replacement;
                if (c >= 0x20 && c < 0x7F && c != '&' && c != '<' && c != '>' && c != '"') continue;
                switch (c) {
                    case '&' -> replacement = "&amp;";
                    case '<' -> replacement = "&lt;";
                    case '>' -> replacement = "&gt;";
                    case '"' -> replacement = attribute ? "&quot;" : null;
                    case '\r' -> replacement = "&#13;";
                    case '\n' -> replacement = attribute ? "&#10;" : null;
                    case '\t' -> replacement = attribute ? "&#9;" : null;
                    default -> replacement = other(s, i, c);
                }
                if (replacement == null) continue;
                out.write(s, plain, i - plain);
                out.write(replacement);
                plain = i + 1;
            }
            out.write(s, plain, s.length() - plain);
        } catch (IOException e) {
            throw new SAXException(e);
        }
    }

    /** The reference for a character other than markup and white space, or null to write it as it is. */
    private String other(String s, int i, char c) throws SAXException {
        if (c < 0x20) {
            if (xml11 && c != 0) return reference(c);
            throw unwritable(c, i);
        }
        if (c >= 0x7F && c <= 0x9F || c == 0x2028) return xml11 ? reference(c) : null;
        if (Character.isHighSurrogate(c)) {
            if (i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) return null;
            throw unwritable(c, i);
        }
        if (Character.isLowSurrogate(c)) {
            if (i > 0 && Character.isHighSurrogate(s.charAt(i - 1))) return null;
            throw unwritable(c, i);
        }
        if (c == 0xFFFE || c == 0xFFFF) throw unwritable(c, i);
        return null;
    }

    private static String reference(char c) {
        return "&#" + (int) c + ";";
    }

    private SAXException unwritable(char c, int index) {
        return new SAXException(String.format(Locale.ROOT, "U+%04X (at UTF-16 index %d of a value) cannot be written in XML %s",
                (int) c, index, xml11 ? "1.1" : "1.0"));
    }
}
