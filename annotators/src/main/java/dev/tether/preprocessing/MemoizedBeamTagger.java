package dev.tether.preprocessing;

import opennlp.tools.ml.model.MaxentModel;
import opennlp.tools.postag.DefaultPOSSequenceValidator;
import opennlp.tools.postag.POSContextGenerator;
import opennlp.tools.postag.POSModel;
import opennlp.tools.postag.POSTaggerME;
import opennlp.tools.util.SequenceValidator;

import java.util.Arrays;
import java.util.PriorityQueue;

/**
 * Tags a sentence with an OpenNLP part-of-speech model exactly as {@link POSTaggerME} does with Penn Treebank tags
 * (the same beam search of width {@code BeamSize}, Ratnaparkhi 1996: the same context generator called in the same
 * order, the same sequence validator, the same scores, ties broken the same way), at less cost:
 * <ul>
 *   <li>the model is evaluated once per distinct context of a position, not once per hypothesis. The beam's
 *       hypotheses often get identical contexts (OpenNLP's cached feature generator returns the features it made for
 *       the first hypothesis at that position, previous-tag features included), and evaluation is a pure function
 *       of the context, so the result is the same;</li>
 *   <li>with OpenNLP's default feature set (every tagger Tether trains), that one context is not built as strings:
 *       {@link FeatureFamilyIndex} sums it from each word's features, looked up once per sentence, to the same
 *       probabilities. With the default set every hypothesis at a position gets the first one's context, as above,
 *       so the position is scored once, with the tags of the best hypothesis;</li>
 *   <li>a hypothesis is a link to its parent, not a copied list of tags and probabilities;</li>
 *   <li>the cut-off (the beam-th best score of an expansion) is selected, not found by sorting every score.</li>
 * </ul>
 * {@code MemoizedBeamTaggerEwtTest} (test-corpora) checks tag for tag against {@link POSTaggerME} over UD English EWT sentences, for the
 * default model's tagger and for the shipped OpenNLP model. Not thread-safe (the context generator keeps caches, as
 * in {@link POSTaggerME}): one per engine instance; the {@link POSModel} itself is shared.
 */
public final class MemoizedBeamTagger {
    /** The least sequence score {@link POSTaggerME} keeps (its beam search's default). */
    private static final double MIN_SEQUENCE_SCORE = -100000;
    private static final Object[] NO_ADDITIONAL_CONTEXT = new Object[0];

    /** OpenNLP's context generator, when the model's features are not {@link FeatureFamilyIndex}'s; else null. */
    private final POSContextGenerator contexts;
    private final SequenceValidator<String> validator;
    private final MaxentModel model;
    private final int beam;
    private final String[] outcomes;
    private final double[] buffer;
    /** Contexts evaluated at the current position, and their scores (at most one per hypothesis). */
    private final String[][] evaluated;
    private final double[][] evaluatedScores;
    private final double[] best;
    /** The natural logarithms of the scores at or above the cut-off of the scores being expanded; NaN for the others. */
    private final double[] logs;
    /** Scores positions from the model's parameters by feature family, when its features are OpenNLP's default set; else null. */
    private final FeatureFamilyIndex.Scorer families;
    /**
     * Whether the sequence validator is OpenNLP's default one, which reads only the word and the proposed tag: then
     * the scored path hands it no tag history, instead of one built per hypothesis and position.
     */
    private final boolean validatorReadsNoTags;

    /** Whether {@code pos} can be decoded here: its tagging model is a maximum entropy model (every one Tether trains or ships). */
    public static boolean decodes(POSModel pos) {
        return pos.getArtifact("pos.model") instanceof MaxentModel;
    }

    /** A tagger over {@code pos}; see {@link #decodes(POSModel)}. */
    public MemoizedBeamTagger(POSModel pos) {
        Object artifact = pos.getArtifact("pos.model");
        if (!(artifact instanceof MaxentModel maxent)) {
            throw new IllegalArgumentException("the part-of-speech model holds a " + (artifact == null ? "no model"
                    : artifact.getClass().getSimpleName()) + ", not a maximum entropy model; tag it with OpenNLP's POSTaggerME");
        }
        String size = pos.getManifestProperty("BeamSize");
        this.beam = size == null ? POSTaggerME.DEFAULT_BEAM_SIZE : Integer.parseInt(size);
        this.validator = pos.getFactory().getSequenceValidator();
        this.model = maxent;
        this.outcomes = new String[maxent.getNumOutcomes()];
        for (int i = 0; i < outcomes.length; i++) outcomes[i] = maxent.getOutcome(i);
        this.buffer = new double[outcomes.length];
        this.evaluated = new String[beam][];
        this.evaluatedScores = new double[beam][outcomes.length];
        this.best = new double[beam];
        this.logs = new double[outcomes.length];
        this.families = FeatureFamilyIndex.of(pos).map(FeatureFamilyIndex::scorer).orElse(null);
        // Building OpenNLP's generator parses its feature descriptor: only when it is used.
        this.contexts = families == null ? pos.getFactory().getPOSContextGenerator(beam) : null;
        this.validatorReadsNoTags = validator.getClass() == DefaultPOSSequenceValidator.class;
    }

