package dev.tether.spark;

import dev.tether.cli.HeapPeak;
import dev.tether.counts.RawAttachmentCounts;
import dev.tether.counts.RawTextAttachmentCounting;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;

import java.io.IOException;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

/**
 * Counting raw text for {@code train --raw} on Spark against the count on one thread, as single shots: the corpus
 * (every {@code .txt} below {@link #corpus}) is laid out {@link #repeat} times (hard links, no copies) and counted by
 * {@code runner}: {@code threads-1} is the single-machine count ({@link RawTextAttachmentCounting} on one thread),
 * {@code local-N} the Spark job on an embedded {@code local[N]} (its context started before the shot; its start is
 * reported apart). Each fork records the tokens counted and the peak heap of its process at one instant, before and
 * after collections ({@link HeapPeak}), which for an embedded master is the one executor's (with the driver), in the
 * file named by {@code tether.benchmark.record}. {@code -jvmArgs -XmxN} caps the fork's heap: a run that completes
 * shows that the counting fits in N.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
public class RawCountingScaleOut {
    @Param("../shared/datasets/raw")
    public String corpus;

    @Param("10")
    public int repeat;

    @Param({"threads-1", "local-1", "local-2"})
    public String runner;

    private Path work;
    private SparkJob job;
    private double contextSeconds;
    private RawAttachmentCounts last;
    /** The heap's peak at one instant, before and after collections (not a sum of each pool's own peak). */
    private HeapPeak heap;

    @Setup(Level.Trial)
    public void setUp() throws IOException {
        work = Files.createTempDirectory("tether-scale-out");
        Path source = Path.of(corpus).toAbsolutePath().normalize();
        List<Path> documents;
        try (Stream<Path> all = Files.walk(source)) {
            documents = all.filter(p -> Files.isRegularFile(p) && p.toString().endsWith(".txt")).sorted().toList();
        }
        for (int k = 0; k < repeat; k++) {
            for (Path d : documents) {
                Path link = work.resolve("copy-" + k).resolve(source.relativize(d).toString());
                Files.createDirectories(link.getParent());
                Files.createLink(link, d);
            }
        }
        if (runner.startsWith("local-")) {
            long start = System.nanoTime();
            job = SparkJob.start(SparkMaster.parse("local[" + runner.substring("local-".length()) + "]"), "benchmark");
            contextSeconds = (System.nanoTime() - start) / 1e9;
        }
        heap = HeapPeak.start();
    }

    @Benchmark
    public long count() throws IOException {
        RawTextAttachmentCounting.Summary s = job == null
                ? new RawTextAttachmentCounting(1).count(List.of(work))
                : countOnSpark();
        last = s.counts();
        return last.tally().tokens();
    }

    private RawTextAttachmentCounting.Summary countOnSpark() throws IOException {
        job.checkExecutors(List.of(work.toString()), null, null, null); // part of every run on Spark, so part of the shot
        return job.countRawText(List.of(work.toString()), false);
    }

    @TearDown(Level.Trial)
    public void tearDown() throws IOException {
        long peak = heap.peakBytes();
        long peakAfterCollection = heap.peakAfterCollectionBytes();
        heap.close();
        if (job != null) job.close();
        String record = System.getProperty("tether.benchmark.record");
        if (record != null && last != null) {
            String line = String.format("%s %d %d %.2f %d %d%n", runner, last.tally().tokens(), peak, contextSeconds,
                    last.tally().documents(), peakAfterCollection);
            Files.writeString(Path.of(record), line, StandardOpenOption.CREATE, StandardOpenOption.APPEND);
        }
        try (Stream<Path> all = Files.walk(work)) {
            for (Path p : all.sorted(Comparator.reverseOrder()).toList()) Files.delete(p);
        }
    }
}
