package dev.tether.model;

import dev.tether.attachment.AttachmentExample;
import dev.tether.attachment.AttachmentQuery;
import dev.tether.attachment.CandidateStructure;
import dev.tether.attachment.HeadChoiceScorer;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.ReviewedChoice;
import dev.tether.candidates.HeadClass;
import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.HeadChoiceCountsBuilder;
import dev.tether.attachment.Quadruple;
import dev.tether.counts.QuadrupleCountsBuilder;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.io.QuadrupleSet;
import dev.tether.treebank.TreebankExamples;
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
    private final HeadChoiceCountsBuilder headChoice = new HeadChoiceCountsBuilder();
    private final List<ModelSource> sources = new ArrayList<>();

    /** Counts every quadruple of {@code set}. */
    public ModelTrainer addQuadruples(QuadrupleSet set) {
        for (LabelledQuadruple lq : set.quadruples()) addQuadruple(lq);
        sources.add(new ModelSource(set.name(), "quadruples", set.quadruples().size(), set.skipped(), set.sha256()));
        return this;
    }

    /**
     * Counts one labelled quadruple (normalized here): into the quadruple counts, and into the lexical head-choice
     * counts as a choice between two candidates, the verb and the first noun. It adds nothing to the structural
     * counts, since a bare quadruple says nothing about positions in a sentence.
     */
    public void addQuadruple(LabelledQuadruple lq) {
        Quadruple q = lq.quadruple();
        String v = normalizer.verb(q.verb());
        String n1 = normalizer.noun(q.noun1());
        String p = normalizer.preposition(q.preposition());
        String n2 = normalizer.noun(q.noun2());
        quadruples.add(v, n1, p, n2, lq.site(), 1.0);
        headChoice.addLexical(p, v, HeadClass.VERB.ordinal(), n2, lq.site() == dev.tether.attachment.AttachmentSite.VERB, 1.0);
        headChoice.addLexical(p, n1, HeadClass.NOUN.ordinal(), n2, lq.site() == dev.tether.attachment.AttachmentSite.NOUN, 1.0);
    }

    /**
     * Counts one head-choice example: every candidate is a trial of its lexical and structural keys, the gold one a
     * hit. An example whose gold head is not among its candidates teaches nothing and is not counted.
     */
    public void addExample(AttachmentExample example) {
        if (example.gold() < 0) return;
        AttachmentQuery q = example.query();
        String p = normalizer.preposition(q.preposition());
        String o = normalizer.noun(q.object());
        long[] structure = CandidateStructure.keys(q);
        for (int i = 0; i < q.size(); i++) {
            HeadClass c = q.headClass(i);
            boolean hit = i == example.gold();
            headChoice.addLexical(p, HeadChoiceScorer.headKey(normalizer, q.head(i), c), c.ordinal(), o, hit, 1.0);
            headChoice.addStructure(structure[i], hit, 1.0);
        }
    }

    /**
     * Counts decisions a person reviewed as lexical head-choice events: for each, every offered head is a trial of
     * its word with the preposition and object (and of its class), the reviewer's choice the hit, each counted
     * {@code weight} times. No structural counts: a reviewed line carries words, not positions. Recorded as a source
     * of kind {@code corrections}.
     */
    public ModelTrainer addReviewedChoices(List<ReviewedChoice> choices, String name, String sha256) {
        for (ReviewedChoice r : choices) {
            String p = normalizer.preposition(r.preposition());
            String o = normalizer.noun(r.object());
            for (int i = 0; i < r.heads().size(); i++) {
                HeadClass c = r.classes().get(i);
                headChoice.addLexical(p, HeadChoiceScorer.headKey(normalizer, r.heads().get(i), c), c.ordinal(), o,
                        i == r.chosen(), r.weight());
            }
        }
        sources.add(new ModelSource(name, "corrections", choices.size(), 0, sha256));
        return this;
    }

    /** Adds the counts of an existing model (for example the shipped default) to what is counted here. */
    public ModelTrainer addModel(TetherModel model, String name) {
        if (!model.normalizerVersion().equals(WordNormalizer.VERSION)) {
            throw new IllegalArgumentException(name + " was counted with normalization " + model.normalizerVersion()
                    + ", this build uses " + WordNormalizer.VERSION + "; retrain it from its sources");
        }
        quadruples.addAll(model.quadruples());
        headChoice.addAll(model.headChoice());
        sources.add(new ModelSource(name, "model", (long) model.quadruples().total(), 0, model.id()));
        return this;
    }

    /**
     * Counts the training events read off a treebank: every head-choice example, and every classic quadruple among
     * them. {@code name} and {@code sha256} identify the file in the model's list of sources.
     */
    public ModelTrainer addTreebank(TreebankExamples treebank, String name, String sha256) {
        for (AttachmentExample e : treebank.examples()) addExample(e);
        for (LabelledQuadruple q : treebank.quadruples()) addQuadruple(q);
        sources.add(new ModelSource(name, "treebank", treebank.examples().size(), 0, sha256));
        return this;
    }

    public TetherModel build() {
        QuadrupleCounts counts = quadruples.build();
        HeadChoiceCounts heads = headChoice.build();
        try {
            byte[] encoded = ModelFile.encode(WordNormalizer.VERSION, sources, counts, heads);
            return new TetherModel(WordNormalizer.VERSION, sources, counts, heads, ModelFile.fingerprint(encoded));
        } catch (IOException e) {
            throw new UncheckedIOException("encoding a model in memory failed", e);
        }
    }
}
