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
        int n = forms.length;
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
    /** Where word {@code i} was read, as "file:line". */
    public String location(int i) { return source + ":" + lines[i]; }

    /** A copy of the forms, for tools that take a token array. */
    public String[] forms() { return forms.clone(); }
    /** A copy of the language-specific tags (Penn Treebank tags in English treebanks). */
    public String[] xposTags() { return xpos.clone(); }
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
