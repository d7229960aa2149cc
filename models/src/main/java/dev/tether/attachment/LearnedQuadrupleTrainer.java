package dev.tether.attachment;

import dev.tether.counts.QuadrupleCounts;
import dev.tether.ranking.CandidateFeatures;
import dev.tether.ranking.FeatureSpace;
import dev.tether.ranking.Lbfgs;
import dev.tether.ranking.RankerModel;
import dev.tether.ranking.RankerTrainer;
import dev.tether.ranking.RankingData;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.WordNormalizer;
import gnu.trove.list.array.TDoubleArrayList;
import gnu.trove.list.array.TIntArrayList;
import gnu.trove.list.array.TLongArrayList;

/**
 * Fits a {@link LearnedQuadrupleScorer} from labelled quadruples. Each quadruple's features come from the extractor of
 * its fold of the jackknife (counts without that fold), so that the weights learn how far to trust each level of
 * evidence for quadruples the counts have not seen; the L2 strength is chosen among {@link #STRENGTHS} by
 * cross-validation ({@link RankerTrainer}, which also fits the probabilities' temperature). Add quadruples in a
 * fixed order; the weights are then the same bits on every run.
 */
public final class LearnedQuadrupleTrainer {
    /** L2 strengths tried, chosen among by cross-validation (the grid of {@code LearnedQuadrupleMeasurement}). */
    public static final double[] STRENGTHS = {0.1, 1, 10};
    /**
     * Fewest labelled quadruples a model fits the scorer on; with fewer the weights of its few dozen features would
     * follow the noise of a handful of decisions (our choice: ten decisions per feature or so, a rule of thumb of
     * regression, common practice), and the back-off decides.
     */
    public static final int MIN_QUADRUPLES = 500;

    private final WordNormalizer normalizer;
    private final TIntArrayList gold = new TIntArrayList();
    private final TIntArrayList start = new TIntArrayList();
    private final TLongArrayList keys = new TLongArrayList();
    private final TDoubleArrayList values = new TDoubleArrayList();
    private final FeatureSpace.Counter counter = new FeatureSpace.Counter();
    private final CandidateFeatures buffer = new CandidateFeatures();

    public LearnedQuadrupleTrainer(WordNormalizer normalizer) {
        this.normalizer = normalizer;
    }

    /** Adds one training quadruple with the features {@code extractor} (its fold's) gives it. */
    public void add(LabelledQuadruple lq, QuadrupleFeatureExtractor extractor) {
        Quadruple q = lq.quadruple();
        String v = normalizer.verb(q.verb());
        String n1 = normalizer.noun(q.noun1());
        String n2 = normalizer.noun(q.noun2());
        QuadrupleCounts c = extractor.counts();
        extractor.extract(Math.max(0, c.words().id(v)), Math.max(0, c.words().id(n1)),
                Math.max(0, c.prepositions().id(normalizer.preposition(q.preposition()))), Math.max(0, c.words().id(n2)),
                v, n1, n2, buffer);
        counter.nextDecision();
        gold.add(lq.site() == AttachmentSite.NOUN ? 1 : 0);
        start.add(keys.size());
        for (int e = buffer.from(1); e < buffer.to(1); e++) {
            keys.add(buffer.key(e));
            values.add(buffer.value(e));
            counter.see(buffer.key(e));
        }
    }

    public int decisions() {
        return gold.size();
    }

    /** The scorer over {@code counts} (the model's) and {@code thesaurus} (null or the one the features read). */
    public LearnedQuadrupleScorer train(int neighbours, QuadrupleCounts counts, Thesaurus thesaurus, int threads) {
        if (gold.isEmpty()) throw new IllegalArgumentException("no labelled quadruples to fit the learned quadruple scorer on");
        FeatureSpace space = counter.build(key -> 1);
        RankingData data = new RankingData();
        int n = gold.size();
        for (int d = 0; d < n; d++) {
            data.startDecision(gold.get(d), 1.0);
            data.addCandidate();
            data.addCandidate();
            int end = d + 1 < n ? start.get(d + 1) : keys.size();
            for (int e = start.get(d); e < end; e++) data.addFeature(space.id(keys.get(e)), values.get(e));
        }
        RankerTrainer.Result r = new RankerTrainer(STRENGTHS, RankerTrainer.DEFAULT_FOLDS, new Lbfgs(3000, 1e-11))
                .threads(threads).train(data.seal(), space.size());
        RankerModel weights = new RankerModel(space, r.ranker(), r.l2(), r.trials(), n, r.temperature());
        return new LearnedQuadrupleScorer(weights, neighbours, counts, thesaurus, normalizer);
    }
}
