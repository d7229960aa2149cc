package dev.tether.coordination;

import dev.tether.evaluation.Accuracy;
import dev.tether.evaluation.CoordinationEvaluation;
import dev.tether.evaluation.CoordinationGoldTagEvaluator;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TetherModel;
import dev.tether.similarity.ThesaurusFile;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/**
 * Trains only the coordination ranker from a treebank and scores it with gold tags on another (a development loop;
 * the figures of record come from {@code tether evaluate}). Run by hand with the models classpath:
 * {@code java -cp ... dev.tether.coordination.CoordinationDevMeasurement TRAIN DEV [THESAURUS]}, or
 * {@code ... CoordinationDevMeasurement TRAIN --folds K} for K-fold cross-validation on the training file alone (sentence
 * {@code i} in fold {@code i mod K}), so that a change motivated by development-set errors is checked on text it was not
 * written on.
 */
public final class CoordinationDevMeasurement {
    public static void main(String[] args) throws Exception {
        List<TreebankSentence> train = ConlluReader.readAll(Path.of(args[0]));
        if (args[1].equals("--folds")) {
            folds(train, Integer.parseInt(args[2]));
            return;
        }
        List<TreebankSentence> dev = ConlluReader.readAll(Path.of(args[1]));
        long start = System.nanoTime();
        ModelTrainer trainer = new ModelTrainer().addCoordinationSentences(train);
        // An optional third argument: a thesaurus file for the similarity and composition features.
        if (args.length > 2) trainer.coordinationThesaurus(ThesaurusFile.read(Path.of(args[2])));
        TetherModel model = trainer.build();
        CoordinationRanker ranker = model.coordinationRanker().orElseThrow();
        System.out.printf("trained in %.1f s: %d pair decisions, %d scope decisions, l2 %s / %s%n",
                (System.nanoTime() - start) / 1e9, ranker.pairWeights().decisions(), ranker.scopeWeights().decisions(),
                ranker.pairWeights().l2(), ranker.scopeWeights().l2());
        CoordinationEvaluation e = new CoordinationEvaluation();
        CoordinationGoldTagEvaluator evaluator = new CoordinationGoldTagEvaluator();
        for (TreebankSentence s : dev) {
            evaluator.add(s, ranker, e);
            if (System.getenv("SHOW") != null) show(s, ranker);
        }
        System.out.printf("heads %s, nearest %s, spans %s, scope %s (always %s, never %s), coverage %s%n",
                f(e.heads()), f(e.nearestOfClass()), f(e.spans()), f(e.scope()), f(e.alwaysShared()), f(e.neverShared()),
                f(e.scopeCoverage()));
        for (Map.Entry<String, Accuracy[]> r : e.byClass().entrySet()) {
            System.out.printf("  %-6s %s  nearest %s%n", r.getKey(), f(r.getValue()[0]), f(r.getValue()[1]));
        }
    }

    private static void folds(List<TreebankSentence> all, int k) {
        CoordinationEvaluation total = new CoordinationEvaluation();
        CoordinationGoldTagEvaluator evaluator = new CoordinationGoldTagEvaluator();
        for (int fold = 0; fold < k; fold++) {
            List<TreebankSentence> rest = new java.util.ArrayList<>();
            List<TreebankSentence> held = new java.util.ArrayList<>();
            for (int i = 0; i < all.size(); i++) (i % k == fold ? held : rest).add(all.get(i));
            CoordinationRanker ranker = new ModelTrainer().addCoordinationSentences(rest).build().coordinationRanker().orElseThrow();
            CoordinationEvaluation e = new CoordinationEvaluation();
            for (TreebankSentence s : held) {
                evaluator.add(s, ranker, e);
                evaluator.add(s, ranker, total);
            }
            System.out.printf("fold %d: heads %s, nearest %s%n", fold, f(e.heads()), f(e.nearestOfClass()));
        }
        System.out.printf("all folds: heads %s, nearest %s, spans %s, scope %s%n", f(total.heads()), f(total.nearestOfClass()),
                f(total.spans()), f(total.scope()));
    }

    /** Prints the wrong head choices whose gold pair was among the candidates. */
    private static void show(TreebankSentence s, CoordinationRanker ranker) {
        java.util.Map<Integer, CoordinatorCandidates> by = new java.util.HashMap<>();
        for (CoordinatorCandidates c : new ConjunctCandidateProposer().proposeAll(s.forms(), s.xposTags())) by.put(c.coordinator(), c);
        for (dev.tether.treebank.GoldCoordination g : new dev.tether.treebank.GoldCoordinationExtractor().extract(s)) {
            CoordinatorCandidates c = by.get(g.coordinator());
            if (c == null || c.indexOf(g.left(), g.right()) < 0) continue;
            CoordinationChoice choice = ranker.choose(new CoordinationQuery(s.forms(), s.xposTags(), c), 1);
            ConjunctPair p = c.pair(choice.pair(0));
            if (p.left() == g.left() && p.right() == g.right()) continue;
            String side = p.right() != g.right() ? (p.left() != g.left() ? "both" : "right")
                    : p.left() < g.left() ? "too-far" : "too-near";
            StringBuilder b = new StringBuilder("WRONG " + side + " gold " + s.form(g.left()) + "+" + s.form(g.right()) + " got " + s.form(p.left()) + "+" + s.form(p.right()) + " :: ");
            for (int k = Math.max(0, Math.min(g.left(), p.left()) - 2); k < Math.min(s.size(), Math.max(g.right(), p.right()) + 3); k++) {
                b.append(s.form(k)).append('/').append(s.xpos(k)).append(' ');
            }
            System.out.println(b);
            if (System.getenv("WHY") != null) {
                for (CoordinationRanker.Reason r : ranker.contrast(new CoordinationQuery(s.forms(), s.xposTags(), c), choice.pair(0),
                        c.indexOf(g.left(), g.right()), 6)) {
                    System.out.printf("    %+.2f %s%n", r.weight(), r.text());
                }
                for (CoordinationRanker.Reason r : ranker.contrast(new CoordinationQuery(s.forms(), s.xposTags(), c),
                        c.indexOf(g.left(), g.right()), choice.pair(0), 6)) {
                    System.out.printf("    %+.2f %s%n", -r.weight(), r.text());
                }
            }
        }
    }

    private static String f(Accuracy a) {
        return String.format("%.2f%% (%d/%d)", 100 * a.value(), a.correct(), a.total());
    }
}
