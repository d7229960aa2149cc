package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.HeadChoiceCounts;
import dev.tether.ranking.FeatureKey;
import dev.tether.vocabulary.PennTags;

import java.util.Locale;

/**
 * The feature templates of attachment ranking. A feature is a template with up to three integer parts packed by
 * {@link FeatureKey}; the parts are listed beside each template (class = {@link HeadClass} ordinal). Each template
 * says in plain words what it means, for the evidence of a decision.
 */
enum AttachmentFeature {
    /** log P(candidate) under the count-based score; parts: class. */
    COUNT_SCORE_LOG(AttachmentFeatureFamily.COUNT_SCORE, 1),
    /** log of one factor of the count-based score (0 structural rate, 1 class, 2 word); parts: factor, class. */
    COUNT_SCORE_FACTOR(AttachmentFeatureFamily.COUNT_SCORE, 1),
    /** The most specific count level the count-based score had; parts: level, class. */
    COUNT_LEVEL(AttachmentFeatureFamily.COUNT_SCORE, 1),
    /** log((hits + ½) / (misses + ½)) of one lexical level; parts: level ({@link HeadChoiceCounts.Part}), class. */
    LEVEL_LOG_ODDS(AttachmentFeatureFamily.BACKED_OFF, 1),
    /** log(1 + trials) of one lexical level; parts: level, class. */
    LEVEL_TRIALS(AttachmentFeatureFamily.BACKED_OFF, 1),
    /** One lexical level never saw this candidate; parts: level, class. */
    LEVEL_UNSEEN(AttachmentFeatureFamily.BACKED_OFF, 1),
    /** Log-odds of the structural rate (class, rank, distance, punctuation; no words); parts: class. */
    STRUCTURE_LOG_ODDS(AttachmentFeatureFamily.BACKED_OFF, 1),
    /** Collins &amp; Brooks log-odds for this side of the classic quadruple; parts: basis, side (0 verb, 1 noun). */
    QUADRUPLE_ESTIMATE(AttachmentFeatureFamily.BACKED_OFF, 1),
    /** Hindle &amp; Rooth lexical association for this side; parts: side. */
    ASSOCIATION_SCORE(AttachmentFeatureFamily.ASSOCIATION, 1),
    /** Class with preposition; parts: preposition, class. */
    CLASS_WITH_PREPOSITION(AttachmentFeatureFamily.CLASS_PREPOSITION, 2),
    /** Nearest candidate of its class, with the preposition; parts: preposition, class. */
    NEAREST_OF_CLASS(AttachmentFeatureFamily.CLASS_PREPOSITION, 2),
    /** Preposition with class and distance bucket; parts: preposition, bucket, class. */
    PREPOSITION_DISTANCE(AttachmentFeatureFamily.CLASS_PREPOSITION, 2),
    /** Preposition with the candidate's fine tag; parts: preposition, tag. */
    PREPOSITION_TAG(AttachmentFeatureFamily.TAGS, 2),
    /** Distance bucket; parts: bucket, class. */
    DISTANCE(AttachmentFeatureFamily.POSITION, 1),
    /** Rank among candidates of its class; parts: rank, class. */
    RANK_IN_CLASS(AttachmentFeatureFamily.POSITION, 1),
    /** The whole structural description; parts: the three parts of the structure key. */
    STRUCTURE(AttachmentFeatureFamily.POSITION, 2),
    /** The whole structural description with the preposition; parts: preposition, first two structure parts, third. */
    PREPOSITION_STRUCTURE(AttachmentFeatureFamily.POSITION, 3),
    /** The head follows the phrase; parts: class. */
    AFTER_PHRASE(AttachmentFeatureFamily.POSITION, 1),
    /** Punctuation between candidate and preposition; parts: nearest (1) or not, class. */
    PUNCTUATION_BETWEEN(AttachmentFeatureFamily.PUNCTUATION, 1),
    /** Fine tag of the candidate; parts: tag, class. */
    CANDIDATE_TAG(AttachmentFeatureFamily.TAGS, 2),
    /** Fine tag of the object; parts: tag, class. */
    OBJECT_TAG(AttachmentFeatureFamily.TAGS, 2),
    /** A light verb or a form of "be"; parts: verb, preposition. */
    LIGHT_VERB(AttachmentFeatureFamily.LIGHT_VERBS, 2),
    /** A pronoun (1) or proper noun (2) candidate; parts: kind, preposition. */
    PRONOUN_OR_NAME(AttachmentFeatureFamily.PRONOUN_PROPER, 2),
    /** Head word with preposition; parts: word, preposition, class. */
    HEAD_WORD(AttachmentFeatureFamily.HEAD_WORDS, 3),
    /** Kind of the object; parts: kind, class. */
    OBJECT_KIND(AttachmentFeatureFamily.OBJECT_CLASS, 1),
    /** Kind of the object with the preposition; parts: kind, preposition, class. */
    OBJECT_KIND_WITH_PREPOSITION(AttachmentFeatureFamily.OBJECT_CLASS, 2),
    /** Object word with preposition and class; parts: word, preposition, class. */
    OBJECT_WORD(AttachmentFeatureFamily.OBJECT_CLASS, 3),
    /**
     * log((hits + ½) / (misses + ½)) pooled over the thesaurus neighbours of one word, each case weighted by its
     * similarity; parts: slot (the {@code SIMILAR_} constants below), how much the exact counts of the same level saw
     * (0 nothing, 1 under five cases, 2 more), class.
     */
    SIMILAR_LOG_ODDS(AttachmentFeatureFamily.SIMILAR_WORDS, 1),
    /** log(1 + similarity-weighted cases) of the same pool; parts as {@link #SIMILAR_LOG_ODDS}. */
    SIMILAR_TRIALS(AttachmentFeatureFamily.SIMILAR_WORDS, 1),
    /** Log-odds of the similarity-smoothed quadruple estimate for this side; parts: basis, side (0 verb, 1 noun). */
    SIMILAR_QUADRUPLE_ESTIMATE(AttachmentFeatureFamily.SIMILAR_WORDS, 1);

