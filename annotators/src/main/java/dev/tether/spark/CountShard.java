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
 * The raw counts of some documents, as Spark's tree aggregation carries them between tasks: Tether's own mergeable
 * count tables and the documents skipped, with their reasons. It travels as the bytes of a raw counts file, so what
 * crosses the network is one compact table per partition, never a record per token. Merging is exact and its order
 * does not matter (whole counts, sorted ids).
 *
 * <p>Memory: a partition's tables are about the size of the whole corpus's (the same words recur everywhere), so a
 * shard never copies them without need. The tables are a {@link RawAttachmentCountsBuilder} while a task counts into
 * them and the immutable {@link RawAttachmentCounts} once they have crossed a process boundary; merging into an
 * empty shard (Spark's zero value) takes the other shard's tables over instead of copying them, and a received shard
 * is turned into a builder only when another shard is added to it.
 */
final class CountShard implements Serializable {
    @Serial
    private static final long serialVersionUID = 2L;
    /** The length written for a shard without tables. */
    private static final int NO_TABLES = -1;

    /** The tables being counted into or merged; null while the shard is empty or holds received tables. */
    private transient RawAttachmentCountsBuilder building;
    /** Tables read from another process, not yet merged with anything; null otherwise. */
    private transient RawAttachmentCounts received;
    /** Skipped documents: the skip's name and the reason naming the file. */
    private List<String[]> skipped = new ArrayList<>();

    /** The tables to count into (or to finish the merged counts with). */
    RawAttachmentCountsBuilder counts() {
        if (building == null) {
            building = new RawAttachmentCountsBuilder();
            if (received != null) building.addAll(received);
            received = null;
        }
        return building;
    }

    /**
     * Turns the tables counted into an immutable copy, emptying the builder as the copy grows
     * ({@link RawAttachmentCountsBuilder#buildAndEmpty}): a task's result then travels without a second copy.
     */
    void freeze() {
        if (building == null) return;
        received = building.buildAndEmpty();
        building = null;
    }

    void skip(String[] kindAndReason) {
        skipped.add(kindAndReason);
    }

    List<String[]> skipped() {
        return skipped;
    }

    private boolean empty() {
        return building == null && received == null;
    }

    /** Adds {@code other} into this shard and returns this one (as Spark's aggregation functions may). */
    CountShard merge(CountShard other) {
        skipped.addAll(other.skipped);
        if (empty()) {
            building = other.building;
            received = other.received;
        } else if (other.received != null) {
            counts().addAll(other.received);
        } else if (other.building != null) {
            counts().addAll(other.building.build());
        }
        other.building = null;
        other.received = null;
        return this;
    }

    @Serial
    private void writeObject(ObjectOutputStream out) throws IOException {
        out.defaultWriteObject();
        if (empty()) {
            out.writeInt(NO_TABLES); // Spark's zero value, copied to every partition: it stays empty there
            return;
        }
        byte[] bytes = received != null ? received.toBytes() : building.build().toBytes();
        out.writeInt(bytes.length);
        out.write(bytes);
    }

    @Serial
    private void readObject(ObjectInputStream in) throws IOException, ClassNotFoundException {
        in.defaultReadObject();
        int length = in.readInt();
        if (length == NO_TABLES) return;
        byte[] bytes = new byte[length];
        in.readFully(bytes);
        received = RawAttachmentCounts.fromBytes(bytes, "counts of a Spark task");
    }
}
