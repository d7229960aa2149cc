package dev.tether.counts;

import dev.tether.attachment.AttachmentSite;
import dev.tether.vocabulary.Vocabulary;

import java.util.ArrayList;
import java.util.List;

/**
 * Counts labelled quadruples whose words are already normalized. Builders add up: counting two sources apart and
 * adding them ({@link #addAll}) gives the same counts as counting their union.
 */
public final class QuadrupleCountsBuilder {
    private static final SubTuple[] PARTS = SubTuple.values();

    private final Vocabulary words = new Vocabulary();
    private final Vocabulary prepositions = new Vocabulary();
    private final List<TupleCountsBuilder[]> tables = new ArrayList<>();
    private final List<double[]> prepositionCounts = new ArrayList<>();
    private final TupleCountsBuilder verbs = new TupleCountsBuilder();
    private final TupleCountsBuilder nouns1 = new TupleCountsBuilder();

    public QuadrupleCountsBuilder() {
        newPreposition(); // slot 0: the unknown preposition, always empty
    }

    private void newPreposition() {
        TupleCountsBuilder[] perPart = new TupleCountsBuilder[PARTS.length];
        for (int k = 0; k < perPart.length; k++) perPart[k] = new TupleCountsBuilder();
        tables.add(perPart);
        prepositionCounts.add(new double[2]);
    }

    /** Counts one quadruple with weight {@code weight} (1 for an observed example). */
    public void add(String verb, String noun1, String preposition, String noun2, AttachmentSite site, double weight) {
        int v = words.add(verb);
        int n1 = words.add(noun1);
        int n2 = words.add(noun2);
        int p = prepositions.add(preposition);
        if (p == tables.size()) newPreposition();
        double hit = site == AttachmentSite.NOUN ? weight : 0;
        TupleCountsBuilder[] perPart = tables.get(p);
        for (SubTuple part : PARTS) perPart[part.ordinal()].add(part.key(v, n1, n2), hit, weight);
        double[] pc = prepositionCounts.get(p);
        pc[0] += hit;
        pc[1] += weight;
        verbs.add(TupleKey.of(v), hit, weight);
        nouns1.add(TupleKey.of(n1), hit, weight);
    }

    /** Adds all counts of {@code other} (which may use other ids for the same words). */
    public void addAll(QuadrupleCounts other) {
        Vocabulary ow = other.words();
        Vocabulary op = other.prepositions();
        int[] wordMap = new int[ow.size() + 1];
        for (int i = 1; i <= ow.size(); i++) wordMap[i] = words.add(ow.word(i));
        for (int q = 1; q <= op.size(); q++) {
            int p = prepositions.add(op.word(q));
            if (p == tables.size()) newPreposition();
            TupleCountsBuilder[] perPart = tables.get(p);
            for (SubTuple part : PARTS) {
                int arity = part.arity();
                perPart[part.ordinal()].addAll(other.table(q, part), key -> remap(key, arity, wordMap));
            }
            double[] pc = prepositionCounts.get(p);
            pc[0] += other.prepositionNounCount(q);
            pc[1] += other.prepositionCount(q);
        }
        verbs.addAll(other.verbs(), key -> remap(key, 1, wordMap));
        nouns1.addAll(other.nouns1(), key -> remap(key, 1, wordMap));
    }

    private static long remap(long key, int arity, int[] wordMap) {
        switch (arity) {
            case 1: return TupleKey.of(wordMap[TupleKey.part(key, 1, 0)]);
            case 2: return TupleKey.of(wordMap[TupleKey.part(key, 2, 0)], wordMap[TupleKey.part(key, 2, 1)]);
            default: return TupleKey.of(wordMap[TupleKey.part(key, 3, 0)], wordMap[TupleKey.part(key, 3, 1)],
                    wordMap[TupleKey.part(key, 3, 2)]);
        }
    }

    public QuadrupleCounts build() {
        int np = tables.size();
        TupleCounts[][] built = new TupleCounts[np][PARTS.length];
        double[] noun = new double[np];
        double[] total = new double[np];
        for (int p = 0; p < np; p++) {
            for (int k = 0; k < PARTS.length; k++) built[p][k] = tables.get(p)[k].build();
            noun[p] = prepositionCounts.get(p)[0];
            total[p] = prepositionCounts.get(p)[1];
        }
        return new QuadrupleCounts(words.frozenCopy(), prepositions.frozenCopy(), built, noun, total,
                verbs.build(), nouns1.build());
    }
}
