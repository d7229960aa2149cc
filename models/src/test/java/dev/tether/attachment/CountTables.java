package dev.tether.attachment;

import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.QuadrupleCountsBuilder;

/** Builds tiny count tables for scorer tests from lines "verb noun1 preposition noun2 N|V" of normalized words. */
final class CountTables {
    private CountTables() {
    }

    static QuadrupleCounts of(String... lines) {
        QuadrupleCountsBuilder builder = new QuadrupleCountsBuilder();
        for (String line : lines) {
            String[] f = line.trim().split("\\s+");
            if (f.length != 5) throw new IllegalArgumentException("bad test line: " + line);
            builder.add(f[0], f[1], f[2], f[3], AttachmentSite.ofLabel(f[4]), 1.0);
        }
        return builder.build();
    }

    /** Decides the quadruple of normalized words {@code v n1 p n2}; words the table never saw get id 0. */
    static QuadrupleDecision decide(QuadrupleScorer scorer, QuadrupleCounts counts, String quadruple) {
        String[] f = quadruple.trim().split("\\s+");
        return scorer.decide(counts.words().id(f[0]), counts.words().id(f[1]), counts.prepositions().id(f[2]),
                counts.words().id(f[3]));
    }
}
