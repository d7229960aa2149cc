package dev.tether.evaluation;

import dev.tether.model.TetherModel;
import dev.tether.preprocessing.EnglishPreprocessingModels;
import dev.tether.preprocessing.MemoizedBeamTagger;
import dev.tether.preprocessing.ModelTaggers;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;
import opennlp.tools.postag.POSModel;
import opennlp.tools.postag.POSTagFormat;
import opennlp.tools.postag.POSTaggerME;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The preprocessing's tagger ({@link MemoizedBeamTagger}) against OpenNLP's own {@link POSTaggerME} with Penn
 * Treebank tags, word for word, on real sentences: the 400 of the EWT dev slice and the first 3,000 of EWT train
 * (Universal Dependencies English EWT, Silveira et al. 2014, CC BY-SA 4.0), with the default model's tagger and with
 * the shipped OpenNLP model. The reference is the library's beam search; any difference in a score, a cut-off or a
 * tie-break would show as a different tag somewhere in these 57,767 words.
 */
class MemoizedBeamTaggerEwtTest {
    private static final List<String[]> SENTENCES = new ArrayList<>();

    @BeforeAll
    static void read() throws Exception {
        for (TreebankSentence s : ConlluReader.readAll(Path.of("data/ud-ewt/en_ewt-ud-dev-slice.conllu"))) SENTENCES.add(s.forms());
        List<TreebankSentence> train = ConlluReader.readAll(Path.of("data/ud-ewt/en_ewt-ud-train.conllu.gz"));
        for (TreebankSentence s : train.subList(0, 3000)) SENTENCES.add(s.forms());
        // A sentence with one word and one with none: the edges of the search.
        SENTENCES.add(new String[] {"Bilge"});
        SENTENCES.add(new String[0]);
    }

    private static void sameTags(POSModel model) {
        POSTaggerME reference = new POSTaggerME(model, POSTagFormat.PENN);
        MemoizedBeamTagger tagger = new MemoizedBeamTagger(model);
        long words = 0;
        for (int i = 0; i < SENTENCES.size(); i++) {
            String[] forms = SENTENCES.get(i);
            assertArrayEquals(reference.tag(forms), tagger.tag(forms), "sentence " + (i + 1) + ": " + String.join(" ", forms));
            words += forms.length;
        }
        assertTrue(words > 50_000, "compared " + words + " words");
    }

    @Test
    void theDefaultModelsTaggerTagsAsOpenNlpDoes() throws Exception {
        sameTags(ModelTaggers.of(TetherModel.bundled()).orElseThrow());
    }

    @Test
    void theShippedOpenNlpModelTagsAsOpenNlpDoes() throws Exception {
        sameTags(EnglishPreprocessingModels.shared().posModel());
    }
}
