package dev.tether.cli;

import dev.tether.spark.SparkJob;
import dev.tether.spark.SparkMaster;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.net.ServerSocket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The commands on Spark (issue 11). {@code tether annotate --spark local[2]} writes byte for byte what the run on
 * threads writes: XMI, ledgers, manifest and the run summary (all but its timing); a document that fails fails alone
 * and is listed the same way; and what cannot work stops the run before any output (a missing input, a master that
 * cannot be reached, a master that is no master, --threads beside --spark). {@code tether train --raw ... --spark
 * local[2]} writes the model file byte for byte as the count on threads does, alone and mixed with labelled sources,
 * and {@code tether thesaurus build --spark local[2]} the thesaurus file of the build on threads.
 * One embedded Spark context serves the whole class. Documents are invented maintenance logs of the fictional ferry
 * operator.
 */
class CommandsOnSparkTest {
    private static final List<String> LOGS = List.of(
            "Replaced the cracked gasket on the cooling pump with a spare from the stores.\n",
            "Found a slow leak in the fuel line near the starboard engine.\n",
            "The chief engineer signed the work order after the sea trial.\n",
            "Greased the hinges of the loading ramp before the morning sailing.\n",
            "Checked the mooring lines for chafe at the bow fairlead and logged it in the deck book.\n",
            "Fitted a new impeller to the bilge pump of the Tern Hollow with help from the yard.\n",
            "Tightened the bolts on the ramp with a torque wrench from the workshop.\n",
            "Logged the running hours of both engines in the engine room book.\n",
            "Painted the hull near the waterline with primer before the survey.\n");

    private static JavaSparkContext spark;

    @TempDir
    Path dir;
    private Path in;

    @BeforeAll
    static void startSpark() {
        spark = new JavaSparkContext(new SparkConf().setMaster(SparkMaster.parse("local[2]").url()).setAppName("test")
                .set("spark.ui.enabled", "false").set("spark.driver.bindAddress", "127.0.0.1")
                .set("spark.driver.host", "127.0.0.1"));
        SparkJob.lend(spark);
    }

    @AfterAll
    static void stopSpark() {
        SparkJob.lend(null);
        spark.stop();
    }

    @BeforeEach
    void writeLogs() throws Exception {
        in = Files.createDirectory(dir.resolve("logs"));
        for (int i = 0; i < LOGS.size(); i++) {
            Files.writeString(in.resolve(String.format("log-%02d.txt", i + 1)), LOGS.get(i), StandardCharsets.UTF_8);
        }
    }

    private CommandLineRun annotate(Path out, String... more) {
        List<String> args = new ArrayList<>(List.of("annotate", "--in", in.toString(), "--out", out.toString()));
        args.addAll(List.of(more));
        return CommandLineRun.of(args.toArray(new String[0]));
    }

    /** The summary's text without its one timing line. */
    private static String summaryWithoutTiming(Path out) throws Exception {
        String s = Files.readString(out.resolve(AnnotateCommand.SUMMARY));
        assertTrue(s.contains("\"seconds\" : "), s);
        return s.replaceAll("\"seconds\" : [0-9.]+", "\"seconds\" : _");
    }

    @Test
    void sparkWritesTheBytesOfTheRunOnThreadsIncludingTheSummary() throws Exception {
        Path threads = dir.resolve("threads");
        Path onSpark = dir.resolve("spark");
        CommandLineRun a = annotate(threads, "--threads", "2");
        CommandLineRun b = annotate(onSpark, "--spark", "local[2]");
        assertEquals(Tether.OK, a.exitCode(), a::toString);
        assertEquals(Tether.OK, b.exitCode(), b::toString);
        assertEquals(OutputFiles.of(threads), OutputFiles.of(onSpark));
        assertEquals(LOGS.size() * 2 + 1, OutputFiles.of(onSpark).size()); // xmi + ledger per document, the manifest
        assertEquals(summaryWithoutTiming(threads), summaryWithoutTiming(onSpark));
        assertTrue(b.out().contains("annotated 9 of 9 documents"), b::toString);
        // Run again on Spark into the same folder: every document is reused, the bytes stay.
        CommandLineRun again = annotate(onSpark, "--spark", "local[2]");
        assertEquals(Tether.OK, again.exitCode(), again::toString);
        assertTrue(again.out().contains("(9 reused from an earlier run)"), again::toString);
        assertEquals(OutputFiles.of(threads), OutputFiles.of(onSpark));
    }

