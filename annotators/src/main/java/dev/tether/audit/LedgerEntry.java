package dev.tether.audit;

/**
 * One decision read back from a ledger. Each {@code kind} of the ledger has its own entry type; the report, the
 * review queue and the summary dispatch on it, so that a new kind (coordination) adds a type and its drawing.
 */
public sealed interface LedgerEntry permits AttachmentEntry, CoordinationEntry {
    /** The ledger's {@code kind} value. */
    String kind();

    /** Line of the ledger file it was read from (1-based). */
    int line();

    /** Where the decision starts in the document (code points): the preposition, the coordinator. */
    int anchor();

    double probability();

    double margin();

    /** Identifier of the model that decided. */
    String modelId();

    /** The decisive statistic in words. */
    String evidenceText();

    /** Every span the decision touches, for placing it in a sentence. */
    java.util.List<Span> spans();
}
