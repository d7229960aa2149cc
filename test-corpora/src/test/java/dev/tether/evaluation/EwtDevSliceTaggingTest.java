package dev.tether.evaluation;

import dev.tether.model.TetherModel;
import dev.tether.preprocessing.EnglishPreprocessingModels;
import dev.tether.preprocessing.ModelTaggers;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;
import opennlp.tools.postag.POSEvaluator;
import opennlp.tools.postag.POSModel;
import opennlp.tools.postag.POSSample;
import opennlp.tools.postag.POSTagFormat;
import opennlp.tools.postag.POSTaggerME;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * External check of the shipped default model's tagger (trained by {@code tether train --conllu} from the Penn
 * Treebank tags of the train split of Universal Dependencies English EWT, Silveira et al. 2014, CC BY-SA 4.0) on
 * the gold words and XPOS tags of the first 400 sentences of EWT's development split, which it never saw; the
 * shipped OpenNLP tagger (trained on the Penn Treebank's Wall Street Journal text) is scored in the same run.
 */
class EwtDevSliceTaggingTest {
    private static final Path SLICE = Path.of("data/ud-ewt/en_ewt-ud-dev-slice.conllu");

    private static List<TreebankSentence> sentences;
    private static double defaultTagger;
    private static double shippedTagger;
    private static long words;

    @BeforeAll
    static void tagTheSliceWithBothTaggers() throws Exception {
        sentences = ConlluReader.readAll(SLICE);
        words = sentences.stream().mapToLong(TreebankSentence::size).sum();
        defaultTagger = accuracy(ModelTaggers.of(TetherModel.bundled()).orElseThrow());
        shippedTagger = accuracy(EnglishPreprocessingModels.shared().posModel());
        System.out.printf("EWT dev slice tagging, %d words: default model's tagger %.4f, shipped OpenNLP tagger %.4f%n",
                words, defaultTagger, shippedTagger);
    }

    private static double accuracy(POSModel model) {
        POSEvaluator evaluator = new POSEvaluator(new POSTaggerME(model, POSTagFormat.PENN));
        for (TreebankSentence s : sentences) evaluator.evaluateSample(new POSSample(s.forms(), s.xposTags()));
        return evaluator.getWordAccuracy();
    }

    /*
     * Measured (December 2026, one run): the default model's tagger gives 0.9330 of the slice's 6,729 words their gold
     * tag, the shipped OpenNLP tagger 0.9007. On the whole dev split (25,147 words) 0.9265 and 0.8831
     * (TaggerAccuracyMeasurement in the annotators' tests); the issue measured 88.3% and 92.7% the same way. Tagging is
     * deterministic, so the floors guard against regressions, not against sampling.
     */

    @Test
    void theSliceHasItsWords() {
        assertEquals(400, sentences.size());
        assertTrue(words > 6000, "words: " + words);
    }

    /**
     * 0.9330 measured; the standard error of a proportion near 0.93 at n = 6,729 is 0.31 points, so 0.92 (1.3 points,
     * about 90 words, lower) lets a retrained tagger differ by what this slice cannot tell apart, and stops a real loss.
     */
    private static final double ACCURACY_FLOOR = 0.92;

    /**
     * 3.2 points measured over the shipped tagger on the same words; the standard error of the difference is at most
     * 0.5 points even treated as unpaired, so a required gain of 2 points is far beyond chance.
     */
    private static final double GAIN_OVER_SHIPPED = 0.02;

    @Test
    void defaultTaggerStaysAboveItsFloor() {
        assertTrue(defaultTagger >= ACCURACY_FLOOR, "default model's tagger: " + defaultTagger);
    }

    @Test
    void defaultTaggerBeatsTheShippedOpenNlpTaggerOnEwt() {
        assertTrue(defaultTagger - shippedTagger >= GAIN_OVER_SHIPPED, defaultTagger + " vs shipped " + shippedTagger);
    }
}