    @Test
    void lineSentencesOnSparkWriteTheBytesOfTheRunOnThreads() throws Exception {
        // Entries one per line without final punctuation: the option changes the sentences, on Spark as on threads.
        Files.writeString(in.resolve("log-10.txt"), "Replaced the impeller on the bilge pump\nChecked the seals with the mate\n",
                StandardCharsets.UTF_8);
        Path threads = dir.resolve("threads");
        Path onSpark = dir.resolve("spark");
        CommandLineRun a = annotate(threads, "--threads", "2", "--line-sentences");
        CommandLineRun b = annotate(onSpark, "--spark", "local[2]", "--line-sentences");
        assertEquals(Tether.OK, a.exitCode(), a::toString);
        assertEquals(Tether.OK, b.exitCode(), b::toString);
        assertEquals(OutputFiles.of(threads), OutputFiles.of(onSpark));
        assertEquals(summaryWithoutTiming(threads), summaryWithoutTiming(onSpark));
        String xmi = Files.readString(onSpark.resolve("log-10.txt.xmi"));
        assertEquals(2, xmi.split("<type:Sentence ", -1).length - 1, xmi);
    }

    @Test
    void aDocumentThatFailsFailsAloneAndIsListedAsOnThreads() throws Exception {
        Files.write(in.resolve("log-05.txt"), new byte[] {'o', 'k', 0, 1, 2}); // binary
        Files.write(in.resolve("log-07.txt"), new byte[] {'a', (byte) 0xC3, '(', '\n'}); // not UTF-8
        Path threads = dir.resolve("threads");
        Path onSpark = dir.resolve("spark");
        CommandLineRun a = annotate(threads, "--threads", "2");
        CommandLineRun b = annotate(onSpark, "--spark", "local[2]");
        assertEquals(Tether.SOME_FAILED, a.exitCode(), a::toString);
        assertEquals(Tether.SOME_FAILED, b.exitCode(), b::toString);
        assertTrue(b.out().contains("2 documents failed"), b::toString);
        assertTrue(b.out().contains("log-05.txt: ") && b.out().contains("log-07.txt: "), b::toString);
        assertEquals(OutputFiles.of(threads), OutputFiles.of(onSpark));
        assertEquals(summaryWithoutTiming(threads), summaryWithoutTiming(onSpark));
        assertFalse(Files.exists(onSpark.resolve("log-05.txt.xmi")));
    }

    /** Raw text for training: each log sentence in many documents, so that counts reach above one. */
    private Path writeRawText() throws Exception {
        Path raw = Files.createDirectory(dir.resolve("raw"));
        for (int d = 0; d < 24; d++) {
            StringBuilder text = new StringBuilder();
            for (int k = 0; k < 5; k++) text.append(LOGS.get((d * 5 + k) % LOGS.size()).strip()).append(' ');
            Files.writeString(raw.resolve(String.format("shift-%02d.txt", d)), text.append('\n').toString());
        }
        Files.write(raw.resolve("shift-99.txt"), new byte[] {'o', 'k', 0, 1}); // skipped as binary (exit code 1), either way
        return raw;
    }

    @Test
    void trainOnSparkWritesTheModelBytesOfTheCountOnThreads() throws Exception {
        Path raw = writeRawText();
        Path onThreads = dir.resolve("threads.tether");
        Path onSpark = dir.resolve("spark.tether");
        CommandLineRun a = CommandLineRun.of("train", "--raw", raw.toString(), "--out", onThreads.toString(), "--threads", "2");
        CommandLineRun b = CommandLineRun.of("train", "--raw", raw.toString(), "--out", onSpark.toString(), "--spark", "local[2]");
        assertEquals(Tether.SOME_FAILED, a.exitCode(), a::toString);
        assertEquals(Tether.SOME_FAILED, b.exitCode(), b::toString);
        assertTrue(b.out().contains("raw text: 24 documents") && b.out().contains("skipped 1 documents (1 binary)"), b::toString);
        assertTrue(Files.size(onSpark) > 0);
        assertArrayEquals(Files.readAllBytes(onThreads), Files.readAllBytes(onSpark));
    }

