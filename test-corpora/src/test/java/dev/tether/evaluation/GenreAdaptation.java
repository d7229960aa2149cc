package dev.tether.evaluation;

import dev.tether.candidates.HeadCandidateProposer;
import dev.tether.counts.RawAttachmentCounts;
import dev.tether.counts.RawAttachmentCountsBuilder;
import dev.tether.counts.RawTextAttachmentCounting;
import dev.tether.io.QuadrupleReader;
import dev.tether.io.QuadrupleSet;
import dev.tether.io.Sha256;
import dev.tether.model.ModelFile;
import dev.tether.model.ModelTrainer;
import dev.tether.model.RawWeightChoice;
import dev.tether.model.TaggerSection;
import dev.tether.model.TetherModel;
import dev.tether.pipeline.TetherPipeline;
import dev.tether.preprocessing.TreebankTaggerTrainer;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankExampleExtractor;
import dev.tether.treebank.TreebankExamples;
import org.apache.uima.analysis_engine.AnalysisEngine;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Stream;

/**
 * An experiment, not a test: domain adaptation from raw text, leaving one genre of UD English EWT (Silveira et al.
 * 2014; the prefix of every {@code # sent_id} names its genre) out at a time. For each genre G:
 * <ul>
 *   <li>model A is trained as the default model is (see DEVELOPERS.md), on the RRR training quadruples (Ratnaparkhi,
 *       Reynar &amp; Roukos 1994), the EWT training trees of the <em>other four</em> genres (attachment examples,
 *       coordination trees) and a tagger trained on those same four genres' trees;</li>
 *   <li>model B is A's sources plus the {@code # text} lines of G's training sentences as raw text (one document per
 *       source document of EWT, one sentence per line), counted by {@code train --raw}'s own code
 *       ({@link RawTextAttachmentCounting}, one round of re-estimation as the command's default) and weighted as the
 *       command weights it: chosen on folds of the labelled quadruples ({@link RawWeightChoice}), never on dev;</li>
 *   <li>both are scored end to end (raw text, the model's own tagger) on G's part of EWT dev
 *       ({@link RunningTextEvaluator}, as {@code tether evaluate --conllu}), and the gain B − A is given with a 95%
 *       percentile interval from a paired bootstrap over dev sentences ({@link PairedBootstrap}, 1,000 resamples,
 *       seed {@value #SEED} plus the genre's position) and the exact McNemar p over the attachments.</li>
 * </ul>
 * The mean gain over the genres gets an interval from the same resamples (position by position: the genres' dev
 * parts are independent). With {@code --other-raw}, a second setting C adds the raw text of every corpus under
 * {@code ../shared/datasets/raw/} (counted once) to B's sources. With {@code --raw-weight W}, B's raw text counts W
 * instead of the weight the folds choose (what {@code train --raw-weight W} does); with {@code --line-sentences}, the
 * raw text is counted with every line break ending a sentence ({@code train --line-sentences}), so that its sentences
 * are the treebank's. Setting C counts the other corpora as before and chooses its weight on the folds either way.
 *
 * <pre>
 * java -Xmx6g -cp ... dev.tether.evaluation.GenreAdaptation [--other-raw] [--raw-weight W] [--line-sentences] [GENRE...]
 * </pre>
 * Reads {@code ../shared/datasets}; see DEVELOPERS.md for the class path.
 */
public final class GenreAdaptation {
    static final List<String> GENRES = List.of("answers", "email", "newsgroup", "reviews", "weblog");
    static final long SEED = 20261202L;
    static final int RESAMPLES = 1000;
    /** Rounds of re-estimation of the ambiguous raw cases, as {@code tether train --raw} does by default. */
    static final int RAW_ROUNDS = 1;

    private GenreAdaptation() {
    }

    /** One genre's result. */
    private record Outcome(String genre, SentenceOutcomes a, SentenceOutcomes b, SentenceOutcomes c, double[] gainsB,
                           double[] gainsC) {
    }

    /** B's raw weight when given ({@code --raw-weight}); otherwise NaN and the folds choose it. */
    private static double fixedWeight = Double.NaN;
    /** Whether the raw text is counted with line breaks ending sentences ({@code --line-sentences}). */
    private static boolean lineSentences;

