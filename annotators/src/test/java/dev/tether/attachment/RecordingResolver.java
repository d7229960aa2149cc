package dev.tether.attachment;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;

import org.apache.uima.UimaContext;
import org.apache.uima.resource.ResourceInitializationException;

/**
 * The attachment resolver, unchanged, plus a record of every instance the framework creates, so tests can ask each
 * instance which model it scores with. Used in place of {@link AttachmentResolver} by naming this class as the
 * implementation (uimaFIT {@code createEngineDescription}, or a descriptor's implementation name).
 */
public class RecordingResolver extends AttachmentResolver {
    static final List<RecordingResolver> CREATED = new CopyOnWriteArrayList<>();

    @Override
    public void initialize(UimaContext context) throws ResourceInitializationException {
        super.initialize(context);
        CREATED.add(this);
    }
}
