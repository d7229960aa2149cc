package dev.tether.pipeline;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/**
 * The documents under an input path: the file itself (whatever its name), or every regular, non-hidden {@code .txt}
 * file below a folder, in sorted order.
 */
public final class DocumentFiles {
    private DocumentFiles() {
    }

    public static List<Path> under(Path input) throws IOException {
        if (!Files.exists(input)) throw new NoSuchFileException(input + " does not exist; give a text file or a folder of them");
        if (Files.isRegularFile(input)) return List.of(input);
        try (Stream<Path> all = Files.walk(input)) {
            return all.filter(Files::isRegularFile)
                    .filter(p -> !p.getFileName().toString().startsWith(".") && p.getFileName().toString().endsWith(".txt"))
                    .sorted()
                    .collect(Collectors.toList());
        }
    }
}
