package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.QuadrupleCountsBuilder;
import dev.tether.counts.SubTuple;
import dev.tether.counts.TupleCounts;
import dev.tether.io.QuadrupleReader;
import dev.tether.ranking.DifferentiableFunction;
import dev.tether.ranking.Lbfgs;
import dev.tether.similarity.Thesaurus;
import dev.tether.similarity.ThesaurusFile;
import dev.tether.vocabulary.WordNormalizer;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Not a test: a development loop for a learned quadruple scorer. A logistic regression (L2, fitted with the project's
 * L-BFGS) over the evidence of the back-off of Collins &amp; Brooks (1995) — each level's log-odds, presence and
 * count, the pooled estimate and the level it came from, one weight per preposition — and, optionally, over the
 * evidence of each word's nearest neighbours in a thesaurus: for the verb, the first noun and the object, the
 * similarity-weighted mean of the neighbours' noun-attachment rates at the quadruple, triple and pair levels (the
 * averaging of Dagan, Lee &amp; Pereira 1999). Training rows take their counts from the other four fifths of the
 * training split (a jackknife), so that the weights see counts as they are for unseen items; the development items
 * take theirs from the whole split. Prints, for each L2 strength, 5-fold cross-validated accuracy on the jackknifed
 * training rows and accuracy on the development set, without and with the thesaurus evidence, and then the devset
 * accuracy of the strength the folds choose (the best fold accuracy; ties: the first).
 *
 * <p>Arguments: TRAINING DEVSET THESAURUS [K]. Run from the repository root after {@code mvn -pl models test-compile}:
 * {@code java -cp "models/target/test-classes:models/target/classes:$(cat cp.txt)"
 * dev.tether.attachment.LearnedQuadrupleMeasurement test-corpora/data/rrr/training test-corpora/data/rrr/devset T 50}.
 */
public final class LearnedQuadrupleMeasurement {
    private static final SubTuple[] LEVELS = {SubTuple.VERB_NOUN1_NOUN2, SubTuple.VERB_NOUN1, SubTuple.VERB_NOUN2,
            SubTuple.NOUN1_NOUN2, SubTuple.VERB, SubTuple.NOUN1, SubTuple.NOUN2};
    private static final HeadClass[] SLOT_CLASSES = {HeadClass.VERB, HeadClass.NOUN, HeadClass.NOUN};
    private static final int FOLDS = 5;
    /** Three numbers for each of the seven levels and the preposition, the pooled estimate, five bases. */
    private static final int BACK_OFF = 3 * 8 + 1 + 5;
    /** Three numbers for each slot and level group (quadruple, triples, pairs). */
    private static final int NEIGHBOURS = 3 * 3 * 3;

    private final WordNormalizer normalizer = new WordNormalizer();
    private final Map<String, Integer> prepositions = new HashMap<>();
    private final Thesaurus thesaurus;
    private final int k;

    private LearnedQuadrupleMeasurement(List<LabelledQuadruple> training, Thesaurus thesaurus, int k) {
        for (LabelledQuadruple lq : training) {
            prepositions.putIfAbsent(normalizer.preposition(lq.quadruple().preposition()), prepositions.size());
        }
        this.thesaurus = thesaurus;
        this.k = k;
    }

