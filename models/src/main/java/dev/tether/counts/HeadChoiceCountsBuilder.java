package dev.tether.counts;

import dev.tether.vocabulary.Vocabulary;

import java.util.ArrayList;
import java.util.List;

/**
 * Accumulates {@link HeadChoiceCounts}. Words arrive normalized; classes as ordinals of
 * {@link dev.tether.candidates.HeadClass}. Builders add up like {@link QuadrupleCountsBuilder}.
 */
public final class HeadChoiceCountsBuilder {
    private static final HeadChoiceCounts.Part[] PARTS = HeadChoiceCounts.Part.values();

    private final Vocabulary words = new Vocabulary();
    private final Vocabulary prepositions = new Vocabulary();
    private final List<TupleCountsBuilder[]> lexical = new ArrayList<>();
    private final TupleCountsBuilder structure = new TupleCountsBuilder();

    public HeadChoiceCountsBuilder() {
        newPreposition();
    }

    private void newPreposition() {
        TupleCountsBuilder[] perPart = new TupleCountsBuilder[PARTS.length];
        for (int k = 0; k < perPart.length; k++) perPart[k] = new TupleCountsBuilder();
        lexical.add(perPart);
    }

    /** Counts one candidate's lexical keys: {@code hit} when it was the gold head. */
    public void addLexical(String preposition, String head, int headClass, String object, boolean hit, double weight) {
        addLexical(preposition, head, headClass, object, hit ? weight : 0, weight);
    }

    /** Adds {@code hits} and {@code trials} to one candidate's lexical keys (fractional hits come from re-estimation). */
    public void addLexical(String preposition, String head, int headClass, String object, double hits, double trials) {
        int p = prepositions.add(preposition);
        if (p == lexical.size()) newPreposition();
        int h = words.add(head);
        int o = words.add(object);
        double weight = trials;
        TupleCountsBuilder[] perPart = lexical.get(p);
        perPart[HeadChoiceCounts.Part.HEAD_OBJECT.ordinal()].add(TupleKey.of(h, headClass + 1, o), hits, weight);
        perPart[HeadChoiceCounts.Part.HEAD.ordinal()].add(TupleKey.of(h, headClass + 1), hits, weight);
        perPart[HeadChoiceCounts.Part.CLASS_OBJECT.ordinal()].add(TupleKey.of(headClass + 1, o), hits, weight);
        perPart[HeadChoiceCounts.Part.CLASS.ordinal()].add(TupleKey.of(headClass + 1), hits, weight);
    }

    /** Counts one candidate's structural key (see {@link StructureKey}). */
    public void addStructure(long structureKey, boolean hit, double weight) {
        structure.add(structureKey, hit ? weight : 0, weight);
    }

    /** Adds {@code hits} (no trials) to a structural key: a share of a case already counted as a trial. */
    public void addStructureHits(long structureKey, double hits) {
        structure.add(structureKey, hits, 0);
    }

    /** Adds all counts of {@code other}. */
    public void addAll(HeadChoiceCounts other) {
        addAll(other, 1.0);
    }

    /** Adds all counts of {@code other} multiplied by {@code scale}. */
    public void addAll(HeadChoiceCounts other, double scale) {
        Vocabulary ow = other.words();
        int[] wordMap = new int[ow.size() + 1];
        for (int i = 1; i <= ow.size(); i++) wordMap[i] = words.add(ow.word(i));
        for (int q = 1; q <= other.prepositions().size(); q++) {
            int p = prepositions.add(other.prepositions().word(q));
            if (p == lexical.size()) newPreposition();
            TupleCountsBuilder[] perPart = lexical.get(p);
            perPart[HeadChoiceCounts.Part.HEAD_OBJECT.ordinal()].addAll(other.lexical(q, HeadChoiceCounts.Part.HEAD_OBJECT),
                    k -> TupleKey.of(wordMap[TupleKey.part(k, 3, 0)], TupleKey.part(k, 3, 1), wordMap[TupleKey.part(k, 3, 2)]), scale);
            perPart[HeadChoiceCounts.Part.HEAD.ordinal()].addAll(other.lexical(q, HeadChoiceCounts.Part.HEAD),
                    k -> TupleKey.of(wordMap[TupleKey.part(k, 2, 0)], TupleKey.part(k, 2, 1)), scale);
            perPart[HeadChoiceCounts.Part.CLASS_OBJECT.ordinal()].addAll(other.lexical(q, HeadChoiceCounts.Part.CLASS_OBJECT),
                    k -> TupleKey.of(TupleKey.part(k, 2, 0), wordMap[TupleKey.part(k, 2, 1)]), scale);
            perPart[HeadChoiceCounts.Part.CLASS.ordinal()].addAll(other.lexical(q, HeadChoiceCounts.Part.CLASS), k -> k, scale);
        }
        structure.addAll(other.structure(), k -> k, scale);
    }

    /** The counts with words and prepositions numbered in sorted order; see {@link QuadrupleCountsBuilder#buildSorted}. */
    public HeadChoiceCounts buildSorted() {
        HeadChoiceCounts arrival = build();
        HeadChoiceCountsBuilder sorted = new HeadChoiceCountsBuilder();
        for (String w : QuadrupleCountsBuilder.sortedWords(arrival.words())) sorted.words.add(w);
        for (String p : QuadrupleCountsBuilder.sortedWords(arrival.prepositions())) {
            sorted.prepositions.add(p);
            sorted.newPreposition();
        }
        sorted.addAll(arrival);
        return sorted.build();
    }

    public HeadChoiceCounts build() {
        TupleCounts[][] built = new TupleCounts[lexical.size()][PARTS.length];
        for (int p = 0; p < built.length; p++) {
            for (int k = 0; k < PARTS.length; k++) built[p][k] = lexical.get(p)[k].build();
        }
        return new HeadChoiceCounts(words.frozenCopy(), prepositions.frozenCopy(), built, structure.build());
    }
}
