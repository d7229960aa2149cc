package dev.tether.pipeline;

import java.io.IOException;
import java.nio.file.FileVisitOption;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;

/**
 * The documents under an input path, and what was left out.
 *
 * <ul>
 *   <li>A file given directly is the one document, whatever its name (a link to a file is followed).</li>
 *   <li>A folder given directly is followed even when the path is a symbolic link; below it, every regular file whose
 *       name ends in {@value #EXTENSION} in any letter case ({@code .txt}, {@code .TXT}) is a document, in sorted
 *       order of its path.</li>
 *   <li>Left out and counted, never dropped silently: files with other endings, hidden files and folders (name
 *       starting with a dot; a hidden folder counts once), symbolic links inside the folder (not followed: they may
 *       loop or leave the folder), and entries that cannot be read.</li>
 * </ul>
 */
public final class DocumentFiles {
    /** The file ending of documents in a folder, compared without regard to letter case. */
    public static final String EXTENSION = ".txt";

    private DocumentFiles() {
    }

    /** Why an entry below the input folder is not a document. */
    public enum Skip {
        OTHER_EXTENSION("other-extension"), HIDDEN("hidden"), LINK("link"), UNREADABLE("unreadable");

        private final String label;

        Skip(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /**
     * The documents in sorted order, the folder their names are relative to, and the count of each kind of skipped
     * entry (indexed by {@link Skip#ordinal()}).
     */
    public record Listing(Path base, List<Path> documents, long[] skipped) {
        public long skipped(Skip kind) {
            return skipped[kind.ordinal()];
        }

        public long skippedTotal() {
            long n = 0;
            for (long s : skipped) n += s;
            return n;
        }

        /** The document's name: its path relative to the input folder, with {@code /} between folders. */
        public String name(Path document) {
            return base.relativize(document).toString().replace('\\', '/');
        }
    }

    /**
     * Whether {@code input} names its documents by a file system URI ({@code hdfs://…}, {@code s3a://…},
     * {@code file:///…}: a scheme of two or more letters and a colon) rather than by a local path; only runs on
     * Spark read those.
     */
    public static boolean isFileSystemUri(String input) {
        int colon = input.indexOf(':');
        if (colon < 2) return false;
        for (int i = 0; i < colon; i++) {
            char c = input.charAt(i);
            boolean letter = (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z');
            if (!(letter || (i > 0 && ((c >= '0' && c <= '9') || c == '+' || c == '.' || c == '-')))) return false;
        }
        return true;
    }

    /** Refuses a file system URI where only local paths are read (a run on threads), saying what to do. */
    public static void requireLocal(String input, String option) throws IOException {
        if (isFileSystemUri(input)) {
            throw new IOException(option + " " + input + ": a file system URI is read only on Spark; add --spark MASTER, or"
                    + " give a local path");
        }
    }

    public static Listing list(Path input) throws IOException {
        if (!Files.exists(input)) {
            throw new NoSuchFileException(input.toString(), null, "does not exist; give a text file or a folder of them");
        }
        long[] skipped = new long[Skip.values().length];
        if (!Files.isDirectory(input)) {
            Path file = input.toAbsolutePath().normalize();
            return new Listing(file.getParent(), List.of(file), skipped);
        }
        Path root = input.toRealPath();
        List<Path> documents = new ArrayList<>();
        Files.walkFileTree(root, EnumSet.noneOf(FileVisitOption.class), Integer.MAX_VALUE, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult preVisitDirectory(Path dir, BasicFileAttributes attrs) {
                if (!dir.equals(root) && hidden(dir)) {
                    skipped[Skip.HIDDEN.ordinal()]++;
                    return FileVisitResult.SKIP_SUBTREE;
                }
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) {
                Skip why;
                if (attrs.isSymbolicLink()) why = Skip.LINK;
                else if (hidden(file)) why = Skip.HIDDEN;
                else if (!attrs.isRegularFile()) why = Skip.UNREADABLE;
                else if (!hasDocumentEnding(file.getFileName().toString())) why = Skip.OTHER_EXTENSION;
                else why = null;
                if (why == null) documents.add(file);
                else skipped[why.ordinal()]++;
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult visitFileFailed(Path file, IOException e) {
                skipped[(Files.isSymbolicLink(file) ? Skip.LINK : Skip.UNREADABLE).ordinal()]++;
                return FileVisitResult.CONTINUE;
            }
        });
        documents.sort(null);
        return new Listing(root, List.copyOf(documents), skipped);
    }

    private static boolean hidden(Path p) {
        return p.getFileName() != null && isHiddenName(p.getFileName().toString());
    }

    /** Whether a file or folder named {@code name} is hidden (its name starts with a dot) and so skipped. */
    public static boolean isHiddenName(String name) {
        return name.startsWith(".");
    }

    /** Whether a file named {@code name} has the document ending, {@value #EXTENSION} in any letter case. */
    public static boolean hasDocumentEnding(String name) {
        return name.toLowerCase(Locale.ROOT).endsWith(EXTENSION);
    }

}