    /**
     * The pools of {@link #SIMILAR_LOG_ODDS}: the candidate's neighbours with the preposition, the candidate's
     * neighbours with the preposition and object, the candidate with the preposition and the object's neighbours, and
     * any word of the candidate's class with the preposition and the object's neighbours.
     */
    static final int SIMILAR_HEAD = 0, SIMILAR_HEAD_WITH_OBJECT = 1, SIMILAR_OBJECT = 2, SIMILAR_CLASS_OBJECT = 3;

    static final String[] LIGHT_VERBS = {"", "be", "have", "do", "make", "take", "get", "give", "go", "put", "come", "keep", "set"};
    static final String[] OBJECT_KINDS = {"other", "a pronoun", "a name", "a number", "a gerund", "a wh-word", "a noun"};

    private static final AttachmentFeature[] ALL = values();

    final AttachmentFeatureFamily family;
    /** Fewest training decisions a key of this template must occur in to get a weight. */
    final int minimumDecisions;

    AttachmentFeature(AttachmentFeatureFamily family, int minimumDecisions) {
        this.family = family;
        this.minimumDecisions = minimumDecisions;
    }

    long key(int a, int b, int c) {
        return FeatureKey.of(ordinal() + 1, a, b, c);
    }

    static AttachmentFeature of(long key) {
        int t = FeatureKey.template(key) - 1;
        if (t < 0 || t >= ALL.length) throw new IllegalArgumentException("unknown attachment feature template " + (t + 1));
        return ALL[t];
    }

