package dev.tether.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** Helpers of the audit tests: invented ferry-log documents, an annotate run over them, and counting in pages. */
final class AuditRuns {
    static final String[] DEMO = {"log-01-tern-hollow.txt", "log-02-corrie-bell.txt", "log-06-corrie-bell.txt"};

    private AuditRuns() {
    }

    /** Copies the three demo documents into {@code dir}. */
    static Path demoDocuments(Path dir) throws IOException {
        Files.createDirectories(dir);
        for (String name : DEMO) {
            try (InputStream in = AuditRuns.class.getResourceAsStream("/dev/tether/audit/" + name)) {
                Files.copy(in, dir.resolve(name));
            }
        }
        return dir;
    }

    /** Runs {@code tether annotate} and checks it succeeded. */
    static CommandLineRun annotate(Path in, Path out, String... more) {
        List<String> args = new ArrayList<>(List.of("annotate", "--in", in.toString(), "--out", out.toString()));
        args.addAll(List.of(more));
        CommandLineRun run = CommandLineRun.of(args.toArray(String[]::new));
        assertEquals(0, run.exitCode(), run.toString());
        return run;
    }

    static int count(String text, String pattern) {
        Matcher m = Pattern.compile(pattern).matcher(text);
        int n = 0;
        while (m.find()) n++;
        return n;
    }

    static long lines(Path file) throws IOException {
        return Files.readAllLines(file).stream().filter(l -> !l.isBlank()).count();
    }

    /** Ledger lines of one kind ({@code attachment} or {@code coordination}). */
    static long lines(Path file, String kind) throws IOException {
        String field = "\"kind\":\"" + kind + "\"";
        return Files.readAllLines(file).stream().filter(l -> l.contains(field)).count();
    }
}