    public static void main(String[] args) throws Exception {
        List<LabelledQuadruple> training = new QuadrupleReader(false).read(Path.of(args[0])).quadruples();
        List<LabelledQuadruple> dev = new QuadrupleReader(false).read(Path.of(args[1])).quadruples();
        Thesaurus thesaurus = ThesaurusFile.read(Path.of(args[2]));
        int k = args.length > 3 ? Integer.parseInt(args[3]) : 20;
        int stored = 0;
        for (int t = 0; t < thesaurus.size(); t++) stored = Math.max(stored, thesaurus.neighbourCount(t));
        if (k > stored) {
            System.out.printf("%s holds at most %d neighbours per word; k %d uses those%n", args[2], stored, k);
            k = stored;
        }
        LearnedQuadrupleMeasurement m = new LearnedQuadrupleMeasurement(training, thesaurus, k);
        QuadrupleCounts all = m.count(training);
        BackedOffScorer plain = new BackedOffScorer(all);
        int right = 0;
        for (LabelledQuadruple lq : dev) {
            Quadruple q = lq.quadruple();
            int[] e = all.encode(m.normalizer, q.verb(), q.noun1(), q.preposition(), q.noun2());
            if (plain.decide(e[0], e[1], e[2], e[3]).site() == lq.site()) right++;
        }
        System.out.printf("plain back-off on the development set: %.2f%% of %d%n", 100.0 * right / dev.size(), dev.size());
        for (boolean withNeighbours : new boolean[] {false, true}) {
            List<double[]> rows = new ArrayList<>();
            List<Boolean> nouns = new ArrayList<>();
            for (int f = 0; f < FOLDS; f++) {
                List<LabelledQuadruple> rest = new ArrayList<>();
                List<LabelledQuadruple> held = new ArrayList<>();
                for (int i = 0; i < training.size(); i++) (i % FOLDS == f ? held : rest).add(training.get(i));
                QuadrupleCounts counts = m.count(rest);
                ThesaurusIds ids = new ThesaurusIds(counts.words(), thesaurus);
                for (LabelledQuadruple lq : held) {
                    rows.add(m.features(counts, ids, lq.quadruple(), withNeighbours));
                    nouns.add(lq.site() == AttachmentSite.NOUN);
                }
            }
            ThesaurusIds ids = new ThesaurusIds(all.words(), thesaurus);
            List<double[]> devRows = new ArrayList<>();
            List<Boolean> devNouns = new ArrayList<>();
            for (LabelledQuadruple lq : dev) {
                devRows.add(m.features(all, ids, lq.quadruple(), withNeighbours));
                devNouns.add(lq.site() == AttachmentSite.NOUN);
            }
            double bestFolds = -1, chosenDev = 0, chosenL2 = 0;
            for (double l2 : new double[] {0.1, 1, 10}) {
                int folded = 0;
                for (int f = 0; f < FOLDS; f++) {
                    List<double[]> fitRows = new ArrayList<>();
                    List<double[]> testRows = new ArrayList<>();
                    List<Boolean> fitNouns = new ArrayList<>();
                    List<Boolean> testNouns = new ArrayList<>();
                    for (int i = 0; i < rows.size(); i++) {
                        (i % FOLDS == f ? testRows : fitRows).add(rows.get(i));
                        (i % FOLDS == f ? testNouns : fitNouns).add(nouns.get(i));
                    }
                    folded += correct(fit(fitRows, fitNouns, l2), testRows, testNouns);
                }
                double[] w = fit(rows, nouns, l2);
                double devAccuracy = (double) correct(w, devRows, devNouns) / devRows.size();
                System.out.printf("%s, l2 %s: training folds %.2f%%, development set %.2f%%%n",
                        withNeighbours ? "with neighbours (k " + k + ")" : "back-off evidence only", l2,
                        100.0 * folded / rows.size(), 100 * devAccuracy);
                if (folded > bestFolds) {
                    bestFolds = folded;
                    chosenDev = devAccuracy;
                    chosenL2 = l2;
                }
            }
            System.out.printf("  l2 chosen on the folds: %s, development set %.2f%%%n", chosenL2, 100 * chosenDev);
        }
    }

    private QuadrupleCounts count(List<LabelledQuadruple> items) {
        QuadrupleCountsBuilder b = new QuadrupleCountsBuilder();
        for (LabelledQuadruple lq : items) {
            Quadruple q = lq.quadruple();
            b.add(normalizer.verb(q.verb()), normalizer.noun(q.noun1()), normalizer.preposition(q.preposition()),
                    normalizer.noun(q.noun2()), lq.site(), 1.0);
        }
        return b.build();
    }

    private static double logOdds(double hits, double trials) {
        return Math.log((hits + 0.5) / (trials - hits + 0.5));
    }

