package dev.tether.treebank;

import java.io.BufferedInputStream;
import java.io.BufferedReader;
import java.io.Closeable;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.GZIPInputStream;
import java.util.zip.ZipException;

/**
 * Streams the sentences of a CoNLL-U file (an open standard: https://universaldependencies.org/format.html), plain or
 * gzip-compressed. Comments are read for {@code # text =}; multiword token lines ({@code 3-4}) give the surface span
 * of their words; empty nodes ({@code 5.1}) belong to the enhanced graph and are skipped. Character offsets of every
 * word are found by aligning the forms to the sentence text; a sentence without {@code # text} gets its text rebuilt
 * from the forms and {@code SpaceAfter=No}. A line that breaks the format fails with a {@link ConlluFormatException}
 * naming the file, the line and what is wrong.
 */
public final class ConlluReader implements Closeable {
    private static final int COLUMNS = 10;

    private final BufferedReader in;
    private final String name;
    private int lineNumber;
    private boolean finished;

    /** Reads from {@code reader}; {@code name} is how messages name the source. */
    public ConlluReader(Reader reader, String name) {
        this.in = reader instanceof BufferedReader ? (BufferedReader) reader : new BufferedReader(reader);
        this.name = name;
    }

    /** Opens a file, decompressing it when it starts with the gzip signature. Input must be UTF-8. */
    public static ConlluReader open(Path file) throws IOException {
        InputStream raw = new BufferedInputStream(Files.newInputStream(file), 1 << 16);
        try {
            raw.mark(2);
            int b0 = raw.read(), b1 = raw.read();
            raw.reset();
            InputStream body = b0 == 0x1f && b1 == 0x8b ? gunzip(raw, file.toString()) : raw;
            CharsetDecoder utf8 = StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
            return new ConlluReader(new InputStreamReader(body, utf8), file.toString());
        } catch (IOException e) {
            raw.close();
            throw e;
        }
    }

    private static InputStream gunzip(InputStream raw, String name) throws IOException {
        try {
            return new GZIPInputStream(raw, 1 << 16);
        } catch (ZipException | EOFException e) {
            throw new ConlluFormatException(name, 1, "starts like a gzip file, but its gzip header is damaged or cut "
                    + "short; compress the file again with gzip, or give it uncompressed");
        }
    }

    /** Every sentence of a file. */
    public static List<TreebankSentence> readAll(Path file) throws IOException {
        List<TreebankSentence> all = new ArrayList<>();
        try (ConlluReader r = open(file)) {
            for (TreebankSentence s = r.next(); s != null; s = r.next()) all.add(s);
        }
        return all;
    }

    /** The next sentence, or {@code null} at the end of the input. */
    public TreebankSentence next() throws IOException {
        if (finished) return null;
        SentenceBuilder b = new SentenceBuilder();
        String line;
        while (true) {
            line = readLine();
            if (line == null) {
                finished = true;
                return b.isEmpty() ? null : b.build();
            }
            if (line.isBlank()) {
                if (!b.isEmpty()) return b.build();
                if (b.hasComments) throw error(lineNumber, "a blank line after comments and before any word line; "
                        + "every sentence needs word lines, so remove the comments or add the words");
                continue;
            }
            if (line.charAt(0) == '#') {
                if (b.wordCount() > 0 || b.surfaceCount() > 0) {
                    throw error(lineNumber, "a comment after word lines; comments go before the words of a sentence "
                            + "(a blank line must end the previous sentence)");
                }
                b.comment(line);
                continue;
            }
            b.wordLine(line, lineNumber);
        }
    }

    private String readLine() throws IOException {
        try {
            String line = in.readLine();
            if (line != null) lineNumber++;
            return line;
        } catch (java.nio.charset.CharacterCodingException e) {
            throw error(lineNumber + 1, "not valid UTF-8; CoNLL-U files must be UTF-8 encoded");
        } catch (ZipException | EOFException e) {
            // Only the gzip stream throws these: its data is corrupt or cut short.
            throw error(lineNumber + 1, "the gzip-compressed data is damaged or cut short here (" + e.getMessage()
                    + "); compress the file again with gzip, or give it uncompressed");
        }
    }

