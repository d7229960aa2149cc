package dev.tether.similarity;

import dev.tether.candidates.HeadClass;
import dev.tether.vocabulary.Vocabulary;
import dev.tether.vocabulary.WordNormalizer;
import gnu.trove.iterator.TLongIntIterator;
import gnu.trove.map.hash.TLongIntHashMap;

import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.IntStream;

/**
 * Builds a {@link Thesaurus} from counted contexts:
 * <ol>
 *   <li>words with fewer than {@link ThesaurusSettings#minFrequency()} tokens are left out (the frequency floor);</li>
 *   <li>the co-occurrence table of the remaining words with the chosen {@link ContextChoice} gives the marginals
 *       {@code f(w)}, {@code f(c)} and the total {@code N} that the {@link Weighting} needs;</li>
 *   <li>contexts shared by more than {@link ThesaurusSettings#maxContextWords()} words are pruned (they are the
 *       frequent, uninformative ones, and the cost of scoring all pairs grows with the square of a context's word
 *       count), and so are contexts of a single word, which cannot make two words alike;</li>
 *   <li>each remaining cell is weighted, non-positive weights dropped;</li>
 *   <li>{@link NeighbourSearch} finds each word's k nearest neighbours on {@code threads} threads.</li>
 * </ol>
 * The result depends only on the counts and the settings, never on the thread count.
 */
public final class ThesaurusBuilder {
    private static final HeadClass[] TARGET_CLASSES = {HeadClass.VERB, HeadClass.NOUN, HeadClass.ADJECTIVE};

    private ThesaurusBuilder() {
    }

    public static Thesaurus build(ContextCounter counts, ThesaurusSettings settings, int threads) {
        if (threads < 1) throw new IllegalArgumentException("threads must be at least 1, was " + threads);
        Vocabulary vocabulary = counts.vocabulary();

        // 1. The words above the floor, ordered by class then key; newId[old target] or -1.
        int targets = counts.targets();
        int[] kept = IntStream.range(0, targets).filter(t -> counts.targetTokens(t) >= settings.minFrequency()).toArray();
        String[] keyOf = new String[targets];
        for (int t : kept) keyOf[t] = vocabulary.word(ContextCounter.wordOf(counts.targetKey(t)));
        Integer[] order = Arrays.stream(kept).boxed().toArray(Integer[]::new);
        Arrays.sort(order, Comparator.<Integer>comparingInt(t -> ContextCounter.classOf(counts.targetKey(t)))
                .thenComparing(t -> keyOf[t]));
        int words = order.length;
        int[] newId = new int[targets];
        Arrays.fill(newId, -1);
        String[] keys = new String[words];
        HeadClass[] classes = new HeadClass[words];
        int[] classStart = new int[TARGET_CLASSES.length + 1];
        for (int i = 0; i < words; i++) {
            int t = order[i];
            newId[t] = i;
            keys[i] = keyOf[t];
            classes[i] = HeadClass.values()[ContextCounter.classOf(counts.targetKey(t))];
        }
        for (int c = 0; c < TARGET_CLASSES.length; c++) {
            int cls = TARGET_CLASSES[c].ordinal();
            int end = classStart[c];
            while (end < words && classes[end].ordinal() == cls) end++;
            classStart[c + 1] = end;
        }

        // 2. Marginals over the chosen contexts.
        int contexts = counts.contexts();
        boolean[] allowed = new boolean[contexts];
        for (int c = 0; c < contexts; c++) {
            boolean window = ContextCounter.relationOf(counts.contextKey(c)) == ContextCounter.WINDOW_WORD;
            allowed[c] = window ? settings.contexts().window() : settings.contexts().grammatical();
        }
        long[] wordTotal = new long[words];
        long[] contextTotal = new long[contexts];
        int[] contextWords = new int[contexts];
        long n = 0;
        TLongIntHashMap cells = counts.cells();
        for (TLongIntIterator it = cells.iterator(); it.hasNext(); ) {
            it.advance();
            int w = newId[ContextCounter.cellTarget(it.key())];
            int c = ContextCounter.cellContext(it.key());
            if (w < 0 || !allowed[c]) continue;
            wordTotal[w] += it.value();
            contextTotal[c] += it.value();
            contextWords[c]++;
            n += it.value();
        }
        double smoothedTotal = 0;
        double[] smoothed = new double[contexts];
        for (int c = 0; c < contexts; c++) {
            if (contextTotal[c] == 0) continue;
            smoothed[c] = Math.pow(contextTotal[c], Weighting.CONTEXT_SMOOTHING);
            smoothedTotal += smoothed[c];
        }

        // 3. Pruning, and ids for the contexts kept (in first-seen order, which the counting fixed).
        int[] contextId = new int[contexts];
        int keptContexts = 0;
        for (int c = 0; c < contexts; c++) {
            boolean keep = allowed[c] && contextWords[c] >= 2 && contextWords[c] <= settings.maxContextWords();
            contextId[c] = keep ? keptContexts++ : -1;
        }

        // 4. Weighted rows, sorted by context.
        Weighting weighting = settings.weighting();
        int[] rowSize = new int[words];
        for (TLongIntIterator it = cells.iterator(); it.hasNext(); ) {
            it.advance();
            int w = newId[ContextCounter.cellTarget(it.key())];
            int c = ContextCounter.cellContext(it.key());
            if (w >= 0 && contextId[c] >= 0) rowSize[w]++;
        }
        int[] start = new int[words + 1];
        for (int w = 0; w < words; w++) start[w + 1] = start[w] + rowSize[w];
        long[] packed = new long[start[words]];
        int[] fill = Arrays.copyOf(start, words);
        for (TLongIntIterator it = cells.iterator(); it.hasNext(); ) {
            it.advance();
            int w = newId[ContextCounter.cellTarget(it.key())];
            int c = ContextCounter.cellContext(it.key());
            if (w < 0 || contextId[c] < 0) continue;
            float weight = (float) weighting.weight(it.value(), wordTotal[w], contextTotal[c], n, smoothed[c], smoothedTotal);
            packed[fill[w]++] = weight > 0 && Float.isFinite(weight)
                    ? ((long) contextId[c] << 32) | (Float.floatToIntBits(weight) & 0xffffffffL) : -1L;
        }
        int[] vectorStart = new int[words + 1];
        int entries = 0;
        for (int w = 0; w < words; w++) {
            Arrays.sort(packed, start[w], start[w + 1]);
            vectorStart[w] = entries;
            for (int i = start[w]; i < start[w + 1]; i++) if (packed[i] >= 0) packed[entries++] = packed[i];
        }
        vectorStart[words] = entries;
        int[] context = new int[entries];
        float[] weights = new float[entries];
        for (int i = 0; i < entries; i++) {
            context[i] = (int) (packed[i] >>> 32);
            weights[i] = Float.intBitsToFloat((int) packed[i]);
        }
        ContextVectors vectors = new ContextVectors(vectorStart, context, weights, keptContexts);

        // 5. Neighbours.
        NeighbourSearch.Result found = new NeighbourSearch(vectors, settings.measure(), settings.neighbours())
                .search(classStart, threads);
        return new Thesaurus(WordNormalizer.VERSION, settings, counts.sentenceCount(), counts.tokenCount(), keys, classes,
                vectors, found.start(), found.ids(), found.scores());
    }
}