    private double[] features(QuadrupleCounts c, ThesaurusIds ids, Quadruple q, boolean withNeighbours) {
        double[] x = new double[BACK_OFF + NEIGHBOURS + prepositions.size() + 1];
        int[] e = c.encode(normalizer, q.verb(), q.noun1(), q.preposition(), q.noun2());
        int v = e[0], n1 = e[1], p = e[2], n2 = e[3];
        Integer pi = prepositions.get(normalizer.preposition(q.preposition()));
        x[BACK_OFF + NEIGHBOURS + (pi == null ? prepositions.size() : pi)] = 1;
        if (p <= 0) return x;
        for (int l = 0; l < LEVELS.length; l++) {
            if (!known(LEVELS[l], v, n1, n2)) continue;
            long f = c.table(p, LEVELS[l]).find(LEVELS[l].key(v, n1, n2));
            if (f == TupleCounts.ABSENT) continue;
            double hits = TupleCounts.hitsIn(f), trials = TupleCounts.trialsIn(f);
            x[3 * l] = 1;
            x[3 * l + 1] = logOdds(hits, trials);
            x[3 * l + 2] = Math.log1p(trials);
        }
        x[21] = 1;
        x[22] = logOdds(c.prepositionNounCount(p), c.prepositionCount(p));
        x[23] = Math.log1p(c.prepositionCount(p));
        QuadrupleDecision d = new BackedOffScorer(c).decide(v, n1, p, n2);
        double pn = Math.min(0.999, Math.max(0.001, d.nounProbability()));
        x[24] = Math.log(pn / (1 - pn));
        x[25 + Math.min(4, d.basis().ordinal())] = 1;
        if (!withNeighbours) return x;
        String[] keys = {normalizer.verb(q.verb()), normalizer.noun(q.noun1()), normalizer.noun(q.noun2())};
        int[] slotIds = {v, n1, n2};
        for (int s = 0; s < 3; s++) {
            int t = ids.entry(SLOT_CLASSES[s], slotIds[s], keys[s]);
            if (t == Thesaurus.UNKNOWN) continue;
            double[][] mean = new double[3][2]; // per level group: sum of similarity x rate, sum of similarity
            for (int i = 0; i < Math.min(k, thesaurus.neighbourCount(t)); i++) {
                int id = ids.countId(thesaurus.neighbourId(t, i));
                if (id <= 0) continue;
                double similarity = thesaurus.neighbourScore(t, i);
                int sv = s == 0 ? id : v, sn1 = s == 1 ? id : n1, sn2 = s == 2 ? id : n2;
                for (int l = 0; l < LEVELS.length; l++) {
                    if (!contains(LEVELS[l], s) || !known(LEVELS[l], sv, sn1, sn2)) continue;
                    long f = c.table(p, LEVELS[l]).find(LEVELS[l].key(sv, sn1, sn2));
                    if (f == TupleCounts.ABSENT || !(TupleCounts.trialsIn(f) > 0)) continue;
                    int group = l == 0 ? 0 : l <= 3 ? 1 : 2;
                    mean[group][0] += similarity * (TupleCounts.hitsIn(f) + 0.5) / (TupleCounts.trialsIn(f) + 1);
                    mean[group][1] += similarity;
                }
            }
            for (int group = 0; group < 3; group++) {
                if (!(mean[group][1] > 0)) continue;
                double rate = mean[group][0] / mean[group][1];
                int at = BACK_OFF + 9 * s + 3 * group;
                x[at] = 1;
                x[at + 1] = Math.log(rate / (1 - rate));
                x[at + 2] = Math.log1p(mean[group][1]);
            }
        }
        return x;
    }

    private static boolean known(SubTuple part, int v, int n1, int n2) {
        return (!contains(part, 0) || v > 0) && (!contains(part, 1) || n1 > 0) && (!contains(part, 2) || n2 > 0);
    }

    /** Whether the tuple {@code part} holds slot {@code slot} (0 verb, 1 first noun, 2 object). */
    private static boolean contains(SubTuple part, int slot) {
        return switch (part) {
            case VERB_NOUN1_NOUN2 -> true;
            case VERB_NOUN1 -> slot == 0 || slot == 1;
            case VERB_NOUN2 -> slot == 0 || slot == 2;
            case NOUN1_NOUN2 -> slot == 1 || slot == 2;
            case VERB -> slot == 0;
            case NOUN1 -> slot == 1;
            case NOUN2 -> slot == 2;
        };
    }

    private static double[] fit(List<double[]> rows, List<Boolean> nouns, double l2) {
        int d = rows.get(0).length;
        DifferentiableFunction loss = new DifferentiableFunction() {
            @Override
            public int dimension() {
                return d;
            }

            @Override
            public double valueAndGradient(double[] w, double[] gradient) {
                Arrays.fill(gradient, 0);
                double value = 0;
                for (int i = 0; i < rows.size(); i++) {
                    double[] x = rows.get(i);
                    double z = 0;
                    for (int j = 0; j < d; j++) z += w[j] * x[j];
                    double pn = 1 / (1 + Math.exp(-z));
                    boolean noun = nouns.get(i);
                    value -= Math.log(Math.max(noun ? pn : 1 - pn, 1e-12));
                    double r = pn - (noun ? 1 : 0);
                    for (int j = 0; j < d; j++) if (x[j] != 0) gradient[j] += r * x[j];
                }
                for (int j = 0; j < d; j++) {
                    value += 0.5 * l2 * w[j] * w[j];
                    gradient[j] += l2 * w[j];
                }
                return value;
            }
        };
        return new Lbfgs(500, 1e-7).minimize(loss, new double[d]).x();
    }

    private static int correct(double[] w, List<double[]> rows, List<Boolean> nouns) {
        int right = 0;
        for (int i = 0; i < rows.size(); i++) {
            double z = 0;
            for (int j = 0; j < w.length; j++) z += w[j] * rows.get(i)[j];
            if ((z >= 0) == nouns.get(i)) right++;
        }
        return right;
    }
}
