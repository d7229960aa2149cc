package dev.tether.spark;

import dev.tether.counts.RawTextAttachmentCounting;
import dev.tether.io.Sha256;
import dev.tether.model.LoadedModels;
import dev.tether.output.AtomicFile;
import dev.tether.output.OutputFolder;
import dev.tether.pipeline.CollectionRun;
import dev.tether.pipeline.DocumentFiles;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The Spark jobs below the command line (issue 11): a task killed on its first attempt (annotating: between writing a
 * document and committing it; counting: half-way through its partition) is tried again, and the result is byte for
 * byte that of a clean run: the same output folder with no temporary file left, the same counts, never counted twice;
 * each task slot builds its pipeline once however many partitions it runs; and the check before work names what an
 * executor cannot use (a model it cannot read, an input it does not see). One embedded context (local[2], four tries
 * per task) serves the class. Documents are invented ferry maintenance logs.
 */
class SparkJobTest {
    private static final String[] SENTENCES = {
            "Replaced the cracked gasket on the cooling pump with a spare from the stores.",
            "Found a slow leak in the fuel line near the starboard engine.",
            "Greased the hinges of the loading ramp before the morning sailing.",
            "Checked the mooring lines for chafe at the bow fairlead and logged it in the deck book.",
    };
    /** Attempts that the injected fault failed, counted in this process (local mode runs tasks here). */
    static final AtomicInteger INJECTED = new AtomicInteger();

    private static JavaSparkContext spark;

    @TempDir
    Path dir;
    private Path in;

    @BeforeAll
    static void startSpark() {
        spark = new JavaSparkContext(new SparkConf().setMaster(SparkMaster.parse("local[2]").url()).setAppName("test")
                .set("spark.ui.enabled", "false").set("spark.driver.bindAddress", "127.0.0.1")
                .set("spark.driver.host", "127.0.0.1"));
        SparkJob.lend(spark);
    }

    @AfterAll
    static void stopSpark() {
        SparkJob.lend(null);
        spark.stop();
    }

    @BeforeEach
    void writeLogs() throws IOException {
        in = Files.createDirectory(dir.resolve("logs"));
        for (int i = 0; i < 16; i++) {
            String text = SENTENCES[i % SENTENCES.length] + " Log " + (i + 1) + " was signed by the chief engineer.\n";
            Files.writeString(in.resolve(String.format("log-%02d.txt", i + 1)), text, StandardCharsets.UTF_8);
        }
    }

    private CollectionRun.Result run(Path out, PartitionAnnotation.BeforeCommit fault) throws IOException {
        DocumentFiles.Listing listing = DocumentFiles.list(in);
        String id = LoadedModels.get(LoadedModels.DEFAULT).id();
        try (SparkJob job = SparkJob.start(SparkMaster.parse("local[2]"), "test")) {
            OutputFolder.prepare(out);
            CollectionRun.Settings settings = new CollectionRun.Settings(LoadedModels.DEFAULT, id, false,
                    job.parallelism(), false, "test");
            return new CollectionRun(listing, out, settings, done -> { })
                    .run(job.annotation(LoadedModels.DEFAULT, id, false, false, out, fault));
        }
    }

    private static Map<String, String> files(Path folder) throws IOException {
        Map<String, String> all = new TreeMap<>();
        try (Stream<Path> s = Files.walk(folder)) {
            for (Path p : (Iterable<Path>) s.filter(Files::isRegularFile)::iterator) {
                all.put(folder.relativize(p).toString(), Sha256.hex(Files.readAllBytes(p)));
            }
        }
        return all;
    }

    @Test
    void aTaskKilledOnItsFirstAttemptIsRetriedAndTheOutputIsThatOfACleanRun() throws Exception {
        Path clean = dir.resolve("clean");
        Path faulty = dir.resolve("faulty");
        CollectionRun.Result a = run(clean, null);
        INJECTED.set(0);
        // Partition 0's first attempt dies after its second document is written but before it is renamed: one
        // document of the partition is committed, one is a temporary file, the rest are not begun.
        CollectionRun.Result b = run(faulty, (partition, attempt, task) -> {
            if (partition == 0 && attempt == 0 && task.index() == 1) {
                INJECTED.incrementAndGet();
                throw new IOException("injected fault: the executor is lost");
            }
        });
        assertEquals(1, INJECTED.get(), "the fault fired once, on the first attempt only");
        assertEquals(files(clean), files(faulty));
        assertEquals(16 * 2 + 1, files(faulty).size());
        assertTrue(files(faulty).keySet().stream().noneMatch(f -> f.endsWith(AtomicFile.TEMPORARY_SUFFIX)));
        assertEquals(a.annotated(), b.annotated());
        assertEquals(16, b.annotated());
        assertEquals(a.decisions(), b.decisions());
        assertEquals(List.of(), b.failed());
    }

