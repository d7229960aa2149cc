package dev.tether.attachment;

import dev.tether.ranking.CandidateFeatures;

import java.util.Locale;

/** Says in words why a head was chosen, for reviewers. */
final class EvidenceText {
    /** Features named per decision: the ones that weighed most for the chosen head against the runner-up. */
    static final int REASONS = 3;

    private EvidenceText() {
    }

    /** Why the count-based score chose candidate {@code i}. */
    static String describe(AttachmentQuery q, HeadChoice choice, int i) {
        return String.format(Locale.ROOT, "%s (%s, p=%.2f, margin %.2f over the runner-up)", countEvidence(q, choice, i),
                q.headClass(i).label(), choice.probability(i), choice.margin());
    }

    /** Why the ranker chose candidate {@code i}; {@code features} are the query's, as {@code choose} left them. */
    static String describe(AttachmentRanker ranker, AttachmentQuery q, HeadChoice choice, int i, CandidateFeatures features) {
        return AttachmentRanker.sentence(q, choice, ranker.explain(q, choice, features, REASONS)) + ". Counts: "
                + countEvidence(q, choice, i);
    }

    /** Which count statistic spoke for candidate {@code i}, with its counts. */
    private static String countEvidence(AttachmentQuery q, HeadChoice choice, int i) {
        String head = q.head(i);
        String cls = q.headClass(i).label();
        String p = q.preposition();
        String o = q.object();
        String counts = "the head in " + Math.round(choice.evidenceHits(i)) + " of " + Math.round(choice.evidenceTrials(i))
                + " training cases";
        // HEAD pools the head word's counts with its class's counts for this object, as HeadChoiceScorer does.
        switch (choice.evidence(i)) {
            case HEAD_WITH_OBJECT: return "'" + head + " ... " + p + " " + o + "' was " + counts;
            case HEAD: return "'" + head + " ... " + p + "', pooled with any " + cls + " ... '" + p + " " + o + "': " + counts;
            case CLASS_WITH_OBJECT: return "a " + cls + " with '" + p + " " + o + "' was " + counts;
            case CLASS: return "a " + cls + " with '" + p + "' was " + counts;
            default: return "no statistic for '" + p + "'; position alone decided";
        }
    }
}
