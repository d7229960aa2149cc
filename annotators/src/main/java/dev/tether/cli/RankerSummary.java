package dev.tether.cli;

import dev.tether.attachment.AttachmentFeatureFamily;
import dev.tether.attachment.AttachmentRanker;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TetherModel;
import dev.tether.ranking.RankerModel;
import dev.tether.ranking.RankerTrainer;

import java.io.PrintStream;
import java.util.stream.Collectors;

/**
 * Prints what a model's learned parts are: the attachment ranker (training decisions, features, the cross-validated
 * L2 choice), the quadruple scorer and the coordination ranker.
 */
final class RankerSummary {
    private RankerSummary() {
    }

    static void print(TetherModel model, PrintStream out) {
        printAttachment(model, out);
        printQuadruple(model, out);
        if (model.coordinationRanker().isEmpty()) {
            out.println("coordination ranker  none: no coordination decisions (train with --conllu to get one)");
            return;
        }
        dev.tether.coordination.CoordinationRanker c = model.coordinationRanker().get();
        out.printf("coordination ranker  %,d pair decisions (%,d features, L2 %s, temperature %.3f), %,d scope decisions"
                        + " (%,d features, L2 %s), %,d counts; families %s%n",
                c.pairWeights().decisions(), c.pairWeights().size(), c.pairWeights().l2(), c.pairWeights().temperature(),
                c.scopeWeights().decisions(), c.scopeWeights().size(), c.scopeWeights().l2(), c.counts().size(),
                c.families().stream().map(dev.tether.coordination.CoordinationFeatureFamily::label).collect(Collectors.joining(", ")));
    }

    private static void printQuadruple(TetherModel model, PrintStream out) {
        if (model.learnedQuadrupleScorer().isEmpty()) {
            out.println("quadruple scorer   " + model.quadrupleScorer().name() + " (no learned scorer: it needs at least "
                    + dev.tether.attachment.LearnedQuadrupleTrainer.MIN_QUADRUPLES + " labelled quadruples, given or read off a treebank)");
            return;
        }
        dev.tether.attachment.LearnedQuadrupleScorer s = model.learnedQuadrupleScorer().get();
        RankerModel w = s.weights();
        out.printf("quadruple scorer   learned over the back-off's evidence: %,d quadruples (count features from a %d-fold"
                        + " jackknife), %,d features, L2 %s, temperature %.3f, %s%n", w.decisions(), ModelTrainer.JACKKNIFE_FOLDS,
                w.size(), w.l2(), w.temperature(), s.neighbours() > 0 ? s.neighbours() + " thesaurus neighbours per word" : "no thesaurus");
    }

    private static void printAttachment(TetherModel model, PrintStream out) {
        if (model.attachmentRanker().isEmpty()) {
            out.println("attachment ranker  none: the count-based score chooses heads (train with --conllu to get one)");
            return;
        }
        AttachmentRanker r = model.attachmentRanker().get();
        RankerModel w = r.weights();
        out.printf("attachment ranker  %,d training decisions (count features from a %d-fold jackknife), %,d features, L2 %s,"
                + " temperature %.3f%n", w.decisions(), ModelTrainer.JACKKNIFE_FOLDS, w.size(), w.l2(), w.temperature());
        out.println("  feature families  " + r.families().stream().map(AttachmentFeatureFamily::label).collect(Collectors.joining(", ")));
        for (RankerTrainer.Trial t : w.trials()) {
            out.printf("  cross-validated L2 %-8s log-loss %.4f  accuracy %.4f%s%n", t.l2(), t.logLoss(), t.accuracy(),
                    t.l2() == w.l2() ? "  <- chosen" : "");
        }
    }
}
