package dev.tether.benchmarks;

import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.DecisionBasis;
import dev.tether.attachment.QuadrupleDecision;

import java.util.HashMap;
import java.util.Map;

/**
 * The straightforward way to write the backed-off estimate of Collins &amp; Brooks (1995): one
 * {@code HashMap<String, double[]>} whose keys are the level's words concatenated, values {noun-attached, all}.
 * It takes words already normalized, so that comparing it with {@code BackedOffScorer} measures the tables only.
 * Kept here, beside the benchmark, as the yardstick; it is not part of Tether.
 */
final class StringKeyedBackOff {
    private final Map<String, double[]> counts = new HashMap<>();

    /** Counts one normalized training quadruple. */
    void add(String v, String n1, String p, String n2, boolean noun) {
        double hit = noun ? 1 : 0;
        count("Q " + v + " " + n1 + " " + p + " " + n2, hit);
        count("VN " + v + " " + n1 + " " + p, hit);
        count("VO " + v + " " + p + " " + n2, hit);
        count("NO " + n1 + " " + p + " " + n2, hit);
        count("V " + v + " " + p, hit);
        count("N " + n1 + " " + p, hit);
        count("O " + p + " " + n2, hit);
        count("P " + p, hit);
    }

    private void count(String key, double hit) {
        double[] c = counts.computeIfAbsent(key, k -> new double[2]);
        c[0] += hit;
        c[1] += 1;
    }

    int size() {
        return counts.size();
    }

    QuadrupleDecision decide(String v, String n1, String p, String n2) {
        double[] quad = counts.get("Q " + v + " " + n1 + " " + p + " " + n2);
        if (quad != null) return decision(quad[0], quad[1], DecisionBasis.QUADRUPLE);
        double hits = 0;
        double trials = 0;
        for (String key : new String[] {"VN " + v + " " + n1 + " " + p, "VO " + v + " " + p + " " + n2,
                "NO " + n1 + " " + p + " " + n2}) {
            double[] c = counts.get(key);
            if (c != null) {
                hits += c[0];
                trials += c[1];
            }
        }
        if (trials > 0) return decision(hits, trials, DecisionBasis.TRIPLES);
        for (String key : new String[] {"V " + v + " " + p, "N " + n1 + " " + p, "O " + p + " " + n2}) {
            double[] c = counts.get(key);
            if (c != null) {
                hits += c[0];
                trials += c[1];
            }
        }
        if (trials > 0) return decision(hits, trials, DecisionBasis.PAIRS);
        double[] prep = counts.get("P " + p);
        if (prep != null) return decision(prep[0], prep[1], DecisionBasis.PREPOSITION);
        return new QuadrupleDecision(AttachmentSite.NOUN, 1.0, DecisionBasis.DEFAULT, 0, 0, 1.0);
    }

    private static QuadrupleDecision decision(double noun, double all, DecisionBasis basis) {
        double pn = noun / all;
        return new QuadrupleDecision(pn >= 0.5 ? AttachmentSite.NOUN : AttachmentSite.VERB, pn, basis, noun, all, pn);
    }
}
