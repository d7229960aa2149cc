package dev.tether.cli;

import dev.tether.model.ModelFile;
import dev.tether.model.ModelSource;
import dev.tether.model.TetherModel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * {@code tether train --base default --quadruples FILE}: a team's own labelled quadruples are added to the shipped
 * counts. Counts add up (the merged model holds exactly the shipped quadruples plus the team's), and the sources
 * say where everything came from.
 */
class DomainRetrainingTest {
    @TempDir
    Path dir;

    @Test
    void ownQuadruplesAreAddedToTheShippedCounts() throws Exception {
        Path training = FerryLogs.write(dir, "ferry.quadruples", FerryLogs.TRAINING);
        Path model = dir.resolve("ferry.tether");

        CommandLineRun run = CommandLineRun.of("train", "--base", "default", "--quadruples", training.toString(),
                "--out", model.toString());

        assertEquals(Tether.OK, run.exitCode(), run::toString);
        TetherModel shipped = TetherModel.bundled();
        TetherModel merged = ModelFile.read(model);
        long own = FerryLogs.TRAINING.lines().filter(l -> !l.isBlank()).count();
        assertEquals(shipped.quadruples().total() + own, merged.quadruples().total(), 1e-9);
        assertEquals(shipped.quadruples().nounAttachments()
                        + FerryLogs.TRAINING.lines().filter(l -> l.strip().endsWith(" N")).count(),
                merged.quadruples().nounAttachments(), 1e-9);
        List<ModelSource> sources = merged.sources();
        assertEquals("model", sources.get(0).kind());
        assertEquals(shipped.id(), sources.get(0).sha256(), "the base is recorded by its id");
        assertEquals("quadruples", sources.get(1).kind());
        assertEquals(own, sources.get(1).items());
    }
}
