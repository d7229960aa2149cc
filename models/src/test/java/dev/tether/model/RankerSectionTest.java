package dev.tether.model;

import dev.tether.attachment.AttachmentExample;
import dev.tether.attachment.AttachmentQuery;
import dev.tether.candidates.HeadClass;
import dev.tether.ranking.Lbfgs;
import dev.tether.ranking.RankerTrainer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.ByteBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The model file's attachment-ranker section: another version, or damaged weights, fail with the file named. */
class RankerSectionTest {
    @TempDir
    Path dir;

    private static TetherModel tinyRankedModel() {
        ModelTrainer trainer = new ModelTrainer().rankerTrainer(new RankerTrainer(new double[] {1}, 1, new Lbfgs(100, 1e-8)));
        trainer.addExample(new AttachmentExample(AttachmentQuery.builder("with", "wrench").objectTag("NN")
                .candidate("gasket", "NN", HeadClass.NOUN, 2, false).candidate("replaced", "VBD", HeadClass.VERB, 4, false)
                .quadruple(1, 0).build(), 1, "ferry:1"));
        trainer.addExample(new AttachmentExample(AttachmentQuery.builder("on", "pump").objectTag("NN")
                .candidate("seal", "NN", HeadClass.NOUN, 2, false).candidate("fitted", "VBD", HeadClass.VERB, 4, false)
                .quadruple(1, 0).build(), 0, "ferry:2"));
        return trainer.build();
    }

    private static Map<String, byte[]> sectionsOf(TetherModel m) throws Exception {
        return ModelFile.sections(m.normalizerVersion(), m.sources(), m.quadruples(), m.headChoice(), m.attachmentRanker().orElseThrow(), null);
    }

    @Test
    void aRankerOfAnotherVersionIsRefusedWithTheFileNamed() throws Exception {
        Map<String, byte[]> sections = sectionsOf(tinyRankedModel());
        byte[] ranker = sections.get("attachment-ranker");
        ByteBuffer.wrap(ranker).putInt(0, 99);
        Path file = dir.resolve("other-version.tether");
        Files.write(file, ModelFile.pack(sections));
        ModelFormatException e = assertThrows(ModelFormatException.class, () -> ModelFile.read(file));
        assertTrue(e.getMessage().contains(file.toString()), e.getMessage());
        assertTrue(e.getMessage().contains("attachment ranker of version 99"), e.getMessage());
        assertTrue(e.getMessage().contains("Retrain"), e.getMessage());
    }

    @Test
    void aWeightThatIsNotANumberIsRefusedWithTheFileNamed() throws Exception {
        Map<String, byte[]> sections = sectionsOf(tinyRankedModel());
        byte[] ranker = sections.get("attachment-ranker");
        // Layout: version, family mask, feature count n, n keys, then the n weights.
        ByteBuffer b = ByteBuffer.wrap(ranker);
        int n = b.getInt(8);
        b.putDouble(12 + 8 * n, Double.NaN);
        Path file = dir.resolve("nan-weight.tether");
        Files.write(file, ModelFile.pack(sections));
        ModelFormatException e = assertThrows(ModelFormatException.class, () -> ModelFile.read(file));
        assertTrue(e.getMessage().contains(file.toString()) && e.getMessage().contains("NaN"), e.getMessage());
    }
}
