package dev.tether.model;

import org.junit.jupiter.api.Test;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.lang.management.ManagementFactory;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Findings of {@link ModelFileFuzzTest}: a size field inside a model file (with a correct checksum) claimed far more
 * data than the file holds, and the reader allocated the claimed size before reading, so a file of a few hundred
 * bytes asked for gigabytes (an OutOfMemoryError instead of a {@link ModelFormatException}). Each case here is the
 * smallest form of the crashing input; the fuzzer's own input is kept beside the seeds in
 * {@code ModelFileFuzzTestInputs/uncompressedPayload/}.
 */
class ModelFileSizeFieldRegressionTest {
    private static final String NAME = "damaged.tether";
    private static final long ALLOWED = 16L << 20;

    /** ModelFile.sections: the section table says the 'info' section has 2^31-1 bytes; it has none. */
    @Test
    void hugeSectionSizeIsAFormatErrorWithoutTheAllocation() throws IOException {
        byte[] payload = payload(out -> {
            out.writeInt(1);
            out.writeUTF("info");
            out.writeInt(Integer.MAX_VALUE);
        });
        assertRejectedCheaply(payload);
    }

    /**
     * TupleCounts.read: the first table of the quadruple section says it has 2^31-1 entries; it has none. (The
     * fuzzer found it in the head-choice section; both read their tables with TupleCounts.read.)
     */
    @Test
    void hugeTableSizeIsAFormatErrorWithoutTheAllocation() throws IOException {
        byte[] info = section(out -> {
            out.writeUTF("tether-normalizer-1");
            out.writeInt(0);
        });
        byte[] quadruples = section(out -> {
            out.writeInt(0); // words
            out.writeInt(0); // prepositions
            out.writeDouble(0); // noun attachments of the unknown preposition
            out.writeDouble(0); // all attachments of the unknown preposition
            out.writeInt(Integer.MAX_VALUE); // entries of its first table
        });
        byte[] headChoice = section(out -> {
            out.writeInt(0);
            out.writeInt(0);
        });
        byte[] payload = payload(out -> {
            out.writeInt(3);
            for (Object[] s : new Object[][] {{"info", info}, {"quadruples", quadruples}, {"head-choice", headChoice}}) {
                out.writeUTF((String) s[0]);
                out.writeInt(((byte[]) s[1]).length);
                out.write((byte[]) s[1]);
            }
        });
        assertRejectedCheaply(payload);
    }

    @Test
    void theFuzzersOwnInputsAreRejectedCheaply() throws IOException {
        for (String input : new String[] {"section-size-beyond-payload", "table-size-beyond-section"}) {
            try (InputStream in = getClass().getResourceAsStream("ModelFileFuzzTestInputs/uncompressedPayload/" + input)) {
                assertNotNull(in, input);
                assertRejectedCheaply(in.readAllBytes());
            }
        }
    }

    private static void assertRejectedCheaply(byte[] payload) {
        byte[] file = ModelFileFuzzTest.wrap(ModelFileFuzzTest.deflate(payload));
        com.sun.management.ThreadMXBean threads = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        long before = threads.getCurrentThreadAllocatedBytes();
        ModelFormatException e = assertThrows(ModelFormatException.class,
                () -> ModelFile.read(new ByteArrayInputStream(file), NAME));
        long allocated = threads.getCurrentThreadAllocatedBytes() - before;
        assertTrue(e.getMessage().startsWith(NAME + " is damaged"), e.getMessage());
        assertTrue(allocated < ALLOWED, "allocated " + allocated + " bytes to reject a file of " + file.length);
    }

    private interface Writer {
        void write(DataOutputStream out) throws IOException;
    }

    private static byte[] section(Writer writer) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (DataOutputStream out = new DataOutputStream(bytes)) {
            writer.write(out);
        }
        return bytes.toByteArray();
    }

    private static byte[] payload(Writer writer) throws IOException {
        return section(writer);
    }
}
