package dev.tether.coordination;

import dev.tether.candidates.HeadClass;
import dev.tether.ranking.CandidateFeatures;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.PennTags;
import dev.tether.vocabulary.Vocabulary;
import dev.tether.vocabulary.WordNormalizer;
import gnu.trove.map.hash.TIntDoubleHashMap;

import java.util.EnumSet;
import java.util.Set;

/**
 * Turns a {@link CoordinationQuery} into the ranker's features (templates in {@link CoordinationFeature}): for the
 * choice of conjunct heads, one sparse vector per candidate pair; for the scope of a modifier, two candidates, "not
 * shared" (no features: the reference) and "shared". Counts come from {@code statistics} (at training, the counts of
 * the other folds); the thesaurus is optional: without one the similarity and composition families give nothing,
 * and a thesaurus of neighbour lists only ({@link Thesaurus#hasVectors}) counts as none: the similarity of any two
 * conjunct heads needs the vectors. Immutable and thread-safe (each thread keeps the codes of the last sentence it was asked about).
 */
public final class CoordinationFeatureExtractor {
    private static final double CLIP = 8;

    private final CoordinationStatistics statistics;
    private final Thesaurus thesaurus;
    private final CoordinationWords keys;
    private final WordNormalizer normalizer;
    private final boolean[] on = new boolean[CoordinationFeatureFamily.values().length];

    public CoordinationFeatureExtractor(CoordinationStatistics statistics, Thesaurus thesaurus, WordNormalizer normalizer,
                                        Set<CoordinationFeatureFamily> families) {
        this.statistics = statistics;
        this.thesaurus = withVectors(thesaurus);
        this.normalizer = normalizer;
        this.keys = new CoordinationWords(normalizer);
        for (CoordinationFeatureFamily f : families) on[f.ordinal()] = true;
    }

    public Set<CoordinationFeatureFamily> families() {
        EnumSet<CoordinationFeatureFamily> s = EnumSet.noneOf(CoordinationFeatureFamily.class);
        for (CoordinationFeatureFamily f : CoordinationFeatureFamily.values()) if (on[f.ordinal()]) s.add(f);
        return s;
    }

    public boolean hasThesaurus() { return thesaurus != null; }

    /** {@code t} when it keeps its vectors, else null: the coordination features read similarities of any pair. */
    static Thesaurus withVectors(Thesaurus t) {
        return t != null && t.hasVectors() ? t : null;
    }

    private boolean on(CoordinationFeatureFamily f) { return on[f.ordinal()]; }

    /**
     * Word kinds, tag ids and lower-cased words (filled as asked for) of one sentence. The coordinators of a sentence
     * come as queries over the same arrays (which callers must not change, {@link CoordinationQuery}), so they share
     * these, and the work per sentence stays linear in its length however many coordinators it has.
     */
    private static final class SentenceCodes {
        String[] words;
        String[] tags;
        byte[] kinds;
        int[] tagIds;
        String[] lower;
    }

    private final ThreadLocal<SentenceCodes> sentenceCodes = ThreadLocal.withInitial(SentenceCodes::new);

    private SentenceCodes codesOf(String[] w, String[] t) {
        SentenceCodes c = sentenceCodes.get();
        if (c.words != w || c.tags != t) {
            c.words = w;
            c.tags = t;
            c.kinds = new byte[t.length];
            c.tagIds = new int[t.length];
            for (int k = 0; k < t.length; k++) {
                c.kinds[k] = ConjunctCandidateProposer.kind(t[k]);
                c.tagIds[k] = PennTags.id(t[k]);
            }
            c.lower = new String[w.length];
        }
        return c;
    }

