package dev.tether.spark;

import dev.tether.counts.RawAttachmentCountsBuilder;
import dev.tether.counts.RawTextAttachmentCounting;
import dev.tether.pipeline.CollectionRun;
import dev.tether.pipeline.DocumentFiles;
import dev.tether.pipeline.DocumentTask;
import dev.tether.similarity.ContextCounter;
import dev.tether.similarity.RawTextCounting;
import dev.tether.pipeline.DocumentOutcome;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaFutureAction;
import org.apache.spark.api.java.JavaSparkContext;

import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.stream.IntStream;

/**
 * A command's connection to Spark: the context it runs its jobs on, started for the {@code --spark} master (or the
 * one {@code spark-submit} started, see {@link #lend}), the check that executors can do the work, and the jobs.
 * No Spark type appears in what it offers, so the command line links without Spark until it is asked to run on it.
 */
public final class SparkJob implements AutoCloseable {
    /** How long the first tasks may wait for an executor before the run stops (a cluster without free resources). */
    public static final int STARTUP_DEADLINE_SECONDS = 120;
    /** Partitions per task slot: small enough partitions that slots finish together and a retry redoes little. */
    static final int PARTITIONS_PER_SLOT = 4;
    /** Levels of Spark's tree aggregation of count shards (Spark's default). */
    static final int AGGREGATION_DEPTH = 2;

    private static volatile JavaSparkContext lent;

    private final JavaSparkContext context;
    private final SparkMaster master;
    private final boolean owned;

    private SparkJob(JavaSparkContext context, SparkMaster master, boolean owned) {
        this.context = context;
        this.master = master;
        this.owned = owned;
    }

    /**
     * Lets the commands of this process run on {@code context} instead of starting their own (spark-submit's driver,
     * or a test class sharing one session); {@code null} ends the loan. A lent context is never stopped here.
     */
    public static void lend(JavaSparkContext context) {
        lent = context;
    }

    /** Starts (or joins the lent context of) {@code master}; an unreachable standalone master fails here. */
    public static SparkJob start(SparkMaster master, String appName) throws IOException {
        JavaSparkContext borrowed = lent;
        if (borrowed != null && !borrowed.sc().isStopped()) {
            if (!borrowed.master().equals(master.url()) && !borrowed.master().equals(master.given())) {
                throw new IOException("this process already runs on the Spark master " + borrowed.master() + "; --spark says "
                        + master.url());
            }
            return new SparkJob(borrowed, master, false);
        }
        master.checkReachable();
        SparkConf conf = new SparkConf().setMaster(master.url()).setAppName(appName)
                .set("spark.ui.showConsoleProgress", "false");
        if (master.local()) {
            // Embedded: nothing listens beyond this machine, and no web page is needed.
            conf.set("spark.driver.bindAddress", "127.0.0.1").set("spark.driver.host", "127.0.0.1")
                    .set("spark.ui.enabled", "false");
        } else if (!conf.contains("spark.jars")) {
            conf.set("spark.jars", String.join(",", tetherJars()));
        }
        try {
            return new SparkJob(new JavaSparkContext(conf), master, true);
        } catch (RuntimeException e) {
            throw new IOException("cannot start Spark on " + master.url() + ": " + CollectionRun.rootMessage(e), e);
        }
    }

    /** Task slots of the cluster (for {@code local[N]}: N); the summary records it as the run's threads. */
    public int parallelism() {
        return context.defaultParallelism();
    }

