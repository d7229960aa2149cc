package dev.tether.ranking;

import org.junit.jupiter.api.Test;

import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The objective and its gradient, checked against worked examples and central finite differences. */
class RankerObjectiveTest {

    /** Random decisions of 1-6 candidates with 1-4 features each over {@code dimension} features. */
    static RankingData randomData(long seed, int decisions, int dimension) {
        Random random = new Random(seed);
        RankingData data = new RankingData();
        for (int d = 0; d < decisions; d++) {
            int n = 1 + random.nextInt(6);
            data.startDecision(random.nextInt(n), 0.5 + random.nextDouble());
            for (int c = 0; c < n; c++) {
                data.addCandidate();
                int k = 1 + random.nextInt(4);
                for (int j = 0; j < k; j++) data.addFeature(random.nextInt(dimension), random.nextGaussian());
            }
        }
        return data.seal();
    }

    static int[] all(RankingData data) {
        int[] d = new int[data.decisions()];
        for (int i = 0; i < d.length; i++) d[i] = i;
        return d;
    }

    @Test
    void gradientEqualsCentralFiniteDifferences() {
        int dimension = 12;
        RankingData data = randomData(7, 40, dimension);
        RankerObjective f = new RankerObjective(data, all(data), 0.7, dimension);
        Random random = new Random(11);
        double[] w = new double[dimension];
        for (int i = 0; i < dimension; i++) w[i] = random.nextGaussian();
        double[] g = new double[dimension];
        f.valueAndGradient(w, g);
        double h = 1e-5;
        double[] scratch = new double[dimension];
        for (int i = 0; i < dimension; i++) {
            double[] plus = w.clone();
            double[] minus = w.clone();
            plus[i] += h;
            minus[i] -= h;
            double numeric = (f.valueAndGradient(plus, scratch) - f.valueAndGradient(minus, scratch)) / (2 * h);
            assertEquals(numeric, g[i], 1e-6 * Math.max(1, Math.abs(numeric)), "gradient component " + i);
        }
    }

    @Test
    void zeroWeightsGiveTheLogOfTheCandidateCount() {
        // Worked example: with w = 0 every candidate has probability 1/n, so a decision costs c * ln n.
        RankingData data = new RankingData();
        data.startDecision(0, 1);
        data.addCandidate(); data.addFeature(0, 1);
        data.addCandidate(); data.addFeature(1, 1);
        data.startDecision(2, 2);
        data.addCandidate(); data.addFeature(0, 1);
        data.addCandidate(); data.addFeature(1, 1);
        data.addCandidate(); data.addFeature(1, -1);
        data.seal();
        double[] g = new double[2];
        double value = new RankerObjective(data, all(data), 5, 2).valueAndGradient(new double[2], g);
        assertEquals(Math.log(2) + 2 * Math.log(3), value, 1e-12);
        // Gradient: decision 1: p=(1/2,1/2) minus gold (1,0) -> feature0 -1/2, feature1 +1/2.
        // Decision 2 (weight 2): p=(1/3,1/3,1/3), gold third candidate (feature1 = -1):
        //   feature0: 2*(1/3), feature1: 2*(1/3 - 1/3 - (-1)) = 2.
        assertEquals(-0.5 + 2.0 / 3, g[0], 1e-12);
        assertEquals(0.5 + 2, g[1], 1e-12);
    }

    @Test
    void probabilitiesSumToOneAndFollowTheScores() {
        RankingData data = randomData(3, 30, 8);
        LogLinearRanker r = new LogLinearRanker(new double[] {0.3, -1.2, 2.5, 0, 4, -3, 0.1, 7});
        for (int d = 0; d < data.decisions(); d++) {
            double[] p = r.probabilities(data, d);
            double sum = 0;
            for (double x : p) {
                assertTrue(x >= 0 && x <= 1);
                sum += x;
            }
            assertEquals(1, sum, 1e-12, "decision " + d);
        }
        double[] large = {1000, 999, -1000};
        LogLinearRanker.softmax(large, 3);
        assertEquals(1 / (1 + Math.exp(-1)), large[0], 1e-12, "softmax stays finite for large scores");
    }
}
