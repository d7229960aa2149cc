package dev.tether.preprocessing;

import java.nio.file.Path;
import java.util.List;

import dev.tether.model.LoadedModels;
import dev.tether.model.TetherModel;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;
import opennlp.tools.postag.POSEvaluator;
import opennlp.tools.postag.POSModel;
import opennlp.tools.postag.POSSample;
import opennlp.tools.postag.POSTagFormat;
import opennlp.tools.postag.POSTaggerME;

/**
 * One-off measurement: the share of a treebank's gold words (its own tokens) that a tagger gives the gold Penn
 * Treebank tag of column 5, for the shipped OpenNLP tagger and for the tagger of each model given. Run by hand from
 * the repository root after {@code mvn -B -q -o -DskipTests -pl annotators -am test-compile}:
 * {@code java -cp "annotators/target/classes:annotators/target/test-classes:annotators/target/lib/*"
 * dev.tether.preprocessing.TaggerAccuracyMeasurement ../shared/datasets/ud-ewt/en_ewt-ud-dev.conllu MODEL...}.
 */
public final class TaggerAccuracyMeasurement {
    public static void main(String[] args) throws Exception {
        List<TreebankSentence> sentences = ConlluReader.readAll(Path.of(args[0]));
        report("shipped OpenNLP tagger " + EnglishPreprocessingModels.POS_MODEL,
                EnglishPreprocessingModels.shared().posModel(), sentences);
        for (int i = 1; i < args.length; i++) {
            TetherModel model = LoadedModels.get(args[i]);
            POSModel tagger = ModelTaggers.of(model).orElse(null);
            if (tagger == null) System.out.println(args[i] + ": no tagger section");
            else report(args[i] + " (model " + model.id() + ")", tagger, sentences);
        }
    }

    /** Accuracy of {@code model} on the gold words and tags of {@code sentences}. */
    static double accuracy(POSModel model, List<TreebankSentence> sentences) {
        POSEvaluator evaluator = new POSEvaluator(new POSTaggerME(model, POSTagFormat.PENN));
        for (TreebankSentence s : sentences) evaluator.evaluateSample(new POSSample(s.forms(), s.xposTags()));
        return evaluator.getWordAccuracy();
    }

    private static void report(String name, POSModel model, List<TreebankSentence> sentences) {
        long words = sentences.stream().mapToLong(TreebankSentence::size).sum();
        System.out.printf("%-60s %.2f%% of %,d words%n", name, 100 * accuracy(model, sentences), words);
    }
}
