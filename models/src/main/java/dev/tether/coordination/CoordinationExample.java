package dev.tether.coordination;

/**
 * A training event read off a gold tree: the query, the index of the gold pair among its candidates (-1 when the
 * proposer missed it), and for each modifier of the gold pair whether the tree shares it (null entries: a candidate
 * modifier that is not a dependent of either conjunct in the tree, which teaches nothing). {@code source} names the
 * file and line.
 */
public record CoordinationExample(CoordinationQuery query, int gold, Boolean[] shared, String source) {
}