    private ConlluFormatException error(int line, String problem) {
        return new ConlluFormatException(name, line, problem);
    }

    @Override public void close() throws IOException {
        in.close();
    }

    /** Collects the lines of one sentence. */
    private final class SentenceBuilder {
        boolean hasComments;
        String text;
        int firstLine = -1;
        final List<String> forms = new ArrayList<>();
        final List<String> upos = new ArrayList<>();
        final List<String> xpos = new ArrayList<>();
        final List<String> relations = new ArrayList<>();
        final List<String> enhanced = new ArrayList<>();
        final IntList heads = new IntList();
        final IntList lines = new IntList();
        // Surface tokens: a multiword token or a word outside any range.
        final List<String> surfaceForms = new ArrayList<>();
        final IntList surfaceFirst = new IntList();
        final IntList surfaceLast = new IntList();
        final IntList surfaceLines = new IntList();
        final List<Boolean> spaceAfter = new ArrayList<>();
        int rangeEnd = 0;

        boolean isEmpty() { return forms.isEmpty() && surfaceForms.isEmpty(); }
        int wordCount() { return forms.size(); }
        int surfaceCount() { return surfaceForms.size(); }

        void comment(String line) {
            hasComments = true;
            if (firstLine < 0) firstLine = lineNumber;
            String body = line.substring(1).trim();
            if (body.startsWith("text") && body.substring(4).trim().startsWith("=")) {
                int eq = line.indexOf('=');
                String value = line.substring(eq + 1);
                text = value.startsWith(" ") ? value.substring(1) : value;
            }
        }

        void wordLine(String line, int at) throws ConlluFormatException {
            if (firstLine < 0) firstLine = at;
            String[] c = line.split("\t", -1);
            if (c.length != COLUMNS) {
                throw error(at, "expected " + COLUMNS + " tab-separated columns, found " + c.length
                        + "; separate the columns with single tabs and write _ for an empty field");
            }
            String id = c[0];
            int dash = id.indexOf('-');
            int dot = id.indexOf('.');
            int expected = forms.size() + 1;
            if (dash > 0) {
                int from = parseId(id.substring(0, dash), at, id);
                int to = parseId(id.substring(dash + 1), at, id);
                if (from != expected || to <= from) {
                    throw error(at, "multiword token range " + id + " should start at word " + expected
                            + " and cover at least two words");
                }
                if (from <= rangeEnd) {
                    throw error(at, "multiword token range " + id + " overlaps the range before it, which ends at word "
                            + rangeEnd + "; list the words of a range before the next range");
                }
                addSurface(c[1], from - 1, to - 1, at, c[9]);
                rangeEnd = to;
                return;
            }
            if (dot > 0) {
                parseId(id.substring(0, dot), at, id);
                parseId(id.substring(dot + 1), at, id);
                return;
            }
            int word = parseId(id, at, id);
            if (word != expected) {
                throw error(at, "word id " + id + " where " + expected + " was expected; number the words 1, 2, 3, ... "
                        + "in each sentence");
            }
            if (c[1].isEmpty()) throw error(at, "empty form in column 2; write the word form");
            int head;
            try {
                head = Integer.parseInt(c[6]);
            } catch (NumberFormatException e) {
                throw error(at, "head '" + c[6] + "' in column 7 is not a number; write the id of the head word, "
                        + "0 for the root");
            }
            if (head < 0) throw error(at, "negative head " + head + " in column 7");
            forms.add(c[1]);
            upos.add(c[3]);
            xpos.add(c[4]);
            heads.add(head - 1);
            relations.add(c[7]);
            enhanced.add(c[8].isEmpty() ? "_" : c[8]);
            lines.add(at);
            if (word > rangeEnd) addSurface(c[1], word - 1, word - 1, at, c[9]);
        }