    public static void main(String[] args) throws Exception {
        Path root = Files.exists(Path.of("test-corpora")) ? Path.of(".") : Path.of("..");
        Path shared = root.resolve("../shared/datasets");
        boolean otherRaw = List.of(args).contains("--other-raw");
        lineSentences = List.of(args).contains("--line-sentences");
        List<String> genres = new ArrayList<>();
        for (int i = 0; i < args.length; i++) {
            if (args[i].equals("--raw-weight")) {
                if (i + 1 == args.length) throw new IllegalArgumentException("--raw-weight needs a positive number after it");
                fixedWeight = Double.parseDouble(args[++i]);
                if (!(fixedWeight > 0) || Double.isInfinite(fixedWeight)) {
                    throw new IllegalArgumentException("--raw-weight must be a positive number, got " + args[i]);
                }
            } else if (args[i].startsWith("--")) {
                if (!args[i].equals("--other-raw") && !args[i].equals("--line-sentences")) {
                    throw new IllegalArgumentException("unknown option " + args[i]
                            + "; give --other-raw, --raw-weight W, --line-sentences and genre names");
                }
            } else {
                genres.add(args[i]);
            }
        }
        for (String g : genres) {
            if (!GENRES.contains(g)) throw new IllegalArgumentException("unknown genre '" + g + "'; one of " + GENRES);
        }
        if (genres.isEmpty()) genres = GENRES;
        Map<String, List<String>> train = blocksByGenre(shared.resolve("ud-ewt/en_ewt-ud-train.conllu"));
        Map<String, List<String>> dev = blocksByGenre(shared.resolve("ud-ewt/en_ewt-ud-dev.conllu"));
        QuadrupleSet rrr = new QuadrupleReader(false).read(root.resolve("test-corpora/data/rrr/training"));
        Path work = Files.createTempDirectory("tether-genre");
        long start = System.nanoTime();
        try {
            RawAttachmentCounts other = null;
            if (otherRaw) {
                RawTextAttachmentCounting.Summary s = new RawTextAttachmentCounting(1).count(List.of(shared.resolve("raw")));
                other = s.counts();
                RawAttachmentCounts.Tally t = other.tally();
                System.out.printf(Locale.ROOT, "other raw corpora (%s): %,d documents, %,d tokens, %,d prepositions with"
                                + " candidates, %,d unambiguous, %,d ambiguous quadruple configurations, %,d skipped (%.0f s)%n",
                        shared.resolve("raw"), t.documents(), t.tokens(), t.prepositions(), t.unambiguous(),
                        t.ambiguousQuadruples(), s.skippedCount(), s.seconds());
            }
            List<Outcome> outcomes = new ArrayList<>();
            for (String g : genres) {
                outcomes.add(runGenre(g, GENRES.indexOf(g), train, dev, rrr, other, work));
            }
            System.out.println();
            printTable("B: A + raw text of the genre's training part", outcomes, false);
            if (otherRaw) printTable("C: B + raw text of ../shared/datasets/raw", outcomes, true);
            System.out.printf(Locale.ROOT, "%nwhole experiment: %.0f s%n", (System.nanoTime() - start) / 1e9);
        } finally {
            deleteTree(work);
        }
    }

