package dev.tether.model;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Models loaded in this process, one instance per location, shared by every engine instance and thread that asks
 * for the same location. {@value #DEFAULT} names the shipped model on the classpath; anything else is a file path.
 */
public final class LoadedModels {
    /** The location of the shipped default model. */
    public static final String DEFAULT = "default";

    private static final ConcurrentHashMap<Path, TetherModel> BY_FILE = new ConcurrentHashMap<>();

    private LoadedModels() {
    }

    /** The model at {@code location}, loaded on first use. */
    public static TetherModel get(String location) throws IOException {
        if (location == null || location.isBlank() || DEFAULT.equals(location)) return TetherModel.bundled();
        Path file = Path.of(location).toAbsolutePath().normalize();
        try {
            return BY_FILE.computeIfAbsent(file, f -> {
                try {
                    return ModelFile.read(f);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }
}
