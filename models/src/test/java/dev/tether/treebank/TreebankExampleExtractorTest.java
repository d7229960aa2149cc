package dev.tether.treebank;

import dev.tether.attachment.AttachmentExample;
import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;
import dev.tether.candidates.HeadCandidateProposer;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.*;

class TreebankExampleExtractorTest {

    @Test
    void turnsGoldAttachmentsIntoExamplesOverTheProposedCandidates() throws Exception {
        Path file = ConlluReaderTest.fixture("maintenance.conllu");
        TreebankExamples ex = new TreebankExampleExtractor(new HeadCandidateProposer()).extract(file);
        assertEquals(3, ex.goldAttachments());
        assertEquals(0, ex.missedPrepositions());
        assertEquals(3, ex.examples().size());

        AttachmentExample on = ex.examples().get(0);
        assertEquals("on", on.query().preposition());
        assertEquals("pump", on.query().object());
        assertEquals("seal", on.query().head(on.gold()), "gold head of 'on' is 'seal'");
        assertEquals(0, on.gold(), "seal is the nearest candidate");
        assertEquals(file + ":9", on.source());

        AttachmentExample with = ex.examples().get(1);
        assertEquals("replaced", with.query().head(with.gold()));
        assertEquals(file + ":12", with.source());

        AttachmentExample in = ex.examples().get(2);
        assertEquals("In", in.query().preposition());
        assertEquals("check", in.query().head(in.gold()), "the fronted phrase's following head");
        assertTrue(in.query().distance(in.gold()) < 0, "a following head has a negative distance");

        assertEquals(1.0, ex.candidateRecall());
        assertEquals(1, ex.quadruples().size());
        LabelledQuadruple q = ex.quadruples().get(0);
        assertEquals(new Quadruple("replaced", "seal", "on", "pump"), q.quadruple());
        assertEquals(AttachmentSite.NOUN, q.site());
    }
}
