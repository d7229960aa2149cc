package dev.tether.engines;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URL;
import java.util.Map;
import java.util.TreeMap;

import org.apache.uima.UIMAFramework;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineDescription;
import org.apache.uima.cas.CAS;
import org.apache.uima.cas.Type;
import org.apache.uima.fit.factory.AnalysisEngineFactory;
import org.apache.uima.resource.metadata.ConfigurationParameter;
import org.apache.uima.resource.metadata.Import;
import org.apache.uima.util.XMLInputSource;
import org.junit.jupiter.api.Test;

import dev.tether.candidates.AttachmentCandidateFinder;
import dev.tether.preprocessing.TextPreprocessor;

/**
 * Every engine descriptor in {@code dev/tether/engines/} is found by name on the classpath, instantiated with plain
 * UIMA (no uimaFIT factory) and run on a CAS; and its parameters agree with the engine class it names.
 */
class EngineDescriptorTest {

    static final String PREPROCESSOR = "dev.tether.engines.TextPreprocessor";
    static final String FINDER = "dev.tether.engines.AttachmentCandidateFinder";

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
        assertFalse(cas.getAnnotationIndex(cas.getTypeSystem().getType("dev.tether.type.Chunk")).isEmpty());
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

    @Test
    void preprocessorDescriptorAgreesWithItsClass() throws Exception {
        assertAgrees(byName(PREPROCESSOR), TextPreprocessor.class);
    }

    @Test
    void finderDescriptorAgreesWithItsClass() throws Exception {
        assertAgrees(byName(FINDER), AttachmentCandidateFinder.class);
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
