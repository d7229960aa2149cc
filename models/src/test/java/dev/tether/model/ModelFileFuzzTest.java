package dev.tether.model;

import com.code_intelligence.jazzer.junit.FuzzTest;
import dev.tether.attachment.AttachmentExample;
import dev.tether.attachment.AttachmentQuery;
import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;
import dev.tether.candidates.HeadClass;
import dev.tether.io.Sha256;
import org.junit.jupiter.api.Test;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.lang.management.ManagementFactory;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.zip.Deflater;
import java.util.zip.DeflaterOutputStream;
import java.util.zip.InflaterInputStream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

/**
 * Fuzz tests of {@link ModelFile#read(InputStream, String)}. The contract (DESIGN.md, "Bad input"): any bytes either
 * load or fail with a {@link ModelFormatException} whose message names the source; no other exception escapes, and
 * no count or size inside the file makes the reader allocate far beyond what the file holds.
 * <p>
 * Three depths: {@link #wholeFile} takes the bytes as they are (the checksum rejects almost all of them early);
 * {@link #compressedPayload} wraps the bytes as the deflated payload of a file with a correct header and checksum;
 * {@link #uncompressedPayload} deflates them first, so the bytes reach the section table and the section parsers
 * ({@code QuadrupleCounts.read}, {@code HeadChoiceCounts.read}, {@code TupleCounts.read}, {@code VocabularyCodec.read}).
 * <p>
 * A normal build runs each target on its seeds only (Jazzer's regression mode): the files under
 * {@code src/test/resources/dev/tether/model/ModelFileFuzzTestInputs/<method>/}, a tiny model trained by
 * {@link #tinyModel()}, cut to the layer the target fuzzes. To fuzz one target for real (one target per run):
 * <pre>
 *   JAZZER_FUZZ=1 mvn -B -pl models test -Dtest='ModelFileFuzzTest#uncompressedPayload'
 * </pre>
 * It stops after {@code maxDuration} or at the first finding; Jazzer writes the crashing input into the method's
 * Inputs folder, where it becomes a seed of every later build. The generated corpus lands in {@code models/.cifuzz-corpus}
 * and is not committed.
 */
class ModelFileFuzzTest {
    private static final String NAME = "fuzzed.tether";
    private static final byte[] MAGIC = "TETHER-MODEL\n".getBytes(StandardCharsets.US_ASCII);
    private static final int HEADER = MAGIC.length + 4 + 8;
    private static final int DIGEST = 32;
    /** Bytes a read may allocate beyond {@link #BUDGET_PER_INPUT_BYTE} per input byte (deflate expands at most ~1032:1). */
    private static final long BUDGET_FIXED = 64L << 20;
    private static final long BUDGET_PER_INPUT_BYTE = 2048;

    @FuzzTest(maxDuration = "3m")
    void wholeFile(byte[] bytes) {
        assertContract(bytes, bytes.length);
    }

    @FuzzTest(maxDuration = "3m")
    void compressedPayload(byte[] deflated) {
        assertContract(wrap(deflated), deflated.length);
    }

    @FuzzTest(maxDuration = "3m")
    void uncompressedPayload(byte[] payload) {
        assertContract(wrap(deflate(payload)), payload.length);
    }

    // ---- The harness checks itself: the seeds and the wrapping are valid, so fuzzing starts from real models. ----

    @Test
    void theTinyModelHasEverySectionFilled() throws IOException {
        TetherModel model = ModelFile.read(new ByteArrayInputStream(tinyModel()), NAME);
        assertEquals(5.0, model.quadruples().total());
        assertTrue(model.headChoice().structure().size() > 0, "head-choice counts are part of the seed");
    }

    @Test
    void wrappingTheTinyModelsOwnPayloadGivesTheSameModel() throws IOException {
        byte[] file = tinyModel();
        byte[] deflated = Arrays.copyOfRange(file, HEADER, file.length - DIGEST);
        assertEquals(Sha256.hex(file), Sha256.hex(wrap(deflated)));
        TetherModel rewrapped = ModelFile.read(new ByteArrayInputStream(wrap(deflate(inflate(deflated)))), NAME);
        assertEquals(ModelFile.read(new ByteArrayInputStream(file), NAME).quadruples().total(),
                rewrapped.quadruples().total());
    }

    @Test
    void committedSeedsOfEachTargetStillLoad() throws IOException {
        byte[] file = resource("wholeFile/tiny-model");
        assertNotNull(ModelFile.read(new ByteArrayInputStream(file), NAME));
        assertNotNull(ModelFile.read(new ByteArrayInputStream(wrap(resource("compressedPayload/tiny-model"))), NAME));
        assertNotNull(ModelFile.read(new ByteArrayInputStream(wrap(deflate(resource("uncompressedPayload/tiny-model")))), NAME));
    }

    // ---- The contract ----

