package dev.tether.model;

import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.QuadrupleCountsBuilder;
import dev.tether.counts.SubTuple;
import dev.tether.counts.TupleCounts;
import dev.tether.vocabulary.WordNormalizer;

import java.util.ArrayList;
import java.util.List;

/**
 * Chooses how much one raw event counts against one labelled event, on folds of the labelled training data: for
 * each of {@value #FOLDS} contiguous folds of the labelled quadruples (given ones and those read off treebanks),
 * the back-off of Collins &amp; Brooks (1995) decides the fold's quadruples from the counts of the other folds (and of
 * base models) plus the raw counts times each candidate weight; the weight with the most correct decisions over all
 * folds wins (ties: the smaller weight); when no weight beats leaving the raw counts out, the weight is 0 and the raw
 * text counts for nothing (it stays listed as a source, with its weight). Since the pooled counts at a level are {@code labelled + w * raw}, one
 * look-up per quadruple and level serves every weight. Deterministic.
 */
public final class RawWeightChoice {
    public static final int FOLDS = 5;
    /** Candidate weights: a raw event counts between a hundredth of a labelled one and as much. */
    public static final double[] GRID = {0.01, 0.03, 0.1, 0.3, 1.0};

    /** The weight chosen, and the held-out accuracy of every candidate (and of no raw counts at all, first). */
    public record Result(double weight, double[] weights, double[] accuracy, double withoutRaw, int quadruples) {
    }

    private static final SubTuple[][] LEVELS = {
            {SubTuple.VERB_NOUN1_NOUN2},
            {SubTuple.VERB_NOUN1, SubTuple.VERB_NOUN2, SubTuple.NOUN1_NOUN2},
            {SubTuple.VERB, SubTuple.NOUN1, SubTuple.NOUN2}};

    private RawWeightChoice() {
    }

    static Result choose(List<LabelledQuadruple> labelled, List<TetherModel> bases, QuadrupleCounts raw,
                         WordNormalizer normalizer) {
        int n = labelled.size();
        int[] correct = new int[GRID.length];
        int correctWithout = 0;
        for (int f = 0; f < FOLDS; f++) {
            int from = (int) ((long) n * f / FOLDS), to = (int) ((long) n * (f + 1) / FOLDS);
            QuadrupleCountsBuilder b = new QuadrupleCountsBuilder();
            for (TetherModel base : bases) b.addAll(base.quadruples());
            for (int j = 0; j < n; j++) {
                if (j >= from && j < to) continue;
                Quadruple q = labelled.get(j).quadruple();
                b.add(normalizer.verb(q.verb()), normalizer.noun(q.noun1()), normalizer.preposition(q.preposition()),
                        normalizer.noun(q.noun2()), labelled.get(j).site(), 1.0);
            }
            QuadrupleCounts own = b.build();
            for (int j = from; j < to; j++) {
                LabelledQuadruple lq = labelled.get(j);
                Quadruple q = lq.quadruple();
                double[] l = evidence(own, own.encode(normalizer, q.verb(), q.noun1(), q.preposition(), q.noun2()));
                double[] r = evidence(raw, raw.encode(normalizer, q.verb(), q.noun1(), q.preposition(), q.noun2()));
                boolean noun = lq.site() == AttachmentSite.NOUN;
                if (decideNoun(l, r, 0) == noun) correctWithout++;
                for (int w = 0; w < GRID.length; w++) if (decideNoun(l, r, GRID[w]) == noun) correct[w]++;
            }
        }
        double[] accuracy = new double[GRID.length];
        int best = 0;
        for (int w = 0; w < GRID.length; w++) {
            accuracy[w] = n == 0 ? 0 : (double) correct[w] / n;
            if (correct[w] > correct[best]) best = w;
        }
        double chosen = correct[best] > correctWithout ? GRID[best] : 0;
        return new Result(chosen, GRID.clone(), accuracy, n == 0 ? 0 : (double) correctWithout / n, n);
    }

    /** Hits and trials at each level (quadruple, triples, pairs, preposition): 8 numbers. */
    private static double[] evidence(QuadrupleCounts c, int[] ids) {
        double[] e = new double[8];
        int p = ids[2];
        if (p <= 0) return e;
        for (int level = 0; level < LEVELS.length; level++) {
            for (SubTuple part : LEVELS[level]) {
                long k = c.table(p, part).find(part.key(ids[0], ids[1], ids[3]));
                if (k != TupleCounts.ABSENT && known(part, ids)) {
                    e[2 * level] += TupleCounts.hitsIn(k);
                    e[2 * level + 1] += TupleCounts.trialsIn(k);
                }
            }
        }
        e[6] = c.prepositionNounCount(p);
        e[7] = c.prepositionCount(p);
        return e;
    }

    /** Whether every word of the part is known (an unknown word's id 0 must not match partial raw keys). */
    private static boolean known(SubTuple part, int[] ids) {
        switch (part) {
            case VERB_NOUN1_NOUN2: return ids[0] > 0 && ids[1] > 0 && ids[3] > 0;
            case VERB_NOUN1: return ids[0] > 0 && ids[1] > 0;
            case VERB_NOUN2: return ids[0] > 0 && ids[3] > 0;
            case NOUN1_NOUN2: return ids[1] > 0 && ids[3] > 0;
            case VERB: return ids[0] > 0;
            case NOUN1: return ids[1] > 0;
            default: return ids[3] > 0;
        }
    }

    private static boolean decideNoun(double[] l, double[] r, double w) {
        for (int level = 0; level < 4; level++) {
            double trials = l[2 * level + 1] + w * r[2 * level + 1];
            if (trials > 0) return (l[2 * level] + w * r[2 * level]) / trials >= 0.5;
        }
        return true;
    }
}
