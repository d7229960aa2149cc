package dev.tether.ranking;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Trains a {@link LogLinearRanker}: the L2 strength is chosen by k-fold cross-validation on the training decisions
 * (contiguous folds, so decisions from one document tend to stay together), by held-out log-likelihood, and the
 * final weights are fitted on all decisions with that strength. Everything runs in a fixed order from a zero
 * start, so the same data give the same weights bit for bit.
 */
public final class RankerTrainer {
    /** Default L2 strengths tried, in order. */
    public static final double[] DEFAULT_STRENGTHS = {0.1, 0.3, 1, 3, 10};
    public static final int DEFAULT_FOLDS = 5;

    private final double[] strengths;
    private final int folds;
    private final Lbfgs optimizer;

    public RankerTrainer() {
        this(DEFAULT_STRENGTHS, DEFAULT_FOLDS, new Lbfgs(400, 1e-7));
    }

    public RankerTrainer(double[] strengths, int folds, Lbfgs optimizer) {
        if (strengths.length == 0) throw new IllegalArgumentException("give at least one L2 strength");
        if (folds < 2 && strengths.length > 1) throw new IllegalArgumentException("choosing among strengths needs at least 2 folds");
        this.strengths = strengths.clone();
        this.folds = folds;
        this.optimizer = optimizer;
    }

    /** Held-out figures of one L2 strength. */
    public record Trial(double l2, double logLoss, double accuracy) {
    }

    /** The trained ranker, the strength chosen and what cross-validation measured for each strength. */
    public record Result(LogLinearRanker ranker, double l2, List<Trial> trials, int iterations) {
    }

    public Result train(RankingData data, int dimension) {
        data.seal();
        int n = data.decisions();
        if (n == 0) throw new IllegalArgumentException("no training decisions: nothing to train the ranker on");
        List<Trial> trials = new ArrayList<>();
        double chosen = strengths[0];
        if (strengths.length > 1) {
            int k = Math.min(folds, n);
            double bestLoss = Double.POSITIVE_INFINITY;
            for (double l2 : strengths) {
                double loss = 0;
                double weight = 0;
                double right = 0;
                for (int f = 0; f < k; f++) {
                    int from = (int) ((long) n * f / k);
                    int to = (int) ((long) n * (f + 1) / k);
                    LogLinearRanker r = fit(data, range(0, from, to, n), l2, dimension).ranker;
                    for (int d = from; d < to; d++) {
                        double[] p = r.probabilities(data, d);
                        double c = data.weight(d);
                        loss -= c * Math.log(Math.max(p[data.gold(d)], 1e-300));
                        weight += c;
                        if (argmax(p) == data.gold(d)) right += c;
                    }
                }
                trials.add(new Trial(l2, loss / weight, right / weight));
                if (loss < bestLoss) {
                    bestLoss = loss;
                    chosen = l2;
                }
            }
        }
        Fit all = fit(data, range(0, 0, 0, n), chosen, dimension);
        return new Result(all.ranker, chosen, trials, all.iterations);
    }

    private record Fit(LogLinearRanker ranker, int iterations) {
    }

    private Fit fit(RankingData data, int[] decisions, double l2, int dimension) {
        RankerObjective objective = new RankerObjective(data, decisions, l2, dimension);
        Lbfgs.Result r = optimizer.minimize(objective, new double[dimension]);
        return new Fit(new LogLinearRanker(r.x()), r.iterations());
    }

    /** Decisions {@code 0..n-1} without {@code [from, to)}. */
    private static int[] range(int start, int from, int to, int n) {
        int[] out = new int[n - (to - from)];
        int k = 0;
        for (int d = start; d < n; d++) if (d < from || d >= to) out[k++] = d;
        return Arrays.copyOf(out, k);
    }

    /** Index of the largest value; the first on ties (candidates are ordered nearest first). */
    public static int argmax(double[] p) {
        int best = 0;
        for (int i = 1; i < p.length; i++) if (p[i] > p[best]) best = i;
        return best;
    }
}
