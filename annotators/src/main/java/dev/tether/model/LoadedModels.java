package dev.tether.model;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Models loaded in this process, one instance per location, shared by every engine instance and thread that asks
 * for the same location (and, for a file, the same modification time and size). {@value #DEFAULT} names the shipped model on the classpath; anything else is a file path.
 */
public final class LoadedModels {
    /** The location of the shipped default model. */
    public static final String DEFAULT = "default";

    /** A model file as it was when loaded: a file rewritten since (a retrained model) is loaded again. */
    private record FileVersion(Path file, FileTime modified, long size) {
    }

    private static final ConcurrentHashMap<FileVersion, TetherModel> BY_FILE = new ConcurrentHashMap<>();

    private LoadedModels() {
    }

    /** The model at {@code location}, loaded on first use. */
    public static TetherModel get(String location) throws IOException {
        if (location == null || location.isBlank() || DEFAULT.equals(location)) return TetherModel.bundled();
        Path file = Path.of(location).toAbsolutePath().normalize();
        if (!Files.isRegularFile(file)) return ModelFile.read(file); // fails with the reader's message for this path
        FileVersion version = new FileVersion(file, Files.getLastModifiedTime(file), Files.size(file));
        try {
            return BY_FILE.computeIfAbsent(version, v -> {
                try {
                    return ModelFile.read(v.file());
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }
}
