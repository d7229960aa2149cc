package dev.tether.evaluation;


import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Attachment scored on running text against gold trees: every gold prepositional attachment counts, and one whose
 * preposition the pipeline did not decide counts as wrong. Baselines come from the same run, on the pipeline's own
 * tokens and tags.
 */
public final class RunningTextEvaluation {
    /** Baseline: the nearest candidate before the preposition that is a noun or a verb. */
    public static final String NEAREST_NOUN_OR_VERB = "nearest-noun-or-verb";
    /** Baseline: the backed-off quadruple model, choosing only between the nearest verb and the nearest noun. */
    public static final String VERB_OR_FIRST_NOUN = "verb-or-first-noun";

    /** Baseline: the count-based head-choice score that the learned ranker replaced, on the pipeline's candidates. */
    public static final String COUNT_SCORE = "count-score";

    final Accuracy attachment = new Accuracy();
    final SentenceOutcomes attachmentOutcomes = new SentenceOutcomes();
    final CoordinationEvaluation coordination = new CoordinationEvaluation();
    final Accuracy candidateRecall = new Accuracy();
    final CalibrationError calibration = new CalibrationError();
    final PairedComparison versusCountScore = new PairedComparison();
    final Map<String, Accuracy> byHeadClass = new LinkedHashMap<>();
    final Map<String, Accuracy> baselines = new LinkedHashMap<>();
    long sentences;
    long missedPrepositions;
    long decisions;
    long tokens;
    double seconds;

    RunningTextEvaluation() {
        for (String c : new String[] {"verb", "noun", "adjective", "adverb", "other"}) byHeadClass.put(c, new Accuracy());
        baselines.put(COUNT_SCORE, new Accuracy());
        baselines.put(NEAREST_NOUN_OR_VERB, new Accuracy());
        baselines.put(VERB_OR_FIRST_NOUN, new Accuracy());
    }

    public Accuracy attachment() { return attachment; }
    /**
     * Every gold attachment's outcome by sentence, in file order (the same order for any model on the same file), for
     * paired comparisons of two models.
     */
    public SentenceOutcomes attachmentOutcomes() { return attachmentOutcomes; }
    /** Coordination scope against the gold coordinations, with its baselines. */
    public CoordinationEvaluation coordination() { return coordination; }
    /** Gold head among the pipeline's candidates, over all gold attachments. */
    public Accuracy candidateRecall() { return candidateRecall; }
    /** Stated probability against correctness of every decision that answers a gold attachment. */
    public CalibrationError calibration() { return calibration; }
    /** The model's decisions against the count-based score's on the same gold attachments (first: the model). */
    public PairedComparison versusCountScore() { return versusCountScore; }
    /** Accuracy by the class of the gold head. */
    public Map<String, Accuracy> byHeadClass() { return byHeadClass; }
    public Map<String, Accuracy> baselines() { return baselines; }
    public long sentences() { return sentences; }
    /** Gold attachments whose preposition got no decision at all. */
    public long missedPrepositions() { return missedPrepositions; }
    /** All attachment decisions the pipeline made (gold or not). */
    public long decisions() { return decisions; }
    /** Tokens the pipeline produced. */
    public long tokens() { return tokens; }
    public double seconds() { return seconds; }
}
