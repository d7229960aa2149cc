package dev.tether.similarity;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

import java.util.Random;
import java.util.concurrent.TimeUnit;

/**
 * The cost of finding every word's neighbours: {@link NeighbourSearch} (inverted index over contexts, pruned) against
 * scoring every pair of words of a class with {@link ContextVectors#similarity}, on the same vectors, for two
 * vocabulary sizes. The corpus is synthetic: words drawn from a Zipf distribution (exponent 1, common practice for
 * word frequencies) with fixed tags, so the sizes can be doubled at will; a quadratic method takes about four times
 * as long at twice the vocabulary.
 *
 * <p>Run: {@code models/src/jmh/run-thesaurus-benchmark} (JMH options as arguments; default {@code -f 1 -wi 1 -i 3}).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class NeighbourSearchScaling {
    /** Distinct words of the synthetic text; tokens are 40 times as many. */
    @Param({"4000", "8000"})
    public int vocabulary;

    private ContextVectors vectors;
    private int[] classStart;
    private ThesaurusSettings settings;

    @Setup
    public void count() {
        ContextCounter counter = new ContextCounter();
        String[] tags = {"NN", "NN", "VBD", "JJ"};
        double[] cumulative = new double[vocabulary];
        double sum = 0;
        for (int i = 0; i < vocabulary; i++) cumulative[i] = sum += 1.0 / (i + 1);
        Random random = new Random(42);
        long tokens = 40L * vocabulary;
        String[] words = new String[12];
        String[] wordTags = new String[12];
        for (long t = 0; t < tokens; t += words.length) {
            for (int i = 0; i < words.length; i++) {
                int w = java.util.Arrays.binarySearch(cumulative, random.nextDouble() * sum);
                w = w < 0 ? -w - 1 : w;
                words[i] = "w" + w;
                wordTags[i] = tags[w % tags.length];
            }
            counter.addSentence(words, wordTags);
        }
        settings = ThesaurusSettings.DEFAULT.withMinFrequency(3);
        Thesaurus t = ThesaurusBuilder.build(counter, settings, 1);
        vectors = t.vectors();
        classStart = new int[] {0, 0, 0, 0};
        for (int w = 0; w < t.size(); w++) classStart[t.wordClass(w).ordinal() + 1] = w + 1;
        for (int c = 1; c < classStart.length; c++) classStart[c] = Math.max(classStart[c], classStart[c - 1]);
        System.out.printf("%n%,d words in the thesaurus, %,d contexts, %,d weights%n", t.size(), t.contexts(), t.vectorEntries());
    }

    @Benchmark
    public Object invertedIndex() {
        return new NeighbourSearch(vectors, settings.measure(), settings.neighbours()).search(classStart, 1);
    }

    @Benchmark
    public double everyPair() {
        double checksum = 0;
        for (int c = 0; c + 1 < classStart.length; c++) {
            for (int a = classStart[c]; a < classStart[c + 1]; a++) {
                double best = 0;
                for (int b = classStart[c]; b < classStart[c + 1]; b++) {
                    if (b != a) best = Math.max(best, vectors.similarity(settings.measure(), a, b));
                }
                checksum += best;
            }
        }
        return checksum;
    }
}
