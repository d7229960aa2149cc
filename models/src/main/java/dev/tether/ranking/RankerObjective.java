package dev.tether.ranking;

/**
 * The training objective of a {@link LogLinearRanker}: the weighted negative conditional log-likelihood of the gold
 * candidates plus an L2 penalty,
 * <pre>
 *   L(w) = Σ_d  c_d · ( log Σ_i exp(w · x_di) − w · x_d,gold )  +  (λ / 2) · ||w||²
 *   ∂L/∂w = Σ_d  c_d · ( Σ_i p_di x_di − x_d,gold )  +  λ w
 * </pre>
 * over a chosen subset of the decisions (so cross-validation folds need no copies of the data). Decisions are
 * visited in index order, so the sums are the same bits on every run.
 */
public final class RankerObjective implements DifferentiableFunction {
    private final RankingData data;
    private final int[] decisions;
    private final double l2;
    private final int dimension;

    public RankerObjective(RankingData data, int[] decisions, double l2, int dimension) {
        if (l2 < 0 || !Double.isFinite(l2)) throw new IllegalArgumentException("L2 strength must be finite and non-negative, got " + l2);
        this.data = data;
        this.decisions = decisions.clone();
        this.l2 = l2;
        this.dimension = dimension;
    }

    @Override public int dimension() { return dimension; }

    /** The objective at {@code w}; its gradient is written into {@code gradient}. */
    @Override public double valueAndGradient(double[] w, double[] gradient) {
        java.util.Arrays.fill(gradient, 0);
        double loss = 0;
        double[] scores = new double[16];
        for (int d : decisions) {
            int first = data.firstCandidate(d);
            int n = data.endCandidate(d) - first;
            if (scores.length < n) scores = new double[Math.max(n, 2 * scores.length)];
            double max = Double.NEGATIVE_INFINITY;
            for (int c = 0; c < n; c++) {
                double s = 0;
                for (int e = data.firstEntry(first + c); e < data.endEntry(first + c); e++) s += w[data.feature(e)] * data.value(e);
                scores[c] = s;
                max = Math.max(max, s);
            }
            double sum = 0;
            for (int c = 0; c < n; c++) sum += Math.exp(scores[c] - max);
            double logZ = max + Math.log(sum);
            int g = data.gold(d);
            double weight = data.weight(d);
            loss += weight * (logZ - scores[g]);
            for (int c = 0; c < n; c++) {
                double coefficient = weight * (Math.exp(scores[c] - logZ) - (c == g ? 1 : 0));
                if (coefficient == 0) continue;
                for (int e = data.firstEntry(first + c); e < data.endEntry(first + c); e++) {
                    gradient[data.feature(e)] += coefficient * data.value(e);
                }
            }
        }
        double norm = 0;
        for (int f = 0; f < w.length; f++) {
            norm += w[f] * w[f];
            gradient[f] += l2 * w[f];
        }
        return loss + 0.5 * l2 * norm;
    }
}