    /** Reads {@code file}: a model or a ModelFormatException naming the source, within an allocation budget. */
    static void assertContract(byte[] file, int inputLength) {
        com.sun.management.ThreadMXBean threads = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        long before = threads.getCurrentThreadAllocatedBytes();
        try {
            assertNotNull(ModelFile.read(new ByteArrayInputStream(file), NAME));
        } catch (ModelFormatException e) {
            assertNotNull(e.getMessage());
            assertTrue(e.getMessage().startsWith(NAME + " "), "the message names the file: " + e.getMessage());
        } catch (IOException e) {
            fail("an IOException that is not a ModelFormatException: " + e, e);
        }
        long allocated = threads.getCurrentThreadAllocatedBytes() - before;
        long budget = BUDGET_FIXED + BUDGET_PER_INPUT_BYTE * inputLength;
        assertTrue(allocated <= budget, "reading " + inputLength + " fuzzed bytes allocated " + allocated
                + " bytes (budget " + budget + "): a size inside the file is trusted before the data is there");
    }

    // ---- The model file layout, as ModelFile documents it: magic, version, payload length, payload, SHA-256. ----

    static byte[] wrap(byte[] deflated) {
        try {
            ByteArrayOutputStream body = new ByteArrayOutputStream();
            DataOutputStream out = new DataOutputStream(body);
            out.write(MAGIC);
            out.writeInt(ModelFile.FORMAT_VERSION);
            out.writeLong(deflated.length);
            out.write(deflated);
            out.flush();
            byte[] digest = Sha256.newDigest().digest(body.toByteArray());
            out.write(digest);
            out.flush();
            return body.toByteArray();
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    static byte[] deflate(byte[] payload) {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        Deflater deflater = new Deflater(Deflater.BEST_SPEED);
        try (DeflaterOutputStream out = new DeflaterOutputStream(bytes, deflater)) {
            out.write(payload);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        } finally {
            deflater.end();
        }
        return bytes.toByteArray();
    }

    static byte[] inflate(byte[] deflated) throws IOException {
        try (InputStream in = new InflaterInputStream(new ByteArrayInputStream(deflated))) {
            return in.readAllBytes();
        }
    }

    /**
     * A tiny but complete model: five quadruples over two prepositions and two head-choice examples, so that every
     * section and every kind of table has entries. Its three layers are the committed seeds (see {@link #main}).
     */
    static byte[] tinyModel() throws IOException {
        ModelTrainer trainer = new ModelTrainer();
        trainer.addQuadruple(lq("replaced", "gasket", "with", "spare", AttachmentSite.VERB));
        trainer.addQuadruple(lq("inspected", "hull", "near", "waterline", AttachmentSite.NOUN));
        trainer.addQuadruple(lq("replaced", "seal", "on", "pump", AttachmentSite.NOUN));
        trainer.addQuadruple(lq("moored", "ferry", "at", "pier", AttachmentSite.VERB));
        trainer.addQuadruple(lq("painted", "deck", "with", "primer", AttachmentSite.VERB));
        trainer.addExample(new AttachmentExample(AttachmentQuery.builder("on", "pump").objectTag("NN")
                .candidate("replaced", "VBD", HeadClass.VERB, 2, false).candidate("seal", "NN", HeadClass.NOUN, 1, false)
                .quadruple(0, 1).build(), 1, "tiny:1"));
        trainer.addExample(new AttachmentExample(AttachmentQuery.builder("with", "primer").objectTag("NN")
                .candidate("painted", "VBD", HeadClass.VERB, 3, false).candidate("deck", "NN", HeadClass.NOUN, 1, false)
                .candidate("fresh", "JJ", HeadClass.ADJECTIVE, 2, true).build(), 0, "tiny:2"));
        TetherModel model = trainer.build();
        return ModelFile.encode(model.normalizerVersion(), model.sources(), model.quadruples(), model.headChoice(),
                model.attachmentRanker().orElse(null), model.tagger().orElse(null));
    }

    private static LabelledQuadruple lq(String v, String n1, String p, String n2, AttachmentSite site) {
        return new LabelledQuadruple(new Quadruple(v, n1, p, n2), site, "tiny");
    }

    private static byte[] resource(String path) throws IOException {
        try (InputStream in = ModelFileFuzzTest.class.getResourceAsStream("ModelFileFuzzTestInputs/" + path)) {
            assertNotNull(in, "missing seed " + path + "; regenerate the seeds with ModelFileFuzzTest.main");
            return in.readAllBytes();
        }
    }

    /**
     * Writes the three seeds of {@link #tinyModel()} into the folder given as argument (the Inputs folder under
     * src/test/resources); run it when the model format changes and {@link #committedSeedsOfEachTargetStillLoad} fails.
     */
    public static void main(String[] args) throws IOException {
        java.nio.file.Path inputs = java.nio.file.Path.of(args[0]);
        byte[] file = tinyModel();
        byte[] deflated = Arrays.copyOfRange(file, HEADER, file.length - DIGEST);
        write(inputs.resolve("wholeFile/tiny-model"), file);
        write(inputs.resolve("compressedPayload/tiny-model"), deflated);
        write(inputs.resolve("uncompressedPayload/tiny-model"), inflate(deflated));
    }

    private static void write(java.nio.file.Path target, byte[] bytes) throws IOException {
        java.nio.file.Files.createDirectories(target.getParent());
        java.nio.file.Files.write(target, bytes);
    }
}