    /** What feature {@code key} says about candidate {@code i} of {@code q}, in plain words. */
    static String describe(long key, AttachmentQuery q, int i) {
        int a = FeatureKey.a(key);
        int b = FeatureKey.b(key);
        String head = "'" + q.head(i) + "'";
        String p = "'" + q.preposition() + "'";
        String cls = q.headClass(i).label();
        switch (of(key)) {
            case COUNT_SCORE_LOG: return "the count-based head-choice score";
            case COUNT_SCORE_FACTOR: return new String[] {"how often a candidate in this position is the head",
                    "how strongly " + p + " prefers a " + cls, "how strongly " + head + " takes " + p}[a];
            case COUNT_LEVEL: return "count evidence at the level '" + HeadChoice.Evidence.values()[a].label() + "'";
            case LEVEL_LOG_ODDS: case LEVEL_TRIALS: case LEVEL_UNSEEN: {
                String seen = of(key) == LEVEL_UNSEEN ? "no counts of " : "counts of ";
                switch (HeadChoiceCounts.Part.values()[a]) {
                    case HEAD_OBJECT: return seen + head + " ... " + p + " '" + q.object() + "'";
                    case HEAD: return seen + head + " ... " + p;
                    case CLASS_OBJECT: return seen + "any " + cls + " ... " + p + " '" + q.object() + "'";
                    default: return seen + "any " + cls + " ... " + p;
                }
            }
            case STRUCTURE_LOG_ODDS: return "how often a " + cls + " in this position is the head";
            case QUADRUPLE_ESTIMATE: return "the backed-off quadruple estimate ("
                    + DecisionBasis.values()[a].label() + ") for the " + (b == 1 ? "noun" : "verb");
            case ASSOCIATION_SCORE: return "lexical association of " + p + " with the " + (a == 1 ? "noun" : "verb");
            case CLASS_WITH_PREPOSITION: return p + " with a " + cls;
            case NEAREST_OF_CLASS: return p + " with the nearest " + cls;
            case PREPOSITION_DISTANCE: return p + " with a " + cls + " " + distanceWords(q.distance(i));
            case PREPOSITION_TAG: return p + " with a candidate tagged " + PennTags.tag(b);
            case OBJECT_WORD: return p + " '" + q.object() + "' with a " + cls + " in training";
            case DISTANCE: return "a " + cls + " " + distanceWords(q.distance(i));
            case RANK_IN_CLASS: return a == 0 ? "the nearest " + cls : "a " + cls + " with " + a + (a == 3 ? " or more" : "") + " nearer";
            case STRUCTURE: return "this " + cls + "'s position among the candidates";
            case PREPOSITION_STRUCTURE: return p + " with this " + cls + "'s position among the candidates";
            case AFTER_PHRASE: return "a " + cls + " after the phrase";
            case PUNCTUATION_BETWEEN: return "punctuation between " + head + " and " + p;
            case CANDIDATE_TAG: return head + " tagged " + PennTags.tag(a);
            case OBJECT_TAG: return "the object tagged " + PennTags.tag(a) + " with a " + cls;
            case LIGHT_VERB: return "the light verb '" + LIGHT_VERBS[a] + "'" + (b > 0 ? " with " + p : "");
            case PRONOUN_OR_NAME: return (a == 1 ? "a pronoun" : "a proper noun") + (b > 0 ? " with " + p : "");
            case HEAD_WORD: return head + " with " + p + " in training";
            case OBJECT_KIND: return "the object being " + OBJECT_KINDS[a] + ", with a " + cls;
            case OBJECT_KIND_WITH_PREPOSITION: return p + " with " + OBJECT_KINDS[a] + " as object, with a " + cls;
            case SIMILAR_LOG_ODDS: case SIMILAR_TRIALS: {
                String object = "'" + q.object() + "'";
                switch (a) {
                    case SIMILAR_HEAD: return "counts of words like " + head + " ... " + p;
                    case SIMILAR_HEAD_WITH_OBJECT: return "counts of words like " + head + " ... " + p + " " + object;
                    case SIMILAR_OBJECT: return "counts of " + head + " ... " + p + " with words like " + object;
                    default: return "counts of any " + cls + " ... " + p + " with words like " + object;
                }
            }
            case SIMILAR_QUADRUPLE_ESTIMATE: return "the similarity-smoothed quadruple estimate ("
                    + DecisionBasis.values()[a].label() + ") for the " + (b == 1 ? "noun" : "verb");
            default: return of(key).name().toLowerCase(Locale.ROOT);
        }
    }

    private static String distanceWords(int distance) {
        if (distance <= 0) return "after the phrase";
        return distance == 1 ? "right before the preposition" : distance + " words before the preposition";
    }
}
