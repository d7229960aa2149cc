package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.HeadChoiceCounts.Part;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.StructureKey;
import dev.tether.counts.TupleCounts;
import dev.tether.counts.TupleKey;
import dev.tether.ranking.CandidateFeatures;
import dev.tether.ranking.FeatureKey;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.PennTags;
import dev.tether.vocabulary.WordNormalizer;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * Turns an {@link AttachmentQuery} into the ranker's features, one sparse vector per candidate (templates in
 * {@link AttachmentFeature}). Count statistics are read from {@code statistics}; word identities (head word,
 * preposition) are keyed by the ids of {@code lexicon}. At run time both are the model's own counts; at training the
 * statistics of a treebank event come from the counts of the other folds (a jackknife), so the ranker learns how far
 * to trust counts on words it has not seen, while the identities stay those of the whole model. With a thesaurus,
 * the {@link AttachmentFeatureFamily#SIMILAR_WORDS} features pool the counts of the {@link #NEIGHBOURS} nearest
 * neighbours of the candidate and of the object, each case weighted by the neighbour's similarity, keyed by how much
 * the exact counts of the same level saw (nothing, a few cases, more), so that the ranker learns how far to trust the
 * neighbours where the exact counts are thin. Immutable and thread-safe; the
 * per-decision work uses integer ids and the caller's reusable buffer.
 */
public final class AttachmentFeatureExtractor {
    private static final Part[] PARTS = Part.values();
    private static final double CLIP = 8;
    /** Neighbours per word pooled by the similar-words features (chosen against 10 and 50 by cross-validated log-loss on EWT train; README). */
    public static final int NEIGHBOURS = 20;
    /** Exact cases below which the exact counts count as little evidence (the similar-words features' middle key). */
    private static final double FEW_CASES = 5;

    private final HeadChoiceCounts statistics;
    private final HeadChoiceCounts lexicon;
    private final QuadrupleCounts quadruples;
    private final WordNormalizer normalizer;
    private final HeadChoiceScorer countScorer;
    private final BackedOffScorer backedOff;
    private final LexicalAssociationScorer association;
    private final boolean[] on = new boolean[AttachmentFeatureFamily.values().length];
    private final String[] lightVerbKeys = new String[AttachmentFeature.LIGHT_VERBS.length];
    /** Null without a thesaurus (or with the similar-words family off). */
    private final Thesaurus thesaurus;
    /** The thesaurus's words' ids in {@code statistics}, and back. */
    private final ThesaurusIds statisticsIds;
    private final SimilarityBackedOffScorer similarQuadruples;
    /** The two-word pools summed once, and which neighbours the three-word pools need to look up. */
    private final SimilarWordPools pools;

    public AttachmentFeatureExtractor(HeadChoiceCounts statistics, QuadrupleCounts quadruples, HeadChoiceCounts lexicon,
                                      WordNormalizer normalizer, Set<AttachmentFeatureFamily> families) {
        this(statistics, quadruples, lexicon, normalizer, families, null);
    }

    /** As the five-argument constructor; {@code thesaurus} (may be null) feeds the similar-words features. */
    public AttachmentFeatureExtractor(HeadChoiceCounts statistics, QuadrupleCounts quadruples, HeadChoiceCounts lexicon,
                                      WordNormalizer normalizer, Set<AttachmentFeatureFamily> families, Thesaurus thesaurus) {
        this.statistics = statistics;
        this.lexicon = lexicon;
        this.quadruples = quadruples;
        this.normalizer = normalizer;
        this.countScorer = new HeadChoiceScorer(statistics, normalizer, 1.0, 1.0);
        this.backedOff = new BackedOffScorer(quadruples);
        this.association = new LexicalAssociationScorer(quadruples);
        for (AttachmentFeatureFamily f : families) on[f.ordinal()] = true;
        for (int i = 1; i < lightVerbKeys.length; i++) lightVerbKeys[i] = normalizer.verb(AttachmentFeature.LIGHT_VERBS[i]);
        if (thesaurus != null && families.contains(AttachmentFeatureFamily.SIMILAR_WORDS)) {
            this.thesaurus = thesaurus;
            this.statisticsIds = new ThesaurusIds(statistics.words(), thesaurus);
            this.similarQuadruples = new SimilarityBackedOffScorer(quadruples, thesaurus, normalizer, NEIGHBOURS,
                    SimilarityBackedOffScorer.MIN_TRIPLE_TRIALS, SimilarityBackedOffScorer.POWER, SimilarityBackedOffScorer.PAIR_BLEND);
            this.pools = new SimilarWordPools(statistics, thesaurus, statisticsIds, NEIGHBOURS);
        } else {
            this.thesaurus = null;
            this.statisticsIds = null;
            this.similarQuadruples = null;
            this.pools = null;
        }
    }

    /** The pools summed at load, null without a thesaurus (for tests). */
    SimilarWordPools pools() {
        return pools;
    }

    /** The thesaurus the similar-words features read, if they are on. */
    public Optional<Thesaurus> thesaurus() {
        return Optional.ofNullable(thesaurus);
    }

    public Set<AttachmentFeatureFamily> families() {
        EnumSet<AttachmentFeatureFamily> s = EnumSet.noneOf(AttachmentFeatureFamily.class);
        for (AttachmentFeatureFamily f : AttachmentFeatureFamily.values()) if (on[f.ordinal()]) s.add(f);
        return s;
    }

    /**
     * Fills {@code out} with the features of every candidate of {@code q} and returns the count-based choice
     * (today's scorer) on the same statistics, for the evidence and as a baseline.
     */
    public HeadChoice extract(AttachmentQuery q, CandidateFeatures out) {
        // The count-based score reads the same count entries the features need; it hands them over, so that each
        // table is probed once per candidate.
        double[][] factors = new double[q.size()][3];
        long[][] entries = new long[q.size()][HeadChoiceScorer.STRUCTURE_ENTRY + 1];
        String[] headKeys = new String[q.size()];
        int[] headIds = new int[q.size()];
        HeadChoice base = countScorer.choose(q, factors, entries, headKeys, headIds);
        out.reset();
        int n = q.size();
        String prepositionKey = normalizer.preposition(q.preposition());
        String objectKey = normalizer.noun(q.object());
        int lp = lexicon.prepositions().id(prepositionKey);
        int lo = lexicon.words().id(objectKey);
        int objectKind = objectKind(q.objectTag());
        long[] structure = CandidateStructure.keys(q);

        double quadrupleNoun = Double.NaN;
        int quadrupleBasis = 0;
        double la = Double.NaN;
        double similarNoun = Double.NaN;
        int similarBasis = 0;
        boolean quadrupleFeatures = on(AttachmentFeatureFamily.BACKED_OFF) || on(AttachmentFeatureFamily.ASSOCIATION) || thesaurus != null;
        if (q.quadrupleVerb() >= 0 && q.quadrupleNoun() >= 0 && quadrupleFeatures) {
            // The quadruple's words are normalized once; the smoothed estimate needs the keys of words the counts never saw.
            String verbKey = normalizer.verb(q.head(q.quadrupleVerb()));
            String nounKey = normalizer.noun(q.head(q.quadrupleNoun()));
            int v = quadruples.words().id(verbKey);
            int n1 = quadruples.words().id(nounKey);
            int p = quadruples.prepositions().id(prepositionKey);
            int n2 = quadruples.words().id(objectKey);
            QuadrupleDecision plain = null;
            if (on(AttachmentFeatureFamily.BACKED_OFF) || on(AttachmentFeatureFamily.ASSOCIATION)) {
                QuadrupleDecision d = backedOff.decide(v, n1, p, n2);
                plain = d;
                quadrupleNoun = d.nounProbability();
                quadrupleBasis = d.basis().ordinal();
                double s = association.decide(v, n1, p, n2).score();
                la = Math.max(-CLIP, Math.min(CLIP, s));
            }
            if (thesaurus != null) {
                QuadrupleDecision d = similarQuadruples.decide(v, n1, p, n2, verbKey, nounKey, objectKey, plain);
                if (d.basis() == DecisionBasis.SIMILAR_QUADRUPLES || d.basis() == DecisionBasis.SIMILAR_TRIPLES) {
                    similarNoun = d.nounProbability();
                    similarBasis = d.basis().ordinal();
                }
            }
        }
        int sp = 0;
        int so = 0;
        int objectEntry = Thesaurus.UNKNOWN;
        if (thesaurus != null) {
            sp = Math.max(0, statistics.prepositions().id(prepositionKey));
            so = Math.max(0, statistics.words().id(objectKey));
            objectEntry = statisticsIds.entry(HeadClass.NOUN, so, objectKey);
        }
        double[] pool = new double[2];

        int[] seenOfClass = new int[HeadClass.values().length];
        for (int i = 0; i < n; i++) {
            out.nextCandidate();
            HeadClass hc = q.headClass(i);
            int c = hc.ordinal();
            int rank = seenOfClass[c]++;
            // Filled by the count score when the preposition is known to the counts; else worked out here.
            String headKey = headKeys[i] != null ? headKeys[i] : HeadChoiceScorer.headKey(normalizer, q.head(i), hc);
            if (on(AttachmentFeatureFamily.COUNT_SCORE)) {
                out.add(AttachmentFeature.COUNT_SCORE_LOG.key(0, 0, c), Math.max(-20, Math.log(base.probability(i))));
                for (int k = 0; k < 3; k++) {
                    out.add(AttachmentFeature.COUNT_SCORE_FACTOR.key(k, 0, c), Math.max(-20, Math.min(20, Math.log(factors[i][k]))));
                }
                out.add(AttachmentFeature.COUNT_LEVEL.key(base.evidence(i).ordinal(), 0, c), 1);
            }
            if (on(AttachmentFeatureFamily.BACKED_OFF)) {
                for (Part part : PARTS) {
                    long entry = entries[i][part.ordinal()];
                    if (entry == TupleCounts.ABSENT) {
                        out.add(AttachmentFeature.LEVEL_UNSEEN.key(part.ordinal(), 0, c), 1);
                    } else {
                        double hits = TupleCounts.hitsIn(entry);
                        double trials = TupleCounts.trialsIn(entry);
                        out.add(AttachmentFeature.LEVEL_LOG_ODDS.key(part.ordinal(), 0, c), Math.log((hits + 0.5) / (trials - hits + 0.5)));
                        out.add(AttachmentFeature.LEVEL_TRIALS.key(part.ordinal(), 0, c), Math.log1p(trials));
                    }
                }
                long se = entries[i][HeadChoiceScorer.STRUCTURE_ENTRY];
                if (se != TupleCounts.ABSENT) {
                    double hits = TupleCounts.hitsIn(se);
                    double trials = TupleCounts.trialsIn(se);
                    out.add(AttachmentFeature.STRUCTURE_LOG_ODDS.key(0, 0, c), Math.log((hits + 0.5) / (trials - hits + 0.5)));
                }
            }
            int side = i == q.quadrupleVerb() ? 0 : i == q.quadrupleNoun() ? 1 : -1;
            if (side >= 0 && !Double.isNaN(quadrupleNoun)) {
                if (on(AttachmentFeatureFamily.BACKED_OFF)) {
                    double pn = Math.max(1e-3, Math.min(1 - 1e-3, quadrupleNoun));
                    double logit = Math.log(pn / (1 - pn));
                    out.add(AttachmentFeature.QUADRUPLE_ESTIMATE.key(quadrupleBasis, side, 0), side == 1 ? logit : -logit);
                }
                if (on(AttachmentFeatureFamily.ASSOCIATION)) {
                    out.add(AttachmentFeature.ASSOCIATION_SCORE.key(side, 0, 0), side == 0 ? la : -la);
                }
            }
            if (side >= 0 && !Double.isNaN(similarNoun)) {
                double pn = Math.max(1e-3, Math.min(1 - 1e-3, similarNoun));
                double logit = Math.log(pn / (1 - pn));
                out.add(AttachmentFeature.SIMILAR_QUADRUPLE_ESTIMATE.key(similarBasis, side, 0), side == 1 ? logit : -logit);
            }
            if (thesaurus != null && sp > 0) {
                int sh = headKeys[i] != null ? headIds[i] : Math.max(0, statistics.words().id(headKey));
                int headEntry = statisticsIds.entry(hc, sh, headKey);
                int headPool = headEntry == Thesaurus.UNKNOWN ? -1 : pools.head(headEntry, sp, c);
                int objectPool = objectEntry == Thesaurus.UNKNOWN ? -1 : pools.object(objectEntry, sp, c);
                for (int slot = AttachmentFeature.SIMILAR_HEAD; slot <= AttachmentFeature.SIMILAR_CLASS_OBJECT; slot++) {
                    if (!pooled(slot, sp, c, sh, headEntry, headPool, so, objectEntry, objectPool,
                            entries[i][Part.HEAD.ordinal()], entries[i][Part.CLASS_OBJECT.ordinal()], pool)) continue;
                    int seen = seenBucket(entries[i][exactPart(slot).ordinal()]);
                    out.add(AttachmentFeature.SIMILAR_LOG_ODDS.key(slot, seen, c), Math.log((pool[0] + 0.5) / (pool[1] - pool[0] + 0.5)));
                    out.add(AttachmentFeature.SIMILAR_TRIALS.key(slot, seen, c), Math.log1p(pool[1]));
                }
            }
            if (on(AttachmentFeatureFamily.CLASS_PREPOSITION)) {
                out.add(AttachmentFeature.CLASS_WITH_PREPOSITION.key(lp, 0, c), 1);
                if (rank == 0) out.add(AttachmentFeature.NEAREST_OF_CLASS.key(lp, 0, c), 1);
                out.add(AttachmentFeature.PREPOSITION_DISTANCE.key(lp, StructureKey.distanceBucket(q.distance(i)), c), 1);
            }
            if (on(AttachmentFeatureFamily.POSITION)) {
                out.add(AttachmentFeature.DISTANCE.key(StructureKey.distanceBucket(q.distance(i)), 0, c), 1);
                out.add(AttachmentFeature.RANK_IN_CLASS.key(Math.min(rank, 3), 0, c), 1);
                long s = structure[i];
                out.add(AttachmentFeature.STRUCTURE.key(TupleKey.part(s, 3, 0), TupleKey.part(s, 3, 1), TupleKey.part(s, 3, 2)), 1);
                out.add(AttachmentFeature.PREPOSITION_STRUCTURE.key(lp, TupleKey.part(s, 3, 0) * 128 + TupleKey.part(s, 3, 1),
                        TupleKey.part(s, 3, 2)), 1);
                if (q.distance(i) <= 0) out.add(AttachmentFeature.AFTER_PHRASE.key(0, 0, c), 1);
            }
            if (on(AttachmentFeatureFamily.PUNCTUATION) && q.punctuated(i)) {
                out.add(AttachmentFeature.PUNCTUATION_BETWEEN.key(i == 0 ? 1 : 0, 0, c), 1);
            }
            int tag = PennTags.id(q.tag(i));
            if (on(AttachmentFeatureFamily.TAGS)) {
                out.add(AttachmentFeature.CANDIDATE_TAG.key(tag, 0, c), 1);
                out.add(AttachmentFeature.OBJECT_TAG.key(PennTags.id(q.objectTag()), 0, c), 1);
                out.add(AttachmentFeature.PREPOSITION_TAG.key(lp, tag, 0), 1);
            }
            if (on(AttachmentFeatureFamily.LIGHT_VERBS) && hc == HeadClass.VERB) {
                int light = lightVerb(headKey);
                if (light > 0) {
                    out.add(AttachmentFeature.LIGHT_VERB.key(light, 0, 0), 1);
                    out.add(AttachmentFeature.LIGHT_VERB.key(light, lp, 0), 1);
                }
            }
            if (on(AttachmentFeatureFamily.PRONOUN_PROPER)) {
                String t = q.tag(i);
                int kind = t.startsWith("PRP") || t.equals("WP") || t.equals("WDT") ? 1 : t.startsWith("NNP") ? 2 : 0;
                if (kind > 0) {
                    out.add(AttachmentFeature.PRONOUN_OR_NAME.key(kind, 0, 0), 1);
                    out.add(AttachmentFeature.PRONOUN_OR_NAME.key(kind, lp, 0), 1);
                }
            }
            if (on(AttachmentFeatureFamily.HEAD_WORDS)) {
                int lh = lexicon.words().id(headKey);
                if (lh > 0) out.add(AttachmentFeature.HEAD_WORD.key(lh, lp, c), 1);
            }
            if (on(AttachmentFeatureFamily.OBJECT_CLASS)) {
                out.add(AttachmentFeature.OBJECT_KIND.key(objectKind, 0, c), 1);
                out.add(AttachmentFeature.OBJECT_KIND_WITH_PREPOSITION.key(objectKind, lp, c), 1);
                if (lo > 0) out.add(AttachmentFeature.OBJECT_WORD.key(lo, lp, c), 1);
            }
        }
        return base;
    }

    /** The exact count level a similar-words pool stands in for. */
    private static Part exactPart(int slot) {
        switch (slot) {
            case AttachmentFeature.SIMILAR_HEAD: return Part.HEAD;
            case AttachmentFeature.SIMILAR_CLASS_OBJECT: return Part.CLASS_OBJECT;
            default: return Part.HEAD_OBJECT;
        }
    }

    private static int seenBucket(long entry) {
        if (entry == TupleCounts.ABSENT) return 0;
        return TupleCounts.trialsIn(entry) < FEW_CASES ? 1 : 2;
    }

    /**
     * What {@link #pool} gives, the same doubles, from the pools summed at load ({@link SimilarWordPools}): the
     * two-word slots are one lookup, and the three-word slots look up only the neighbours that have two-word cases.
     * {@code headPool} and {@code objectPool} are the pools of the candidate and of the object for this preposition
     * and class (-1: none); {@code headPair} and {@code objectPair} the exact entries of the candidate with the
     * preposition and of its class with the object ({@link TupleCounts#ABSENT}: none), without which no neighbour
     * can have a three-word entry either.
     */
    boolean pooled(int slot, int sp, int c, int sh, int headEntry, int headPool, int so, int objectEntry, int objectPool,
                   long headPair, long objectPair, double[] out) {
        out[0] = 0;
        out[1] = 0;
        switch (slot) {
            case AttachmentFeature.SIMILAR_HEAD:
                if (headPool < 0) return false;
                out[0] = pools.headHits(headPool);
                out[1] = pools.headTrials(headPool);
                return out[1] > 0;
            case AttachmentFeature.SIMILAR_CLASS_OBJECT:
                if (objectPool < 0) return false;
                out[0] = pools.objectHits(objectPool);
                out[1] = pools.objectTrials(objectPool);
                return out[1] > 0;
            case AttachmentFeature.SIMILAR_HEAD_WITH_OBJECT:
                if (headEntry == Thesaurus.UNKNOWN || so == 0) return false;
                if (objectPair == TupleCounts.ABSENT && pools.pairsHold()) return false;
                return poolTriples(headEntry, pools.mask(true, headPool), statistics.lexical(sp, Part.HEAD_OBJECT), c, sh, so, true, out);
            default:
                if (objectEntry == Thesaurus.UNKNOWN || sh == 0) return false;
                if (headPair == TupleCounts.ABSENT && pools.pairsHold()) return false;
                return poolTriples(objectEntry, pools.mask(false, objectPool), statistics.lexical(sp, Part.HEAD_OBJECT), c, sh, so, false, out);
        }
    }

    /** The three-word pool over the neighbours of {@code entry} in {@code mask}, in neighbour order (as {@link #pool}). */
    private boolean poolTriples(int entry, long mask, TupleCounts table, int c, int sh, int so, boolean byHead, double[] out) {
        int k = Math.min(NEIGHBOURS, thesaurus.neighbourCount(entry));
        for (long m = mask; m != 0; m &= m - 1) {
            int j = Long.numberOfTrailingZeros(m);
            if (j >= k) break;
            double s = thesaurus.neighbourScore(entry, j);
            if (!(s > 0)) continue;
            int w = statisticsIds.countId(thesaurus.neighbourId(entry, j));
            if (w == 0) continue;
            long e = table.find(byHead ? TupleKey.of(w, c + 1, so) : TupleKey.of(sh, c + 1, w));
            if (e == TupleCounts.ABSENT) continue;
            out[0] += s * TupleCounts.hitsIn(e);
            out[1] += s * TupleCounts.trialsIn(e);
        }
        return out[1] > 0;
    }

    /**
     * Pools into {@code out} (hits, cases) the counts of one similar-words slot over the neighbours of the candidate
     * ({@code headEntry}) or of the object ({@code objectEntry}), each case weighted by similarity; returns whether
     * any neighbour had cases. {@code contributions}, when given, receives "neighbour (weighted cases)" per neighbour
     * that had some, for the evidence.
     */
    boolean pool(int slot, int sp, int c, int sh, int headEntry, int so, int objectEntry, double[] out,
                         List<double[]> contributions) {
        out[0] = 0;
        out[1] = 0;
        boolean byHead = slot == AttachmentFeature.SIMILAR_HEAD || slot == AttachmentFeature.SIMILAR_HEAD_WITH_OBJECT;
        int entry = byHead ? headEntry : objectEntry;
        if (entry == Thesaurus.UNKNOWN) return false;
        if (slot == AttachmentFeature.SIMILAR_HEAD_WITH_OBJECT && so == 0) return false;
        if (slot == AttachmentFeature.SIMILAR_OBJECT && sh == 0) return false;
        TupleCounts table = statistics.lexical(sp, exactPart(slot));
        int k = Math.min(NEIGHBOURS, thesaurus.neighbourCount(entry));
        for (int j = 0; j < k; j++) {
            double s = thesaurus.neighbourScore(entry, j);
            if (!(s > 0)) continue;
            int w = statisticsIds.countId(thesaurus.neighbourId(entry, j));
            if (w == 0) continue;
            long key;
            switch (slot) {
                case AttachmentFeature.SIMILAR_HEAD: key = TupleKey.of(w, c + 1); break;
                case AttachmentFeature.SIMILAR_HEAD_WITH_OBJECT: key = TupleKey.of(w, c + 1, so); break;
                case AttachmentFeature.SIMILAR_OBJECT: key = TupleKey.of(sh, c + 1, w); break;
                default: key = TupleKey.of(c + 1, w);
            }
            long e = table.find(key);
            if (e == TupleCounts.ABSENT) continue;
            out[0] += s * TupleCounts.hitsIn(e);
            out[1] += s * TupleCounts.trialsIn(e);
            if (contributions != null) contributions.add(new double[] {thesaurus.neighbourId(entry, j), s * TupleCounts.trialsIn(e)});
        }
        return out[1] > 0;
    }

    /**
     * The neighbours whose counts fed feature {@code key} of candidate {@code i} (a similar-words feature), heaviest
     * first, at most {@code limit}, as "word (weighted cases)"; the quadruple estimate's own neighbours for
     * {@link AttachmentFeature#SIMILAR_QUADRUPLE_ESTIMATE}. Empty for other features. For the evidence, not the hot path.
     */
    List<String> neighboursBehind(long key, AttachmentQuery q, int i, int limit) {
        List<String> names = new ArrayList<>();
        if (thesaurus == null) return names;
        AttachmentFeature template = AttachmentFeature.of(key);
        if (template == AttachmentFeature.SIMILAR_QUADRUPLE_ESTIMATE) {
            List<String> deciders = similarQuadruples.explain(new Quadruple(q.head(q.quadrupleVerb()), q.head(q.quadrupleNoun()),
                    q.preposition(), q.object()));
            return deciders.subList(0, Math.min(limit, deciders.size()));
        }
        if (template != AttachmentFeature.SIMILAR_LOG_ODDS && template != AttachmentFeature.SIMILAR_TRIALS) return names;
        HeadClass hc = q.headClass(i);
        String headKey = HeadChoiceScorer.headKey(normalizer, q.head(i), hc);
        String objectKey = normalizer.noun(q.object());
        int sp = Math.max(0, statistics.prepositions().id(normalizer.preposition(q.preposition())));
        if (sp == 0) return names;
        List<double[]> contributions = new ArrayList<>();
        pool(FeatureKey.a(key), sp, hc.ordinal(), Math.max(0, statistics.words().id(headKey)),
                thesaurus.id(hc, headKey), Math.max(0, statistics.words().id(objectKey)), thesaurus.id(HeadClass.NOUN, objectKey),
                new double[2], contributions);
        contributions.sort((x, y) -> x[1] != y[1] ? Double.compare(y[1], x[1]) : Double.compare(x[0], y[0]));
        for (int j = 0; j < Math.min(limit, contributions.size()); j++) {
            StringBuilder b = new StringBuilder().append(thesaurus.key((int) contributions.get(j)[0])).append(" (");
            names.add(AttachmentRanker.twoDecimals(contributions.get(j)[1], b).append(')').toString());
        }
        return names;
    }

    private boolean on(AttachmentFeatureFamily f) {
        return on[f.ordinal()];
    }

    private int lightVerb(String verbKey) {
        for (int i = 1; i < lightVerbKeys.length; i++) if (lightVerbKeys[i].equals(verbKey)) return i;
        return 0;
    }

    /** Index into {@link AttachmentFeature#OBJECT_KINDS} for the object's Penn tag. */
    static int objectKind(String tag) {
        if (tag.startsWith("PRP")) return 1;
        if (tag.startsWith("NNP")) return 2;
        if (tag.equals("CD")) return 3;
        if (tag.equals("VBG")) return 4;
        if (tag.startsWith("W")) return 5;
        if (tag.startsWith("NN")) return 6;
        return 0;
    }
}
