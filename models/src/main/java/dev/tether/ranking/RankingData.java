package dev.tether.ranking;

import gnu.trove.list.array.TDoubleArrayList;
import gnu.trove.list.array.TIntArrayList;

/**
 * Training decisions for a {@link LogLinearRanker}, packed in flat primitive arrays: each decision has a gold
 * candidate, a weight and its candidates; each candidate a sparse feature vector of feature ids and values. Built
 * with {@link #startDecision} / {@link #addCandidate} / {@link #addFeature}, then read by index. Not thread-safe
 * while being built; read-only afterwards.
 */
public final class RankingData {
    private final TIntArrayList decisionStart = new TIntArrayList();   // first candidate of each decision
    private final TIntArrayList gold = new TIntArrayList();
    private final TDoubleArrayList weight = new TDoubleArrayList();
    private final TIntArrayList candidateStart = new TIntArrayList();  // first feature entry of each candidate
    private final TIntArrayList features = new TIntArrayList();
    private final TDoubleArrayList values = new TDoubleArrayList();
    private int featureCount;

    /** Opens a decision whose gold candidate is {@code goldIndex} (0-based among the candidates that follow). */
    public void startDecision(int goldIndex, double decisionWeight) {
        if (goldIndex < 0) throw new IllegalArgumentException("a training decision needs a gold candidate, got " + goldIndex);
        if (!(decisionWeight > 0) || Double.isInfinite(decisionWeight)) {
            throw new IllegalArgumentException("decision weight must be positive and finite, got " + decisionWeight);
        }
        closeCheck();
        decisionStart.add(candidateStart.size());
        gold.add(goldIndex);
        weight.add(decisionWeight);
    }

    /** Opens the next candidate of the current decision. */
    public void addCandidate() {
        if (decisionStart.isEmpty()) throw new IllegalStateException("addCandidate before startDecision");
        candidateStart.add(features.size());
    }

    /** Adds one feature to the current candidate. */
    public void addFeature(int feature, double value) {
        if (candidateStart.isEmpty()) throw new IllegalStateException("addFeature before addCandidate");
        if (feature < 0) throw new IllegalArgumentException("negative feature id " + feature);
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("feature " + feature + " has the value " + value + "; features must be finite");
        }
        features.add(feature);
        values.add(value);
        featureCount = Math.max(featureCount, feature + 1);
    }

    private void closeCheck() {
        if (!decisionStart.isEmpty()) {
            int d = decisionStart.size() - 1;
            int n = candidateStart.size() - decisionStart.get(d);
            if (gold.get(d) >= n) {
                throw new IllegalStateException("decision " + d + " has gold candidate " + gold.get(d) + " but only " + n + " candidates");
            }
        }
    }

    /** Checks the last decision; call before reading. */
    public RankingData seal() {
        closeCheck();
        return this;
    }

    public int decisions() { return decisionStart.size(); }
    /** One more than the largest feature id used. */
    public int featureCount() { return featureCount; }
    public int gold(int decision) { return gold.get(decision); }
    public double weight(int decision) { return weight.get(decision); }
    public int firstCandidate(int decision) { return decisionStart.get(decision); }
    public int endCandidate(int decision) {
        return decision + 1 < decisionStart.size() ? decisionStart.get(decision + 1) : candidateStart.size();
    }
    public int firstEntry(int candidate) { return candidateStart.get(candidate); }
    public int endEntry(int candidate) {
        return candidate + 1 < candidateStart.size() ? candidateStart.get(candidate + 1) : features.size();
    }
    public int feature(int entry) { return features.getQuick(entry); }
    public double value(int entry) { return values.getQuick(entry); }
}
