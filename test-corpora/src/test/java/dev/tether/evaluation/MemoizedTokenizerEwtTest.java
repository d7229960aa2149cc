package dev.tether.evaluation;

import dev.tether.preprocessing.EnglishPreprocessingModels;
import dev.tether.preprocessing.MemoizedTokenizer;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;
import opennlp.tools.tokenize.TokenizerME;
import opennlp.tools.tokenize.TokenizerModel;
import opennlp.tools.util.Span;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The preprocessing's tokenizer ({@link MemoizedTokenizer}) against OpenNLP's own {@link TokenizerME}, span for span,
 * on real text: the {@code # text} of the 400 sentences of the EWT dev slice and of the first 5,000 of EWT train
 * (Universal Dependencies English EWT, Silveira et al. 2014, CC BY-SA 4.0), one sentence at a time as the
 * preprocessing gives them, and the same text as documents of 20 sentences. Web text has what breaks a tokenizer
 * (URLs, e-mail addresses, emoticons, runs of punctuation); any token whose split depended on more than the token
 * itself would show as a different span here.
 */
class MemoizedTokenizerEwtTest {

    @Test
    void tokenizesEwtTextAsOpenNlpDoes() throws Exception {
        List<String> texts = new ArrayList<>();
        for (TreebankSentence s : ConlluReader.readAll(Path.of("data/ud-ewt/en_ewt-ud-dev-slice.conllu"))) texts.add(s.text());
        List<TreebankSentence> train = ConlluReader.readAll(Path.of("data/ud-ewt/en_ewt-ud-train.conllu.gz"));
        for (TreebankSentence s : train.subList(0, 5000)) texts.add(s.text());
        List<String> documents = new ArrayList<>();
        for (int i = 0; i < texts.size(); i += 20) documents.add(String.join(" ", texts.subList(i, Math.min(texts.size(), i + 20))));
        texts.addAll(documents);

        TokenizerModel model = EnglishPreprocessingModels.shared().tokenizerModel();
        TokenizerME reference = new TokenizerME(model);
        MemoizedTokenizer tokenizer = new MemoizedTokenizer(model);
        long tokens = 0;
        for (int i = 0; i < texts.size(); i++) {
            String text = texts.get(i);
            if (text == null) continue;
            Span[] expected = reference.tokenizePos(text);
            assertArrayEquals(expected, tokenizer.tokenizePos(text), "text " + (i + 1) + ": " + text);
            tokens += expected.length;
        }
        assertTrue(tokens > 150_000, "compared " + tokens + " tokens");
    }
}
