package dev.tether.spark;

import dev.tether.similarity.ContextCounter;
import dev.tether.similarity.RawTextCounting;
import dev.tether.similarity.RawTextTagger;
import org.apache.spark.api.java.function.Function2;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Queue;
import java.util.concurrent.ConcurrentLinkedQueue;

/**
 * One Spark task of {@code thesaurus build}: the consecutive documents of one partition read, tagged by the built-in
 * preprocessing (one tagger per task slot, reused by later partitions) and counted in order into a
 * {@link ContextCounter} of the task's own. The shard is the task's only result, so an attempt that fails takes its
 * counts with it and a retried task never counts twice.
 */
final class PartitionContextCounting implements Function2<Integer, Iterator<ArrayList<String>>, Iterator<ContextShard>> {
    /** Idle taggers: [0] with line breaks as spaces, [1] with line breaks ending sentences. */
    @SuppressWarnings("unchecked")
    private static final Queue<RawTextTagger>[] IDLE = new Queue[] {new ConcurrentLinkedQueue<RawTextTagger>(),
            new ConcurrentLinkedQueue<RawTextTagger>()};

    private final boolean lineBreaksEndSentences;

    PartitionContextCounting(boolean lineBreaksEndSentences) {
        this.lineBreaksEndSentences = lineBreaksEndSentences;
    }

    @Override
    public Iterator<ContextShard> call(Integer partition, Iterator<ArrayList<String>> files) throws Exception {
        Queue<RawTextTagger> idle = IDLE[lineBreaksEndSentences ? 1 : 0];
        RawTextTagger tagger = idle.poll();
        if (tagger == null) tagger = new RawTextTagger(lineBreaksEndSentences);
        ContextCounter counter = new ContextCounter();
        List<String[]> skipped = new ArrayList<>();
        int documents = 0;
        try {
            while (files.hasNext()) {
                for (String file : files.next()) {
                    RawTextCounting.Document d = RawTextCounting.Document.of(file, InputLocations.read(file), tagger);
                    if (d.skip() != null) {
                        skipped.add(new String[] {d.skip().name(), d.reason()});
                        continue;
                    }
                    d.sentencesTo(counter::addSentence);
                    documents++;
                }
            }
        } finally {
            idle.add(tagger);
        }
        return List.of(new ContextShard(partition, counter.toBytes(), documents, skipped)).iterator();
    }

    /** Releases the idle taggers (the end of an embedded run). */
    static void closeAll() {
        for (Queue<RawTextTagger> idle : IDLE) {
            for (RawTextTagger t = idle.poll(); t != null; t = idle.poll()) t.close();
        }
    }
}
