package dev.tether.engines;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URL;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.apache.uima.UIMAFramework;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineDescription;
import org.apache.uima.cas.CAS;
import org.apache.uima.cas.Type;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
import org.apache.uima.jcas.JCas;
import org.apache.uima.resource.ExternalResourceDependency;
import org.apache.uima.resource.ResourceSpecifier;
import org.apache.uima.resource.metadata.ConfigurationParameter;
import org.apache.uima.resource.metadata.ExternalResourceBinding;
import org.apache.uima.resource.metadata.Import;
import org.apache.uima.resource.metadata.ResourceManagerConfiguration;
import org.apache.uima.util.XMLInputSource;
import org.junit.jupiter.api.Test;

import dev.tether.attachment.AttachmentResolver;
import dev.tether.coordination.CoordinationChecks;
import dev.tether.coordination.CoordinationResolver;
import dev.tether.type.CoordinationDecision;
import dev.tether.attachment.DecisionChecks;
import dev.tether.candidates.AttachmentCandidateFinder;
import dev.tether.counts.RawAttachmentCounts;
import dev.tether.counts.UnlabelledAttachmentCounter;
import dev.tether.model.LoadedModels;
import dev.tether.model.ModelHolder;
import dev.tether.model.SharedModelResource;
import dev.tether.preprocessing.TextPreprocessor;
import dev.tether.type.AttachmentDecision;
import dev.tether.type.ScoredHead;

/**
 * Every engine descriptor in {@code dev/tether/engines/} is found by name on the classpath, instantiated with plain
 * UIMA (no uimaFIT factory) and run on a CAS; and its parameters agree with the engine class it names. Example text is
 * invented, from the maintenance logs of a fictional ferry operator.
 */
class EngineDescriptorTest {

    static final String PREPROCESSOR = "dev.tether.engines.TextPreprocessor";
    static final String FINDER = "dev.tether.engines.AttachmentCandidateFinder";
    static final String RESOLVER = "dev.tether.engines.AttachmentResolver";
    static final String COORDINATION = "dev.tether.engines.CoordinationResolver";
    static final String RAW_TEXT_PIPELINE = "dev.tether.engines.RawTextPipeline";
    static final String TAGGED_TEXT_PIPELINE = "dev.tether.engines.TaggedTextPipeline";
    static final String COUNTER = "dev.tether.engines.UnlabelledAttachmentCounter";

    /** Three prepositional phrases: 'on the port engine', 'with a spare', 'from the stores'. */
    /** One coordination: 'bearings and seals', with a premodifier before and a phrase after. */
    static final String BEARINGS_ENTRY = "Inspectors checked the worn bearings and seals on the pump.";

    static final String GASKET_ENTRY = "The engineer replaced the gasket on the port engine with a spare from the stores.";

    static AnalysisEngineDescription byName(String name) throws Exception {
        Import location = UIMAFramework.getResourceSpecifierFactory().createImport();
        location.setName(name);
        URL url = location.findAbsoluteUrl(UIMAFramework.newDefaultResourceManager());
        assertNotNull(url, "descriptor " + name + " on the classpath");
        return UIMAFramework.getXMLParser().parseAnalysisEngineDescription(new XMLInputSource(url));
    }

    @Test
    void preprocessorDescriptorRunsWithPlainUima() throws Exception {
        AnalysisEngine preprocessor = UIMAFramework.produceAnalysisEngine(byName(PREPROCESSOR));
        CAS cas = preprocessor.newCAS();
        cas.setDocumentText("The mate logged a leak in the forward ballast tank.");

        preprocessor.process(cas);

        Type token = cas.getTypeSystem().getType("dev.tether.type.Token");
        assertEquals(11, cas.getAnnotationIndex(token).size());
        assertEquals(1, cas.getAnnotationIndex(cas.getTypeSystem().getType("dev.tether.type.Sentence")).size());
        // Chunks only when asked (parameter chunk, off by default).
        assertTrue(cas.getAnnotationIndex(cas.getTypeSystem().getType("dev.tether.type.Chunk")).isEmpty());
    }

    @Test
    void finderDescriptorRunsWithPlainUimaAfterThePreprocessor() throws Exception {
        AnalysisEngine preprocessor = UIMAFramework.produceAnalysisEngine(byName(PREPROCESSOR));
        AnalysisEngine finder = UIMAFramework.produceAnalysisEngine(byName(FINDER));
        CAS cas = finder.newCAS();
        cas.setDocumentText("The mate logged a leak in the forward ballast tank.");

        preprocessor.process(cas);
        finder.process(cas);

        Type ambiguity = cas.getTypeSystem().getType("dev.tether.type.AttachmentAmbiguity");
        assertEquals(1, cas.getAnnotationIndex(ambiguity).size(), "one preposition: 'in'");
        assertEquals("in the forward ballast tank", cas.getAnnotationIndex(ambiguity).iterator().next().getCoveredText());
    }