    /** Fills {@code out} with one candidate per pair of {@code q}. */
    public void extractPairs(CoordinationQuery q, CandidateFeatures out) {
        out.reset();
        String[] w = q.words();
        String[] t = q.tags();
        CoordinatorCandidates cc = q.candidates();
        int c = cc.coordinator();
        int coordinator = CoordinationFeature.coordinator(w[c]);
        Vocabulary vocabulary = statistics.words();
        SentenceCodes codes = codesOf(w, t);
        byte[] kinds = codes.kinds;
        int[] tagIds = codes.tagIds;
        String[] lower = codes.lower;
        int[] rankOf = new int[HeadClass.values().length * ConjunctCandidateProposer.MAX_RIGHT];
        int lastRight = -2;
        int readingIndex = -1;
        // How many candidates of each class each reading has, for the rank counted from the far end.
        int[] classCount = new int[HeadClass.values().length * cc.size()];
        int[] readingOf = new int[cc.size()];
        for (int i = 0, r = -1, last = -2; i < cc.size(); i++) {
            if (cc.pair(i).right() != last) {
                last = cc.pair(i).right();
                r++;
            }
            readingOf[i] = r;
            classCount[r * 4 + cc.pair(i).leftClass().ordinal()]++;
        }
        for (int i = 0; i < cc.size(); i++) {
            ConjunctPair p = cc.pair(i);
            if (p.right() != lastRight) {
                lastRight = p.right();
                readingIndex++;
                java.util.Arrays.fill(rankOf, 0);
            }
            out.nextCandidate();
            int lc = p.leftClass().ordinal();
            int rc = p.rightClass().ordinal();
            int pairClass = lc * 4 + rc;
            int lt = tagIds[p.left()];
            int rt = tagIds[p.right()];
            int rank = rankOf[lc]++;
            boolean rightClause = p.rightClass() == HeadClass.VERB && ownSubject(t, c, p.right());
            boolean rightDeterminer = opensWithDeterminer(t, p);
            if (on(CoordinationFeatureFamily.PARALLELISM)) {
                out.add(CoordinationFeature.CLASS_PAIR.key(lc, rc, Math.min(readingIndex, 3)), 1);
                out.add(CoordinationFeature.TAG_PAIR.key(lt, rt, 0), 1);
                if (lt == rt) out.add(CoordinationFeature.SAME_TAG.key(0, 0, lc), 1);
                out.add(CoordinationFeature.TAG_SEQUENCE_OVERLAP.key(0, 0, pairClass),
                        tagOverlap(tagIds, p.leftBegin(), p.leftEnd(), p.rightBegin(), p.rightEnd()));
                out.add(CoordinationFeature.LENGTHS.key(lengthBucket(p.leftEnd() - p.leftBegin() + 1),
                        lengthBucket(p.rightEnd() - p.rightBegin() + 1), pairClass), 1);
                String lw = lowerCase(w, lower, p.left());
                String rw = lowerCase(w, lower, p.right());
                if (lw.length() > 3 && rw.length() > 3 && lw.regionMatches(lw.length() - 3, rw, rw.length() - 3, 3)) {
                    out.add(CoordinationFeature.SAME_SUFFIX.key(0, 0, pairClass), 1);
                }
                if (lw.equals(rw)) out.add(CoordinationFeature.SAME_WORD.key(0, 0, pairClass), 1);
                int leftPrevious = p.left() > 0 ? tagIds[p.left() - 1] : 0;
                int rightPrevious = tagIds[p.right() - 1];
                out.add(CoordinationFeature.PREVIOUS_TAGS.key(leftPrevious, rightPrevious, pairClass), 1);
                if (p.rightClass() == HeadClass.NOUN) {
                    boolean groupEnd = p.right() + 1 >= w.length || !ConjunctCandidateProposer.isNounish(kinds[p.right() + 1]);
                    out.add(CoordinationFeature.RIGHT_SHAPE.key((rightDeterminer ? 2 : 0) + (groupEnd ? 1 : 0), 0, pairClass), 1);
                }
            }
            int li = vocabulary.id(keys.key(w[p.left()], t[p.left()]));
            int ri = vocabulary.id(keys.key(w[p.right()], t[p.right()]));
            if (on(CoordinationFeatureFamily.ASSOCIATION)) {
                int pair = li > 0 && ri > 0 ? statistics.count(CoordinationCounts.pair(li, p.leftClass(), ri, p.rightClass()))
                        + statistics.count(CoordinationCounts.pair(ri, p.rightClass(), li, p.leftClass())) : 0;
                if (pair > 0) out.add(CoordinationFeature.PAIR_COUNT.key(0, 0, pairClass), Math.log1p(pair));
                else if (li > 0 && ri > 0) out.add(CoordinationFeature.PAIR_UNSEEN.key(0, 0, pairClass), 1);
                out.add(CoordinationFeature.LEFT_CONJUNCT_RATE.key(0, 0, lc), conjunctRate(li, p.leftClass()));
                out.add(CoordinationFeature.RIGHT_CONJUNCT_RATE.key(0, 0, rc), conjunctRate(ri, p.rightClass()));
            }
            if (on(CoordinationFeatureFamily.DISTANCE)) {
                out.add(CoordinationFeature.DISTANCE.key(distanceBucket(c - p.left()), 0, pairClass), 1);
                out.add(CoordinationFeature.RANK.key(Math.min(rank, 3), lc == rc ? 1 : 0, pairClass), 1);
                int fromStart = classCount[readingOf[i] * 4 + lc] - rank - 1;
                out.add(CoordinationFeature.RANK_FROM_START.key(Math.min(fromStart, 2), lc == rc ? 1 : 0, pairClass), 1);
                out.add(CoordinationFeature.CLAUSE_RANK_FROM_START.key(Math.min(fromStart, 2), rightClause ? 1 : 0, pairClass), 1);
                boolean groupEnd = p.left() + 1 >= w.length || ConjunctCandidateProposer.classOfTag(t[p.left() + 1]) != HeadClass.NOUN;
                if (groupEnd) out.add(CoordinationFeature.GROUP_END.key(0, 0, lc), 1);
                int verbs = 0;
                for (int k = p.left() + 1; k < c; k++) if (t[k].startsWith("VB") || t[k].equals("MD")) verbs++;
                out.add(CoordinationFeature.VERBS_BETWEEN.key(Math.min(verbs, 3), 0, pairClass), 1);
            }
            if (on(CoordinationFeatureFamily.PARALLELISM)) {
                boolean proper = t[p.left()].startsWith("NNP");
                boolean properBefore = p.left() > 0 && t[p.left() - 1].startsWith("NNP");
                boolean properAfter = p.left() + 1 < w.length && t[p.left() + 1].startsWith("NNP");
                int position = !proper ? 0 : properBefore ? 2 : properAfter ? 1 : 0;
                out.add(CoordinationFeature.GROUP_POSITION.key(position, 0, pairClass), 1);
                int leftPlace = namePlace(t, p.left());
                int rightPlace = namePlace(t, p.right());
                if (leftPlace + rightPlace > 0) out.add(CoordinationFeature.NAME_POSITIONS.key(leftPlace, rightPlace, 0), 1);
            }
            if (on(CoordinationFeatureFamily.PUNCTUATION)) {
                int commas = 0;
                boolean inner = false;
                for (int k = p.left() + 1; k < c; k++) {
                    if (t[k].equals(",")) commas++;
                    if (t[k].equals("CC")) inner = true;
                }
                out.add(CoordinationFeature.COMMAS.key(Math.min(commas, 3), t[c - 1].equals(",") ? 1 : 0, pairClass), 1);
                if (p.middle().length > 0) {
                    out.add(CoordinationFeature.LIST.key(0, 0, pairClass), 1);
                    if (p.leftBegin() == 0 || !t[p.leftBegin() - 1].equals(",")) out.add(CoordinationFeature.LIST_FIRST.key(0, 0, pairClass), 1);
                }
                if (inner) out.add(CoordinationFeature.INNER_COORDINATOR.key(0, 0, pairClass), 1);
                if (insideList(cc, i)) out.add(CoordinationFeature.INSIDE_LIST.key(0, 0, pairClass), 1);
                if (afterCoordinator(kinds, p)) out.add(CoordinationFeature.LEFT_AFTER_COORDINATOR.key(0, 0, pairClass), 1);
            }
            if (on(CoordinationFeatureFamily.STRUCTURE)) {
                out.add(CoordinationFeature.COORDINATOR.key(coordinator, 0, pairClass), 1);
                if (rightClause) {
                    out.add(CoordinationFeature.RIGHT_CLAUSE.key(0, 0, pairClass), 1);
                }
                if (p.leftClass() == HeadClass.VERB && subordinate(w, t, p.left())) {
                    out.add(CoordinationFeature.LEFT_SUBORDINATE.key(rightClause ? 1 : 0, 0, pairClass), 1);
                }
                int before = p.leftBegin() - 1;
                out.add(CoordinationFeature.LEFT_CONTEXT.key(before >= 0 ? tagIds[before] : 0, 0, pairClass), 1);
                int leftNext = p.left() + 1 < w.length ? tagIds[p.left() + 1] : 0;
                out.add(CoordinationFeature.LEFT_NEXT_TAG.key(leftNext, 0, pairClass), 1);
                int rightNext = p.right() + 1 < w.length ? tagIds[p.right() + 1] : 0;
                out.add(CoordinationFeature.RIGHT_NEXT_TAG.key(rightNext, 0, pairClass), 1);
                if (p.leftClass() == HeadClass.VERB && auxiliaryBeforeVerb(w, kinds, p.left(), c)) {
                    out.add(CoordinationFeature.LEFT_AUXILIARY.key(0, 0, pairClass), 1);
                }
                out.add(CoordinationFeature.PREDICATES.key(leftPredicate(w, kinds, p.left()),
                        rightPredicate(w, kinds, c, p.right()), pairClass), 1);
                if (p.leftClass() == HeadClass.NOUN) {
                    out.add(CoordinationFeature.LEFT_PHRASE.key(prepositionBefore(w, kinds, p.left()),
                            (ofAfter(w, p.left()) ? 2 : 0) + (rightDeterminer ? 1 : 0), pairClass), 1);
                }
                if (p.rightClass() == HeadClass.NOUN) {
                    int k = p.right() + 1;
                    while (k < w.length && (t[k].startsWith("RB") || t[k].equals("MD"))) k++;
                    if (k < w.length && (t[k].equals("VBD") || t[k].equals("VBZ") || t[k].equals("VBP") || t[k].equals("MD")
                            || k > p.right() + 1 && t[k].startsWith("VB"))) {
                        out.add(CoordinationFeature.RIGHT_SUBJECT_OF_VERB.key(0, 0, pairClass), 1);
                    }
                }
            }
            if (thesaurus != null && (on(CoordinationFeatureFamily.SIMILARITY) || on(CoordinationFeatureFamily.COMPOSITION))) {
                int a = thesaurusId(w[p.left()], t[p.left()]);
                int b = thesaurusId(w[p.right()], t[p.right()]);
                if (on(CoordinationFeatureFamily.SIMILARITY)) {
                    if (a >= 0 && b >= 0 && p.leftClass() == p.rightClass()) {
                        out.add(CoordinationFeature.HEAD_SIMILARITY.key(0, 0, pairClass), thesaurus.similarity(a, b));
                    } else {
                        out.add(CoordinationFeature.HEAD_SIMILARITY_UNKNOWN.key(0, 0, pairClass), 1);
                    }
                }
                if (on(CoordinationFeatureFamily.COMPOSITION)) {
                    double[] cos = composedSimilarity(w, t, p);
                    out.add(CoordinationFeature.ADDITIVE_COMPOSITION.key(0, 0, pairClass), cos[0]);
                    out.add(CoordinationFeature.MULTIPLICATIVE_COMPOSITION.key(0, 0, pairClass), cos[1]);
                }
            }
        }
    }

