package dev.tether.treebank;

import dev.tether.candidates.HeadClass;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class GoldAttachmentExtractorTest {

    @Test
    void findsNominalAndVerbalAttachments() throws Exception {
        List<TreebankSentence> s = ConlluReader.readAll(ConlluReaderTest.fixture("maintenance.conllu"));
        List<GoldAttachment> first = new GoldAttachmentExtractor().extract(s.get(0));
        assertEquals(List.of(new GoldAttachment(5, 7, 4, HeadClass.NOUN), new GoldAttachment(8, 10, 2, HeadClass.VERB)),
                first, "'on the pump' modifies 'seal'; 'with a spare' modifies 'replaced'");
    }

    @Test
    void skipsStrandedPrepositionsAndKeepsFrontedOnes() throws Exception {
        List<TreebankSentence> s = ConlluReader.readAll(ConlluReaderTest.fixture("maintenance.conllu"));
        List<GoldAttachment> second = new GoldAttachmentExtractor().extract(s.get(1));
        assertEquals(List.of(new GoldAttachment(0, 1, 7, HeadClass.VERB)), second,
                "'In port' attaches to the following 'check'; the stranded 'for' introduces nothing after it");
    }

    @Test
    void prepositionalRelationsAreOblAndNmodWithSubtypesButNotPossessives() {
        assertTrue(GoldAttachmentExtractor.isPrepositionalRelation("obl"));
        assertTrue(GoldAttachmentExtractor.isPrepositionalRelation("obl:tmod"));
        assertTrue(GoldAttachmentExtractor.isPrepositionalRelation("nmod"));
        assertTrue(GoldAttachmentExtractor.isPrepositionalRelation("nmod:npmod"));
        assertFalse(GoldAttachmentExtractor.isPrepositionalRelation("nmod:poss"));
        assertFalse(GoldAttachmentExtractor.isPrepositionalRelation("obj"));
        assertFalse(GoldAttachmentExtractor.isPrepositionalRelation("oblique"));
    }

    @Test
    void headClassesFollowUniversalTags() {
        assertEquals(HeadClass.VERB, GoldAttachmentExtractor.headClass("AUX"));
        assertEquals(HeadClass.NOUN, GoldAttachmentExtractor.headClass("PRON"));
        assertEquals(HeadClass.NOUN, GoldAttachmentExtractor.headClass("NUM"));
        assertEquals(HeadClass.ADJECTIVE, GoldAttachmentExtractor.headClass("ADJ"));
        assertEquals(HeadClass.ADVERB, GoldAttachmentExtractor.headClass("ADV"));
        assertNull(GoldAttachmentExtractor.headClass("DET"));
    }
}