    /** The primitive resolver descriptor alone, its optional model resource left unbound: the parameter's model. */
    @Test
    void resolverDescriptorRunsWithPlainUimaWithoutItsSharedResource() throws Exception {
        AnalysisEngine preprocessor = UIMAFramework.produceAnalysisEngine(byName(PREPROCESSOR));
        AnalysisEngine finder = UIMAFramework.produceAnalysisEngine(byName(FINDER));
        AnalysisEngine resolver = UIMAFramework.produceAnalysisEngine(byName(RESOLVER));
        CAS cas = resolver.newCAS();
        cas.setDocumentText(GASKET_ENTRY);

        preprocessor.process(cas);
        finder.process(cas);
        resolver.process(cas);

        List<AttachmentDecision> decisions = assertSaneDecisions(cas, 3);
        for (AttachmentDecision d : decisions) {
            assertEquals(LoadedModels.get(LoadedModels.DEFAULT).id(), d.getModelId(), "the default of parameter model");
        }
    }

    @Test
    void rawTextPipelineRunsWithPlainUima() throws Exception {
        AnalysisEngine pipeline = UIMAFramework.produceAnalysisEngine(byName(RAW_TEXT_PIPELINE));
        CAS cas = pipeline.newCAS();
        cas.setDocumentText(GASKET_ENTRY + " The mate logged a leak in the forward ballast tank.");

        pipeline.process(cas);

        List<AttachmentDecision> decisions = assertSaneDecisions(cas, 4);
        for (AttachmentDecision d : decisions) {
            assertTrue(d.getRanking().size() <= 5, "the resolver's default ranking size when the aggregate leaves it unset");
            assertEquals(LoadedModels.get(LoadedModels.DEFAULT).id(), d.getModelId(), "the shipped model from the resource");
        }
        CAS second = pipeline.newCAS();
        second.setDocumentText(BEARINGS_ENTRY);
        pipeline.process(second);
        List<CoordinationDecision> coordinations = second.getJCas().select(CoordinationDecision.class).asList();
        assertEquals(1, coordinations.size());
        CoordinationChecks.assertSane(coordinations.get(0));
        assertEquals(LoadedModels.get(LoadedModels.DEFAULT).id(), coordinations.get(0).getModelId());
    }

    /** Tokens and tags already in the CAS (here from the preprocessor descriptor); the aggregate adds decisions only. */
    @Test
    void taggedTextPipelineRunsWithPlainUimaOnTokensAlreadyThere() throws Exception {
        AnalysisEngine preprocessor = UIMAFramework.produceAnalysisEngine(byName(PREPROCESSOR));
        AnalysisEngine pipeline = UIMAFramework.produceAnalysisEngine(byName(TAGGED_TEXT_PIPELINE));
        CAS cas = pipeline.newCAS();
        cas.setDocumentText(GASKET_ENTRY);
        preprocessor.process(cas);
        int tokens = cas.getAnnotationIndex(cas.getTypeSystem().getType("dev.tether.type.Token")).size();

        pipeline.process(cas);

        assertSaneDecisions(cas, 3);
        assertEquals(tokens, cas.getAnnotationIndex(cas.getTypeSystem().getType("dev.tether.type.Token")).size(),
                "no tokens of its own");
    }

    /** An aggregate-level setting of rankingSize reaches the resolver (the override is wired). */
    @Test
    void aggregateRankingSizeReachesTheResolver() throws Exception {
        AnalysisEngineDescription description = byName(RAW_TEXT_PIPELINE);
        description.getAnalysisEngineMetaData().getConfigurationParameterSettings().setParameterValue("rankingSize", 1);
        AnalysisEngine pipeline = UIMAFramework.produceAnalysisEngine(description);
        CAS cas = pipeline.newCAS();
        cas.setDocumentText(GASKET_ENTRY);

        pipeline.process(cas);

        for (AttachmentDecision d : assertSaneDecisions(cas, 3)) {
            assertEquals(1, d.getRanking().size(), "rankingSize 1 set on the aggregate");
        }
    }