    /** Fills {@code out} with the two readings of modifier {@code m} of pair {@code p}: not shared (0), shared (1). */
    public void extractScope(CoordinationQuery q, ConjunctPair p, ScopeCandidate m, CandidateFeatures out) {
        out.reset();
        out.nextCandidate();
        out.nextCandidate();
        String[] w = q.words();
        String[] t = q.tags();
        int c = q.candidates().coordinator();
        int kind = m.kind().ordinal();
        int lc = p.leftClass().ordinal();
        int rc = p.rightClass().ordinal();
        int near = m.kind().before() ? p.left() : p.right();
        int far = m.kind().before() ? p.right() : p.left();
        if (on(CoordinationFeatureFamily.STRUCTURE)) {
            out.add(CoordinationFeature.SHARED.key(kind, lc, rc), 1);
            out.add(CoordinationFeature.SHARED_COORDINATOR.key(kind, CoordinationFeature.coordinator(w[c]), 0), 1);
            out.add(CoordinationFeature.SHARED_TAG.key(kind, PennTags.id(t[m.token()]), 0), 1);
            if (farHasOwn(t, p, m, c)) out.add(CoordinationFeature.SHARED_DESPITE_OWN.key(kind, 0, 0), 1);
        }
        if (on(CoordinationFeatureFamily.PARALLELISM)) {
            if (t[p.left()].equals(t[p.right()])) out.add(CoordinationFeature.SHARED_SAME_TAG.key(kind, 0, 0), 1);
            int farLength = m.kind().before() ? p.rightEnd() - p.rightBegin() + 1 : p.leftEnd() - p.leftBegin() + 1;
            out.add(CoordinationFeature.SHARED_FAR_LENGTH.key(kind, lengthBucket(farLength), 0), 1);
        }
        if (on(CoordinationFeatureFamily.DISTANCE)) {
            out.add(CoordinationFeature.SHARED_DISTANCE.key(kind, distanceBucket(p.right() - p.left()), 0), 1);
        }
        if (on(CoordinationFeatureFamily.PUNCTUATION) && c > 0 && t[c - 1].equals(",")) {
            out.add(CoordinationFeature.SHARED_COMMA.key(kind, 0, 0), 1);
        }
        if (on(CoordinationFeatureFamily.ASSOCIATION)) {
            Vocabulary vocabulary = statistics.words();
            int mi = m.kind() == ModifierKind.PREPOSITIONAL && m.preposition() >= 0
                    ? vocabulary.id(keys.preposition(w[m.preposition()])) : vocabulary.id(keys.key(w[m.token()], t[m.token()]));
            int table = m.kind() == ModifierKind.PREPOSITIONAL ? CoordinationCounts.PREPOSITION : CoordinationCounts.MODIFIER;
            int part = m.kind() == ModifierKind.PREPOSITIONAL ? 0 : kind;
            int fi = vocabulary.id(keys.key(w[far], t[far]));
            int ni = vocabulary.id(keys.key(w[near], t[near]));
            if (mi > 0) {
                out.add(CoordinationFeature.SHARED_FAR_ASSOCIATION.key(kind, 0, 0),
                        fi > 0 ? Math.log1p(statistics.count(CoordinationCounts.key(table, mi, fi, part))) : 0);
                out.add(CoordinationFeature.SHARED_NEAR_ASSOCIATION.key(kind, 0, 0),
                        ni > 0 ? Math.log1p(statistics.count(CoordinationCounts.key(table, mi, ni, part))) : 0);
            }
        }
        if (thesaurus != null && on(CoordinationFeatureFamily.SIMILARITY)) {
            int a = thesaurusId(w[p.left()], t[p.left()]);
            int b = thesaurusId(w[p.right()], t[p.right()]);
            if (a >= 0 && b >= 0 && p.leftClass() == p.rightClass()) {
                out.add(CoordinationFeature.SHARED_SIMILARITY.key(kind, 0, 0), thesaurus.similarity(a, b));
            }
        }
    }

