package dev.tether.benchmarks;

import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.options.CommandLineOptions;
import org.openjdk.jmh.runner.options.OptionsBuilder;

import java.util.Arrays;
import java.util.Collection;
import java.util.Map;

/**
 * Runs {@link CollectionThroughput} and prints, from the one run, tokens per second of each variant, the gain of
 * the default pipeline over the previous release's pipeline and over the chunked one (one thread each), and the
 * gain of two threads over one. Tokens are
 * counted as {@link ResolutionThroughput} counts them. JMH options are passed through.
 *
 * <p>{@code interleaved ROUNDS [WARM-UP]} instead runs the four variants in turn, ROUNDS times (after WARM-UP rounds,
 * {@value #WARM_UP_ROUNDS} unless given: the JIT needs a few runs of each variant), and
 * prints the median time of each and the median of the per-round ratios, then what two threads give on this machine
 * for work that shares nothing ({@link MachineScaling}), the ceiling to read the two-thread ratio against. JMH
 * measures one variant after the other, minutes apart; on a machine shared with other work the load changes in between, and interleaving keeps the
 * variants of one round under the same load.
 */
public final class CollectionThroughputMain {
    /** Rounds run before the measured ones, and not measured. */
    static final int WARM_UP_ROUNDS = 3;

    private CollectionThroughputMain() {
    }

    public static void main(String[] args) throws Exception {
        if (args.length >= 1 && args[0].equals("interleaved")) {
            interleaved(args.length > 1 ? Integer.parseInt(args[1]) : 5, args.length > 2 ? Integer.parseInt(args[2]) : WARM_UP_ROUNDS);
            return;
        }
        CommandLineOptions cli = new CommandLineOptions(args);
        Collection<RunResult> results = new Runner(new OptionsBuilder().parent(cli)
                .include(CollectionThroughput.class.getSimpleName()).threads(1).build()).run();
        Map<String, Double> ms = ResolutionThroughputMain.scores(results);
        double previous = ms.getOrDefault("previousReleaseOneThread", Double.NaN);
        double chunked = ms.getOrDefault("chunkedOneThread", Double.NaN);
        double one = ms.getOrDefault("oneThread", Double.NaN);
        double two = ms.getOrDefault("twoThreads", Double.NaN);
        report(ResolutionThroughputMain.countTokens(args), new double[] {previous, chunked, one, two},
                previous / one, chunked / one, one / two);
    }

    private static void interleaved(int rounds, int warmUpRounds) throws Exception {
        CollectionThroughput b = new CollectionThroughput();
        b.conllu = "";
        b.setUp();
        int variants = NAMES.length;
        double[][] ms = new double[variants][rounds];
        double[][] cpu = new double[variants][rounds];
        com.sun.management.OperatingSystemMXBean os =
                (com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        try {
            for (int round = -warmUpRounds; round < rounds; round++) {
                for (int k = 0; k < variants; k++) {
                    int variant = (k + Math.max(round, 0)) % variants; // rotate the order from round to round
                    long start = System.nanoTime();
                    long cpuStart = os.getProcessCpuTime();
                    if (variant == 0) b.previousReleaseOneThread();
                    else if (variant == 1) b.chunkedOneThread();
                    else if (variant == 2) b.oneThread();
                    else b.twoThreads();
                    if (round >= 0) {
                        ms[variant][round] = (System.nanoTime() - start) / 1e6;
                        cpu[variant][round] = (os.getProcessCpuTime() - cpuStart) / 1e6;
                    }
                }
                if (round >= 0) {
                    StringBuilder line = new StringBuilder("round " + (round + 1) + ":");
                    for (int v = 0; v < variants; v++) {
                        line.append(String.format(" %s %.0f ms (CPU %.0f ms)%s", NAMES[v], ms[v][round], cpu[v][round],
                                v + 1 < variants ? "," : ""));
                    }
                    System.out.println(line);
                }
            }
        } finally {
            b.tearDown();
        }
        double[] overPrevious = new double[rounds];
        double[] overChunked = new double[rounds];
        double[] scaling = new double[rounds];
        for (int r = 0; r < rounds; r++) {
            overPrevious[r] = ms[0][r] / ms[2][r];
            overChunked[r] = ms[1][r] / ms[2][r];
            scaling[r] = ms[2][r] / ms[3][r];
        }
        double[] medians = new double[variants];
        for (int v = 0; v < variants; v++) medians[v] = median(ms[v]);
        report(ResolutionThroughputMain.countTokens(new String[0]), medians, median(overPrevious), median(overChunked),
                median(scaling));
        // Process CPU time (all threads, GC and compiler included) does not depend on how much of the machine other
        // work takes: the chunked/default ratio is the work saved; 2-thread CPU over 1-thread CPU is the cost of
        // running two pipelines, which bounds what a second free core can give (2 / that ratio at best).
        System.out.printf("CPU time: previous release %.0f ms, chunked %.0f ms, 1 thread %.0f ms, 2 threads %.0f ms"
                + " (medians)%n", median(cpu[0]), median(cpu[1]), median(cpu[2]), median(cpu[3]));
        System.out.printf("CPU work, previous vs default: %.2fx%n", median(cpu[0]) / median(cpu[2]));
        System.out.printf("CPU work, chunked vs default:  %.2fx%n", median(cpu[1]) / median(cpu[2]));
        System.out.printf("CPU work, 2 threads vs 1:      %.2fx%n", median(cpu[3]) / median(cpu[2]));
        MachineScaling.report(5);
    }

    static double median(double[] values) {
        double[] v = values.clone();
        Arrays.sort(v);
        return v.length % 2 == 1 ? v[v.length / 2] : (v[v.length / 2 - 1] + v[v.length / 2]) / 2;
    }

    /** The variants, in the order of {@code ms} in {@link #report}. */
    private static final String[] NAMES = {"previous release", "chunked", "1 thread", "2 threads"};

    private static final String[] LABELS = {
            "annotate, previous release (chunker, shipped tagger), 1 thread",
            "annotate, chunker, model's tagger, 1 thread",
            "annotate, default, 1 thread",
            "annotate, default, 2 threads"};

    private static void report(long tokens, double[] ms, double overPrevious, double overChunked, double scaling) {
        System.out.printf("%ntokens per run: %,d (%d processors)%n", tokens, Runtime.getRuntime().availableProcessors());
        for (int v = 0; v < ms.length; v++) {
            System.out.printf("%-64s %8.1f ms = %,8.0f tokens/s%n", LABELS[v] + ":", ms[v], tokens / (ms[v] / 1000));
        }
        System.out.printf("default vs previous release (1 thread): %.2fx%n", overPrevious);
        System.out.printf("default vs chunker (1 thread):          %.2fx%n", overChunked);
        System.out.printf("2 threads vs 1 thread:                  %.2fx%n", scaling);
    }
}
