package dev.tether.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermissions;

/**
 * Writes a whole file atomically: a temporary file in the same folder, forced to disk, then renamed over the target.
 * Readers see the old file or the new one, never a part; on failure the target is untouched.
 */
public final class AtomicFileWriter {
    private AtomicFileWriter() {
    }

    /** Writes {@code bytes} to {@code target}; {@code what} names the file's kind in errors ("model", "thesaurus"). */
    public static void write(Path target, byte[] bytes, String what) throws IOException {
        Path folder = target.toAbsolutePath().getParent();
        if (folder != null) Files.createDirectories(folder);
        if (Files.isDirectory(target)) {
            throw new IOException(target + " is a directory; give a file name for the " + what);
        }
        Path temporary = Files.createTempFile(folder, "." + target.getFileName(), ".partial");
        try {
            try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING)) {
                ByteBuffer buffer = ByteBuffer.wrap(bytes);
                while (buffer.hasRemaining()) channel.write(buffer);
                channel.force(true);
            }
            readableByAll(temporary);
            Files.move(temporary, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(temporary);
        }
    }

    /** Temporary files are created private; models and thesauri are meant to be shared. */
    private static void readableByAll(Path file) throws IOException {
        if (Files.getFileStore(file).supportsFileAttributeView(PosixFileAttributeView.class)) {
            Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-r--r--"));
        }
    }
}
