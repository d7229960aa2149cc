package dev.tether.attachment;

import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;

/** Groups of attachment features that can be switched off together, for ablation. */
public enum AttachmentFeatureFamily {
    /** The count-based head-choice score of {@link HeadChoiceScorer} and the level its evidence came from. */
    COUNT_SCORE,
    /** Log-odds and counts of every lexical back-off level, the structural rate, and the Collins &amp; Brooks estimate. */
    BACKED_OFF,
    /** Hindle &amp; Rooth (1993) lexical association of the preposition with the verb against the noun. */
    ASSOCIATION,
    /** Word class of the candidate with the preposition. */
    CLASS_PREPOSITION,
    /** Distance and rank buckets, and whether the head comes before or after the phrase. */
    POSITION,
    /** Punctuation between the candidate and the preposition. */
    PUNCTUATION,
    /** Fine part-of-speech tags of the candidate and of the object. */
    TAGS,
    /** Forms of "be" and light verbs ("take", "make", "have", ...). */
    LIGHT_VERBS,
    /** Pronoun and proper-noun candidates. */
    PRONOUN_PROPER,
    /** Frequent head words with the preposition. */
    HEAD_WORDS,
    /** The kind of the object (pronoun, number, name, gerund, noun). */
    OBJECT_CLASS,
    /**
     * Counts of the candidate's and the object's nearest neighbours in the model's thesaurus, and the similarity-smoothed
     * quadruple estimate (Dagan, Lee &amp; Pereira 1999; Zhao &amp; Lin 2004); off when the model has no thesaurus.
     */
    SIMILAR_WORDS;

    public String label() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    public static AttachmentFeatureFamily byLabel(String label) {
        for (AttachmentFeatureFamily f : values()) if (f.label().equals(label)) return f;
        throw new IllegalArgumentException("unknown feature family '" + label + "'; known: " + EnumSet.allOf(AttachmentFeatureFamily.class).stream()
                .map(AttachmentFeatureFamily::label).reduce((x, y) -> x + ", " + y).orElse(""));
    }

    /** A bit set of families, as stored in model files. */
    public static int mask(Set<AttachmentFeatureFamily> families) {
        int m = 0;
        for (AttachmentFeatureFamily f : families) m |= 1 << f.ordinal();
        return m;
    }

    public static EnumSet<AttachmentFeatureFamily> fromMask(int mask) {
        EnumSet<AttachmentFeatureFamily> s = EnumSet.noneOf(AttachmentFeatureFamily.class);
        for (AttachmentFeatureFamily f : values()) if ((mask & (1 << f.ordinal())) != 0) s.add(f);
        return s;
    }
}
