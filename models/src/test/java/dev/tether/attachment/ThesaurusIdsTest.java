package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.similarity.FerryLogCorpus;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.Vocabulary;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Finding a thesaurus word by its count id gives what finding it by its key gives (invented ferry-log words). */
class ThesaurusIdsTest {
    @Test
    void aCountedWordIsFoundByItsIdAsByItsKey() {
        Thesaurus thesaurus = FerryLogCorpus.thesaurus(300, 5);
        Vocabulary words = Vocabulary.frozenOf(List.of("gasket", "pump", "lifeboat", "replac"));
        ThesaurusIds ids = new ThesaurusIds(words, thesaurus);
        int gasket = thesaurus.id(HeadClass.NOUN, "gasket");
        assertTrue(gasket >= 0);
        assertEquals(words.id("gasket"), ids.countId(gasket));
        for (HeadClass c : HeadClass.values()) {
            for (int w = 1; w <= words.size(); w++) {
                assertEquals(thesaurus.id(c, words.word(w)), ids.entry(c, w, words.word(w)), c + " " + words.word(w));
            }
        }
        assertEquals(Thesaurus.UNKNOWN, ids.entry(HeadClass.NOUN, words.id("lifeboat"), "lifeboat"), "counted, not in the thesaurus");
        int valve = thesaurus.id(HeadClass.NOUN, "valve");
        assertTrue(valve >= 0);
        assertEquals(0, ids.countId(valve), "in the thesaurus, never counted");
        assertEquals(valve, ids.entry(HeadClass.NOUN, 0, "valve"), "an uncounted word is found by its key");
    }
}
