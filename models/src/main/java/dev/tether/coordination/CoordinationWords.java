package dev.tether.coordination;

import dev.tether.candidates.HeadClass;
import dev.tether.vocabulary.WordNormalizer;

/**
 * How coordination counts and features key a word: by its Penn tag's class, nouns by {@link WordNormalizer#noun},
 * verbs by {@link WordNormalizer#verb}, everything else by {@link WordNormalizer#other} (the keys the thesaurus uses
 * too). Thread-safe.
 */
public final class CoordinationWords {
    private final WordNormalizer normalizer;

    public CoordinationWords(WordNormalizer normalizer) {
        this.normalizer = normalizer;
    }

    public String key(String word, String pennTag) {
        HeadClass c = ConjunctCandidateProposer.classOfTag(pennTag);
        if (c == HeadClass.NOUN) return normalizer.noun(word);
        if (c == HeadClass.VERB) return normalizer.verb(word);
        return normalizer.other(word);
    }

    public String preposition(String word) {
        return normalizer.preposition(word);
    }
}
