package dev.tether.evaluation;

import dev.tether.attachment.AttachmentSite;
import dev.tether.io.QuadrupleReader;
import dev.tether.io.QuadrupleSet;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TetherModel;
import dev.tether.similarity.ThesaurusFile;
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

    private static final Path THESAURUS = Path.of("data/thesaurus/raw-text.thesaurus");

    private static QuadrupleSet devset;
    private static QuadrupleEvaluation evaluation;
    private static QuadrupleEvaluation withThesaurus;

    @BeforeAll
    static void trainAndEvaluate() throws Exception {
        QuadrupleReader strict = new QuadrupleReader(false);
        QuadrupleSet training = strict.read(TRAINING);
        devset = strict.read(DEVSET);
        TetherModel model = new ModelTrainer().addQuadruples(training).build();
        evaluation = new QuadrupleEvaluator().evaluate(model, devset.quadruples());
        TetherModel smoothed = new ModelTrainer().addQuadruples(training).withThesaurus(ThesaurusFile.read(THESAURUS)).build();
        withThesaurus = new QuadrupleEvaluator().evaluate(smoothed, devset.quadruples());
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
        Accuracy backedOff = evaluation.byScorer().get("backed-off");
        double accuracy = backedOff.value();
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
        // Every decision of the model's scorer is accounted for by exactly one back-off level.
        long byLevel = evaluation.byBasis().values().stream().mapToLong(Accuracy::total).sum();
        assertEquals(evaluation.main().total(), byLevel);
        System.out.printf("devset: backed-off %.4f (%d/%d), always-noun %.4f, preposition-majority %.4f, "
                        + "lexical-association %.4f%n", accuracy, backedOff.correct(), backedOff.total(), alwaysNoun, majority,
                evaluation.byScorer().get("lexical-association").value());
    }

    @Test
    void theLearnedScorerBeatsTheBackOffItsEvidenceComesFrom() {
        // The model's scorer weighs every level of the back-off's evidence (a logistic regression, as the maximum
        // entropy model of Ratnaparkhi, Reynar & Roukos 1994 weighs its features; they report 81.6% on the test split,
        // from memory). Measured here: 85.02% against 84.60% (+0.42 points, 17 quadruples; December 3, 2026); the floor is
        // half of that gain, so that a learned scorer that only copies the back-off fails.
        assertEquals("learned", evaluation.mainScorer());
        double learned = evaluation.main().value();
        double backedOff = evaluation.byScorer().get("backed-off").value();
        assertTrue(learned >= backedOff + 0.002, () -> "learned " + learned + " vs backed-off " + backedOff);
        System.out.printf("devset: learned %.4f, backed-off %.4f%n", learned, backedOff);
    }

    @Test
    void theShippedThesaurusAddsToTheLearnedScorer() {
        // Similarity-based smoothing of attachment counts (Zhao & Lin 2004 report 86.5% on the test split with
        // neighbours from a far larger corpus; ../shared/datasets/README.md, quoted from memory there). With the shipped neighbour lists (20 per word,
        // from the development raw text, data/thesaurus/README.md) the learned scorer measured 85.44% against 85.02%
        // without (+0.42 points, 17 quadruples; December 3, 2026); the floor is half of that gain.
        assertEquals("learned", withThesaurus.mainScorer());
        double with = withThesaurus.main().value();
        double without = evaluation.main().value();
        assertTrue(with >= without + 0.002, () -> "with the thesaurus " + with + " vs without " + without);
        // Same items, same counts: the plain back-off does not move.
        assertEquals(evaluation.byScorer().get("backed-off").correct(), withThesaurus.byScorer().get("backed-off").correct());
        System.out.printf("devset: learned with the shipped thesaurus %.4f, without %.4f%n", with, without);
    }
}