    @Test
    void aFileSystemUriIsListedAndReadThroughHadoopAsItsLocalPathIs() throws Exception {
        // A file: URI goes through Hadoop's FileSystem API, as hdfs:// or s3a:// would; the listing rules (a
        // subfolder, a hidden file, another extension) and the bytes written are those of the local path on threads.
        Path raw = writeRawText();
        Files.writeString(Files.createDirectory(raw.resolve("night-shift")).resolve("shift-50.TXT"), LOGS.get(0));
        Files.writeString(raw.resolve(".draft.txt"), LOGS.get(1));
        Files.writeString(raw.resolve("rota.csv"), "deckhand,engineer\n");
        String uri = raw.toUri().toString();
        assertTrue(uri.startsWith("file:/"), uri);

        Path onThreads = dir.resolve("threads.tether");
        Path onSpark = dir.resolve("spark.tether");
        CommandLineRun a = CommandLineRun.of("train", "--raw", raw.toString(), "--out", onThreads.toString(), "--threads", "2");
        CommandLineRun b = CommandLineRun.of("train", "--raw", uri, "--out", onSpark.toString(), "--spark", "local[2]");
        assertEquals(Tether.SOME_FAILED, b.exitCode(), b::toString);
        assertTrue(b.out().contains("raw text: 25 documents") && b.out().contains("2 entries that are not documents"), b::toString);
        assertTrue(b.out().contains(uri + "shift-99.txt: holds NUL bytes"), "the skipped document is named by its URI: " + b);
        assertArrayEquals(Files.readAllBytes(onThreads), Files.readAllBytes(onSpark), a + "\n" + b);

        Path thesaurusOnThreads = dir.resolve("threads.thesaurus");
        Path thesaurusOnSpark = dir.resolve("spark.thesaurus");
        CommandLineRun c = CommandLineRun.of("thesaurus", "build", "--raw", raw.toString(), "--out", thesaurusOnThreads.toString(),
                "--min-frequency", "2", "--threads", "2");
        CommandLineRun d = CommandLineRun.of("thesaurus", "build", "--raw", uri, "--out", thesaurusOnSpark.toString(),
                "--min-frequency", "2", "--spark", "local[2]");
        assertEquals(Tether.SOME_FAILED, d.exitCode(), d::toString);
        assertArrayEquals(Files.readAllBytes(thesaurusOnThreads), Files.readAllBytes(thesaurusOnSpark), c + "\n" + d);
    }

