package dev.tether.benchmarks;

import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.options.CommandLineOptions;
import org.openjdk.jmh.runner.options.OptionsBuilder;

import java.util.Collection;

/**
 * Runs {@link CollectionThroughput} and prints, from the one run, tokens per second of each variant, the gain of
 * the default pipeline over the chunked one (one thread each) and the gain of two threads over one. Tokens are
 * counted as {@link ResolutionThroughput} counts them. JMH options are passed through.
 */
public final class CollectionThroughputMain {
    private CollectionThroughputMain() {
    }

    public static void main(String[] args) throws Exception {
        CommandLineOptions cli = new CommandLineOptions(args);
        Collection<RunResult> results = new Runner(new OptionsBuilder().parent(cli)
                .include(CollectionThroughput.class.getSimpleName()).threads(1).build()).run();
        double chunked = Double.NaN;
        double one = Double.NaN;
        double two = Double.NaN;
        for (RunResult r : results) {
            String name = r.getParams().getBenchmark();
            double ms = r.getPrimaryResult().getScore();
            if (name.endsWith("chunkedOneThread")) chunked = ms;
            else if (name.endsWith("oneThread")) one = ms;
            else if (name.endsWith("twoThreads")) two = ms;
        }
        ResolutionThroughput counter = new ResolutionThroughput();
        counter.conllu = "";
        for (int i = 0; i + 1 < args.length; i++) {
            if (args[i].equals("-p") && args[i + 1].startsWith("conllu=")) counter.conllu = args[i + 1].substring("conllu=".length());
        }
        counter.setUp();
        counter.tearDown();
        long tokens = counter.tokens;
        System.out.printf("%ntokens per run: %,d (%d processors)%n", tokens, Runtime.getRuntime().availableProcessors());
        System.out.printf("annotate, chunker, 1 thread:    %8.1f ms = %,8.0f tokens/s%n", chunked, tokens / (chunked / 1000));
        System.out.printf("annotate, default, 1 thread:    %8.1f ms = %,8.0f tokens/s%n", one, tokens / (one / 1000));
        System.out.printf("annotate, default, 2 threads:   %8.1f ms = %,8.0f tokens/s%n", two, tokens / (two / 1000));
        System.out.printf("default vs chunker (1 thread): %.2fx%n", chunked / one);
        System.out.printf("2 threads vs 1 thread:         %.2fx%n", one / two);
    }
}
