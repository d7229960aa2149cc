package dev.tether.cli;

import dev.tether.attachment.AttachmentFeatureFamily;
import dev.tether.candidates.HeadCandidateProposer;
import dev.tether.counts.RawAttachmentCounts;
import dev.tether.counts.RawAttachmentCountsBuilder;
import dev.tether.counts.RawTextAttachmentCounting;
import dev.tether.io.QuadrupleReader;
import dev.tether.io.Sha256;
import dev.tether.treebank.TreebankExampleExtractor;
import dev.tether.treebank.TreebankExamples;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;
import dev.tether.io.QuadrupleSet;
import dev.tether.model.ModelFile;
import dev.tether.model.ModelTrainer;
import dev.tether.model.RawWeightChoice;
import dev.tether.model.TaggerSection;
import dev.tether.model.TetherModel;
import dev.tether.similarity.Thesaurus;
import dev.tether.similarity.ThesaurusFile;
import dev.tether.pipeline.DocumentFiles;
import dev.tether.preprocessing.HeldOutTagging;
import dev.tether.preprocessing.TreebankTaggerTrainer;
import dev.tether.spark.SparkJob;
import dev.tether.spark.SparkLibraries;
import dev.tether.spark.SparkMaster;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * {@code tether train}: counts training sources into a new model file. Treebanks ({@code --conllu}) also train the
 * model's part-of-speech tagger from their Penn Treebank tags, which the built-in preprocessing then uses;
 * {@code --no-tagger} trains none, so the shipped OpenNLP tagger stays in use.
 */
final class TrainCommand implements Command {
    /** Rounds of re-estimation of the ambiguous raw cases unless --reestimate says otherwise (see README). */
    static final int RAW_ROUNDS = 1;

    @Override
    public String name() {
        return "train";
    }

    @Override
    public String usage() {
        return "train [--quadruples FILE...] [--conllu FILE...] [--raw PATH...] [--raw-counts FILE...]"
                + " [--corrections SHEET... [--correction-weight W]] [--base MODEL|default] [--raw-weight W]"
                + " [--reestimate ROUNDS] [--line-sentences] [--threads N | --spark MASTER] [--save-raw-counts FILE] [--thesaurus FILE] [--skip-malformed] [--ranker-without FAMILY...] [--no-ranker] [--no-tagger] --out MODEL";
    }

    @Override
    public String help() {
        return "usage: tether " + usage() + "\n\n"
                + "Counts training sources into one model file (deterministic: the same inputs give the same bytes).\n"
                + "With raw text it ends with a domain report (stored in the model; 'tether inspect' shows it again):\n"
                + "events per raw source, vocabulary overlap with the --base model, prepositions whose majority\n"
                + "attachment changed. Raw documents that are empty, binary or not UTF-8 are skipped and listed (exit 1).\n\n"
                + "  --quadruples FILE...  labelled quadruples: 'id verb noun1 preposition noun2 V|N' per line, or\n"
                + "                        Tether's tab-separated format with a header\n"
                + "  --conllu FILE...      treebanks in CoNLL-U (plain or .gz): head-choice examples that train the\n"
                + "                        attachment ranker, and Penn tags (column 5) that train a tagger\n"
                + "  --raw PATH...         unlabelled text (.txt files, or folders of them): unambiguous attachments\n"
                + "                        and head-preposition-object co-occurrence, counted through the candidate finder\n"
                + "  --raw-counts FILE...  raw counts written by the unlabelled attachment counter (merged with --raw)\n"
                + "  --raw-weight W        how much one raw event counts (default: chosen on development data when\n"
                + "                        there are labelled sources, else 1)\n"
                + "  --reestimate ROUNDS   rounds of re-estimation of ambiguous raw cases (default "
                + RAW_ROUNDS + "; 0: unambiguous only)\n"
                + "  --thesaurus FILE      a thesaurus from 'tether thesaurus build', stored in the model: where the\n"
                + "                        back-off has little evidence, nearest neighbours of verb, noun and object decide\n"
                + "                        (one built with --lists-only serves attachment only)\n"
                + "  --save-raw-counts F   also write the merged raw counts to F (atomically)\n"
                + "  --line-sentences      in --raw text every line break ends a sentence (text written one entry per\n"
                + "                        line); by default a line break is a space and the sentence detector decides\n"
                + "  --threads N           threads that count raw text (default 1; the model is the same for any N)\n"
                + "  --spark MASTER        count the raw text on Apache Spark instead: local[N] (embedded), spark://host:port,\n"
                + "                        yarn, k8s://...; the model is byte for byte the one counted on threads\n"
                + "  --corrections SHEET.. review sheets from 'tether audit --queue', marked by a reviewer\n"
                + "  --correction-weight W how much one reviewed decision counts (default 1)\n"
                + "  --base MODEL|default  start from the counts (and ranker, tagger) of an existing model\n"
                + "  --skip-malformed      skip and count lines that do not parse (default: stop at the first)\n"
                + "  --ranker-without F..  leave these feature families out of the ranker (for ablation): "
                + java.util.Arrays.stream(AttachmentFeatureFamily.values()).map(AttachmentFeatureFamily::label)
                        .collect(java.util.stream.Collectors.joining(", ")) + "\n"
                + "  --no-ranker           train no ranker: the count-based score chooses heads\n"
                + "  --no-tagger           train no tagger: the shipped OpenNLP tagger stays in use\n"
                + "  --out MODEL           the model file to write (atomically)\n";
    }

