package dev.tether.preprocessing;

import dev.tether.type.Sentence;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * External check of {@link TextPreprocessor#PARAM_LINE_BREAKS_END_SENTENCES} against the sentence boundaries of a
 * treebank: the first 400 sentences of Universal Dependencies English EWT's development split (Silveira et al. 2014,
 * CC BY-SA 4.0), their {@code # text} lines written one per line, one document per {@code # newdoc}. Web text often
 * ends a sentence without punctuation, so by default the sentence detector runs such lines together; with line breaks
 * ending sentences no sentence may cross a line, and a line comes out whole unless the detector splits it further.
 */
class LineSentencesEwtTest {
    private static final Path SLICE = Path.of("data/ud-ewt/en_ewt-ud-dev-slice.conllu");

    /** One document's text and where each of its lines begins and ends. */
    private record Document(String text, List<int[]> lines) {
    }

    private static final List<Document> documents = new ArrayList<>();
    private static int lines;

    @BeforeAll
    static void readTheSliceAsDocuments() throws Exception {
        StringBuilder text = null;
        List<int[]> spans = null;
        for (String line : Files.readAllLines(SLICE, StandardCharsets.UTF_8)) {
            if (line.startsWith("# newdoc")) {
                if (text != null) documents.add(new Document(text.toString(), spans));
                text = new StringBuilder();
                spans = new ArrayList<>();
            } else if (line.startsWith("# text = ")) {
                String sentence = line.substring("# text = ".length()).strip();
                spans.add(new int[] {text.length(), text.length() + sentence.length()});
                text.append(sentence).append('\n');
                lines++;
            }
        }
        documents.add(new Document(text.toString(), spans));
    }

    /** Lines that came out as exactly one sentence, and sentences that cross a line break. */
    private static int[] score(AnalysisEngine preprocessor) throws Exception {
        int whole = 0, crossing = 0;
        JCas jcas = preprocessor.newJCas();
        for (Document d : documents) {
            jcas.reset();
            jcas.setDocumentText(d.text());
            preprocessor.process(jcas);
            List<Sentence> sentences = new ArrayList<>(JCasUtil.select(jcas, Sentence.class));
            for (Sentence s : sentences) if (s.getCoveredText().indexOf('\n') >= 0) crossing++;
            for (int[] line : d.lines()) {
                for (Sentence s : sentences) {
                    if (s.getBegin() == line[0] && s.getEnd() == line[1]) whole++;
                }
            }
        }
        return new int[] {whole, crossing};
    }

    /*
     * Measured (December 3, 2026; preprocessing is deterministic): of the slice's 400 lines in 23 documents, the
     * default keeps 273 whole and writes 46 sentences that cross a line; with line breaks ending sentences 394 lines
     * come out whole (the other 6 do not come out as one sentence: the detector cuts them) and no sentence crosses a line. The floor of 95%
     * leaves room for a retrained sentence or tokenizer model, not for lines running together again.
     */

    @Test
    void lineBreaksEndingSentencesGiveBackTheTreebanksSentences() throws Exception {
        int[] byDefault = score(AnalysisEngineFactory.createEngine(TextPreprocessor.class));
        int[] byLine = score(AnalysisEngineFactory.createEngine(TextPreprocessor.class,
                TextPreprocessor.PARAM_LINE_BREAKS_END_SENTENCES, true));
        System.out.printf("EWT dev slice, %d lines: whole sentences %d by default (%d crossing a line), %d by line (%d crossing)%n",
                lines, byDefault[0], byDefault[1], byLine[0], byLine[1]);
        assertEquals(400, lines);
        assertEquals(0, byLine[1], "no sentence may cross a line break");
        assertTrue(byDefault[1] > 0, "the default joins lines without final punctuation");
        assertTrue(byLine[0] > byDefault[0], byLine[0] + " lines whole by line against " + byDefault[0] + " by default");
        assertTrue(byLine[0] >= 0.95 * lines, byLine[0] + " of " + lines + " lines whole");
    }
}
