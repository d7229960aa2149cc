package dev.tether.spark;

import dev.tether.pipeline.DocumentFiles;
import dev.tether.similarity.RawTextCounting;
import org.apache.hadoop.conf.Configuration;
import org.apache.hadoop.fs.FSDataInputStream;
import org.apache.hadoop.fs.FileStatus;
import org.apache.hadoop.fs.FileSystem;

import java.io.FileNotFoundException;
import java.io.IOException;
import java.net.URI;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The raw-text inputs of a Spark job: a local path (a folder every executor sees at the same place, read as the run
 * on threads reads it, {@link DocumentFiles}), or a URI of any file system the Spark installation's Hadoop client
 * reads ({@code hdfs://namenode/logs}, {@code s3a://bucket/logs}, {@code file:///shared/logs}), listed and read
 * through Hadoop's {@link FileSystem} API by the same rules: {@code .txt} files in any letter case, hidden files and
 * folders and symbolic links skipped and counted, documents in the order of their paths. The executors read a URI
 * with the Hadoop configuration they find (core-site.xml on their class path, or HADOOP_CONF_DIR).
 */
final class InputLocations {
    private InputLocations() {
    }

    /** The Hadoop configuration this process finds, read once (building one parses its XML resources). */
    private static final class ExecutorConfiguration {
        static final Configuration CONF = new Configuration();
    }

    /** The documents below the inputs, in the order a run on threads reads them, their sizes, and the skipped entries. */
    record Documents(List<String> files, Map<String, Long> sizes, long notDocuments) {
    }

    /** Lists the inputs on the driver; {@code conf} is the Spark context's Hadoop configuration. */
    static Documents list(List<String> inputs, Configuration conf) throws IOException {
        List<String> files = new ArrayList<>();
        Map<String, Long> sizes = new HashMap<>();
        long notDocuments = 0;
        for (String input : inputs) {
            if (!DocumentFiles.isFileSystemUri(input)) {
                DocumentFiles.Listing listing = DocumentFiles.list(Path.of(input));
                for (Path d : listing.documents()) {
                    files.add(d.toString());
                    sizes.put(d.toString(), d.toFile().length());
                }
                notDocuments += listing.skippedTotal();
                continue;
            }
            org.apache.hadoop.fs.Path root = new org.apache.hadoop.fs.Path(URI.create(input));
            FileSystem fs = root.getFileSystem(conf);
            FileStatus status;
            try {
                status = fs.getFileStatus(root); // a linked input is followed, as a local one is
            } catch (FileNotFoundException e) {
                throw new IOException(input + " does not exist; give raw text files or folders of .txt files", e);
            }
            List<FileStatus> documents = new ArrayList<>();
            if (status.isDirectory()) notDocuments += walk(fs, status, documents);
            else documents.add(status);
            documents.sort(Comparator.comparing(d -> d.getPath().toUri().getPath()));
            for (FileStatus d : documents) {
                files.add(d.getPath().toUri().toString());
                sizes.put(d.getPath().toUri().toString(), d.getLen());
            }
        }
        return new Documents(files, sizes, notDocuments);
    }

    /** Adds the documents below {@code folder} to {@code documents}; returns how many entries were skipped. */
    private static long walk(FileSystem fs, FileStatus folder, List<FileStatus> documents) throws IOException {
        long skipped = 0;
        for (FileStatus entry : fs.listStatus(folder.getPath())) {
            String name = entry.getPath().getName();
            if (DocumentFiles.isHiddenName(name) || entry.isSymlink()) {
                skipped++;
            } else if (entry.isDirectory()) {
                skipped += walk(fs, entry, documents);
            } else if (!entry.isFile() || !DocumentFiles.hasDocumentEnding(name)) {
                skipped++;
            } else {
                documents.add(entry);
            }
        }
        return skipped;
    }

    /** Reads one listed document on an executor, or says why it is skipped (a reason naming it). */
    static RawTextCounting.Reading read(String file) {
        if (!DocumentFiles.isFileSystemUri(file)) return RawTextCounting.read(Path.of(file));
        org.apache.hadoop.fs.Path path = new org.apache.hadoop.fs.Path(URI.create(file));
        byte[] bytes;
        try (FSDataInputStream in = path.getFileSystem(ExecutorConfiguration.CONF).open(path)) {
            bytes = in.readAllBytes();
        } catch (IOException e) {
            return new RawTextCounting.Reading(null, RawTextCounting.Skip.UNREADABLE, file + ": cannot be read ("
                    + e.getMessage() + "); check that every executor reaches that file system and may read it");
        }
        return RawTextCounting.check(file, bytes);
    }

    /** Why an executor cannot use the file system URI {@code input}, or null. */
    static String problem(String input) {
        try {
            org.apache.hadoop.fs.Path path = new org.apache.hadoop.fs.Path(URI.create(input));
            if (!path.getFileSystem(ExecutorConfiguration.CONF).exists(path)) return "does not exist there";
            return null;
        } catch (IOException | RuntimeException e) {
            return "cannot be reached there (" + e.getMessage() + ")";
        }
    }
}
