package dev.tether.audit;

import java.util.ArrayList;
import java.util.List;

/**
 * A coordination decision of a ledger, in the shape DESIGN.md gives it: the coordinator and the conjuncts of the
 * chosen reading, each with its head.
 */
public record CoordinationEntry(int line, Span coordinator, List<Conjunct> conjuncts, double probability, double margin,
                                String evidenceText, String modelId) implements LedgerEntry {
    public static final String KIND = "coordination";

    /** One conjunct: its extent and its head word. */
    public record Conjunct(Span extent, Span head) {
    }

    public CoordinationEntry {
        conjuncts = List.copyOf(conjuncts);
    }

    @Override
    public String kind() { return KIND; }

    @Override
    public int anchor() { return coordinator.begin(); }

    @Override
    public List<Span> spans() {
        List<Span> all = new ArrayList<>(List.of(coordinator));
        for (Conjunct c : conjuncts) {
            all.add(c.extent());
            all.add(c.head());
        }
        return all;
    }
}