    @Test
    void lineSentencesInTrainAndThesaurusGiveTheSameBytesOnSparkAsOnThreadsAndOtherCountsThanWithout() throws Exception {
        // Log entries one per line, without final punctuation: by default they run together into one sentence.
        Path raw = Files.createDirectory(dir.resolve("lines"));
        for (int d = 0; d < 12; d++) {
            StringBuilder text = new StringBuilder();
            for (int k = 0; k < 5; k++) {
                String entry = LOGS.get((d * 5 + k) % LOGS.size()).strip();
                text.append(entry, 0, entry.length() - 1).append('\n');
            }
            Files.writeString(raw.resolve(String.format("shift-%02d.txt", d)), text.toString());
        }
        Path joined = dir.resolve("joined.tether");
        Path onThreads = dir.resolve("threads.tether");
        Path onSpark = dir.resolve("spark.tether");
        assertEquals(Tether.OK, CommandLineRun.of("train", "--raw", raw.toString(), "--out", joined.toString()).exitCode());
        CommandLineRun a = CommandLineRun.of("train", "--raw", raw.toString(), "--line-sentences", "--out", onThreads.toString(),
                "--threads", "2");
        CommandLineRun b = CommandLineRun.of("train", "--raw", raw.toString(), "--line-sentences", "--out", onSpark.toString(),
                "--spark", "local[2]");
        assertEquals(Tether.OK, a.exitCode(), a::toString);
        assertEquals(Tether.OK, b.exitCode(), b::toString);
        assertArrayEquals(Files.readAllBytes(onThreads), Files.readAllBytes(onSpark), a + "\n" + b);
        assertFalse(java.util.Arrays.equals(Files.readAllBytes(joined), Files.readAllBytes(onThreads)),
                "sentences split at the line breaks must change the counts");

        Path thesaurusOnThreads = dir.resolve("threads.thesaurus");
        Path thesaurusOnSpark = dir.resolve("spark.thesaurus");
        CommandLineRun c = CommandLineRun.of("thesaurus", "build", "--raw", raw.toString(), "--line-sentences",
                "--out", thesaurusOnThreads.toString(), "--min-frequency", "2", "--threads", "2");
        CommandLineRun d = CommandLineRun.of("thesaurus", "build", "--raw", raw.toString(), "--line-sentences",
                "--out", thesaurusOnSpark.toString(), "--min-frequency", "2", "--spark", "local[2]");
        assertEquals(Tether.OK, c.exitCode(), c::toString);
        assertEquals(Tether.OK, d.exitCode(), d::toString);
        assertArrayEquals(Files.readAllBytes(thesaurusOnThreads), Files.readAllBytes(thesaurusOnSpark), c + "\n" + d);
        // 12 documents of 5 lines: 60 sentences when every line break ends one, fewer when the entries run together.
        assertTrue(c.out().contains("read     12 documents, 60 sentences"), c::toString);
        CommandLineRun e = CommandLineRun.of("thesaurus", "build", "--raw", raw.toString(), "--out",
                dir.resolve("joined.thesaurus").toString(), "--min-frequency", "2", "--threads", "2");
        assertFalse(e.out().contains("12 documents, 60 sentences"), e::toString);
    }

    @Test
    void aFileSystemUriWithoutSparkOrThatDoesNotExistIsAnErrorBeforeAnyOutput() throws Exception {
        Path raw = writeRawText();
        Path model = dir.resolve("m.tether");
        CommandLineRun local = CommandLineRun.of("train", "--raw", raw.toUri().toString(), "--out", model.toString());
        assertEquals(Tether.INPUT, local.exitCode(), local::toString);
        assertTrue(local.err().contains("only on Spark") && local.err().contains("--spark"), local::toString);
        CommandLineRun thesaurus = CommandLineRun.of("thesaurus", "build", "--raw", raw.toUri().toString(), "--out",
                dir.resolve("t.thesaurus").toString());
        assertEquals(Tether.INPUT, thesaurus.exitCode(), thesaurus::toString);

        String missing = dir.resolve("no-such-logs").toUri().toString();
        CommandLineRun gone = CommandLineRun.of("train", "--raw", missing, "--out", model.toString(), "--spark", "local[2]");
        assertEquals(Tether.INPUT, gone.exitCode(), gone::toString);
        assertTrue(gone.err().contains(missing) && gone.err().contains("does not exist"), gone::toString);
        assertFalse(Files.exists(model));
        assertFalse(Files.exists(dir.resolve("t.thesaurus")));
    }

    @Test
    void trainOnSparkMixedWithLabelledSourcesWritesTheSameModel() throws Exception {
        Path raw = writeRawText();
        Path quadruples = FerryLogs.write(dir, "training.txt", FerryLogs.TRAINING);
        Path treebank = dir.resolve("six.conllu");
        try (var in = getClass().getResourceAsStream("ewt-dev-six-sentences.conllu")) {
            Files.copy(in, treebank);
        }
        List<String> common = List.of("train", "--raw", raw.toString(), "--quadruples", quadruples.toString(),
                "--conllu", treebank.toString(), "--no-tagger", "--out");
        List<String> a = new ArrayList<>(common);
        a.add(dir.resolve("threads.tether").toString());
        List<String> b = new ArrayList<>(common);
        b.addAll(List.of(dir.resolve("spark.tether").toString(), "--spark", "local[2]"));
        CommandLineRun ra = CommandLineRun.of(a.toArray(new String[0]));
        CommandLineRun rb = CommandLineRun.of(b.toArray(new String[0]));
        assertEquals(Tether.SOME_FAILED, ra.exitCode(), ra::toString);
        assertEquals(Tether.SOME_FAILED, rb.exitCode(), rb::toString);
        assertArrayEquals(Files.readAllBytes(dir.resolve("threads.tether")), Files.readAllBytes(dir.resolve("spark.tether")));
    }

