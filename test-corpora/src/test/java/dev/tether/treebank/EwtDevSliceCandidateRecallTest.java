package dev.tether.treebank;

import dev.tether.candidates.HeadClass;
import dev.tether.candidates.HeadCandidateProposer;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/**
 * External check on the first 400 sentences of the development split of Universal Dependencies English EWT
 * (Silveira et al. 2014; CC BY-SA 4.0; see data/ud-ewt/README.md), with gold Penn Treebank tags.
 */
class EwtDevSliceCandidateRecallTest {
    private static final Path SLICE = Path.of("data/ud-ewt/en_ewt-ud-dev-slice.conllu");

    /**
     * Measured on this slice: 531 of 547 gold heads among the candidates (0.971); on the whole dev split 0.979
     * (1,747 of 1,785; {@code DevSplitMeasurement}, December 2026). The floor sits about 1.5 standard errors of a proportion at n = 547 below the measured value
     * (common practice for a regression floor): small retuning passes, losing a rule does not (the following head
     * of fronted phrases alone covers 37 of the 547, 6.8%).
     */
    private static final double RECALL_FLOOR = 0.94;
    /** Measured 5.01 on this slice (4.63 on the whole dev split); above 6 the bound on candidates has stopped working. */
    private static final double AVERAGE_CANDIDATES_CEILING = 6.0;

    @Test
    void candidateRecallWithGoldTagsStaysAboveTheFloor() throws Exception {
        TreebankExamples ex = new TreebankExampleExtractor(new HeadCandidateProposer()).extract(SLICE);
        assertEquals(547, ex.goldAttachments(), "gold prepositional attachments in the slice (stable: the slice is fixed)");
        assertTrue(ex.candidateRecall() >= RECALL_FLOOR, "candidate recall " + ex.candidateRecall());
        assertTrue(ex.missedPrepositions() <= ex.goldAttachments() / 50,
                "prepositions the proposer missed: " + ex.missedPrepositions());
        assertTrue(ex.averageCandidates() <= AVERAGE_CANDIDATES_CEILING, "average candidates " + ex.averageCandidates());
    }

    @Test
    void candidatesCoverMoreThanTheBestChoiceBetweenNearestVerbAndNoun() throws Exception {
        List<TreebankSentence> sentences = ConlluReader.readAll(SLICE);
        GoldAttachmentExtractor gold = new GoldAttachmentExtractor();
        int n = 0, nearest = 0, verbOrNoun = 0;
        for (TreebankSentence s : sentences) {
            for (GoldAttachment g : gold.extract(s)) {
                n++;
                int verb = -1, noun = -1, any = -1;
                for (int k = g.preposition() - 1; k >= 0 && (verb < 0 || noun < 0); k--) {
                    HeadClass c = GoldAttachmentExtractor.headClass(s.upos(k));
                    if (c == HeadClass.VERB && verb < 0) verb = k;
                    if (c == HeadClass.NOUN && noun < 0) noun = k;
                    if ((c == HeadClass.VERB || c == HeadClass.NOUN) && any < 0) any = k;
                }
                if (g.head() == any) nearest++;
                if (g.head() == verb || g.head() == noun) verbOrNoun++;
            }
        }
        TreebankExamples ex = new TreebankExampleExtractor(new HeadCandidateProposer()).extract(SLICE);
        assertEquals(n, ex.goldAttachments());
        // On the whole dev split the datasets' notes give 62.3% and 81.2% for these two baselines; this extractor
        // reproduces both (1,112 and 1,450 of 1,785). On the slice they are 350 and 433 of 547.
        assertTrue(nearest < verbOrNoun && verbOrNoun < ex.goldAmongCandidates(),
                nearest + " nearest, " + verbOrNoun + " verb-or-noun, " + ex.goldAmongCandidates() + " among candidates");
    }
}