    /** Each aggregate declares the model resource once and binds it to the resolver's (and preprocessor's) dependency of the same interface. */
    @Test
    void aggregatesDeclareTheModelOnceAndBindItToTheResolver() throws Exception {
        for (String name : List.of(RAW_TEXT_PIPELINE, TAGGED_TEXT_PIPELINE)) {
            AnalysisEngineDescription aggregate = byName(name);
            ResourceManagerConfiguration resources = aggregate.getResourceManagerConfiguration();
            assertEquals(1, resources.getExternalResources().length, name + ": one model resource");
            assertEquals(SharedModelResource.class.getName(), resources.getExternalResources()[0].getImplementationName());
            ExternalResourceBinding[] bindings = resources.getExternalResourceBindings();
            // The raw-text flow binds the same model to its preprocessor too, which tags with the model's tagger.
            List<String> keys = name.equals(RAW_TEXT_PIPELINE)
                    ? List.of("preprocessor/" + TextPreprocessor.RES_MODEL, "resolver/" + AttachmentResolver.RES_MODEL,
                            "coordination/" + CoordinationResolver.RES_MODEL)
                    : List.of("resolver/" + AttachmentResolver.RES_MODEL, "coordination/" + CoordinationResolver.RES_MODEL);
            assertEquals(keys, java.util.Arrays.stream(bindings).map(ExternalResourceBinding::getKey).toList(), name);
            for (ExternalResourceBinding b : bindings) {
                assertEquals(resources.getExternalResources()[0].getName(), b.getResourceName(), name);
            }
            ResourceSpecifier resolver = aggregate.getDelegateAnalysisEngineSpecifiers().get("resolver");
            assertEquals(AttachmentResolver.class.getName(),
                    ((AnalysisEngineDescription) resolver).getAnnotatorImplementationName(), name);
            String[] flow = ((org.apache.uima.analysis_engine.metadata.FixedFlow) aggregate.getAnalysisEngineMetaData()
                    .getFlowConstraints()).getFixedFlow();
            assertEquals("resolver", flow[flow.length - 2], name + ": the attachment resolver runs before the coordination resolver");
            assertEquals("coordination", flow[flow.length - 1], name + ": the coordination resolver runs last");
            assertEquals(CoordinationResolver.class.getName(), ((AnalysisEngineDescription) aggregate
                    .getDelegateAnalysisEngineSpecifiers().get("coordination")).getAnnotatorImplementationName(), name);
            assertEquals(aggregate.getDelegateAnalysisEngineSpecifiers().size(), flow.length, name + ": every delegate runs");
        }
    }

    @Test
    void resolverDescriptorAgreesWithItsClass() throws Exception {
        AnalysisEngineDescription xml = byName(RESOLVER);
        assertAgrees(xml, AttachmentResolver.class);
        assertOptionalModelDependency(xml, AttachmentResolver.RES_MODEL);
    }

    /** The descriptor's only resource dependency is the optional shared model under {@code key}. */
    private static void assertOptionalModelDependency(AnalysisEngineDescription xml, String key) {
        ExternalResourceDependency[] dependencies = xml.getExternalResourceDependencies();
        assertEquals(1, dependencies.length);
        assertEquals(key, dependencies[0].getKey());
        assertEquals(ModelHolder.class.getName(), dependencies[0].getInterfaceName());
        assertTrue(dependencies[0].isOptional(), "the model resource is optional");
    }

    /** The coordination descriptor alone after the preprocessor, its model resource unbound: no attachment engine needed. */
    @Test
    void coordinationDescriptorRunsWithPlainUimaAlone() throws Exception {
        AnalysisEngine preprocessor = UIMAFramework.produceAnalysisEngine(byName(PREPROCESSOR));
        AnalysisEngine coordination = UIMAFramework.produceAnalysisEngine(byName(COORDINATION));
        CAS cas = coordination.newCAS();
        cas.setDocumentText(BEARINGS_ENTRY);
        preprocessor.process(cas);
        coordination.process(cas);
        List<CoordinationDecision> decisions = cas.getJCas().select(CoordinationDecision.class).asList();
        assertEquals(1, decisions.size(), "one coordinator in: " + BEARINGS_ENTRY);
        CoordinationChecks.assertSane(decisions.get(0));
        assertEquals("and", decisions.get(0).getCoordinator().getCoveredText());
        assertEquals(0, cas.getJCas().select(AttachmentDecision.class).asList().size(), "no attachment engine ran");
    }

    @Test
    void coordinationDescriptorAgreesWithItsClass() throws Exception {
        AnalysisEngineDescription xml = byName(COORDINATION);
        assertAgrees(xml, CoordinationResolver.class);
        assertOptionalModelDependency(xml, CoordinationResolver.RES_MODEL);
    }

