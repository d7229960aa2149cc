package dev.tether.evaluation;

import dev.tether.model.TetherModel;
import dev.tether.preprocessing.EnglishPreprocessingModels;
import dev.tether.preprocessing.FeatureFamilyIndex;
import dev.tether.preprocessing.ModelTaggers;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;
import opennlp.tools.ml.model.MaxentModel;
import opennlp.tools.postag.POSContextGenerator;
import opennlp.tools.postag.POSModel;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@link FeatureFamilyIndex} against OpenNLP: at every position of the 400 sentences of the EWT dev slice and the
 * first 2,000 of EWT train (Universal Dependencies English EWT, Silveira et al. 2014, CC BY-SA 4.0), with the gold
 * Penn Treebank tags as the tags before the position, the probabilities it sums from its per-word lookups are the
 * very doubles that OpenNLP's maximum entropy model gives for the context OpenNLP's own generator builds.
 */
class FeatureFamilyIndexEwtTest {
    @Test
    void scoresEveryPositionAsOpenNlpsModelDoes() throws Exception {
        POSModel pos = ModelTaggers.of(TetherModel.bundled()).orElseThrow();
        FeatureFamilyIndex index = FeatureFamilyIndex.of(pos).orElseThrow();
        MaxentModel model = (MaxentModel) pos.getArtifact("pos.model");
        List<TreebankSentence> sentences = new ArrayList<>(ConlluReader.readAll(Path.of("data/ud-ewt/en_ewt-ud-dev-slice.conllu")));
        sentences.addAll(ConlluReader.readAll(Path.of("data/ud-ewt/en_ewt-ud-train.conllu.gz")).subList(0, 2000));
        double[] scores = new double[index.outcomes()];
        FeatureFamilyIndex.Scorer scorer = index.scorer();
        long positions = 0;
        for (TreebankSentence s : sentences) {
            // A fresh generator per sentence: OpenNLP's caches key on the words array, and each position is asked once.
            POSContextGenerator contexts = pos.getFactory().getPOSContextGenerator(3);
            String[] words = s.forms();
            String[] tags = s.xposTags();
            scorer.start(words);
            for (int i = 0; i < words.length; i++) {
                double[] expected = model.eval(contexts.getContext(i, words, tags, new Object[0]));
                scorer.score(i, i >= 1 ? tags[i - 1] : null, i >= 2 ? tags[i - 2] : null, scores);
                assertArrayEquals(expected, scores, 0.0, "position " + i + " of: " + String.join(" ", words));
                positions++;
            }
        }
        assertTrue(positions > 35_000, "compared " + positions + " positions");
    }

    @Test
    void aModelOfTheOpenNlp15GenerationHasNoIndex() throws Exception {
        // Its contexts come from another generator (with a tag dictionary and other features); OpenNLP's own path tags it.
        assertTrue(FeatureFamilyIndex.of(EnglishPreprocessingModels.shared().posModel()).isEmpty());
    }
}
