package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.candidates.PrepositionCandidates;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The question a prepositional phrase asks: which of these candidate heads does it attach to? Words are as they
 * appear in the text; normalization is the model's job. Candidates are ordered nearest first; distance is the
 * number of tokens from the head to the preposition (negative for a head that follows the phrase); a candidate is
 * {@code punctuated} when a comma, colon, semicolon, dash or bracket stands between it and the preposition. Tags
 * are Penn Treebank tags ({@code ""} when unknown). The classic verb–noun–preposition–noun configuration, when
 * there is one, is given by the indexes of its verb and first noun among the candidates.
 */
public final class AttachmentQuery {
    private final String preposition;
    private final String object;
    private final String objectTag;
    private final String[] heads;
    private final String[] tags;
    private final HeadClass[] classes;
    private final int[] distances;
    private final boolean[] punctuated;
    private final int quadrupleVerb;
    private final int quadrupleNoun;

    private AttachmentQuery(Builder b) {
        int n = b.heads.size();
        this.preposition = b.preposition;
        this.object = b.object;
        this.objectTag = b.objectTag;
        this.heads = b.heads.toArray(new String[0]);
        this.tags = b.tags.toArray(new String[0]);
        this.classes = b.classes.toArray(new HeadClass[0]);
        this.distances = Arrays.copyOf(b.distances, n);
        this.punctuated = Arrays.copyOf(b.punctuated, n);
        if (b.quadrupleVerb >= n || b.quadrupleNoun >= n) {
            throw new IllegalArgumentException("quadruple positions " + b.quadrupleVerb + "/" + b.quadrupleNoun
                    + " outside " + n + " candidates");
        }
        this.quadrupleVerb = b.quadrupleVerb;
        this.quadrupleNoun = b.quadrupleNoun;
    }

    /** Starts a query for a preposition and the head word of its object ({@code ""} when none). */
    public static Builder builder(String preposition, String object) {
        return new Builder(preposition, object);
    }

    /** Collects the candidates of a query, nearest first. */
    public static final class Builder {
        private final String preposition;
        private final String object;
        private String objectTag = "";
        private final List<String> heads = new ArrayList<>();
        private final List<String> tags = new ArrayList<>();
        private final List<HeadClass> classes = new ArrayList<>();
        private int[] distances = new int[8];
        private boolean[] punctuated = new boolean[8];
        private int quadrupleVerb = -1;
        private int quadrupleNoun = -1;

        private Builder(String preposition, String object) {
            this.preposition = preposition;
            this.object = object;
        }

        public Builder objectTag(String tag) {
            this.objectTag = tag;
            return this;
        }

        public Builder candidate(String head, String tag, HeadClass headClass, int distance, boolean punctuatedBetween) {
            int i = heads.size();
            if (i == distances.length) {
                distances = Arrays.copyOf(distances, 2 * i);
                punctuated = Arrays.copyOf(punctuated, 2 * i);
            }
            heads.add(head);
            tags.add(tag);
            classes.add(headClass);
            distances[i] = distance;
            punctuated[i] = punctuatedBetween;
            return this;
        }

        /** Candidate indexes of the classic configuration's verb and first noun (-1 each when there is none). */
        public Builder quadruple(int verbCandidate, int nounCandidate) {
            this.quadrupleVerb = verbCandidate;
            this.quadrupleNoun = nounCandidate;
            return this;
        }

        public AttachmentQuery build() {
            return new AttachmentQuery(this);
        }
    }

    /** The query for one preposition of a tokenized, tagged sentence. */
    public static AttachmentQuery of(String[] words, String[] pennTags, PrepositionCandidates c) {
        Builder b = builder(words[c.preposition()], c.object() >= 0 ? words[c.object()] : "")
                .objectTag(c.object() >= 0 ? pennTags[c.object()] : "");
        for (int i = 0; i < c.size(); i++) {
            int head = c.head(i);
            boolean broken = false;
            for (int k = Math.min(head, c.preposition()) + 1; k < Math.max(head, c.preposition()) && !broken; k++) {
                broken = isBreak(words[k]);
            }
            b.candidate(words[head], pennTags[head], c.headClass(i), c.preposition() - head, broken);
        }
        if (c.isQuadruple()) b.quadruple(c.indexOf(c.quadrupleVerb()), c.indexOf(c.quadrupleNoun()));
        return b.build();
    }

    /** A token that marks a phrase break: comma, colon, semicolon, dash or bracket. */
    public static boolean isBreak(String token) {
        if (token.isEmpty() || token.length() > 3) return false;
        switch (token) {
            case ",": case ":": case ";": case "-": case "--": case "(": case ")": case "[": case "]":
            case "-LRB-": case "-RRB-":
                return true;
            default:
                return false;
        }
    }

    public String preposition() { return preposition; }
    public String object() { return object; }
    /** Penn tag of the object's head, {@code ""} when unknown. */
    public String objectTag() { return objectTag; }
    public int size() { return heads.length; }
    public String head(int i) { return heads[i]; }
    /** Penn tag of candidate {@code i}, {@code ""} when unknown. */
    public String tag(int i) { return tags[i]; }
    public HeadClass headClass(int i) { return classes[i]; }
    public int distance(int i) { return distances[i]; }
    public boolean punctuated(int i) { return punctuated[i]; }
    /** Candidate index of the classic configuration's verb, or -1. */
    public int quadrupleVerb() { return quadrupleVerb; }
    /** Candidate index of the classic configuration's first noun, or -1. */
    public int quadrupleNoun() { return quadrupleNoun; }

    @Override public boolean equals(Object o) {
        if (!(o instanceof AttachmentQuery)) return false;
        AttachmentQuery q = (AttachmentQuery) o;
        return preposition.equals(q.preposition) && object.equals(q.object) && objectTag.equals(q.objectTag)
                && Arrays.equals(heads, q.heads) && Arrays.equals(tags, q.tags)
                && Arrays.equals(classes, q.classes) && Arrays.equals(distances, q.distances)
                && Arrays.equals(punctuated, q.punctuated) && quadrupleVerb == q.quadrupleVerb
                && quadrupleNoun == q.quadrupleNoun;
    }
    @Override public int hashCode() {
        return (preposition.hashCode() * 31 + object.hashCode()) * 31 + Arrays.hashCode(heads);
    }
    @Override public String toString() {
        return preposition + " " + object + "/" + objectTag + " <- " + Arrays.toString(heads) + Arrays.toString(tags)
                + Arrays.toString(classes);
    }
}
