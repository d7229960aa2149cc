package dev.tether.counts;

import dev.tether.vocabulary.Vocabulary;
import dev.tether.vocabulary.WordNormalizer;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;

/**
 * Counts of labelled quadruples, for the back-off and for lexical association: per preposition, one
 * {@link TupleCounts} for every {@link SubTuple} (hits = attachments to the noun, trials = all), the preposition's
 * own totals, and per verb and per first noun how often each occurred at all. Word ids come from {@link #words()},
 * preposition ids from {@link #prepositions()}. Immutable once built; safe to share across threads.
 */
public final class QuadrupleCounts {
    private static final SubTuple[] PARTS = SubTuple.values();

    private final Vocabulary words;
    private final Vocabulary prepositions;
    /** [preposition id][sub-tuple ordinal]; index 0 (unknown preposition) holds empty tables. */
    private final TupleCounts[][] tables;
    private final double[] prepositionNoun;
    private final double[] prepositionTotal;
    private final TupleCounts verbs;
    private final TupleCounts nouns1;
    private final double nounTotal;
    private final double total;

    QuadrupleCounts(Vocabulary words, Vocabulary prepositions, TupleCounts[][] tables, double[] prepositionNoun,
                    double[] prepositionTotal, TupleCounts verbs, TupleCounts nouns1) {
        this.words = words;
        this.prepositions = prepositions;
        this.tables = tables;
        this.prepositionNoun = prepositionNoun;
        this.prepositionTotal = prepositionTotal;
        this.verbs = verbs;
        this.nouns1 = nouns1;
        double n = 0, t = 0;
        for (int p = 0; p < prepositionTotal.length; p++) {
            n += prepositionNoun[p];
            t += prepositionTotal[p];
        }
        this.nounTotal = n;
        this.total = t;
    }

    public Vocabulary words() { return words; }
    public Vocabulary prepositions() { return prepositions; }

    /** The table of one part of the quadruple under preposition {@code p}. */
    public TupleCounts table(int p, SubTuple part) {
        return tables[p][part.ordinal()];
    }

    public double prepositionNounCount(int p) { return prepositionNoun[p]; }
    public double prepositionCount(int p) { return prepositionTotal[p]; }
    /** Per verb id: trials = quadruples with that verb, hits = those attached to the noun. */
    public TupleCounts verbs() { return verbs; }
    /** Per first-noun id: trials = quadruples with that noun, hits = those attached to the noun. */
    public TupleCounts nouns1() { return nouns1; }
    public double nounAttachments() { return nounTotal; }
    /** Number of quadruples counted (weights summed). */
    public double total() { return total; }

    /** Ids of a quadruple's words under this model's vocabularies, after normalization; unknown words get 0. */
    public int[] encode(WordNormalizer normalizer, String verb, String noun1, String preposition, String noun2) {
        return new int[] {
                words.id(normalizer.verb(verb)), words.id(normalizer.noun(noun1)),
                prepositions.id(normalizer.preposition(preposition)), words.id(normalizer.noun(noun2))};
    }

    /** Number of distinct keys over all prepositions for one part. */
    public long distinct(SubTuple part) {
        long n = 0;
        for (TupleCounts[] perPreposition : tables) n += perPreposition[part.ordinal()].size();
        return n;
    }

    public long approximateBytes() {
        long b = 0;
        for (TupleCounts[] perPreposition : tables) for (TupleCounts t : perPreposition) b += t.approximateBytes();
        return b + verbs.approximateBytes() + nouns1.approximateBytes() + 16L * prepositionTotal.length;
    }

    public void write(DataOutput out) throws IOException {
        VocabularyCodec.write(words, out);
        VocabularyCodec.write(prepositions, out);
        for (int p = 0; p < tables.length; p++) {
            out.writeDouble(prepositionNoun[p]);
            out.writeDouble(prepositionTotal[p]);
            for (TupleCounts t : tables[p]) t.write(out);
        }
        verbs.write(out);
        nouns1.write(out);
    }

    public static QuadrupleCounts read(DataInput in) throws IOException {
        Vocabulary words = VocabularyCodec.read(in);
        Vocabulary prepositions = VocabularyCodec.read(in);
        int np = prepositions.size() + 1;
        TupleCounts[][] tables = new TupleCounts[np][PARTS.length];
        double[] noun = new double[np];
        double[] tot = new double[np];
        for (int p = 0; p < np; p++) {
            noun[p] = in.readDouble();
            tot[p] = in.readDouble();
            for (int k = 0; k < PARTS.length; k++) tables[p][k] = TupleCounts.read(in);
        }
        return new QuadrupleCounts(words, prepositions, tables, noun, tot, TupleCounts.read(in), TupleCounts.read(in));
    }
}
