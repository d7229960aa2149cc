package dev.tether.spark;

import org.junit.jupiter.api.Test;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;

import static org.junit.jupiter.api.Assertions.*;

/** The shard Spark's tree aggregation carries: exact merges, and no copy of the tables where none is needed. */
class CountShardTest {

    private static CountShard counted(String... taggedWords) {
        CountShard shard = new CountShard();
        for (String w : taggedWords) {
            int slash = w.indexOf('/');
            shard.counts().addToken(w.substring(0, slash), w.substring(slash + 1));
        }
        shard.counts().addDocument(1, taggedWords.length);
        return shard;
    }

    private static CountShard travelled(CountShard shard) throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
            out.writeObject(shard);
        }
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
            return (CountShard) in.readObject();
        }
    }

    @Test
    void mergingIntoTheEmptyZeroValueTakesTheTablesOverInsteadOfCopyingThem() throws Exception {
        CountShard shard = counted("pump/NN", "replaced/VBD", "pump/NN");
        var tables = shard.counts();
        CountShard zero = travelled(new CountShard()); // Spark hands every partition a serialized copy of the zero
        assertSame(tables, zero.merge(shard).counts(), "the empty zero value adopts the partition's tables");
    }

    @Test
    void aFrozenShardHoldsTheSameCountsAndTravelsAsTheBuilderWould() throws Exception {
        CountShard shard = counted("pump/NN", "replaced/VBD", "seal/NN");
        byte[] before = shard.counts().build().toBytes();
        CountShard frozen = counted("pump/NN", "replaced/VBD", "seal/NN");
        frozen.freeze();
        CountShard zero = travelled(new CountShard());
        zero.merge(travelled(frozen));
        assertArrayEquals(before, zero.counts().build().toBytes());
    }

    @Test
    void mergesGiveTheSameCountsWhetherTheShardsTravelledOrNot() throws Exception {
        CountShard a = counted("pump/NN", "replaced/VBD", "seal/NN");
        CountShard b = counted("pump/NN", "gasket/NN", "fitted/VBD");
        CountShard expected = counted("pump/NN", "replaced/VBD", "seal/NN");
        expected.merge(counted("pump/NN", "gasket/NN", "fitted/VBD"));
        byte[] direct = expected.counts().build().toBytes();

        CountShard driver = travelled(new CountShard());
        driver.merge(travelled(a)).merge(travelled(b));
        assertArrayEquals(direct, driver.counts().build().toBytes(), "received shards merged on the driver");
        assertEquals(2, driver.counts().build().tally().documents());
        assertEquals(6, driver.counts().build().tally().tokens());

        CountShard again = travelled(travelled(driver));
        assertArrayEquals(direct, again.counts().build().toBytes(), "a merged shard travels unchanged");
    }
}
