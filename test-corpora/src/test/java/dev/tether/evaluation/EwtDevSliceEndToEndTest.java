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
     * Floors. Measured with the shipped default model (December 2026, after its retraining for the punctuation-aware
     * structural key): attachment 416 of 547 = 0.761 (Wilson 95% interval 0.723-0.794), nearest noun-or-verb 344 =
     * 0.629, verb-or-first-noun 345 = 0.631, candidate recall 511 = 0.934; by gold head class verb 174/232 = 0.750,
     * noun 213/275 = 0.775. (The default model before that retraining gave 415 = 0.759.) Since the default model
     * carries its own tagger trained on EWT train's XPOS tags (instead of the shipped OpenNLP tagger): attachment
     * 422 = 0.771, nearest noun-or-verb 340 = 0.622, verb-or-first-noun 346 = 0.633, candidate recall 519 = 0.949,
     * verb heads 176/232 = 0.759, noun heads 214/275 = 0.778; the floors below were kept. The run is deterministic, so
     * the floors guard against regressions, not against sampling: each sits a few points (about one and a half to two
     * standard errors of a proportion at this n, common practice for a regression floor) below the measured value, so
     * a retrained model that differs by what 547 items cannot tell apart still passes, and a real loss does not.
     */

    /** 0.761 measured; 0.73 lets 16 decisions (2.9 points, about 1.6 standard errors) go, inside the 95% interval. */
    private static final double ACCURACY_FLOOR = 0.73;
    /**
     * 13.2 points measured over nearest-noun-or-verb (13.0 over verb-or-first-noun). The standard error of a
     * difference of two proportions near these values at n = 547 is at most 2.8 points even treated as unpaired
     * (paired items make it smaller), so 1.96 of them is 5.4 points: a margin of 8 points keeps the gain clearly
     * beyond chance while leaving room for retraining. (The target of 10 points is set on the whole dev split.)
     */
    private static final double MARGIN_OVER_BASELINES = 0.08;
    /** 0.934 measured (0.954 with gold tags, see EwtDevSliceCandidateRecallTest); 0.92 is 8 heads (1.4 SE) lower. */
    private static final double CANDIDATE_RECALL_FLOOR = 0.92;
    /** Verb heads 0.750 (n = 232, SE 2.8 points), noun heads 0.775 (n = 275, SE 2.5): both held at 0.70. */
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
}
