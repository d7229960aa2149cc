package dev.tether.treebank;

import java.util.Arrays;

/**
 * One sentence of a dependency treebank: its raw text and, for every syntactic word, the form, universal and
 * language-specific part of speech, head (0-based, -1 for the root), relation, character span {@code [begin,end)}
 * in the text, and the line of the file it was read from. Words of one multiword token ("don't" = "do" + "n't")
 * share the token's span. Immutable.
 */
public final class TreebankSentence {
    private final String source;
    private final String text;
    private final String[] forms;
    private final String[] upos;
    private final String[] xpos;
    private final int[] heads;
    private final String[] relations;
    private final int[] begins;
    private final int[] ends;
    private final int[] lines;
    private final String[] enhanced;

    /**
     * @param source    the file the sentence came from, as named in messages
     * @param text      the raw text of the sentence
     * @param heads     0-based head of each word, -1 for the root
     * @param begins    start offset of each word in {@code text}
     * @param ends      end offset (exclusive) of each word in {@code text}
     * @param lines     1-based line of each word in the source file
     */
    public TreebankSentence(String source, String text, String[] forms, String[] upos, String[] xpos, int[] heads,
                            String[] relations, int[] begins, int[] ends, int[] lines) {
        this(source, text, forms, upos, xpos, heads, relations, begins, ends, lines, null);
    }

    /**
     * As above, with the enhanced graph: column 9 (DEPS) of each word as written ({@code 4:nsubj|7:conj:and}, or
     * {@code _}); {@code null} when the source has none.
     */
    public TreebankSentence(String source, String text, String[] forms, String[] upos, String[] xpos, int[] heads,
                            String[] relations, int[] begins, int[] ends, int[] lines, String[] enhanced) {
        int n = forms.length;
        if (enhanced != null && enhanced.length != n) {
            throw new IllegalArgumentException(source + ": the enhanced graph has " + enhanced.length + " entries for " + n + " words");
        }
        if (upos.length != n || xpos.length != n || heads.length != n || relations.length != n || begins.length != n
                || ends.length != n || lines.length != n) {
            throw new IllegalArgumentException(source + ": the columns of a sentence differ in length");
        }
        for (int i = 0; i < n; i++) {
            if (heads[i] < -1 || heads[i] >= n) {
                throw new IllegalArgumentException(source + ":" + lines[i] + ": head " + heads[i] + " outside the sentence");
            }
            if (begins[i] < 0 || ends[i] < begins[i] || ends[i] > text.length()) {
                throw new IllegalArgumentException(source + ":" + lines[i] + ": span [" + begins[i] + "," + ends[i]
                        + ") outside the text of " + text.length() + " characters");
            }
        }
        this.source = source;
        this.text = text;
        this.forms = forms.clone();
        this.upos = upos.clone();
        this.xpos = xpos.clone();
        this.heads = heads.clone();
        this.relations = relations.clone();
        this.begins = begins.clone();
        this.ends = ends.clone();
        this.lines = lines.clone();
        this.enhanced = enhanced == null ? null : enhanced.clone();
    }

    public String source() { return source; }
    public String text() { return text; }
    /** Number of syntactic words (multiword tokens count by their words; empty nodes are not words). */
    public int size() { return forms.length; }
    public String form(int i) { return forms[i]; }
    public String upos(int i) { return upos[i]; }
    public String xpos(int i) { return xpos[i]; }
    /** 0-based head of word {@code i}, -1 for the root. */
    public int head(int i) { return heads[i]; }
    public String relation(int i) { return relations[i]; }
    public int begin(int i) { return begins[i]; }
    public int end(int i) { return ends[i]; }
    /** 1-based line of word {@code i} in the source file. */
    public int line(int i) { return lines[i]; }
    /** Whether the sentence carries an enhanced graph (column 9 of CoNLL-U). */
    public boolean hasEnhancedGraph() { return enhanced != null; }

    /**
     * Whether the enhanced graph (column 9) makes word {@code head} (0-based) a head of word {@code i}, with a relation
     * whose universal part (before the first colon) is {@code relation}, or with any relation when {@code relation}
     * is {@code null}. Empty nodes ({@code 5.1}) are not words and never match. False without an enhanced graph.
     */
    public boolean hasEnhancedHead(int i, int head, String relation) {
        if (enhanced == null) return false;
        String deps = enhanced[i];
        if (deps.equals("_")) return false;
        int at = 0;
        while (at < deps.length()) {
            int bar = deps.indexOf('|', at);
            int end = bar < 0 ? deps.length() : bar;
            int colon = deps.indexOf(':', at);
            if (colon > at && colon < end) {
                int id = parseWordId(deps, at, colon);
                if (id == head + 1) {
                    if (relation == null) return true;
                    int next = deps.indexOf(':', colon + 1);
                    int relEnd = next < 0 || next > end ? end : next;
                    if (deps.regionMatches(colon + 1, relation, 0, relation.length()) && relEnd - colon - 1 == relation.length()) return true;
                }
            }
            at = end + 1;
        }
        return false;
    }

    /** The word id in {@code s[from, to)}, -1 for an empty node or anything that is not a whole number. */
    private static int parseWordId(String s, int from, int to) {
        int v = 0;
        for (int k = from; k < to; k++) {
            char ch = s.charAt(k);
            if (ch < '0' || ch > '9') return -1;
            v = v * 10 + (ch - '0');
            if (v > 10_000_000) return -1;
        }
        return v;
    }

    /** Where word {@code i} was read, as "file:line". */
    public String location(int i) { return source + ":" + lines[i]; }

    /** A copy of the forms, for tools that take a token array. */
    public String[] forms() { return forms.clone(); }
    /** A copy of the language-specific tags (Penn Treebank tags in English treebanks). */
    public String[] xposTags() { return xpos.clone(); }

    /** The same sentence with other fine tags in column 5 (a tagger's, say); everything else as it is. */
    public TreebankSentence withXposTags(String[] tags) {
        return new TreebankSentence(source, text, forms, upos, tags, heads, relations, begins, ends, lines, enhanced);
    }
    /** A copy of the universal part-of-speech tags. */
    public String[] uposTags() { return upos.clone(); }

    @Override public boolean equals(Object o) {
        if (!(o instanceof TreebankSentence)) return false;
        TreebankSentence s = (TreebankSentence) o;
        return text.equals(s.text) && Arrays.equals(forms, s.forms) && Arrays.equals(upos, s.upos)
                && Arrays.equals(xpos, s.xpos) && Arrays.equals(heads, s.heads) && Arrays.equals(relations, s.relations)
                && Arrays.equals(begins, s.begins) && Arrays.equals(ends, s.ends);
    }

    @Override public int hashCode() {
        return text.hashCode() * 31 + Arrays.hashCode(heads);
    }

    @Override public String toString() {
        return source + ":" + (lines.length > 0 ? lines[0] : 0) + " " + text;
    }
}