        private void addSurface(String form, int first, int last, int at, String misc) {
            surfaceForms.add(form);
            surfaceFirst.add(first);
            surfaceLast.add(last);
            surfaceLines.add(at);
            spaceAfter.add(!misc.contains("SpaceAfter=No"));
        }

        private int parseId(String s, int at, String whole) throws ConlluFormatException {
            try {
                int v = Integer.parseInt(s);
                if (v < 0) throw new NumberFormatException();
                return v;
            } catch (NumberFormatException e) {
                throw error(at, "word id '" + whole + "' in column 1 is not a number, a range like 3-4 or an empty "
                        + "node like 5.1");
            }
        }

        TreebankSentence build() throws ConlluFormatException {
            int n = forms.size();
            if (n == 0) throw error(firstLine, "a sentence without word lines");
            if (rangeEnd > n) {
                throw error(surfaceLines.get(surfaceLines.size() - 1), "multiword token range ends at word " + rangeEnd
                        + " but the sentence has " + n + " words");
            }
            for (int i = 0; i < n; i++) {
                if (heads.get(i) >= n) {
                    throw error(lines.get(i), "head " + (heads.get(i) + 1) + " in column 7 is beyond the last word ("
                            + n + ") of the sentence");
                }
            }
            String sentenceText = text != null ? text : rebuildText();
            int[] begins = new int[n];
            int[] ends = new int[n];
            align(sentenceText, begins, ends);
            return new TreebankSentence(name, sentenceText, forms.toArray(new String[0]), upos.toArray(new String[0]),
                    xpos.toArray(new String[0]), heads.toArray(), relations.toArray(new String[0]), begins, ends,
                    lines.toArray(), enhanced.toArray(new String[0]));
        }

        private String rebuildText() {
            StringBuilder sb = new StringBuilder();
            for (int t = 0; t < surfaceForms.size(); t++) {
                sb.append(surfaceForms.get(t));
                if (spaceAfter.get(t) && t + 1 < surfaceForms.size()) sb.append(' ');
            }
            return sb.toString();
        }

        /** Finds each surface token in the text, left to right; its words share its span. */
        private void align(String s, int[] begins, int[] ends) throws ConlluFormatException {
            int cursor = 0;
            for (int t = 0; t < surfaceForms.size(); t++) {
                String form = surfaceForms.get(t);
                while (cursor < s.length() && Character.isWhitespace(s.charAt(cursor))) cursor++;
                int begin = cursor;
                int end = matchAt(s, cursor, form);
                if (end < 0) {
                    begin = s.indexOf(form, cursor);
                    if (begin < 0) {
                        throw error(surfaceLines.get(t), "form '" + form + "' not found in the # text after character "
                                + cursor + "; the text and the forms of the sentence disagree");
                    }
                    end = begin + form.length();
                }
                for (int w = surfaceFirst.get(t); w <= surfaceLast.get(t); w++) {
                    begins[w] = begin;
                    ends[w] = end;
                }
                cursor = end;
            }
        }

        /** End of {@code form} matched at {@code at} (a space inside a form matches any run of spaces), or -1. */
        private int matchAt(String s, int at, String form) {
            int i = at;
            for (int f = 0; f < form.length(); f++) {
                char fc = form.charAt(f);
                if (Character.isWhitespace(fc)) {
                    if (i >= s.length() || !Character.isWhitespace(s.charAt(i))) return -1;
                    while (i < s.length() && Character.isWhitespace(s.charAt(i))) i++;
                    while (f + 1 < form.length() && Character.isWhitespace(form.charAt(f + 1))) f++;
                    continue;
                }
                if (i >= s.length() || s.charAt(i) != fc) return -1;
                i++;
            }
            return i;
        }
    }

    /** A growable array of ints. */
    private static final class IntList {
        private int[] values = new int[32];
        private int size;

        void add(int v) {
            if (size == values.length) values = java.util.Arrays.copyOf(values, size * 2);
            values[size++] = v;
        }
        int get(int i) { return values[i]; }
        int size() { return size; }
        int[] toArray() { return java.util.Arrays.copyOf(values, size); }
    }
}
