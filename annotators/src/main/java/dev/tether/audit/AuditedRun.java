package dev.tether.audit;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/**
 * An annotate run read back from its output folder: which model decided, the ledger of every document, and the
 * documents that failed (from {@code run-summary.json}).
 */
public record AuditedRun(Path folder, String model, String modelId, List<LedgerDocument> documents,
                         Map<String, String> failed) {
    public AuditedRun {
        documents = List.copyOf(documents);
        failed = Map.copyOf(failed);
    }

    /** One document's ledger. */
    public record LedgerDocument(String doc, Path ledger, List<LedgerEntry> entries) {
        public LedgerDocument {
            entries = List.copyOf(entries);
        }
    }

    public int decisions() {
        int n = 0;
        for (LedgerDocument d : documents) n += d.entries().size();
        return n;
    }
}
