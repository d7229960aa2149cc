package dev.tether.ranking;

import java.util.Arrays;

/**
 * A conditional log-linear model over the candidates of one decision: candidate {@code i} with sparse features
 * {@code x_i} scores {@code s_i = w · x_i}, and its probability is the softmax {@code exp(s_i) / Σ_j exp(s_j)} over
 * the candidate set. Generic: it knows feature ids and values, not what they mean. Immutable and thread-safe.
 */
public final class LogLinearRanker {
    private final double[] weights;

    public LogLinearRanker(double[] weights) {
        for (int i = 0; i < weights.length; i++) {
            if (!Double.isFinite(weights[i])) throw new IllegalArgumentException("weight " + i + " is " + weights[i]);
        }
        this.weights = weights.clone();
    }

    public int size() { return weights.length; }
    public double weight(int feature) { return feature < weights.length ? weights[feature] : 0; }

    /** {@code w · x} over entries {@code from..to-1} of the parallel id/value arrays; ids outside the model count 0. */
    public double score(int[] ids, double[] values, int from, int to) {
        double s = 0;
        for (int k = from; k < to; k++) {
            int f = ids[k];
            if (f >= 0 && f < weights.length) s += weights[f] * values[k];
        }
        return s;
    }

    /** Turns scores into probabilities in place (softmax, stable for large scores). */
    public static void softmax(double[] scores, int n) {
        if (n == 0) return;
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) max = Math.max(max, scores[i]);
        double sum = 0;
        for (int i = 0; i < n; i++) {
            scores[i] = Math.exp(scores[i] - max);
            sum += scores[i];
        }
        for (int i = 0; i < n; i++) scores[i] /= sum;
    }

    /** The probabilities of the candidates of decision {@code d} of {@code data}. */
    public double[] probabilities(RankingData data, int d) {
        double[] p = scores(data, d);
        softmax(p, p.length);
        return p;
    }

    /** The scores {@code w · x} of the candidates of decision {@code d} of {@code data}. */
    public double[] scores(RankingData data, int d) {
        int first = data.firstCandidate(d);
        int n = data.endCandidate(d) - first;
        double[] p = new double[n];
        for (int c = 0; c < n; c++) {
            double s = 0;
            for (int e = data.firstEntry(first + c); e < data.endEntry(first + c); e++) s += weight(data.feature(e)) * data.value(e);
            p[c] = s;
        }
        return p;
    }

    double[] weightsCopy() { return weights.clone(); }

    @Override public boolean equals(Object o) {
        return o instanceof LogLinearRanker && Arrays.equals(weights, ((LogLinearRanker) o).weights);
    }
    @Override public int hashCode() { return Arrays.hashCode(weights); }
}
