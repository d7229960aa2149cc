package dev.tether.cli;

import dev.tether.documents.StandardErrorCapture;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

/**
 * A strict command line (issue 7): {@code --help} for every verb, {@code --version}, a suggestion for a mistyped
 * verb; stray words and single-dash flags are errors with the usage; I/O errors say why; an output folder that cannot
 * be written is reported before any document is processed; a model that fails to load creates no output folder;
 * warnings name their document. Exit codes as documented on {@link Tether}.
 */
class CommandLineStrictnessTest {
    private static final String LOG = "Replaced the cracked gasket on the cooling pump with a spare from the stores.\n";

    @TempDir
    Path dir;

    @Test
    void everyVerbHasItsOwnHelpListingItsOptions() {
        for (String verb : List.of("annotate", "train", "evaluate", "inspect")) {
            CommandLineRun run = CommandLineRun.of(verb, "--help");
            assertEquals(Tether.OK, run.exitCode(), run::toString);
            assertTrue(run.out().startsWith("usage: tether " + verb), run::toString);
            assertTrue(run.out().split("\n").length > 3, () -> verb + " --help says more than the usage line: " + run);
        }
        CommandLineRun annotate = CommandLineRun.of("annotate", "--help");
        for (String option : List.of("--in", "--out", "--model", "--threads", "--chunks", "--fresh")) {
            assertTrue(annotate.out().contains(option), () -> option + " in " + annotate);
        }
        assertEquals(CommandLineRun.of("annotate", "--help").out(), CommandLineRun.of("help", "annotate").out());
    }

    @Test
    void versionIsPrinted() {
        CommandLineRun run = CommandLineRun.of("--version");
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        assertTrue(run.out().matches("(?s)tether \\d+\\.\\d+\\.\\d+.*model file format \\d+.*"), run::toString);
    }

    @Test
    void mistypedVerbGetsASuggestion() {
        CommandLineRun run = CommandLineRun.of("anotate", "--in", "x", "--out", "y");
        assertEquals(Tether.USAGE, run.exitCode(), run::toString);
        assertTrue(run.err().contains("did you mean 'annotate'?"), run::toString);
        CommandLineRun far = CommandLineRun.of("bake");
        assertFalse(far.err().contains("did you mean"), far::toString);
    }

    @Test
    void strayWordsAndSingleDashFlagsAreErrorsWithTheUsage() throws Exception {
        Path in = Files.writeString(dir.resolve("log.txt"), LOG, StandardCharsets.UTF_8);
        String out = dir.resolve("out").toString();
        List<String[]> wrong = List.of(
                new String[] {"annotate", "extra", "--in", in.toString(), "--out", out},
                new String[] {"annotate", "--in", in.toString(), "--out", out, "-v"},
                new String[] {"annotate", "-in", in.toString(), "--out", out},
                new String[] {"evaluate", "--model", "default", "--quadruples", in.toString(), "-json"},
                new String[] {"inspect", "default", "another"},
                new String[] {"annotate", "--in", in.toString(), "--out", out, "--threads", "0"},
                new String[] {"annotate", "--in", in.toString(), "--out", out, "--threads", "two"},
                new String[] {"train", "--quadruples", in.toString(), "--line-sentences", "--out", out});
        for (String[] args : wrong) {
            CommandLineRun run = CommandLineRun.of(args);
            assertEquals(Tether.USAGE, run.exitCode(), () -> String.join(" ", args) + "\n" + run);
            assertTrue(run.err().contains("usage: tether " + args[0]), run::toString);
        }
        assertTrue(CommandLineRun.of("evaluate", "--model", "default", "-json").err().contains("did you mean --json?"));
        assertFalse(Files.exists(dir.resolve("out")), "no command above wrote anything");
    }

    @Test
    void outputFolderThatCannotBeCreatedIsReportedWithTheReasonBeforeAnyDocument() throws Exception {
        Path in = Files.createDirectory(dir.resolve("logs"));
        Files.writeString(in.resolve("log.txt"), LOG, StandardCharsets.UTF_8);
        Path file = Files.writeString(dir.resolve("a-file"), "x", StandardCharsets.UTF_8);
        Path out = file.resolve("out"); // below a regular file: no folder can be made there
        CommandLineRun run = CommandLineRun.of("annotate", "--in", in.toString(), "--out", out.toString());
        assertEquals(Tether.INPUT, run.exitCode(), run::toString);
        assertTrue(run.err().contains("cannot write into the output folder " + out), run::toString);
        assertTrue(run.err().toLowerCase().contains("not a directory") || run.err().contains("already exists")
                || run.err().contains("not a folder"), "the reason is given: " + run);
        assertFalse(run.out().contains("annotated"), "no document was processed: " + run);
    }

    @Test
    void readOnlyOutputFolderIsReportedAsPermissionDenied() throws Exception {
        assumeFalse("root".equals(System.getProperty("user.name")), "root may write anywhere; checked for other users");
        Path in = Files.createDirectory(dir.resolve("logs"));
        Files.writeString(in.resolve("log.txt"), LOG, StandardCharsets.UTF_8);
        Path out = Files.createDirectory(dir.resolve("out"));
        Files.setPosixFilePermissions(out, PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            CommandLineRun run = CommandLineRun.of("annotate", "--in", in.toString(), "--out", out.toString());
            assertEquals(Tether.INPUT, run.exitCode(), run::toString);
            assertTrue(run.err().contains("permission denied"), run::toString);
        } finally {
            Files.setPosixFilePermissions(out, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }

    @Test
    void modelThatFailsToLoadCreatesNoOutputFolder() throws Exception {
        Path in = Files.writeString(dir.resolve("log.txt"), LOG, StandardCharsets.UTF_8);
        Path bad = Files.writeString(dir.resolve("ferry.tether"), "not a model\n", StandardCharsets.UTF_8);
        Path out = dir.resolve("out");
        CommandLineRun run = CommandLineRun.of("annotate", "--in", in.toString(), "--out", out.toString(), "--model", bad.toString());
        assertEquals(Tether.INPUT, run.exitCode(), run::toString);
        assertTrue(run.err().contains(bad.toString()), run::toString);
        assertFalse(Files.exists(out), "no output folder for a run that cannot start");
    }

    @Test
    void missingInputGivesTheReason() {
        CommandLineRun run = CommandLineRun.of("annotate", "--in", dir.resolve("nowhere").toString(), "--out", dir.resolve("o").toString());
        assertEquals(Tether.INPUT, run.exitCode(), run::toString);
        assertTrue(run.err().contains("nowhere") && run.err().contains("does not exist"), run::toString);
    }

    @Test
    void warningsNameTheirDocument() throws Exception {
        Path in = Files.createDirectory(dir.resolve("logs"));
        StringBuilder runOn = new StringBuilder();
        for (int i = 0; i < 400; i++) runOn.append("checked the pump on deck ");
        Files.writeString(in.resolve("run-on.txt"), runOn + "\n", StandardCharsets.UTF_8);
        Path out = dir.resolve("out");
        String log = StandardErrorCapture.during(() -> assertEquals(Tether.OK,
                CommandLineRun.of("annotate", "--in", in.toString(), "--out", out.toString(), "--threads", "1").exitCode()));
        assertTrue(log.contains("tokens, more than maxSentenceTokens"), log);
        for (String line : log.split("\n")) {
            if (line.contains("maxSentenceTokens")) assertTrue(line.contains("document 'run-on.txt'"), line);
        }
    }
}
