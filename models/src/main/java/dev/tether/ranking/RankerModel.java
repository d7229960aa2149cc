package dev.tether.ranking;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

/**
 * A trained ranker ready for use: the {@link FeatureSpace} that maps feature keys to ids, the weights, and what
 * training chose (the L2 strength, with the cross-validated figures of every strength tried, the number of training
 * decisions, and the temperature of the probabilities fitted on the held-out folds). Immutable and thread-safe; the scoring path reads primitive arrays and one primitive hash
 * map only.
 */
public final class RankerModel {
    private final FeatureSpace space;
    private final double[] weights;
    private final double l2;
    private final List<RankerTrainer.Trial> trials;
    private final int decisions;
    private final double temperature;

    public RankerModel(FeatureSpace space, LogLinearRanker ranker, double l2, List<RankerTrainer.Trial> trials, int decisions,
                       double temperature) {
        if (ranker.size() != space.size()) {
            throw new IllegalArgumentException(ranker.size() + " weights for " + space.size() + " features");
        }
        if (!(temperature > 0) || Double.isInfinite(temperature)) {
            throw new IllegalArgumentException("temperature must be positive and finite, got " + temperature);
        }
        this.temperature = temperature;
        this.space = space;
        this.weights = ranker.weightsCopy();
        this.l2 = l2;
        this.trials = List.copyOf(trials);
        this.decisions = decisions;
    }

    public FeatureSpace space() { return space; }
    public double l2() { return l2; }
    public List<RankerTrainer.Trial> trials() { return trials; }
    public int decisions() { return decisions; }
    public int size() { return weights.length; }
    /** The temperature T of the probabilities, {@code softmax(score / T)}, fitted on held-out folds (1: none). */
    public double temperature() { return temperature; }

    /** The weight of a feature key (0 for a key unknown to the model). */
    public double weightOf(long key) {
        int id = space.id(key);
        return id == FeatureSpace.ABSENT ? 0 : weights[id];
    }

    /** Writes the candidates' probabilities (softmax of their scores) into {@code out}. */
    public void probabilities(CandidateFeatures f, double[] out) {
        int n = f.candidates();
        for (int c = 0; c < n; c++) {
            double s = 0;
            for (int e = f.from(c); e < f.to(c); e++) {
                int id = space.id(f.key(e));
                if (id != FeatureSpace.ABSENT) s += weights[id] * f.value(e);
            }
            out[c] = s / temperature;
        }
        LogLinearRanker.softmax(out, n);
    }

    public void write(DataOutput out) throws IOException {
        space.write(out);
        for (double w : weights) out.writeDouble(w);
        out.writeDouble(l2);
        out.writeDouble(temperature);
        out.writeInt(decisions);
        out.writeInt(trials.size());
        for (RankerTrainer.Trial t : trials) {
            out.writeDouble(t.l2());
            out.writeDouble(t.logLoss());
            out.writeDouble(t.accuracy());
        }
    }

    public static RankerModel read(DataInput in) throws IOException {
        FeatureSpace space = FeatureSpace.read(in);
        double[] w = new double[space.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = in.readDouble();
            if (!Double.isFinite(w[i])) throw new IOException("ranker weight " + i + " is " + w[i]);
        }
        double l2 = in.readDouble();
        double temperature = in.readDouble();
        if (!(temperature > 0) || Double.isInfinite(temperature)) throw new IOException("ranker temperature is " + temperature);
        int decisions = in.readInt();
        int n = in.readInt();
        if (n < 0 || n > 1000) throw new IOException("implausible count of cross-validation trials " + n);
        List<RankerTrainer.Trial> trials = new ArrayList<>();
        for (int i = 0; i < n; i++) trials.add(new RankerTrainer.Trial(in.readDouble(), in.readDouble(), in.readDouble()));
        return new RankerModel(space, new LogLinearRanker(w), l2, trials, decisions, temperature);
    }

    @Override public boolean equals(Object o) {
        if (!(o instanceof RankerModel)) return false;
        RankerModel m = (RankerModel) o;
        return space.equals(m.space) && java.util.Arrays.equals(weights, m.weights) && l2 == m.l2
                && trials.equals(m.trials) && decisions == m.decisions && temperature == m.temperature;
    }
    @Override public int hashCode() { return space.hashCode() * 31 + java.util.Arrays.hashCode(weights); }
}
