package dev.tether.attachment;

import static org.apache.uima.fit.factory.AnalysisEngineFactory.createEngine;
import static org.apache.uima.fit.factory.ExternalResourceFactory.createSharedResourceDescription;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.apache.uima.resource.ResourceInitializationException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import dev.tether.model.SharedModelResource;

/** A model location that is not a model fails when the engine is created, naming the file and what to set. */
class ModelLoadingErrorTest {

    @Test
    void aFileThatIsNotAModelNamesTheFileAndTheParameter(@TempDir Path dir) throws Exception {
        Path notAModel = Files.writeString(dir.resolve("ferry-log-07.txt"),
                "07:40 Deckhand reported a weeping seal on the bow ramp ram.\n", StandardCharsets.UTF_8);

        ResourceInitializationException e = assertThrows(ResourceInitializationException.class,
                () -> createEngine(AttachmentResolver.class, AttachmentResolver.PARAM_MODEL, notAModel.toString()));

        String chain = messageChain(e);
        assertTrue(chain.contains(notAModel.toString()), "names the file: " + chain);
        assertTrue(chain.contains("parameter model"), "names the parameter: " + chain);
        assertTrue(chain.contains("not a Tether model file"), "says what is wrong: " + chain);
        assertTrue(chain.contains("tether train"), "says what to do: " + chain);
    }

    @Test
    void aMissingFileNamesTheFileAndTheParameter(@TempDir Path dir) {
        Path missing = dir.resolve("tern-hollow.tether");

        ResourceInitializationException e = assertThrows(ResourceInitializationException.class,
                () -> createEngine(AttachmentResolver.class, AttachmentResolver.PARAM_MODEL, missing.toString()));

        String chain = messageChain(e);
        assertTrue(chain.contains(missing.toString()), "names the file: " + chain);
        assertTrue(chain.contains("parameter model"), "names the parameter: " + chain);
        assertTrue(chain.contains("does not exist"), "says what is wrong: " + chain);
    }

    @Test
    void aSharedResourceOnAFileThatIsNotAModelNamesTheFile(@TempDir Path dir) throws Exception {
        Path notAModel = Files.write(dir.resolve("truncated.tether"), "TETHER-MODEL\n".getBytes(StandardCharsets.US_ASCII));

        ResourceInitializationException e = assertThrows(ResourceInitializationException.class,
                () -> createEngine(AttachmentResolver.class, AttachmentResolver.RES_MODEL,
                        createSharedResourceDescription(notAModel.toUri().toURL(), SharedModelResource.class)));

        String chain = messageChain(e);
        assertTrue(chain.contains(notAModel.toString()), "names the file: " + chain);
        assertTrue(chain.contains("truncated"), "says what is wrong: " + chain);
    }

    /** The messages of an exception and all its causes, one per line. */
    static String messageChain(Throwable e) {
        StringBuilder chain = new StringBuilder();
        for (Throwable t = e; t != null; t = t.getCause()) {
            chain.append(t.getClass().getSimpleName()).append(": ").append(t.getMessage()).append('\n');
            if (t.getCause() == t) break;
        }
        return chain.toString();
    }
}
