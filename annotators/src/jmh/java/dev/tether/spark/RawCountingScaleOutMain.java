package dev.tether.spark;

import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.options.CommandLineOptions;
import org.openjdk.jmh.runner.options.OptionsBuilder;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Runs {@link RawCountingScaleOut} and prints, from one run: tokens per second of each runner, the ratios the issue
 * sets targets for ({@code local[2]} / {@code local[1]}, at least 1.7; {@code local[1]} / one thread, at least 0.8),
 * the peak heap of each process (the executor's, for an embedded master), and the wall time that one billion tokens
 * would take on a 32-core cluster at the measured per-core rate (with and without the measured scaling from one core
 * to two). JMH options pass through; {@code java-options} of Spark must be on the JVM (the script sets them).
 */
public final class RawCountingScaleOutMain {
    private RawCountingScaleOutMain() {
    }

    public static void main(String[] args) throws Exception {
        Path record = Files.createTempFile("tether-scale-out", ".txt");
        String javaOptions = System.getProperty("tether.spark.javaOptions", "annotators/src/spark/java-options");
        Collection<RunResult> results = new Runner(new OptionsBuilder().parent(new CommandLineOptions(args))
                .include(RawCountingScaleOut.class.getSimpleName()).threads(1)
                .jvmArgsAppend("@" + javaOptions, "-Dtether.benchmark.record=" + record,
                        "-Dorg.slf4j.simpleLogger.defaultLogLevel=warn")
                .build()).run();
        Map<String, double[]> seen = new HashMap<>(); // runner -> tokens, peak bytes, context seconds, documents, peak after GC
        for (String line : Files.readAllLines(record)) {
            String[] f = line.trim().split(" ");
            seen.put(f[0], new double[] {Double.parseDouble(f[1]), Double.parseDouble(f[2]), Double.parseDouble(f[3]),
                    Double.parseDouble(f[4]), Double.parseDouble(f[5])});
        }
        Files.delete(record);
        Map<String, Double> rate = new HashMap<>();
        System.out.printf("%n%-10s %12s %10s %14s %12s %16s %14s%n", "runner", "tokens", "seconds", "tokens/s", "peak heap",
                "peak after GC", "context start");
        for (RunResult r : results) {
            String runner = r.getParams().getParam("runner");
            double seconds = r.getPrimaryResult().getScore();
            double[] s = seen.get(runner);
            if (s == null) continue;
            rate.put(runner, s[0] / seconds);
            System.out.printf("%-10s %,12.0f %10.1f %,14.0f %9.0f MB %13.0f MB %12.1f s%n", runner, s[0], seconds,
                    s[0] / seconds, s[1] / 1e6, s[4] / 1e6, s[2]);
        }
        Double one = rate.get("local-1");
        Double two = rate.get("local-2");
        Double threads = rate.get("threads-1");
        if (one != null && two != null) System.out.printf("local[2] / local[1]: %.2fx (target >= 1.7)%n", two / one);
        if (one != null && threads != null) System.out.printf("local[1] / one thread: %.2fx (target >= 0.8)%n", one / threads);
        if (one != null) {
            double perCore = one;
            double efficiency = two != null ? Math.min(1.0, two / one / 2) : 1.0;
            System.out.printf("one billion tokens on 32 cores at %,.0f tokens/s per core: %.1f min linear, %.1f min at the"
                            + " measured two-core efficiency %.2f%n", perCore, 1e9 / (32 * perCore) / 60,
                    1e9 / (32 * perCore * efficiency) / 60, efficiency);
        }
        for (String missing : List.of("threads-1", "local-1", "local-2")) {
            if (!rate.containsKey(missing)) System.out.println("(no figure for " + missing + " in this run)");
        }
    }
}
