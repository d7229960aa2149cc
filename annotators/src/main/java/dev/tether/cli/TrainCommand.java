package dev.tether.cli;

import dev.tether.candidates.HeadCandidateProposer;
import dev.tether.io.QuadrupleReader;
import dev.tether.io.Sha256;
import dev.tether.treebank.TreebankExampleExtractor;
import dev.tether.treebank.TreebankExamples;
import dev.tether.io.QuadrupleSet;
import dev.tether.model.ModelFile;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TetherModel;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/** {@code tether train}: counts training sources into a new model file. */
final class TrainCommand implements Command {
    @Override
    public String name() {
        return "train";
    }

    @Override
    public String usage() {
        return "train [--quadruples FILE...] [--conllu FILE...] [--corrections SHEET... [--correction-weight W]] [--base MODEL|default] [--skip-malformed] --out MODEL";
    }

    @Override
    public int run(String[] args, PrintStream out, PrintStream err) throws UsageException, IOException {
        CommandArguments a = new CommandArguments(name(), args, 1, Set.of("quadruples", "conllu", "corrections", "correction-weight", "base", "out"), Set.of("skip-malformed"));
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

        ModelTrainer trainer = new ModelTrainer();
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
        }
        int problems = 0;
        for (String f : a.values("corrections")) problems += CorrectionEvents.add(trainer, Path.of(f), correctionWeight, out, err);
        TetherModel model = trainer.build();
        ModelFile.write(model, target);
        out.printf("wrote %s  (model %s, %,.0f quadruples counted%s)%n", target, model.id(), model.quadruples().total(),
                skipped > 0 ? String.format(", %,d malformed lines skipped", skipped) : "");
        return problems > 0 ? Tether.SOME_FAILED : Tether.OK;
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
