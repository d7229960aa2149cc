package dev.tether.audit;

import java.util.ArrayList;
import java.util.List;

/** An attachment decision of a ledger: a preposition, its object, the chosen head and the ranked alternatives. */
public record AttachmentEntry(int line, Span preposition, Span object, Span head, String headClass, double probability,
                              double margin, List<Alternative> alternatives, String evidenceLevel, String evidenceCounts,
                              String evidenceText, String modelId) implements LedgerEntry {
    public static final String KIND = "attachment";

    /** One ranked candidate head. */
    public record Alternative(Span head, String headClass, double probability) {
    }

    public AttachmentEntry {
        alternatives = List.copyOf(alternatives);
    }

    @Override
    public String kind() { return KIND; }

    @Override
    public int anchor() { return preposition.begin(); }

    /** The best alternative that is not the chosen head, or null when there is none. */
    public Alternative runnerUp() {
        for (Alternative a : alternatives) {
            if (a.head().begin() != head.begin()) return a;
        }
        return null;
    }

    @Override
    public List<Span> spans() {
        List<Span> all = new ArrayList<>(List.of(preposition, object, head));
        Alternative r = runnerUp();
        if (r != null) all.add(r.head());
        return all;
    }
}