    /**
     * How the first head {@code k} predicates a clause: 1 a verb, 2 a noun or adjective after a copula ("were all
     * American citizens"), 3 a copula itself (a form of "be" before its predicate; UD makes the predicate the head), 0 none.
     */
    static int leftPredicate(String[] w, byte[] kinds, int k) {
        byte kind = kinds[k];
        if (ConjunctCandidateProposer.isVerb(kind) || kind == ConjunctCandidateProposer.MODAL) return isCopula(w, kinds, k) ? 3 : 1;
        if (!(ConjunctCandidateProposer.isNounish(kind) || kind == ConjunctCandidateProposer.ADJECTIVE)) return 0;
        int j = ConjunctCandidateProposer.groupBegin(kinds, k) - 1;
        while (j >= 0 && kinds[j] == ConjunctCandidateProposer.ADVERB) j--;
        return j >= 0 && ConjunctCandidateProposer.isVerb(kinds[j]) && ConjunctCandidateProposer.isOneOf(w[j], ConjunctCandidateProposer.FORMS_OF_BE) ? 2 : 0;
    }

    /** How the last head predicates a clause after coordinator {@code c}: 1 a verb, 2 a predicate after a copula, 0 none. */
    static int rightPredicate(String[] w, byte[] kinds, int c, int right) {
        if (ConjunctCandidateProposer.isVerb(kinds[right]) || kinds[right] == ConjunctCandidateProposer.MODAL) return 1;
        for (int k = c + 1; k < right; k++) {
            if (ConjunctCandidateProposer.isVerb(kinds[k]) && ConjunctCandidateProposer.isOneOf(w[k], ConjunctCandidateProposer.FORMS_OF_BE)) return 2;
        }
        return 0;
    }

