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
 * Calibration decisions ({@link #addCalibration}) only fit the temperature of the probabilities.
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
    /** Calibration decisions: the same layout, and the training position each stands beside. */
    private final TIntArrayList calibrationGold = new TIntArrayList();
    private final TIntArrayList calibrationPosition = new TIntArrayList();
    private final TIntArrayList calibrationDecisionStart = new TIntArrayList();
    private final TIntArrayList calibrationCandidateStart = new TIntArrayList();
    private final TLongArrayList calibrationKeys = new TLongArrayList();
    private final TDoubleArrayList calibrationValues = new TDoubleArrayList();

    /**
     * Adds one training decision, its features taken from {@code extractor}; returns its position among the training
     * decisions, or -1 when it teaches nothing (its gold head is not among the candidates).
     */
    public int add(AttachmentExample example, double weight, AttachmentFeatureExtractor extractor) {
        if (example.gold() < 0) return -1;
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
        return gold.size() - 1;
    }

    /**
     * Adds a decision the temperature is fitted on, not the weights: {@code example} as the run time would see it (the
     * same phrase with other tags, say), held out as the training decision at {@code position} is. Its features come
     * from the same {@code extractor} as that decision's; features the training decisions never had are dropped.
     * Skipped when its gold head is not among its candidates.
     */
    public void addCalibration(AttachmentExample example, int position, AttachmentFeatureExtractor extractor) {
        if (example.gold() < 0 || position < 0) return;
        try {
            extractor.extract(example.query(), buffer);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(example.source() + ": " + e.getMessage(), e);
        }
        calibrationGold.add(example.gold());
        calibrationPosition.add(position);
        calibrationDecisionStart.add(calibrationCandidateStart.size());
        for (int c = 0; c < buffer.candidates(); c++) {
            calibrationCandidateStart.add(calibrationKeys.size());
            for (int e = buffer.from(c); e < buffer.to(c); e++) {
                calibrationKeys.add(buffer.key(e));
                calibrationValues.add(buffer.value(e));
            }
        }
    }

    public int calibrationDecisions() {
        return calibrationGold.size();
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
        RankingData calibration = new RankingData();
        int m = calibrationGold.size();
        for (int d = 0; d < m; d++) {
            calibration.startDecision(calibrationGold.get(d), 1.0);
            int firstCandidate = calibrationDecisionStart.get(d);
            int endCandidate = d + 1 < m ? calibrationDecisionStart.get(d + 1) : calibrationCandidateStart.size();
            for (int c = firstCandidate; c < endCandidate; c++) {
                calibration.addCandidate();
                int end = c + 1 < calibrationCandidateStart.size() ? calibrationCandidateStart.get(c + 1) : calibrationKeys.size();
                for (int e = calibrationCandidateStart.get(c); e < end; e++) {
                    int id = space.id(calibrationKeys.get(e));
                    if (id != FeatureSpace.ABSENT) calibration.addFeature(id, calibrationValues.get(e));
                }
            }
        }
        RankerTrainer.Result r = trainer.train(data.seal(), space.size(), m > 0 ? calibration : null, calibrationPosition.toArray());
        return new RankerModel(space, r.ranker(), r.l2(), r.trials(), decisions, r.temperature());
    }
}
