package dev.tether.spark;

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
import com.sun.management.GarbageCollectionNotificationInfo;

import javax.management.NotificationEmitter;
import javax.management.openmbean.CompositeData;
import java.lang.management.GarbageCollectorMXBean;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryUsage;
import java.util.concurrent.atomic.AtomicLong;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
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
 * reported apart). Each fork records the tokens counted and the peak heap of its process, which for an embedded
 * master is the one executor's (with the driver), in the file named by {@code tether.benchmark.record}.
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
    /** The most the heap held right after a collection: what the process needed, garbage left out. */
    private final AtomicLong peakAfterCollection = new AtomicLong();

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
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) pool.resetPeakUsage();
        for (GarbageCollectorMXBean gc : ManagementFactory.getGarbageCollectorMXBeans()) {
            ((NotificationEmitter) gc).addNotificationListener((n, handback) -> {
                if (!GarbageCollectionNotificationInfo.GARBAGE_COLLECTION_NOTIFICATION.equals(n.getType())) return;
                GarbageCollectionNotificationInfo info = GarbageCollectionNotificationInfo.from((CompositeData) n.getUserData());
                long live = 0;
                for (MemoryUsage u : info.getGcInfo().getMemoryUsageAfterGc().values()) live += u.getUsed();
                peakAfterCollection.accumulateAndGet(live, Math::max);
            }, null, null);
        }
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
        return job.countRawText(List.of(work.toString()));
    }

    @TearDown(Level.Trial)
    public void tearDown() throws IOException {
        long peak = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) peak += pool.getPeakUsage().getUsed();
        }
        if (job != null) job.close();
        String record = System.getProperty("tether.benchmark.record");
        if (record != null && last != null) {
            String line = String.format("%s %d %d %.2f %d %d%n", runner, last.tally().tokens(), peak, contextSeconds,
                    last.tally().documents(), peakAfterCollection.get());
            Files.writeString(Path.of(record), line, StandardOpenOption.CREATE, StandardOpenOption.APPEND);
        }
        try (Stream<Path> all = Files.walk(work)) {
            for (Path p : all.sorted(Comparator.reverseOrder()).toList()) Files.delete(p);
        }
    }
}