    /**
     * Runs {@code check} on every task slot before any work starts and fails with every problem found (input, model
     * or output folder an executor cannot use), or when no executor takes a task within
     * {@value #STARTUP_DEADLINE_SECONDS} s.
     */
    public void checkExecutors(List<String> inputs, String model, String modelId, Path out) throws IOException {
        List<String> in = new ArrayList<>();
        for (String p : inputs) in.add(DocumentFiles.isFileSystemUri(p) ? p : Path.of(p).toAbsolutePath().toString());
        ExecutorCheck check = new ExecutorCheck(List.copyOf(in), model, modelId, out == null ? null : out.toAbsolutePath().toString());
        int slots = Math.max(2, parallelism());
        List<Integer> probes = IntStream.range(0, slots).boxed().toList();
        JavaFutureAction<List<List<String>>> job = context.parallelize(probes, slots).map(i -> check.problems()).collectAsync();
        List<List<String>> reports;
        try {
            reports = job.get(STARTUP_DEADLINE_SECONDS, TimeUnit.SECONDS);
        } catch (TimeoutException e) {
            job.cancel(true);
            throw new IOException("no Spark executor took a task within " + STARTUP_DEADLINE_SECONDS + " s on " + master.url()
                    + "; check that the cluster has workers with free cores and enough memory for spark.executor.memory");
        } catch (ExecutionException e) {
            throw new IOException("the executors could not be checked on " + master.url() + ": "
                    + CollectionRun.rootMessage(e), e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted", e);
        }
        Set<String> problems = new LinkedHashSet<>();
        for (List<String> r : reports) problems.addAll(r);
        if (!problems.isEmpty()) throw new IOException(String.join("\n", problems));
    }

    /**
     * The annotation job for {@link CollectionRun#run(CollectionRun.Elsewhere)}; with {@code lineBreaksEndSentences}
     * every line break ends a sentence.
     */
    public CollectionRun.Elsewhere annotation(String model, String modelId, boolean chunks, boolean lineBreaksEndSentences,
                                              Path out) {
        return annotation(model, modelId, chunks, lineBreaksEndSentences, out, null);
    }

    /** The same, calling {@code beforeCommit} before each document's files are renamed (a test's fault injection). */
    CollectionRun.Elsewhere annotation(String model, String modelId, boolean chunks, boolean lineBreaksEndSentences,
                                       Path out, PartitionAnnotation.BeforeCommit beforeCommit) {
        return (tasks, fingerprint) -> {
            List<ArrayList<DocumentTask>> parts = BalancedPartitions.of(tasks, PARTITIONS_PER_SLOT * parallelism(),
                    t -> new File(t.file()).length());
            PartitionAnnotation work = new PartitionAnnotation(model, modelId, chunks, lineBreaksEndSentences, out, fingerprint,
                    beforeCommit);
            try {
                List<DocumentOutcome> outcomes = context.parallelize(parts, parts.size()).mapPartitions(work).collect();
                return outcomes;
            } catch (RuntimeException e) {
                throw new IOException("the Spark job failed: " + CollectionRun.rootMessage(e), e);
            } finally {
                if (master.local()) ExecutorPipelines.closeAll();
            }
        };
    }

    /**
     * Counts the raw text below {@code inputs} (local paths or file system URIs, see {@link InputLocations}) for
     * {@code train --raw} as {@link RawTextAttachmentCounting#count} does on threads, with the same result: each
     * partition's documents are counted into one shard of Tether's mergeable count tables, and the shards are combined
     * by Spark's tree aggregation (results of completed tasks only).
     */
    public RawTextAttachmentCounting.Summary countRawText(List<String> inputs, boolean lineBreaksEndSentences) throws IOException {
        return countRawText(inputs, lineBreaksEndSentences, null);
    }

    /** The same, calling {@code afterDocument} after each counted document (a test's fault injection). */
    RawTextAttachmentCounting.Summary countRawText(List<String> inputs, boolean lineBreaksEndSentences,
                                                   PartitionCounting.AfterDocument afterDocument) throws IOException {
        long start = System.nanoTime();
        InputLocations.Documents listed = InputLocations.list(inputs, context.hadoopConfiguration());
        List<String> files = listed.files();
        long notDocuments = listed.notDocuments();
        List<ArrayList<String>> parts = BalancedPartitions.of(files, PARTITIONS_PER_SLOT * parallelism(), listed.sizes()::get);
        CountShard all;
        try {
            all = context.parallelize(parts, Math.max(1, parts.size()))
                    .mapPartitions(new PartitionCounting(lineBreaksEndSentences, afterDocument))
                    .treeAggregate(new CountShard(), CountShard::merge, CountShard::merge, AGGREGATION_DEPTH);
        } catch (RuntimeException e) {
            throw new IOException("the Spark job failed: " + CollectionRun.rootMessage(e), e);
        } finally {
            if (master.local()) PartitionCounting.closeAll();
        }
        RawAttachmentCountsBuilder counts = all.counts();
        Map<RawTextCounting.Skip, List<String>> skipped = new EnumMap<>(RawTextCounting.Skip.class);
        for (String[] s : all.skipped()) {
            skipped.computeIfAbsent(RawTextCounting.Skip.valueOf(s[0]), k -> new ArrayList<>()).add(s[1]);
            counts.addSkippedDocument();
        }
        for (List<String> reasons : skipped.values()) Collections.sort(reasons);
        return new RawTextAttachmentCounting.Summary(counts.build(), skipped, notDocuments, (System.nanoTime() - start) / 1e9);
    }

    /**
     * Counts the thesaurus contexts of the raw text below {@code inputs} into {@code into} (an empty counter) as
     * {@link RawTextCounting#count} does on threads, with the same counts and ids: the documents, in the order that
     * run reads them, are cut into consecutive partitions; each task tags and counts its partition into a counter of
     * its own; the driver appends the completed tasks' counters in partition order. With {@code lineBreaksEndSentences}
     * every line break ends a sentence.
     */
    public RawTextCounting.Summary countContexts(List<String> inputs, ContextCounter into, boolean lineBreaksEndSentences)
            throws IOException {
        long start = System.nanoTime();
        InputLocations.Documents listed = InputLocations.list(inputs, context.hadoopConfiguration());
        List<String> files = listed.files();
        long notDocuments = listed.notDocuments();
        List<ArrayList<String>> parts = BalancedPartitions.inOrder(files, PARTITIONS_PER_SLOT * parallelism(), listed.sizes()::get);
        List<ContextShard> shards;
        try {
            shards = new ArrayList<>(context.parallelize(parts, Math.max(1, parts.size()))
                    .mapPartitionsWithIndex(new PartitionContextCounting(lineBreaksEndSentences), false).collect());
        } catch (RuntimeException e) {
            throw new IOException("the Spark job failed: " + CollectionRun.rootMessage(e), e);
        } finally {
            if (master.local()) PartitionContextCounting.closeAll();
        }
        shards.sort(java.util.Comparator.comparingInt(ContextShard::partition));
        Map<RawTextCounting.Skip, List<String>> skipped = new java.util.LinkedHashMap<>();
        int documents = 0;
        for (ContextShard shard : shards) {
            into.append(ContextCounter.fromBytes(shard.counts(), "the context counts of Spark partition " + shard.partition()));
            documents += shard.documents();
            for (String[] s : shard.skipped()) {
                skipped.computeIfAbsent(RawTextCounting.Skip.valueOf(s[0]), k -> new ArrayList<>()).add(s[1]);
            }
        }
        return new RawTextCounting.Summary(documents, skipped, notDocuments, into.sentenceCount(), into.tokenCount(),
                (System.nanoTime() - start) / 1e9);
    }

    /** Stops the context this job started (not a lent one). */
    @Override
    public void close() {
        if (owned) context.stop();
    }

    /** The jars of Tether and its libraries on this process's class path (not Spark's), for executors to load. */
    private static List<String> tetherJars() {
        List<String> jars = new ArrayList<>();
        for (String entry : System.getProperty("java.class.path", "").split(File.pathSeparator)) {
            File f = new File(entry);
            if (f.isFile() && entry.endsWith(".jar") && !"spark-lib".equals(f.getParentFile() == null ? "" : f.getParentFile().getName())) {
                jars.add(f.getAbsolutePath());
            }
        }
        return jars;
    }
}