    /** A form of "be" before a predicate (an adjective, a noun group or a phrase), not an auxiliary nor existential. */
    static boolean isCopula(String[] w, byte[] kinds, int k) {
        if (!ConjunctCandidateProposer.isOneOf(w[k], ConjunctCandidateProposer.FORMS_OF_BE)) return false;
        for (int j = k - 1; j >= 0 && j >= k - 3; j--) {
            if (kinds[j] == ConjunctCandidateProposer.EXISTENTIAL) return false;
            if (!(kinds[j] == ConjunctCandidateProposer.MODAL || kinds[j] == ConjunctCandidateProposer.ADVERB)) break;
        }
        int p = k + 1;
        while (p < kinds.length && kinds[p] == ConjunctCandidateProposer.ADVERB) p++;
        if (p >= kinds.length) return false;
        byte next = kinds[p];
        return next == ConjunctCandidateProposer.ADJECTIVE || next == ConjunctCandidateProposer.DETERMINER || ConjunctCandidateProposer.isNounish(next)
                || next == ConjunctCandidateProposer.PREPOSITION;
    }

    /** Token {@code k} lower-cased, computed once per sentence. */
    private static String lowerCase(String[] w, String[] lower, int k) {
        String s = lower[k];
        if (s == null) lower[k] = s = w[k].toLowerCase(java.util.Locale.ROOT);
        return s;
    }

