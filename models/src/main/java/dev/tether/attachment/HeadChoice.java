package dev.tether.attachment;

/**
 * The scored candidates of one {@link AttachmentQuery}: a probability for each (they sum to 1), the best one, and
 * for each candidate the most specific lexical statistic that was available ({@link Evidence}) with its counts.
 */
public final class HeadChoice {
    /** Which lexical statistic spoke for a candidate, most specific first. */
    public enum Evidence {
        HEAD_WITH_OBJECT, HEAD, CLASS_WITH_OBJECT, CLASS, NONE;

        public String label() {
            return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
        }
    }

    private final double[] probabilities;
    private final Evidence[] evidence;
    private final double[] hits;
    private final double[] trials;
    private final int best;
    private final int second;

    HeadChoice(double[] probabilities, Evidence[] evidence, double[] hits, double[] trials) {
        this.probabilities = probabilities;
        this.evidence = evidence;
        this.hits = hits;
        this.trials = trials;
        int b = -1;
        int s = -1;
        for (int i = 0; i < probabilities.length; i++) {
            if (b < 0 || probabilities[i] > probabilities[b]) {
                s = b;
                b = i;
            } else if (s < 0 || probabilities[i] > probabilities[s]) {
                s = i;
            }
        }
        this.best = b;
        this.second = s;
    }

    /** The same candidates and evidence with other probabilities (for example a ranker's). */
    HeadChoice withProbabilities(double[] p) {
        if (p.length != probabilities.length) throw new IllegalArgumentException(p.length + " probabilities for " + probabilities.length + " candidates");
        return new HeadChoice(p, evidence, hits, trials);
    }

    public int size() { return probabilities.length; }
    /** Index of the most probable candidate, -1 when there are none. */
    public int best() { return best; }
    /** Index of the runner-up, -1 when there is at most one candidate. */
    public int runnerUp() { return second; }
    public double probability(int i) { return probabilities[i]; }
    /** Probability of the best minus that of the runner-up (the best's probability when it stands alone). */
    public double margin() {
        if (best < 0) return 0;
        return second < 0 ? probabilities[best] : probabilities[best] - probabilities[second];
    }
    public Evidence evidence(int i) { return evidence[i]; }
    /** Times candidate {@code i}'s statistic was the gold head in training. */
    public double evidenceHits(int i) { return hits[i]; }
    /** Times candidate {@code i}'s statistic was a candidate in training. */
    public double evidenceTrials(int i) { return trials[i]; }

    /** Candidate indexes ordered by probability, best first (ties keep the nearer candidate first). */
    public int[] ranking() {
        int n = probabilities.length;
        int[] order = new int[n];
        for (int i = 0; i < n; i++) order[i] = i;
        for (int i = 1; i < n; i++) {
            int x = order[i];
            int j = i - 1;
            while (j >= 0 && probabilities[order[j]] < probabilities[x]) {
                order[j + 1] = order[j];
                j--;
            }
            order[j + 1] = x;
        }
        return order;
    }
}
