package dev.tether.model;

import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;
import dev.tether.counts.QuadrupleCountsBuilder;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.io.QuadrupleSet;
import dev.tether.vocabulary.WordNormalizer;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

/**
 * Builds a new {@link TetherModel} from training sources. Sources are counted in the order they are added, so the
 * same sources in the same order always give a byte-identical model file. A trainer is single-use and not
 * thread-safe; the model it builds is immutable.
 */
public final class ModelTrainer {
    private final WordNormalizer normalizer = new WordNormalizer();
    private final QuadrupleCountsBuilder quadruples = new QuadrupleCountsBuilder();
    private final List<ModelSource> sources = new ArrayList<>();

    /** Counts every quadruple of {@code set}. */
    public ModelTrainer addQuadruples(QuadrupleSet set) {
        for (LabelledQuadruple lq : set.quadruples()) addQuadruple(lq);
        sources.add(new ModelSource(set.name(), "quadruples", set.quadruples().size(), set.skipped(), set.sha256()));
        return this;
    }

    /** Counts one labelled quadruple (normalized here). */
    public void addQuadruple(LabelledQuadruple lq) {
        Quadruple q = lq.quadruple();
        quadruples.add(normalizer.verb(q.verb()), normalizer.noun(q.noun1()), normalizer.preposition(q.preposition()),
                normalizer.noun(q.noun2()), lq.site(), 1.0);
    }

    /** Adds the counts of an existing model (for example the shipped default) to what is counted here. */
    public ModelTrainer addModel(TetherModel model, String name) {
        if (!model.normalizerVersion().equals(WordNormalizer.VERSION)) {
            throw new IllegalArgumentException(name + " was counted with normalization " + model.normalizerVersion()
                    + ", this build uses " + WordNormalizer.VERSION + "; retrain it from its sources");
        }
        quadruples.addAll(model.quadruples());
        sources.add(new ModelSource(name, "model", (long) model.quadruples().total(), 0, model.id()));
        return this;
    }

    /** Records a source counted by other means (for example a treebank). */
    public void recordSource(ModelSource source) {
        sources.add(source);
    }

    public TetherModel build() {
        QuadrupleCounts counts = quadruples.build();
        try {
            byte[] encoded = ModelFile.encode(WordNormalizer.VERSION, sources, counts);
            return new TetherModel(WordNormalizer.VERSION, sources, counts, ModelFile.fingerprint(encoded));
        } catch (IOException e) {
            throw new UncheckedIOException("encoding a model in memory failed", e);
        }
    }
}
