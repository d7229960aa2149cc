package dev.tether.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** {@code tether thesaurus build|query|evaluate} on invented ferry logs, with the bad inputs a user can give. */
class ThesaurusCommandTest {
    @TempDir
    static Path dir;
    static Path logs;
    static Path thesaurus;
    static CommandLineRun build;

    private static final String[] CREW = {"engineer", "deckhand", "mechanic", "mate"};
    private static final String[] PARTS = {"gasket", "valve", "seal", "filter", "hose"};
    private static final String[] MACHINES = {"pump", "engine", "winch", "generator"};

    @BeforeAll
    static void buildFromLogs() throws Exception {
        logs = Files.createDirectories(dir.resolve("logs"));
        StringBuilder text = new StringBuilder();
        int n = 0;
        for (String crew : CREW) {
            for (String part : PARTS) {
                for (String machine : MACHINES) {
                    n++;
                    text.append(n % 2 == 0
                            ? "The " + crew + " replaced the worn " + part + " on the " + machine + ".\n"
                            : "The " + crew + " inspected a new " + part + " of the " + machine + ".\n");
                }
            }
        }
        Files.writeString(logs.resolve("log-1.txt"), text);
        Files.writeString(logs.resolve("log-2-empty.txt"), "  \n");
        Files.write(logs.resolve("log-3-binary.txt"), new byte[] {'E', 'n', 0, 1, 2});
        Files.write(logs.resolve("log-4-latin1.txt"), "Le m\u00e9canicien a remplac\u00e9 le joint.\n".getBytes(StandardCharsets.ISO_8859_1));
        Files.writeString(logs.resolve("crew-notes.md"), "Not a log.\n");
        thesaurus = dir.resolve("ferry.thesaurus");
        build = CommandLineRun.of("thesaurus", "build", "--raw", logs.toString(), "--out", thesaurus.toString(),
                "--min-frequency", "3", "--neighbours", "5", "--threads", "2");
    }

    @Test
    void buildSkipsEmptyBinaryAndBadlyEncodedTextAndCountsThem() {
        assertEquals(Tether.SOME_FAILED, build.exitCode(), build.toString());
        assertTrue(build.out().contains("read     1 documents"), build.out());
        assertTrue(build.out().contains("skipped  3 documents:"), build.out());
        assertTrue(build.out().contains("  empty            1"), build.out());
        assertTrue(build.out().contains("  binary           1"), build.out());
        assertTrue(build.out().contains("  not valid UTF-8  1"), build.out());
        assertTrue(build.out().contains("log-4-latin1.txt:1: is not valid UTF-8 text"), build.out());
        assertTrue(build.out().contains("not read 1 entries below the inputs that are not .txt documents"),
                "a file of another ending is counted, not dropped silently: " + build.out());
        assertTrue(Files.exists(thesaurus));
    }

    @Test
    void queryPrintsNeighboursOfTheSameClassWithScores() {
        CommandLineRun q = CommandLineRun.of("thesaurus", "query", "--thesaurus", thesaurus.toString(), "gaskets", "replaced", "lifeboat");
        assertEquals(Tether.OK, q.exitCode(), q.toString());
        String[] lines = q.out().split("\n");
        assertEquals("gaskets (noun 'gasket'): 5 neighbours", lines[0]);
        // The other parts share every context slot of a gasket; crew and machines do not.
        for (int i = 1; i <= 4; i++) {
            String neighbour = lines[i].trim().split("\\s+")[0];
            assertTrue(java.util.List.of(PARTS).contains(neighbour), q.out());
        }
        assertTrue(q.out().contains("replaced (verb 'replac'):"), q.out());
        assertTrue(q.out().contains("lifeboat: not in the thesaurus"), q.out());
    }

    @Test
    void evaluatePrintsOneJsonObjectForEitherPairFormat() throws Exception {
        Path indexed = dir.resolve("indexed.csv");
        Files.writeString(indexed, ",word1,word2,similarity\n0,gasket,valve,3.9\n1,engineer,deckhand,3.5\n2,gasket,engineer,0.4\n3,seal,lifeboat,2\n");
        Path plain = dir.resolve("plain.csv");
        Files.writeString(plain, "gasket,valve,3.9\nengineer,deckhand,3.5\ngasket,engineer,0.4\nseal,lifeboat,2\n");
        JsonNode first = null;
        for (Path pairs : new Path[] {indexed, plain}) {
            CommandLineRun e = CommandLineRun.of("thesaurus", "evaluate", "--thesaurus", thesaurus.toString(), "--pairs", pairs.toString(), "--json");
            assertEquals(Tether.OK, e.exitCode(), e.toString());
            JsonNode json = new ObjectMapper().readTree(e.out());
            assertEquals(3, json.get("n").asInt());
            assertEquals(4, json.get("pairs").asInt());
            assertEquals(0.75, json.get("coverage").asDouble(), 1e-9);
            assertTrue(json.get("spearman").isNumber());
            if (first != null) assertEquals(first.get("spearman"), json.get("spearman"));
            first = json;
        }
    }

    @Test
    void theSameInputGivesTheSameBytesWhateverTheThreads() throws Exception {
        Path again = dir.resolve("again.thesaurus");
        CommandLineRun r = CommandLineRun.of("thesaurus", "build", "--raw", logs.resolve("log-1.txt").toString(), "--out",
                again.toString(), "--min-frequency", "3", "--neighbours", "5", "--threads", "1");
        assertEquals(Tether.OK, r.exitCode(), r.toString());
        assertArrayEquals(Files.readAllBytes(thesaurus), Files.readAllBytes(again));
    }

