package dev.tether.counts;

import dev.tether.vocabulary.Vocabulary;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;

/**
 * Counts for choosing a head among many candidates. Head words are keyed together with their class, so the
 * verb and the noun "report" never share a count. Every candidate of every training example is one trial of its
 * keys; it is a hit when it was the gold head. Lexical tables (per preposition, so the preposition is never part of
 * a key): head word with object, head word alone, head class with object; plus per preposition and class. The
 * structural table counts candidates by class, rank among candidates of that class and distance bucket, with no
 * words at all. Immutable; safe to share across threads.
 */
public final class HeadChoiceCounts {
    /** Lexical parts, per preposition. */
    public enum Part {
        HEAD_OBJECT(3), HEAD(2), CLASS_OBJECT(2), CLASS(1);

        private final int arity;

        Part(int arity) {
            this.arity = arity;
        }

        public int arity() {
            return arity;
        }
    }

    private static final Part[] PARTS = Part.values();

    private final Vocabulary words;
    private final Vocabulary prepositions;
    private final TupleCounts[][] lexical;
    private final TupleCounts structure;

    HeadChoiceCounts(Vocabulary words, Vocabulary prepositions, TupleCounts[][] lexical, TupleCounts structure) {
        this.words = words;
        this.prepositions = prepositions;
        this.lexical = lexical;
        this.structure = structure;
    }

    public Vocabulary words() { return words; }
    public Vocabulary prepositions() { return prepositions; }

    public TupleCounts lexical(int preposition, Part part) {
        return lexical[preposition][part.ordinal()];
    }

    /** Keys from {@link StructureKey}. */
    public TupleCounts structure() {
        return structure;
    }

    public long distinct(Part part) {
        long n = 0;
        for (TupleCounts[] t : lexical) n += t[part.ordinal()].size();
        return n;
    }

    public long approximateBytes() {
        long b = structure.approximateBytes();
        for (TupleCounts[] t : lexical) for (TupleCounts c : t) b += c.approximateBytes();
        return b;
    }

    public void write(DataOutput out) throws IOException {
        VocabularyCodec.write(words, out);
        VocabularyCodec.write(prepositions, out);
        for (TupleCounts[] perPreposition : lexical) for (TupleCounts t : perPreposition) t.write(out);
        structure.write(out);
    }

    public static HeadChoiceCounts read(DataInput in) throws IOException {
        Vocabulary words = VocabularyCodec.read(in);
        Vocabulary prepositions = VocabularyCodec.read(in);
        TupleCounts[][] lexical = new TupleCounts[prepositions.size() + 1][PARTS.length];
        for (TupleCounts[] perPreposition : lexical) {
            for (int k = 0; k < PARTS.length; k++) perPreposition[k] = TupleCounts.read(in);
        }
        return new HeadChoiceCounts(words, prepositions, lexical, TupleCounts.read(in));
    }
}
