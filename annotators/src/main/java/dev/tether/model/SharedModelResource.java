package dev.tether.model;

import org.apache.uima.resource.DataResource;
import org.apache.uima.resource.ResourceInitializationException;
import org.apache.uima.resource.SharedResourceObject;

import java.io.IOException;
import java.net.URI;
import java.nio.file.Path;

/**
 * A model as a UIMA shared resource: bind it once in an aggregate and every engine that declares it scores with
 * the same instance. The resource URL is a model file; the shipped model is selected by a URL ending in
 * {@value LoadedModels#DEFAULT} (uimaFIT) or by its classpath path {@code dev/tether/model/default.tether} (in an XML
 * descriptor's {@code fileUrl}, where UIMA resolves that relative path on the classpath). Loading goes through
 * {@link LoadedModels}, so separate bindings of the same file share one copy.
 */
public final class SharedModelResource implements SharedResourceObject, ModelHolder {
    private volatile TetherModel model;

    @Override
    public void load(DataResource data) throws ResourceInitializationException {
        URI uri = data.getUri();
        String location = uri == null || uri.toString().endsWith(LoadedModels.DEFAULT) || isShippedModelPath(uri.toString())
                ? LoadedModels.DEFAULT
                : "file".equals(uri.getScheme()) ? Path.of(uri).toString() : uri.toString();
        try {
            model = LoadedModels.get(location);
        } catch (IOException e) {
            throw new ResourceInitializationException(e);
        }
    }

    /** The shipped model's classpath path, as UIMA resolved it (ends with it) or as written (relative, unresolved). */
    private static boolean isShippedModelPath(String uri) {
        return uri.endsWith(TetherModel.BUNDLED_RESOURCE) || uri.equals(TetherModel.BUNDLED_RESOURCE.substring(1));
    }

    @Override
    public TetherModel model() {
        return model;
    }
}
