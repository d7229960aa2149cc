package dev.tether.candidates;

import java.util.ArrayList;
import java.util.List;

import org.apache.uima.fit.factory.JCasFactory;
import org.apache.uima.jcas.JCas;

import dev.tether.type.Sentence;
import dev.tether.type.Token;

/** Builds a CAS holding a hand-tagged sentence in Tether's own sentence and token types. */
final class TetherTypedCas {
    final JCas jcas;
    final List<Token> tokens = new ArrayList<>();

    private TetherTypedCas(JCas jcas) {
        this.jcas = jcas;
    }

    static TetherTypedCas of(HandTaggedText sentence) throws Exception {
        TetherTypedCas built = new TetherTypedCas(JCasFactory.createJCas());
        built.jcas.setDocumentText(sentence.text);
        for (int i = 0; i < sentence.size(); i++) {
            Token token = new Token(built.jcas, sentence.begin(i), sentence.end(i));
            token.setPos(sentence.tags.get(i));
            token.addToIndexes();
            built.tokens.add(token);
        }
        new Sentence(built.jcas, 0, sentence.text.length()).addToIndexes();
        return built;
    }
}
