package dev.tether.coordination;

import dev.tether.ranking.CandidateFeatures;
import dev.tether.ranking.FeatureSpace;
import dev.tether.ranking.RankerModel;
import dev.tether.ranking.RankerTrainer;
import dev.tether.ranking.RankingData;
import gnu.trove.list.array.TDoubleArrayList;
import gnu.trove.list.array.TIntArrayList;
import gnu.trove.list.array.TLongArrayList;

/**
 * Trains the two weight sets of a {@link CoordinationRanker} from {@link CoordinationExample}s, each example's
 * features taken from the extractor of its fold (counts of the other folds, as the attachment ranker's jackknife
 * does). Examples whose gold pair is not among the candidates teach the pair model nothing; their scope is not
 * learned either. Add examples in a fixed order for the same bits every run.
 */
public final class CoordinationRankerTrainer {
    private final Collected pairs = new Collected();
    private final Collected scope = new Collected();
    private final CandidateFeatures buffer = new CandidateFeatures();

    public void add(CoordinationExample e, CoordinationFeatureExtractor extractor) {
        if (e.gold() < 0) return;
        extractor.extractPairs(e.query(), buffer);
        pairs.add(buffer, e.gold());
        ConjunctPair gold = e.query().candidates().pair(e.gold());
        for (int m = 0; m < gold.modifiers().length; m++) {
            if (e.shared()[m] == null) continue;
            extractor.extractScope(e.query(), gold, gold.modifiers()[m], buffer);
            scope.add(buffer, e.shared()[m] ? 1 : 0);
        }
    }

    public int pairDecisions() { return pairs.gold.size(); }
    public int scopeDecisions() { return scope.gold.size(); }

    /** Trains both weight sets; {@code null} when there are no usable pair decisions. */
    public RankerModel[] train(RankerTrainer trainer) {
        if (pairs.gold.isEmpty()) return null;
        RankerModel p = pairs.train(trainer);
        RankerModel s = scope.gold.isEmpty() ? pairs.empty() : scope.train(trainer);
        return new RankerModel[] {p, s};
    }

    /** Decisions with their candidates' features, kept as packed keys until the feature space is known. */
    private static final class Collected {
        final TIntArrayList gold = new TIntArrayList();
        final TIntArrayList decisionStart = new TIntArrayList();
        final TIntArrayList candidateStart = new TIntArrayList();
        final TLongArrayList keys = new TLongArrayList();
        final TDoubleArrayList values = new TDoubleArrayList();
        final FeatureSpace.Counter counter = new FeatureSpace.Counter();

        void add(CandidateFeatures f, int goldIndex) {
            counter.nextDecision();
            gold.add(goldIndex);
            decisionStart.add(candidateStart.size());
            for (int c = 0; c < f.candidates(); c++) {
                candidateStart.add(keys.size());
                for (int e = f.from(c); e < f.to(c); e++) {
                    keys.add(f.key(e));
                    values.add(f.value(e));
                    counter.see(f.key(e));
                }
            }
        }

        RankerModel train(RankerTrainer trainer) {
            FeatureSpace space = counter.build(key -> CoordinationFeature.of(key).minimumDecisions);
            RankingData data = new RankingData();
            int n = gold.size();
            for (int d = 0; d < n; d++) {
                data.startDecision(gold.get(d), 1.0);
                int first = decisionStart.get(d);
                int end = d + 1 < n ? decisionStart.get(d + 1) : candidateStart.size();
                for (int c = first; c < end; c++) {
                    data.addCandidate();
                    int to = c + 1 < candidateStart.size() ? candidateStart.get(c + 1) : keys.size();
                    for (int e = candidateStart.get(c); e < to; e++) {
                        int id = space.id(keys.get(e));
                        if (id != FeatureSpace.ABSENT) data.addFeature(id, values.get(e));
                    }
                }
            }
            RankerTrainer.Result r = trainer.train(data.seal(), space.size());
            return new RankerModel(space, r.ranker(), r.l2(), r.trials(), n, r.temperature());
        }

        RankerModel empty() {
            return new RankerModel(FeatureSpace.of(new long[0]), new dev.tether.ranking.LogLinearRanker(new double[0]), 0,
                    java.util.List.of(), 0, 1);
        }
    }
}
