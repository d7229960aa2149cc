package dev.tether.evaluation;

import org.apache.commons.math3.distribution.BinomialDistribution;

/**
 * Two methods judged on the same items: how often only the first was right, only the second, and the exact two-sided
 * McNemar test of whether they differ (McNemar 1947): under the null hypothesis the discordant items split as a fair
 * coin, so {@code p = min(1, 2 · P(X ≤ min(b, c)))} with {@code X ~ Binomial(b + c, 1/2)}. A small accumulator.
 */
public final class PairedComparison {
    private long firstOnly;
    private long secondOnly;
    private long total;

    public void add(boolean firstRight, boolean secondRight) {
        total++;
        if (firstRight && !secondRight) firstOnly++;
        if (secondRight && !firstRight) secondOnly++;
    }

    /** Items only the first method got right. */
    public long firstOnly() { return firstOnly; }
    /** Items only the second method got right. */
    public long secondOnly() { return secondOnly; }
    public long total() { return total; }

    /** Exact two-sided McNemar p-value; 1 when no item is discordant. */
    public double pValue() {
        long n = firstOnly + secondOnly;
        if (n == 0) return 1;
        if (n > Integer.MAX_VALUE) throw new IllegalStateException("too many discordant items for the exact test: " + n);
        BinomialDistribution coin = new BinomialDistribution(null, (int) n, 0.5);
        return Math.min(1, 2 * coin.cumulativeProbability((int) Math.min(firstOnly, secondOnly)));
    }
}
