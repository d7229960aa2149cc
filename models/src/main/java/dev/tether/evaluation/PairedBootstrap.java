package dev.tether.evaluation;

import org.apache.commons.math3.random.Well19937c;

import java.util.Arrays;

/**
 * The difference in accuracy between two methods scored on the same sentences, with a percentile interval from the
 * paired bootstrap (Efron &amp; Tibshirani 1993; for comparing systems on the same test sentences, Koehn 2004): each
 * resample draws as many sentences as there are, with replacement, and takes the second method's accuracy minus the
 * first's over the items of the drawn sentences. Sentences, not items, are drawn, because the items of one sentence
 * share its words and tags and are not independent. A fixed seed gives the same interval on every run.
 */
public final class PairedBootstrap {
    /** The observed difference (second − first) and the bounds of its interval at {@code level}. */
    public record Interval(double observed, double low, double high, double level, int resamples, long seed) {
    }

    private final int resamples;
    private final long seed;

    public PairedBootstrap(int resamples, long seed) {
        if (resamples < 1) throw new IllegalArgumentException("resamples must be at least 1, was " + resamples);
        this.resamples = resamples;
        this.seed = seed;
    }

    /**
     * The difference of each resample, in the order drawn (second − first; 0 for a resample without items).
     * Resamples of several test sets drawn with their own seeds can be averaged position by position: that is the
     * bootstrap of the mean difference over independent test sets.
     */
    public double[] resampledGains(SentenceOutcomes first, SentenceOutcomes second) {
        checkPaired(first, second);
        int n = first.sentences();
        int[] items = new int[n];
        int[] gain = new int[n];
        for (int s = 0; s < n; s++) {
            items[s] = first.itemsIn(s);
            gain[s] = second.rightIn(s) - first.rightIn(s);
        }
        Well19937c random = new Well19937c(seed);
        double[] out = new double[resamples];
        for (int r = 0; r < resamples; r++) {
            long total = 0;
            long difference = 0;
            for (int k = 0; k < n; k++) {
                int s = random.nextInt(n);
                total += items[s];
                difference += gain[s];
            }
            out[r] = total == 0 ? 0 : (double) difference / total;
        }
        return out;
    }

    /** The observed difference with the percentile interval of the resampled ones at {@code level} (e.g. 0.95). */
    public Interval gain(SentenceOutcomes first, SentenceOutcomes second, double level) {
        double observed = second.accuracy() - first.accuracy();
        double[] bounds = percentileBounds(resampledGains(first, second), level);
        return new Interval(observed, bounds[0], bounds[1], level, resamples, seed);
    }

    /**
     * The {@code (1 − level)/2} and {@code (1 + level)/2} order statistics of {@code values} (the percentile
     * interval): with 1,000 values and level 0.95, the 26th smallest and the 26th largest.
     */
    public static double[] percentileBounds(double[] values, double level) {
        if (!(level > 0 && level < 1)) throw new IllegalArgumentException("level must be in (0, 1), was " + level);
        if (values.length == 0) throw new IllegalArgumentException("no values");
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        int cut = (int) Math.floor((1 - level) / 2 * sorted.length);
        return new double[] {sorted[cut], sorted[sorted.length - 1 - cut]};
    }

    private static void checkPaired(SentenceOutcomes first, SentenceOutcomes second) {
        if (first.sentences() != second.sentences() || first.items() != second.items()) {
            throw new IllegalArgumentException("not the same sentences: " + first.sentences() + " sentences with "
                    + first.items() + " items against " + second.sentences() + " with " + second.items());
        }
        for (int s = 0; s < first.sentences(); s++) {
            if (first.itemsIn(s) != second.itemsIn(s)) {
                throw new IllegalArgumentException("sentence " + s + " has " + first.itemsIn(s) + " items in the first"
                        + " and " + second.itemsIn(s) + " in the second");
            }
        }
    }
}
