package dev.tether.spark;

import java.io.Serial;
import java.io.Serializable;
import java.util.List;

/**
 * The thesaurus context counts of one partition of consecutive documents, as a Spark task returns them: the
 * partition's index (the driver appends the shards in that order, since the counts' ids follow the order of the
 * text), the counts as the bytes of {@link dev.tether.similarity.ContextCounter#toBytes}, the documents counted and
 * those skipped with their reasons (skip name, reason naming the file). One compact table per partition crosses the
 * network, never a record per token.
 */
record ContextShard(int partition, byte[] counts, int documents, List<String[]> skipped) implements Serializable {
    @Serial
    private static final long serialVersionUID = 1L;
}
