package dev.tether.output;

import java.io.BufferedOutputStream;
import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * A file that appears under its name only when complete: written to a temporary name beside it
 * ({@code .<name>}{@value #TEMPORARY_SUFFIX}), then renamed over the final name in one step. A run that is killed
 * leaves at most a temporary file, never a truncated output; {@link OutputFolder} removes such leftovers when the
 * next run starts.
 *
 * <p>Per-document outputs are not forced to disk before the rename ({@link #writeTemporary}): a killed process loses
 * nothing the operating system already holds, and after a power failure the run manifest's checksums find any output
 * that did not reach the disk, so the next run redoes it. Forcing every file cost about 5 ms each on the development
 * machine, a quarter of a run's time. The manifest and the summary, written once per run, are forced
 * ({@link #write}).
 */
public final class AtomicFile {
    /** Ending of every temporary file Tether writes; nothing else in an output folder ends so. */
    public static final String TEMPORARY_SUFFIX = ".tether-partial";

    /** Writes the content; may be called once. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws Exception;
    }

    private AtomicFile() {
    }

    /** The temporary name used while {@code target} is being written. */
    public static Path temporaryFor(Path target) {
        return temporaryFor(target, null);
    }

    /**
     * The temporary name used while {@code target} is being written by the writer {@code writer}
     * ({@code .<name>.<writer>}{@value #TEMPORARY_SUFFIX}), so that two writers of the same file (two attempts of one
     * Spark task) never write into each other's temporary file; {@code null} gives the plain temporary name.
     */
    public static Path temporaryFor(Path target, String writer) {
        String tag = writer == null ? "" : "." + writer;
        return target.resolveSibling("." + target.getFileName() + tag + TEMPORARY_SUFFIX);
    }

    /** Writes {@code content} to a temporary file and returns it; {@link #commit} gives it its final name. */
    public static Path writeTemporary(Path target, Content content) throws IOException {
        return writeTemporary(target, null, content, false);
    }

    /** Like {@link #writeTemporary(Path, Content)}, into the temporary file of {@code writer}. */
    public static Path writeTemporary(Path target, String writer, Content content) throws IOException {
        return writeTemporary(target, writer, content, false);
    }

    private static Path writeTemporary(Path target, String writer, Content content, boolean force) throws IOException {
        Path temporary = temporaryFor(target, writer);
        Files.createDirectories(target.toAbsolutePath().getParent());
        boolean done = false;
        try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.CREATE, StandardOpenOption.WRITE,
                StandardOpenOption.TRUNCATE_EXISTING)) {
            OutputStream out = new BufferedOutputStream(Channels.newOutputStream(channel), 1 << 16);
            // The content may close what it was given (a JSON generator does); the channel stays open until forced.
            content.writeTo(new FilterOutputStream(out) {
                @Override
                public void write(byte[] b, int off, int len) throws IOException {
                    out.write(b, off, len);
                }

                @Override
                public void close() throws IOException {
                    out.flush();
                }
            });
            out.flush();
            if (force) channel.force(true);
            done = true;
        } catch (IOException e) {
            throw e;
        } catch (Exception e) {
            throw new IOException(e.getMessage() != null ? e.getMessage() : e.toString(), e);
        } finally {
            if (!done) Files.deleteIfExists(temporary);
        }
        return temporary;
    }

    /** Renames the temporary file of {@code target} to {@code target}, replacing what was there. */
    public static void commit(Path target) throws IOException {
        commit(target, null);
    }

    /** Renames the temporary file that {@code writer} wrote for {@code target} to {@code target}. */
    public static void commit(Path target, String writer) throws IOException {
        Path temporary = temporaryFor(target, writer);
        try {
            Files.move(temporary, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(temporary, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /**
     * Writes {@code text} as UTF-8 to {@code target} completely or not at all, not forced to disk (for files a re-run
     * writes again, such as report pages).
     */
    public static void writeString(Path target, String text) throws IOException {
        writeTemporary(target, out -> out.write(text.getBytes(java.nio.charset.StandardCharsets.UTF_8)));
        commit(target);
    }

    /** Writes {@code target} completely or not at all, forced to disk before the rename. */
    public static void write(Path target, Content content) throws IOException {
        writeTemporary(target, null, content, true);
        commit(target);
    }
}
