package dev.tether.similarity;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * The k nearest neighbours of every word among the words of its own class, scored through an inverted index over
 * contexts: a word is compared only with the words it shares a context with, so the cost is the sum over contexts of
 * the square of the number of words sharing each, not the square of the vocabulary. The builder has already pruned
 * contexts shared by very many words, which bounds that sum.
 *
 * <p>Deterministic whatever the thread count: each word's neighbours are computed by one thread, its contexts visited
 * in ascending order, so every sum is added in the same order as {@link ContextVectors#similarity} adds it, and ties
 * are broken by the lower word id.
 */
final class NeighbourSearch {
    private static final int CHUNK = 32;

    private final ContextVectors vectors;
    private final SimilarityMeasure measure;
    private final int k;

    NeighbourSearch(ContextVectors vectors, SimilarityMeasure measure, int k) {
        this.vectors = vectors;
        this.measure = measure;
        this.k = k;
    }

    /**
     * Neighbours of every word, words of one class forming the contiguous id ranges {@code [classStart[i],
     * classStart[i+1])}. Returns the neighbour lists in compressed rows: {@code start}, {@code ids}, {@code scores}.
     */
    Result search(int[] classStart, int threads) {
        int words = vectors.words();
        int[][] ids = new int[words][];
        float[][] scores = new float[words][];
        for (int c = 0; c + 1 < classStart.length; c++) {
            int lo = classStart[c], hi = classStart[c + 1];
            if (hi <= lo) continue;
            Postings postings = Postings.of(vectors, lo, hi);
            AtomicInteger next = new AtomicInteger(lo);
            run(threads, () -> {
                Accumulator acc = new Accumulator(hi - lo);
                for (int from = next.getAndAdd(CHUNK); from < hi; from = next.getAndAdd(CHUNK)) {
                    for (int w = from; w < Math.min(hi, from + CHUNK); w++) {
                        acc.neighbours(w, lo, postings, ids, scores);
                    }
                }
            });
        }
        int[] start = new int[words + 1];
        for (int w = 0; w < words; w++) start[w + 1] = start[w] + ids[w].length;
        int[] allIds = new int[start[words]];
        float[] allScores = new float[start[words]];
        for (int w = 0; w < words; w++) {
            System.arraycopy(ids[w], 0, allIds, start[w], ids[w].length);
            System.arraycopy(scores[w], 0, allScores, start[w], scores[w].length);
        }
        return new Result(start, allIds, allScores);
    }

    record Result(int[] start, int[] ids, float[] scores) {
    }

    private static void run(int threads, Runnable work) {
        if (threads <= 1) {
            work.run();
            return;
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "thesaurus-neighbours");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<?>> running = new ArrayList<>();
            for (int i = 0; i < threads; i++) running.add(pool.submit(work));
            for (Future<?> f : running) f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("neighbour search interrupted", e);
        } catch (ExecutionException e) {
            throw e.getCause() instanceof RuntimeException r ? r : new IllegalStateException(e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    /** For each context, the words of one class range that have it, ascending, with their weights. */
    private record Postings(int[] start, int[] word, float[] weight) {
        static Postings of(ContextVectors v, int lo, int hi) {
            int[] start = new int[v.contexts() + 1];
            for (int w = lo; w < hi; w++) {
                for (int i = v.start(w); i < v.end(w); i++) start[v.context(i) + 1]++;
            }
            for (int c = 0; c < v.contexts(); c++) start[c + 1] += start[c];
            int[] fill = java.util.Arrays.copyOf(start, v.contexts());
            int[] word = new int[start[v.contexts()]];
            float[] weight = new float[word.length];
            for (int w = lo; w < hi; w++) {
                for (int i = v.start(w); i < v.end(w); i++) {
                    int slot = fill[v.context(i)]++;
                    word[slot] = w;
                    weight[slot] = v.weight(i);
                }
            }
            return new Postings(start, word, weight);
        }
    }

    /** One thread's scratch space: a dense sum per word of the class and the list of words touched. */
    private final class Accumulator {
        private final double[] sum;
        private final int[] touched;
        private final int[] heapIds;
        private final double[] heapScores;

        Accumulator(int classSize) {
            sum = new double[classSize];
            touched = new int[classSize];
            heapIds = new int[k];
            heapScores = new double[k];
        }

        void neighbours(int a, int lo, Postings postings, int[][] ids, float[][] scores) {
            int touchedCount = 0;
            for (int i = vectors.start(a); i < vectors.end(a); i++) {
                int c = vectors.context(i);
                double wa = vectors.weight(i);
                for (int p = postings.start[c]; p < postings.start[c + 1]; p++) {
                    int b = postings.word[p];
                    if (b == a) continue;
                    int slot = b - lo;
                    if (sum[slot] == 0) touched[touchedCount++] = slot;
                    sum[slot] += measure.shared(wa, postings.weight[p]);
                }
            }
            int size = 0;
            for (int t = 0; t < touchedCount; t++) {
                int slot = touched[t];
                int b = slot + lo;
                double score = measure.finish(sum[slot], vectors.norm(a), vectors.total(a), vectors.norm(b), vectors.total(b));
                sum[slot] = 0;
                if (size < k) {
                    heapIds[size] = b;
                    heapScores[size] = score;
                    siftUp(size++);
                } else if (better(score, b, heapScores[0], heapIds[0])) {
                    heapIds[0] = b;
                    heapScores[0] = score;
                    siftDown(0, size);
                }
            }
            // Pop the worst first to fill the list from the back: best first, ties by lower id.
            int[] outIds = new int[size];
            float[] outScores = new float[size];
            for (int n = size; n > 0; n--) {
                outIds[n - 1] = heapIds[0];
                outScores[n - 1] = (float) heapScores[0];
                heapIds[0] = heapIds[n - 1];
                heapScores[0] = heapScores[n - 1];
                siftDown(0, n - 1);
            }
            ids[a] = outIds;
            scores[a] = outScores;
        }

        /** Whether (s1, id1) ranks above (s2, id2). */
        private boolean better(double s1, int id1, double s2, int id2) {
            return s1 > s2 || (s1 == s2 && id1 < id2);
        }

        // A min-heap on rank: the root is the worst of the kept neighbours.
        private void siftUp(int i) {
            while (i > 0) {
                int parent = (i - 1) / 2;
                if (!better(heapScores[parent], heapIds[parent], heapScores[i], heapIds[i])) break;
                swap(i, parent);
                i = parent;
            }
        }

        private void siftDown(int i, int size) {
            while (true) {
                int l = 2 * i + 1, r = l + 1, worst = i;
                if (l < size && better(heapScores[worst], heapIds[worst], heapScores[l], heapIds[l])) worst = l;
                if (r < size && better(heapScores[worst], heapIds[worst], heapScores[r], heapIds[r])) worst = r;
                if (worst == i) return;
                swap(i, worst);
                i = worst;
            }
        }

        private void swap(int i, int j) {
            int id = heapIds[i];
            heapIds[i] = heapIds[j];
            heapIds[j] = id;
            double s = heapScores[i];
            heapScores[i] = heapScores[j];
            heapScores[j] = s;
        }
    }
}
