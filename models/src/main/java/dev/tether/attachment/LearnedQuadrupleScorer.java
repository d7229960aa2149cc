package dev.tether.attachment;

import dev.tether.counts.QuadrupleCounts;
import dev.tether.ranking.CandidateFeatures;
import dev.tether.ranking.RankerModel;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.Vocabulary;
import dev.tether.vocabulary.WordNormalizer;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;

/**
 * A quadruple scorer learned over the evidence of the back-off ({@link QuadrupleFeatureExtractor}): a logistic
 * regression, fitted by {@link LearnedQuadrupleTrainer} on the model's labelled quadruples with jackknifed counts,
 * that weighs every level of the back-off instead of deciding at the most specific one with any evidence, and reads
 * the thesaurus neighbours' attachment rates when the model has a thesaurus. Its decision names the level the plain
 * back-off would have decided at and that level's counts, with the learned probability. Immutable and thread-safe.
 */
public final class LearnedQuadrupleScorer implements QuadrupleScorer {
    /** Version of the model-file section; bump when the features or the layout change. */
    public static final int VERSION = 1;

    private final RankerModel weights;
    private final QuadrupleFeatureExtractor extractor;
    private final WordNormalizer normalizer;
    private final int neighbours;
    private final ThreadLocal<Scratch> scratch = ThreadLocal.withInitial(Scratch::new);

    private static final class Scratch {
        final CandidateFeatures features = new CandidateFeatures();
        final double[] probabilities = new double[2];
    }

    /**
     * @param weights    the regression's weights over {@link QuadrupleFeature} keys
     * @param neighbours neighbours per word the weights were fitted with (0: no neighbour features)
     */
    public LearnedQuadrupleScorer(RankerModel weights, int neighbours, QuadrupleCounts counts, Thesaurus thesaurus,
                                  WordNormalizer normalizer) {
        this.weights = weights;
        this.neighbours = neighbours;
        this.normalizer = normalizer;
        this.extractor = new QuadrupleFeatureExtractor(counts, neighbours > 0 ? thesaurus : null, neighbours,
                counts.prepositions());
    }

    @Override
    public String name() {
        return "learned";
    }

    public RankerModel weights() {
        return weights;
    }

    /** Neighbours per word the weights read (0: fitted without a thesaurus). */
    public int neighbours() {
        return neighbours;
    }

    /** Decides a quadruple of count ids; a word the counts never saw (id 0) is not looked up in the thesaurus. */
    @Override
    public QuadrupleDecision decide(int v, int n1, int p, int n2) {
        Vocabulary w = extractor.counts().words();
        return decide(v, n1, p, n2, v > 0 ? w.word(v) : null, n1 > 0 ? w.word(n1) : null, n2 > 0 ? w.word(n2) : null);
    }

    /** Decides a quadruple given as words in the text (normalized here), so that unseen words still find neighbours. */
    public QuadrupleDecision decide(Quadruple q) {
        String v = normalizer.verb(q.verb());
        String n1 = normalizer.noun(q.noun1());
        String n2 = normalizer.noun(q.noun2());
        QuadrupleCounts c = extractor.counts();
        return decide(c.words().id(v), c.words().id(n1), c.prepositions().id(normalizer.preposition(q.preposition())),
                c.words().id(n2), v, n1, n2);
    }

    private QuadrupleDecision decide(int v, int n1, int p, int n2, String vk, String n1k, String n2k) {
        Scratch s = scratch.get();
        QuadrupleDecision plain = extractor.extract(Math.max(0, v), Math.max(0, n1), Math.max(0, p), Math.max(0, n2),
                vk, n1k, n2k, s.features);
        weights.probabilities(s.features, s.probabilities);
        double pn = s.probabilities[1];
        return new QuadrupleDecision(pn >= 0.5 ? AttachmentSite.NOUN : AttachmentSite.VERB, pn, plain.basis(),
                plain.nounCount(), plain.count(), Math.log(pn / (1 - pn)));
    }

    /** Writes the section: version, neighbours, weights. */
    public static void write(LearnedQuadrupleScorer scorer, DataOutput out) throws IOException {
        out.writeInt(VERSION);
        out.writeInt(scorer.neighbours);
        scorer.weights.write(out);
    }

    /** Reads a section written by {@link #write}, checking every template; the counts and thesaurus are the model's. */
    public static LearnedQuadrupleScorer read(DataInput in, QuadrupleCounts counts, Thesaurus thesaurus,
                                              WordNormalizer normalizer) throws IOException {
        int version = in.readInt();
        if (version != VERSION) throw new IOException("learned quadruple scorer of version " + version + ", this build reads " + VERSION);
        int neighbours = in.readInt();
        if (neighbours < 0 || neighbours > 10_000) throw new IOException("implausible neighbour count " + neighbours);
        if (neighbours > 0 && thesaurus == null) throw new IOException("the learned quadruple scorer reads neighbours but the model has no thesaurus");
        RankerModel weights = RankerModel.read(in);
        for (int i = 0; i < weights.space().size(); i++) {
            try {
                QuadrupleFeature.of(weights.space().key(i));
            } catch (IllegalArgumentException e) {
                throw new IOException(e.getMessage());
            }
        }
        return new LearnedQuadrupleScorer(weights, neighbours, counts, thesaurus, normalizer);
    }

    /** Reads only the section's version. */
    public static int readVersion(byte[] section) {
        return section.length < 4 ? -1
                : ((section[0] & 0xff) << 24) | ((section[1] & 0xff) << 16) | ((section[2] & 0xff) << 8) | (section[3] & 0xff);
    }
}
