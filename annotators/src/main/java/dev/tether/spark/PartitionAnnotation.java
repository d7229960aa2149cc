package dev.tether.spark;

import dev.tether.output.AtomicFile;
import dev.tether.output.IoFailure;
import dev.tether.pipeline.CollectionRun;
import dev.tether.pipeline.DocumentAnnotator;
import dev.tether.pipeline.DocumentOutcome;
import dev.tether.pipeline.DocumentTask;
import org.apache.spark.TaskContext;
import org.apache.spark.api.java.function.FlatMapFunction;
import org.apache.spark.util.TaskFailureListener;

import java.io.IOException;
import java.io.Serializable;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

/**
 * One Spark task of {@code annotate}: the documents of one partition, in order, through a pipeline borrowed from
 * {@link ExecutorPipelines}. Each document is written under temporary names of this task attempt's own
 * ({@code .<name>.attempt-<id>.tether-partial}) and committed by rename as soon as it is complete, exactly as a run on
 * threads commits it. An attempt that fails deletes its temporary files; its committed documents are byte-identical to
 * what the next attempt writes again, so a retried task leaves no partial output. A document that fails fails alone:
 * its outcome carries the reason.
 */
final class PartitionAnnotation implements FlatMapFunction<Iterator<ArrayList<DocumentTask>>, DocumentOutcome> {
    /** Called before a document's files are committed; lets a test fail an attempt between writing and renaming. */
    @FunctionalInterface
    interface BeforeCommit extends Serializable {
        void check(int partition, int attempt, DocumentTask task) throws IOException;
    }

    private final String model;
    private final String modelId;
    private final boolean chunks;
    private final boolean lineBreaksEndSentences;
    private final String out;
    private final String fingerprint;
    private final BeforeCommit beforeCommit;

    PartitionAnnotation(String model, String modelId, boolean chunks, boolean lineBreaksEndSentences, Path out,
                        String fingerprint, BeforeCommit beforeCommit) {
        this.model = model;
        this.modelId = modelId;
        this.chunks = chunks;
        this.lineBreaksEndSentences = lineBreaksEndSentences;
        this.out = out.toAbsolutePath().toString();
        this.fingerprint = fingerprint;
        this.beforeCommit = beforeCommit;
    }

    @Override
    public Iterator<DocumentOutcome> call(Iterator<ArrayList<DocumentTask>> partition) throws Exception {
        TaskContext task = TaskContext.get();
        String attempt = "attempt-" + task.taskAttemptId();
        Path folder = Path.of(out);
        List<DocumentTask> tasks = new ArrayList<>();
        partition.forEachRemaining(tasks::addAll);
        TaskFailureListener cleanUp = (context, error) -> deleteTemporaries(folder, tasks, attempt);
        task.addTaskFailureListener(cleanUp);

        String location = ExecutorModel.resolve(model);
        DocumentAnnotator annotator = ExecutorPipelines.borrow(location, modelId, chunks, lineBreaksEndSentences);
        List<DocumentOutcome> outcomes = new ArrayList<>(tasks.size());
        try {
            for (DocumentTask t : tasks) {
                DocumentOutcome o = annotator.annotate(t, folder, fingerprint, attempt);
                if (!o.isFailure() && !o.reused()) {
                    if (beforeCommit != null) beforeCommit.check(task.partitionId(), task.attemptNumber(), t);
                    try {
                        for (String file : o.entry().outputs().keySet()) AtomicFile.commit(folder.resolve(file), attempt);
                        o = o.asCommitted();
                    } catch (IOException e) {
                        o = DocumentOutcome.failed(t.index(), IoFailure.describe(e));
                    }
                }
                outcomes.add(o);
            }
        } finally {
            ExecutorPipelines.giveBack(location, modelId, chunks, lineBreaksEndSentences, annotator);
        }
        return outcomes.iterator();
    }

    private static void deleteTemporaries(Path folder, List<DocumentTask> tasks, String attempt) {
        for (DocumentTask t : tasks) {
            for (String suffix : List.of(CollectionRun.XMI, CollectionRun.LEDGER)) {
                try {
                    Files.deleteIfExists(AtomicFile.temporaryFor(folder.resolve(t.doc() + suffix), attempt));
                } catch (IOException e) {
                    // the driver removes what is left when the job ends
                }
            }
        }
    }
}
