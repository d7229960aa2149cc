package dev.tether.similarity;

/**
 * The weighted context vectors of a thesaurus's words, in compressed sparse rows: the contexts of word {@code w} are
 * {@code context[start[w] .. start[w+1])}, ascending, with their weights, all positive. Immutable; the arrays are
 * never handed out.
 */
final class ContextVectors {
    private final int[] start;
    private final int[] context;
    private final float[] weight;
    private final double[] norm;
    private final double[] total;
    private final int contexts;

    ContextVectors(int[] start, int[] context, float[] weight, int contexts) {
        this.start = start;
        this.context = context;
        this.weight = weight;
        this.contexts = contexts;
        int n = start.length - 1;
        this.norm = new double[n];
        this.total = new double[n];
        for (int w = 0; w < n; w++) {
            double squares = 0, sum = 0;
            for (int i = start[w]; i < start[w + 1]; i++) {
                squares += (double) weight[i] * weight[i];
                sum += weight[i];
            }
            norm[w] = Math.sqrt(squares);
            total[w] = sum;
        }
    }

    int words() { return start.length - 1; }
    int contexts() { return contexts; }
    int entries() { return context.length; }
    int start(int w) { return start[w]; }
    int end(int w) { return start[w + 1]; }
    int context(int i) { return context[i]; }
    float weight(int i) { return weight[i]; }
    double norm(int w) { return norm[w]; }
    double total(int w) { return total[w]; }

    /** The measure between words {@code a} and {@code b}: shared contexts merged in ascending order. */
    double similarity(SimilarityMeasure measure, int a, int b) {
        int i = start[a], ie = start[a + 1], j = start[b], je = start[b + 1];
        double shared = 0;
        while (i < ie && j < je) {
            int ca = context[i], cb = context[j];
            if (ca == cb) {
                shared += measure.shared(weight[i], weight[j]);
                i++;
                j++;
            } else if (ca < cb) {
                i++;
            } else {
                j++;
            }
        }
        return measure.finish(shared, norm[a], total[a], norm[b], total[b]);
    }

    /** Approximate heap bytes of the vectors. */
    long approximateBytes() {
        return 4L * start.length + 8L * context.length + 16L * norm.length;
    }
}
