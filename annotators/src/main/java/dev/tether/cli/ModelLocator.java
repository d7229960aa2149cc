package dev.tether.cli;

import dev.tether.model.LoadedModels;
import dev.tether.model.TetherModel;

import java.io.IOException;

/**
 * Resolves a {@code --model} value: {@code default} (or nothing) is the shipped model, anything else a file. Goes
 * through {@link LoadedModels}, so the command and the engines it runs share one loaded copy.
 */
final class ModelLocator {
    static final String DEFAULT = LoadedModels.DEFAULT;

    private ModelLocator() {
    }

    static TetherModel load(String value) throws IOException {
        return LoadedModels.get(value);
    }
}
