package dev.tether.preprocessing;

import opennlp.tools.tokenize.TokenizerME;
import opennlp.tools.tokenize.TokenizerModel;
import opennlp.tools.tokenize.WhitespaceTokenizer;
import opennlp.tools.util.Span;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;

/**
 * Splits text into tokens exactly as OpenNLP's {@link TokenizerME#tokenizePos} does, at less cost. {@link TokenizerME}
 * first cuts the text at white space and then decides where to split each white-space token on its own: the model is
 * asked at each position inside the token with a context made from that token alone, and the abbreviation check
 * reads the token alone (so recalled from OpenNLP's source, and checked, not assumed: see below). The split of a
 * white-space token is therefore a function of that token, and this class asks {@link TokenizerME} once per distinct
 * token and reuses the answer; in running text most tokens ("the", "and", "pump") have been seen before.
 *
 * <p>{@code MemoizedTokenizerEwtTest} (test-corpora) checks span for span against {@link TokenizerME} over the
 * {@code # text} of UD English EWT sentences; {@code MemoizedTokenizerTest} (annotators) covers the edges (tabs,
 * line breaks, characters outside the Basic Multilingual Plane, a full cache). Not thread-safe, as {@link TokenizerME}
 * is not: one per engine instance; the {@link TokenizerModel} itself is shared. Memory is bounded: the cache is
 * emptied when it holds {@value #CAPACITY} tokens, which changes the cost, never the result.
 */
public final class MemoizedTokenizer {
    /** Distinct white-space tokens remembered before the cache starts over. */
    static final int CAPACITY = 50_000;

    private final TokenizerME tokenizer;
    /** White-space token → the start and end of each of its parts, relative to the token's start. */
    private final HashMap<String, int[]> splits = new HashMap<>();

    public MemoizedTokenizer(TokenizerModel model) {
        this.tokenizer = new TokenizerME(model);
    }

    /** The tokens of {@code text} as character spans, as {@link TokenizerME#tokenizePos} gives them. */
    public Span[] tokenizePos(String text) {
        Span[] words = WhitespaceTokenizer.INSTANCE.tokenizePos(text);
        List<Span> tokens = new ArrayList<>(words.length + words.length / 4);
        for (Span word : words) {
            String token = text.substring(word.getStart(), word.getEnd());
            int[] parts = splits.get(token);
            if (parts == null) {
                parts = split(token);
                if (splits.size() >= CAPACITY) splits.clear();
                splits.put(token, parts);
            }
            for (int i = 0; i < parts.length; i += 2) tokens.add(new Span(word.getStart() + parts[i], word.getStart() + parts[i + 1]));
        }
        return tokens.toArray(new Span[0]);
    }

    /** Distinct tokens remembered now (for tests). */
    int remembered() {
        return splits.size();
    }

    private int[] split(String token) {
        Span[] parts = tokenizer.tokenizePos(token);
        int[] bounds = new int[2 * parts.length];
        for (int i = 0; i < parts.length; i++) {
            bounds[2 * i] = parts[i].getStart();
            bounds[2 * i + 1] = parts[i].getEnd();
        }
        return bounds;
    }
}
