package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.QuadrupleCountsBuilder;
import dev.tether.counts.SubTuple;
import dev.tether.counts.TupleCounts;
import dev.tether.io.QuadrupleReader;
import dev.tether.ranking.DifferentiableFunction;
import dev.tether.ranking.Lbfgs;
import dev.tether.similarity.Thesaurus;
import dev.tether.similarity.ThesaurusFile;
import dev.tether.vocabulary.WordNormalizer;
import gnu.trove.map.hash.TLongIntHashMap;
import gnu.trove.map.hash.TObjectIntHashMap;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Not a test: a development loop for a learned quadruple scorer. A logistic regression (L2, fitted with the project's
 * L-BFGS) over the evidence of the back-off of Collins &amp; Brooks (1995) — each level's log-odds, presence and
 * count, the pooled estimate and the level it came from, one weight per preposition — and, per variant, over more
 * evidence (see {@link Variant}): sparse indicators of the words in each slot with their preposition, and, from a
 * thesaurus, the same indicators for each word's nearest neighbours weighted by similarity (a soft word class, so that
 * what the regression learns of a word carries to its neighbours), and dense neighbour-substitution evidence in the
 * manner of Dagan, Lee &amp; Pereira (1999) and Zhao &amp; Lin (2004). Training rows take their counts from the other
 * four fifths of the training split (a jackknife), so that the weights see counts as they are for unseen items; the
 * development items take theirs from the whole split. Prints, for each variant and L2 strength, 5-fold cross-validated
 * accuracy on the jackknifed training rows and accuracy on the development set, and then the devset accuracy of the
 * strength the folds choose (the best fold accuracy; ties: the first). Variants with sparse features try an L2
 * strength for the dense and one for the sparse weights. Fits run L-BFGS to convergence (at most 3,000 iterations,
 * relative tolerance 1e-11; {@code -Dtether.iterations} and {@code -Dtether.tolerance} change them, and the earlier
 * 500 and 1e-7 stopped many fits before convergence: 85.74% on the devset with the neighbour rates instead of 85.59%).
 *
 * <p>Arguments: TRAINING DEVSET THESAURUS K [VARIANT...], each variant a '+'-joined list of feature groups (see
 * {@link Variant#parse}); without variants, {@code backoff} and {@code backoff+rates}, the set the training folds
 * choose among those measured.
 * Run from the repository root after {@code mvn -pl models test-compile}: {@code java -cp
 * "models/target/test-classes:models/target/classes:$(cat cp.txt)" dev.tether.attachment.LearnedQuadrupleMeasurement
 * test-corpora/data/rrr/training test-corpora/data/rrr/devset T 50}.
 */
public final class LearnedQuadrupleMeasurement {
    private static final SubTuple[] LEVELS = {SubTuple.VERB_NOUN1_NOUN2, SubTuple.VERB_NOUN1, SubTuple.VERB_NOUN2,
            SubTuple.NOUN1_NOUN2, SubTuple.VERB, SubTuple.NOUN1, SubTuple.NOUN2};
    private static final HeadClass[] SLOT_CLASSES = {HeadClass.VERB, HeadClass.NOUN, HeadClass.NOUN};
    private static final int FOLDS = 5;
    private static final int ITERATIONS = Integer.getInteger("tether.iterations", 3000);
    private static final double TOLERANCE = Double.parseDouble(System.getProperty("tether.tolerance", "1e-11"));
    /** L2 strengths of the dense features tried; the sparse ones, when a variant has any, also try {@link #SPARSE_L2}. */
    private static final double[] L2 = {0.1, 1, 10};
    /** L2 strengths of the sparse features tried, strongest first (each fit starts from the previous one's weights). */
    private static final double[] SPARSE_L2 = {100, 30, 10, 3};
    /** Three numbers for each of the seven levels and the preposition, the pooled estimate, five bases. */
    private static final int BACK_OFF = 3 * 8 + 1 + 5;
    /** Mean neighbour rates: three numbers for each slot and level group (quadruple, triples, pairs). */
    private static final int RATES = 3 * 3 * 3;
    /** Pooled neighbour counts: three numbers for each slot and level (quadruple, triples). */
    private static final int POOLED = 3 * 2 * 3;
    /** The similarity-smoothed back-off's log-odds and whether it departed from the plain back-off. */
    private static final int SMOOTHED = 2;
    /** Joint substitution of two slots: three numbers for each pair of slots and level (quadruple, their triple). */
    private static final int JOINT = 3 * 2 * 3;
    /**
     * The mean neighbour rates again, split by how often the word itself was seen with the preposition (never, 1 to
     * 4 times, 5 or more): presence and log-odds for each slot, level group and bin.
     */
    private static final int RATE_BINS = 3 * 3 * 3 * 2;
    private static final int DENSE_PREPOSITIONS = BACK_OFF + RATES + POOLED + SMOOTHED + JOINT + RATE_BINS;
    /** The slot pairs of the joint substitution and the triple each pair forms with the preposition. */
    private static final int[][] SLOT_PAIRS = {{0, 1}, {0, 2}, {1, 2}};
    private static final SubTuple[] PAIR_TRIPLES = {SubTuple.VERB_NOUN1, SubTuple.VERB_NOUN2, SubTuple.NOUN1_NOUN2};

    /** Kinds of sparse feature, the top four bits of a feature key. */
    private static final int WORD = 1, WORD_PAIR = 2, CLASS = 3, CLASS_PAIR = 4;

    /**
     * One feature set: the back-off evidence always, and the groups below. The thesaurus groups read the first
     * K neighbours of a word (the command's K) unless {@code slotK} says fewer.
     *
     * @param rates    per slot, the similarity^power-weighted mean of the neighbours' noun-attachment rates
     *                 ((hits + 0.5) / (trials + 1)) at the quadruple, triple and pair levels, with the word replaced
     *                 by each neighbour the counts saw: presence, log-odds, log of 1 + the summed weight
     * @param pooled   per slot, the neighbours' cases at the quadruple and at the triples pooled, each weighted by
     *                 similarity^power: presence, log-odds and log count
     * @param smoothed the log-odds of {@link SimilarityBackedOffScorer} (K neighbours) and whether it departed from
     *                 the back-off
     * @param words    sparse indicators (preposition, slot, word) for the verb, the first noun and the object
     * @param wordPairs sparse indicators (preposition, verb, object) and (preposition, first noun, object)
     * @param classes  the word itself (value 1) and its top {@code classes} neighbours as sparse (preposition, slot,
     *                 word) indicators valued (similarity / the first neighbour's similarity)^classPower; 0 for none
     * @param classPairs the top {@code classPairs} of the verb's and of the object's class (with the words
     *                 themselves), crossed as (preposition, verb class member, object class member), valued by the
     *                 product of their values; 0 for none
     * @param power    the power of the similarity in {@code rates}, {@code pooled} and {@code joint}
     * @param joint    per pair of slots, the cases of the quadruple and of the pair's triple with both words
     *                 replaced by the words themselves or their top {@code joint} neighbours; 0 for none
     * @param minSimilarity neighbours at or below this similarity are not read ({@code rates}, {@code pooled},
     *                 {@code joint})
     * @param slotK    per slot (verb, first noun, object), at most this many neighbours in {@code rates} and
     *                 {@code pooled}
     * @param classPower the power of the relative similarity in {@code classes} and {@code classPairs}
     * @param rateBins the {@code rates} log-odds again, split by how often the word itself was seen with the
     *                 preposition (never, 1 to 4 times, 5 or more)
     * @param prepositionRates the {@code rates} block again for each of the this many most frequent prepositions
     *                 (zero for the others)
     */
    record Variant(String name, boolean rates, boolean pooled, boolean smoothed, boolean words, boolean wordPairs,
                   int classes, int classPairs, double power, int joint, double minSimilarity, int[] slotK,
                   double classPower, boolean rateBins, int prepositionRates) {
        boolean thesaurus() {
            return rates || rateBins || pooled || smoothed || classes > 0 || classPairs > 0 || joint > 0;
        }

        /**
         * A variant from '+'-joined groups: {@code rates}, {@code pooled}, {@code smoothed}, {@code words},
         * {@code wordpairs}, {@code class=M}, {@code classpairs=C}, {@code power=P}; {@code backoff} for none.
         */
        static Variant parse(String spec) {
            boolean rates = false, pooled = false, smoothed = false, words = false, wordPairs = false;
            int classes = 0, classPairs = 0, joint = 0;
            double power = 1, minSimilarity = 0, classPower = 1;
            boolean rateBins = false;
            int prepositionRates = 0;
            int[] slotK = {Integer.MAX_VALUE, Integer.MAX_VALUE, Integer.MAX_VALUE};
            for (String group : spec.split("\\+")) {
                String[] kv = group.split("=", 2);
                switch (kv[0]) {
                    case "backoff" -> { }
                    case "rates" -> rates = true;
                    case "pooled" -> pooled = true;
                    case "smoothed" -> smoothed = true;
                    case "words" -> words = true;
                    case "wordpairs" -> wordPairs = true;
                    case "class" -> classes = Integer.parseInt(kv[1]);
                    case "classpairs" -> classPairs = Integer.parseInt(kv[1]);
                    case "power" -> power = Double.parseDouble(kv[1]);
                    case "cpower" -> classPower = Double.parseDouble(kv[1]);
                    case "ratebins" -> rateBins = true;
                    case "preprates" -> prepositionRates = Integer.parseInt(kv[1]);
                    case "joint" -> joint = Integer.parseInt(kv[1]);
                    case "minsim" -> minSimilarity = Double.parseDouble(kv[1]);
                    case "kv" -> slotK[0] = Integer.parseInt(kv[1]);
                    case "kn" -> slotK[1] = Integer.parseInt(kv[1]);
                    case "ko" -> slotK[2] = Integer.parseInt(kv[1]);
                    default -> throw new IllegalArgumentException("unknown feature group '" + group + "' in variant '"
                            + spec + "'; use backoff, rates, pooled, smoothed, words, wordpairs, class=M, classpairs=C, "
                            + "power=P, joint=C, minsim=S, kv=K, kn=K, ko=K, cpower=P, ratebins, preprates=N");
                }
            }
            return new Variant(spec, rates, pooled, smoothed, words, wordPairs, classes, classPairs, power, joint,
                    minSimilarity, slotK, classPower, rateBins, prepositionRates);
        }
    }

    private final WordNormalizer normalizer = new WordNormalizer();
    private final Map<String, Integer> prepositions = new HashMap<>();
    /** Per preposition index, its rank by frequency in training (0: the most frequent). */
    private int[] prepositionRank;
    private final Thesaurus thesaurus;
    private final int k;
    /** Normalized words of the training and development items, per slot class, to ids of the sparse features. */
    private final TObjectIntHashMap<String>[] wordIds;

    @SuppressWarnings("unchecked")
    private LearnedQuadrupleMeasurement(List<LabelledQuadruple> training, Thesaurus thesaurus, int k) {
        for (LabelledQuadruple lq : training) {
            prepositions.putIfAbsent(normalizer.preposition(lq.quadruple().preposition()), prepositions.size());
        }
        int[] frequency = new int[prepositions.size()];
        for (LabelledQuadruple lq : training) frequency[prepositions.get(normalizer.preposition(lq.quadruple().preposition()))]++;
        Integer[] order = new Integer[frequency.length];
        for (int i = 0; i < order.length; i++) order[i] = i;
        Arrays.sort(order, (a, b) -> frequency[b] != frequency[a] ? Integer.compare(frequency[b], frequency[a]) : Integer.compare(a, b));
        prepositionRank = new int[frequency.length];
        for (int r = 0; r < order.length; r++) prepositionRank[order[r]] = r;
        this.thesaurus = thesaurus;
        this.k = k;
        this.wordIds = new TObjectIntHashMap[HeadClass.values().length];
        for (int c = 0; c < wordIds.length; c++) wordIds[c] = new TObjectIntHashMap<>(1 << 14, 0.5f, -1);
    }

    /** Sparse rows of one variant: feature indices and values per row, and the label. */
    private static final class Rows {
        final List<int[]> index = new ArrayList<>();
        final List<double[]> value = new ArrayList<>();
        final List<Boolean> noun = new ArrayList<>();

        int size() {
            return index.size();
        }
    }

    /** The sparse features' indices: dense features first, then sparse keys in the order first seen in training. */
    private static final class FeatureIndex {
        final TLongIntHashMap sparse = new TLongIntHashMap(1 << 16, 0.5f, Long.MIN_VALUE, -1);
        final int dense;
        boolean frozen;

        FeatureIndex(int dense) {
            this.dense = dense;
        }

        /** The index of a sparse key; -1 once frozen for a key training never saw. */
        int of(long key) {
            int i = sparse.get(key);
            if (i >= 0 || frozen) return i;
            i = dense + sparse.size();
            sparse.put(key, i);
            return i;
        }

        int dimension() {
            return dense + sparse.size();
        }
    }

    /** One row's features as they are built; reused. */
    private static final class RowBuilder {
        int[] index = new int[256];
        double[] value = new double[256];
        int size;

        void add(int i, double v) {
            if (i < 0 || v == 0) return;
            if (size == index.length) {
                index = Arrays.copyOf(index, 2 * size);
                value = Arrays.copyOf(value, 2 * size);
            }
            index[size] = i;
            value[size++] = v;
        }
    }

    public static void main(String[] args) throws Exception {
        List<LabelledQuadruple> training = new QuadrupleReader(false).read(Path.of(args[0])).quadruples();
        List<LabelledQuadruple> dev = new QuadrupleReader(false).read(Path.of(args[1])).quadruples();
        Thesaurus thesaurus = ThesaurusFile.read(Path.of(args[2]));
        int k = args.length > 3 ? Integer.parseInt(args[3]) : 20;
        int stored = 0;
        for (int t = 0; t < thesaurus.size(); t++) stored = Math.max(stored, thesaurus.neighbourCount(t));
        if (k > stored) {
            System.out.printf("%s holds at most %d neighbours per word; k %d uses those%n", args[2], stored, k);
            k = stored;
        }
        List<Variant> variants = new ArrayList<>();
        for (int a = 4; a < args.length; a++) variants.add(Variant.parse(args[a]));
        if (variants.isEmpty()) {
            variants.add(Variant.parse("backoff"));
            variants.add(Variant.parse("backoff+rates"));
        }
        System.out.printf("fits: at most %d L-BFGS iterations, tolerance %s%n", ITERATIONS, TOLERANCE);
        LearnedQuadrupleMeasurement m = new LearnedQuadrupleMeasurement(training, thesaurus, k);
        QuadrupleCounts all = m.count(training);
        BackedOffScorer plain = new BackedOffScorer(all);
        int right = 0;
        for (LabelledQuadruple lq : dev) {
            Quadruple q = lq.quadruple();
            int[] e = all.encode(m.normalizer, q.verb(), q.noun1(), q.preposition(), q.noun2());
            if (plain.decide(e[0], e[1], e[2], e[3]).site() == lq.site()) right++;
        }
        System.out.printf("plain back-off on the development set: %.2f%% of %d%n", 100.0 * right / dev.size(), dev.size());
        QuadrupleCounts[] foldCounts = new QuadrupleCounts[FOLDS];
        List<List<LabelledQuadruple>> held = new ArrayList<>();
        for (int f = 0; f < FOLDS; f++) {
            List<LabelledQuadruple> rest = new ArrayList<>();
            List<LabelledQuadruple> in = new ArrayList<>();
            for (int i = 0; i < training.size(); i++) (i % FOLDS == f ? in : rest).add(training.get(i));
            foldCounts[f] = m.count(rest);
            held.add(in);
        }
        for (Variant variant : variants) {
            long start = System.nanoTime();
            FeatureIndex features = new FeatureIndex(m.denseSize(variant));
            Rows rows = new Rows();
            for (int f = 0; f < FOLDS; f++) {
                Evidence evidence = m.new Evidence(foldCounts[f], variant);
                for (LabelledQuadruple lq : held.get(f)) evidence.add(lq, rows, features);
            }
            features.frozen = true;
            Evidence evidence = m.new Evidence(all, variant);
            Rows devRows = new Rows();
            for (LabelledQuadruple lq : dev) evidence.add(lq, devRows, features);
            int d = features.dimension();
            boolean sparse = features.sparse.size() > 0;
            double[] sparseL2 = sparse ? SPARSE_L2 : new double[] {0};
            double[][] previous = new double[FOLDS + 1][];
            double bestFolds = -1, chosenDev = 0;
            String chosenL2 = "";
            for (double l2 : sparse ? Arrays.copyOf(L2, 2) : L2) {
                for (double l2s : sparseL2) {
                    String strength = sparse ? l2 + "/" + l2s : String.valueOf(l2);
                    int folded = 0;
                    for (int f = 0; f < FOLDS; f++) {
                        boolean[] fitted = new boolean[rows.size()];
                        for (int i = 0; i < fitted.length; i++) fitted[i] = i % FOLDS != f;
                        previous[f] = fit(rows, fitted, features.dense, d, l2, l2s, previous[f]);
                        for (int i = 0; i < fitted.length; i++) fitted[i] = !fitted[i];
                        folded += correct(previous[f], rows, fitted);
                    }
                    boolean[] everything = new boolean[rows.size()];
                    Arrays.fill(everything, true);
                    previous[FOLDS] = fit(rows, everything, features.dense, d, l2, l2s, previous[FOLDS]);
                    boolean[] allDev = new boolean[devRows.size()];
                    Arrays.fill(allDev, true);
                    double devAccuracy = (double) correct(previous[FOLDS], devRows, allDev) / devRows.size();
                    System.out.printf("%s (%d weights, %s), l2 %s: training folds %.2f%%, development set %.2f%%%n",
                            variant.name(), d, variant.thesaurus() ? "with thesaurus" : "no thesaurus", strength, 100.0 * folded / rows.size(), 100 * devAccuracy);
                    if (folded > bestFolds) {
                        bestFolds = folded;
                        chosenDev = devAccuracy;
                        chosenL2 = strength;
                    }
                }
            }
            System.out.printf("  %s: l2 chosen on the folds %s, training folds %.2f%%, development set %.2f%% (%.0f s)%n",
                    variant.name(), chosenL2, 100.0 * bestFolds / rows.size(), 100 * chosenDev,
                    (System.nanoTime() - start) / 1e9);
        }
    }

    private QuadrupleCounts count(List<LabelledQuadruple> items) {
        QuadrupleCountsBuilder b = new QuadrupleCountsBuilder();
        for (LabelledQuadruple lq : items) {
            Quadruple q = lq.quadruple();
            b.add(normalizer.verb(q.verb()), normalizer.noun(q.noun1()), normalizer.preposition(q.preposition()),
                    normalizer.noun(q.noun2()), lq.site(), 1.0);
        }
        return b.build();
    }

    private static double logOdds(double hits, double trials) {
        return Math.log((hits + 0.5) / (trials - hits + 0.5));
    }

    /** Number of dense features of a variant: the fixed blocks, the prepositions, the per-preposition rates. */
    private int denseSize(Variant variant) {
        return DENSE_PREPOSITIONS + prepositions.size() + 1 + RATES * variant.prepositionRates();
    }

    /** A sparse feature key: kind, preposition, slot (or pair), and up to two word ids (thesaurus or word ids). */
    private static long key(int kind, int preposition, int slot, int a, int b) {
        return ((long) kind << 60) | ((long) preposition << 50) | ((long) slot << 48) | ((long) a << 24) | b;
    }

    /** The features of one variant read from one set of counts. */
    private final class Evidence {
        final QuadrupleCounts c;
        final Variant variant;
        final ThesaurusIds ids;
        final BackedOffScorer backOff;
        final SimilarityBackedOffScorer smoothed;
        final double[] dense;
        final RowBuilder row = new RowBuilder();
        /** Per slot: the class members' thesaurus ids and weights (the word itself first, when the thesaurus holds it). */
        final int[][] members = new int[3][];
        final double[][] weights = new double[3][];
        final int[] memberCount = new int[3];

        Evidence(QuadrupleCounts c, Variant variant) {
            this.dense = new double[denseSize(variant)];
            this.c = c;
            this.variant = variant;
            this.ids = new ThesaurusIds(c.words(), thesaurus);
            this.backOff = new BackedOffScorer(c);
            this.smoothed = variant.smoothed() ? new SimilarityBackedOffScorer(c, thesaurus, normalizer, k,
                    SimilarityBackedOffScorer.MIN_TRIPLE_TRIALS, SimilarityBackedOffScorer.POWER,
                    SimilarityBackedOffScorer.PAIR_BLEND) : null;
            int most = 1 + Math.max(Math.max(variant.classes(), variant.classPairs()), variant.joint());
            for (int s = 0; s < 3; s++) {
                members[s] = new int[most];
                weights[s] = new double[most];
            }
        }

        void add(LabelledQuadruple lq, Rows rows, FeatureIndex features) {
            Quadruple q = lq.quadruple();
            Arrays.fill(dense, 0);
            row.size = 0;
            String[] keys = {normalizer.verb(q.verb()), normalizer.noun(q.noun1()), normalizer.noun(q.noun2())};
            int[] e = c.encode(normalizer, q.verb(), q.noun1(), q.preposition(), q.noun2());
            Integer pi = prepositions.get(normalizer.preposition(q.preposition()));
            dense[DENSE_PREPOSITIONS + (pi == null ? prepositions.size() : pi)] = 1;
            if (e[2] > 0) denseEvidence(e[0], e[1], e[2], e[3], keys);
            int rank = pi == null ? Integer.MAX_VALUE : prepositionRank[pi];
            if (rank < variant.prepositionRates()) {
                int at = DENSE_PREPOSITIONS + prepositions.size() + 1 + RATES * rank;
                System.arraycopy(dense, BACK_OFF, dense, at, RATES);
            }
            for (int j = 0; j < dense.length; j++) row.add(j, dense[j]);
            if (pi != null) sparseEvidence(pi, keys, features);
            rows.index.add(Arrays.copyOf(row.index, row.size));
            rows.value.add(Arrays.copyOf(row.value, row.size));
            rows.noun.add(lq.site() == AttachmentSite.NOUN);
        }

        private void denseEvidence(int v, int n1, int p, int n2, String[] keys) {
            double[] x = dense;
            for (int l = 0; l < LEVELS.length; l++) {
                if (!known(LEVELS[l], v, n1, n2)) continue;
                long f = c.table(p, LEVELS[l]).find(LEVELS[l].key(v, n1, n2));
                if (f == TupleCounts.ABSENT) continue;
                double hits = TupleCounts.hitsIn(f), trials = TupleCounts.trialsIn(f);
                x[3 * l] = 1;
                x[3 * l + 1] = logOdds(hits, trials);
                x[3 * l + 2] = Math.log1p(trials);
            }
            x[21] = 1;
            x[22] = logOdds(c.prepositionNounCount(p), c.prepositionCount(p));
            x[23] = Math.log1p(c.prepositionCount(p));
            QuadrupleDecision d = backOff.decide(v, n1, p, n2);
            x[24] = clippedLogOdds(d.nounProbability());
            x[25 + Math.min(4, d.basis().ordinal())] = 1;
            if (smoothed != null) {
                QuadrupleDecision s = smoothed.decide(v, n1, p, n2, keys[0], keys[1], keys[2], d);
                x[BACK_OFF + RATES + POOLED] = clippedLogOdds(s.nounProbability());
                x[BACK_OFF + RATES + POOLED + 1] = s.basis() == d.basis() ? 0 : 1;
            }
            int[] slotIds = {v, n1, n2};
            if (variant.joint() > 0) jointEvidence(slotIds, p, keys);
            if (!variant.rates() && !variant.pooled() && !variant.rateBins()) return;
            double[][] mean = new double[3][2]; // per level group: sum of similarity x rate, sum of similarity
            double[][] pool = new double[2][2]; // quadruple, triples: weighted hits, weighted trials
            for (int s = 0; s < 3; s++) {
                int t = ids.entry(SLOT_CLASSES[s], slotIds[s], keys[s]);
                if (t == Thesaurus.UNKNOWN) continue;
                for (double[] r : mean) Arrays.fill(r, 0);
                for (double[] r : pool) Arrays.fill(r, 0);
                for (int i = 0; i < Math.min(Math.min(k, variant.slotK()[s]), thesaurus.neighbourCount(t)); i++) {
                    int id = ids.countId(thesaurus.neighbourId(t, i));
                    if (id <= 0) continue;
                    double similarity = thesaurus.neighbourScore(t, i);
                    if (!(similarity > variant.minSimilarity())) break;
                    double weight = Math.pow(similarity, variant.power());
                    int sv = s == 0 ? id : v, sn1 = s == 1 ? id : n1, sn2 = s == 2 ? id : n2;
                    for (int l = 0; l < LEVELS.length; l++) {
                        if (!contains(LEVELS[l], s) || !known(LEVELS[l], sv, sn1, sn2)) continue;
                        long f = c.table(p, LEVELS[l]).find(LEVELS[l].key(sv, sn1, sn2));
                        if (f == TupleCounts.ABSENT || !(TupleCounts.trialsIn(f) > 0)) continue;
                        double hits = TupleCounts.hitsIn(f), trials = TupleCounts.trialsIn(f);
                        int group = l == 0 ? 0 : l <= 3 ? 1 : 2;
                        mean[group][0] += weight * (hits + 0.5) / (trials + 1);
                        mean[group][1] += weight;
                        if (group < 2) {
                            pool[group][0] += weight * hits;
                            pool[group][1] += weight * trials;
                        }
                    }
                }
                for (int group = 0; variant.rates() && group < 3; group++) {
                    if (!(mean[group][1] > 0)) continue;
                    double rate = mean[group][0] / mean[group][1];
                    int at = BACK_OFF + 9 * s + 3 * group;
                    x[at] = 1;
                    x[at + 1] = Math.log(rate / (1 - rate));
                    x[at + 2] = Math.log1p(mean[group][1]);
                }
                if (variant.rateBins()) {
                    double own = 0;
                    if (slotIds[s] > 0) own = c.table(p, LEVELS[4 + s]).trialsOf(LEVELS[4 + s].key(v, n1, n2));
                    int bin = own == 0 ? 0 : own < 5 ? 1 : 2;
                    for (int group = 0; group < 3; group++) {
                        if (!(mean[group][1] > 0)) continue;
                        double rate = mean[group][0] / mean[group][1];
                        int at = BACK_OFF + RATES + POOLED + SMOOTHED + JOINT + 18 * s + 6 * group + 2 * bin;
                        x[at] = 1;
                        x[at + 1] = Math.log(rate / (1 - rate));
                    }
                }
                for (int level = 0; variant.pooled() && level < 2; level++) {
                    if (!(pool[level][1] > 0)) continue;
                    int at = BACK_OFF + RATES + 6 * s + 3 * level;
                    x[at] = 1;
                    x[at + 1] = logOdds(pool[level][0], pool[level][1]);
                    x[at + 2] = Math.log1p(pool[level][1]);
                }
            }
        }

        /**
         * For each pair of slots, the cases of the quadruple and of the pair's triple with both words replaced by
         * members of their classes (the word itself and its top {@code joint} neighbours; not both the words
         * themselves), each weighted by the product of the similarities to the power.
         */
        private void jointEvidence(int[] slotIds, int p, String[] keys) {
            int top = variant.joint();
            for (int s = 0; s < 3; s++) {
                memberCount[s] = 0;
                int t = ids.entry(SLOT_CLASSES[s], slotIds[s], keys[s]);
                int n = 0;
                if (slotIds[s] > 0) {
                    members[s][n] = slotIds[s];
                    weights[s][n++] = 1;
                }
                if (t != Thesaurus.UNKNOWN) {
                    for (int i = 0; i < Math.min(top, thesaurus.neighbourCount(t)); i++) {
                        int id = ids.countId(thesaurus.neighbourId(t, i));
                        double similarity = thesaurus.neighbourScore(t, i);
                        if (!(similarity > variant.minSimilarity())) break;
                        if (id <= 0) continue;
                        members[s][n] = id;
                        weights[s][n++] = Math.pow(similarity, variant.power());
                    }
                }
                memberCount[s] = n;
            }
            for (int pair = 0; pair < 3; pair++) {
                int a = SLOT_PAIRS[pair][0], b = SLOT_PAIRS[pair][1], other = 3 - a - b; // a < b
                double qh = 0, qt = 0, th = 0, tt = 0;
                for (int i = 0; i < memberCount[a]; i++) {
                    for (int j = 0; j < memberCount[b]; j++) {
                        int wa = members[a][i], wb = members[b][j];
                        if (wa == slotIds[a] && wb == slotIds[b]) continue;
                        int sv = a == 0 ? wa : slotIds[0];
                        int sn1 = a == 1 ? wa : b == 1 ? wb : slotIds[1];
                        int sn2 = b == 2 ? wb : slotIds[2];
                        double w = weights[a][i] * weights[b][j];
                        long f = c.table(p, PAIR_TRIPLES[pair]).find(PAIR_TRIPLES[pair].key(sv, sn1, sn2));
                        if (f != TupleCounts.ABSENT) {
                            th += w * TupleCounts.hitsIn(f);
                            tt += w * TupleCounts.trialsIn(f);
                        }
                        if (slotIds[other] <= 0) continue;
                        f = c.table(p, SubTuple.VERB_NOUN1_NOUN2).find(SubTuple.VERB_NOUN1_NOUN2.key(sv, sn1, sn2));
                        if (f != TupleCounts.ABSENT) {
                            qh += w * TupleCounts.hitsIn(f);
                            qt += w * TupleCounts.trialsIn(f);
                        }
                    }
                }
                int at = BACK_OFF + RATES + POOLED + SMOOTHED + 6 * pair;
                if (qt > 0) {
                    dense[at] = 1;
                    dense[at + 1] = logOdds(qh, qt);
                    dense[at + 2] = Math.log1p(qt);
                }
                if (tt > 0) {
                    dense[at + 3] = 1;
                    dense[at + 4] = logOdds(th, tt);
                    dense[at + 5] = Math.log1p(tt);
                }
            }
        }

        private void sparseEvidence(int p, String[] keys, FeatureIndex features) {
            int[] word = new int[3];
            for (int s = 0; s < 3; s++) {
                TObjectIntHashMap<String> of = wordIds[SLOT_CLASSES[s].ordinal()];
                int id = of.get(keys[s]);
                if (id < 0) {
                    id = of.size();
                    of.put(keys[s], id);
                }
                word[s] = id;
            }
            if (variant.words()) {
                for (int s = 0; s < 3; s++) row.add(features.of(key(WORD, p, s, word[s], 0)), 1);
            }
            if (variant.wordPairs()) {
                row.add(features.of(key(WORD_PAIR, p, 0, word[0], word[2])), 1);
                row.add(features.of(key(WORD_PAIR, p, 1, word[1], word[2])), 1);
            }
            if (variant.classes() == 0 && variant.classPairs() == 0) return;
            int most = Math.max(variant.classes(), variant.classPairs());
            for (int s = 0; s < 3; s++) {
                memberCount[s] = 0;
                int t = thesaurus.id(SLOT_CLASSES[s], keys[s]);
                if (t == Thesaurus.UNKNOWN) continue;
                members[s][0] = t;
                weights[s][0] = 1;
                int n = 1;
                for (int i = 0; i < Math.min(most, thesaurus.neighbourCount(t)); i++) {
                    double similarity = thesaurus.neighbourScore(t, i);
                    if (!(similarity > 0)) continue;
                    members[s][n] = thesaurus.neighbourId(t, i);
                    weights[s][n++] = Math.pow(similarity / thesaurus.neighbourScore(t, 0), variant.classPower());
                }
                memberCount[s] = n;
            }
            for (int s = 0; s < 3; s++) {
                for (int i = 0; i < Math.min(memberCount[s], 1 + variant.classes()); i++) {
                    row.add(features.of(key(CLASS, p, s, members[s][i], 0)), weights[s][i]);
                }
            }
            int pairs = 1 + variant.classPairs();
            for (int i = 0; variant.classPairs() > 0 && i < Math.min(memberCount[0], pairs); i++) {
                for (int j = 0; j < Math.min(memberCount[2], pairs); j++) {
                    row.add(features.of(key(CLASS_PAIR, p, 0, members[0][i], members[2][j])), weights[0][i] * weights[2][j]);
                }
            }
        }
    }

    private static double clippedLogOdds(double p) {
        double pn = Math.min(0.999, Math.max(0.001, p));
        return Math.log(pn / (1 - pn));
    }

    private static boolean known(SubTuple part, int v, int n1, int n2) {
        return (!contains(part, 0) || v > 0) && (!contains(part, 1) || n1 > 0) && (!contains(part, 2) || n2 > 0);
    }

    /** Whether the tuple {@code part} holds slot {@code slot} (0 verb, 1 first noun, 2 object). */
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

    /**
     * Fits the weights on the rows marked in {@code fitted}, with L2 strength {@code l2} on the first {@code dense}
     * weights and {@code sparseL2} on the others, starting from {@code start} (zeros when null).
     */
    private static double[] fit(Rows rows, boolean[] fitted, int dense, int d, double l2, double sparseL2, double[] start) {
        int n = rows.size();
        int[][] index = rows.index.toArray(new int[0][]);
        double[][] value = rows.value.toArray(new double[0][]);
        boolean[] noun = new boolean[n];
        for (int i = 0; i < n; i++) noun[i] = rows.noun.get(i);
        DifferentiableFunction loss = new DifferentiableFunction() {
            @Override
            public int dimension() {
                return d;
            }

            @Override
            public double valueAndGradient(double[] w, double[] gradient) {
                Arrays.fill(gradient, 0);
                double total = 0;
                for (int i = 0; i < n; i++) {
                    if (!fitted[i]) continue;
                    int[] ix = index[i];
                    double[] x = value[i];
                    double z = 0;
                    for (int j = 0; j < ix.length; j++) z += w[ix[j]] * x[j];
                    double pn = 1 / (1 + Math.exp(-z));
                    total -= Math.log(Math.max(noun[i] ? pn : 1 - pn, 1e-12));
                    double r = pn - (noun[i] ? 1 : 0);
                    for (int j = 0; j < ix.length; j++) gradient[ix[j]] += r * x[j];
                }
                for (int j = 0; j < d; j++) {
                    double strength = j < dense ? l2 : sparseL2;
                    total += 0.5 * strength * w[j] * w[j];
                    gradient[j] += strength * w[j];
                }
                return total;
            }
        };
        Lbfgs.Result r = new Lbfgs(ITERATIONS, TOLERANCE).minimize(loss, start == null ? new double[d] : start);
        if (Boolean.getBoolean("tether.trace")) System.out.printf("    fit: %d iterations, converged %s, loss %.2f%n", r.iterations(), r.converged(), r.value());
        return r.x();
    }

    /** Rows marked in {@code counted} that the weights decide rightly. */
    private static int correct(double[] w, Rows rows, boolean[] counted) {
        int right = 0;
        for (int i = 0; i < rows.size(); i++) {
            if (!counted[i]) continue;
            int[] ix = rows.index.get(i);
            double[] x = rows.value.get(i);
            double z = 0;
            for (int j = 0; j < ix.length; j++) z += w[ix[j]] * x[j];
            if ((z >= 0) == rows.noun.get(i)) right++;
        }
        return right;
    }
}
