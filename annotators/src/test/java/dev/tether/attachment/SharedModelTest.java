package dev.tether.attachment;

import static org.apache.uima.fit.factory.AnalysisEngineFactory.createEngine;
import static org.apache.uima.fit.factory.AnalysisEngineFactory.createEngineDescription;
import static org.apache.uima.fit.factory.ExternalResourceFactory.createSharedResourceDescription;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.net.URL;
import java.nio.file.Path;

import org.apache.uima.UIMAFramework;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineDescription;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.resource.ExternalResourceDescription;
import org.apache.uima.resource.metadata.Import;
import org.apache.uima.util.XMLInputSource;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.tether.candidates.AttachmentCandidateFinder;
import dev.tether.model.LoadedModels;
import dev.tether.model.ModelFile;
import dev.tether.model.SharedModelResource;
import dev.tether.model.TetherModel;
import dev.tether.type.AttachmentDecision;

/**
 * Several resolver instances hold one model in memory: each instance is asked for its model ({@link
 * AttachmentResolver#model()}, reached through {@link RecordingResolver}) and the objects must be identical, whether
 * the engines are created one by one, inside separate aggregates, through the XML aggregates' shared resource, or
 * through a {@link SharedModelResource} bound with uimaFIT.
 */
class SharedModelTest {

    @BeforeEach
    void forgetInstances() {
        RecordingResolver.CREATED.clear();
    }

    @Test
    void separatelyCreatedResolversShareTheDefaultModel() throws Exception {
        createEngine(RecordingResolver.class);
        createEngine(RecordingResolver.class);
        createEngine(RecordingResolver.class, AttachmentResolver.PARAM_MODEL, LoadedModels.DEFAULT);

        assertEquals(3, RecordingResolver.CREATED.size());
        TetherModel shipped = LoadedModels.get(LoadedModels.DEFAULT);
        for (RecordingResolver r : RecordingResolver.CREATED) assertSame(shipped, r.model());
    }

    @Test
    void resolversInsideTwoAggregatesShareOneModel() throws Exception {
        AnalysisEngine first = createEngine(createEngineDescription(
                createEngineDescription(AttachmentCandidateFinder.class), createEngineDescription(RecordingResolver.class)));
        AnalysisEngine second = createEngine(createEngineDescription(
                createEngineDescription(AttachmentCandidateFinder.class), createEngineDescription(RecordingResolver.class)));

        assertEquals(2, RecordingResolver.CREATED.size());
        assertSame(RecordingResolver.CREATED.get(0).model(), RecordingResolver.CREATED.get(1).model());
        assertSame(LoadedModels.get(LoadedModels.DEFAULT), RecordingResolver.CREATED.get(0).model());
        for (AnalysisEngine aggregate : new AnalysisEngine[] {first, second}) {
            TaggedLogLine line = TaggedLogLine.of(AttachmentResolverTest.GASKET_LINE);
            aggregate.process(line.jcas);
            assertEquals(3, JCasUtil.select(line.jcas, AttachmentDecision.class).size(), "the aggregate resolves");
        }
    }

    /**
     * The XML aggregates bind their declared model resource to the resolver; two of them share one model. The
     * resolver's parameter {@code model} is set to a file that does not exist: it is not read when the resource is
     * bound, so the engines start only if the binding took effect.
     */
    @Test
    void resolversInsideTheXmlAggregatesShareOneModelThroughTheResource(@TempDir Path dir) throws Exception {
        for (String aggregate : new String[] {"dev.tether.engines.RawTextPipeline", "dev.tether.engines.TaggedTextPipeline"}) {
            AnalysisEngineDescription description = byName(aggregate);
            AnalysisEngineDescription resolver = (AnalysisEngineDescription) description.getDelegateAnalysisEngineSpecifiers()
                    .get("resolver");
            resolver.setAnnotatorImplementationName(RecordingResolver.class.getName());
            resolver.getAnalysisEngineMetaData().getConfigurationParameterSettings()
                    .setParameterValue(AttachmentResolver.PARAM_MODEL, dir.resolve("absent.tether").toString());
            UIMAFramework.produceAnalysisEngine(description);
        }
        createEngine(RecordingResolver.class);

        assertEquals(3, RecordingResolver.CREATED.size());
        TetherModel shipped = LoadedModels.get(LoadedModels.DEFAULT);
        for (RecordingResolver r : RecordingResolver.CREATED) assertSame(shipped, r.model());
    }

