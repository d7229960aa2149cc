package dev.tether.model;

import dev.tether.attachment.AttachmentQuery;
import dev.tether.attachment.AttachmentRanker;
import dev.tether.attachment.BackedOffScorer;
import dev.tether.attachment.LearnedQuadrupleScorer;
import dev.tether.attachment.LexicalAssociationScorer;
import dev.tether.attachment.QuadrupleScorer;
import dev.tether.attachment.SimilarityBackedOffScorer;
import dev.tether.similarity.Thesaurus;
import dev.tether.attachment.HeadChoice;
import dev.tether.attachment.HeadChoiceScorer;
import dev.tether.coordination.CoordinationRanker;
import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.vocabulary.WordNormalizer;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Optional;

/**
 * A trained model: the counts the scorers read, the normalization they were counted under, and where they came
 * from. Immutable; load it once and share it across threads and engine instances.
 */
public final class TetherModel {
    /** Classpath location of the shipped default model. */
    public static final String BUNDLED_RESOURCE = "/dev/tether/model/default.tether";

    /** Weights of the head-choice score's class and word factors (see {@link HeadChoiceScorer}); tuned on dev data. */
    static final double CLASS_WEIGHT = 1.0;
    static final double WORD_WEIGHT = 1.0;

    private final String normalizerVersion;
    private final List<ModelSource> sources;
    private final QuadrupleCounts quadruples;
    private final HeadChoiceCounts headChoice;
    private final TaggerSection tagger;
    private final String id;
    private final WordNormalizer normalizer = new WordNormalizer();
    private final HeadChoiceScorer headChoiceScorer;
    private final AttachmentRanker attachmentRanker;
    private final CoordinationRanker coordinationRanker;
    private final Thesaurus thesaurus;
    private final QuadrupleScorer quadrupleScorer;
    private final DomainReport domainReport;
    private final LearnedQuadrupleScorer learnedQuadrupleScorer;

    TetherModel(String normalizerVersion, List<ModelSource> sources, QuadrupleCounts quadruples,
                HeadChoiceCounts headChoice, AttachmentRanker attachmentRanker, TaggerSection tagger, Thesaurus thesaurus,
                String id) {
        this(normalizerVersion, sources, quadruples, headChoice, attachmentRanker, tagger, thesaurus, null, id);
    }

    TetherModel(String normalizerVersion, List<ModelSource> sources, QuadrupleCounts quadruples,
                HeadChoiceCounts headChoice, AttachmentRanker attachmentRanker, TaggerSection tagger, Thesaurus thesaurus,
                CoordinationRanker coordinationRanker, String id) {
        this(normalizerVersion, sources, quadruples, headChoice, attachmentRanker, tagger, thesaurus, coordinationRanker,
                null, id);
    }

    TetherModel(String normalizerVersion, List<ModelSource> sources, QuadrupleCounts quadruples,
                HeadChoiceCounts headChoice, AttachmentRanker attachmentRanker, TaggerSection tagger, Thesaurus thesaurus,
                CoordinationRanker coordinationRanker, DomainReport domainReport, String id) {
        this(normalizerVersion, sources, quadruples, headChoice, attachmentRanker, tagger, thesaurus, coordinationRanker,
                domainReport, null, id);
    }

    /** {@code coordinationRanker} is given the model's thesaurus (if any) for its similarity features. */
    TetherModel(String normalizerVersion, List<ModelSource> sources, QuadrupleCounts quadruples,
                HeadChoiceCounts headChoice, AttachmentRanker attachmentRanker, TaggerSection tagger, Thesaurus thesaurus,
                CoordinationRanker coordinationRanker, DomainReport domainReport, LearnedQuadrupleScorer learned, String id) {
        this.learnedQuadrupleScorer = learned;
        this.domainReport = domainReport;
        this.coordinationRanker = coordinationRanker == null ? null : coordinationRanker.withThesaurus(thesaurus);
        this.normalizerVersion = normalizerVersion;
        this.sources = List.copyOf(sources);
        this.quadruples = quadruples;
        this.headChoice = headChoice;
        this.tagger = tagger;
        this.id = id;
        this.headChoiceScorer = new HeadChoiceScorer(headChoice, normalizer, CLASS_WEIGHT, WORD_WEIGHT);
        this.attachmentRanker = attachmentRanker == null ? null : attachmentRanker.withThesaurus(thesaurus);
        this.thesaurus = thesaurus;
        this.quadrupleScorer = unlabelledOnly(sources) ? new LexicalAssociationScorer(quadruples)
                : learned != null ? learned
                : thesaurus == null ? new BackedOffScorer(quadruples)
                : new SimilarityBackedOffScorer(quadruples, thesaurus, normalizer);
    }

