package dev.tether.output;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;
import java.nio.file.ReadOnlyFileSystemException;

/**
 * Says why a file operation failed in words a user can act on. Java's file exceptions often carry only the path
 * ({@code AccessDeniedException: /data/out}); the reason is in the exception's class or in the operating system's
 * message.
 */
public final class IoFailure {
    private IoFailure() {
    }

    /** The reason, with the file when the exception names one, e.g. {@code "/data/out: permission denied"}. */
    public static String describe(Throwable e) {
        if (e instanceof FileSystemException f && f.getFile() != null) {
            String other = f.getOtherFile() != null ? " -> " + f.getOtherFile() : "";
            return f.getFile() + other + ": " + reason(e);
        }
        return reason(e);
    }

    /** The reason alone: "permission denied", "read-only file system", "no such file or folder", ... */
    public static String reason(Throwable e) {
        if (e instanceof FileSystemException f && f.getReason() != null) return lowerFirst(f.getReason());
        if (e instanceof AccessDeniedException) return "permission denied";
        if (e instanceof NoSuchFileException) return "no such file or folder";
        if (e instanceof NotDirectoryException) return "not a folder";
        if (e instanceof FileAlreadyExistsException) return "already exists";
        if (e instanceof ReadOnlyFileSystemException) return "read-only file system";
        if (e instanceof IOException && e.getCause() != null && e.getCause() != e && e.getMessage() == null) {
            return reason(e.getCause());
        }
        return e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
    }

    private static String lowerFirst(String s) {
        return s.isEmpty() ? s : Character.toLowerCase(s.charAt(0)) + s.substring(1);
    }
}
