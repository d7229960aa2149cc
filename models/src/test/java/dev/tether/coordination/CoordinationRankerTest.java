package dev.tether.coordination;

import dev.tether.model.ModelFile;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TetherModel;
import dev.tether.treebank.TreebankSentence;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Trains the coordination ranker on the invented ferry treebank, saves and loads it, and decides with it. */
class CoordinationRankerTest {
    private static List<TreebankSentence> repeated() throws Exception {
        List<TreebankSentence> ferry = dev.tether.treebank.GoldCoordinationExtractorTest.ferry();
        List<TreebankSentence> all = new ArrayList<>();
        for (int i = 0; i < 10; i++) all.addAll(ferry);
        return all;
    }

    @Test
    void aTrainedRankerSurvivesTheModelFileAndPrefersTheTreebanksBracketing(@TempDir Path dir) throws Exception {
        TetherModel model = new ModelTrainer().addCoordinationSentences(repeated()).build();
        CoordinationRanker ranker = model.coordinationRanker().orElseThrow();
        assertEquals(30, ranker.pairWeights().decisions());
        Path file = dir.resolve("ferry.tether");
        ModelFile.write(model, file);
        TetherModel loaded = ModelFile.read(file);
        assertEquals(ranker, loaded.coordinationRanker().orElseThrow());
        assertEquals(model.id(), loaded.id());

        TaggedWords s = TaggedWords.of("The/DT crew/NN inspected/VBD the/DT hull/NN and/CC replaced/VBD the/DT anodes/NNS ./.");
        CoordinatorCandidates c = new ConjunctCandidateProposer().proposeAll(s.words, s.tags).get(0);
        CoordinationChoice choice = loaded.coordinationRanker().get().choose(new CoordinationQuery(s.words, s.tags, c), 3);
        ConjunctPair best = c.pair(choice.pair(0));
        assertEquals(s.index("inspected"), best.left());
        assertEquals(s.index("replaced"), best.right());
        assertTrue(choice.probability(0) > 0 && choice.probability(0) <= 1);
        assertTrue(choice.readings() <= 3 && choice.readings() >= 2);
        for (int r = 1; r < choice.readings(); r++) assertTrue(choice.probability(r - 1) >= choice.probability(r), "readings best first");
        assertEquals(choice.probability(0) - choice.probability(1), choice.margin(), 1e-12);
        assertTrue(choice.margin() >= 0);
    }

    @Test
    void theEvidenceKeptByChooseIsWhatWeighingThePairsAgainGives() throws Exception {
        CoordinationRanker ranker = new ModelTrainer().addCoordinationSentences(repeated()).build().coordinationRanker().orElseThrow();
        TaggedWords s = TaggedWords.of("The/DT crew/NN inspected/VBD the/DT hull/NN and/CC replaced/VBD the/DT anodes/NNS ./.");
        CoordinatorCandidates c = new ConjunctCandidateProposer().proposeAll(s.words, s.tags).get(0);
        CoordinationQuery q = new CoordinationQuery(s.words, s.tags, c);
        CoordinationChoice choice = ranker.choose(q, 3);
        for (int limit : new int[] {1, 3, CoordinationRanker.EXPLAINED, CoordinationRanker.EXPLAINED + 4}) {
            List<CoordinationRanker.Reason> kept = ranker.explain(q, choice, limit);
            List<CoordinationRanker.Reason> again = ranker.contrast(q, choice.pair(0), choice.pair(1), limit);
            assertEquals(again, kept, "limit " + limit);
            assertTrue(kept.size() <= limit);
            for (int i = 1; i < kept.size(); i++) assertTrue(kept.get(i - 1).weight() >= kept.get(i).weight(), "strongest first");
        }
        assertFalse(ranker.explain(q, choice, 3).isEmpty(), "the chosen reading has features that pull for it");
    }

    @Test
    void aRankerStoredAsVersionOneStillReadsAndAnUnknownVersionIsRefused() throws Exception {
        CoordinationRanker ranker = new ModelTrainer().addCoordinationSentences(repeated()).build().coordinationRanker().orElseThrow();
        java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
        CoordinationRanker.write(ranker, new java.io.DataOutputStream(bytes));
        byte[] stored = bytes.toByteArray();
        assertEquals(CoordinationRanker.VERSION, CoordinationRanker.readVersion(stored));
        // Version 1 had the same layout and a subset of today's templates, so its sections read as they are.
        java.nio.ByteBuffer.wrap(stored).putInt(0, 1);
        assertEquals(ranker, CoordinationRanker.read(new java.io.DataInputStream(new java.io.ByteArrayInputStream(stored))));
        java.nio.ByteBuffer.wrap(stored).putInt(0, CoordinationRanker.VERSION + 1);
        assertFalse(CoordinationRanker.reads(CoordinationRanker.VERSION + 1));
        java.io.IOException e = org.junit.jupiter.api.Assertions.assertThrows(java.io.IOException.class,
                () -> CoordinationRanker.read(new java.io.DataInputStream(new java.io.ByteArrayInputStream(stored))));
        assertTrue(e.getMessage().contains("version " + (CoordinationRanker.VERSION + 1)), e.getMessage());
    }

    @Test
    void aSentenceScoresTheSameWhetherItsCodesAreFreshOrKeptFromTheQueryBefore() throws Exception {
        CoordinationRanker ranker = new ModelTrainer().addCoordinationSentences(repeated()).build().coordinationRanker().orElseThrow();
        TaggedWords a = TaggedWords.of("The/DT crew/NN inspected/VBD the/DT hull/NN and/CC replaced/VBD the/DT anodes/NNS and/CC seals/NNS ./.");
        TaggedWords b = TaggedWords.of("Worn/JJ bearings/NNS and/CC seals/NNS were/VBD logged/VBN ./.");
        List<CoordinatorCandidates> ca = new ConjunctCandidateProposer().proposeAll(a.words, a.tags);
        CoordinatorCandidates cb = new ConjunctCandidateProposer().proposeAll(b.words, b.tags).get(0);
        double first = ranker.choose(new CoordinationQuery(a.words, a.tags, ca.get(1)), 2).pairProbability(0);
        ranker.choose(new CoordinationQuery(b.words, b.tags, cb), 2);
        // The same sentence again, its codes kept from the query before on this thread ...
        ranker.choose(new CoordinationQuery(a.words, a.tags, ca.get(0)), 2);
        double kept = ranker.choose(new CoordinationQuery(a.words, a.tags, ca.get(1)), 2).pairProbability(0);
        // ... and as fresh arrays with the same words.
        double fresh = ranker.choose(new CoordinationQuery(a.words.clone(), a.tags.clone(), ca.get(1)), 2).pairProbability(0);
        assertEquals(first, kept, 0.0);
        assertEquals(first, fresh, 0.0);
    }

    @Test
    void trainingTwiceGivesTheSameModelBytes(@TempDir Path dir) throws Exception {
        TetherModel a = new ModelTrainer().addCoordinationSentences(repeated()).build();
        TetherModel b = new ModelTrainer().addCoordinationSentences(repeated()).build();
        assertEquals(a.id(), b.id());
    }

    @Test
    void aModelTrainedWithoutTreesHasNoCoordinationRanker() {
        TetherModel model = new ModelTrainer().build();
        assertFalse(model.coordinationRanker().isPresent());
    }
}
