package dev.tether.ranking;

import org.junit.jupiter.api.Test;

import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class RankerTrainerTest {

    /**
     * A separable set: the gold candidate is always the one whose feature 0 is largest, with noise features beside
     * it. A log-linear model can rank it perfectly.
     */
    private static RankingData separable(long seed, int decisions) {
        Random random = new Random(seed);
        RankingData data = new RankingData();
        for (int d = 0; d < decisions; d++) {
            int n = 2 + random.nextInt(4);
            double[] signal = new double[n];
            int gold = 0;
            for (int c = 0; c < n; c++) {
                signal[c] = random.nextDouble();
                if (signal[c] > signal[gold]) gold = c;
            }
            data.startDecision(gold, 1);
            for (int c = 0; c < n; c++) {
                data.addCandidate();
                data.addFeature(0, c == gold ? signal[c] + 0.5 : signal[c]);
                data.addFeature(1 + random.nextInt(3), random.nextGaussian());
            }
        }
        return data.seal();
    }

    @Test
    void learnsASeparableToySetPerfectly() {
        RankingData data = separable(5, 300);
        RankerTrainer.Result result = new RankerTrainer(new double[] {1e-3}, 1, new Lbfgs(500, 1e-10)).train(data, 4);
        for (int d = 0; d < data.decisions(); d++) {
            assertEquals(data.gold(d), RankerTrainer.argmax(result.ranker().probabilities(data, d)), "decision " + d);
        }
        assertTrue(result.ranker().weight(0) > 0, "the signal feature gets a positive weight");
    }

    @Test
    void strongerL2ShrinksTheWeights() {
        RankingData data = RankerObjectiveTest.randomData(9, 200, 10);
        double previous = Double.POSITIVE_INFINITY;
        for (double l2 : new double[] {0.01, 1, 100, 10000}) {
            LogLinearRanker r = new RankerTrainer(new double[] {l2}, 1, new Lbfgs(500, 1e-10)).train(data, 10).ranker();
            double norm = 0;
            for (int f = 0; f < 10; f++) norm += r.weight(f) * r.weight(f);
            assertTrue(norm < previous, "norm " + norm + " at L2 " + l2 + " should be below " + previous);
            previous = norm;
        }
        assertTrue(previous < 1e-3, "a very strong penalty drives the weights towards zero: " + previous);
    }

    @Test
    void optimumHasAVanishingGradient() {
        RankingData data = RankerObjectiveTest.randomData(13, 150, 6);
        LogLinearRanker r = new RankerTrainer(new double[] {0.5}, 1, new Lbfgs(500, 1e-12)).train(data, 6).ranker();
        double[] g = new double[6];
        double[] w = new double[6];
        for (int f = 0; f < 6; f++) w[f] = r.weight(f);
        new RankerObjective(data, RankerObjectiveTest.all(data), 0.5, 6).valueAndGradient(w, g);
        for (double x : g) assertEquals(0, x, 1e-4);
    }

    @Test
    void trainingIsDeterministicAndCrossValidationReportsEveryStrength() {
        RankingData data = RankerObjectiveTest.randomData(21, 120, 8);
        RankerTrainer trainer = new RankerTrainer(new double[] {0.1, 1, 10}, 4, new Lbfgs(300, 1e-9));
        RankerTrainer.Result a = trainer.train(data, 8);
        RankerTrainer.Result b = trainer.train(data, 8);
        assertEquals(a.ranker(), b.ranker());
        assertEquals(3, a.trials().size());
        assertTrue(a.trials().stream().anyMatch(t -> t.l2() == a.l2()));
        double[] wa = new double[8];
        for (int f = 0; f < 8; f++) wa[f] = a.ranker().weight(f);
        double[] wb = new double[8];
        for (int f = 0; f < 8; f++) wb[f] = b.ranker().weight(f);
        assertArrayEquals(wa, wb, 0.0);
    }

    @Test
    void temperatureScalingFindsTheWorkedOptimum() {
        // Worked example: two candidates whose scores differ by 2, the higher one gold in 8 decisions of 10. Under
        // softmax(beta * s) the likelihood is largest where sigmoid(2 beta) = 0.8, that is beta = ln(4) / 2.
        double[][] scores = new double[10][];
        int[] gold = new int[10];
        double[] weights = new double[10];
        for (int d = 0; d < 10; d++) {
            scores[d] = new double[] {2, 0};
            gold[d] = d < 8 ? 0 : 1;
            weights[d] = 1;
        }
        // A flat optimum: the loss pins beta down to about the square root of the rounding error.
        assertEquals(Math.log(4) / 2, RankerTrainer.fitInverseTemperature(scores, gold, weights), 1e-6);
    }

    @Test
    void crossValidationFitsATemperatureOnTheHeldOutFolds() {
        RankingData data = RankerObjectiveTest.randomData(31, 200, 8);
        RankerTrainer.Result r = new RankerTrainer(new double[] {0.1, 1}, 4, new Lbfgs(300, 1e-9)).train(data, 8);
        assertTrue(r.temperature() > 0.125 && r.temperature() < 8, "temperature " + r.temperature());
        assertEquals(1.0, new RankerTrainer(new double[] {1}, 1, new Lbfgs(300, 1e-9)).train(data, 8).temperature(), 0.0,
                "no held-out folds, no temperature");
    }

    /** {@code data}'s decisions again, the gold of every {@code every}-th one moved to the next candidate (0: none). */
    private static RankingData copyWithGoldMoved(RankingData data, int every) {
        RankingData out = new RankingData();
        for (int d = 0; d < data.decisions(); d++) {
            int candidates = data.endCandidate(d) - data.firstCandidate(d);
            int gold = every > 0 && d % every == 0 ? (data.gold(d) + 1) % candidates : data.gold(d);
            out.startDecision(gold, data.weight(d));
            for (int c = data.firstCandidate(d); c < data.endCandidate(d); c++) {
                out.addCandidate();
                for (int e = data.firstEntry(c); e < data.endEntry(c); e++) out.addFeature(data.feature(e), data.value(e));
            }
        }
        return out.seal();
    }

    private static int[] identity(int n) {
        int[] p = new int[n];
        for (int i = 0; i < n; i++) p[i] = i;
        return p;
    }

    @Test
    void calibrationDecisionsFitTheTemperatureEachHeldOutAsItsTrainingCounterpart() {
        RankingData data = separable(31, 300);
        RankerTrainer trainer = new RankerTrainer(new double[] {0.1, 1}, 4, new Lbfgs(300, 1e-9));
        RankerTrainer.Result plain = trainer.train(data, 8);
        RankerTrainer.Result same = trainer.train(data, 8, copyWithGoldMoved(data, 0), identity(data.decisions()));
        assertEquals(plain.temperature(), same.temperature(), 0.0,
                "the training decisions themselves as calibration decisions, each at its own position: the same temperature");
        assertEquals(plain.ranker(), same.ranker(), "calibration decisions train no weight");

        // As with tags from a tagger that never saw the sentence: the ranker is wrong more often than on the training
        // decisions, so its scores must be flattened further.
        RankerTrainer.Result noisier = trainer.train(data, 8, copyWithGoldMoved(data, 4), identity(data.decisions()));
        assertTrue(plain.temperature() < 4, "the separable set's own held-out folds want sharp probabilities: " + plain.temperature());
        assertTrue(noisier.temperature() > plain.temperature() * 1.05,
                "noisier calibration decisions raise the temperature: " + noisier.temperature() + " against " + plain.temperature());

        assertThrows(IllegalArgumentException.class, () -> trainer.train(data, 8, copyWithGoldMoved(data, 0), new int[3]),
                "one position per calibration decision");
        int[] outside = identity(data.decisions());
        outside[7] = data.decisions();
        assertThrows(IllegalArgumentException.class, () -> trainer.train(data, 8, copyWithGoldMoved(data, 0), outside),
                "a position outside the training decisions");
    }

    @Test
    void badInputIsRefused() {
        RankingData empty = new RankingData();
        assertThrows(IllegalArgumentException.class, () -> new RankerTrainer().train(empty, 3));
        RankingData data = new RankingData();
        data.startDecision(0, 1);
        data.addCandidate();
        assertThrows(IllegalArgumentException.class, () -> data.addFeature(0, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> data.addFeature(0, Double.POSITIVE_INFINITY));
        RankingData goldOutside = new RankingData();
        goldOutside.startDecision(3, 1);
        goldOutside.addCandidate();
        assertThrows(IllegalStateException.class, goldOutside::seal);
    }
}