    @Test
    void aCountingTaskKilledHalfWayIsRetriedAndNothingIsCountedTwice() throws Exception {
        RawTextAttachmentCounting.Summary onThreads = new RawTextAttachmentCounting(2).count(List.of(in));
        RawTextAttachmentCounting.Summary clean;
        RawTextAttachmentCounting.Summary faulty;
        INJECTED.set(0);
        int before = PartitionCounting.built();
        try (SparkJob job = SparkJob.start(SparkMaster.parse("local[2]"), "test")) {
            clean = job.countRawText(List.of(in.toString()), false);
            // Partition 0's first attempt dies after counting its first document: its counts must not survive.
            faulty = job.countRawText(List.of(in.toString()), false, (partition, attempt, counted) -> {
                if (partition == 0 && attempt == 0 && counted == 1) {
                    INJECTED.incrementAndGet();
                    throw new IOException("injected fault: the executor is lost");
                }
            });
        }
        assertEquals(1, INJECTED.get(), "the fault fired once, on the first attempt only");
        assertEquals(16, faulty.counts().tally().documents());
        assertTrue(faulty.counts().tally().prepositions() > 16, "the logs hold prepositions to count");
        assertArrayEquals(onThreads.counts().toBytes(), clean.counts().toBytes());
        assertArrayEquals(clean.counts().toBytes(), faulty.counts().toBytes());
        // Two jobs of 8 partitions each on 2 slots: each slot built its counting flow once.
        assertTrue(PartitionCounting.built() - before <= 4, "flows built: " + (PartitionCounting.built() - before));
    }

    @Test
    void eachTaskSlotBuildsItsPipelineOnceForAllItsPartitions() throws Exception {
        int before = ExecutorPipelines.built();
        CollectionRun.Result r = run(dir.resolve("out"), null);
        assertEquals(16, r.annotated());
        int built = ExecutorPipelines.built() - before;
        // 16 documents in 8 partitions on 2 slots: at most one pipeline per slot.
        assertTrue(built >= 1 && built <= 2, "pipelines built: " + built);
    }

    @Test
    void aModelTheExecutorsCannotReadStopsTheRunBeforeWork() throws Exception {
        Path missing = dir.resolve("models/retrained.tether");
        try (SparkJob job = SparkJob.start(SparkMaster.parse("local[2]"), "test")) {
            IOException e = assertThrows(IOException.class,
                    () -> job.checkExecutors(List.of(in.toString()), missing.toString(), "0123", dir.resolve("out")));
            assertTrue(e.getMessage().contains("cannot read the model " + missing), e.getMessage());
            assertTrue(e.getMessage().contains("spark-submit --files"), e.getMessage());
            Files.createDirectories(missing.getParent());
            Files.writeString(missing, "not a model\n");
            IOException damaged = assertThrows(IOException.class,
                    () -> job.checkExecutors(List.of(in.toString()), missing.toString(), "0123", dir.resolve("out")));
            assertTrue(damaged.getMessage().contains("cannot read the model " + missing), damaged.getMessage());
        }
    }

    @Test
    void anInputTheExecutorsDoNotSeeStopsTheRunBeforeWork() throws Exception {
        Path gone = dir.resolve("archive-on-another-machine");
        String id = LoadedModels.get(LoadedModels.DEFAULT).id();
        try (SparkJob job = SparkJob.start(SparkMaster.parse("local[2]"), "test")) {
            IOException e = assertThrows(IOException.class,
                    () -> job.checkExecutors(List.of(gone.toString()), LoadedModels.DEFAULT, id, dir.resolve("out")));
            assertTrue(e.getMessage().contains("the input " + gone + " does not exist there"), e.getMessage());
            job.checkExecutors(List.of(in.toString()), LoadedModels.DEFAULT, id, dir.resolve("out")); // and all is well otherwise
        }
    }
}
