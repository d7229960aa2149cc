package dev.tether.evaluation;

import dev.tether.model.TetherModel;
import dev.tether.pipeline.TetherPipeline;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * External check of the whole raw-text pipeline with the shipped default model, on the first 400 sentences of the
 * development split of Universal Dependencies English EWT (Silveira et al. 2014, "A Gold Standard Dependency Corpus
 * for English", LREC 2014; CC BY-SA 4.0; provenance in data/ud-ewt/README.md). Only the {@code # text} lines reach
 * the pipeline (its own sentences, tokens and tags); decisions are scored against the gold trees by character
 * offsets. The default model is trained on the EWT train split, never on dev.
 */
class EwtDevSliceEndToEndTest {
    private static final Path SLICE = Path.of("data/ud-ewt/en_ewt-ud-dev-slice.conllu");

    private static RunningTextEvaluation evaluation;

    @BeforeAll
    static void runPipelineOnTheSlice() throws Exception {
        AnalysisEngine pipeline = TetherPipeline.createForRawText("default");
        try {
            evaluation = new RunningTextEvaluator(pipeline, TetherModel.bundled()).evaluate(SLICE);
        } finally {
            pipeline.destroy();
        }
        Accuracy a = evaluation.attachment();
        System.out.printf("EWT dev slice end to end: attachment %.4f (%d/%d), candidate recall %.4f, missed %d, %.1f s%n",
                a.value(), a.correct(), a.total(), evaluation.candidateRecall().value(), evaluation.missedPrepositions(),
                evaluation.seconds());
        for (Map.Entry<String, Accuracy> b : evaluation.baselines().entrySet()) {
            System.out.printf("  baseline %-22s %.4f (%d/%d)%n", b.getKey(), b.getValue().value(), b.getValue().correct(), b.getValue().total());
        }
        for (Map.Entry<String, Accuracy> c : evaluation.byHeadClass().entrySet()) {
            System.out.printf("  head class %-10s %.4f (%d/%d)%n", c.getKey(), c.getValue().value(), c.getValue().correct(), c.getValue().total());
        }
    }

    @Test
    void everyGoldAttachmentOfTheSliceIsScored() {
        assertEquals(400, evaluation.sentences());
        // 547 gold prepositional attachments in the slice, the count EwtDevSliceCandidateRecallTest fixes for it.
        assertEquals(547, evaluation.attachment().total());
        assertEquals(547, evaluation.candidateRecall().total());
        long byClass = evaluation.byHeadClass().values().stream().mapToLong(Accuracy::total).sum();
        assertEquals(547, byClass);
    }

    /*
     * Floors. Measured with the shipped default model and its learned ranker (December 2026, model 013e441a5047, the
     * sources of 5d7066160f60 with the thesaurus of data/thesaurus):
     * attachment 448 of 547 = 0.819 (Wilson 95% interval 0.785-0.849); in the same run the count-based score the
     * ranker replaced 425 = 0.777, nearest noun-or-verb 340 = 0.622, verb-or-first-noun 346 = 0.633, candidate recall
     * 523 = 0.956. (Before the thesaurus the default model measured 442 = 0.808; before the ranker 416 = 0.761.) The
     * run is deterministic, so the floors guard against
     * regressions, not against sampling: each sits about two standard errors of a proportion at this n (common
     * practice for a regression floor) below the measured value, so a retrained model that differs by what 547
     * items cannot tell apart still passes, and a real loss does not.
     */

    /** 0.819 measured; 0.78 lets 21 decisions (3.9 points, about 2 standard errors of 1.6 points) go, inside the 95% interval. */
    private static final double ACCURACY_FLOOR = 0.78;
    /**
     * 19.7 points measured over nearest-noun-or-verb (18.6 over verb-or-first-noun). The standard error of a
     * difference of two proportions near these values at n = 547 is at most 2.8 points even treated as unpaired
     * (paired items make it smaller), so 1.96 of them is 5.4 points: a margin of 10 points (the target on
     * the whole dev split) keeps the gain clearly beyond chance while leaving room for retraining.
     */
    private static final double MARGIN_OVER_BASELINES = 0.10;
    /**
     * 4.2 points measured over the count-based score on the same candidates (3.1 before the thesaurus). Both choose among the same candidates,
     * so the comparison is paired and its spread is that of the decisions where they differ; retraining has moved
     * single figures on this slice by about half a point. The ranker must stay at least 1.5 points ahead.
     */
    private static final double MARGIN_OVER_COUNT_SCORE = 0.015;
    /** 0.956 measured end to end (523 of 547); 0.92 lets 20 heads (about 2 standard errors) go. */
    private static final double CANDIDATE_RECALL_FLOOR = 0.92;
    /** Verb heads 0.845 (n = 232, SE 2.4 points), noun heads 0.796 (n = 275, SE 2.4): both held at 0.70. */
    private static final double HEAD_CLASS_FLOOR = 0.70;

    @Test
    void accuracyStaysAboveTheMeasuredFloor() {
        double accuracy = evaluation.attachment().value();
        assertTrue(accuracy >= ACCURACY_FLOOR, () -> "end-to-end attachment accuracy " + accuracy);
    }

    @Test
    void accuracyBeatsBothBaselinesOfTheSameRunByAMargin() {
        double accuracy = evaluation.attachment().value();
        for (String name : new String[] {RunningTextEvaluation.NEAREST_NOUN_OR_VERB, RunningTextEvaluation.VERB_OR_FIRST_NOUN}) {
            Accuracy baseline = evaluation.baselines().get(name);
            assertEquals(547, baseline.total(), name);
            assertTrue(accuracy - baseline.value() >= MARGIN_OVER_BASELINES,
                    () -> "accuracy " + accuracy + " vs " + name + " " + baseline.value());
        }
    }

    @Test
    void theLearnedRankerBeatsTheCountScoreOfTheSameRun() {
        double accuracy = evaluation.attachment().value();
        Accuracy counts = evaluation.baselines().get(RunningTextEvaluation.COUNT_SCORE);
        assertEquals(547, counts.total());
        assertTrue(accuracy - counts.value() >= MARGIN_OVER_COUNT_SCORE,
                () -> "ranker " + accuracy + " vs count-based score " + counts.value());
    }

    @Test
    void candidateRecallStaysAboveTheMeasuredFloor() {
        double recall = evaluation.candidateRecall().value();
        assertTrue(recall >= CANDIDATE_RECALL_FLOOR, () -> "candidate recall " + recall);
        // A decision can be right only if its head was a candidate.
        assertTrue(evaluation.attachment().correct() <= evaluation.candidateRecall().correct());
    }

    @Test
    void neitherVerbNorNounHeadsAreSacrificedForTheOther() {
        for (String headClass : new String[] {"verb", "noun"}) {
            double accuracy = evaluation.byHeadClass().get(headClass).value();
            assertTrue(accuracy >= HEAD_CLASS_FLOOR, () -> headClass + " heads: accuracy " + accuracy);
        }
    }

    /*
     * Coordination scope on the same run (the coordination resolver is in the raw-text pipeline). Measured with the
     * shipped default model 013e441a5047, whose coordination ranker is 5d7066160f60's (December 2026): 180 gold coordinations in the slice (a cc whose head is a
     * conj); both conjunct heads right for 110 = 0.611 (Wilson 95% interval 0.538-0.679); the nearest word before the
     * coordinator with the last conjunct's class (as the pipeline tagged it), same run, 74 = 0.411. Scope decisions on
     * the gold modifiers the pipeline decided: 77 of 79 right, against never-shared 60 = 0.759 and always-shared 0.241.
     * (Models before: be8ffe111ee2 gave 96 = 0.533 and 66 of 67, b89d43f0acc7 94 = 0.522 and 64 of 65.)
     * Floors sit about two standard errors of a proportion below the measured values (common practice for a
     * regression floor), margins at about half of what was measured.
     */

    /** 0.611 measured; SE at n = 180 is 3.6 points, so 0.54 lets about two SE go. */
    private static final double COORDINATION_FLOOR = 0.54;
    /**
     * 20.0 points measured over nearest-of-class. Both are scored on the same 180 coordinations, so the comparison is
     * paired; even unpaired the SE of the difference is 5.2 points. 10 points keeps the model clearly ahead of the
     * baseline (about two unpaired SE) without failing on a retrain that moves a handful of decisions.
     */
    private static final double COORDINATION_MARGIN = 0.10;
    /** 0.975 measured on 79 decisions (never-shared 0.759; SE of that baseline 4.8 points): 10 points ahead, about 2 SE. */
    private static final double SCOPE_MARGIN = 0.10;

    @Test
    void everyGoldCoordinationOfTheSliceIsScored() {
        CoordinationEvaluation c = evaluation.coordination();
        assertEquals(180, c.heads().total());
        assertEquals(180, c.nearestOfClass().total());
        assertEquals(180, c.byClass().values().stream().mapToLong(a -> a[0].total()).sum());
        assertEquals(c.scope().total(), c.neverShared().total(), "the scope baselines are scored on the same decisions");
    }

    @Test
    void coordinationBeatsTheNearestWordOfTheClassByAMargin() {
        CoordinationEvaluation c = evaluation.coordination();
        System.out.printf("EWT dev slice coordination: %.4f (%d/%d), nearest-of-class %.4f, spans %.4f, scope %.4f (%d) never-shared %.4f%n",
                c.heads().value(), c.heads().correct(), c.heads().total(), c.nearestOfClass().value(), c.spans().value(),
                c.scope().value(), c.scope().total(), c.neverShared().value());
        assertTrue(c.heads().value() >= COORDINATION_FLOOR, () -> "coordination accuracy " + c.heads().value());
        assertTrue(c.heads().value() - c.nearestOfClass().value() >= COORDINATION_MARGIN,
                () -> c.heads().value() + " vs nearest-of-class " + c.nearestOfClass().value());
    }

    @Test
    void scopeDecisionsBeatBothScopeBaselines() {
        CoordinationEvaluation c = evaluation.coordination();
        assertTrue(c.scope().total() >= 40, () -> "scope decisions on gold modifiers: " + c.scope().total());
        assertTrue(c.scope().value() - c.neverShared().value() >= SCOPE_MARGIN, () -> c.scope().value() + " vs never-shared " + c.neverShared().value());
        assertTrue(c.scope().value() - c.alwaysShared().value() >= SCOPE_MARGIN, () -> c.scope().value() + " vs always-shared " + c.alwaysShared().value());
    }
}
