package dev.tether.benchmarks;

import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.options.CommandLineOptions;
import org.openjdk.jmh.runner.options.Options;
import org.openjdk.jmh.runner.options.OptionsBuilder;

import java.util.Collection;

/**
 * Runs {@link BackedOffScoring} with the JMH options given on the command line (for example
 * {@code -f 1 -wi 3 -i 5}) and prints the throughput of both implementations and their ratio.
 */
public final class BackedOffScoringMain {
    private BackedOffScoringMain() {
    }

    public static void main(String[] args) throws Exception {
        Options options = new OptionsBuilder()
                .parent(new CommandLineOptions(args))
                .include(BackedOffScoring.class.getName())
                .build();
        Collection<RunResult> results = new Runner(options).run();
        double packed = Double.NaN;
        double strings = Double.NaN;
        for (RunResult r : results) {
            String method = r.getParams().getBenchmark();
            double score = r.getPrimaryResult().getScore();
            if (method.endsWith(".packedIdTables")) packed = score;
            if (method.endsWith(".stringKeyedHashMap")) strings = score;
        }
        System.out.printf("%nBackedOffScorer (packed id tables): %,.0f decisions/s%n", packed);
        System.out.printf("string-keyed HashMap:               %,.0f decisions/s%n", strings);
        System.out.printf("ratio:                              %.1fx%n", packed / strings);
    }
}
