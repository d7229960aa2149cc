package dev.tether.coordination;

import java.util.List;

/**
 * One coordinating conjunction in a tagged sentence with every bracketing the proposer found plausible, the
 * nearest first conjunct first for each reading of the last conjunct. {@code capped} says how many further
 * first-conjunct candidates the window held but the caps left out (0 when no cap bit), for the evidence.
 */
public record CoordinatorCandidates(int coordinator, List<ConjunctPair> pairs, int capped) {
    public CoordinatorCandidates {
        pairs = List.copyOf(pairs);
    }

    public int size() { return pairs.size(); }
    public ConjunctPair pair(int i) { return pairs.get(i); }

    /** Index of the pair with these heads, or -1. */
    public int indexOf(int left, int right) {
        for (int i = 0; i < pairs.size(); i++) if (pairs.get(i).left() == left && pairs.get(i).right() == right) return i;
        return -1;
    }
}
