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
 * the default pipeline over the chunked one (one thread each) and the gain of two threads over one. Tokens are
 * counted as {@link ResolutionThroughput} counts them. JMH options are passed through.
 *
 * <p>{@code interleaved ROUNDS} instead runs the three variants in turn, ROUNDS times (after one warm-up round), and
 * prints the median time of each and the median of the per-round ratios. JMH measures one variant after the other,
 * minutes apart; on a machine shared with other work the load changes in between, and interleaving keeps the
 * variants of one round under the same load.
 */
public final class CollectionThroughputMain {
    private CollectionThroughputMain() {
    }

    public static void main(String[] args) throws Exception {
        if (args.length >= 1 && args[0].equals("interleaved")) {
            interleaved(args.length > 1 ? Integer.parseInt(args[1]) : 5);
            return;
        }
        CommandLineOptions cli = new CommandLineOptions(args);
        Collection<RunResult> results = new Runner(new OptionsBuilder().parent(cli)
                .include(CollectionThroughput.class.getSimpleName()).threads(1).build()).run();
        Map<String, Double> ms = ResolutionThroughputMain.scores(results);
        double chunked = ms.getOrDefault("chunkedOneThread", Double.NaN);
        double one = ms.getOrDefault("oneThread", Double.NaN);
        double two = ms.getOrDefault("twoThreads", Double.NaN);
        report(ResolutionThroughputMain.countTokens(args), chunked, one, two, chunked / one, one / two);
    }

    private static void interleaved(int rounds) throws Exception {
        CollectionThroughput b = new CollectionThroughput();
        b.conllu = "";
        b.setUp();
        double[][] ms = new double[3][rounds];
        double[][] cpu = new double[3][rounds];
        com.sun.management.OperatingSystemMXBean os =
                (com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        try {
            for (int round = -1; round < rounds; round++) {
                for (int k = 0; k < 3; k++) {
                    int variant = (k + Math.max(round, 0)) % 3; // rotate the order from round to round
                    long start = System.nanoTime();
                    long cpuStart = os.getProcessCpuTime();
                    if (variant == 0) b.chunkedOneThread();
                    else if (variant == 1) b.oneThread();
                    else b.twoThreads();
                    if (round >= 0) {
                        ms[variant][round] = (System.nanoTime() - start) / 1e6;
                        cpu[variant][round] = (os.getProcessCpuTime() - cpuStart) / 1e6;
                    }
                }
                if (round >= 0) {
                    System.out.printf("round %d: chunked %.0f ms (CPU %.0f ms), 1 thread %.0f ms (CPU %.0f ms), "
                            + "2 threads %.0f ms (CPU %.0f ms)%n", round + 1, ms[0][round], cpu[0][round], ms[1][round],
                            cpu[1][round], ms[2][round], cpu[2][round]);
                }
            }
        } finally {
            b.tearDown();
        }
        double[] gain = new double[rounds];
        double[] scaling = new double[rounds];
        for (int r = 0; r < rounds; r++) {
            gain[r] = ms[0][r] / ms[1][r];
            scaling[r] = ms[1][r] / ms[2][r];
        }
        report(ResolutionThroughputMain.countTokens(new String[0]), median(ms[0]), median(ms[1]), median(ms[2]),
                median(gain), median(scaling));
        // Process CPU time (all threads, GC and compiler included) does not depend on how much of the machine other
        // work takes: the chunked/default ratio is the work saved; 2-thread CPU over 1-thread CPU is the cost of
        // running two pipelines, which bounds what a second free core can give (2 / that ratio at best).
        System.out.printf("CPU time: chunked %.0f ms, 1 thread %.0f ms, 2 threads %.0f ms (medians)%n",
                median(cpu[0]), median(cpu[1]), median(cpu[2]));
        System.out.printf("CPU work, chunked vs default:   %.2fx%n", median(cpu[0]) / median(cpu[1]));
        System.out.printf("CPU work, 2 threads vs 1:       %.2fx%n", median(cpu[2]) / median(cpu[1]));
    }

    private static double median(double[] values) {
        double[] v = values.clone();
        Arrays.sort(v);
        return v.length % 2 == 1 ? v[v.length / 2] : (v[v.length / 2 - 1] + v[v.length / 2]) / 2;
    }

    private static void report(long tokens, double chunked, double one, double two, double gain, double scaling) {
        System.out.printf("%ntokens per run: %,d (%d processors)%n", tokens, Runtime.getRuntime().availableProcessors());
        System.out.printf("annotate, chunker, 1 thread:    %8.1f ms = %,8.0f tokens/s%n", chunked, tokens / (chunked / 1000));
        System.out.printf("annotate, default, 1 thread:    %8.1f ms = %,8.0f tokens/s%n", one, tokens / (one / 1000));
        System.out.printf("annotate, default, 2 threads:   %8.1f ms = %,8.0f tokens/s%n", two, tokens / (two / 1000));
        System.out.printf("default vs chunker (1 thread): %.2fx%n", gain);
        System.out.printf("2 threads vs 1 thread:         %.2fx%n", scaling);
    }
}