    /**
     * A host's own aggregate wraps the tagged-text aggregate and declares its own model file under the inner
     * aggregate's resource name, as the aggregate descriptors' comments describe: UIMA keeps the enclosing aggregate's
     * definition of a resource name, so the inner resolver scores with the host's file, not the shipped model.
     */
    @Test
    void anEnclosingAggregateReplacesTheModelByResourceName(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("corrie-bell.tether");
        ModelFile.write(LoadedModels.get(LoadedModels.DEFAULT), file);
        String host = """
                <analysisEngineDescription xmlns="http://uima.apache.org/resourceSpecifier">
                  <frameworkImplementation>org.apache.uima.java</frameworkImplementation>
                  <primitive>false</primitive>
                  <delegateAnalysisEngineSpecifiers>
                    <delegateAnalysisEngine key="tether"><import name="dev.tether.engines.TaggedTextPipeline"/></delegateAnalysisEngine>
                  </delegateAnalysisEngineSpecifiers>
                  <analysisEngineMetaData>
                    <name>Ferry log host pipeline</name>
                    <flowConstraints><fixedFlow><node>tether</node></fixedFlow></flowConstraints>
                  </analysisEngineMetaData>
                  <resourceManagerConfiguration>
                    <externalResources>
                      <externalResource>
                        <name>tetherAttachmentModel</name>
                        <fileResourceSpecifier><fileUrl>%s</fileUrl></fileResourceSpecifier>
                        <implementationName>dev.tether.model.SharedModelResource</implementationName>
                      </externalResource>
                    </externalResources>
                  </resourceManagerConfiguration>
                </analysisEngineDescription>
                """.formatted(file.toUri());
        AnalysisEngineDescription outer = UIMAFramework.getXMLParser().parseAnalysisEngineDescription(
                new XMLInputSource(new java.io.ByteArrayInputStream(host.getBytes(java.nio.charset.StandardCharsets.UTF_8)), null));
        AnalysisEngineDescription inner = (AnalysisEngineDescription) outer.getDelegateAnalysisEngineSpecifiers().get("tether");
        ((AnalysisEngineDescription) inner.getDelegateAnalysisEngineSpecifiers().get("resolver"))
                .setAnnotatorImplementationName(RecordingResolver.class.getName());

        AnalysisEngine pipeline = UIMAFramework.produceAnalysisEngine(outer);

        assertEquals(1, RecordingResolver.CREATED.size());
        assertSame(LoadedModels.get(file.toString()), RecordingResolver.CREATED.get(0).model(), "the host's file");
        assertNotSame(LoadedModels.get(LoadedModels.DEFAULT), RecordingResolver.CREATED.get(0).model());
        TaggedLogLine line = TaggedLogLine.into(pipeline.newJCas(), AttachmentResolverTest.GASKET_LINE);
        pipeline.process(line.jcas);
        assertEquals(3, JCasUtil.select(line.jcas, AttachmentDecision.class).size(), "the wrapped aggregate resolves");
    }

    /**
     * A model file of one's own, bound as a shared resource twice (two separate resource descriptions of the same file)
     * and named by parameter once: one model object, loaded from that file (not the shipped one).
     */
    @Test
    void oneModelFileBoundSeveralWaysIsLoadedOnce(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("sorrel-gate.tether");
        ModelFile.write(LoadedModels.get(LoadedModels.DEFAULT), file);
        URL url = file.toUri().toURL();

        createEngine(RecordingResolver.class, AttachmentResolver.RES_MODEL,
                createSharedResourceDescription(url, SharedModelResource.class));
        createEngine(RecordingResolver.class, AttachmentResolver.RES_MODEL,
                createSharedResourceDescription(url, SharedModelResource.class));
        createEngine(RecordingResolver.class, AttachmentResolver.PARAM_MODEL, file.toString());

        TetherModel fromFile = LoadedModels.get(file.toString());
        assertEquals(3, RecordingResolver.CREATED.size());
        for (RecordingResolver r : RecordingResolver.CREATED) assertSame(fromFile, r.model());
        assertNotSame(LoadedModels.get(LoadedModels.DEFAULT), fromFile, "the file's own copy, not the shipped model");
        assertEquals(LoadedModels.get(LoadedModels.DEFAULT).id(), fromFile.id(), "same content, same id");
    }

    /**
     * One shared resource description bound to both resolvers of one aggregate gives the shipped model, whether its
     * URL is {@code default} or the classpath path that the XML aggregates use.
     */
    @Test
    void aSharedResourceOnTheShippedModelGivesTheShippedModel() throws Exception {
        for (String url : new String[] {LoadedModels.DEFAULT, "dev/tether/model/default.tether"}) {
            RecordingResolver.CREATED.clear();
            ExternalResourceDescription shared = createSharedResourceDescription(url, SharedModelResource.class);
            createEngine(createEngineDescription(
                    createEngineDescription(RecordingResolver.class, AttachmentResolver.RES_MODEL, shared),
                    createEngineDescription(RecordingResolver.class, AttachmentResolver.RES_MODEL, shared)));

            assertEquals(2, RecordingResolver.CREATED.size(), url);
            for (RecordingResolver r : RecordingResolver.CREATED) {
                assertSame(LoadedModels.get(LoadedModels.DEFAULT), r.model(), url);
            }
        }
    }

    private static AnalysisEngineDescription byName(String name) throws Exception {
        Import location = UIMAFramework.getResourceSpecifierFactory().createImport();
        location.setName(name);
        URL url = location.findAbsoluteUrl(UIMAFramework.newDefaultResourceManager());
        AnalysisEngineDescription description = UIMAFramework.getXMLParser()
                .parseAnalysisEngineDescription(new XMLInputSource(url));
        description.resolveImports(UIMAFramework.newDefaultResourceManager());
        return description;
    }
}
