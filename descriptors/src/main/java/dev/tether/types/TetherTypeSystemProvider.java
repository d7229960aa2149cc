package dev.tether.types;

import java.io.IOException;
import java.net.URL;
import java.util.ArrayList;
import java.util.List;

import org.apache.uima.UIMAFramework;
import org.apache.uima.jcas.cas.TOP;
import org.apache.uima.resource.metadata.TypeDescription;
import org.apache.uima.resource.metadata.TypeSystemDescription;
import org.apache.uima.spi.JCasClassProvider;
import org.apache.uima.spi.TypeSystemDescriptionProvider;
import org.apache.uima.util.InvalidXMLException;
import org.apache.uima.util.XMLInputSource;

/**
 * Announces Tether's type system ({@value #TYPE_SYSTEM_RESOURCE}) and its JCas classes to UIMA and uimaFIT through
 * Java's service loader, so that {@code AnalysisEngineFactory.createEngine(SomeEngine.class)} and
 * {@code JCasFactory.createJCas()} include the Tether types without an explicit import. Registered in
 * {@code META-INF/services/org.apache.uima.spi.TypeSystemDescriptionProvider} and
 * {@code META-INF/services/org.apache.uima.spi.JCasClassProvider}.
 *
 * <p>Implements the two service interfaces directly: the resource location is given in full here, independent of how
 * a UIMA release resolves relative locations.
 */
public final class TetherTypeSystemProvider implements TypeSystemDescriptionProvider, JCasClassProvider {

    /** The type system on the classpath; by name it is {@code dev.tether.types.TetherTypeSystem}. */
    public static final String TYPE_SYSTEM_RESOURCE = "/dev/tether/types/TetherTypeSystem.xml";

    private List<TypeSystemDescription> descriptions;
    private List<Class<? extends TOP>> jcasClasses;

    @Override
    public synchronized List<TypeSystemDescription> listTypeSystemDescriptions() {
        if (descriptions == null) {
            URL url = TetherTypeSystemProvider.class.getResource(TYPE_SYSTEM_RESOURCE);
            if (url == null) {
                throw new IllegalStateException("Tether's type system " + TYPE_SYSTEM_RESOURCE
                        + " is missing from the classpath; the tether-descriptors jar is incomplete");
            }
            try {
                descriptions = List.of(UIMAFramework.getXMLParser()
                        .parseTypeSystemDescription(new XMLInputSource(url)));
            } catch (InvalidXMLException | IOException e) {
                throw new IllegalStateException("Tether's type system " + url + " could not be read as a type system: "
                        + e.getMessage(), e);
            }
        }
        return descriptions;
    }

    @Override
    @SuppressWarnings("unchecked")
    public synchronized List<Class<? extends TOP>> listJCasClasses() {
        if (jcasClasses == null) {
            List<Class<? extends TOP>> classes = new ArrayList<>();
            ClassLoader loader = TetherTypeSystemProvider.class.getClassLoader();
            for (TypeSystemDescription description : listTypeSystemDescriptions()) {
                for (TypeDescription type : description.getTypes()) {
                    try {
                        classes.add((Class<? extends TOP>) loader.loadClass(type.getName()));
                    } catch (ClassNotFoundException e) {
                        throw new IllegalStateException("JCas class " + type.getName() + " of Tether's type system "
                                + "is missing; JCasGen did not run on " + TYPE_SYSTEM_RESOURCE, e);
                    }
                }
            }
            jcasClasses = List.copyOf(classes);
        }
        return jcasClasses;
    }
}
