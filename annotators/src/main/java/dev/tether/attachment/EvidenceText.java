package dev.tether.attachment;

import java.util.Locale;

/** Says in words which statistic spoke for a chosen head, for reviewers. */
final class EvidenceText {
    private EvidenceText() {
    }

    static String describe(AttachmentQuery q, HeadChoice choice, int i) {
        String head = q.head(i);
        String cls = q.headClass(i).label();
        String p = q.preposition();
        String o = q.object();
        String counts = String.format(Locale.ROOT, "the head in %.0f of %.0f training cases", choice.evidenceHits(i), choice.evidenceTrials(i));
        // The texts below say which counts were read; HEAD pools the head word's counts with its class's counts for
        // this object, as HeadChoiceScorer does.
        String seen;
        switch (choice.evidence(i)) {
            case HEAD_WITH_OBJECT: seen = "'" + head + " ... " + p + " " + o + "' was " + counts; break;
            case HEAD: seen = "'" + head + " ... " + p + "', pooled with any " + cls + " ... '" + p + " " + o + "': " + counts; break;
            case CLASS_WITH_OBJECT: seen = "a " + cls + " with '" + p + " " + o + "' was " + counts; break;
            case CLASS: seen = "a " + cls + " with '" + p + "' was " + counts; break;
            default: seen = "no statistic for '" + p + "'; position alone decided"; break;
        }
        return String.format(Locale.ROOT, "%s (%s, p=%.2f, margin %.2f over the runner-up)", seen, cls,
                choice.probability(i), choice.margin());
    }
}
