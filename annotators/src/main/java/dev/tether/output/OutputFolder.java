package dev.tether.output;

import java.io.IOException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;

/**
 * The folder a run writes into: created and checked for writing before any document is processed, and cleared of
 * the temporary files an interrupted run left behind.
 */
public final class OutputFolder {
    private OutputFolder() {
    }

    /**
     * Creates {@code folder} if needed and proves that a file can be created in it, so that a folder that cannot be
     * written fails the run at once, with the reason, instead of failing every document.
     */
    public static void prepare(Path folder) throws IOException {
        if (Files.exists(folder) && !Files.isDirectory(folder)) {
            throw new IOException(folder + " exists and is not a folder; give a folder for --out");
        }
        try {
            Files.createDirectories(folder);
            Path probe = Files.createTempFile(folder, ".tether-write-check", AtomicFile.TEMPORARY_SUFFIX);
            Files.delete(probe);
        } catch (IOException e) {
            throw new IOException("cannot write into the output folder " + folder + ": " + IoFailure.reason(e)
                    + "; give a folder you can write to with --out", e);
        }
    }

    /** Deletes every temporary file ({@link AtomicFile#TEMPORARY_SUFFIX}) below {@code folder}; returns how many. */
    public static int removeTemporaryFiles(Path folder) throws IOException {
        int[] removed = {0};
        Files.walkFileTree(folder, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                if (attrs.isRegularFile() && file.getFileName().toString().endsWith(AtomicFile.TEMPORARY_SUFFIX)) {
                    Files.delete(file);
                    removed[0]++;
                }
                return FileVisitResult.CONTINUE;
            }
        });
        return removed[0];
    }
}