    /** Whether verb {@code k} is an auxiliary or modal with a verb of its own after it, before coordinator {@code c}. */
    static boolean auxiliaryBeforeVerb(String[] w, byte[] kinds, int k, int c) {
        if (!(kinds[k] == ConjunctCandidateProposer.MODAL || ConjunctCandidateProposer.isAuxiliary(w[k]))) return false;
        int j = k + 1;
        while (j < c && (kinds[j] == ConjunctCandidateProposer.ADVERB || kinds[j] == ConjunctCandidateProposer.MODAL)) j++;
        return j < c && ConjunctCandidateProposer.isVerb(kinds[j]);
    }

    /** The preposition before the noun group of {@code k}: 1 "of", 2 another, 0 none. */
    static int prepositionBefore(String[] w, byte[] kinds, int k) {
        int j = ConjunctCandidateProposer.groupBegin(kinds, k) - 1;
        if (j < 0 || !(kinds[j] == ConjunctCandidateProposer.PREPOSITION || kinds[j] == ConjunctCandidateProposer.TO)) return 0;
        return w[j].equalsIgnoreCase("of") ? 1 : 2;
    }

    private static boolean ofAfter(String[] w, int k) {
        return k + 1 < w.length && w[k + 1].equalsIgnoreCase("of");
    }

    /** Whether the last conjunct of {@code p} opens with a determiner or a possessive ("and the pumps", "and their seals"). */
    private static boolean opensWithDeterminer(String[] t, ConjunctPair p) {
        int b = p.rightBegin();
        if (b < 0 || b >= t.length || b > p.right()) return false;
        String tag = t[b];
        return tag.equals("DT") || tag.equals("PDT") || tag.equals("PRP$") || tag.equals("WP$");
    }

    /** Whether a coordinator stands right before the first head's group (adverbs aside): "files and photos and ...". */
    private static boolean afterCoordinator(byte[] kinds, ConjunctPair p) {
        int j = (p.leftClass() == HeadClass.NOUN ? ConjunctCandidateProposer.groupBegin(kinds, p.left()) : p.left()) - 1;
        while (j >= 0 && kinds[j] == ConjunctCandidateProposer.ADVERB) j--;
        return j >= 0 && kinds[j] == ConjunctCandidateProposer.COORDINATOR;
    }

    /** Words that open a subordinate or relative clause (distinct from the proposer's lists, which bound conjuncts). */
    private static final String[] SUBORDINATE_CLAUSE_OPENERS = {"that", "since", "while", "if", "because", "when", "as",
            "although", "though", "whether", "where", "which", "who", "whom", "unless", "until", "after", "before", "once"};

