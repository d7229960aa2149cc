package dev.tether.treebank;

import org.junit.jupiter.api.Test;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.*;

/**
 * The shipped copy of the Universal Dependencies English EWT train split (Silveira et al. 2014; CC BY-SA 4.0), from
 * which the default model is rebuilt, is complete and readable through gzip.
 */
class EwtTrainCopyTest {

    @Test
    void trainSplitCopyHasEverySentenceOfTheRelease() throws Exception {
        int sentences = 0, words = 0;
        try (ConlluReader r = ConlluReader.open(Path.of("data/ud-ewt/en_ewt-ud-train.conllu.gz"))) {
            for (TreebankSentence s = r.next(); s != null; s = r.next()) {
                sentences++;
                words += s.size();
                assertFalse(s.text().isEmpty(), s.toString());
            }
        }
        assertEquals(12_544, sentences, "sentences in the EWT train split (datasets notes, release 15d613d8)");
        assertTrue(words > 200_000, "words: " + words);
    }
}
