package dev.tether.evaluation;

import dev.tether.attachment.AttachmentFeatureFamily;
import dev.tether.candidates.HeadCandidateProposer;
import dev.tether.io.QuadrupleReader;
import dev.tether.io.QuadrupleSet;
import dev.tether.model.ModelFile;
import dev.tether.model.ModelTrainer;
import dev.tether.model.TaggerSection;
import dev.tether.preprocessing.TreebankTaggerTrainer;
import dev.tether.model.TetherModel;
import dev.tether.pipeline.TetherPipeline;
import dev.tether.ranking.Lbfgs;
import dev.tether.ranking.RankerModel;
import dev.tether.ranking.RankerTrainer;
import dev.tether.similarity.Thesaurus;
import dev.tether.similarity.ThesaurusFile;
import dev.tether.treebank.TreebankExampleExtractor;
import dev.tether.treebank.TreebankExamples;
import org.apache.uima.analysis_engine.AnalysisEngine;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;

/**
 * A measurement, not a test: trains the default model's sources (RRR training quadruples of Ratnaparkhi, Reynar
 * &amp; Roukos 1994; UD English EWT train, Silveira et al. 2014; the thesaurus of {@code test-corpora/data/thesaurus})
 * with each ranker feature family removed in turn, and
 * with 25/50/75/100% of the EWT training examples, and scores every model on EWT dev end to end (raw text) and with
 * gold tags, beside the count-based score of the same run. Every model carries the same tagger, trained once on EWT
 * train as the default model's is. Reads the dev split from {@code ../shared/datasets}.
 *
 * <pre>
 * mvn -q -pl test-corpora -am test-compile
 * java -cp ... dev.tether.evaluation.RankerAblation [--quick] [ablation|curve|full]...
 * </pre>
 * {@code --quick} trains with the L2 strength fixed at 10 (the value cross-validation chooses on the full data)
 * instead of cross-validating, for exploration; the README's table is made without it. See DEVELOPERS.md.
 */
public final class RankerAblation {
    private static TaggerSection tagger;
    private static Thesaurus thesaurus;

    private RankerAblation() {
    }

    public static void main(String[] args) throws Exception {
        Path root = Files.exists(Path.of("test-corpora")) ? Path.of(".") : Path.of("..");
        Path dev = root.resolve("../shared/datasets/ud-ewt/en_ewt-ud-dev.conllu");
        boolean quick = List.of(args).contains("--quick");
        List<String> what = new ArrayList<>(List.of(args));
        what.remove("--quick");
        if (what.isEmpty()) what = List.of("full", "ablation", "curve");
        QuadrupleSet rrr = new QuadrupleReader(false).read(root.resolve("test-corpora/data/rrr/training"));
        TreebankExamples ewt = new TreebankExampleExtractor(new HeadCandidateProposer())
                .extract(root.resolve("test-corpora/data/ud-ewt/en_ewt-ud-train.conllu.gz"));
        TreebankExamples devGold = new TreebankExampleExtractor(new HeadCandidateProposer()).extract(dev);
        // Every model carries the default model's tagger (trained once on EWT train), so only the ranker differs.
        TreebankTaggerTrainer taggerTrainer = new TreebankTaggerTrainer();
        taggerTrainer.add(root.resolve("test-corpora/data/ud-ewt/en_ewt-ud-train.conllu.gz"));
        tagger = taggerTrainer.train();
        thesaurus = ThesaurusFile.read(root.resolve("test-corpora/data/thesaurus/raw-text.thesaurus"));
        System.out.printf("%-28s %9s %9s %9s %9s %9s %9s%n", "configuration", "e2e", "e2e-count", "gold-tags", "gold-count",
                "cv-loss", "train-s");
        for (String w : what) {
            if (w.equals("full")) run("all families", EnumSet.allOf(AttachmentFeatureFamily.class), 1.0, rrr, ewt, devGold, dev, quick);
            if (w.equals("ablation")) {
                for (AttachmentFeatureFamily f : AttachmentFeatureFamily.values()) {
                    EnumSet<AttachmentFeatureFamily> s = EnumSet.allOf(AttachmentFeatureFamily.class);
                    s.remove(f);
                    run("without " + f.label(), s, 1.0, rrr, ewt, devGold, dev, quick);
                }
            }
            if (w.equals("curve")) {
                for (double share : new double[] {0.25, 0.5, 0.75, 1.0}) {
                    run(String.format(Locale.ROOT, "%.0f%% of EWT train", 100 * share), EnumSet.allOf(AttachmentFeatureFamily.class),
                            share, rrr, ewt, devGold, dev, quick);
                }
            }
        }
    }

    /** The held-out log-loss, on folds of the training decisions, of the L2 strength the trainer chose. */
    private static double chosenLogLoss(TetherModel model) {
        RankerModel w = model.attachmentRanker().orElseThrow().weights();
        for (RankerTrainer.Trial t : w.trials()) if (t.l2() == w.l2()) return t.logLoss();
        throw new IllegalStateException("no cross-validation trial for the chosen L2 " + w.l2());
    }

    private static void run(String name, EnumSet<AttachmentFeatureFamily> families, double share, QuadrupleSet rrr,
                            TreebankExamples ewt, TreebankExamples devGold, Path dev, boolean quick) throws Exception {
        long start = System.nanoTime();
        ModelTrainer trainer = new ModelTrainer().rankerFamilies(families).withTagger(tagger).withThesaurus(thesaurus);
        if (quick) trainer.rankerTrainer(new RankerTrainer(new double[] {10}, 1, new Lbfgs(400, 1e-7)));
        trainer.addQuadruples(rrr);
        trainer.addTreebank(share < 1 ? ewt.firstShare(share) : ewt, "en_ewt-ud-train.conllu.gz", "-");
        TetherModel model = trainer.build();
        double seconds = (System.nanoTime() - start) / 1e9;
        GoldTagEvaluation gold = new GoldTagEvaluator().evaluate(model, devGold);
        Path file = Files.createTempFile("ablation", ".tether");
        try {
            ModelFile.write(model, file);
            AnalysisEngine pipeline = TetherPipeline.createForRawText(file.toString());
            RunningTextEvaluation e2e;
            try {
                e2e = new RunningTextEvaluator(pipeline, model).evaluate(dev);
            } finally {
                pipeline.destroy();
            }
            System.out.printf(Locale.ROOT, "%-28s %8.2f%% %8.2f%% %8.2f%% %8.2f%% %9.4f %9.1f%n", name, 100 * e2e.attachment().value(),
                    100 * e2e.baselines().get(RunningTextEvaluation.COUNT_SCORE).value(), 100 * gold.attachment().value(),
                    100 * gold.comparisons().get(GoldTagEvaluation.COUNT_SCORE).value(), chosenLogLoss(model), seconds);
        } finally {
            Files.deleteIfExists(file);
        }
    }
}
