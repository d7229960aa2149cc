package dev.tether.coordination;

import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;

/** Groups of coordination features that can be switched off together, for ablation. */
public enum CoordinationFeatureFamily {
    /** Distributional similarity of the two conjunct heads (Resnik 1999 used semantic similarity); needs a thesaurus. */
    SIMILARITY,
    /** Similarity of multiword conjuncts composed from word vectors, additive and multiplicative (Mitchell &amp; Lapata 2008); needs a thesaurus. */
    COMPOSITION,
    /** Parallel word classes, tags, tag sequences, lengths, suffixes and number of the conjuncts. */
    PARALLELISM,
    /** Treebank counts: coordinated head pairs, how often each head is a conjunct, modifier–head association. */
    ASSOCIATION,
    /** Distance from the coordinator and rank among candidates of a class. */
    DISTANCE,
    /** Commas and clause punctuation between the conjuncts, lists. */
    PUNCTUATION,
    /** The coordinator word, the modifier's kind and tag, and whether the last conjunct has its own such word. */
    STRUCTURE;

    public String label() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    public static CoordinationFeatureFamily byLabel(String label) {
        for (CoordinationFeatureFamily f : values()) if (f.label().equals(label)) return f;
        throw new IllegalArgumentException("unknown coordination feature family '" + label + "'; known: "
                + EnumSet.allOf(CoordinationFeatureFamily.class).stream().map(CoordinationFeatureFamily::label)
                .reduce((x, y) -> x + ", " + y).orElse(""));
    }

    public static int mask(Set<CoordinationFeatureFamily> families) {
        int m = 0;
        for (CoordinationFeatureFamily f : families) m |= 1 << f.ordinal();
        return m;
    }

    public static EnumSet<CoordinationFeatureFamily> fromMask(int mask) {
        EnumSet<CoordinationFeatureFamily> s = EnumSet.noneOf(CoordinationFeatureFamily.class);
        for (CoordinationFeatureFamily f : values()) if ((mask & (1 << f.ordinal())) != 0) s.add(f);
        return s;
    }
}
