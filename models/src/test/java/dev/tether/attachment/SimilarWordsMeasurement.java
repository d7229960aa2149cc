package dev.tether.attachment;

import dev.tether.candidates.HeadCandidateProposer;
import dev.tether.evaluation.PairedComparison;
import dev.tether.model.ModelFile;
import dev.tether.model.TetherModel;
import dev.tether.treebank.TreebankExampleExtractor;
import dev.tether.treebank.TreebankExamples;

import java.nio.file.Path;

/**
 * Compares two models' head choice with gold tags on a treebank, decision by decision, grouped by the most specific
 * count level the first model has for the gold head (the level the back-off falls to): the gain of the similar-words
 * features by level when the second model differs from the first only by its thesaurus. A development loop; the
 * figures of record come from {@code tether evaluate}. Run by hand with the models classpath:
 * {@code java -cp ... dev.tether.attachment.SimilarWordsMeasurement WITHOUT.tether WITH.tether DEV.conllu}.
 */
public final class SimilarWordsMeasurement {
    public static void main(String[] args) throws Exception {
        TetherModel without = ModelFile.read(Path.of(args[0]));
        TetherModel with = ModelFile.read(Path.of(args[1]));
        TreebankExamples examples = new TreebankExampleExtractor(new HeadCandidateProposer()).extract(Path.of(args[2]));
        HeadChoice.Evidence[] levels = HeadChoice.Evidence.values();
        PairedComparison[] byLevel = new PairedComparison[levels.length];
        int[][] right = new int[levels.length][2];
        int[] n = new int[levels.length];
        for (int l = 0; l < levels.length; l++) byLevel[l] = new PairedComparison();
        PairedComparison all = new PairedComparison();
        for (AttachmentExample e : examples.examples()) {
            AttachmentQuery q = e.query();
            if (e.gold() < 0 || q.size() == 0) continue;
            int level = without.headChoiceScorer().choose(q).evidence(e.gold()).ordinal();
            boolean a = without.chooseHead(q).best() == e.gold();
            boolean b = with.chooseHead(q).best() == e.gold();
            byLevel[level].add(a, b);
            all.add(a, b);
            n[level]++;
            if (a) right[level][0]++;
            if (b) right[level][1]++;
        }
        System.out.printf("gold head's count level   decisions  without   with    gain  (only without / only with, p)%n");
        for (int l = 0; l < levels.length; l++) {
            if (n[l] == 0) continue;
            System.out.printf("%-25s %10d  %6.2f%%  %6.2f%%  %+5.2f  (%d / %d, p %.3f)%n", levels[l].label(), n[l],
                    100.0 * right[l][0] / n[l], 100.0 * right[l][1] / n[l], 100.0 * (right[l][1] - right[l][0]) / n[l],
                    byLevel[l].firstOnly(), byLevel[l].secondOnly(), byLevel[l].pValue());
        }
        System.out.printf("all (gold head among the candidates) %d decisions: only without %d, only with %d, p %.3f%n",
                all.total(), all.firstOnly(), all.secondOnly(), all.pValue());
        // Head choice alone, both models in turn on the same examples, best of five rounds after two for warm-up.
        double[] best = {Double.MAX_VALUE, Double.MAX_VALUE};
        TetherModel[] models = {without, with};
        long sink = 0;
        for (int round = 0; round < 7; round++) {
            for (int m = 0; m < 2; m++) {
                long start = System.nanoTime();
                for (AttachmentExample e : examples.examples()) if (e.query().size() > 0) sink += models[m].chooseHead(e.query()).best();
                double seconds = (System.nanoTime() - start) / 1e9;
                if (round >= 2) best[m] = Math.min(best[m], seconds);
            }
        }
        int decisions = 0;
        for (AttachmentExample e : examples.examples()) if (e.query().size() > 0) decisions++;
        System.out.printf("head choice: without %.0f, with %.0f decisions/s (ratio %.2f; checksum %d)%n",
                decisions / best[0], decisions / best[1], best[0] / best[1], sink);
    }
}
