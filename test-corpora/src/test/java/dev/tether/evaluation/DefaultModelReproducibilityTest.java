package dev.tether.evaluation;

import dev.tether.io.Sha256;
import dev.tether.model.TetherModel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The shipped default model is reproducible bit for bit from the repository. It was made, from the repository root,
 * by:
 * <pre>
 * ./tether train --quadruples test-corpora/data/rrr/training \
 *     --conllu test-corpora/data/ud-ewt/en_ewt-ud-train.conllu.gz --thesaurus test-corpora/data/thesaurus/raw-text.thesaurus \
 *     --out models/src/main/resources/dev/tether/model/default.tether
 * </pre>
 * This test runs that same command (same entry point, same arguments, paths relative to this module) into a
 * temporary file and compares the bytes with the resource on the classpath. Sources: the prepositional attachment
 * quadruples of Ratnaparkhi, Reynar &amp; Roukos (1994) (data/rrr) and the train split of Universal Dependencies
 * English EWT (Silveira et al. 2014, CC BY-SA 4.0; data/ud-ewt), and a thesaurus of neighbour lists counted from the
 * project's development raw text (data/thesaurus, whose README gives the command and the text's sources). A model records its sources by file name and
 * SHA-256, so the relative paths do not change its bytes.
 */
class DefaultModelReproducibilityTest {
    @TempDir
    Path dir;

    @Test
    void trainingTheDocumentedCommandGivesTheShippedBytes() throws Exception {
        Path retrained = dir.resolve("default.tether");
        CommandLineEntry run = CommandLineEntry.run("train",
                "--quadruples", "data/rrr/training",
                "--conllu", "data/ud-ewt/en_ewt-ud-train.conllu.gz",
                "--thesaurus", "data/thesaurus/raw-text.thesaurus",
                "--out", retrained.toString());
        assertEquals(0, run.exitCode(), run::toString);

        byte[] shipped;
        try (InputStream in = TetherModel.class.getResourceAsStream(TetherModel.BUNDLED_RESOURCE)) {
            assertNotNull(in, TetherModel.BUNDLED_RESOURCE);
            shipped = in.readAllBytes();
        }
        byte[] rebuilt = Files.readAllBytes(retrained);
        assertEquals(Sha256.hex(shipped), Sha256.hex(rebuilt),
                "the shipped default model differs from a retraining with the documented command; rerun it and commit the result");
        assertArrayEquals(shipped, rebuilt);
        // The model id the command printed is the one the shipped model carries.
        String id = TetherModel.bundled().id();
        assertTrue(run.out().contains(id), () -> "id " + id + " not in\n" + run);
    }
}