    /** One hypothesis: its last tag, its score (the sum of its tags' log probabilities), and the hypothesis it extends. */
    private static final class Hypothesis implements Comparable<Hypothesis> {
        final Hypothesis parent;
        final String tag;
        final double score;
        final int length;

        Hypothesis() {
            this.parent = null;
            this.tag = null;
            this.score = 0;
            this.length = 0;
        }

        Hypothesis(Hypothesis parent, String tag, double logProbability) {
            this.parent = parent;
            this.tag = tag;
            this.score = parent.score + logProbability;
            this.length = parent.length + 1;
        }

        String[] tags() {
            String[] out = new String[length];
            Hypothesis h = this;
            for (int i = length - 1; i >= 0; i--) {
                out[i] = h.tag;
                h = h.parent;
            }
            return out;
        }

        /** Higher scores first; equal scores keep the queue's order, as OpenNLP's sequences do. */
        @Override
        public int compareTo(Hypothesis other) {
            return Double.compare(other.score, score);
        }
    }

    private static final String[] NO_TAGS = new String[0];

    /** The tags of {@code top}, or none where nothing will read them. */
    private String[] tagsBefore(Hypothesis top) {
        return families != null && validatorReadsNoTags ? NO_TAGS : top.tags();
    }

    /** The Penn Treebank tags of {@code words}, one per word. */
    public String[] tag(String[] words) {
        PriorityQueue<Hypothesis> previous = new PriorityQueue<>(beam);
        PriorityQueue<Hypothesis> next = new PriorityQueue<>(beam);
        previous.add(new Hypothesis());
        if (families != null) families.start(words);
        for (int i = 0; i < words.length; i++) {
            int expand = Math.min(beam, previous.size());
            int seen = 0;
            double cutOff = 0;
            for (int h = 0; !previous.isEmpty() && h < expand; h++) {
                Hypothesis top = previous.remove();
                String[] tags = tagsBefore(top);
                double[] scores = null;
                if (families != null) {
                    // Every hypothesis at this position has the first one's context (see the class comment).
                    if (h == 0) families.score(i, top.tag, top.parent == null ? null : top.parent.tag, evaluatedScores[0]);
                    scores = evaluatedScores[0];
                } else {
                    String[] context = contexts.getContext(i, words, tags, NO_ADDITIONAL_CONTEXT);
                    for (int k = 0; k < seen; k++) {
                        if (Arrays.equals(evaluated[k], context)) {
                            scores = evaluatedScores[k];
                            break;
                        }
                    }
                    if (scores == null) {
                        double[] fresh = model.eval(context, buffer);
                        System.arraycopy(fresh, 0, evaluatedScores[seen], 0, fresh.length);
                        evaluated[seen] = context;
                        scores = evaluatedScores[seen++];
                    }
                }
                if (families == null || h == 0) {
                    cutOff = beamthBest(scores);
                    // The logarithms of the scores that pass, once per set of scores.
                    for (int p = 0; p < scores.length; p++) logs[p] = scores[p] >= cutOff ? StrictMath.log(scores[p]) : Double.NaN;
                }
                for (int p = 0; p < scores.length; p++) {
                    if (scores[p] >= cutOff) extend(next, top, tags, i, words, p, logs[p]);
                }
                if (next.isEmpty()) {
                    // Nothing of the best scores is a valid continuation: try every valid one.
                    for (int p = 0; p < scores.length; p++) {
                        extend(next, top, tags, i, words, p, Double.isNaN(logs[p]) ? StrictMath.log(scores[p]) : logs[p]);
                    }
                }
            }
            Arrays.fill(evaluated, 0, seen, null);
            previous.clear();
            PriorityQueue<Hypothesis> swap = previous;
            previous = next;
            next = swap;
        }
        if (previous.isEmpty()) {
            throw new IllegalStateException("no tag sequence of " + words.length + " words is valid under the model's tag dictionary");
        }
        return previous.remove().tags();
    }

    private void extend(PriorityQueue<Hypothesis> next, Hypothesis top, String[] tags, int i, String[] words, int p, double logProbability) {
        String tag = outcomes[p];
        if (!validator.validSequence(i, words, tags, tag)) return;
        Hypothesis extended = new Hypothesis(top, tag, logProbability);
        if (extended.score > MIN_SEQUENCE_SCORE) next.add(extended);
    }

    /**
     * The beam-th largest of {@code scores}, duplicates counted (the smallest when there are fewer): the value at
     * index {@code max(0, n - beam)} of the scores sorted ascending, which is the cut-off OpenNLP's beam search uses.
     */
    private double beamthBest(double[] scores) {
        int k = Math.min(beam, scores.length);
        int filled = 0;
        for (double s : scores) {
            // best[0..filled) holds the largest values so far, in descending order; s goes in by insertion.
            int j;
            if (filled < k) j = filled++;
            else if (Double.compare(s, best[k - 1]) > 0) j = k - 1;
            else continue;
            while (j > 0 && Double.compare(best[j - 1], s) < 0) {
                best[j] = best[j - 1];
                j--;
            }
            best[j] = s;
        }
        return best[k - 1];
    }
}