    /** Whether a subordinator or relative word opens the clause of verb {@code k} (within a few words before it). */
    static boolean subordinate(String[] w, String[] t, int k) {
        for (int j = k - 1; j >= 0 && j >= k - 6; j--) {
            String tag = t[j];
            if (tag.equals(",") || tag.equals(".") || tag.equals(":") || tag.equals("CC")) return false;
            if ((tag.equals("IN") || tag.startsWith("W")) && ConjunctCandidateProposer.isOneOf(w[j], SUBORDINATE_CLAUSE_OPENERS)) return true;
            if (tag.startsWith("VB") && j < k - 1 && !tag.equals("VBN") && !tag.equals("VBG")) return false;
        }
        return false;
    }

    /**
     * Where token {@code k} stands in a run of proper nouns: 1 first, 2 last, 3 alone; 0 otherwise (not a proper noun,
     * or an inner word of a name of three or more, which the feature treats alike).
     */
    static int namePlace(String[] t, int k) {
        if (!t[k].startsWith("NNP")) return 0;
        boolean before = k > 0 && t[k - 1].startsWith("NNP");
        boolean after = k + 1 < t.length && t[k + 1].startsWith("NNP");
        return after && !before ? 1 : before && !after ? 2 : !before ? 3 : 0;
    }

    /** Whether the left head of pair {@code i} is a middle item of another pair's list with the same last conjunct. */
    private static boolean insideList(CoordinatorCandidates cc, int i) {
        ConjunctPair p = cc.pair(i);
        for (int j = 0; j < cc.size(); j++) {
            ConjunctPair o = cc.pair(j);
            if (j == i || o.right() != p.right()) continue;
            for (int m : o.middle()) if (m == p.left()) return true;
        }
        return false;
    }

    /** Whether the far conjunct has its own word of the modifier's kind (its own subject, premodifier, phrase). */
    static boolean farHasOwn(String[] t, ConjunctPair p, ScopeCandidate m, int c) {
        switch (m.kind()) {
            case SUBJECT: return ownSubject(t, c, p.right());
            case PREMODIFIER: {
                int k = p.right() - 1;
                return k > c && (t[k].startsWith("JJ") || t[k].startsWith("NN") || t[k].equals("CD") || t[k].equals("PRP$")
                        || t[k].equals("POS") || t[k].equals("DT"));
            }
            default: {
                // The first conjunct has a phrase or object of its own before the coordinator.
                for (int k = p.left() + 1; k < c; k++) {
                    if (m.kind() == ModifierKind.PREPOSITIONAL && t[k].equals("IN")) return true;
                    if (m.kind() == ModifierKind.OBJECT && (t[k].startsWith("NN") || t[k].equals("PRP"))) return true;
                }
                return false;
            }
        }
    }

    /** Whether a noun or pronoun stands between the coordinator and the verb {@code right}. */
    static boolean ownSubject(String[] t, int c, int right) {
        for (int k = c + 1; k < right; k++) {
            if (t[k].startsWith("NN") || t[k].equals("PRP") || t[k].equals("EX") || t[k].equals("WP")) return true;
        }
        return false;
    }

    private double conjunctRate(int id, HeadClass c) {
        if (id <= 0) return 0;
        int hits = statistics.count(CoordinationCounts.key(CoordinationCounts.CONJUNCT, id, 0, c.ordinal()));
        int trials = statistics.count(CoordinationCounts.key(CoordinationCounts.OCCURRENCE, id, 0, c.ordinal()));
        double v = Math.log((hits + 0.5) / (Math.max(trials - hits, 0) + 0.5));
        return Math.max(-CLIP, Math.min(CLIP, v));
    }

    private int thesaurusId(String word, String tag) {
        HeadClass c = ConjunctCandidateProposer.classOfTag(tag);
        if (c == null || c == HeadClass.ADVERB) return Thesaurus.UNKNOWN;
        String key = c == HeadClass.NOUN ? normalizer.noun(word) : c == HeadClass.VERB ? normalizer.verb(word) : normalizer.other(word);
        return thesaurus.id(c, key);
    }

