package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.candidates.PrepositionCandidates;

import java.util.Arrays;

/**
 * The question a prepositional phrase asks: which of these candidate heads does it attach to? Words are as they
 * appear in the text; normalization is the model's job. Candidates are ordered nearest first; distance is the
 * number of tokens from the head to the preposition (negative for a head that follows the phrase); a candidate is
 * {@code punctuated} when a comma, colon, semicolon, dash or bracket stands between it and the preposition.
 */
public final class AttachmentQuery {
    private final String preposition;
    private final String object;
    private final String[] heads;
    private final HeadClass[] classes;
    private final int[] distances;
    private final boolean[] punctuated;

    public AttachmentQuery(String preposition, String object, String[] heads, HeadClass[] classes, int[] distances,
                           boolean[] punctuated) {
        if (heads.length != classes.length || heads.length != distances.length || heads.length != punctuated.length) {
            throw new IllegalArgumentException("heads, classes, distances and punctuation flags must have the same length");
        }
        this.punctuated = punctuated.clone();
        this.preposition = preposition;
        this.object = object;
        this.heads = heads.clone();
        this.classes = classes.clone();
        this.distances = distances.clone();
    }

    /** The query for one preposition of a tokenized sentence. */
    public static AttachmentQuery of(String[] words, PrepositionCandidates c) {
        int n = c.size();
        String[] heads = new String[n];
        HeadClass[] classes = new HeadClass[n];
        int[] distances = new int[n];
        boolean[] punctuated = new boolean[n];
        for (int i = 0; i < n; i++) {
            heads[i] = words[c.head(i)];
            classes[i] = c.headClass(i);
            distances[i] = c.preposition() - c.head(i);
            int from = Math.min(c.head(i), c.preposition()) + 1;
            int to = Math.max(c.head(i), c.preposition());
            for (int k = from; k < to && !punctuated[i]; k++) punctuated[i] = isBreak(words[k]);
        }
        String object = c.object() >= 0 ? words[c.object()] : "";
        return new AttachmentQuery(words[c.preposition()], object, heads, classes, distances, punctuated);
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
    public int size() { return heads.length; }
    public String head(int i) { return heads[i]; }
    public HeadClass headClass(int i) { return classes[i]; }
    public int distance(int i) { return distances[i]; }
    public boolean punctuated(int i) { return punctuated[i]; }

    @Override public boolean equals(Object o) {
        if (!(o instanceof AttachmentQuery)) return false;
        AttachmentQuery q = (AttachmentQuery) o;
        return preposition.equals(q.preposition) && object.equals(q.object) && Arrays.equals(heads, q.heads)
                && Arrays.equals(classes, q.classes) && Arrays.equals(distances, q.distances)
                && Arrays.equals(punctuated, q.punctuated);
    }
    @Override public int hashCode() {
        return (preposition.hashCode() * 31 + object.hashCode()) * 31 + Arrays.hashCode(heads);
    }
    @Override public String toString() {
        return preposition + " " + object + " <- " + Arrays.toString(heads) + Arrays.toString(classes);
    }
}