    @Override
    public int run(String[] args, PrintStream out, PrintStream err) throws UsageException, IOException {
        CommandArguments a = new CommandArguments(name(), args, 1,
                Set.of("quadruples", "conllu", "corrections", "correction-weight", "base", "out", "ranker-without", "raw",
                        "raw-counts", "raw-weight", "reestimate", "threads", "spark", "save-raw-counts", "thesaurus"),
                Set.of("skip-malformed", "no-ranker", "no-tagger", "line-sentences"));
        Path target = Path.of(a.required("out"));
        if (!a.has("quadruples") && !a.has("conllu") && !a.has("corrections") && !a.has("raw") && !a.has("raw-counts")) {
            throw new UsageException("give at least one training source with --quadruples, --conllu, --raw, --raw-counts or --corrections");
        }
        if (a.has("line-sentences") && !a.has("raw")) {
            throw new UsageException("--line-sentences says how --raw text is split into sentences; give --raw too");
        }
        SparkMaster spark = SparkOption.master(a.value("spark", null));
        if (spark != null && a.has("threads")) {
            throw new UsageException("--threads and --spark exclude each other: on Spark the master sets how many"
                    + " pipelines count side by side (local[N], or the cluster's executor cores)");
        }
        int threads = positiveInt(a.value("threads", "1"), "--threads");
        if (threads < 1) throw new UsageException("--threads must be at least 1");
        int rounds = positiveInt(a.value("reestimate", String.valueOf(RAW_ROUNDS)), "--reestimate");
        Double rawWeight = null;
        if (a.has("raw-weight")) {
            try {
                rawWeight = Double.parseDouble(a.value("raw-weight", null));
            } catch (NumberFormatException e) {
                rawWeight = Double.NaN;
            }
            if (!(rawWeight > 0) || rawWeight.isInfinite()) throw new UsageException("--raw-weight must be a positive number");
        }
        RawAttachmentCounts raw = null;
        String rawName = null;
        int skippedDocuments = 0;
        if (a.has("raw") || a.has("raw-counts")) {
            RawAttachmentCountsBuilder merged = new RawAttachmentCountsBuilder();
            List<String> names = new ArrayList<>();
            if (a.has("raw")) {
                List<Path> inputs = new ArrayList<>();
                for (String f : a.values("raw")) {
                    if (spark == null) DocumentFiles.requireLocal(f, "--raw");
                    if (DocumentFiles.isFileSystemUri(f)) {
                        // Listed on Spark; named like a local folder, by its last part.
                        String trimmed = f.replaceAll("/+$", "");
                        names.add(trimmed.substring(trimmed.lastIndexOf('/') + 1));
                        continue;
                    }
                    Path p = Path.of(f);
                    if (!Files.exists(p)) throw new IOException(p + " does not exist; give raw text files or folders of .txt files");
                    inputs.add(p);
                    names.add(p.getFileName() == null ? f : p.getFileName().toString());
                }
                RawTextAttachmentCounting.Summary summary;
                String where;
                if (spark == null) {
                    summary = new RawTextAttachmentCounting(threads, a.has("line-sentences")).count(inputs);
                    where = threads + " thread" + (threads == 1 ? "" : "s");
                } else {
                    SparkLibraries.require();
                    try (SparkJob job = SparkJob.start(spark, "tether train")) {
                        job.checkExecutors(a.values("raw"), null, null, null);
                        summary = job.countRawText(a.values("raw"), a.has("line-sentences"));
                        where = "Spark " + spark.url() + ", " + job.parallelism() + " task slots";
                    }
                }
                RawAttachmentCounts.Tally t = summary.counts().tally();
                out.printf("raw text: %,d documents, %,d sentences, %,d tokens in %.1f s (%,.0f tokens/s, %s)%n",
                        t.documents(), t.sentences(), t.tokens(), summary.seconds(), t.tokens() / Math.max(1e-9, summary.seconds()),
                        where);
                if (summary.skippedCount() > 0 || summary.notDocuments() > 0) {
                    StringBuilder why = new StringBuilder();
                    summary.skipped().forEach((k, v) -> why.append(why.length() == 0 ? "" : ", ").append(v.size()).append(' ').append(k.label()));
                    out.printf("raw text: skipped %,d documents (%s), %,d entries that are not documents%n",
                            summary.skippedCount(), why.length() == 0 ? "none" : why, summary.notDocuments());
                    for (List<String> reasons : summary.skipped().values()) for (String r : reasons) out.println("    skipped " + r);
                    skippedDocuments += summary.skippedCount();
                }
                merged.addAll(summary.counts());
            }
            for (String f : a.values("raw-counts")) {
                Path p = Path.of(f);
                merged.addAll(RawAttachmentCounts.read(p));
                names.add(p.getFileName().toString());
            }
            raw = merged.build();
            rawName = String.join("+", names);
            if (a.has("save-raw-counts")) {
                Path saved = Path.of(a.value("save-raw-counts", null));
                raw.write(saved);
                out.println("raw counts written to " + saved + " (give it to --raw-counts to train again without counting)");
            }
            RawAttachmentCounts.Tally t = raw.tally();
            out.printf("raw counts: %,d prepositions with candidates, %,d unambiguous (%.1f%%), %,d ambiguous quadruple configurations%n",
                    t.prepositions(), t.unambiguous(), 100.0 * t.unambiguous() / Math.max(1, t.prepositions()), t.ambiguousQuadruples());
        }
        if (spark != null && !a.has("raw")) {
            out.println("--spark: only raw text (--raw) is counted on Spark; the other sources are read here");
        }
        double correctionWeight = CorrectionEvents.weight(a.value("correction-weight", null), a.has("corrections"));
        boolean skip = a.has("skip-malformed");
        QuadrupleReader reader = new QuadrupleReader(skip);
        List<QuadrupleSet> sets = new ArrayList<>();
        for (String f : a.values("quadruples")) sets.add(reader.read(Path.of(f)));
        TreebankExampleExtractor extractor = new TreebankExampleExtractor(new HeadCandidateProposer());
        List<TreebankExamples> treebanks = new ArrayList<>();
        for (String f : a.values("conllu")) {
            Path file = Path.of(f);
            if (Files.isDirectory(file)) throw new IOException(file + " is a directory; give CoNLL-U files");
            treebanks.add(extractor.extract(file));
        }

        ModelTrainer trainer = new ModelTrainer().trainRanker(!a.has("no-ranker"));
        if (a.has("ranker-without")) {
            EnumSet<AttachmentFeatureFamily> families = EnumSet.allOf(AttachmentFeatureFamily.class);
            for (String name : a.values("ranker-without")) {
                try {
                    families.remove(AttachmentFeatureFamily.byLabel(name));
                } catch (IllegalArgumentException e) {
                    throw new UsageException("--ranker-without: " + e.getMessage());
                }
            }
            if (families.isEmpty()) throw new UsageException("--ranker-without leaves the ranker no feature family");
            trainer.rankerFamilies(families);
        }
        int usableEvents = 0;
        for (TreebankExamples t : treebanks) usableEvents += t.goldAmongCandidates();
        if (!treebanks.isEmpty() && usableEvents == 0) {
            throw new IOException(String.join(", ", a.values("conllu")) + ": no usable attachment events (no gold "
                    + "prepositional attachment whose head is among the candidates); check that the files are CoNLL-U with "
                    + "Penn Treebank tags in column 5 and case/obl/nmod relations");
        }
        String base = a.value("base", null);
        if (base != null) trainer.addModel(ModelLocator.load(base), ModelLocator.DEFAULT.equals(base) ? "default" : Path.of(base).getFileName().toString());
        long skipped = 0;
        for (QuadrupleSet s : sets) {
            trainer.addQuadruples(s);
            skipped += s.skipped();
            out.printf("%-40s %,9d quadruples%s%n", s.name(), s.quadruples().size(),
                    s.skipped() > 0 ? String.format("  (%,d malformed lines skipped)", s.skipped()) : "");
            for (String reason : s.skippedReasons()) out.println("    skipped " + reason);
        }
        for (int i = 0; i < treebanks.size(); i++) {
            Path file = Path.of(a.values("conllu").get(i));
            TreebankExamples t = treebanks.get(i);
            trainer.addTreebank(t, file.getFileName().toString(), fileSha256(file));
            out.printf("%-40s %,9d attachment examples, %,d quadruples (candidate recall %.3f)%n", file.getFileName(),
                    t.examples().size(), t.quadruples().size(), t.candidateRecall());
            // The same trees train the coordination ranker.
            trainer.addCoordinationSentences(dev.tether.treebank.ConlluReader.readAll(file));
        }
        if (raw != null) {
            double w;
            if (rawWeight != null) {
                w = rawWeight;
                trainer.addRawCounts(raw, rawName, w, rounds);
            } else {
                RawWeightChoice.Result choice = trainer.addRawCountsChoosingWeight(raw, rawName, rounds);
                w = choice.weight();
                if (choice.quadruples() > 0) {
                    StringBuilder row = new StringBuilder();
                    for (int i = 0; i < choice.weights().length; i++) {
                        row.append(String.format("  %s: %.2f%%", InspectCommand.weight(choice.weights()[i]), 100 * choice.accuracy()[i]));
                    }
                    out.printf("raw weight chosen on %d folds of %,d labelled quadruples (held-out backed-off accuracy; without raw %.2f%%):%s%n",
                            RawWeightChoice.FOLDS, choice.quadruples(), 100 * choice.withoutRaw(), row);
                }
                if (w == 0) {
                    out.println("raw weight 0: on those folds no weight did better than leaving the raw text out, so its counts"
                            + " are listed as a source but not used; give --raw-weight W to use them anyway");
                }
            }
            out.printf("%-40s %,9d prepositions, weight %s, %d round%s of re-estimation%n", rawName, raw.tally().prepositions(),
                    InspectCommand.weight(w), rounds, rounds == 1 ? "" : "s");
        }
        int problems = 0;
        for (String f : a.values("corrections")) problems += CorrectionEvents.add(trainer, Path.of(f), correctionWeight, out, err);
        if (a.has("thesaurus")) {
            Path file = Path.of(a.value("thesaurus", null));
            Thesaurus thesaurus = ThesaurusFile.read(file);
            try {
                trainer.withThesaurus(thesaurus);
            } catch (IllegalArgumentException e) {
                throw new IOException(file + ": " + e.getMessage(), e);
            }
            out.printf("thesaurus: %s, %,d words (%s, %s), stored in the model for similarity smoothing%s%n", file.getFileName(),
                    thesaurus.size(), thesaurus.settings().weighting() + "/" + thesaurus.settings().measure(),
                    thesaurus.hasVectors() ? "vectors and " + thesaurus.settings().neighbours() + " neighbours per word"
                            : thesaurus.settings().neighbours() + " neighbours per word, lists only",
                    thesaurus.hasVectors() ? "" : " (the coordination features, which need the vectors, do without it)");
        }
        if (a.has("no-tagger")) trainer.withTagger(null);
        else if (!treebanks.isEmpty() && trainTagger(a.values("conllu"), trainer, out) && !a.has("no-ranker")) {
            addHeldOutTagged(a.values("conllu"), extractor, trainer, out);
        }
        long start = System.nanoTime();
        TetherModel model = trainer.build();
        out.printf("built the model in %.1f s%n", (System.nanoTime() - start) / 1e9);
        RankerSummary.print(model, out);
        if (ModelTrainer.thesaurusUnusedByRanker(model)) {
            out.println("thesaurus: the attachment ranker, kept from the base model, was trained without a thesaurus and"
                    + " does not read it; only the quadruple scorer uses it (add a treebank,"
                    + " --conllu, to train the ranker's similar-words features)");
        }
        ModelFile.write(model, target);
        out.printf("wrote %s  (model %s, %,.0f quadruples counted%s)%n", target, model.id(), model.quadruples().total(),
                skipped > 0 ? String.format(", %,d malformed lines skipped", skipped) : "");
        if (raw != null) DomainReportText.print(model, out);
        if (skippedDocuments > 0) {
            out.printf("%,d raw documents were skipped (listed above); the model holds the others (exit code %d)%n",
                    skippedDocuments, Tether.SOME_FAILED);
        }
        return problems > 0 || skippedDocuments > 0 ? Tether.SOME_FAILED : Tether.OK;
    }

