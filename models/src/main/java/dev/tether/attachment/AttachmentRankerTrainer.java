package dev.tether.attachment;

import dev.tether.ranking.CandidateFeatures;
import dev.tether.ranking.FeatureSpace;
import dev.tether.ranking.RankerModel;
import dev.tether.ranking.RankerTrainer;
import dev.tether.ranking.RankingData;
import gnu.trove.list.array.TDoubleArrayList;
import gnu.trove.list.array.TIntArrayList;
import gnu.trove.list.array.TLongArrayList;

/**
 * Trains the weights of an {@link AttachmentRanker} from head-choice examples. Each example's features are
 * extracted with the extractor of its fold (so its count statistics can come from the other folds), collected,
 * pruned to the keys seen in enough decisions ({@link AttachmentFeature#minimumDecisions}), and handed to a
 * {@link RankerTrainer}. Examples whose gold head is not among the candidates teach nothing and are left out.
 * Add examples in a fixed order; the result is then the same bits on every run.
 */
public final class AttachmentRankerTrainer {
    private final TIntArrayList gold = new TIntArrayList();
    private final TDoubleArrayList weights = new TDoubleArrayList();
    private final TIntArrayList decisionStart = new TIntArrayList();
    private final TIntArrayList candidateStart = new TIntArrayList();
    private final TLongArrayList keys = new TLongArrayList();
    private final TDoubleArrayList values = new TDoubleArrayList();
    private final FeatureSpace.Counter counter = new FeatureSpace.Counter();
    private final CandidateFeatures buffer = new CandidateFeatures();

    /** Adds one training decision, its features taken from {@code extractor}. */
    public void add(AttachmentExample example, double weight, AttachmentFeatureExtractor extractor) {
        if (example.gold() < 0) return;
        AttachmentQuery q = example.query();
        try {
            extractor.extract(q, buffer);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(example.source() + ": " + e.getMessage(), e);
        }
        counter.nextDecision();
        gold.add(example.gold());
        weights.add(weight);
        decisionStart.add(candidateStart.size());
        for (int c = 0; c < buffer.candidates(); c++) {
            candidateStart.add(keys.size());
            for (int e = buffer.from(c); e < buffer.to(c); e++) {
                keys.add(buffer.key(e));
                values.add(buffer.value(e));
                counter.see(buffer.key(e));
            }
        }
    }

    public int decisions() {
        return gold.size();
    }

    public RankerModel train(RankerTrainer trainer) {
        if (gold.isEmpty()) {
            throw new IllegalArgumentException("no usable training events for the attachment ranker (no treebank attachment "
                    + "whose gold head is among the candidates)");
        }
        FeatureSpace space = counter.build(key -> AttachmentFeature.of(key).minimumDecisions);
        RankingData data = new RankingData();
        int decisions = gold.size();
        for (int d = 0; d < decisions; d++) {
            data.startDecision(gold.get(d), weights.get(d));
            int firstCandidate = decisionStart.get(d);
            int endCandidate = d + 1 < decisions ? decisionStart.get(d + 1) : candidateStart.size();
            for (int c = firstCandidate; c < endCandidate; c++) {
                data.addCandidate();
                int end = c + 1 < candidateStart.size() ? candidateStart.get(c + 1) : keys.size();
                for (int e = candidateStart.get(c); e < end; e++) {
                    int id = space.id(keys.get(e));
                    if (id != FeatureSpace.ABSENT) data.addFeature(id, values.get(e));
                }
            }
        }
        RankerTrainer.Result r = trainer.train(data.seal(), space.size());
        return new RankerModel(space, r.ranker(), r.l2(), r.trials(), decisions, r.temperature());
    }
}
