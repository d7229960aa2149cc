package dev.tether.model;

import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;
import dev.tether.counts.RawAttachmentCounts;
import dev.tether.counts.RawAttachmentCountsBuilder;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The model file's {@code domain-report} section: written for a model trained with raw counts, read back equal,
 * byte-identical for the same inputs, and optional: a model without it (the shipped default, trained without raw
 * text) or with another version of it loads, without a report. Invented ferry words.
 */
class DomainReportSectionTest {
    @TempDir
    Path dir;

    /** A base of two quadruples and raw text whose nouns and verbs are: gasket x2, valve, hull (noun), paint (verb). */
    private static TetherModel merged() {
        ModelTrainer b = new ModelTrainer().trainRanker(false);
        b.addQuadruple(new LabelledQuadruple(new Quadruple("replaced", "gasket", "with", "spare"), AttachmentSite.VERB, "t"));
        b.addQuadruple(new LabelledQuadruple(new Quadruple("fitted", "valve", "on", "pump"), AttachmentSite.NOUN, "t"));
        TetherModel base = b.build();
        RawAttachmentCountsBuilder raw = new RawAttachmentCountsBuilder();
        for (String[] token : new String[][] {{"gaskets", "NNS"}, {"the", "DT"}, {"gasket", "NN"}, {"valve", "NN"},
                {"hull", "NN"}, {"painted", "VBD"}, {"with", "IN"}}) {
            raw.addToken(token[0], token[1]);
        }
        raw.addDocument(1, 7);
        RawAttachmentCounts counts = raw.build();
        return new ModelTrainer().trainRanker(false).addModel(base, "base.tether").addRawCounts(counts, "logs", 1.0, 0).build();
    }

    @Test
    void reportIsStoredReadBackAndDeterministic() throws Exception {
        TetherModel m = merged();
        DomainReport r = m.domainReport().orElseThrow();
        assertEquals("base.tether", r.base());
        DomainReport.Overlap o = r.overlap();
        // Base vocabulary: replac(e), gasket, spare, fit, valve, pump = 6. Raw forms: gasket (2), valve, hull, paint:
        // 4 forms, 5 tokens; in the base: gasket and valve, 2 forms and 3 tokens.
        assertEquals(6, o.baseVocabulary());
        assertEquals(4, o.rawWords());
        assertEquals(2, o.rawWordsInBase());
        assertEquals(5, o.rawTokens());
        assertEquals(3, o.rawTokensCovered());
        assertEquals(List.of(new DomainReport.NewWord("hull", 1), new DomainReport.NewWord("paint", 1)), o.newWords());
        assertEquals(2, r.prepositionsCompared());
        assertTrue(r.shifts().isEmpty(), "raw text without prepositions moves no preposition");

        Path file = dir.resolve("m.tether");
        ModelFile.write(m, file);
        assertEquals(r, ModelFile.read(file).domainReport().orElseThrow());
        Path again = dir.resolve("again.tether");
        ModelFile.write(merged(), again);
        assertArrayEquals(Files.readAllBytes(file), Files.readAllBytes(again));
    }

    @Test
    void modelsWithoutTheSectionOrWithAnotherVersionOfItLoadWithoutAReport() throws Exception {
        assertTrue(TetherModel.bundled().domainReport().isEmpty(), "the shipped model was trained without raw text");

        TetherModel m = merged();
        Map<String, byte[]> sections = ModelFile.sections(m.normalizerVersion(), m.sources(), m.quadruples(), m.headChoice(),
                null, null, null);
        ByteArrayOutputStream other = new ByteArrayOutputStream();
        try (DataOutputStream out = new DataOutputStream(other)) {
            out.writeInt(DomainReport.VERSION + 1);
            out.writeUTF("a layout this build does not know");
        }
        sections.put("domain-report", other.toByteArray());
        TetherModel loaded = ModelFile.decode(ModelFile.pack(sections), "newer.tether");
        assertTrue(loaded.domainReport().isEmpty());
        assertEquals(m.quadruples().total(), loaded.quadruples().total());
    }
}
