package dev.tether.coordination;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The clause roles the coordination features read off a tagged sentence: predicates, copulas, auxiliaries, a noun's
 * preposition. Invented ferry-log sentences, tagged by hand with Penn Treebank tags (Marcus et al. 1993). Which head
 * a copular clause has follows the Universal Dependencies guidelines (https://universaldependencies.org/u/dep/cop.html):
 * the predicate, not the copula, heads the clause, which is why the copula gets a role of its own.
 */
class ClauseRoleFeaturesTest {

    private static byte[] kinds(TaggedWords s) {
        byte[] k = new byte[s.tags.length];
        for (int i = 0; i < k.length; i++) k[i] = ConjunctCandidateProposer.kind(s.tags[i]);
        return k;
    }

    @Test
    void aPredicateNounAfterACopulaAndTheCopulaItselfHaveTheirOwnRoles() {
        TaggedWords s = TaggedWords.of("The/DT deckhands/NNS were/VBD all/RB new/JJ recruits/NNS and/CC the/DT bosun/NN trained/VBD them/PRP ./.");
        byte[] k = kinds(s);
        assertEquals(2, CoordinationFeatureExtractor.leftPredicate(s.words, k, s.index("recruits")));
        assertEquals(3, CoordinationFeatureExtractor.leftPredicate(s.words, k, s.index("were")));
        assertEquals(0, CoordinationFeatureExtractor.leftPredicate(s.words, k, s.index("deckhands")));
        int c = s.index("and");
        assertEquals(1, CoordinationFeatureExtractor.rightPredicate(s.words, k, c, s.index("trained")));
        assertEquals(0, CoordinationFeatureExtractor.rightPredicate(s.words, k, c, s.index("bosun")));
    }

    @Test
    void theUnpunctuatedFormsOfInformalLogsAreCopulasToo() {
        TaggedWords s = TaggedWords.of("it/PRP s/VBZ a/DT loose/JJ belt/NN and/CC i/PRP m/VBP sure/JJ of/IN it/PRP");
        byte[] k = kinds(s);
        assertTrue(CoordinationFeatureExtractor.isCopula(s.words, k, s.index("s")));
        assertTrue(CoordinationFeatureExtractor.isCopula(s.words, k, s.index("m")));
        assertEquals(2, CoordinationFeatureExtractor.rightPredicate(s.words, k, s.index("and"), s.index("sure")));
    }

    @Test
    void anExistentialBeOrAnAuxiliaryBeIsNoCopula() {
        TaggedWords s = TaggedWords.of("there/EX was/VBD a/DT leak/NN and/CC the/DT pump/NN was/VBD replaced/VBN ./.");
        byte[] k = kinds(s);
        assertFalse(CoordinationFeatureExtractor.isCopula(s.words, k, 1));
        assertFalse(CoordinationFeatureExtractor.isCopula(s.words, k, 7));
    }

    @Test
    void anAuxiliaryBeforeItsVerbIsMarkedAndTheVerbIsNot() {
        TaggedWords s = TaggedWords.of("The/DT engineer/NN does/VBZ not/RB change/VB the/DT filters/NNS and/CC logs/VBZ the/DT hours/NNS");
        byte[] k = kinds(s);
        int c = s.index("and");
        assertTrue(CoordinationFeatureExtractor.auxiliaryBeforeVerb(s.words, k, s.index("does"), c));
        assertFalse(CoordinationFeatureExtractor.auxiliaryBeforeVerb(s.words, k, s.index("change"), c));
    }

    @Test
    void theNounOfAnOfPhraseIsToldFromTheNounItModifies() {
        TaggedWords s = TaggedWords.of("a/DT crate/NN of/IN spare/JJ gaskets/NNS and/CC a/DT drum/NN for/IN the/DT oil/NN");
        byte[] k = kinds(s);
        assertEquals(1, CoordinationFeatureExtractor.prepositionBefore(s.words, k, s.index("gaskets")));
        assertEquals(0, CoordinationFeatureExtractor.prepositionBefore(s.words, k, s.index("crate")));
        assertEquals(2, CoordinationFeatureExtractor.prepositionBefore(s.words, k, s.index("oil")));
    }
}
