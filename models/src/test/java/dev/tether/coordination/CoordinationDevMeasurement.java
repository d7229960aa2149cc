package dev.tether.coordination;

import dev.tether.evaluation.Accuracy;
import dev.tether.evaluation.CoordinationEvaluation;
import dev.tether.evaluation.CoordinationGoldTagEvaluator;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TetherModel;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/**
 * Trains only the coordination ranker from a treebank and scores it with gold tags on another (a development loop;
 * the figures of record come from {@code tether evaluate}). Run by hand with the models classpath:
 * {@code java -cp ... dev.tether.coordination.CoordinationDevMeasurement TRAIN DEV}.
 */
public final class CoordinationDevMeasurement {
    public static void main(String[] args) throws Exception {
        List<TreebankSentence> train = ConlluReader.readAll(Path.of(args[0]));
        List<TreebankSentence> dev = ConlluReader.readAll(Path.of(args[1]));
        long start = System.nanoTime();
        TetherModel model = new ModelTrainer().addCoordinationSentences(train).build();
        CoordinationRanker ranker = model.coordinationRanker().orElseThrow();
        System.out.printf("trained in %.1f s: %d pair decisions, %d scope decisions, l2 %s / %s%n",
                (System.nanoTime() - start) / 1e9, ranker.pairWeights().decisions(), ranker.scopeWeights().decisions(),
                ranker.pairWeights().l2(), ranker.scopeWeights().l2());
        CoordinationEvaluation e = new CoordinationEvaluation();
        CoordinationGoldTagEvaluator evaluator = new CoordinationGoldTagEvaluator();
        for (TreebankSentence s : dev) evaluator.add(s, ranker, e);
        System.out.printf("heads %s, nearest %s, spans %s, scope %s (always %s, never %s), coverage %s%n",
                f(e.heads()), f(e.nearestOfClass()), f(e.spans()), f(e.scope()), f(e.alwaysShared()), f(e.neverShared()),
                f(e.scopeCoverage()));
        for (Map.Entry<String, Accuracy[]> r : e.byClass().entrySet()) {
            System.out.printf("  %-6s %s  nearest %s%n", r.getKey(), f(r.getValue()[0]), f(r.getValue()[1]));
        }
    }

    private static String f(Accuracy a) {
        return String.format("%.2f%% (%d/%d)", 100 * a.value(), a.correct(), a.total());
    }
}
