package dev.tether.counts;

import dev.tether.vocabulary.Vocabulary;
import org.junit.jupiter.api.Test;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Count tables and vocabularies read back from bytes refuse content that no writer produces. */
class CountTableReadTest {
    private interface Body {
        void write(DataOutputStream out) throws IOException;
    }

    private static DataInputStream bytes(Body body) throws IOException {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        try (DataOutputStream out = new DataOutputStream(b)) {
            body.write(out);
        }
        return new DataInputStream(new ByteArrayInputStream(b.toByteArray()));
    }

    @Test
    void writtenTableReadsBack() throws IOException {
        TupleCountsBuilder builder = new TupleCountsBuilder();
        builder.add(TupleKey.of(3, 1), 1, 2);
        builder.add(TupleKey.of(1, 2), 0, 5);
        TupleCounts table = builder.build();
        TupleCounts back = TupleCounts.read(bytes(table::write));
        assertEquals(2, back.size());
        assertEquals(5, back.trialsOf(TupleKey.of(1, 2)));
        assertEquals(1, back.hitsOf(TupleKey.of(3, 1)));
    }

    @Test
    void keysOutOfOrderOrRepeatedAreRefused() {
        IOException e = assertThrows(IOException.class, () -> TupleCounts.read(bytes(out -> {
            out.writeInt(2);
            out.writeLong(7);
            out.writeLong(0); // the same key again
            out.writeLong(TupleCounts.pack(1, 1));
            out.writeLong(TupleCounts.pack(1, 1));
        })));
        assertTrue(e.getMessage().contains("out of order or repeated"), e.getMessage());
    }

    @Test
    void countsThatAreNotCountsAreRefused() {
        for (double[] pair : new double[][] {{Double.NaN, 1}, {1, Double.NaN}, {2, 1}, {-1, 1}, {0, Double.POSITIVE_INFINITY}}) {
            assertThrows(IOException.class, () -> TupleCounts.read(bytes(out -> {
                out.writeInt(1);
                out.writeLong(5);
                out.writeLong(TupleCounts.pack(pair[0], pair[1]));
            })), () -> "hits " + pair[0] + ", trials " + pair[1]);
        }
    }

    @Test
    void vocabularyThatRepeatsAWordIsRefused() throws IOException {
        Vocabulary fine = VocabularyCodec.read(bytes(out -> VocabularyCodec.write(Vocabulary.frozenOf(List.of("hull", "keel")), out)));
        assertEquals(2, fine.size());
        IOException e = assertThrows(IOException.class, () -> VocabularyCodec.read(bytes(out -> {
            out.writeInt(2);
            out.writeUTF("hull");
            out.writeUTF("hull");
        })));
        assertTrue(e.getMessage().contains("repeats"), e.getMessage());
    }
}
