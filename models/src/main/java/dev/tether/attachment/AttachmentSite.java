package dev.tether.attachment;

/** The two answers of the classic quadruple question, with the one-letter labels of the benchmark data. */
public enum AttachmentSite {
    VERB('V'), NOUN('N');

    private final char label;

    AttachmentSite(char label) { this.label = label; }

    public char label() { return label; }

    /** The site for a label {@code V} or {@code N}; {@code null} for anything else. */
    public static AttachmentSite ofLabel(String label) {
        if ("V".equals(label)) return VERB;
        if ("N".equals(label)) return NOUN;
        return null;
    }
}
