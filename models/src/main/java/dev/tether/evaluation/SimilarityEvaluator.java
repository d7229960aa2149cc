package dev.tether.evaluation;

import dev.tether.candidates.HeadClass;
import dev.tether.io.WordPairReader.WordPair;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.WordNormalizer;
import org.apache.commons.math3.stat.correlation.SpearmansCorrelation;

import java.util.List;

/**
 * Scores a thesaurus against human similarity judgements by Spearman's rank correlation over the pairs it covers,
 * the usual way of scoring a distributional thesaurus (for example on Rubenstein &amp; Goodenough 1965). A pair is
 * covered when both words are in the thesaurus in one class, tried in the order noun, verb, adjective (the judged
 * sets hold words without their class, mostly nouns); its score is the thesaurus's similarity of the two vectors.
 */
public final class SimilarityEvaluator {
    private static final HeadClass[] CLASSES = {HeadClass.NOUN, HeadClass.VERB, HeadClass.ADJECTIVE};
    private final WordNormalizer normalizer = new WordNormalizer();

    public SimilarityEvaluation evaluate(Thesaurus thesaurus, List<WordPair> pairs) {
        double[] human = new double[pairs.size()];
        double[] predicted = new double[pairs.size()];
        int covered = 0;
        for (WordPair p : pairs) {
            double s = similarity(thesaurus, p.first(), p.second());
            if (Double.isNaN(s)) continue;
            human[covered] = p.score();
            predicted[covered] = s;
            covered++;
        }
        double rho = covered < 2 ? Double.NaN : new SpearmansCorrelation().correlation(
                java.util.Arrays.copyOf(human, covered), java.util.Arrays.copyOf(predicted, covered));
        return new SimilarityEvaluation(rho, covered, pairs.size());
    }

    /** The similarity of two surface words, or NaN when the thesaurus lacks either in every class. */
    public double similarity(Thesaurus thesaurus, String first, String second) {
        for (HeadClass c : CLASSES) {
            int a = thesaurus.id(c, key(c, first));
            int b = thesaurus.id(c, key(c, second));
            if (a != Thesaurus.UNKNOWN && b != Thesaurus.UNKNOWN) return thesaurus.similarity(a, b);
        }
        return Double.NaN;
    }

    private String key(HeadClass c, String word) {
        return switch (c) {
            case NOUN -> normalizer.noun(word);
            case VERB -> normalizer.verb(word);
            default -> normalizer.other(word);
        };
    }
}
