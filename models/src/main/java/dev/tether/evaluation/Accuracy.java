package dev.tether.evaluation;

import org.apache.commons.math3.stat.interval.ConfidenceInterval;
import org.apache.commons.math3.stat.interval.WilsonScoreInterval;

/** Counts right and wrong decisions; reports the accuracy with a Wilson score 95% confidence interval. */
public final class Accuracy {
    private long correct;
    private long total;

    public void add(boolean right) {
        total++;
        if (right) correct++;
    }

    public long correct() { return correct; }
    public long total() { return total; }

    /** Fraction right; 0 when nothing was counted. */
    public double value() {
        return total == 0 ? 0 : (double) correct / total;
    }

    /** Lower and upper bound of the 95% Wilson score interval; {0, 0} when nothing was counted. */
    public double[] interval95() {
        if (total == 0) return new double[] {0, 0};
        ConfidenceInterval ci = new WilsonScoreInterval().createInterval((int) total, (int) correct, 0.95);
        return new double[] {ci.getLowerBound(), ci.getUpperBound()};
    }
}
