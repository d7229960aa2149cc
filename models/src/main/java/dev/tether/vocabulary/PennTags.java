package dev.tether.vocabulary;

import gnu.trove.map.hash.TObjectIntHashMap;

/** Small integer ids for the Penn Treebank part-of-speech tags (Marcus et al. 1993); 0 for anything else. */
public final class PennTags {
    private static final String[] TAGS = {
            "CC", "CD", "DT", "EX", "FW", "IN", "JJ", "JJR", "JJS", "LS", "MD", "NN", "NNS", "NNP", "NNPS", "PDT", "POS",
            "PRP", "PRP$", "RB", "RBR", "RBS", "RP", "SYM", "TO", "UH", "VB", "VBD", "VBG", "VBN", "VBP", "VBZ", "WDT",
            "WP", "WP$", "WRB", "$", "#", ".", ",", ":", "``", "''", "-LRB-", "-RRB-", "HYPH", "NFP", "ADD", "AFX", "GW", "XX"};
    private static final TObjectIntHashMap<String> IDS = new TObjectIntHashMap<>(128, 0.5f, 0);

    static {
        for (int i = 0; i < TAGS.length; i++) IDS.put(TAGS[i], i + 1);
    }

    private PennTags() {
    }

    /** The id of {@code tag}, 0 when it is not a Penn tag. */
    public static int id(String tag) {
        return IDS.get(tag);
    }

    /** The tag of an id from {@link #id}, {@code "?"} for 0. */
    public static String tag(int id) {
        return id >= 1 && id <= TAGS.length ? TAGS[id - 1] : "?";
    }
}
