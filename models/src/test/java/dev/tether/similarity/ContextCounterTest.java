package dev.tether.similarity;

import dev.tether.candidates.HeadClass;
import org.junit.jupiter.api.Test;

import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ContextCounterTest {
    private static final String[] WORDS = "The deckhand replaced the worn gaskets on the bilge pump , then logged it .".split(" ");
    private static final String[] TAGS = "DT NN VBD DT JJ NNS IN DT NN NN , RB VBD PRP .".split(" ");

    @Test
    void windowHoldsFiveWordsEitherSideWithoutPunctuation() {
        ContextCounter counter = new ContextCounter();
        counter.addSentence(WORDS, TAGS);
        Map<String, Integer> deckhand = counter.contextsOf(HeadClass.NOUN, "deckhand");
        // Positions 0 and 2..6 of the sentence: the, replaced, the, worn, gaskets, on.
        assertEquals(Map.of("window:the", 2, "window:replac", 1, "window:worn", 1, "window:gasket", 1, "window:on", 1),
                deckhand);
        // "logged" is the 12th word, with the comma skipped its window reaches back to "the" before "bilge".
        Map<String, Integer> logged = counter.contextsOf(HeadClass.VERB, "log");
        assertEquals(Map.of("window:on", 1, "window:the", 1, "window:bilge", 1, "window:pump", 1, "window:then", 1,
                "window:it", 1), logged);
    }

    @Test
    void grammaticalContextsComeFromBothEnds() {
        ContextCounter counter = new ContextCounter();
        counter.addSentence(WORDS, TAGS);
        Map<String, Integer> gasket = counter.contextsOf(HeadClass.NOUN, "gasket");
        assertEquals(1, gasket.get("object-of:replac"), gasket.toString());   // verb-object
        assertEquals(1, gasket.get("modifier:worn"), gasket.toString());      // modifier-noun
        assertEquals(1, gasket.get("on:pump"), gasket.toString());            // noun-preposition-noun
        assertEquals(1, counter.contextsOf(HeadClass.VERB, "replac").get("object:gasket"));
        assertEquals(1, counter.contextsOf(HeadClass.ADJECTIVE, "worn").get("modifies:gasket"));
        Map<String, Integer> pump = counter.contextsOf(HeadClass.NOUN, "pump");
        assertEquals(1, pump.get("modifier:bilge"), pump.toString());         // a noun modifier in a compound
        assertEquals(1, pump.get("gasket:on"), pump.toString());              // the object's side of the relation
        assertEquals(1, counter.contextsOf(HeadClass.NOUN, "bilge").get("modifies:pump"));
    }

    @Test
    void formsOfBeTakeNoObjectAndClassesAreKeptApart() {
        ContextCounter counter = new ContextCounter();
        counter.addSentence("The ferry is a catamaran".split(" "), "DT NN VBZ DT NN".split(" "));
        counter.addSentence("They ferry the cars".split(" "), "PRP VBP DT NNS".split(" "));
        assertTrue(counter.contextsOf(HeadClass.VERB, "be").keySet().stream().noneMatch(k -> k.startsWith("object")));
        assertEquals(1, counter.contextsOf(HeadClass.VERB, "ferry").get("object:car"));
        assertTrue(counter.contextsOf(HeadClass.NOUN, "ferry").containsKey("window:catamaran"));
        assertTrue(!counter.contextsOf(HeadClass.NOUN, "ferry").containsKey("object:car"));
        assertEquals(9, counter.tokenCount());
        assertEquals(2, counter.sentenceCount());
    }
}