    private static Outcome runGenre(String g, int position, Map<String, List<String>> train, Map<String, List<String>> dev,
                                    QuadrupleSet rrr, RawAttachmentCounts other, Path work) throws Exception {
        long start = System.nanoTime();
        Path dir = Files.createDirectory(work.resolve(g));
        List<String> others = new ArrayList<>();
        for (String o : GENRES) if (!o.equals(g)) others.addAll(train.get(o));
        Path trees = write(dir.resolve("train-without-" + g + ".conllu"), others);
        Path devPart = write(dir.resolve("dev-" + g + ".conllu"), dev.get(g));
        Path rawFolder = writeRawText(Files.createDirectory(dir.resolve("raw-" + g)), train.get(g));

        TreebankExamples examples = new TreebankExampleExtractor(new HeadCandidateProposer()).extract(trees);
        TreebankTaggerTrainer taggerTrainer = new TreebankTaggerTrainer();
        taggerTrainer.add(trees);
        TaggerSection tagger = taggerTrainer.train();
        String treesSha = Sha256.hex(Files.readAllBytes(trees));
        RawTextAttachmentCounting.Summary counted = new RawTextAttachmentCounting(1, lineSentences).count(List.of(rawFolder));
        RawAttachmentCounts raw = counted.counts();
        RawAttachmentCounts.Tally t = raw.tally();
        System.out.printf(Locale.ROOT, "%s: trees of the other four genres: %,d sentences, %,d attachment examples;"
                        + " raw text of %s: %,d documents, %,d sentences, %,d tokens, %,d prepositions with candidates,"
                        + " %,d unambiguous, %,d ambiguous quadruple configurations%s%n",
                g, others.size(), examples.examples().size(), g, t.documents(), t.sentences(), t.tokens(), t.prepositions(),
                t.unambiguous(), t.ambiguousQuadruples(),
                counted.skippedCount() > 0 ? String.format(Locale.ROOT, ", %d documents skipped", counted.skippedCount()) : "");

        TetherModel a = trainer(rrr, examples, trees, treesSha, tagger).build();
        ModelTrainer bTrainer = trainer(rrr, examples, trees, treesSha, tagger);
        if (Double.isNaN(fixedWeight)) {
            RawWeightChoice.Result choice = bTrainer.addRawCountsChoosingWeight(raw, "raw-" + g, RAW_ROUNDS);
            System.out.printf(Locale.ROOT, "%s: raw weight %s chosen on %d folds of %,d labelled quadruples (held-out"
                            + " backed-off accuracy %s; without raw %.2f%%)%n",
                    g, choice.weight(), RawWeightChoice.FOLDS, choice.quadruples(), foldRow(choice), 100 * choice.withoutRaw());
        } else {
            bTrainer.addRawCounts(raw, "raw-" + g, fixedWeight, RAW_ROUNDS);
            System.out.printf(Locale.ROOT, "%s: raw weight %s given%n", g, fixedWeight);
        }
        TetherModel b = bTrainer.build();
        SentenceOutcomes c = null;
        if (other != null) {
            RawAttachmentCountsBuilder both = new RawAttachmentCountsBuilder();
            both.addAll(raw);
            both.addAll(other);
            ModelTrainer cTrainer = trainer(rrr, examples, trees, treesSha, tagger);
            RawWeightChoice.Result cChoice = cTrainer.addRawCountsChoosingWeight(both.build(), "raw-" + g + "+raw", RAW_ROUNDS);
            System.out.printf(Locale.ROOT, "%s: setting C raw weight %s (held-out backed-off accuracy %s)%n", g,
                    cChoice.weight(), foldRow(cChoice));
            c = evaluate(cTrainer.build(), devPart, dir.resolve("c.tether")).attachmentOutcomes();
        }
        RunningTextEvaluation ea = evaluate(a, devPart, dir.resolve("a.tether"));
        RunningTextEvaluation eb = evaluate(b, devPart, dir.resolve("b.tether"));
        PairedBootstrap bootstrap = new PairedBootstrap(RESAMPLES, SEED + position);
        double[] gainsB = bootstrap.resampledGains(ea.attachmentOutcomes(), eb.attachmentOutcomes());
        double[] gainsC = c == null ? null : bootstrap.resampledGains(ea.attachmentOutcomes(), c);
        Outcome o = new Outcome(g, ea.attachmentOutcomes(), eb.attachmentOutcomes(), c, gainsB, gainsC);
        System.out.printf(Locale.ROOT, "%s: dev %,d sentences, %,d attachments: A %.2f%% (count-based %.2f%%), B %.2f%%"
                        + " (count-based %.2f%%)%s; %.0f s%n",
                g, ea.sentences(), ea.attachment().total(), 100 * ea.attachment().value(),
                100 * ea.baselines().get(RunningTextEvaluation.COUNT_SCORE).value(), 100 * eb.attachment().value(),
                100 * eb.baselines().get(RunningTextEvaluation.COUNT_SCORE).value(),
                c == null ? "" : String.format(Locale.ROOT, ", C %.2f%%", 100 * c.accuracy()), (System.nanoTime() - start) / 1e9);
        return o;
    }

    /** The default model's sources as {@code tether train} adds them, with the genre's trees left out. */
    private static ModelTrainer trainer(QuadrupleSet rrr, TreebankExamples examples, Path trees, String sha,
                                        TaggerSection tagger) throws IOException {
        ModelTrainer trainer = new ModelTrainer();
        trainer.addQuadruples(rrr);
        trainer.addTreebank(examples, trees.getFileName().toString(), sha);
        trainer.addCoordinationSentences(ConlluReader.readAll(trees));
        trainer.withTagger(tagger);
        return trainer;
    }

    private static RunningTextEvaluation evaluate(TetherModel model, Path dev, Path file) throws Exception {
        ModelFile.write(model, file);
        AnalysisEngine pipeline = TetherPipeline.createForRawText(file.toString());
        try {
            return new RunningTextEvaluator(pipeline, model).evaluate(dev);
        } finally {
            pipeline.destroy();
            Files.deleteIfExists(file);
        }
    }

