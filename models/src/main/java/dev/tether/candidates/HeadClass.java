package dev.tether.candidates;

/**
 * The word class of a candidate attachment site. UD's split of prepositional phrases into {@code obl} (the head is
 * a verb, adjective or adverb) and {@code nmod} (the head is nominal) follows the same lines.
 */
public enum HeadClass {
    VERB, NOUN, ADJECTIVE, ADVERB;

    /** Each constant's label, made once: the engines ask for it for every candidate they write. */
    private final String label = name().toLowerCase(java.util.Locale.ROOT);

    /** The lower-case name used in annotations, ledgers and reports. */
    public String label() {
        return label;
    }
}
