package dev.tether.evaluation;

import dev.tether.attachment.AttachmentSite;
import dev.tether.io.QuadrupleReader;
import dev.tether.io.QuadrupleSet;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TetherModel;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The external check of the quadruple model: train on the training split of the prepositional attachment benchmark
 * of Ratnaparkhi, Reynar &amp; Roukos (1994), "A Maximum Entropy Model for Prepositional Phrase Attachment" (copies in
 * data/rrr with their provenance README), evaluate on its development split. Surefire runs with this module's
 * folder as working directory.
 */
class QuadrupleBenchmarkTest {
    private static final Path TRAINING = Path.of("data/rrr/training");
    private static final Path DEVSET = Path.of("data/rrr/devset");

    private static QuadrupleSet devset;
    private static QuadrupleEvaluation evaluation;

    @BeforeAll
    static void trainAndEvaluate() throws Exception {
        QuadrupleReader strict = new QuadrupleReader(false);
        QuadrupleSet training = strict.read(TRAINING);
        devset = strict.read(DEVSET);
        TetherModel model = new ModelTrainer().addQuadruples(training).build();
        evaluation = new QuadrupleEvaluator().evaluate(model, devset.quadruples());
    }

    @Test
    void splitsAreReadWhole() {
        // Line counts of the distributed files: training 20,801, devset 4,039 (Ratnaparkhi, Reynar & Roukos 1994 data
        // as redistributed; figures in ../shared/datasets/README.md and data/rrr/README.md).
        assertEquals(4039, devset.quadruples().size());
        assertEquals(0, devset.skipped());
        assertEquals(4039, evaluation.main().total());
    }

    @Test
    void alwaysNounIsTheKnownShareOfTheDevset() {
        // A fact of the dataset (Ratnaparkhi, Reynar & Roukos 1994 devset): 2,142 of its 4,039 quadruples are
        // noun-attached, so always-noun scores 53.0% (../shared/datasets/README.md).
        long nouns = devset.quadruples().stream().filter(q -> q.site() == AttachmentSite.NOUN).count();
        assertEquals(2142, nouns);
        Accuracy alwaysNoun = evaluation.byScorer().get("always-noun");
        assertEquals(2142, alwaysNoun.correct());
        assertEquals(4039, alwaysNoun.total());
        assertEquals(0.530, alwaysNoun.value(), 0.0005);
    }

    @Test
    void backedOffModelReachesThePublishedLevelAndBeatsBothBaselines() {
        Accuracy model = evaluation.main();
        double accuracy = model.value();
        // Collins & Brooks (1995), "Prepositional Phrase Attachment through a Backed-Off Model", report 84.5% on the
        // benchmark's test split (figure recalled from memory in ../shared/datasets/README.md). The test split is
        // withheld, so the devset is held to a floor one point lower: 83.5%, as issue 2 asks.
        assertTrue(accuracy >= 0.835, () -> "backed-off accuracy on the devset " + accuracy);
        // Baselines of the same run: always-noun and the majority attachment per preposition (Ratnaparkhi, Reynar &
        // Roukos 1994 and Collins & Brooks 1995 report both beside their models).
        double alwaysNoun = evaluation.byScorer().get("always-noun").value();
        double majority = evaluation.byScorer().get("preposition-majority").value();
        assertTrue(accuracy > alwaysNoun, () -> accuracy + " vs always-noun " + alwaysNoun);
        assertTrue(accuracy > majority, () -> accuracy + " vs preposition-majority " + majority);
        // Every decision is accounted for by exactly one back-off level.
        long byLevel = evaluation.byBasis().values().stream().mapToLong(Accuracy::total).sum();
        assertEquals(model.total(), byLevel);
        System.out.printf("devset: backed-off %.4f (%d/%d), always-noun %.4f, preposition-majority %.4f, "
                        + "lexical-association %.4f%n", accuracy, model.correct(), model.total(), alwaysNoun, majority,
                evaluation.byScorer().get("lexical-association").value());
    }
}
