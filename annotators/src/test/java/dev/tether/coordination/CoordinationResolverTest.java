package dev.tether.coordination;

import dev.tether.attachment.TaggedLogLine;
import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;
import dev.tether.model.ModelFile;
import dev.tether.model.ModelTrainer;
import dev.tether.type.Conjunct;
import dev.tether.type.CoordinationDecision;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
import org.apache.uima.fit.util.JCasUtil;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The coordination resolver on hand-tagged lines of the invented ferry operator's logs, with the shipped model. */
class CoordinationResolverTest {

    private static List<CoordinationDecision> decide(TaggedLogLine line, Object... parameters) throws Exception {
        AnalysisEngine engine = AnalysisEngineFactory.createEngine(CoordinationResolver.class, parameters);
        engine.process(line.jcas);
        engine.destroy();
        return List.copyOf(JCasUtil.select(line.jcas, CoordinationDecision.class));
    }

    @Test
    void nounsAfterAVerbAreCoordinatedWithEachOther() throws Exception {
        TaggedLogLine line = TaggedLogLine.of("Inspectors/NNS checked/VBD the/DT worn/JJ bearings/NNS and/CC seals/NNS on/IN the/DT pump/NN ./.");
        List<CoordinationDecision> decisions = decide(line);
        assertEquals(1, decisions.size());
        CoordinationDecision d = decisions.get(0);
        CoordinationChecks.assertSane(d);
        Conjunct first = (Conjunct) d.getConjuncts().get(0);
        Conjunct last = (Conjunct) d.getConjuncts().get(d.getConjuncts().size() - 1);
        assertEquals("bearings", first.getHead().getCoveredText(), d.getEvidence());
        assertEquals("seals", last.getHead().getCoveredText());
        assertEquals("noun", first.getWordClass());
        assertTrue(d.getSharedModifiers().size() + d.getUnsharedModifiers().size() >= 2,
                "'worn' and 'pump' are decided: " + d.getEvidence());
    }

    @Test
    void twoClausesAreCoordinatedByTheirVerbs() throws Exception {
        TaggedLogLine line = TaggedLogLine.of("The/DT crew/NN inspected/VBD the/DT hull/NN and/CC replaced/VBD the/DT anodes/NNS ./.");
        CoordinationDecision d = decide(line).get(0);
        CoordinationChecks.assertSane(d);
        assertEquals("inspected", ((Conjunct) d.getConjuncts().get(0)).getHead().getCoveredText(), d.getEvidence());
        assertEquals("replaced", ((Conjunct) d.getConjuncts().get(1)).getHead().getCoveredText());
    }

    @Test
    void aModelWithoutACoordinationRankerLoadsAndDecidesNothing(@TempDir Path dir) throws Exception {
        ModelTrainer trainer = new ModelTrainer();
        trainer.addQuadruple(new LabelledQuadruple(new Quadruple("replaced", "gasket", "with", "spare"), AttachmentSite.VERB, "test"));
        Path model = dir.resolve("old.tether");
        ModelFile.write(trainer.build(), model);
        TaggedLogLine line = TaggedLogLine.of("The/DT crew/NN inspected/VBD the/DT hull/NN and/CC replaced/VBD the/DT anodes/NNS ./.");
        assertEquals(0, decide(line, CoordinationResolver.PARAM_MODEL, model.toString()).size());
    }

    @Test
    void aVeryLongRunOnLineIsDecidedInBoundedWindows() throws Exception {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < 10_000; i++) b.append(i == 0 ? "" : " ").append("valve/NN and/CC gasket/NN ,/, bolts/NNS");
        TaggedLogLine line = TaggedLogLine.of(b.toString());
        List<CoordinationDecision> decisions = decide(line);
        assertEquals(10_000, decisions.size(), "every coordinator decided");
        for (CoordinationDecision d : decisions.subList(0, 50)) CoordinationChecks.assertSane(d);
        long capped = decisions.stream().filter(d -> d.getEvidence().contains("caps:")).count();
        assertTrue(capped > 0, "the caps are said in the evidence");
    }
}