    @Test
    void thesaurusBuiltOnSparkHasTheBytesOfTheBuildOnThreads() throws Exception {
        Path raw = writeRawText();
        Path onThreads = dir.resolve("threads.thesaurus");
        Path onSpark = dir.resolve("spark.thesaurus");
        CommandLineRun a = CommandLineRun.of("thesaurus", "build", "--raw", raw.toString(), "--out", onThreads.toString(),
                "--min-frequency", "2", "--threads", "2");
        CommandLineRun b = CommandLineRun.of("thesaurus", "build", "--raw", raw.toString(), "--out", onSpark.toString(),
                "--min-frequency", "2", "--spark", "local[2]");
        // The binary file is skipped and counted either way (exit code 1: some input skipped).
        assertEquals(Tether.SOME_FAILED, a.exitCode(), a::toString);
        assertEquals(Tether.SOME_FAILED, b.exitCode(), b::toString);
        assertTrue(b.out().contains("read     24 documents") && b.out().contains(", 2 task slots)"), b::toString);
        assertTrue(b.out().contains("binary") && b.out().contains("shift-99.txt"), b::toString);
        assertTrue(dev.tether.similarity.ThesaurusFile.read(onSpark).size(dev.tether.candidates.HeadClass.NOUN) > 10,
                "the thesaurus compared holds words");
        assertArrayEquals(Files.readAllBytes(onThreads), Files.readAllBytes(onSpark));
        CommandLineRun both = CommandLineRun.of("thesaurus", "build", "--raw", raw.toString(), "--out",
                dir.resolve("x.thesaurus").toString(), "--threads", "2", "--spark", "local[2]");
        assertEquals(Tether.USAGE, both.exitCode(), both::toString);
    }

    @Test
    void anInputThatDoesNotExistStopsTheRunBeforeAnyOutput() {
        Path out = dir.resolve("out");
        CommandLineRun r = CommandLineRun.of("annotate", "--in", dir.resolve("no-such-folder").toString(), "--out",
                out.toString(), "--spark", "local[2]");
        assertEquals(Tether.INPUT, r.exitCode(), r::toString);
        assertTrue(r.err().contains("no-such-folder") && r.err().contains("does not exist"), r::toString);
        assertFalse(Files.exists(out));
    }

    @Test
    void aMasterThatCannotBeReachedStopsTheRunBeforeAnyOutput() throws Exception {
        int port;
        try (ServerSocket s = new ServerSocket(0, 1, java.net.InetAddress.getLoopbackAddress())) {
            port = s.getLocalPort(); // free once closed: nothing listens there
        }
        SparkJob.lend(null); // a context for this master would be started, as from the command line
        try {
            Path out = dir.resolve("out");
            CommandLineRun r = annotate(out, "--spark", "spark://127.0.0.1:" + port);
            assertEquals(Tether.INPUT, r.exitCode(), r::toString);
            assertTrue(r.err().contains("spark://127.0.0.1:" + port + " cannot be reached"), r::toString);
            assertFalse(Files.exists(out));
        } finally {
            SparkJob.lend(spark);
        }
    }

    @Test
    void aMasterThatIsNoMasterAndThreadsBesideSparkAreUsageErrors() {
        Path out = dir.resolve("out");
        CommandLineRun wrong = annotate(out, "--spark", "locl[2]");
        assertEquals(Tether.USAGE, wrong.exitCode(), wrong::toString);
        assertTrue(wrong.err().contains("'locl[2]' is not a Spark master"), wrong::toString);
        CommandLineRun both = annotate(out, "--spark", "local[2]", "--threads", "2");
        assertEquals(Tether.USAGE, both.exitCode(), both::toString);
        assertTrue(both.err().contains("--threads and --spark exclude each other"), both::toString);
        assertFalse(Files.exists(out));
    }
}
