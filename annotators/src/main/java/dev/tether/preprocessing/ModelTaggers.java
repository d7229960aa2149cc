package dev.tether.preprocessing;

import java.io.IOException;
import java.util.Map;
import java.util.Optional;
import java.util.WeakHashMap;

import dev.tether.model.TaggerSection;
import dev.tether.model.TetherModel;
import opennlp.tools.postag.POSModel;

/**
 * The part-of-speech model that a Tether model carries in its {@code tagger} section, decoded once per loaded model
 * and shared by every engine instance and thread that preprocesses for that model. OpenNLP's {@link POSModel} is
 * immutable and thread-safe; the {@code POSTaggerME} built on it is not, so each engine instance makes its own.
 * A model no longer loaded anywhere lets its decoded tagger go too (the map holds its keys weakly, by identity).
 */
public final class ModelTaggers {
    private static final Map<TetherModel, POSModel> DECODED = new WeakHashMap<>();

    private ModelTaggers() {
    }

    /**
     * The tagger trained with {@code model}, or empty when it has none.
     *
     * @throws IOException naming the model file when the section's bytes cannot be decoded
     */
    public static Optional<POSModel> of(TetherModel model) throws IOException {
        Optional<TaggerSection> section = model.tagger();
        if (section.isEmpty()) return Optional.empty();
        synchronized (DECODED) {
            POSModel decoded = DECODED.get(model);
            if (decoded == null) {
                decoded = PosModelBytes.unpack(section.get());
                DECODED.put(model, decoded);
            }
            return Optional.of(decoded);
        }
    }
}