    @Test
    void preprocessorDescriptorAgreesWithItsClass() throws Exception {
        AnalysisEngineDescription xml = byName(PREPROCESSOR);
        assertAgrees(xml, TextPreprocessor.class);
        assertOptionalModelDependency(xml, TextPreprocessor.RES_MODEL);
    }

    /** The counter after preprocessor and finder, with plain UIMA: its counts file holds the document's prepositions. */
    @Test
    void counterDescriptorRunsWithPlainUimaAndWritesItsCounts(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws Exception {
        AnalysisEngine preprocessor = UIMAFramework.produceAnalysisEngine(byName(PREPROCESSOR));
        AnalysisEngine finder = UIMAFramework.produceAnalysisEngine(byName(FINDER));
        AnalysisEngineDescription counterXml = byName(COUNTER);
        java.nio.file.Path file = dir.resolve("log.counts");
        counterXml.getAnalysisEngineMetaData().getConfigurationParameterSettings()
                .setParameterValue(UnlabelledAttachmentCounter.PARAM_COUNTS_FILE, file.toString());
        AnalysisEngine counter = UIMAFramework.produceAnalysisEngine(counterXml);
        CAS cas = counter.newCAS();
        cas.setDocumentText(GASKET_ENTRY);

        preprocessor.process(cas);
        finder.process(cas);
        counter.process(cas);
        counter.collectionProcessComplete();

        RawAttachmentCounts counts = RawAttachmentCounts.read(file);
        assertEquals(1, counts.tally().documents());
        assertEquals(3, counts.tally().prepositions(), "on, with, from");
    }

    @Test
    void counterDescriptorAgreesWithItsClass() throws Exception {
        assertAgrees(byName(COUNTER), UnlabelledAttachmentCounter.class);
    }

    @Test
    void finderDescriptorAgreesWithItsClass() throws Exception {
        assertAgrees(byName(FINDER), AttachmentCandidateFinder.class);
    }

    /** Every decision in {@code cas} passes {@link DecisionChecks#assertSane}; there are at least {@code minimum}. */
    private static List<AttachmentDecision> assertSaneDecisions(CAS cas, int minimum) throws Exception {
        JCas jcas = cas.getJCas();
        List<AttachmentDecision> decisions = new ArrayList<>(jcas.select(AttachmentDecision.class).asList());
        assertTrue(decisions.size() >= minimum, "at least " + minimum + " decisions in: " + cas.getDocumentText()
                + ", found " + decisions.size());
        for (AttachmentDecision d : decisions) {
            DecisionChecks.assertSane(d);
            for (ScoredHead s : d.getRanking()) {
                assertTrue(s.getHead().getEnd() <= d.getBegin() || s.getHead().getBegin() >= d.getEnd(),
                        "a candidate head lies outside its own phrase: " + d.getCoveredText());
            }
        }
        return decisions;
    }

    /** Same implementation, same parameters (name, type, mandatory, multi-valued) and same defaults. */
    private static void assertAgrees(AnalysisEngineDescription xml, Class<?> engine) throws Exception {
        AnalysisEngineDescription fromClass = AnalysisEngineFactory.createEngineDescription(
                engine.asSubclass(org.apache.uima.analysis_component.AnalysisComponent.class));
        assertEquals(engine.getName(), xml.getAnnotatorImplementationName());
        assertEquals(declarations(fromClass), declarations(xml), "parameters of " + engine.getSimpleName());
        for (ConfigurationParameter p : fromClass.getAnalysisEngineMetaData().getConfigurationParameterDeclarations()
                .getConfigurationParameters()) {
            assertEquals(fromClass.getAnalysisEngineMetaData().getConfigurationParameterSettings()
                            .getParameterValue(p.getName()),
                    xml.getAnalysisEngineMetaData().getConfigurationParameterSettings().getParameterValue(p.getName()),
                    "default of " + p.getName());
        }
        assertTrue(xml.getAnalysisEngineMetaData().getTypeSystem().getImports().length > 0, "type system imported");
    }

    private static Map<String, String> declarations(AnalysisEngineDescription description) {
        Map<String, String> result = new TreeMap<>();
        for (ConfigurationParameter p : description.getAnalysisEngineMetaData().getConfigurationParameterDeclarations()
                .getConfigurationParameters()) {
            result.put(p.getName(), p.getType() + (p.isMandatory() ? " mandatory" : "") + (p.isMultiValued() ? " multi" : ""));
        }
        return result;
    }
}