    /**
     * Trains the model's tagger from the treebanks' Penn tags and says whether it did; without any usable tags, says
     * so and leaves the tagger as it is.
     */
    private static boolean trainTagger(List<String> files, ModelTrainer trainer, PrintStream out) throws IOException {
        TreebankTaggerTrainer tagger = new TreebankTaggerTrainer();
        for (String f : files) out.println("tagger: " + tagger.add(Path.of(f)).summary());
        if (tagger.sentences() == 0) {
            out.println("tagger: none trained (no usable Penn Treebank tags); the model "
                    + (trainer.hasTagger() ? "keeps the base model's tagger" : "leaves the shipped OpenNLP tagger in use"));
            return false;
        }
        TaggerSection section = tagger.train();
        trainer.withTagger(section);
        out.printf("tagger: %s (%,d bytes)%n", section.description(), section.size());
        return true;
    }

    /**
     * The treebanks' attachments as the model's own tagger would present them on new text: every sentence tagged by a
     * tagger trained without its fold ({@link HeldOutTagging}), for the ranker's temperature.
     */
    private static void addHeldOutTagged(List<String> files, TreebankExampleExtractor extractor, ModelTrainer trainer,
                                         PrintStream out) throws IOException {
        long start = System.nanoTime();
        List<TreebankSentence> sentences = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (String f : files) {
            sentences.addAll(ConlluReader.readAll(Path.of(f)));
            names.add(Path.of(f).getFileName().toString());
        }
        List<TreebankSentence> retagged = HeldOutTagging.retag(sentences, ModelTrainer.JACKKNIFE_FOLDS, String.join(", ", names));
        long words = 0, same = 0;
        TreebankExamples examples = new TreebankExamples();
        for (int i = 0; i < sentences.size(); i++) {
            String[] gold = sentences.get(i).xposTags();
            String[] tagged = retagged.get(i).xposTags();
            for (int w = 0; w < gold.length; w++) {
                if ("_".equals(gold[w])) continue;
                words++;
                if (gold[w].equals(tagged[w])) same++;
            }
            extractor.add(retagged.get(i), examples);
        }
        trainer.addCalibrationExamples(examples.examples());
        out.printf(Locale.ROOT, "calibration: %,d attachments with tags from %d taggers each trained without its fold "
                        + "(%.2f%% of %,d tags as the treebank's) for the ranker's temperature (%.1f s)%n",
                examples.examples().size(), ModelTrainer.JACKKNIFE_FOLDS, words == 0 ? 0.0 : 100.0 * same / words, words,
                (System.nanoTime() - start) / 1e9);
    }

    private static int positiveInt(String value, String option) throws UsageException {
        try {
            int n = Integer.parseInt(value);
            if (n >= 0) return n;
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new UsageException(option + " must be a whole number (0 or more), was '" + value + "'");
    }

    static String fileSha256(Path file) throws IOException {
        MessageDigest digest = Sha256.newDigest();
        try (InputStream in = Files.newInputStream(file)) {
            byte[] buffer = new byte[1 << 16];
            for (int n = in.read(buffer); n > 0; n = in.read(buffer)) digest.update(buffer, 0, n);
        }
        return HexFormat.of().formatHex(digest.digest());
    }
}
