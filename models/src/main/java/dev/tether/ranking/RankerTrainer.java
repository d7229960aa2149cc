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
    public static final double[] DEFAULT_STRENGTHS = {1, 3, 10, 30};
    public static final int DEFAULT_FOLDS = 5;

    private final double[] strengths;
    private final int folds;
    private final Lbfgs optimizer;
    private int threads = Math.min(2, Runtime.getRuntime().availableProcessors());

    public RankerTrainer() {
        this(DEFAULT_STRENGTHS, DEFAULT_FOLDS, new Lbfgs(400, 1e-7));
    }

    /** How many fits run at once during cross-validation; the result does not depend on it. */
    public RankerTrainer threads(int n) {
        this.threads = Math.max(1, n);
        return this;
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
    /**
     * The trained ranker, the strength chosen, what cross-validation measured for each strength, and the temperature
     * fitted on the held-out folds at that strength (1 without cross-validation).
     */
    public record Result(LogLinearRanker ranker, double l2, List<Trial> trials, int iterations, double temperature) {
    }

    public Result train(RankingData data, int dimension) {
        return train(data, dimension, null, null);
    }

    /**
     * As {@link #train(RankingData, int)}, with the temperature fitted on {@code calibration} instead of the training
     * decisions themselves: decisions as the run time will see them (for example the same sentences with tags from a
     * tagger that did not see them), each scored by the cross-validation ranker that did not see the training decision
     * at {@code positions[d]} (its place in {@code data}, so a calibration decision is held out exactly as its training
     * counterpart is). Null or empty {@code calibration}: the held-out training decisions, as without it.
     */
    public Result train(RankingData data, int dimension, RankingData calibration, int[] positions) {
        data.seal();
        int n = data.decisions();
        if (n == 0) throw new IllegalArgumentException("no training decisions: nothing to train the ranker on");
        List<Trial> trials = new ArrayList<>();
        double chosen = strengths[0];
        double temperature = 1;
        if (strengths.length > 1) {
            int k = Math.min(folds, n);
            // Every (strength, fold) fit is independent and deterministic, so they may run in parallel; the
            // held-out sums are then added in a fixed order.
            double[][][] heldOut = new double[strengths.length][k][];
            LogLinearRanker[][] foldRankers = new LogLinearRanker[strengths.length][k];
            java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(threads);
            try {
                List<java.util.concurrent.Future<LogLinearRanker[]>> futures = new ArrayList<>();
                for (int f = 0; f < k; f++) {
                    int from = (int) ((long) n * f / k);
                    int to = (int) ((long) n * (f + 1) / k);
                    futures.add(pool.submit(() -> foldPath(data, from, to, n, dimension)));
                }
                for (int f = 0; f < k; f++) {
                    LogLinearRanker[] path = futures.get(f).get();
                    int from = (int) ((long) n * f / k);
                    int to = (int) ((long) n * (f + 1) / k);
                    for (int s = 0; s < strengths.length; s++) {
                        foldRankers[s][f] = path[s];
                        heldOut[s][f] = heldOut(data, path[s], from, to);
                    }
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("ranker training was interrupted", e);
            } catch (java.util.concurrent.ExecutionException e) {
                throw new IllegalStateException("ranker training failed: " + e.getCause().getMessage(), e.getCause());
            } finally {
                pool.shutdownNow();
            }
            double bestLoss = Double.POSITIVE_INFINITY;
            int chosenIndex = 0;
            for (int s = 0; s < strengths.length; s++) {
                double loss = 0;
                double right = 0;
                double weight = 0;
                for (int f = 0; f < k; f++) {
                    loss += heldOut[s][f][0];
                    right += heldOut[s][f][1];
                    weight += heldOut[s][f][2];
                }
                trials.add(new Trial(strengths[s], loss / weight, right / weight));
                if (loss < bestLoss) {
                    bestLoss = loss;
                    chosen = strengths[s];
                    chosenIndex = s;
                }
            }
            temperature = calibration != null && calibration.seal().decisions() > 0
                    ? fitTemperature(calibration, positions, n, foldRankers[chosenIndex], k)
                    : fitTemperature(data, foldRankers[chosenIndex], k);
        }
        Fit all = fit(data, range(0, 0, n), chosen, dimension);
        return new Result(all.ranker, chosen, trials, all.iterations, temperature);
    }

    private record Fit(LogLinearRanker ranker, int iterations) {
    }

    private Fit fit(RankingData data, int[] decisions, double l2, int dimension) {
        return fit(data, decisions, l2, new double[dimension]);
    }

    private Fit fit(RankingData data, int[] decisions, double l2, double[] start) {
        RankerObjective objective = new RankerObjective(data, decisions, l2, start.length);
        Lbfgs.Result r = optimizer.minimize(objective, start);
        return new Fit(new LogLinearRanker(r.x()), r.iterations());
    }

    /**
     * The held-out figures of every strength for one fold, fitted from the strongest penalty to the weakest, each
     * starting from the previous solution (a regularization path: fewer iterations, same order every run).
     */
    private LogLinearRanker[] foldPath(RankingData data, int from, int to, int n, int dimension) {
        int[] training = range(from, to, n);
        Integer[] order = new Integer[strengths.length];
        for (int s = 0; s < order.length; s++) order[s] = s;
        Arrays.sort(order, (x, y) -> Double.compare(strengths[y], strengths[x]));
        LogLinearRanker[] out = new LogLinearRanker[strengths.length];
        double[] start = new double[dimension];
        for (int s : order) {
            out[s] = fit(data, training, strengths[s], start).ranker;
            start = out[s].weightsCopy();
        }
        return out;
    }

    /**
     * Temperature scaling (Guo et al. 2017) fitted on held-out folds: the {@code T} that maximizes the likelihood of
     * every decision's gold candidate under {@code softmax(s / T)}, where {@code s} are the decision's scores from the
     * ranker that did not see its fold. The likelihood is concave in {@code 1/T}, so a golden-section search finds it.
     */
    private static double fitTemperature(RankingData data, LogLinearRanker[] foldRankers, int k) {
        int n = data.decisions();
        double[][] scores = new double[n][];
        int[] gold = new int[n];
        double[] weights = new double[n];
        for (int f = 0; f < k; f++) {
            int from = (int) ((long) n * f / k);
            int to = (int) ((long) n * (f + 1) / k);
            for (int d = from; d < to; d++) {
                scores[d] = foldRankers[f].scores(data, d);
                gold[d] = data.gold(d);
                weights[d] = data.weight(d);
            }
        }
        return 1 / fitInverseTemperature(scores, gold, weights);
    }

    /**
     * Temperature scaling fitted on calibration decisions: decision {@code d} is scored by the fold ranker of the fold
     * that holds training position {@code positions[d]} (folds as in {@link #train}, over {@code n} training decisions).
     */
    private static double fitTemperature(RankingData calibration, int[] positions, int n, LogLinearRanker[] foldRankers, int k) {
        int m = calibration.decisions();
        if (positions == null || positions.length != m) {
            throw new IllegalArgumentException("give one training position per calibration decision (" + m + ")");
        }
        double[][] scores = new double[m][];
        int[] gold = new int[m];
        double[] weights = new double[m];
        for (int d = 0; d < m; d++) {
            if (positions[d] < 0 || positions[d] >= n) {
                throw new IllegalArgumentException("calibration decision " + d + " names training position " + positions[d]
                        + ", outside the " + n + " training decisions");
            }
            int f = 0;
            while (f + 1 < k && (int) ((long) n * (f + 1) / k) <= positions[d]) f++;
            scores[d] = foldRankers[f].scores(calibration, d);
            gold[d] = calibration.gold(d);
            weights[d] = calibration.weight(d);
        }
        return 1 / fitInverseTemperature(scores, gold, weights);
    }

    /** The {@code β = 1/T} in [1/8, 8] that minimizes {@code Σ c_d · (log Σ_i exp(β s_di) − β s_d,gold)}. */
    static double fitInverseTemperature(double[][] scores, int[] gold, double[] weights) {
        double lo = 0.125;
        double hi = 8;
        double ratio = (Math.sqrt(5) - 1) / 2;
        double a = hi - ratio * (hi - lo);
        double b = lo + ratio * (hi - lo);
        double fa = scaledLoss(scores, gold, weights, a);
        double fb = scaledLoss(scores, gold, weights, b);
        for (int i = 0; i < 80; i++) {
            if (fa <= fb) {
                hi = b;
                b = a;
                fb = fa;
                a = hi - ratio * (hi - lo);
                fa = scaledLoss(scores, gold, weights, a);
            } else {
                lo = a;
                a = b;
                fa = fb;
                b = lo + ratio * (hi - lo);
                fb = scaledLoss(scores, gold, weights, b);
            }
        }
        return (lo + hi) / 2;
    }

    private static double scaledLoss(double[][] scores, int[] gold, double[] weights, double beta) {
        double loss = 0;
        for (int d = 0; d < scores.length; d++) {
            double max = Double.NEGATIVE_INFINITY;
            for (double s : scores[d]) max = Math.max(max, beta * s);
            double sum = 0;
            for (double s : scores[d]) sum += Math.exp(beta * s - max);
            loss += weights[d] * (max + Math.log(sum) - beta * scores[d][gold[d]]);
        }
        return loss;
    }

    /** Decisions {@code 0..n-1} without {@code [from, to)}. */
    private static int[] range(int from, int to, int n) {
        int[] out = new int[n - (to - from)];
        int k = 0;
        for (int d = 0; d < n; d++) if (d < from || d >= to) out[k++] = d;
        return Arrays.copyOf(out, k);
    }

    /** Weighted log-loss, weighted right answers and total weight of decisions {@code [from, to)}. */
    private static double[] heldOut(RankingData data, LogLinearRanker r, int from, int to) {
        double loss = 0;
        double right = 0;
        double weight = 0;
        for (int d = from; d < to; d++) {
            double[] p = r.probabilities(data, d);
            double c = data.weight(d);
            loss -= c * Math.log(Math.max(p[data.gold(d)], 1e-300));
            weight += c;
            if (argmax(p) == data.gold(d)) right += c;
        }
        return new double[] {loss, right, weight};
    }

    /** Index of the largest value; the first on ties (candidates are ordered nearest first). */
    public static int argmax(double[] p) {
        int best = 0;
        for (int i = 1; i < p.length; i++) if (p[i] > p[best]) best = i;
        return best;
    }
}
