package dev.tether.coordination;

/**
 * The ranker's answer for one coordinator: the probability of every candidate pair of conjunct heads, and for the
 * {@code k} likeliest pairs the probability that each of their modifiers is shared; those k readings are ordered by
 * their own probability, best first. A
 * reading is a pair with its modifiers shared where that is likelier than not; its probability is the pair's times
 * that of each scope decision.
 */
public final class CoordinationChoice {
    private final double[] pairProbabilities;
    private final int[] order;
    private final double[][] shared;
    /** The features that weigh most for the best reading against the runner-up; null until the ranker adds them. */
    private final CoordinationRanker.Pulls pulls;

    private CoordinationChoice(CoordinationChoice c, CoordinationRanker.Pulls pulls) {
        this.pairProbabilities = c.pairProbabilities;
        this.order = c.order;
        this.shared = c.shared;
        this.pulls = pulls;
    }

    CoordinationChoice(double[] pairProbabilities, int[] order, double[][] shared) {
        this.pulls = null;
        this.pairProbabilities = pairProbabilities;
        // The k readings, each its pair with its scope decisions, best first by the reading's probability (stable).
        int k = shared.length;
        Integer[] byReading = new Integer[k];
        double[] p = new double[k];
        for (int r = 0; r < k; r++) {
            byReading[r] = r;
            p[r] = pairProbabilities[order[r]];
            for (double s : shared[r]) p[r] *= Math.max(s, 1 - s);
        }
        java.util.Arrays.sort(byReading, (a, b) -> p[a] != p[b] ? Double.compare(p[b], p[a]) : Integer.compare(a, b));
        this.order = order.clone();
        this.shared = new double[k][];
        for (int r = 0; r < k; r++) {
            this.order[r] = order[byReading[r]];
            this.shared[r] = shared[byReading[r]];
        }
    }

    /** This choice with the pulls behind its best reading, for the evidence. */
    CoordinationChoice withPulls(CoordinationRanker.Pulls p) {
        return new CoordinationChoice(this, p);
    }

    CoordinationRanker.Pulls pulls() { return pulls; }

    /** Number of readings ranked with their scope (at most the k asked for). */
    public int readings() { return shared.length; }
    /** The candidate pair of the {@code r}-th reading, best first. */
    public int pair(int r) { return order[r]; }
    public double pairProbability(int r) { return pairProbabilities[order[r]]; }
    /** Probability that modifier {@code m} of the {@code r}-th reading's pair is shared. */
    public double sharedProbability(int r, int m) { return shared[r][m]; }
    public boolean isShared(int r, int m) { return shared[r][m] > 0.5; }

    /** The probability of the {@code r}-th reading: its pair's, times that of each of its scope decisions. */
    public double probability(int r) {
        double p = pairProbability(r);
        for (double s : shared[r]) p *= Math.max(s, 1 - s);
        return p;
    }

    /** Probability of the best reading minus that of the runner-up (the probability itself when alone). */
    public double margin() {
        return readings() > 1 ? probability(0) - probability(1) : probability(0);
    }
}
