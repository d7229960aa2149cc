package dev.tether.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.tether.output.RunManifest;
import dev.tether.pipeline.CollectionRun;
import dev.tether.pipeline.DocumentFiles;
import dev.tether.pipeline.TetherPipeline;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * What {@code tether annotate} takes from an input folder (issue 7): a symlinked {@code --in} is followed, links
 * inside it are skipped and counted, so are hidden files and other endings; {@code .TXT} is a document; an input
 * without documents is an error naming the ending looked for; a file that disappears between listing and reading
 * fails alone. Invented maintenance logs of the fictional ferry operator.
 */
class AnnotateInputTest {
    private static final String LOG = "Replaced the cracked gasket on the cooling pump with a spare from the stores.\n";
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    @Test
    void symlinkedInputFolderIsFollowedAndLinksInsideAreSkippedAndCounted() throws Exception {
        Path real = Files.createDirectory(dir.resolve("real-logs"));
        Files.writeString(real.resolve("a-deck.txt"), LOG, StandardCharsets.UTF_8);
        Files.writeString(real.resolve("B-ENGINE.TXT"), LOG, StandardCharsets.UTF_8);
        Files.writeString(real.resolve(".draft.txt"), LOG, StandardCharsets.UTF_8);
        Files.writeString(real.resolve("roster.csv"), "name,role\n", StandardCharsets.UTF_8);
        Path hiddenFolder = Files.createDirectory(real.resolve(".cache"));
        Files.writeString(hiddenFolder.resolve("old.txt"), LOG, StandardCharsets.UTF_8);
        Path elsewhere = Files.writeString(dir.resolve("elsewhere.txt"), LOG, StandardCharsets.UTF_8);
        Files.createSymbolicLink(real.resolve("linked.txt"), elsewhere);
        Files.createSymbolicLink(real.resolve("loop"), real); // a link back up: must not be walked
        Path link = Files.createSymbolicLink(dir.resolve("logs"), real);
        Path out = dir.resolve("out");

        CommandLineRun run = CommandLineRun.of("annotate", "--in", link.toString(), "--out", out.toString());
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        JsonNode s = JSON.readTree(out.resolve(AnnotateCommand.SUMMARY).toFile());
        assertEquals(2, s.get("documents").asInt(), s::toString);
        assertTrue(Files.isRegularFile(out.resolve("a-deck.txt.xmi")));
        assertTrue(Files.isRegularFile(out.resolve("B-ENGINE.TXT.ledger.jsonl")), "a .TXT file is a document");
        assertEquals(2, s.at("/skipped/link").asInt(), s::toString);
        assertEquals(2, s.at("/skipped/hidden").asInt(), "a hidden file and a hidden folder: " + s);
        assertEquals(1, s.at("/skipped/other-extension").asInt(), s::toString);
        assertTrue(run.out().contains("2 symbolic links"), run::toString);
    }

    @Test
    void inputWithoutDocumentsIsAnErrorNamingTheEndingLookedFor() throws Exception {
        Path in = Files.createDirectory(dir.resolve("logs"));
        Files.writeString(in.resolve("roster.csv"), "name,role\n", StandardCharsets.UTF_8);
        Files.writeString(in.resolve("notes.md"), "# notes\n", StandardCharsets.UTF_8);
        Path out = dir.resolve("out");
        CommandLineRun run = CommandLineRun.of("annotate", "--in", in.toString(), "--out", out.toString());
        assertEquals(Tether.INPUT, run.exitCode(), run::toString);
        assertTrue(run.err().contains(".txt") && run.err().contains("2 with other endings"), run::toString);
        assertFalse(Files.exists(out), "nothing is created for an input without documents");

        Path empty = Files.createDirectory(dir.resolve("empty"));
        CommandLineRun none = CommandLineRun.of("annotate", "--in", empty.toString(), "--out", out.toString());
        assertEquals(Tether.INPUT, none.exitCode(), none::toString);
        assertTrue(none.err().contains("no documents in " + empty), none::toString);
    }

    @Test
    void fileThatDisappearsBetweenListingAndReadingFailsAlone() throws Exception {
        Path in = Files.createDirectory(dir.resolve("logs"));
        Path kept = Files.writeString(in.resolve("a.txt"), LOG, StandardCharsets.UTF_8);
        Path gone = Files.writeString(in.resolve("b.txt"), LOG, StandardCharsets.UTF_8);
        DocumentFiles.Listing listing = DocumentFiles.list(in);
        Files.delete(gone); // after the listing, before the run reads it
        Path out = Files.createDirectory(dir.resolve("out"));

        CollectionRun.Result r = new CollectionRun(listing, out,
                new CollectionRun.Settings("default", "test", false, 2, false, "test"), done -> { })
                .run(TetherPipeline.forRawText("default"));

        assertEquals(1, r.annotated());
        assertEquals(1, r.failed().size());
        assertEquals("b.txt", r.failed().get(0).doc());
        assertTrue(r.failed().get(0).reason().contains("no such file") && r.failed().get(0).reason().contains("b.txt"),
                r.failed()::toString);
        assertTrue(Files.isRegularFile(out.resolve("a.txt.xmi")));
        assertEquals(List.of("a.txt"), Files.readAllLines(out.resolve(RunManifest.FILE)).stream()
                .map(l -> l.substring(8, l.indexOf("\",\""))).toList());
        assertTrue(Files.exists(kept));
    }

    @Test
    void leftoverTemporaryFilesOfAnEarlierRunAreRemovedAndCounted() throws Exception {
        Path in = Files.createDirectory(dir.resolve("logs"));
        Files.writeString(in.resolve("a.txt"), LOG, StandardCharsets.UTF_8);
        Path out = Files.createDirectory(dir.resolve("out"));
        Files.write(out.resolve(".a.txt.xmi.tether-partial"), new byte[0]);
        Path sub = Files.createDirectory(out.resolve("deck"));
        Files.writeString(sub.resolve(".ramp.txt.ledger.jsonl.tether-partial"), "{\"doc\":\"deck/ramp.txt\",\"ki");
        Files.writeString(out.resolve("notes-of-mine.txt"), "kept\n"); // not Tether's: left alone

        CommandLineRun run = CommandLineRun.of("annotate", "--in", in.toString(), "--out", out.toString());
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        JsonNode s = JSON.readTree(out.resolve(AnnotateCommand.SUMMARY).toFile());
        assertEquals(2, s.get("temporaryFilesRemoved").asInt(), s::toString);
        try (var files = Files.walk(out)) {
            assertTrue(files.noneMatch(p -> p.toString().endsWith(".tether-partial")));
        }
        assertEquals("kept\n", Files.readString(out.resolve("notes-of-mine.txt")));
    }
}
