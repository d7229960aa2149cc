package dev.tether.coordination;

import dev.tether.vocabulary.Vocabulary;

/**
 * Counts the coordination features read: how often two words were coordinated, how often a word was a conjunct and
 * how often it occurred at all, and how often a modifier word depended on a head word ({@link CoordinationCounts}
 * holds them; at training a held-out view leaves out the fold being trained on). Keys are built by
 * {@link CoordinationCounts#key}; word ids come from {@link #words()}.
 */
public interface CoordinationStatistics {
    Vocabulary words();

    /** The count stored under {@code key}, 0 when absent. */
    int count(long key);
}
