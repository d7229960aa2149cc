package dev.tether.evaluation;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Head choice scored on a treebank's own tokens and tags, so that tagging errors play no part: every gold
 * prepositional attachment counts (one whose preposition the proposer missed counts as wrong), with baselines and
 * the ceiling of a choice limited to the nearest verb and the nearest noun, all on the same candidates.
 */
public final class GoldTagEvaluation {
    /** Baseline: the nearest candidate before the preposition that is a noun or a verb. */
    public static final String NEAREST_NOUN_OR_VERB = "nearest-noun-or-verb";
    /** Baseline: the backed-off quadruple model choosing between the nearest verb and the nearest noun. */
    public static final String VERB_OR_FIRST_NOUN = "verb-or-first-noun";
    /** Baseline: the count-based head-choice score that the learned ranker replaced, on the same candidates. */
    public static final String COUNT_SCORE = "count-score";
    /** Not a method: how often the gold head is the nearest verb or the nearest noun before the preposition. */
    public static final String VERB_OR_NOUN_CEILING = "verb-or-noun-ceiling";

    final Accuracy attachment = new Accuracy();
    final Accuracy candidateRecall = new Accuracy();
    final PairedComparison versusCountScore = new PairedComparison();
    final CalibrationError calibration = new CalibrationError();
    final Map<String, Accuracy> comparisons = new LinkedHashMap<>();

    GoldTagEvaluation() {
        comparisons.put(COUNT_SCORE, new Accuracy());
        comparisons.put(NEAREST_NOUN_OR_VERB, new Accuracy());
        comparisons.put(VERB_OR_FIRST_NOUN, new Accuracy());
        comparisons.put(VERB_OR_NOUN_CEILING, new Accuracy());
    }

    public Accuracy attachment() { return attachment; }
    public Accuracy candidateRecall() { return candidateRecall; }
    /** The model's choices against the count-based score's on the same examples (first: the model). */
    public PairedComparison versusCountScore() { return versusCountScore; }
    /** Stated probability against correctness of every decision made (a missed preposition states none). */
    public CalibrationError calibration() { return calibration; }
    /** Baselines and the ceiling, by name. */
    public Map<String, Accuracy> comparisons() { return comparisons; }
}
