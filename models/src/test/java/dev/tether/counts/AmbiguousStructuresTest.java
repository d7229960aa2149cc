package dev.tether.counts;

import org.junit.jupiter.api.Test;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** Every structure key survives its 16-bit code, and the table reads back what was written, prepositions sorted. */
class AmbiguousStructuresTest {
    @Test
    void everyStructureKeyRoundTripsThroughItsCode() {
        int n = 0;
        for (int c = 0; c < 6; c++) {
            for (int rank = 0; rank <= 4; rank++) {
                for (int d = 0; d <= 20; d++) {
                    for (int v = 0; v <= 3; v++) {
                        for (boolean nearest : new boolean[] {false, true}) {
                            for (boolean punctuated : new boolean[] {false, true}) {
                                long key = StructureKey.of(c, rank, d, v, nearest, punctuated);
                                long other = StructureKey.of(5 - c, 0, 1, 0, true, false);
                                long pair = AmbiguousStructures.pairKey(key, other);
                                assertEquals(key, AmbiguousStructures.verbStructure(pair));
                                assertEquals(other, AmbiguousStructures.nounStructure(pair));
                                n++;
                            }
                        }
                    }
                }
            }
        }
        assertEquals(6 * 5 * 21 * 4 * 4, n);
        assertThrows(IllegalArgumentException.class, () -> AmbiguousStructures.code(TupleKey.of(1, 200, 1)));
    }

    @Test
    void writesAndReadsBackInSortedOrder() throws Exception {
        AmbiguousStructures.Builder b = new AmbiguousStructures.Builder();
        long verb = StructureKey.of(0, 0, 3, 0, false, false);
        long noun = StructureKey.of(1, 0, 1, 0, true, false);
        b.add("with", verb, noun);
        b.add("on", verb, noun);
        b.add("on", verb, noun);
        AmbiguousStructures built = b.build();
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        built.write(new DataOutputStream(bytes));
        AmbiguousStructures read = AmbiguousStructures.read(new DataInputStream(new ByteArrayInputStream(bytes.toByteArray())));
        assertEquals(2, read.size());
        assertArrayEquals(new String[] {"on", "with"}, new String[] {read.preposition(0), read.preposition(1)});
        assertEquals(2.0, read.pairs(0).trialsOf(AmbiguousStructures.pairKey(verb, noun)), 1e-9);
        assertEquals(1.0, read.pairs(1).trialsOf(AmbiguousStructures.pairKey(verb, noun)), 1e-9);
    }
}
