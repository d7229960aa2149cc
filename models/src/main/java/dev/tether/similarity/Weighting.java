package dev.tether.similarity;

import java.util.Locale;

/**
 * How much a context says about a word. Every weighting turns the count {@code f(w,c)} of word {@code w} in context
 * {@code c}, with the marginals {@code f(w)} and {@code f(c)} and the total {@code N} of the co-occurrence table, into
 * a non-negative weight; contexts that occur with everything (frequent and uninformative) get little or none.
 * A weight of 0 drops the context from the word's vector. Negative association values are clipped to 0: estimated
 * from sparse counts they are unreliable, and Lin's measure needs non-negative weights (Lin 1998).
 */
public enum Weighting {
    /** {@code f(w,c) / f(c)}: the relative frequency of the word over the context's total. */
    RELATIVE("relative") {
        @Override double weight(double fwc, double fw, double fc, double n, double smoothedFc, double smoothedTotal) {
            return fwc / fc;
        }
    },
    /** Positive pointwise mutual information, {@code max(0, log(f(w,c) N / (f(w) f(c))))} (Church &amp; Hanks 1990). */
    PPMI("ppmi") {
        @Override double weight(double fwc, double fw, double fc, double n, double smoothedFc, double smoothedTotal) {
            return Math.max(0, Math.log(fwc * n / (fw * fc)));
        }
    },
    /**
     * Positive PMI with the context distribution smoothed by raising context counts to the power 0.75, which
     * lowers the PMI of rare contexts (Levy, Goldberg &amp; Dagan 2015):
     * {@code max(0, log(P(w,c) / (P(w) P_0.75(c))))}.
     */
    PPMI_SMOOTHED("ppmi-smoothed") {
        @Override double weight(double fwc, double fw, double fc, double n, double smoothedFc, double smoothedTotal) {
            return Math.max(0, Math.log((fwc / n) / ((fw / n) * (smoothedFc / smoothedTotal))));
        }
    },
    /**
     * The t-test of the association, {@code (P(w,c) - P(w) P(c)) / sqrt(P(w) P(c))}, positive part (the usual
     * t-score approximation of collocation statistics; common practice).
     */
    TTEST("ttest") {
        @Override double weight(double fwc, double fw, double fc, double n, double smoothedFc, double smoothedTotal) {
            double expected = (fw / n) * (fc / n);
            return Math.max(0, (fwc / n - expected) / Math.sqrt(expected));
        }
    };

    /** The exponent of context counts in {@link #PPMI_SMOOTHED}. */
    public static final double CONTEXT_SMOOTHING = 0.75;

    private final String label;

    Weighting(String label) {
        this.label = label;
    }

    /**
     * The weight of a cell: {@code fwc} its count, {@code fw} and {@code fc} the word's and the context's totals,
     * {@code n} the table's total, {@code smoothedFc} = {@code fc^0.75} and {@code smoothedTotal} the sum of those
     * over all contexts (used by {@link #PPMI_SMOOTHED} only).
     */
    abstract double weight(double fwc, double fw, double fc, double n, double smoothedFc, double smoothedTotal);

    /** The name used on the command line and in thesaurus files. */
    public String label() {
        return label;
    }

    /** The weighting called {@code label}; the message lists the names when there is none. */
    public static Weighting of(String label) {
        for (Weighting w : values()) {
            if (w.label.equals(label.toLowerCase(Locale.ROOT))) return w;
        }
        throw new IllegalArgumentException("unknown weighting '" + label + "'; choose one of " + labels());
    }

    static String labels() {
        StringBuilder s = new StringBuilder();
        for (Weighting w : values()) s.append(s.length() == 0 ? "" : ", ").append(w.label);
        return s.toString();
    }
}