    @Test
    void helpForEachVerbAndErrorsForStrayWordsAndUnknownFlags() {
        for (String verb : new String[] {"build", "query", "evaluate"}) {
            CommandLineRun h = CommandLineRun.of("thesaurus", verb, "--help");
            assertEquals(Tether.OK, h.exitCode(), h.toString());
            assertTrue(h.out().contains("usage: tether thesaurus " + verb), h.out());
        }
        CommandLineRun all = CommandLineRun.of("thesaurus", "--help");
        assertEquals(Tether.OK, all.exitCode());
        assertTrue(all.out().contains("--max-context-words N") && all.out().contains("--pairs CSV"), all.out());
        CommandLineRun stray = CommandLineRun.of("thesaurus", "evaluate", "extra", "--thesaurus", thesaurus.toString(), "--pairs", "x.csv");
        assertEquals(Tether.USAGE, stray.exitCode());
        assertTrue(stray.err().contains("unexpected word 'extra'"), stray.err());
        CommandLineRun flag = CommandLineRun.of("thesaurus", "build", "--raw", "x", "--out", "y", "--window", "3");
        assertEquals(Tether.USAGE, flag.exitCode());
        assertTrue(flag.err().contains("has no option --window"), flag.err());
        CommandLineRun weighting = CommandLineRun.of("thesaurus", "build", "--raw", "x", "--out", "y", "--weighting", "tfidf");
        assertEquals(Tether.USAGE, weighting.exitCode());
        assertTrue(weighting.err().contains("unknown weighting 'tfidf'; choose one of relative, ppmi, ppmi-smoothed, ttest"), weighting.err());
        assertEquals(Tether.USAGE, CommandLineRun.of("thesaurus", "rebuild").exitCode());
        assertEquals(Tether.USAGE, CommandLineRun.of("thesaurus").exitCode());
    }

    @Test
    void aFileThatIsNotAThesaurusIsAnInputErrorNamingIt() throws Exception {
        Path notes = dir.resolve("notes.txt");
        Files.writeString(notes, "not a thesaurus");
        CommandLineRun r = CommandLineRun.of("thesaurus", "query", "--thesaurus", notes.toString(), "gasket");
        assertEquals(Tether.INPUT, r.exitCode());
        assertTrue(r.err().contains(notes + " is not a Tether thesaurus file"), r.err());
        Path emptyFolder = Files.createDirectories(dir.resolve("nothing"));
        Files.writeString(emptyFolder.resolve("blank.txt"), "");
        CommandLineRun none = CommandLineRun.of("thesaurus", "build", "--raw", emptyFolder.toString(), "--out", dir.resolve("none.thesaurus").toString());
        assertEquals(Tether.INPUT, none.exitCode(), none.toString());
    }

    @Test
    void listsOnlyKeepsTheSameNeighboursInASmallerFileThatEvaluateRefuses() throws Exception {
        Path lists = dir.resolve("lists.thesaurus");
        CommandLineRun r = CommandLineRun.of("thesaurus", "build", "--raw", logs.resolve("log-1.txt").toString(), "--out",
                lists.toString(), "--min-frequency", "3", "--neighbours", "5", "--threads", "1", "--lists-only");
        assertEquals(Tether.OK, r.exitCode(), r.toString());
        assertTrue(r.out().contains("vectors not kept (--lists-only)"), r.out());
        assertTrue(Files.size(lists) < Files.size(thesaurus), Files.size(lists) + " against " + Files.size(thesaurus));
        CommandLineRun full = CommandLineRun.of("thesaurus", "query", "--thesaurus", thesaurus.toString(), "gasket", "replaced");
        CommandLineRun fromLists = CommandLineRun.of("thesaurus", "query", "--thesaurus", lists.toString(), "gasket", "replaced");
        assertEquals(Tether.OK, fromLists.exitCode(), fromLists.toString());
        assertEquals(full.out(), fromLists.out());
        Path pairs = dir.resolve("pairs-for-lists.csv");
        Files.writeString(pairs, "gasket,valve,3.9\nengineer,deckhand,3.5\n");
        CommandLineRun e = CommandLineRun.of("thesaurus", "evaluate", "--thesaurus", lists.toString(), "--pairs", pairs.toString());
        assertEquals(Tether.USAGE, e.exitCode(), e.toString());
        assertTrue(e.err().contains(lists + " keeps neighbour lists only"), e.err());

        // A model trained with it carries it, and says so.
        Path quadruples = dir.resolve("ferry.quadruples");
        Files.writeString(quadruples, "1 replaced gasket on pump V\n2 inspected valve of engine N\n3 fitted seal with wrench V\n");
        Path model = dir.resolve("lists.tether");
        CommandLineRun train = CommandLineRun.of("train", "--quadruples", quadruples.toString(), "--thesaurus", lists.toString(),
                "--out", model.toString());
        assertEquals(Tether.OK, train.exitCode(), train.toString());
        assertTrue(train.out().contains("lists only"), train.out());
        CommandLineRun inspect = CommandLineRun.of("inspect", model.toString());
        assertTrue(inspect.out().contains("5 neighbours per word, lists only"), inspect.out());
    }
}
