package dev.tether.coordination;

/**
 * What the coordination ranker is asked about one coordinator: the Penn-tagged tokens of its sentence (or window)
 * and the candidates the {@link ConjunctCandidateProposer} found. Immutable by convention (the arrays are not copied
 * on the hot path; callers must not change them).
 */
public record CoordinationQuery(String[] words, String[] tags, CoordinatorCandidates candidates) {
    public CoordinationQuery {
        if (words.length != tags.length) throw new IllegalArgumentException("words and tags differ in length");
    }

    public String coordinatorWord() { return words[candidates.coordinator()]; }
}
