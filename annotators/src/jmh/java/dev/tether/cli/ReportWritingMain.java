package dev.tether.cli;

import org.openjdk.jmh.results.RunResult;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.options.CommandLineOptions;
import org.openjdk.jmh.runner.options.OptionsBuilder;

import java.util.Collection;

/**
 * Runs {@link ReportWriting} and prints the time of the report (index, a page per document, a review sheet of 20)
 * beside the time of the annotation, from one run. JMH options are passed through (default in the script:
 * {@code -f 2 -wi 1 -i 5}, so each fork's first, cold shot is a warm-up).
 */
public final class ReportWritingMain {
    private ReportWritingMain() {
    }

    public static void main(String[] args) throws Exception {
        Collection<RunResult> results = new Runner(new OptionsBuilder().parent(new CommandLineOptions(args))
                .include(ReportWriting.class.getSimpleName()).threads(1).build()).run();
        double annotateMs = Double.NaN;
        double reportMs = Double.NaN;
        for (RunResult r : results) {
            String name = r.getParams().getBenchmark();
            if (name.endsWith(".annotate")) annotateMs = r.getPrimaryResult().getScore();
            if (name.endsWith(".report")) reportMs = r.getPrimaryResult().getScore();
        }
        System.out.printf("%nannotate: %.0f ms per run; audit report: %.0f ms per run (%.1f%% of the annotation)%n",
                annotateMs, reportMs, 100 * reportMs / annotateMs);
    }
}
