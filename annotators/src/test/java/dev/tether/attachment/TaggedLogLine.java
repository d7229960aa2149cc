package dev.tether.attachment;

import java.util.ArrayList;
import java.util.List;

import org.apache.uima.fit.factory.JCasFactory;
import org.apache.uima.jcas.JCas;

import dev.tether.type.Sentence;
import dev.tether.type.Token;

/**
 * A maintenance-log line of the invented ferry operator, written as {@code word/TAG} pairs separated by single
 * spaces and tagged by hand from the Penn Treebank tag set (Marcus et al. 1993), loaded into a CAS as one Tether
 * sentence with its tokens, so resolver tests depend on no statistical tagger.
 */
public final class TaggedLogLine {
    public final JCas jcas;
    public final List<Token> tokens = new ArrayList<>();

    private TaggedLogLine(JCas jcas) {
        this.jcas = jcas;
    }

    public static TaggedLogLine of(String pairs) throws Exception {
        return into(JCasFactory.createJCas(), pairs);
    }

    /** Loads the line into {@code jcas}, which must be empty (fresh or reset). */
    public static TaggedLogLine into(JCas jcas, String pairs) {
        TaggedLogLine line = new TaggedLogLine(jcas);
        StringBuilder text = new StringBuilder();
        List<String> tags = new ArrayList<>();
        List<int[]> spans = new ArrayList<>();
        for (String pair : pairs.trim().split(" ")) {
            int slash = pair.lastIndexOf('/');
            if (slash <= 0 || slash == pair.length() - 1) {
                throw new IllegalArgumentException("not a word/TAG pair: '" + pair + "' in: " + pairs);
            }
            if (text.length() > 0) text.append(' ');
            spans.add(new int[] {text.length(), text.length() + slash});
            text.append(pair, 0, slash);
            tags.add(pair.substring(slash + 1));
        }
        jcas.setDocumentText(text.toString());
        jcas.setDocumentLanguage("en");
        for (int i = 0; i < spans.size(); i++) {
            Token token = new Token(jcas, spans.get(i)[0], spans.get(i)[1]);
            token.setPos(tags.get(i));
            token.addToIndexes();
            line.tokens.add(token);
        }
        new Sentence(jcas, 0, text.length()).addToIndexes();
        return line;
    }

    /** The first token whose text is {@code word}. */
    public Token token(String word) {
        for (Token t : tokens) {
            if (t.getCoveredText().equals(word)) return t;
        }
        throw new IllegalArgumentException("no token '" + word + "' in: " + jcas.getDocumentText());
    }
}
