package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.SubTuple;
import dev.tether.counts.TupleCounts;
import dev.tether.ranking.CandidateFeatures;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.Vocabulary;

/**
 * The features of one quadruple for the learned quadruple scorer, read from one set of counts: the evidence of every
 * level of the Collins &amp; Brooks (1995) back-off (each of the seven tuples with the preposition: seen, log-odds,
 * cases), the preposition's own rate and identity, the back-off's estimate and the level it decided at, and, with a
 * thesaurus, for each of verb, first noun and object the similarity-weighted noun-attachment rate of the tuples in
 * which a neighbour takes the word's place (Dagan, Lee &amp; Pereira 1999), per level group. The features go on the noun
 * side of a two-candidate decision (candidate 0 the verb, candidate 1 the noun).
 *
 * <p>Training builds one extractor per fold of the jackknife, over counts without that fold; {@code prepositionKeys}
 * then maps the fold's preposition ids to the final model's, so that the preposition feature means the same in every
 * fold. Immutable and thread-safe; {@link #extract} writes into the caller's buffer only.
 */
public final class QuadrupleFeatureExtractor {
    /** The back-off's tuples, most specific first. */
    static final SubTuple[] LEVELS = {SubTuple.VERB_NOUN1_NOUN2, SubTuple.VERB_NOUN1, SubTuple.VERB_NOUN2,
            SubTuple.NOUN1_NOUN2, SubTuple.VERB, SubTuple.NOUN1, SubTuple.NOUN2};
    /** Neighbours read per word (k 50 measured best on the quadruple devset among 20 and 50; README). */
    public static final int NEIGHBOURS = 50;
    private static final HeadClass[] SLOT_CLASSES = {HeadClass.VERB, HeadClass.NOUN, HeadClass.NOUN};

    private final QuadrupleCounts counts;
    private final BackedOffScorer backedOff;
    private final Thesaurus thesaurus;
    private final ThesaurusIds ids;
    private final int neighbours;
    private final int[] prepositionKeys;

    /**
     * @param counts          the counts the features read
     * @param thesaurus       neighbours for the neighbour features; null: none
     * @param neighbours      neighbours read per word
     * @param keyPrepositions the prepositions the feature keys name (the final model's); {@code counts.prepositions()}
     *                        at run time
     */
    public QuadrupleFeatureExtractor(QuadrupleCounts counts, Thesaurus thesaurus, int neighbours, Vocabulary keyPrepositions) {
        this.counts = counts;
        this.backedOff = new BackedOffScorer(counts);
        this.thesaurus = thesaurus;
        this.ids = thesaurus == null ? null : new ThesaurusIds(counts.words(), thesaurus);
        this.neighbours = neighbours;
        Vocabulary own = counts.prepositions();
        this.prepositionKeys = new int[own.size() + 1];
        for (int p = 1; p <= own.size(); p++) prepositionKeys[p] = Math.max(0, keyPrepositions.id(own.word(p)));
    }

    public QuadrupleCounts counts() {
        return counts;
    }

    /** Whether the neighbour features are on. */
    public boolean readsThesaurus() {
        return thesaurus != null;
    }

    /**
     * Fills {@code out} with the two candidates of quadruple (v, n1, p, n2), given as ids of this extractor's counts
     * (0 for a word they never saw) and as normalized words (for the thesaurus; null when not known), and returns the
     * back-off's decision, which the features include.
     */
    public QuadrupleDecision extract(int v, int n1, int p, int n2, String verbKey, String nounKey, String objectKey,
                                     CandidateFeatures out) {
        out.reset();
        out.nextCandidate();
        out.nextCandidate();
        boolean knownPreposition = p > 0 && p < prepositionKeys.length;
        out.add(QuadrupleFeature.PREPOSITION.key(knownPreposition ? prepositionKeys[p] : 0, 0), 1);
        QuadrupleDecision d = backedOff.decide(v, n1, p, n2);
        if (!knownPreposition) return d;
        for (int l = 0; l < LEVELS.length; l++) {
            if (!known(LEVELS[l], v, n1, n2)) continue;
            long f = counts.table(p, LEVELS[l]).find(LEVELS[l].key(v, n1, n2));
            if (f == TupleCounts.ABSENT) continue;
            double hits = TupleCounts.hitsIn(f), trials = TupleCounts.trialsIn(f);
            out.add(QuadrupleFeature.LEVEL_SEEN.key(l, 0), 1);
            out.add(QuadrupleFeature.LEVEL_LOG_ODDS.key(l, 0), logOdds(hits, trials));
            out.add(QuadrupleFeature.LEVEL_TRIALS.key(l, 0), Math.log1p(trials));
        }
        out.add(QuadrupleFeature.PREPOSITION_LOG_ODDS.key(), logOdds(counts.prepositionNounCount(p), counts.prepositionCount(p)));
        out.add(QuadrupleFeature.PREPOSITION_TRIALS.key(), Math.log1p(counts.prepositionCount(p)));
        double pn = Math.min(0.999, Math.max(0.001, d.nounProbability()));
        out.add(QuadrupleFeature.BACKED_OFF_LOG_ODDS.key(), Math.log(pn / (1 - pn)));
        out.add(QuadrupleFeature.BACKED_OFF_BASIS.key(Math.min(DecisionBasis.DEFAULT.ordinal(), d.basis().ordinal()), 0), 1);
        if (thesaurus != null) neighbourFeatures(v, n1, p, n2, verbKey, nounKey, objectKey, out);
        return d;
    }

