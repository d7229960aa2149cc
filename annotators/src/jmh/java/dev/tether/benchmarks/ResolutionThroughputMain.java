package dev.tether.benchmarks;

import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.options.CommandLineOptions;
import org.openjdk.jmh.runner.options.OptionsBuilder;

import java.util.Collection;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Runs {@link ResolutionThroughput} and prints tokens per second for the finder plus resolver and for the whole
 * pipeline, and the share of the whole pipeline's time that finder plus resolver take, all from one run, for each
 * model given ({@code -p model=default,OTHER.tether}: the later ones' finder + resolver speed against the first's).
 * JMH options on the command line are passed through (for example {@code -f 1 -wi 3 -i 5}).
 */
public final class ResolutionThroughputMain {
    private ResolutionThroughputMain() {
    }

    public static void main(String[] args) throws Exception {
        CommandLineOptions cli = new CommandLineOptions(args);
        // A benchmark pattern on the command line (for example 'ResolutionThroughput.finderAnd') narrows the run.
        OptionsBuilder options = new OptionsBuilder();
        options.parent(cli);
        if (cli.getIncludes().isEmpty()) options.include(ResolutionThroughput.class.getSimpleName());
        Collection<RunResult> results = new Runner(options.threads(1).build()).run();
        long tokens = countTokens(args);
        System.out.printf("%ntokens per pass: %,d%n", tokens);
        Map<String, Map<String, Double>> byModel = scoresByModel(results);
        Map<String, Double> first = null;
        for (Map.Entry<String, Map<String, Double>> m : byModel.entrySet()) {
            Map<String, Double> ms = m.getValue();
            double resolutionMs = ms.getOrDefault("finderAndResolver", Double.NaN);
            double wholeMs = ms.getOrDefault("wholePipeline", Double.NaN);
            double countMs = ms.getOrDefault("finderAndCountScore", Double.NaN);
            double coordinationMs = ms.getOrDefault("coordinationResolver", Double.NaN);
            System.out.printf("%nmodel %s%n", m.getKey());
            System.out.printf("finder + resolver: %.1f ms per pass = %,.0f tokens/s (one thread)%n", resolutionMs, tokens / (resolutionMs / 1000));
            System.out.printf("finder + count score: %.1f ms per pass = %,.0f tokens/s (one thread); ranker/count-score time %.2f%n",
                    countMs, tokens / (countMs / 1000), resolutionMs / countMs);
            System.out.printf("coordination resolver alone: %.1f ms per pass = %,.0f tokens/s (one thread); its speed / finder + resolver's %.2f%n",
                    coordinationMs, tokens / (coordinationMs / 1000), resolutionMs / coordinationMs);
            System.out.printf("whole pipeline:    %.1f ms per pass = %,.0f tokens/s (one thread)%n", wholeMs, tokens / (wholeMs / 1000));
            System.out.printf("finder + resolver share of the whole pipeline: %.1f%%%n", 100 * resolutionMs / wholeMs);
            if (first == null) {
                first = ms;
            } else {
                System.out.printf("finder + resolver speed against model %s's: %.2f%n", byModel.keySet().iterator().next(),
                        first.getOrDefault("finderAndResolver", Double.NaN) / resolutionMs);
            }
        }
    }

    /** Each model's benchmark scores (model parameter → simple benchmark name → milliseconds per operation), in run order. */
    static Map<String, Map<String, Double>> scoresByModel(Collection<RunResult> results) {
        Map<String, Map<String, Double>> byModel = new LinkedHashMap<>();
        for (RunResult r : results) {
            String name = r.getParams().getBenchmark();
            String model = r.getParams().getParam("model");
            byModel.computeIfAbsent(model == null ? "default" : model, m -> new HashMap<>())
                    .put(name.substring(name.lastIndexOf('.') + 1), r.getPrimaryResult().getScore());
        }
        return byModel;
    }

    /** Each benchmark method's score (its simple name → milliseconds per operation). */
    static Map<String, Double> scores(Collection<RunResult> results) {
        Map<String, Double> scores = new HashMap<>();
        for (RunResult r : results) {
            String name = r.getParams().getBenchmark();
            scores.put(name.substring(name.lastIndexOf('.') + 1), r.getPrimaryResult().getScore());
        }
        return scores;
    }

    /** Tokens over the documents of the benchmark's CoNLL-U file ({@code -p conllu=FILE}, else the default file). */
    static long countTokens(String[] args) throws Exception {
        ResolutionThroughput state = new ResolutionThroughput();
        state.conllu = "";
        state.model = "default";
        for (int i = 0; i + 1 < args.length; i++) {
            if (args[i].equals("-p") && args[i + 1].startsWith("conllu=")) state.conllu = args[i + 1].substring("conllu=".length());
        }
        state.setUp();
        state.tearDown();
        return state.tokens;
    }
}
