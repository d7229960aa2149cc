package dev.tether.candidates;

import java.util.List;

/**
 * Finds prepositions with a nominal object in a sentence tagged with Penn Treebank part-of-speech tags and proposes
 * every plausible attachment site. The same proposer serves the annotators at run time and treebank training, so
 * that both see the same candidate sets. Stateless and thread-safe.
 */
public final class HeadCandidateProposer {

    /** Candidates for every preposition of the sentence, in sentence order. */
    public List<PrepositionCandidates> proposeAll(String[] words, String[] pennTags) {
        throw new UnsupportedOperationException("being written");
    }

    /** Candidates for the preposition at {@code index}, or {@code null} when it is not a preposition with an object. */
    public PrepositionCandidates propose(String[] words, String[] pennTags, int index) {
        throw new UnsupportedOperationException("being written");
    }
}
