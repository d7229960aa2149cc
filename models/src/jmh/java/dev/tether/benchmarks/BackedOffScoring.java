package dev.tether.benchmarks;

import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.BackedOffScorer;
import dev.tether.attachment.LearnedQuadrupleScorer;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;
import dev.tether.attachment.QuadrupleDecision;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.QuadrupleCountsBuilder;
import dev.tether.io.QuadrupleReader;
import dev.tether.io.QuadrupleSet;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TetherModel;
import dev.tether.vocabulary.WordNormalizer;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.infra.Blackhole;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Scoring throughput of the backed-off model, in decisions per second on one thread, side by side with
 * {@link StringKeyedBackOff} (the same estimate over string-keyed {@code HashMap}s) and with the model's learned
 * scorer over the back-off's evidence ({@link LearnedQuadrupleScorer}, no thesaurus) in the same run. Both are
 * trained on the benchmark's training split (Ratnaparkhi, Reynar &amp; Roukos 1994) and score its devset, cycled to
 * {@value #BATCH} decisions per invocation; {@code BackedOffScorer} gets ids encoded once in setup, the string
 * version gets words normalized once in setup. Setup checks that both give the same decision on every devset
 * quadruple and prints the heap each model takes.
 *
 * <p>Run with {@code models/src/jmh/run-benchmarks} (see that script).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Threads(1)
public class BackedOffScoring {
    static final int BATCH = 4096;

    /** Folder holding {@code training} and {@code devset}; relative paths are taken from the project root. */
    @Param({"../shared/datasets/rrr"})
    public String data;

    private BackedOffScorer scorer;
    /** The model's learned scorer over the same counts (no thesaurus), for what weighing the evidence costs. */
    private LearnedQuadrupleScorer learned;
    private int[] verbs;
    private int[] nouns1;
    private int[] prepositions;
    private int[] nouns2;

    private StringKeyedBackOff strings;
    private String[][] words;

    @Setup
    public void setUp() throws IOException {
        Path folder = dataFolder(data);
        QuadrupleReader reader = new QuadrupleReader(false);
        QuadrupleSet training = reader.read(folder.resolve("training"));
        List<LabelledQuadruple> devset = reader.read(folder.resolve("devset")).quadruples();
        WordNormalizer normalizer = new WordNormalizer();

        long before = usedHeap();
        TetherModel model = new ModelTrainer().addQuadruples(training).build();
        long modelHeap = usedHeap() - before;
        QuadrupleCounts counts = model.quadruples();
        scorer = new BackedOffScorer(counts);
        learned = model.learnedQuadrupleScorer().orElseThrow(() -> new IllegalStateException("the model has no learned quadruple scorer"));

        // The count tables alone, built the same way from the same normalized words, for a like-for-like figure.
        before = usedHeap();
        QuadrupleCountsBuilder builder = new QuadrupleCountsBuilder();
        for (LabelledQuadruple lq : training.quadruples()) {
            Quadruple q = lq.quadruple();
            builder.add(normalizer.verb(q.verb()), normalizer.noun(q.noun1()), normalizer.preposition(q.preposition()),
                    normalizer.noun(q.noun2()), lq.site(), 1.0);
        }
        QuadrupleCounts tablesOnly = builder.build();
        builder = null;
        long tablesHeap = usedHeap() - before;
        if (tablesOnly.total() != counts.total()) throw new IllegalStateException("count tables differ from the model's");

        before = usedHeap();
        strings = new StringKeyedBackOff();
        for (LabelledQuadruple lq : training.quadruples()) {
            Quadruple q = lq.quadruple();
            strings.add(normalizer.verb(q.verb()), normalizer.noun(q.noun1()), normalizer.preposition(q.preposition()),
                    normalizer.noun(q.noun2()), lq.site() == AttachmentSite.NOUN);
        }
        long stringHeap = usedHeap() - before;
        java.lang.ref.Reference.reachabilityFence(tablesOnly);

        verbs = new int[BATCH];
        nouns1 = new int[BATCH];
        prepositions = new int[BATCH];
        nouns2 = new int[BATCH];
        words = new String[BATCH][];
        for (int i = 0; i < BATCH; i++) {
            Quadruple q = devset.get(i % devset.size()).quadruple();
            int[] ids = counts.encode(normalizer, q.verb(), q.noun1(), q.preposition(), q.noun2());
            verbs[i] = ids[0];
            nouns1[i] = ids[1];
            prepositions[i] = ids[2];
            nouns2[i] = ids[3];
            words[i] = new String[] {normalizer.verb(q.verb()), normalizer.noun(q.noun1()),
                    normalizer.preposition(q.preposition()), normalizer.noun(q.noun2())};
        }
        for (int i = 0; i < devset.size(); i++) {
            QuadrupleDecision a = scorer.decide(verbs[i], nouns1[i], prepositions[i], nouns2[i]);
            QuadrupleDecision b = strings.decide(words[i][0], words[i][1], words[i][2], words[i][3]);
            if (!a.equals(b)) {
                throw new IllegalStateException("the two implementations disagree on " + devset.get(i).source()
                        + ": " + a + " vs " + b);
            }
        }
        System.out.printf("%n[heap] %s: %,d training quadruples, %,d devset quadruples (identical decisions from both)%n",
                folder, training.quadruples().size(), devset.size());
        System.out.printf("[heap] BackedOffScorer count tables: approximateBytes %.1f MB; measured used-heap delta %.1f MB"
                + " (tables with vocabularies), %.1f MB (whole trained model)%n",
                counts.approximateBytes() / 1e6, tablesHeap / 1e6, modelHeap / 1e6);
        System.out.printf("[heap] string-keyed HashMap (%,d keys): measured used-heap delta %.1f MB%n",
                strings.size(), stringHeap / 1e6);
    }

    private static Path dataFolder(String configured) {
        for (String candidate : new String[] {configured, "test-corpora/data/rrr", "../test-corpora/data/rrr"}) {
            Path p = Path.of(candidate);
            if (Files.isRegularFile(p.resolve("training")) && Files.isRegularFile(p.resolve("devset"))) return p;
        }
        throw new IllegalStateException("no 'training' and 'devset' under " + configured
                + " or test-corpora/data/rrr; pass -p data=FOLDER");
    }

    /** Used heap after collecting garbage, in bytes. */
    private static long usedHeap() {
        Runtime rt = Runtime.getRuntime();
        long used = Long.MAX_VALUE;
        for (int i = 0; i < 4; i++) {
            System.gc();
            try {
                Thread.sleep(50);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            used = Math.min(used, rt.totalMemory() - rt.freeMemory());
        }
        return used;
    }

    @Benchmark
    @OperationsPerInvocation(BATCH)
    public void packedIdTables(Blackhole bh) {
        for (int i = 0; i < BATCH; i++) {
            bh.consume(scorer.decide(verbs[i], nouns1[i], prepositions[i], nouns2[i]));
        }
    }

    @Benchmark
    @OperationsPerInvocation(BATCH)
    public void learnedOverBackOffEvidence(Blackhole bh) {
        for (int i = 0; i < BATCH; i++) {
            bh.consume(learned.decide(verbs[i], nouns1[i], prepositions[i], nouns2[i]));
        }
    }

    @Benchmark
    @OperationsPerInvocation(BATCH)
    public void stringKeyedHashMap(Blackhole bh) {
        for (int i = 0; i < BATCH; i++) {
            String[] w = words[i];
            bh.consume(strings.decide(w[0], w[1], w[2], w[3]));
        }
    }
}
