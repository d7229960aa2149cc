package dev.tether.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

/** Every file of an output folder with its bytes, to compare two runs byte for byte. */
final class OutputFiles {
    private OutputFiles() {
    }

    /** Relative name → content of every file below {@code folder}, except the run summary (it holds timings). */
    static Map<String, String> of(Path folder) throws IOException {
        Map<String, String> files = new TreeMap<>();
        try (Stream<Path> all = Files.walk(folder)) {
            for (Path p : (Iterable<Path>) all.filter(Files::isRegularFile).sorted()::iterator) {
                String name = folder.relativize(p).toString().replace('\\', '/');
                if (name.equals(AnnotateCommand.SUMMARY)) continue;
                byte[] bytes = Files.readAllBytes(p);
                files.put(name, bytes.length + " bytes, hash " + Arrays.hashCode(bytes) + ", sha256 " + dev.tether.io.Sha256.hex(bytes));
            }
        }
        return files;
    }
}