    private static void printTable(String title, List<Outcome> outcomes, boolean settingC) {
        System.out.println(title + " against A (trees of the other four genres), end to end on the genre's dev part");
        String other = settingC ? "C" : "B";
        System.out.printf("%-10s %6s %9s %9s %8s %19s %5s %5s %9s%n", "genre", "n", "acc A", "acc " + other, "gain",
                "95% interval", "A>" + other, other + ">A", "McNemar p");
        double sum = 0;
        double[] meanGains = new double[RESAMPLES];
        for (Outcome o : outcomes) {
            SentenceOutcomes b = settingC ? o.c() : o.b();
            double[] gains = settingC ? o.gainsC() : o.gainsB();
            double[] ci = PairedBootstrap.percentileBounds(gains, 0.95);
            PairedComparison paired = new PairedComparison();
            for (int i = 0; i < o.a().items(); i++) paired.add(o.a().right(i), b.right(i));
            double gain = b.accuracy() - o.a().accuracy();
            sum += gain;
            for (int r = 0; r < RESAMPLES; r++) meanGains[r] += gains[r] / outcomes.size();
            System.out.printf(Locale.ROOT, "%-10s %6d %8.2f%% %8.2f%% %+8.2f %8s%+.2f..%+.2f %5d %5d %9.3f%n", o.genre(),
                    o.a().items(), 100 * o.a().accuracy(), 100 * b.accuracy(), 100 * gain, "", 100 * ci[0], 100 * ci[1],
                    paired.firstOnly(), paired.secondOnly(), paired.pValue());
        }
        double[] ci = PairedBootstrap.percentileBounds(meanGains, 0.95);
        System.out.printf(Locale.ROOT, "mean gain over %d genres: %+.2f points (95%% interval %+.2f..%+.2f; paired bootstrap"
                + " over dev sentences, %d resamples, seed %d + genre position)%n", outcomes.size(), 100 * sum / outcomes.size(),
                100 * ci[0], 100 * ci[1], RESAMPLES, SEED);
    }

    private static String foldRow(RawWeightChoice.Result choice) {
        StringBuilder row = new StringBuilder();
        for (int i = 0; i < choice.weights().length; i++) {
            row.append(i == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%s: %.2f%%", choice.weights()[i], 100 * choice.accuracy()[i]));
        }
        return row.toString();
    }

    /** The sentence blocks of a CoNLL-U file (comment lines included, without the blank line), by genre, in file order. */
    static Map<String, List<String>> blocksByGenre(Path conllu) throws IOException {
        Map<String, List<String>> byGenre = new LinkedHashMap<>();
        for (String g : GENRES) byGenre.put(g, new ArrayList<>());
        String text = Files.readString(conllu, StandardCharsets.UTF_8);
        for (String block : text.split("\n\\s*\n")) {
            if (block.isBlank()) continue;
            String id = value(block, "# sent_id = ");
            if (id == null) throw new IOException(conllu + ": a sentence without # sent_id: " + block.lines().findFirst().orElse(""));
            String genre = id.substring(0, Math.max(0, id.indexOf('-')));
            List<String> blocks = byGenre.get(genre);
            if (blocks == null) throw new IOException(conllu + ": sentence " + id + " names no genre of " + GENRES);
            blocks.add(block.strip());
        }
        return byGenre;
    }

    private static String value(String block, String prefix) {
        for (String line : block.split("\n")) if (line.startsWith(prefix)) return line.substring(prefix.length()).strip();
        return null;
    }

    private static Path write(Path file, List<String> blocks) throws IOException {
        StringBuilder out = new StringBuilder();
        for (String b : blocks) out.append(b).append("\n\n");
        return Files.writeString(file, out.toString(), StandardCharsets.UTF_8);
    }

    /**
     * The {@code # text} of every sentence, one per line, one {@code .txt} file per EWT source document (the sentence id
     * without its final {@code -NNNN}), in file order.
     */
    private static Path writeRawText(Path folder, List<String> blocks) throws IOException {
        Map<String, StringBuilder> documents = new LinkedHashMap<>();
        for (String b : blocks) {
            String id = value(b, "# sent_id = ");
            String text = value(b, "# text = ");
            if (text == null) continue;
            int cut = id.lastIndexOf('-');
            String doc = (cut > 0 ? id.substring(0, cut) : id).replaceAll("[^A-Za-z0-9._-]", "_");
            documents.computeIfAbsent(doc, k -> new StringBuilder()).append(text).append('\n');
        }
        int n = 0;
        for (Map.Entry<String, StringBuilder> d : documents.entrySet()) {
            Files.writeString(folder.resolve(String.format(Locale.ROOT, "%05d-%s.txt", n++, d.getKey())), d.getValue().toString(),
                    StandardCharsets.UTF_8);
        }
        return folder;
    }

    private static void deleteTree(Path dir) throws IOException {
        try (Stream<Path> paths = Files.walk(dir)) {
            for (Path p : paths.sorted(Comparator.reverseOrder()).toList()) Files.deleteIfExists(p);
        }
    }
}
