package dev.tether.cli;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

/**
 * The audit report's cost beside the annotation it reports on: one {@code tether annotate} of a corpus and one
 * {@code tether audit} of its output, each timed as a single shot (the way a user runs them), in the same JVM.
 * Lives in {@code dev.tether.cli} to run the commands as the command line does.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class ReportWriting {
    /** Folder of plain-text documents. */
    @Param("test-corpora/data/demo")
    public String corpus;

    private Path work;
    private Path annotated;
    private final PrintStream quiet = new PrintStream(OutputStream.nullOutputStream());

    @Setup
    public void setUp() throws Exception {
        work = Files.createTempDirectory("tether-report-benchmark");
        annotated = work.resolve("run");
        int code = new Tether().run(new String[] {"annotate", "--in", corpus, "--out", annotated.toString()}, quiet, quiet);
        if (code != 0) throw new IllegalStateException("annotate failed with exit code " + code + " on " + corpus);
    }

    @TearDown
    public void tearDown() throws IOException {
        try (Stream<Path> all = Files.walk(work)) {
            for (Path p : all.sorted(Comparator.reverseOrder()).toList()) Files.delete(p);
        }
    }

    @Benchmark
    public int annotate() {
        return new Tether().run(new String[] {"annotate", "--in", corpus, "--out", work.resolve("again").toString()}, quiet, quiet);
    }

    @Benchmark
    public int report() throws IOException {
        return AuditCommand.report(annotated, work.resolve("report"), 20, null, quiet, quiet);
    }
}
