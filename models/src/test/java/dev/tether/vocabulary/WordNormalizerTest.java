package dev.tether.vocabulary;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.util.List;
import java.util.Set;
import java.util.TreeSet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

/**
 * The normalization of head words. Collins &amp; Brooks (1995) describe mapping numbers to one class and words to
 * lower case before counting; the plural and verb rules are the project's own (documented in
 * {@link WordNormalizer}), so most checks here are of the documented rules and of the property that matters for
 * counting: inflections of one verb share a key.
 */
class WordNormalizerTest {
    private final WordNormalizer normalizer = new WordNormalizer();

    @ParameterizedTest
    @CsvSource({"1998", "1600", "2026", "1750", "2099"})
    void fourDigitYearsBecomeTheYearClass(String year) {
        assertEquals(WordNormalizer.YEAR, normalizer.noun(year));
        assertEquals(WordNormalizer.YEAR, normalizer.verb(year));
        assertEquals(WordNormalizer.YEAR, normalizer.other(year));
    }

    @ParameterizedTest
    @CsvSource(delimiter = ';', value = {"1599", "2100", "12", "19980", "'2,400'", "1.5", "75%", "1/2", "3-4", "0"})
    void otherNumbersBecomeTheNumberClass(String number) {
        assertEquals(WordNormalizer.NUMBER, normalizer.noun(number));
        assertEquals(WordNormalizer.NUMBER, normalizer.other(number));
    }

    @ParameterizedTest
    @CsvSource({"a320, a320", "'-', '-'", "'%', '%'", "mv-12, mv-12"})
    void tokensWithLettersOrWithoutDigitsAreNotNumbers(String word, String key) {
        assertEquals(key, normalizer.noun(word));
    }

    @ParameterizedTest
    @CsvSource({
            "Gaskets, gasket", "hulls, hull", "valves, valve", "batteries, battery", "glasses, glass",
            "boxes, box", "winches, winch", "flashes, flash", "bus, bus", "axis, axis", "class, class",
            "gas, gas", "men, man", "knives, knife", "HULL, hull", "crisis, crisis"})
    void pluralNounsLoseTheirEnding(String word, String key) {
        assertEquals(key, normalizer.noun(word));
    }

    @Test
    void prepositionsAreOnlyLowerCased() {
        assertEquals("with", normalizer.preposition("With"));
        assertEquals("towards", normalizer.preposition("towards"));
    }

    @ParameterizedTest
    @CsvSource({
            "replaced, replac", "Inspected, inspect", "fitted, fit", "carried, carry", "wore, wear", "took, tak",
            "painted, paint", "sank, sink", "1998, <year>"})
    void verbsAreReducedToAStem(String word, String key) {
        assertEquals(key, normalizer.verb(word));
    }

    /** The property counting relies on: every inflection of one verb is counted under one key. */
    @Test
    void inflectionsOfOneVerbShareAKey() {
        List<List<String>> paradigms = List.of(
                List.of("replace", "replaces", "replaced", "replacing"),
                List.of("inspect", "inspects", "inspected", "inspecting"),
                List.of("fit", "fits", "fitted", "fitting"),
                List.of("stop", "stops", "stopped", "stopping"),
                List.of("carry", "carries", "carried", "carrying"),
                List.of("fix", "fixes", "fixed", "fixing"),
                List.of("pass", "passes", "passed", "passing"),
                List.of("repair", "repairs", "repaired", "repairing"),
                List.of("drain", "drains", "drained", "draining"),
                List.of("tighten", "tightens", "tightened", "tightening"),
                List.of("grease", "greases", "greased", "greasing"),
                List.of("weld", "welds", "welded", "welding"),
                List.of("need", "needs", "needed", "needing"),
                List.of("make", "makes", "made", "making"),
                List.of("take", "takes", "took", "taken", "taking"),
                List.of("wear", "wears", "wore", "worn", "wearing"),
                List.of("sink", "sinks", "sank", "sunk", "sinking"),
                List.of("be", "is", "are", "was", "were", "been", "being"),
                List.of("have", "has", "had", "having"),
                List.of("Replaced", "REPLACING"));
        Set<String> keys = new TreeSet<>();
        for (List<String> forms : paradigms) {
            String key = normalizer.verb(forms.get(0));
            for (String form : forms) {
                assertEquals(key, normalizer.verb(form), () -> form + " should share the key of " + forms.get(0));
            }
            keys.add(key);
        }
        // The last paradigm repeats the first in other cases; every other verb keeps a key of its own.
        assertEquals(paradigms.size() - 1, keys.size(), "distinct verbs must not collapse onto one key: " + keys);
    }

    @Test
    void differentVerbsKeepDifferentKeys() {
        assertNotEquals(normalizer.verb("inspected"), normalizer.verb("inserted"));
        assertNotEquals(normalizer.verb("sealed"), normalizer.verb("sailed"));
    }
}
