package dev.tether.spark;

import dev.tether.model.LoadedModels;
import dev.tether.pipeline.DocumentAnnotator;
import dev.tether.pipeline.TetherPipeline;
import org.apache.uima.resource.ResourceInitializationException;

import java.io.IOException;
import java.util.Map;
import java.util.Queue;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * The pipelines of one executor process. A task borrows a pipeline for its partition and gives it back, so each task
 * slot builds its pipeline once and later partitions reuse it; every pipeline of the process scores with the one model
 * instance that {@link LoadedModels} keeps per file. Pipelines are kept per model (location and id), chunk setting and line-break setting.
 */
final class ExecutorPipelines {
    private record Key(String location, String modelId, boolean chunks, boolean lineBreaksEndSentences) {
    }

    private static final Map<Key, Queue<DocumentAnnotator>> IDLE = new ConcurrentHashMap<>();
    private static final AtomicInteger BUILT = new AtomicInteger();

    private ExecutorPipelines() {
    }

    /** An idle pipeline for the model at {@code location} (which must have id {@code modelId}), or a new one. */
    static DocumentAnnotator borrow(String location, String modelId, boolean chunks, boolean lineBreaksEndSentences)
            throws IOException, ResourceInitializationException {
        Key key = new Key(location, modelId, chunks, lineBreaksEndSentences);
        DocumentAnnotator idle = IDLE.computeIfAbsent(key, k -> new ConcurrentLinkedQueue<>()).poll();
        if (idle != null) return idle;
        String loaded = LoadedModels.get(location).id();
        if (!loaded.equals(modelId)) {
            throw new IOException("the model at " + location + " on this executor has id " + loaded + ", the driver's has id "
                    + modelId + "; give every executor the same model file (spark-submit --files, or one shared path)");
        }
        BUILT.incrementAndGet();
        return new DocumentAnnotator(TetherPipeline.forRawText(location, chunks, lineBreaksEndSentences));
    }

    static void giveBack(String location, String modelId, boolean chunks, boolean lineBreaksEndSentences,
                         DocumentAnnotator annotator) {
        IDLE.computeIfAbsent(new Key(location, modelId, chunks, lineBreaksEndSentences), k -> new ConcurrentLinkedQueue<>()).add(annotator);
    }

    /** How many pipelines this process has built. */
    static int built() {
        return BUILT.get();
    }

    /** Closes every idle pipeline (the end of an embedded run, where the driver's process is the executor). */
    static void closeAll() {
        for (Queue<DocumentAnnotator> q : IDLE.values()) {
            for (DocumentAnnotator a = q.poll(); a != null; a = q.poll()) a.close();
        }
    }
}
