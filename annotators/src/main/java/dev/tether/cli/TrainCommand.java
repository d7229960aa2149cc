package dev.tether.cli;

import dev.tether.attachment.AttachmentFeatureFamily;
import dev.tether.candidates.HeadCandidateProposer;
import dev.tether.io.QuadrupleReader;
import dev.tether.io.Sha256;
import dev.tether.treebank.TreebankExampleExtractor;
import dev.tether.treebank.TreebankExamples;
import dev.tether.io.QuadrupleSet;
import dev.tether.model.ModelFile;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TaggerSection;
import dev.tether.model.TetherModel;
import dev.tether.preprocessing.TreebankTaggerTrainer;

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
import java.util.Set;

/**
 * {@code tether train}: counts training sources into a new model file. Treebanks ({@code --conllu}) also train the
 * model's part-of-speech tagger from their Penn Treebank tags, which the built-in preprocessing then uses;
 * {@code --no-tagger} trains none, so the shipped OpenNLP tagger stays in use.
 */
final class TrainCommand implements Command {
    @Override
    public String name() {
        return "train";
    }

    @Override
    public String usage() {
        return "train [--quadruples FILE...] [--conllu FILE...] [--corrections SHEET... [--correction-weight W]]"
                + " [--base MODEL|default] [--skip-malformed] [--ranker-without FAMILY...] [--no-ranker] [--no-tagger] --out MODEL";
    }

    @Override
    public String help() {
        return "usage: tether " + usage() + "\n\n"
                + "Counts training sources into one model file (deterministic: the same inputs give the same bytes).\n\n"
                + "  --quadruples FILE...  labelled quadruples: 'id verb noun1 preposition noun2 V|N' per line, or\n"
                + "                        Tether's tab-separated format with a header\n"
                + "  --conllu FILE...      treebanks in CoNLL-U (plain or .gz): head-choice examples that train the\n"
                + "                        attachment ranker, and Penn tags (column 5) that train a tagger\n"
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
                Set.of("quadruples", "conllu", "corrections", "correction-weight", "base", "out", "ranker-without"),
                Set.of("skip-malformed", "no-ranker", "no-tagger"));
        Path target = Path.of(a.required("out"));
        if (!a.has("quadruples") && !a.has("conllu") && !a.has("corrections")) {
            throw new UsageException("give at least one training source with --quadruples, --conllu or --corrections");
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
        int problems = 0;
        for (String f : a.values("corrections")) problems += CorrectionEvents.add(trainer, Path.of(f), correctionWeight, out, err);
        if (a.has("no-tagger")) trainer.withTagger(null);
        else if (!treebanks.isEmpty()) trainTagger(a.values("conllu"), trainer, out);
        long start = System.nanoTime();
        TetherModel model = trainer.build();
        out.printf("built the model in %.1f s%n", (System.nanoTime() - start) / 1e9);
        RankerSummary.print(model, out);
        ModelFile.write(model, target);
        out.printf("wrote %s  (model %s, %,.0f quadruples counted%s)%n", target, model.id(), model.quadruples().total(),
                skipped > 0 ? String.format(", %,d malformed lines skipped", skipped) : "");
        return problems > 0 ? Tether.SOME_FAILED : Tether.OK;
    }

    /** Trains the model's tagger from the treebanks' Penn tags; without any, says so and leaves the tagger as it is. */
    private static void trainTagger(List<String> files, ModelTrainer trainer, PrintStream out) throws IOException {
        TreebankTaggerTrainer tagger = new TreebankTaggerTrainer();
        for (String f : files) out.println("tagger: " + tagger.add(Path.of(f)).summary());
        if (tagger.sentences() == 0) {
            out.println("tagger: none trained (no usable Penn Treebank tags); the model "
                    + (trainer.hasTagger() ? "keeps the base model's tagger" : "leaves the shipped OpenNLP tagger in use"));
            return;
        }
        TaggerSection section = tagger.train();
        trainer.withTagger(section);
        out.printf("tagger: %s (%,d bytes)%n", section.description(), section.size());
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
