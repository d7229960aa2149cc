package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.HeadChoiceCounts.Part;
import dev.tether.counts.TupleCounts;
import dev.tether.counts.TupleKey;
import dev.tether.vocabulary.Vocabulary;
import dev.tether.vocabulary.WordNormalizer;

/**
 * Chooses the head of a prepositional phrase among all its candidates. Each candidate gets
 * <pre>
 *   score = S · (Pc / Rc)^classWeight · (Pw / Pc)^wordWeight
 * </pre>
 * normalized over the candidates, where
 * <ul>
 *   <li>S is the structural rate: how often a candidate with the same {@link dev.tether.counts.StructureKey}
 *       (class, rank among its class, distance, verbs nearer to the preposition) was the head, no words involved;</li>
 *   <li>Pc = P(head | class, preposition), smoothed towards a constant prior, and Rc the class's rate over all
 *       prepositions: how much this preposition favours this class;</li>
 *   <li>Pw = P(head | word, class, preposition, object) estimated in the manner of Collins &amp; Brooks (1995): the
 *       pooled counts of the most specific level with evidence — head word with object; else head word and class
 *       with object pooled; else the class estimate — each smoothed towards the next level down;</li>
 * </ul>
 * so that S carries structure, the second factor the preposition's preference for verbs or nouns, and the third
 * the lexical preference of this very word (as a likelihood ratio against its class). Immutable and thread-safe.
 */
public final class HeadChoiceScorer {
    /** Pseudo-count of the smoothing towards the next level. */
    private static final double SMOOTHING = 1.0;
    private static final double PRIOR = 0.25;
    private static final HeadClass[] CLASSES = HeadClass.values();

    private final HeadChoiceCounts counts;
    private final WordNormalizer normalizer;
    private final double classWeight;
    private final double wordWeight;
    private final double[] classRate = new double[CLASSES.length];

    public HeadChoiceScorer(HeadChoiceCounts counts, WordNormalizer normalizer, double classWeight, double wordWeight) {
        this.counts = counts;
        this.normalizer = normalizer;
        this.classWeight = classWeight;
        this.wordWeight = wordWeight;
        double[] hits = new double[CLASSES.length];
        double[] trials = new double[CLASSES.length];
        for (int p = 1; p <= counts.prepositions().size(); p++) {
            TupleCounts t = counts.lexical(p, Part.CLASS);
            for (int c = 0; c < CLASSES.length; c++) {
                int s = t.slot(TupleKey.of(c + 1));
                if (s >= 0) {
                    hits[c] += t.hits(s);
                    trials[c] += t.trials(s);
                }
            }
        }
        for (int c = 0; c < CLASSES.length; c++) classRate[c] = (hits[c] + SMOOTHING * PRIOR) / (trials[c] + SMOOTHING);
    }

    /** The key under which a head word of class {@code c} is counted. */
    public static String headKey(WordNormalizer normalizer, String word, HeadClass c) {
        switch (c) {
            case VERB: return normalizer.verb(word);
            case NOUN: return normalizer.noun(word);
            default: return normalizer.other(word);
        }
    }

    public HeadChoice choose(AttachmentQuery q) {
        int n = q.size();
        Vocabulary words = counts.words();
        int p = counts.prepositions().id(normalizer.preposition(q.preposition()));
        int o = words.id(normalizer.noun(q.object()));
        double[] score = new double[n];
        HeadChoice.Evidence[] evidence = new HeadChoice.Evidence[n];
        double[] evidenceHits = new double[n];
        double[] evidenceTrials = new double[n];
        long[] structureKeys = CandidateStructure.keys(q);
        TupleCounts structure = counts.structure();
        double sum = 0;
        for (int i = 0; i < n; i++) {
            HeadClass hc = q.headClass(i);
            int c = hc.ordinal();
            int ss = structure.slot(structureKeys[i]);
            double s = ss >= 0 ? (structure.hits(ss) + SMOOTHING * PRIOR) / (structure.trials(ss) + SMOOTHING) : PRIOR / 4;
            double pc = classRate[c];
            double pw = pc;
            HeadChoice.Evidence ev = HeadChoice.Evidence.NONE;
            double eh = 0;
            double et = 0;
            if (p > 0) {
                TupleCounts classTable = counts.lexical(p, Part.CLASS);
                int cs = classTable.slot(TupleKey.of(c + 1));
                if (cs >= 0) {
                    pc = (classTable.hits(cs) + SMOOTHING * classRate[c]) / (classTable.trials(cs) + SMOOTHING);
                    ev = HeadChoice.Evidence.CLASS;
                    eh = classTable.hits(cs);
                    et = classTable.trials(cs);
                }
                pw = pc;
                int h = words.id(headKey(normalizer, q.head(i), hc));
                double midHits = 0;
                double midTrials = 0;
                TupleCounts head = counts.lexical(p, Part.HEAD);
                int hs = h > 0 ? head.slot(TupleKey.of(h, c + 1)) : -1;
                TupleCounts classObject = counts.lexical(p, Part.CLASS_OBJECT);
                int cos = o > 0 ? classObject.slot(TupleKey.of(c + 1, o)) : -1;
                if (cos >= 0) {
                    midHits += classObject.hits(cos);
                    midTrials += classObject.trials(cos);
                    ev = HeadChoice.Evidence.CLASS_WITH_OBJECT;
                }
                if (hs >= 0) {
                    midHits += head.hits(hs);
                    midTrials += head.trials(hs);
                    ev = HeadChoice.Evidence.HEAD;
                }
                if (midTrials > 0) {
                    pw = (midHits + SMOOTHING * pc) / (midTrials + SMOOTHING);
                    eh = midHits;
                    et = midTrials;
                }
                TupleCounts headObject = counts.lexical(p, Part.HEAD_OBJECT);
                int hos = h > 0 && o > 0 ? headObject.slot(TupleKey.of(h, c + 1, o)) : -1;
                if (hos >= 0) {
                    pw = (headObject.hits(hos) + SMOOTHING * pw) / (headObject.trials(hos) + SMOOTHING);
                    ev = HeadChoice.Evidence.HEAD_WITH_OBJECT;
                    eh = headObject.hits(hos);
                    et = headObject.trials(hos);
                }
            }
            score[i] = s * Math.pow(pc / classRate[c], classWeight) * Math.pow(pw / pc, wordWeight);
            sum += score[i];
            evidence[i] = ev;
            evidenceHits[i] = eh;
            evidenceTrials[i] = et;
        }
        for (int i = 0; i < n; i++) score[i] = sum > 0 ? score[i] / sum : 1.0 / n;
        return new HeadChoice(score, evidence, evidenceHits, evidenceTrials);
    }
}
