package dev.tether.candidates;

import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * The part-of-speech tag sets the candidate finder reads, and how each maps onto the Penn Treebank tags that
 * {@link HeadCandidateProposer} works with.
 *
 * <ul>
 *   <li>{@link #PENN}: the Penn Treebank tag set (Marcus, Santorini and Marcinkiewicz 1993), with the additions of the
 *       English Web Treebank's XPOS column ({@code ADD}, {@code AFX}, {@code GW}, {@code HYPH}, {@code NFP},
 *       {@code XX}; Silveira et al. 2014). Read as they are.</li>
 *   <li>{@link #UD}: the 17 universal part-of-speech tags of Universal Dependencies v2 (UPOS). Mapped to the Penn tag
 *       that the UD project's English conversion table pairs with each (universaldependencies.org, "tagset
 *       conversion", en-penn-uposf): NOUN→NN, PROPN→NNP, VERB and AUX→VB (a modal auxiliary → MD), ADJ→JJ,
 *       ADV→RB, ADP and SCONJ→IN, DET→DT, PRON→PRP, NUM→CD, CCONJ→CC, PART→TO/POS/RB/RP by its word, PUNCT by its
 *       character, SYM→SYM ({@code $}→$), INTJ→UH, X→FW. UPOS does not separate participles from finite verbs, so
 *       every verb is read as a finite verb.</li>
 * </ul>
 */
public enum TagSet {
    PENN, UD;

    /** Penn Treebank tags (Marcus et al. 1993, table 2) and the English Web Treebank's additions. */
    private static final Set<String> PENN_TAGS = Set.of("CC", "CD", "DT", "EX", "FW", "IN", "JJ", "JJR", "JJS", "LS",
            "MD", "NN", "NNS", "NNP", "NNPS", "PDT", "POS", "PRP", "PRP$", "RB", "RBR", "RBS", "RP", "SYM", "TO", "UH",
            "VB", "VBD", "VBG", "VBN", "VBP", "VBZ", "WDT", "WP", "WP$", "WRB", "#", "$", ".", ",", ":", "(", ")",
            "-LRB-", "-RRB-", "``", "''", "ADD", "AFX", "GW", "HYPH", "NFP", "XX");

    /** Universal Dependencies v2 UPOS tags, each with its Penn counterpart (see the class comment). */
    private static final Map<String, String> UPOS_TO_PENN = Map.ofEntries(Map.entry("NOUN", "NN"),
            Map.entry("PROPN", "NNP"), Map.entry("VERB", "VB"), Map.entry("AUX", "VB"), Map.entry("ADJ", "JJ"),
            Map.entry("ADV", "RB"), Map.entry("ADP", "IN"), Map.entry("SCONJ", "IN"), Map.entry("DET", "DT"),
            Map.entry("PRON", "PRP"), Map.entry("NUM", "CD"), Map.entry("CCONJ", "CC"), Map.entry("PART", "RP"),
            Map.entry("PUNCT", "NFP"), Map.entry("SYM", "SYM"), Map.entry("INTJ", "UH"), Map.entry("X", "FW"));

    /** English modal auxiliaries (Penn MD); common practice. */
    private static final Set<String> MODALS = Set.of("can", "could", "may", "might", "must", "shall", "should", "will",
            "would", "ca", "wo", "'ll", "'d");

    /** Whether {@code tag} belongs to this tag set. */
    public boolean contains(String tag) {
        return this == PENN ? PENN_TAGS.contains(tag) : UPOS_TO_PENN.containsKey(tag);
    }

    /**
     * The Penn Treebank tag for a token tagged {@code tag} in this set; {@code word} settles the UPOS tags whose Penn
     * counterpart depends on the word (AUX, PART, PUNCT, SYM). A tag outside the set is returned as it is.
     */
    public String toPenn(String tag, String word) {
        if (this == PENN) return tag;
        String penn = UPOS_TO_PENN.get(tag);
        if (penn == null) return tag;
        String w = word.toLowerCase(Locale.ROOT);
        switch (tag) {
            case "AUX": return MODALS.contains(w) ? "MD" : "VB";
            case "PART":
                if (w.equals("to")) return "TO";
                if (w.equals("'s") || w.equals("'") || w.equals("’s")) return "POS";
                if (w.equals("not") || w.equals("n't")) return "RB";
                return "RP";
            case "PUNCT": return punctuation(w);
            case "SYM": return w.equals("$") ? "$" : "SYM";
            default: return penn;
        }
    }

    private static String punctuation(String w) {
        switch (w) {
            case ".": case "!": case "?": return ".";
            case ",": return ",";
            case ":": case ";": case "--": case "...": return ":";
            case "(": case "[": case "{": return "-LRB-";
            case ")": case "]": case "}": return "-RRB-";
            case "\"": case "``": case "“": return "``";
            case "''": case "”": return "''";
            case "-": return "HYPH";
            default: return "NFP";
        }
    }

    /** The value of the finder's {@code tagset} parameter: {@code penn}, {@code ud}, or {@code null} for {@code auto}. */
    public static TagSet parameter(String value, String parameterName) {
        switch (value == null ? "" : value.trim().toLowerCase(Locale.ROOT)) {
            case "penn": return PENN;
            case "ud": return UD;
            case "auto": return null;
            default:
                throw new IllegalArgumentException("Parameter " + parameterName + " must be 'penn', 'ud' or 'auto', was '"
                        + value + "'");
        }
    }
}
