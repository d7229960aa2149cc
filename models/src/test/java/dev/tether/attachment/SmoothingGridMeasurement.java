package dev.tether.attachment;

import dev.tether.io.QuadrupleReader;
import dev.tether.model.ModelFile;
import dev.tether.model.TetherModel;
import dev.tether.similarity.Thesaurus;
import dev.tether.similarity.ThesaurusFile;

import java.nio.file.Path;
import java.util.List;

/**
 * Not a test: prints the quadruple accuracy of {@link SimilarityBackedOffScorer} over a grid of its settings, beside
 * the plain back-off on the same items. Arguments: MODEL THESAURUS QUADRUPLES (a development set). Run from the
 * repository root after {@code mvn -pl models test-compile}:
 * {@code java -cp "models/target/test-classes:models/target/classes:$(cat cp.txt)" dev.tether.attachment.SmoothingGridMeasurement ...}
 */
public final class SmoothingGridMeasurement {
    public static void main(String[] args) throws Exception {
        TetherModel model = ModelFile.read(Path.of(args[0]));
        Thesaurus thesaurus = ThesaurusFile.read(Path.of(args[1]));
        List<LabelledQuadruple> items = new QuadrupleReader(false).read(Path.of(args[2])).quadruples();
        BackedOffScorer plain = new BackedOffScorer(model.quadruples());
        int base = 0;
        for (LabelledQuadruple lq : items) {
            Quadruple q = lq.quadruple();
            int[] ids = model.quadruples().encode(model.normalizer(), q.verb(), q.noun1(), q.preposition(), q.noun2());
            if (plain.decide(ids[0], ids[1], ids[2], ids[3]).site() == lq.site()) base++;
        }
        System.out.printf("plain back-off %.2f%% of %d%n", 100.0 * base / items.size(), items.size());
        System.out.println("k\tminTriples\tpower\tpairBlend\taccuracy\tgain");
        for (int k : new int[] {20, 50}) {
            for (double min : new double[] {5, 10, 20, 50, 1000}) {
                for (double power : new double[] {1}) {
                    for (double blend : new double[] {0, 1, 4}) {
                        SimilarityBackedOffScorer s = new SimilarityBackedOffScorer(model.quadruples(), thesaurus,
                                model.normalizer(), k, min, power, blend);
                        int right = 0;
                        for (LabelledQuadruple lq : items) if (s.decide(lq.quadruple()).site() == lq.site()) right++;
                        System.out.printf("%d\t%.0f\t%.0f\t%.1f\t%.2f%%\t%+.2f%n", k, min, power, blend,
                                100.0 * right / items.size(), 100.0 * (right - base) / items.size());
                    }
                }
            }
        }
    }
}
