package dev.tether.spark;

import dev.tether.counts.RawTextAttachmentCounting;
import dev.tether.counts.UnlabelledAttachmentCounter;
import org.apache.spark.TaskContext;
import org.apache.spark.api.java.function.FlatMapFunction;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
import org.apache.uima.jcas.JCas;
import org.apache.uima.util.CasCreationUtils;

import java.io.IOException;
import java.io.Serializable;
import java.util.Iterator;
import java.util.List;
import java.util.Queue;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * One Spark task of {@code train --raw}: the documents of one partition through the counting flow
 * ({@link RawTextAttachmentCounting#findingFlow}, built once per task slot and reused by later partitions), each
 * counted by {@link UnlabelledAttachmentCounter#countInto} into this attempt's own {@link CountShard}. The shard is
 * the task's only result: an attempt that fails takes its counts with it, so a retried task never counts twice.
 */
final class PartitionCounting implements FlatMapFunction<Iterator<java.util.ArrayList<String>>, CountShard> {
    /** Called after each document is counted; lets a test fail an attempt half-way through its partition. */
    @FunctionalInterface
    interface AfterDocument extends Serializable {
        void check(int partition, int attempt, int counted) throws IOException;
    }

    private record Flow(AnalysisEngine engine, JCas jcas) {
    }

    /** Idle flows: [0] with line breaks as spaces, [1] with line breaks ending sentences. */
    @SuppressWarnings("unchecked")
    private static final Queue<Flow>[] IDLE = new Queue[] {new ConcurrentLinkedQueue<Flow>(), new ConcurrentLinkedQueue<Flow>()};
    private static final AtomicInteger BUILT = new AtomicInteger();

    private final boolean lineBreaksEndSentences;
    private final AfterDocument afterDocument;

    PartitionCounting(boolean lineBreaksEndSentences, AfterDocument afterDocument) {
        this.lineBreaksEndSentences = lineBreaksEndSentences;
        this.afterDocument = afterDocument;
    }

    @Override
    public Iterator<CountShard> call(Iterator<java.util.ArrayList<String>> partition) throws Exception {
        List<String> files = new java.util.ArrayList<>();
        partition.forEachRemaining(files::addAll);
        TaskContext task = TaskContext.get();
        Queue<Flow> idle = IDLE[lineBreaksEndSentences ? 1 : 0];
        Flow flow = idle.poll();
        if (flow == null) {
            AnalysisEngine engine = AnalysisEngineFactory.createEngine(RawTextAttachmentCounting.findingFlow(lineBreaksEndSentences));
            flow = new Flow(engine, CasCreationUtils.createCas(engine.getAnalysisEngineMetaData()).getJCas());
            BUILT.incrementAndGet();
        }
        CountShard shard = new CountShard();
        try {
            int counted = 0;
            for (String file : files) {
                String[] skip = RawTextAttachmentCounting.process(flow.engine(), flow.jcas(), file, InputLocations.read(file));
                if (skip != null) {
                    shard.skip(skip);
                } else {
                    UnlabelledAttachmentCounter.countInto(flow.jcas(), shard.counts());
                }
                counted++;
                if (afterDocument != null) afterDocument.check(task.partitionId(), task.attemptNumber(), counted);
            }
            flow.jcas().reset();
            shard.freeze();
        } finally {
            idle.add(flow);
        }
        return List.of(shard).iterator();
    }

    /** Counting flows this process has built. */
    static int built() {
        return BUILT.get();
    }

    /** Releases the idle flows (the end of an embedded run). */
    static void closeAll() {
        for (Queue<Flow> idle : IDLE) {
            for (Flow f = idle.poll(); f != null; f = idle.poll()) f.engine().destroy();
        }
    }
}
