package dev.tether.evaluation;

/**
 * Expected calibration error of stated probabilities: decisions are put into equal-width bins by the probability
 * they state, and the error is the average gap between each bin's accuracy and its mean stated probability,
 * weighted by the bin's share of decisions,
 * <pre>
 *   ECE = sum over bins b of  (n_b / N) * | accuracy(b) - confidence(b) |
 * </pre>
 * (Naeini, Cooper &amp; Hauskrecht 2015; Guo, Pleiss, Sun &amp; Weinberger 2017, with their bins
 * {@code ((b-1)/B, b/B]}, the first bin also holding 0). A small accumulator: not thread-safe.
 */
public final class CalibrationError {
    /** The number of bins used for {@code attachment.calibration_error}. */
    public static final int DEFAULT_BINS = 10;

    private final long[] counts;
    private final long[] correct;
    private final double[] stated;
    private long total;

    public CalibrationError() {
        this(DEFAULT_BINS);
    }

    public CalibrationError(int bins) {
        if (bins < 1) throw new IllegalArgumentException("a calibration needs at least one bin, got " + bins);
        counts = new long[bins];
        correct = new long[bins];
        stated = new double[bins];
    }

    /** Counts one decision that stated {@code probability} (in [0, 1]) and was {@code right} or not. */
    public void add(double probability, boolean right) {
        if (!(probability >= 0 && probability <= 1)) {
            throw new IllegalArgumentException("a probability lies in [0, 1], got " + probability);
        }
        int b = bin(probability);
        counts[b]++;
        if (right) correct[b]++;
        stated[b] += probability;
        total++;
    }

    /** The bin of {@code probability}: {@code ((b)/B, (b+1)/B]}, 0 included in the first. */
    public int bin(double probability) {
        int b = (int) Math.ceil(probability * counts.length) - 1;
        return Math.max(0, Math.min(counts.length - 1, b));
    }

    public int bins() { return counts.length; }
    public long total() { return total; }
    /** Decisions in bin {@code b}. */
    public long count(int b) { return counts[b]; }
    /** Right decisions in bin {@code b}. */
    public long correct(int b) { return correct[b]; }

    /** Fraction right in bin {@code b}; 0 for an empty bin. */
    public double accuracy(int b) {
        return counts[b] == 0 ? 0 : (double) correct[b] / counts[b];
    }

    /** Mean stated probability in bin {@code b}; 0 for an empty bin. */
    public double confidence(int b) {
        return counts[b] == 0 ? 0 : stated[b] / counts[b];
    }

    /** Lower edge of bin {@code b} (exclusive except for the first bin). */
    public double lowerEdge(int b) { return (double) b / counts.length; }
    /** Upper edge of bin {@code b} (inclusive). */
    public double upperEdge(int b) { return (double) (b + 1) / counts.length; }

    /** The expected calibration error; 0 when nothing was counted. */
    public double ece() {
        if (total == 0) return 0;
        double e = 0;
        for (int b = 0; b < counts.length; b++) {
            if (counts[b] > 0) e += (double) counts[b] / total * Math.abs(accuracy(b) - confidence(b));
        }
        return e;
    }
}
