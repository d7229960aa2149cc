package dev.tether.spark;

import dev.tether.counts.RawAttachmentCounts;
import dev.tether.counts.RawAttachmentCountsBuilder;

import java.io.IOException;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.io.Serial;
import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;

/**
 * The raw counts of some documents, as Spark's tree aggregation carries them between tasks: a
 * {@link RawAttachmentCountsBuilder} (Tether's own mergeable count tables) and the documents skipped, with their
 * reasons. It travels as the bytes of a raw counts file, so what crosses the network is one compact table per
 * partition, never a record per token. Merging is exact and its order does not matter (whole counts, sorted ids).
 */
final class CountShard implements Serializable {
    @Serial
    private static final long serialVersionUID = 1L;

    private transient RawAttachmentCountsBuilder counts = new RawAttachmentCountsBuilder();
    /** Skipped documents: the skip's name and the reason naming the file. */
    private List<String[]> skipped = new ArrayList<>();

    RawAttachmentCountsBuilder counts() {
        return counts;
    }

    void skip(String[] kindAndReason) {
        skipped.add(kindAndReason);
    }

    List<String[]> skipped() {
        return skipped;
    }

    /** Adds {@code other} into this shard and returns this one (as Spark's aggregation functions may). */
    CountShard merge(CountShard other) {
        counts.addAll(other.counts.build());
        skipped.addAll(other.skipped);
        return this;
    }

    @Serial
    private void writeObject(ObjectOutputStream out) throws IOException {
        out.defaultWriteObject();
        byte[] bytes = counts.build().toBytes();
        out.writeInt(bytes.length);
        out.write(bytes);
    }

    @Serial
    private void readObject(ObjectInputStream in) throws IOException, ClassNotFoundException {
        in.defaultReadObject();
        byte[] bytes = new byte[in.readInt()];
        in.readFully(bytes);
        counts = new RawAttachmentCountsBuilder();
        counts.addAll(RawAttachmentCounts.fromBytes(bytes, "counts of a Spark task"));
    }
}
