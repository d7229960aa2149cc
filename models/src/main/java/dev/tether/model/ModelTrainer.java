package dev.tether.model;

import dev.tether.attachment.AmbiguousReestimation;
import dev.tether.attachment.AttachmentExample;
import dev.tether.attachment.AttachmentFeatureExtractor;
import dev.tether.attachment.AttachmentFeatureFamily;
import dev.tether.attachment.AttachmentQuery;
import dev.tether.attachment.AttachmentRanker;
import dev.tether.attachment.AttachmentRankerTrainer;
import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.CandidateStructure;
import dev.tether.attachment.HeadChoiceScorer;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.LearnedQuadrupleScorer;
import dev.tether.attachment.LearnedQuadrupleTrainer;
import dev.tether.attachment.QuadrupleFeatureExtractor;
import dev.tether.attachment.Quadruple;
import dev.tether.attachment.ReviewedChoice;
import dev.tether.candidates.HeadClass;
import dev.tether.coordination.ConjunctCandidateProposer;
import dev.tether.coordination.CoordinationCounts;
import dev.tether.coordination.CoordinationCountsBuilder;
import dev.tether.coordination.CoordinationExample;
import dev.tether.coordination.CoordinationFeatureExtractor;
import dev.tether.coordination.CoordinationFeatureFamily;
import dev.tether.coordination.CoordinationRanker;
import dev.tether.coordination.CoordinationRankerTrainer;
import dev.tether.similarity.Thesaurus;
import dev.tether.similarity.ThesaurusFile;
import dev.tether.treebank.CoordinationExampleExtractor;
import dev.tether.treebank.TreebankSentence;
import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.HeadChoiceCountsBuilder;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.QuadrupleCountsBuilder;
import dev.tether.counts.RawAttachmentCounts;
import dev.tether.io.QuadrupleSet;
import dev.tether.ranking.RankerModel;
import dev.tether.ranking.RankerTrainer;
import dev.tether.treebank.TreebankExamples;
import dev.tether.vocabulary.WordNormalizer;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Builds a new {@link TetherModel} from training sources. Sources are counted in the order they are added, so the
 * same sources in the same order always give a byte-identical model file. A trainer is single-use and not
 * thread-safe; the model it builds is immutable.
 *
 * <p>When head-choice examples (from treebanks) are among the sources, {@link #build} also trains the attachment
 * ranker. The count statistics that become an example's features are a jackknife over {@value #JACKKNIFE_FOLDS}
 * contiguous folds of the examples: an example's features are read from counts of everything except its own fold
 * (labelled quadruples and base models always count), so the ranker sees counts as they are for text it was not
 * trained on. The shipped model's own counts come from all the data.
 */
public final class ModelTrainer {
    /** Folds of the jackknife that gives training examples their count features. */
    public static final int JACKKNIFE_FOLDS = 5;

    private final WordNormalizer normalizer = new WordNormalizer();
    private final QuadrupleCountsBuilder quadruples = new QuadrupleCountsBuilder();
    private final HeadChoiceCountsBuilder headChoice = new HeadChoiceCountsBuilder();
    private final List<ModelSource> sources = new ArrayList<>();
    // What the jackknife replays per fold: counts that always count, and the examples with their quadruples.
    private final List<TetherModel> baseModels = new ArrayList<>();
    private final List<LabelledQuadruple> fixedQuadruples = new ArrayList<>();
    private final List<AttachmentExample> examples = new ArrayList<>();
    private final List<AttachmentExample> calibrationExamples = new ArrayList<>();
    private int calibrationDecisions;
    private final List<AmbiguousReestimation.Estimate> rawEstimates = new ArrayList<>();
    private final List<Double> rawWeights = new ArrayList<>();
    private final List<RawAttachmentCounts> rawCounts = new ArrayList<>();
    private final List<DomainReport.RawSource> rawSources = new ArrayList<>();
    private final List<String> baseNames = new ArrayList<>();
    private final List<LabelledQuadruple> exampleQuadruples = new ArrayList<>();
    private Set<AttachmentFeatureFamily> families = EnumSet.allOf(AttachmentFeatureFamily.class);
    private RankerTrainer rankerTrainer = new RankerTrainer();
    private boolean rankerWanted = true;
    private TaggerSection tagger;
    private final List<TreebankSentence> coordinationSentences = new ArrayList<>();
    private Set<CoordinationFeatureFamily> coordinationFamilies = EnumSet.allOf(CoordinationFeatureFamily.class);
    private Thesaurus coordinationThesaurus;
    /**
     * The coordination ranker's trainer: its features are fewer and denser than attachment's, and cross-validation on
     * EWT train chose the weakest penalty of the attachment grid, so the grid reaches one step further down.
     */
    private RankerTrainer coordinationTrainer = new RankerTrainer(COORDINATION_STRENGTHS, RankerTrainer.DEFAULT_FOLDS,
            new dev.tether.ranking.Lbfgs(400, 1e-7));
    /** L2 strengths tried for the coordination ranker. */
    public static final double[] COORDINATION_STRENGTHS = {0.1, 0.3, 1, 3};
    private Thesaurus thesaurus;

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
        fixedQuadruples.add(lq);
        countQuadruple(lq, quadruples, headChoice);
    }

    /** Counts {@code lq} into {@code q4}, and into {@code heads} unless it is null. */
    private void countQuadruple(LabelledQuadruple lq, QuadrupleCountsBuilder q4, HeadChoiceCountsBuilder heads) {
        Quadruple q = lq.quadruple();
        String v = normalizer.verb(q.verb());
        String n1 = normalizer.noun(q.noun1());
        String p = normalizer.preposition(q.preposition());
        String n2 = normalizer.noun(q.noun2());
        q4.add(v, n1, p, n2, lq.site(), 1.0);
        if (heads == null) return;
        heads.addLexical(p, v, HeadClass.VERB.ordinal(), n2, lq.site() == AttachmentSite.VERB, 1.0);
        heads.addLexical(p, n1, HeadClass.NOUN.ordinal(), n2, lq.site() == AttachmentSite.NOUN, 1.0);
    }

    /**
     * Counts one head-choice example: every candidate is a trial of its lexical and structural keys, the gold one a
     * hit. An example whose gold head is not among its candidates teaches nothing and is not counted. The example
     * also trains the attachment ranker.
     */
    public void addExample(AttachmentExample example) {
        if (example.gold() < 0) return;
        examples.add(example);
        countExample(example, headChoice);
    }

    /**
     * Head-choice examples as the run time will see them: the treebank's own prepositions with the tags of a tagger
     * that never saw their sentences (the same {@link AttachmentExample#source()} as the example they stand beside).
     * They count nothing and train no weight; the ranker's temperature is fitted on them, each scored by the
     * cross-validation ranker that did not see its training counterpart, so that the stated probabilities match what
     * running text gives rather than what gold tags give. Examples whose source is not a training example's are ignored.
     */
    public ModelTrainer addCalibrationExamples(List<AttachmentExample> asTagged) {
        calibrationExamples.addAll(asTagged);
        return this;
    }

    /** How many calibration decisions fitted the temperature in the last {@link #build} (0: the training decisions did). */
    public int calibrationDecisions() {
        return calibrationDecisions;
    }

    private void countExample(AttachmentExample example, HeadChoiceCountsBuilder heads) {
        AttachmentQuery q = example.query();
        String p = normalizer.preposition(q.preposition());
        String o = normalizer.noun(q.object());
        long[] structure = CandidateStructure.keys(q);
        for (int i = 0; i < q.size(); i++) {
            HeadClass c = q.headClass(i);
            boolean hit = i == example.gold();
            heads.addLexical(p, HeadChoiceScorer.headKey(normalizer, q.head(i), c), c.ordinal(), o, hit, 1.0);
            heads.addStructure(structure[i], hit, 1.0);
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
        baseModels.add(model);
        baseNames.add(name);
        quadruples.addAll(model.quadruples());
        headChoice.addAll(model.headChoice());
        if (tagger == null) tagger = model.tagger().orElse(null);
        if (thesaurus == null) thesaurus = model.thesaurus().orElse(null);
        sources.add(new ModelSource(name, "model", (long) model.quadruples().total(), 0, model.id()));
        return this;
    }

    /**
     * Adds what unlabelled text taught ({@link RawAttachmentCounts}, merged from any number of documents or shards):
     * the unambiguous attachments and the co-occurrence counts, and after {@code rounds} rounds of re-estimation
     * ({@link AmbiguousReestimation}) the ambiguous configurations; every count times {@code weight}, how much one
     * raw event counts against one labelled one (chosen on development data, see {@code RawWeightChoice}). Recorded
     * as a source of kind {@code raw} with its weight; {@code sha256} identifies the counts.
     */
    public ModelTrainer addRawCounts(RawAttachmentCounts raw, String name, double weight, int rounds) {
        if (!(weight >= 0) || Double.isInfinite(weight)) {
            throw new IllegalArgumentException("the weight of raw counts must be a number of at least 0, was " + weight);
        }
        AmbiguousReestimation.Estimate estimate = AmbiguousReestimation.of(raw, rounds);
        if (weight > 0) {
            quadruples.addAll(estimate.quadruples(), weight);
            headChoice.addAll(estimate.headChoice(), weight);
        }
        rawEstimates.add(estimate);
        rawWeights.add(weight);
        rawCounts.add(raw);
        rawSources.add(DomainReport.source(name, raw, estimate, weight, rounds));
        sources.add(new ModelSource(name, "raw", raw.tally().prepositions(), raw.tally().skippedDocuments(),
                dev.tether.io.Sha256.hex(raw.toBytes()), weight));
        return this;
    }

    /**
     * Like {@link #addRawCounts}, with the weight chosen on folds of the labelled quadruples added so far (given and
     * read off treebanks; see {@link RawWeightChoice}); with none, the weight is 1. Add the labelled sources first.
     */
    public RawWeightChoice.Result addRawCountsChoosingWeight(RawAttachmentCounts raw, String name, int rounds) {
        List<LabelledQuadruple> labelled = new ArrayList<>(fixedQuadruples);
        labelled.addAll(exampleQuadruples);
        RawWeightChoice.Result choice;
        if (labelled.isEmpty()) {
            choice = new RawWeightChoice.Result(1.0, new double[0], new double[0], 0, 0);
        } else {
            choice = RawWeightChoice.choose(labelled, baseModels, AmbiguousReestimation.of(raw, rounds).quadruples(), normalizer);
        }
        addRawCounts(raw, name, choice.weight(), rounds);
        return choice;
    }

    /**
     * Counts the training events read off a treebank: every head-choice example, and every classic quadruple among
     * them. {@code name} and {@code sha256} identify the file in the model's list of sources.
     */
    public ModelTrainer addTreebank(TreebankExamples treebank, String name, String sha256) {
        for (AttachmentExample e : treebank.examples()) addExample(e);
        for (LabelledQuadruple q : treebank.quadruples()) {
            exampleQuadruples.add(q);
            countQuadruple(q, quadruples, headChoice);
        }
        sources.add(new ModelSource(name, "treebank", treebank.examples().size(), 0, sha256));
        return this;
    }

    /**
     * Gold trees that train the coordination ranker (with their Penn tags, as the attachment examples are read). Its
     * count features are a jackknife over {@value #JACKKNIFE_FOLDS} contiguous folds of these sentences, like the
     * attachment ranker's.
     */
    public ModelTrainer addCoordinationSentences(List<TreebankSentence> sentences) {
        coordinationSentences.addAll(sentences);
        return this;
    }

    /** The coordination ranker's feature families (all by default); fewer for ablation. */
    public ModelTrainer coordinationFamilies(Set<CoordinationFeatureFamily> chosen) {
        if (chosen.isEmpty()) throw new IllegalArgumentException("the coordination ranker needs at least one feature family");
        this.coordinationFamilies = EnumSet.copyOf(chosen);
        return this;
    }

    /**
     * A thesaurus whose similarities feed the coordination ranker's similarity and composition features at training,
     * in place of the thesaurus the model carries ({@code train --thesaurus}, which is used when this is not set);
     * with neither, those features stay off. At run time the ranker reads the model's own thesaurus.
     */
    public ModelTrainer coordinationThesaurus(Thesaurus thesaurus) {
        this.coordinationThesaurus = thesaurus;
        return this;
    }

    /** The feature families the ranker uses (all by default); fewer for ablation. */
    public ModelTrainer rankerFamilies(Set<AttachmentFeatureFamily> chosen) {
        if (chosen.isEmpty()) throw new IllegalArgumentException("the ranker needs at least one feature family");
        this.families = EnumSet.copyOf(chosen);
        return this;
    }

    /** Replaces the ranker's trainer (L2 strengths, folds, optimizer). */
    public ModelTrainer rankerTrainer(RankerTrainer trainer) {
        this.rankerTrainer = trainer;
        return this;
    }

    /** Whether to train a ranker when there are examples (default yes); without one the count score decides. */
    public ModelTrainer trainRanker(boolean wanted) {
        this.rankerWanted = wanted;
        return this;
    }

    /**
     * The part-of-speech tagger the model will carry; it replaces one taken over from a base model. {@code null}: none
     * (the built-in preprocessing then uses its shipped tagger).
     */
    public ModelTrainer withTagger(TaggerSection tagger) {
        this.tagger = tagger;
        return this;
    }

    /**
     * The distributional thesaurus the model will carry for similarity smoothing ({@link TetherModel#thesaurus()});
     * it replaces one taken over from a base model. {@code null}: none.
     */
    public ModelTrainer withThesaurus(Thesaurus thesaurus) {
        if (thesaurus != null && !thesaurus.normalizerVersion().equals(WordNormalizer.VERSION)) {
            throw new IllegalArgumentException("the thesaurus keys its words with normalization " + thesaurus.normalizerVersion()
                    + ", this build uses " + WordNormalizer.VERSION + "; build it again");
        }
        this.thesaurus = thesaurus;
        return this;
    }

    /** Whether the model will carry a tagger (one set here or taken over from a base model). */
    public boolean hasTagger() {
        return tagger != null;
    }

    public TetherModel build() {
        QuadrupleCounts counts = quadruples.build();
        HeadChoiceCounts heads = headChoice.build();
        AttachmentRanker ranker = null;
        if (rankerWanted && !examples.isEmpty()) {
            ranker = new AttachmentRanker(trainRanker(heads), trainedFamilies(), heads, counts, normalizer);
        } else if (rankerWanted) {
            // No examples of its own: keep the ranker of the (last) base model that has one, over the new counts.
            for (TetherModel base : baseModels) {
                if (base.attachmentRanker().isPresent()) {
                    AttachmentRanker r = base.attachmentRanker().get();
                    checkKeptRankerThesaurus(base, r);
                    ranker = new AttachmentRanker(r.weights(), r.families(), heads, counts, normalizer);
                }
            }
        }
        CoordinationRanker coordination = null;
        if (rankerWanted && !coordinationSentences.isEmpty()) {
            coordination = trainCoordination();
        }
        if (coordination == null && rankerWanted) {
            for (TetherModel base : baseModels) {
                if (base.coordinationRanker().isPresent()) coordination = base.coordinationRanker().get();
            }
        }
        LearnedQuadrupleScorer learned = rankerWanted ? learnedQuadrupleScorer(counts) : null;
        DomainReport report = rawSources.isEmpty() ? null
                : DomainReport.of(rawSources, rawCounts, baseModels, String.join("+", baseNames), counts);
        try {
            byte[] encoded = ModelFile.encode(WordNormalizer.VERSION, sources, counts, heads, ranker, tagger, thesaurus,
                    coordination, report, learned);
            return new TetherModel(WordNormalizer.VERSION, sources, counts, heads, ranker, tagger, thesaurus, coordination,
                    report, learned, ModelFile.fingerprint(encoded));
        } catch (IOException e) {
            throw new UncheckedIOException("encoding a model in memory failed", e);
        }
    }

    /**
     * A ranker kept from a base model learned its similar-words weights on that model's thesaurus; the same weights
     * over another thesaurus's neighbours would weigh evidence they were never fitted to, so that is refused (a
     * treebank trains the ranker again with the new thesaurus).
     */
    private void checkKeptRankerThesaurus(TetherModel base, AttachmentRanker kept) {
        if (!kept.families().contains(AttachmentFeatureFamily.SIMILAR_WORDS)) return;
        Thesaurus before = base.thesaurus().orElse(null);
        if (sameThesaurus(before, thesaurus)) return;
        throw new IllegalStateException("base model " + base.id() + " has a ranker whose similar-words weights were "
                + "learned on its own thesaurus, and this model gets " + (thesaurus == null ? "none" : "another one")
                + "; add a treebank (--conllu) so that the ranker is trained again with the new thesaurus, or leave "
                + "the thesaurus out to keep the base model's");
    }

    private static boolean sameThesaurus(Thesaurus a, Thesaurus b) {
        if (a == b) return true;
        if (a == null || b == null) return false;
        try {
            return java.util.Arrays.equals(ThesaurusFile.toBytes(a), ThesaurusFile.toBytes(b));
        } catch (IOException e) {
            throw new UncheckedIOException("encoding a thesaurus in memory failed", e);
        }
    }

    /**
     * Whether the model will carry a thesaurus that its attachment ranker does not read: a ranker kept from a base
     * model trained without one (the thesaurus then serves the quadruple scorer only).
     */
    public static boolean thesaurusUnusedByRanker(TetherModel model) {
        return model.thesaurus().isPresent() && model.attachmentRanker().isPresent()
                && !model.attachmentRanker().get().families().contains(AttachmentFeatureFamily.SIMILAR_WORDS);
    }

    /**
     * The learned quadruple scorer: fitted on the labelled quadruples (given, and read off treebanks) with features
     * from a jackknife over {@value #JACKKNIFE_FOLDS} contiguous folds of them (base models and raw text always count),
     * reading the model's thesaurus when it has one. With fewer than {@link LearnedQuadrupleTrainer#MIN_QUADRUPLES}
     * labelled quadruples (none, or a handful beside a base model), the scorer of the last base model
     * that has one, over the new counts, unless it read a thesaurus other than this model's; else none.
     */
    private LearnedQuadrupleScorer learnedQuadrupleScorer(QuadrupleCounts counts) {
        List<LabelledQuadruple> labelled = new ArrayList<>(fixedQuadruples);
        labelled.addAll(exampleQuadruples);
        if (labelled.size() < LearnedQuadrupleTrainer.MIN_QUADRUPLES) {
            LearnedQuadrupleScorer kept = null;
            for (TetherModel base : baseModels) {
                if (base.learnedQuadrupleScorer().isEmpty()) continue;
                LearnedQuadrupleScorer s = base.learnedQuadrupleScorer().get();
                if (s.neighbours() > 0 && !sameThesaurus(base.thesaurus().orElse(null), thesaurus)) continue;
                kept = new LearnedQuadrupleScorer(s.weights(), s.neighbours(), counts, thesaurus, normalizer);
            }
            return kept;
        }
        int n = labelled.size();
        int k = Math.min(JACKKNIFE_FOLDS, n);
        int neighbours = thesaurus == null ? 0 : QuadrupleFeatureExtractor.NEIGHBOURS;
        LearnedQuadrupleTrainer trainer = new LearnedQuadrupleTrainer(normalizer);
        for (int f = 0; f < k; f++) {
            int from = (int) ((long) n * f / k);
            int to = (int) ((long) n * (f + 1) / k);
            QuadrupleCountsBuilder q4 = new QuadrupleCountsBuilder();
            for (TetherModel base : baseModels) q4.addAll(base.quadruples());
            for (int r = 0; r < rawEstimates.size(); r++) {
                if (rawWeights.get(r) > 0) q4.addAll(rawEstimates.get(r).quadruples(), rawWeights.get(r));
            }
            for (int j = 0; j < n; j++) if (j < from || j >= to) countQuadruple(labelled.get(j), q4, null);
            QuadrupleFeatureExtractor extractor = new QuadrupleFeatureExtractor(q4.build(), thesaurus, neighbours,
                    counts.prepositions());
            for (int j = from; j < to; j++) trainer.add(labelled.get(j), extractor);
        }
        return trainer.train(neighbours, counts, thesaurus, 2);
    }

    /** The coordination ranker from the treebank sentences, null when they hold no usable coordination. */
    private CoordinationRanker trainCoordination() {
        int n = coordinationSentences.size();
        int k = Math.min(JACKKNIFE_FOLDS, n);
        int[] fold = new int[n];
        CoordinationCountsBuilder builder = new CoordinationCountsBuilder(k);
        for (int j = 0; j < n; j++) {
            fold[j] = (int) ((long) k * j / n);
            builder.add(coordinationSentences.get(j), fold[j]);
        }
        CoordinationCounts all = builder.build();
        CoordinationFeatureExtractor[] extractors = new CoordinationFeatureExtractor[k];
        for (int f = 0; f < k; f++) {
            extractors[f] = new CoordinationFeatureExtractor(all.without(builder.fold(f, all)), coordinationThesaurus(),
                    normalizer, coordinationFamilies);
        }
        CoordinationExampleExtractor examples = new CoordinationExampleExtractor(new ConjunctCandidateProposer());
        CoordinationRankerTrainer events = new CoordinationRankerTrainer();
        for (int j = 0; j < n; j++) {
            for (CoordinationExample e : examples.extract(coordinationSentences.get(j))) events.add(e, extractors[fold[j]]);
        }
        RankerModel[] weights = events.train(coordinationTrainer);
        if (weights == null) return null;
        return new CoordinationRanker(weights[0], weights[1], coordinationFamilies, all, coordinationThesaurus());
    }

    /** The thesaurus of the coordination features: the one given for them, else the one the model will carry. */
    private Thesaurus coordinationThesaurus() {
        return coordinationThesaurus != null ? coordinationThesaurus : thesaurus;
    }

    /** The families the ranker is trained with: the chosen ones, without similar-words when there is no thesaurus. */
    private Set<AttachmentFeatureFamily> trainedFamilies() {
        EnumSet<AttachmentFeatureFamily> used = EnumSet.copyOf(families);
        if (thesaurus == null) used.remove(AttachmentFeatureFamily.SIMILAR_WORDS);
        return used;
    }

    private RankerModel trainRanker(HeadChoiceCounts lexicon) {
        int n = examples.size();
        int k = Math.min(JACKKNIFE_FOLDS, n);
        Map<String, Integer> foldOfSource = new HashMap<>();
        int[] fold = new int[n];
        for (int j = 0; j < n; j++) {
            fold[j] = (int) ((long) k * j / n);
            foldOfSource.put(examples.get(j).source(), fold[j]);
        }
        AttachmentRankerTrainer events = new AttachmentRankerTrainer();
        // The calibration examples of each fold, in their given order, beside the training example of the same source.
        Map<String, Integer> exampleOfSource = new HashMap<>();
        for (int j = 0; j < n; j++) exampleOfSource.putIfAbsent(examples.get(j).source(), j);
        List<List<AttachmentExample>> calibrationOfFold = new ArrayList<>();
        for (int f = 0; f < k; f++) calibrationOfFold.add(new ArrayList<>());
        for (AttachmentExample c : calibrationExamples) {
            Integer j = exampleOfSource.get(c.source());
            if (j != null) calibrationOfFold.get(fold[j]).add(c);
        }
        Map<String, Integer> positionOfSource = new HashMap<>();
        int next = 0;
        for (int f = 0; f < k; f++) {
            QuadrupleCountsBuilder q4 = new QuadrupleCountsBuilder();
            HeadChoiceCountsBuilder hc = new HeadChoiceCountsBuilder();
            for (TetherModel base : baseModels) {
                q4.addAll(base.quadruples());
                hc.addAll(base.headChoice());
            }
            for (int r = 0; r < rawEstimates.size(); r++) {
                if (rawWeights.get(r) == 0) continue;
                q4.addAll(rawEstimates.get(r).quadruples(), rawWeights.get(r));
                hc.addAll(rawEstimates.get(r).headChoice(), rawWeights.get(r));
            }
            for (LabelledQuadruple q : fixedQuadruples) countQuadruple(q, q4, hc);
            for (int j = 0; j < n; j++) if (fold[j] != f) countExample(examples.get(j), hc);
            for (LabelledQuadruple q : exampleQuadruples) {
                Integer of = foldOfSource.get(q.source());
                if (of == null || of != f) countQuadruple(q, q4, hc);
            }
            AttachmentFeatureExtractor extractor = new AttachmentFeatureExtractor(hc.build(), q4.build(), lexicon, normalizer, trainedFamilies(),
                    thesaurus);
            for (; next < n && fold[next] == f; next++) {
                int position = events.add(examples.get(next), 1.0, extractor);
                if (position >= 0) positionOfSource.putIfAbsent(examples.get(next).source(), position);
            }
            for (AttachmentExample c : calibrationOfFold.get(f)) {
                events.addCalibration(c, positionOfSource.getOrDefault(c.source(), -1), extractor);
            }
        }
        calibrationDecisions = events.calibrationDecisions();
        return events.train(rankerTrainer);
    }
}
