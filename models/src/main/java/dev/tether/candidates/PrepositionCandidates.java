package dev.tether.candidates;

import java.util.Arrays;

/**
 * One preposition in a tagged sentence with everything that could be its attachment site. Token positions are
 * indexes into the sentence's token array; candidate heads are ordered nearest first.
 */
public final class PrepositionCandidates {
    private final int preposition;
    private final int object;
    private final int[] heads;
    private final HeadClass[] classes;
    private final int quadrupleVerb;
    private final int quadrupleNoun;

    /**
     * @param preposition   index of the preposition token
     * @param object        index of the head of its object (the noun it introduces)
     * @param heads         indexes of candidate heads, nearest first (a head after the phrase counts by its distance)
     * @param classes       word class of each candidate head, parallel to {@code heads}
     * @param quadrupleVerb index of the verb of the classic verb–noun–preposition–noun configuration, or -1
     * @param quadrupleNoun index of its first noun (the noun right before the preposition), or -1
     */
    public PrepositionCandidates(int preposition, int object, int[] heads, HeadClass[] classes,
                                 int quadrupleVerb, int quadrupleNoun) {
        if (heads.length != classes.length) {
            throw new IllegalArgumentException("heads and classes differ in length: " + heads.length + " vs " + classes.length);
        }
        this.preposition = preposition;
        this.object = object;
        this.heads = heads.clone();
        this.classes = classes.clone();
        this.quadrupleVerb = quadrupleVerb;
        this.quadrupleNoun = quadrupleNoun;
    }

    public int preposition() { return preposition; }
    public int object() { return object; }
    public int size() { return heads.length; }
    public int head(int i) { return heads[i]; }
    public HeadClass headClass(int i) { return classes[i]; }
    /** Position of token {@code token} among the candidates, or -1 when it is not one. */
    public int indexOf(int token) {
        for (int i = 0; i < heads.length; i++) {
            if (heads[i] == token) return i;
        }
        return -1;
    }
    public boolean isQuadruple() { return quadrupleVerb >= 0 && quadrupleNoun >= 0; }
    public int quadrupleVerb() { return quadrupleVerb; }
    public int quadrupleNoun() { return quadrupleNoun; }

    @Override public boolean equals(Object o) {
        if (!(o instanceof PrepositionCandidates)) return false;
        PrepositionCandidates c = (PrepositionCandidates) o;
        return preposition == c.preposition && object == c.object && quadrupleVerb == c.quadrupleVerb
                && quadrupleNoun == c.quadrupleNoun && Arrays.equals(heads, c.heads) && Arrays.equals(classes, c.classes);
    }
    @Override public int hashCode() {
        return 31 * (31 * preposition + object) + Arrays.hashCode(heads);
    }
    @Override public String toString() {
        return "PrepositionCandidates{p=" + preposition + ", object=" + object + ", heads=" + Arrays.toString(heads)
                + ", classes=" + Arrays.toString(classes) + ", quadruple=" + quadrupleVerb + "/" + quadrupleNoun + "}";
    }
}
