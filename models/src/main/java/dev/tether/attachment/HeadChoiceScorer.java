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
                long e = t.find(TupleKey.of(c + 1));
                if (e != TupleCounts.ABSENT) {
                    hits[c] += TupleCounts.hitsIn(e);
                    trials[c] += TupleCounts.trialsIn(e);
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
        return choose(q, null, null, null, null);
    }

    /** Index of the structural entry in a row of {@link #choose(AttachmentQuery, double[][], long[][])}'s entries. */
    static final int STRUCTURE_ENTRY = Part.values().length;

    /**
     * As {@link #choose(AttachmentQuery)}; when {@code factors} is given (one row of three per candidate), it receives
     * each candidate's structural rate S, class factor (Pc/Rc) and word factor (Pw/Pc), and when {@code entries} is
     * given (one row of {@code STRUCTURE_ENTRY + 1} per candidate), the count entries it read for the candidate: one per
     * lexical {@link Part} (by ordinal) and the structural one last, {@link TupleCounts#ABSENT} where there was none;
     * {@code keys} and {@code ids}, when given, receive each candidate's normalized head key and its word id in the
     * counts (0 when unseen), so that a caller over the same counts need not work them out again.
     */
    HeadChoice choose(AttachmentQuery q, double[][] factors, long[][] entries, String[] keys, int[] ids) {
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
            long se = structure.find(structureKeys[i]);
            long ce = TupleCounts.ABSENT;
            long he = TupleCounts.ABSENT;
            long coe = TupleCounts.ABSENT;
            long hoe = TupleCounts.ABSENT;
            double s = se != TupleCounts.ABSENT
                    ? (TupleCounts.hitsIn(se) + SMOOTHING * PRIOR) / (TupleCounts.trialsIn(se) + SMOOTHING) : PRIOR / 4;
            double pc = classRate[c];
            double pw = pc;
            HeadChoice.Evidence ev = HeadChoice.Evidence.NONE;
            double eh = 0;
            double et = 0;
            if (p > 0) {
                ce = counts.lexical(p, Part.CLASS).find(TupleKey.of(c + 1));
                if (ce != TupleCounts.ABSENT) {
                    eh = TupleCounts.hitsIn(ce);
                    et = TupleCounts.trialsIn(ce);
                    pc = (eh + SMOOTHING * classRate[c]) / (et + SMOOTHING);
                    ev = HeadChoice.Evidence.CLASS;
                }
                pw = pc;
                String key = headKey(normalizer, q.head(i), hc);
                int h = words.id(key);
                if (keys != null) {
                    keys[i] = key;
                    ids[i] = Math.max(0, h);
                }
                double midHits = 0;
                double midTrials = 0;
                if (h > 0) he = counts.lexical(p, Part.HEAD).find(TupleKey.of(h, c + 1));
                if (o > 0) coe = counts.lexical(p, Part.CLASS_OBJECT).find(TupleKey.of(c + 1, o));
                if (coe != TupleCounts.ABSENT) {
                    midHits += TupleCounts.hitsIn(coe);
                    midTrials += TupleCounts.trialsIn(coe);
                    ev = HeadChoice.Evidence.CLASS_WITH_OBJECT;
                }
                if (he != TupleCounts.ABSENT) {
                    midHits += TupleCounts.hitsIn(he);
                    midTrials += TupleCounts.trialsIn(he);
                    ev = HeadChoice.Evidence.HEAD;
                }
                if (midTrials > 0) {
                    pw = (midHits + SMOOTHING * pc) / (midTrials + SMOOTHING);
                    eh = midHits;
                    et = midTrials;
                }
                if (h > 0 && o > 0) hoe = counts.lexical(p, Part.HEAD_OBJECT).find(TupleKey.of(h, c + 1, o));
                if (hoe != TupleCounts.ABSENT) {
                    eh = TupleCounts.hitsIn(hoe);
                    et = TupleCounts.trialsIn(hoe);
                    pw = (eh + SMOOTHING * pw) / (et + SMOOTHING);
                    ev = HeadChoice.Evidence.HEAD_WITH_OBJECT;
                }
            }
            score[i] = s * Math.pow(pc / classRate[c], classWeight) * Math.pow(pw / pc, wordWeight);
            if (factors != null) {
                factors[i][0] = s;
                factors[i][1] = pc / classRate[c];
                factors[i][2] = pw / pc;
            }
            if (entries != null) {
                entries[i][Part.HEAD_OBJECT.ordinal()] = hoe;
                entries[i][Part.HEAD.ordinal()] = he;
                entries[i][Part.CLASS_OBJECT.ordinal()] = coe;
                entries[i][Part.CLASS.ordinal()] = ce;
                entries[i][STRUCTURE_ENTRY] = se;
            }
            sum += score[i];
            evidence[i] = ev;
            evidenceHits[i] = eh;
            evidenceTrials[i] = et;
        }
        for (int i = 0; i < n; i++) score[i] = sum > 0 ? score[i] / sum : 1.0 / n;
        return new HeadChoice(score, evidence, evidenceHits, evidenceTrials);
    }
}