    /**
     * Cosines of the two conjuncts' composed vectors: each content word of a conjunct is represented by itself and its
     * thesaurus neighbours (weighted by similarity); a conjunct is the sum (additive) or the element-wise product
     * (multiplicative) of its words' vectors, after Mitchell &amp; Lapata (2008).
     */
    private double[] composedSimilarity(String[] w, String[] t, ConjunctPair p) {
        TIntDoubleHashMap[] left = compose(w, t, p.leftBegin(), p.leftEnd());
        TIntDoubleHashMap[] right = compose(w, t, p.rightBegin(), p.rightEnd());
        return new double[] {cosine(left[0], right[0]), cosine(left[1], right[1])};
    }

    private TIntDoubleHashMap[] compose(String[] w, String[] t, int from, int to) {
        TIntDoubleHashMap sum = new TIntDoubleHashMap();
        TIntDoubleHashMap product = null;
        for (int k = Math.max(0, from); k <= Math.min(to, w.length - 1) && k - from < 12; k++) {
            int id = thesaurusId(w[k], t[k]);
            if (id < 0) continue;
            TIntDoubleHashMap v = new TIntDoubleHashMap();
            v.put(id, 1);
            for (int i = 0; i < thesaurus.neighbourCount(id); i++) v.put(thesaurus.neighbourId(id, i), thesaurus.neighbourScore(id, i));
            v.forEachEntry((key, value) -> {
                sum.adjustOrPutValue(key, value, value);
                return true;
            });
            if (product == null) {
                product = v;
            } else {
                TIntDoubleHashMap next = new TIntDoubleHashMap();
                TIntDoubleHashMap previous = product;
                v.forEachEntry((key, value) -> {
                    if (previous.containsKey(key)) next.put(key, previous.get(key) * value);
                    return true;
                });
                product = next;
            }
        }
        return new TIntDoubleHashMap[] {sum, product == null ? new TIntDoubleHashMap() : product};
    }

    private static double cosine(TIntDoubleHashMap a, TIntDoubleHashMap b) {
        if (a.isEmpty() || b.isEmpty()) return 0;
        double[] dot = {0};
        a.forEachEntry((k, v) -> {
            dot[0] += v * b.get(k);
            return true;
        });
        double na = norm(a);
        double nb = norm(b);
        return na == 0 || nb == 0 ? 0 : dot[0] / (na * nb);
    }

    private static double norm(TIntDoubleHashMap a) {
        double s = 0;
        for (double v : a.values()) s += v * v;
        return Math.sqrt(s);
    }

    /** Share of the left conjunct's tag bigrams that the right conjunct has too (Dice over bigram sets). */
    static double tagOverlap(int[] t, int lb, int le, int rb, int re) {
        long[] left = bigrams(t, lb, le);
        long[] right = bigrams(t, rb, re);
        if (left.length == 0 && right.length == 0) return t[lb] == t[rb] ? 1 : 0;
        int common = 0;
        for (int i = 0, j = 0; i < left.length && j < right.length; ) {
            if (left[i] == right[j]) {
                common++;
                i++;
                j++;
            } else if (left[i] < right[j]) {
                i++;
            } else {
                j++;
            }
        }
        return 2.0 * common / (left.length + right.length);
    }

    /** The distinct tag bigrams of tokens {@code from..to} (at most 20 counted), sorted. */
    private static long[] bigrams(int[] t, int from, int to) {
        int start = Math.max(0, from);
        int end = Math.min(Math.min(to, t.length - 1), from + 20);
        if (end <= start) return new long[0];
        long[] b = new long[end - start];
        for (int k = start; k < end; k++) b[k - start] = (long) t[k] << 32 | t[k + 1];
        java.util.Arrays.sort(b);
        int distinct = 1;
        for (int k = 1; k < b.length; k++) if (b[k] != b[distinct - 1]) b[distinct++] = b[k];
        return distinct == b.length ? b : java.util.Arrays.copyOf(b, distinct);
    }

    static int distanceBucket(int d) {
        if (d <= 3) return Math.max(d, 0);
        if (d <= 5) return 4;
        if (d <= 8) return 5;
        if (d <= 13) return 6;
        return 7;
    }

    static int lengthBucket(int n) {
        if (n <= 3) return Math.max(n, 0);
        return n <= 6 ? 4 : 5;
    }
}
