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

    /**
     * Counts the parts of a quadruple that is known only in part: an attachment read off unlabelled text names the
     * verb or the first noun, not both. {@code verb} or {@code noun1} is {@code null} for the word not known; only the
     * sub-tuples made of known words are counted (never the whole quadruple), and the preposition's totals.
     */
    public void addPartial(String verb, String noun1, String preposition, String noun2, AttachmentSite site, double weight) {
        if ((verb == null) == (noun1 == null)) {
            throw new IllegalArgumentException("a partial quadruple names exactly one of verb and first noun");
        }
        int v = verb == null ? 0 : words.add(verb);
        int n1 = noun1 == null ? 0 : words.add(noun1);
        int n2 = words.add(noun2);
        int p = prepositions.add(preposition);
        if (p == tables.size()) newPreposition();
        double hit = site == AttachmentSite.NOUN ? weight : 0;
        TupleCountsBuilder[] perPart = tables.get(p);
        for (SubTuple part : PARTS) {
            boolean needsVerb = part == SubTuple.VERB_NOUN1_NOUN2 || part == SubTuple.VERB_NOUN1 || part == SubTuple.VERB_NOUN2
                    || part == SubTuple.VERB;
            boolean needsNoun1 = part == SubTuple.VERB_NOUN1_NOUN2 || part == SubTuple.VERB_NOUN1
                    || part == SubTuple.NOUN1_NOUN2 || part == SubTuple.NOUN1;
            if ((needsVerb && v == 0) || (needsNoun1 && n1 == 0)) continue;
            perPart[part.ordinal()].add(part.key(v, n1, n2), hit, weight);
        }
        double[] pc = prepositionCounts.get(p);
        pc[0] += hit;
        pc[1] += weight;
        if (v != 0) verbs.add(TupleKey.of(v), hit, weight);
        if (n1 != 0) nouns1.add(TupleKey.of(n1), hit, weight);
    }

    /** Adds all counts of {@code other} (which may use other ids for the same words). */
    public void addAll(QuadrupleCounts other) {
        addAll(other, 1.0);
    }

    /** Adds all counts of {@code other} multiplied by {@code scale} (how much one of its events counts here). */
    public void addAll(QuadrupleCounts other, double scale) {
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
                perPart[part.ordinal()].addAll(other.table(q, part), key -> remap(key, arity, wordMap), scale);
            }
            double[] pc = prepositionCounts.get(p);
            pc[0] += other.prepositionNounCount(q) * scale;
            pc[1] += other.prepositionCount(q) * scale;
        }
        verbs.addAll(other.verbs(), key -> remap(key, 1, wordMap), scale);
        nouns1.addAll(other.nouns1(), key -> remap(key, 1, wordMap), scale);
    }

    /**
     * The counts with words and prepositions numbered in sorted order rather than in order of arrival. Builders whose
     * counts are whole numbers (below 2^24 per entry, where the stored floats are exact) that hold the same events
     * give the same sorted counts however the events were split among builders and in whatever order they were
     * added: whole-number sums do not depend on order, and neither do the sorted ids.
     */
    public QuadrupleCounts buildSorted() {
        QuadrupleCounts arrival = build();
        QuadrupleCountsBuilder sorted = new QuadrupleCountsBuilder();
        for (String w : sortedWords(arrival.words())) sorted.words.add(w);
        for (String p : sortedWords(arrival.prepositions())) {
            sorted.prepositions.add(p);
            sorted.newPreposition();
        }
        sorted.addAll(arrival);
        return sorted.build();
    }

    static List<String> sortedWords(Vocabulary v) {
        List<String> w = new ArrayList<>(v.words());
        w.sort(null);
        return w;
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