    private void neighbourFeatures(int v, int n1, int p, int n2, String verbKey, String nounKey, String objectKey,
                                   CandidateFeatures out) {
        int[] slotIds = {v, n1, n2};
        String[] keys = {verbKey, nounKey, objectKey};
        double[] rate = new double[3];
        double[] weight = new double[3];
        for (int s = 0; s < 3; s++) {
            if (slotIds[s] <= 0 && keys[s] == null) continue;
            int t = ids.entry(SLOT_CLASSES[s], slotIds[s], keys[s]);
            if (t == Thesaurus.UNKNOWN) continue;
            java.util.Arrays.fill(rate, 0);
            java.util.Arrays.fill(weight, 0);
            int k = Math.min(neighbours, thesaurus.neighbourCount(t));
            for (int i = 0; i < k; i++) {
                int id = ids.countId(thesaurus.neighbourId(t, i));
                if (id <= 0) continue;
                double similarity = thesaurus.neighbourScore(t, i);
                int sv = s == 0 ? id : v, sn1 = s == 1 ? id : n1, sn2 = s == 2 ? id : n2;
                for (int l = 0; l < LEVELS.length; l++) {
                    if (!contains(LEVELS[l], s) || !known(LEVELS[l], sv, sn1, sn2)) continue;
                    long f = counts.table(p, LEVELS[l]).find(LEVELS[l].key(sv, sn1, sn2));
                    if (f == TupleCounts.ABSENT || !(TupleCounts.trialsIn(f) > 0)) continue;
                    int group = l == 0 ? 0 : l <= 3 ? 1 : 2;
                    rate[group] += similarity * (TupleCounts.hitsIn(f) + 0.5) / (TupleCounts.trialsIn(f) + 1);
                    weight[group] += similarity;
                }
            }
            for (int group = 0; group < 3; group++) {
                if (!(weight[group] > 0)) continue;
                double r = rate[group] / weight[group];
                out.add(QuadrupleFeature.NEIGHBOUR_SEEN.key(s, group), 1);
                out.add(QuadrupleFeature.NEIGHBOUR_LOG_ODDS.key(s, group), Math.log(r / (1 - r)));
                out.add(QuadrupleFeature.NEIGHBOUR_WEIGHT.key(s, group), Math.log1p(weight[group]));
            }
        }
    }

    private static double logOdds(double hits, double trials) {
        return Math.log((hits + 0.5) / (trials - hits + 0.5));
    }

    private static boolean known(SubTuple part, int v, int n1, int n2) {
        return (!contains(part, 0) || v > 0) && (!contains(part, 1) || n1 > 0) && (!contains(part, 2) || n2 > 0);
    }

    /** Whether tuple {@code part} holds slot {@code slot} (0 verb, 1 first noun, 2 object). */
    private static boolean contains(SubTuple part, int slot) {
        return switch (part) {
            case VERB_NOUN1_NOUN2 -> true;
            case VERB_NOUN1 -> slot == 0 || slot == 1;
            case VERB_NOUN2 -> slot == 0 || slot == 2;
            case NOUN1_NOUN2 -> slot == 1 || slot == 2;
            case VERB -> slot == 0;
            case NOUN1 -> slot == 1;
            case NOUN2 -> slot == 2;
        };
    }
}
