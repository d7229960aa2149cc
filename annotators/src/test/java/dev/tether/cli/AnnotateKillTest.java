package dev.tether.cli;

import dev.tether.output.RunManifest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A real interruption (issue 7): {@code tether annotate} in a separate JVM is sent SIGTERM once some documents are
 * complete. What it leaves has no truncated output under a final name and no run summary; running the same command
 * again ends with exactly the files of a clean run. Documents are invented maintenance logs of the fictional ferry
 * operator.
 */
class AnnotateKillTest {
    @TempDir
    Path dir;

    @Test
    void runStoppedBySigtermLeavesNoPartialOutputAndIsFinishedByTheSameCommand() throws Exception {
        Path in = Files.createDirectory(dir.resolve("logs"));
        StringBuilder log = new StringBuilder();
        for (int i = 0; i < 30; i++) {
            log.append("Replaced the cracked gasket on the cooling pump with a spare from the stores. ")
                    .append("Found a slow leak in the fuel line near the starboard engine.\n");
        }
        for (int d = 0; d < 30; d++) Files.writeString(in.resolve(String.format("log-%02d.txt", d)), log, StandardCharsets.UTF_8);
        Path out = dir.resolve("out");
        Path clean = dir.resolve("clean");

        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), "-Dorg.slf4j.simpleLogger.defaultLogLevel=warn",
                Tether.class.getName(), "annotate", "--in", in.toString(), "--out", out.toString(), "--threads", "1"));
        Process p = new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(dir.resolve("run.log").toFile()).start();
        Path manifest = out.resolve(RunManifest.FILE);
        long deadline = System.nanoTime() + TimeUnit.MINUTES.toNanos(3);
        while (p.isAlive() && System.nanoTime() < deadline
                && (!Files.exists(manifest) || Files.readAllLines(manifest).isEmpty())) {
            Thread.sleep(10);
        }
        boolean interrupted = p.isAlive();
        p.destroy(); // SIGTERM
        assertTrue(p.waitFor(1, TimeUnit.MINUTES), "the run stops on SIGTERM");
        String runLog = read(dir.resolve("run.log"));
        assertTrue(interrupted, () -> "the run ended before it could be interrupted: " + runLog);

        assertFalse(Files.exists(out.resolve(AnnotateCommand.SUMMARY)), "no summary claims the folder is complete");
        try (Stream<Path> files = Files.list(out)) {
            for (Path f : (Iterable<Path>) files::iterator) {
                String name = f.getFileName().toString();
                if (name.endsWith(".xmi") || name.endsWith(".ledger.jsonl")) {
                    assertTrue(Files.size(f) > 0, () -> name + " is empty");
                    if (name.endsWith(".xmi")) assertTrue(read(f).trim().endsWith("</xmi:XMI>"), name + " is cut short");
                }
            }
        }

        CommandLineRun rerun = CommandLineRun.of("annotate", "--in", in.toString(), "--out", out.toString());
        assertEquals(Tether.OK, rerun.exitCode(), rerun::toString);
        assertTrue(rerun.out().contains("reused"), rerun::toString);
        assertEquals(Tether.OK, CommandLineRun.of("annotate", "--in", in.toString(), "--out", clean.toString()).exitCode());
        assertEquals(OutputFiles.of(clean), OutputFiles.of(out));
    }

    private static String read(Path f) throws java.io.IOException {
        return Files.readString(f, StandardCharsets.UTF_8);
    }
}