    public String normalizerVersion() { return normalizerVersion; }
    public List<ModelSource> sources() { return sources; }
    public QuadrupleCounts quadruples() { return quadruples; }
    public HeadChoiceCounts headChoice() { return headChoice; }
    /** The count-based scorer that chooses among all candidate heads (the baseline of the ranker), built once with the model. */
    public HeadChoiceScorer headChoiceScorer() { return headChoiceScorer; }
    /** The learned attachment ranker, present when the model was trained with head-choice examples. */
    public Optional<AttachmentRanker> attachmentRanker() { return Optional.ofNullable(attachmentRanker); }

    /**
     * The learned coordination ranker, present when the model was trained from treebanks with this version of
     * Tether; without it no coordination decisions are made. It reads the model's thesaurus ({@link #thesaurus()}),
     * if the model has one, for its similarity features.
     */
    public Optional<CoordinationRanker> coordinationRanker() { return Optional.ofNullable(coordinationRanker); }

    /** The model's head choice: the ranker's when it has one, else the count-based score's. */
    public HeadChoice chooseHead(AttachmentQuery q) {
        return attachmentRanker != null ? attachmentRanker.choose(q) : headChoiceScorer.choose(q);
    }
    public WordNormalizer normalizer() { return normalizer; }
    /** The distributional thesaurus the model was trained with ({@code train --thesaurus}), if any. */
    public Optional<Thesaurus> thesaurus() { return Optional.ofNullable(thesaurus); }
    /** Whether every source is unlabelled text (no outcome was ever observed, only inferred). */
    private static boolean unlabelledOnly(List<ModelSource> sources) {
        if (sources.isEmpty()) return false;
        for (ModelSource s : sources) if (!s.kind().equals("raw")) return false;
        return true;
    }

    /**
     * The model's quadruple scorer. A model counted from unlabelled text alone uses lexical association (Hindle &amp;
     * Rooth 1993), the method made for such counts: its estimates compare how often verb and noun take the
     * preposition, which survives the skew of the unambiguous cases towards verbs that defeats the back-off's pooled
     * relative frequencies (quadruple devset: 76.26% against 69.82%, README). Otherwise the learned scorer over the
     * back-off's evidence ({@link LearnedQuadrupleScorer}) when the model was trained with labelled quadruples or
     * treebanks by this version; for older models the back-off smoothed by the thesaurus ({@link SimilarityBackedOffScorer}) when
     * the model has one, else the plain back-off ({@link BackedOffScorer}). Built once; thread-safe.
     */
    public QuadrupleScorer quadrupleScorer() { return quadrupleScorer; }

    /** The learned quadruple scorer, present when the model was trained with labelled quadruples (or treebanks). */
    public Optional<LearnedQuadrupleScorer> learnedQuadrupleScorer() { return Optional.ofNullable(learnedQuadrupleScorer); }
    /**
     * What raw text of the model's domain changed ({@link DomainReport}), for a model trained with {@code --raw} by
     * this version of Tether; empty for other models.
     */
    public Optional<DomainReport> domainReport() { return Optional.ofNullable(domainReport); }
    /** The part-of-speech tagger trained with this model, if it was trained with one (opaque bytes; see {@link TaggerSection}). */
    public Optional<TaggerSection> tagger() { return Optional.ofNullable(tagger); }

    /** A short fingerprint of the model's content (the start of its checksum), recorded with every decision. */
    public String id() { return id; }

    /** The shipped default model, loaded from the classpath once per class loader. */
    public static TetherModel bundled() {
        return Bundled.MODEL;
    }

    private static final class Bundled {
        static final TetherModel MODEL = load();

        private static TetherModel load() {
            try (InputStream in = TetherModel.class.getResourceAsStream(BUNDLED_RESOURCE)) {
                if (in == null) {
                    throw new IllegalStateException("the default model " + BUNDLED_RESOURCE
                            + " is missing from the classpath; rebuild the models module (see DEVELOPERS.md)");
                }
                return ModelFile.read(in, "classpath:" + BUNDLED_RESOURCE);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }
}
