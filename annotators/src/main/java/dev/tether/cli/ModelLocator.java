package dev.tether.cli;

import dev.tether.model.ModelFile;
import dev.tether.model.TetherModel;

import java.io.IOException;
import java.nio.file.Path;

/** Resolves a {@code --model} value: {@code default} (or nothing) is the shipped model, anything else a file. */
final class ModelLocator {
    static final String DEFAULT = "default";

    private ModelLocator() {
    }

    static TetherModel load(String value) throws IOException {
        if (value == null || DEFAULT.equals(value)) return TetherModel.bundled();
        return ModelFile.read(Path.of(value));
    }
}
