package dev.tether.coordination;

import dev.tether.ranking.FeatureKey;
import dev.tether.vocabulary.PennTags;

/**
 * The feature templates of coordination ranking, for the choice of conjunct heads (pair templates) and for the
 * scope of a modifier (scope templates, on the "shared" reading of a modifier against "not shared"). Parts packed by
 * {@link FeatureKey}; class = {@link dev.tether.candidates.HeadClass} ordinal. Each says in plain words what it
 * means, for the evidence.
 */
enum CoordinationFeature {
    // Pair templates
    /** Thesaurus similarity of the heads; parts: class pair. */
    HEAD_SIMILARITY(CoordinationFeatureFamily.SIMILARITY, 1),
    /** A head the thesaurus does not hold; parts: class pair. */
    HEAD_SIMILARITY_UNKNOWN(CoordinationFeatureFamily.SIMILARITY, 1),
    /** Cosine of the conjuncts' additive composition; parts: class pair. */
    ADDITIVE_COMPOSITION(CoordinationFeatureFamily.COMPOSITION, 1),
    /** Cosine of the conjuncts' multiplicative composition; parts: class pair. */
    MULTIPLICATIVE_COMPOSITION(CoordinationFeatureFamily.COMPOSITION, 1),
    /** Word classes of the two heads; parts: left class, right class, right reading. */
    CLASS_PAIR(CoordinationFeatureFamily.PARALLELISM, 1),
    /** Fine tags of the two heads; parts: left tag, right tag. */
    TAG_PAIR(CoordinationFeatureFamily.PARALLELISM, 2),
    /** Same fine tag; parts: class. */
    SAME_TAG(CoordinationFeatureFamily.PARALLELISM, 1),
    /** Share of tag bigrams the two conjuncts have in common; parts: class pair. */
    TAG_SEQUENCE_OVERLAP(CoordinationFeatureFamily.PARALLELISM, 1),
    /** Length bucket of left and right conjunct; parts: left bucket, right bucket, class pair. */
    LENGTHS(CoordinationFeatureFamily.PARALLELISM, 2),
    /** Same last three letters; parts: class pair. */
    SAME_SUFFIX(CoordinationFeatureFamily.PARALLELISM, 1),
    /** The same word; parts: class pair. */
    SAME_WORD(CoordinationFeatureFamily.PARALLELISM, 1),
    /** log(1 + times the two heads were coordinated in training); parts: class pair. */
    PAIR_COUNT(CoordinationFeatureFamily.ASSOCIATION, 1),
    /** The pair never seen coordinated, both words seen; parts: class pair. */
    PAIR_UNSEEN(CoordinationFeatureFamily.ASSOCIATION, 1),
    /** log-odds of the left head being a conjunct; parts: class. */
    LEFT_CONJUNCT_RATE(CoordinationFeatureFamily.ASSOCIATION, 1),
    /** log-odds of the right head being a conjunct; parts: class. */
    RIGHT_CONJUNCT_RATE(CoordinationFeatureFamily.ASSOCIATION, 1),
    /** Distance bucket from the left head to the coordinator; parts: bucket, class pair. */
    DISTANCE(CoordinationFeatureFamily.DISTANCE, 1),
    /** Rank among left candidates of the same class; parts: rank, same class (1) or not, class pair. */
    RANK(CoordinationFeatureFamily.DISTANCE, 1),
    /** Candidates of the same class farther from the coordinator (0, 1, 2 or more); parts: count, same class as the right, class pair. */
    RANK_FROM_START(CoordinationFeatureFamily.DISTANCE, 1),
    /** The left head ends its group (no noun right after it); parts: class. */
    GROUP_END(CoordinationFeatureFamily.DISTANCE, 1),
    /** Commas between the left head and the coordinator; parts: bucket, comma right before (1) or not, class pair. */
    COMMAS(CoordinationFeatureFamily.PUNCTUATION, 1),
    /** A list of middle conjuncts found; parts: class pair. */
    LIST(CoordinationFeatureFamily.PUNCTUATION, 1),
    /** Another coordinator between the left head and this one; parts: class pair. */
    INNER_COORDINATOR(CoordinationFeatureFamily.PUNCTUATION, 1),
    /** The coordinator word with the class pair; parts: coordinator, class pair. */
    COORDINATOR(CoordinationFeatureFamily.STRUCTURE, 2),
    /** The last conjunct has its own subject before its verb; parts: class pair. */
    RIGHT_CLAUSE(CoordinationFeatureFamily.STRUCTURE, 1),
    /** The word before the left head's group; parts: tag, class pair. */
    LEFT_CONTEXT(CoordinationFeatureFamily.STRUCTURE, 2),
    /** The left head is itself a middle item of a longer list this coordinator ends; parts: class pair. */
    INSIDE_LIST(CoordinationFeatureFamily.PUNCTUATION, 1),
    /** Where the left head sits in its name or noun group (0 alone or last, 1 first of a name, 2 inside a name); parts: position, class pair. */
    GROUP_POSITION(CoordinationFeatureFamily.PARALLELISM, 1),
    /** A verb follows the last conjunct's noun group, which then reads as a subject; parts: class pair. */
    RIGHT_SUBJECT_OF_VERB(CoordinationFeatureFamily.STRUCTURE, 1),
    /** Verbs between the left head and the coordinator; parts: bucket, class pair. */
    VERBS_BETWEEN(CoordinationFeatureFamily.DISTANCE, 1),
    /** The tag after the left head; parts: tag, class pair. */
    LEFT_NEXT_TAG(CoordinationFeatureFamily.STRUCTURE, 2),
    /** The tag after the last conjunct's head; parts: tag, class pair. */
    RIGHT_NEXT_TAG(CoordinationFeatureFamily.STRUCTURE, 2),

    // Scope templates (on the "shared" reading)
    /** Sharing a modifier of this kind; parts: kind, left class, right class. */
    SHARED(CoordinationFeatureFamily.STRUCTURE, 1),
    /** Sharing, with the coordinator word; parts: kind, coordinator. */
    SHARED_COORDINATOR(CoordinationFeatureFamily.STRUCTURE, 2),
    /** Sharing, with the modifier's tag; parts: kind, tag. */
    SHARED_TAG(CoordinationFeatureFamily.STRUCTURE, 2),
    /** Sharing while the far conjunct has its own such word; parts: kind. */
    SHARED_DESPITE_OWN(CoordinationFeatureFamily.STRUCTURE, 1),
    /** Sharing, by the heads' tags being the same; parts: kind. */
    SHARED_SAME_TAG(CoordinationFeatureFamily.PARALLELISM, 1),
    /** Sharing, by the length of the far conjunct; parts: kind, bucket. */
    SHARED_FAR_LENGTH(CoordinationFeatureFamily.PARALLELISM, 1),
    /** log(1 + how often the modifier depended on the far conjunct's head); parts: kind. */
    SHARED_FAR_ASSOCIATION(CoordinationFeatureFamily.ASSOCIATION, 1),
    /** log(1 + how often the modifier depended on the near conjunct's head); parts: kind. */
    SHARED_NEAR_ASSOCIATION(CoordinationFeatureFamily.ASSOCIATION, 1),
    /** Thesaurus similarity of the heads, on sharing; parts: kind. */
    SHARED_SIMILARITY(CoordinationFeatureFamily.SIMILARITY, 1),
    /** Sharing, by distance bucket between the heads; parts: kind, bucket. */
    SHARED_DISTANCE(CoordinationFeatureFamily.DISTANCE, 1),
    /** Sharing with a comma before the coordinator; parts: kind. */
    SHARED_COMMA(CoordinationFeatureFamily.PUNCTUATION, 1),
    /** Where each head stands in a name (0 not a name or an inner word, 1 first word, 2 last word, 3 one-word name); parts: left, right. */
    NAME_POSITIONS(CoordinationFeatureFamily.PARALLELISM, 1),
    /** The first head begins a comma list that ends at the coordinator; parts: class pair. */
    LIST_FIRST(CoordinationFeatureFamily.PUNCTUATION, 1),
    /** A verbal first head inside a subordinate or relative clause; parts: whether the last conjunct has its own subject. */
    LEFT_SUBORDINATE(CoordinationFeatureFamily.STRUCTURE, 1),
    /** Whether each head predicates a clause (see {@link CoordinationFeatureExtractor#leftPredicate}); parts: left, right, class pair. */
    PREDICATES(CoordinationFeatureFamily.STRUCTURE, 1),
    /** A nominal last conjunct: whether it opens with a determiner, whether its head ends its group; parts: both, class pair. */
    RIGHT_SHAPE(CoordinationFeatureFamily.PARALLELISM, 1),
    /** A nominal first head: the preposition before its group and "of" after it, with a determiner opening the last conjunct; parts: before, after and determiner, class pair. */
    LEFT_PHRASE(CoordinationFeatureFamily.STRUCTURE, 1),
    /** A coordinator right before the first head's group: the head is itself a later conjunct; parts: class pair. */
    LEFT_AFTER_COORDINATOR(CoordinationFeatureFamily.PUNCTUATION, 1),
    /** The tags right before each head; parts: left tag, right tag, class pair. */
    PREVIOUS_TAGS(CoordinationFeatureFamily.PARALLELISM, 2),
    /** A verbal first head that is an auxiliary or modal before a verb of its own ("does not change"); parts: class pair. */
    LEFT_AUXILIARY(CoordinationFeatureFamily.STRUCTURE, 1),
    /** {@link #RANK_FROM_START} with whether the last conjunct is a clause with its own subject; parts: count, clause, class pair. */
    CLAUSE_RANK_FROM_START(CoordinationFeatureFamily.DISTANCE, 1);

    static final String[] COORDINATORS = {"", "and", "or", "but", "nor", "&", "yet", "plus", "so", "/", "as", "rather"};
    private static final CoordinationFeature[] ALL = values();
    private static final String[] PREDICATE_ROLES = {"no predicate", "a verb", "a predicate after a copula", "a copula"};
    private static final String[] NAME_PLACES = {"not a name, or inside one", "first word", "last word", "one word"};

    final CoordinationFeatureFamily family;
    final int minimumDecisions;

    CoordinationFeature(CoordinationFeatureFamily family, int minimumDecisions) {
        this.family = family;
        this.minimumDecisions = minimumDecisions;
    }

    long key(int a, int b, int c) {
        return FeatureKey.of(ordinal() + 1, a, b, c);
    }

    static CoordinationFeature of(long key) {
        int t = FeatureKey.template(key) - 1;
        if (t < 0 || t >= ALL.length) throw new IllegalArgumentException("unknown coordination feature template " + (t + 1));
        return ALL[t];
    }

    /** What {@code key} says, in plain words. */
    String describe(long key) {
        int a = FeatureKey.a(key);
        switch (this) {
            case HEAD_SIMILARITY: return "distributional similarity of the heads";
            case HEAD_SIMILARITY_UNKNOWN: return "a head without distributional neighbours";
            case ADDITIVE_COMPOSITION: return "similarity of the conjuncts (additive composition)";
            case MULTIPLICATIVE_COMPOSITION: return "similarity of the conjuncts (multiplicative composition)";
            case CLASS_PAIR: return "the word classes of the heads";
            case TAG_PAIR: return "heads tagged " + PennTags.tag(a) + " and " + PennTags.tag(FeatureKey.b(key));
            case SAME_TAG: return "heads with the same tag";
            case TAG_SEQUENCE_OVERLAP: return "parallel tag sequences";
            case LENGTHS: return "the conjuncts' lengths";
            case SAME_SUFFIX: return "heads with the same ending";
            case SAME_WORD: return "the same word on both sides";
            case PAIR_COUNT: return "the heads coordinated in training text";
            case PAIR_UNSEEN: return "the heads never coordinated in training text";
            case LEFT_CONJUNCT_RATE: return "how often the first head is a conjunct";
            case RIGHT_CONJUNCT_RATE: return "how often the last head is a conjunct";
            case DISTANCE: return "the distance of the first head from the coordinator";
            case RANK: return a == 0 ? "the nearest candidate of its class" : "a candidate with " + a + (a == 3 ? " or more" : "") + " nearer of its class";
            case GROUP_END: return "a head at the end of its phrase";
            case RANK_FROM_START: return a == 0 ? "the first candidate of its class in the clause" : "a candidate with " + a + (a == 2 ? " or more" : "") + " of its class before it";
            case COMMAS: return "commas between the conjuncts";
            case LIST: return "a comma list";
            case INNER_COORDINATOR: return "another coordinator between the conjuncts";
            case COORDINATOR: return "'" + COORDINATORS[a] + "' between these classes";
            case RIGHT_CLAUSE: return "the last conjunct has its own subject";
            case LEFT_CONTEXT: return a == 0 ? "a first conjunct at the start of the sentence" : "the word before the first conjunct tagged " + PennTags.tag(a);
            case INSIDE_LIST: return "a first head inside a longer list";
            case GROUP_POSITION: return new String[] {"a first head at the end of its phrase", "the first word of a name",
                    "a word inside a name"}[Math.min(a, 2)];
            case RIGHT_SUBJECT_OF_VERB: return "a verb after the last conjunct";
            case VERBS_BETWEEN: return "verbs between the conjuncts";
            case LEFT_NEXT_TAG: return "the word after the first head tagged " + PennTags.tag(a);
            case RIGHT_NEXT_TAG: return "the word after the last head tagged " + PennTags.tag(a);
            case SHARED: return "how often such a modifier is shared";
            case SHARED_COORDINATOR: return "sharing with '" + COORDINATORS[FeatureKey.b(key)] + "'";
            case SHARED_TAG: return "sharing a modifier tagged " + PennTags.tag(FeatureKey.b(key));
            case SHARED_DESPITE_OWN: return "the far conjunct has its own";
            case SHARED_SAME_TAG: return "heads with the same tag";
            case SHARED_FAR_LENGTH: return "the length of the far conjunct";
            case SHARED_FAR_ASSOCIATION: return "the modifier seen with the far head";
            case SHARED_NEAR_ASSOCIATION: return "the modifier seen with the near head";
            case SHARED_SIMILARITY: return "distributional similarity of the heads";
            case SHARED_DISTANCE: return "the distance between the heads";
            case SHARED_COMMA: return "a comma before the coordinator";
            case NAME_POSITIONS: return "the heads' places in their names (" + NAME_PLACES[a] + ", " + NAME_PLACES[FeatureKey.b(key)] + ")";
            case LIST_FIRST: return "the first item of a comma list";
            case PREDICATES: return "the heads as predicates (" + PREDICATE_ROLES[a] + "; " + PREDICATE_ROLES[FeatureKey.b(key)] + ")";
            case RIGHT_SHAPE: return (a / 2 == 1 ? "a last conjunct opening with a determiner" : "a last conjunct without a determiner")
                    + (a % 2 == 1 ? ", its head at the end of its group" : ", its head inside its group");
            case LEFT_PHRASE: return (a == 0 ? "a first head not after a preposition" : a == 1 ? "a first head after 'of'" : "a first head after a preposition")
                    + (FeatureKey.b(key) / 2 == 1 ? ", 'of' after it" : "") + (FeatureKey.b(key) % 2 == 1 ? ", a determiner opening the last conjunct" : "");
            case LEFT_AFTER_COORDINATOR: return "a first head that follows another coordinator";
            case PREVIOUS_TAGS: return "the words before the heads tagged " + PennTags.tag(a) + " and " + PennTags.tag(FeatureKey.b(key));
            case LEFT_AUXILIARY: return "a first head that is an auxiliary before its verb";
            case CLAUSE_RANK_FROM_START: return (a == 0 ? "the first candidate of its class in the clause" : "a candidate with " + a + (a == 2 ? " or more" : "") + " of its class before it")
                    + (FeatureKey.b(key) == 1 ? ", before a clause with its own subject" : "");
            case LEFT_SUBORDINATE: return "a first head inside a subordinate clause" + (a == 1 ? ", before a clause with its own subject" : "");
            default: return name();
        }
    }

    static int coordinator(String word) {
        for (int i = 1; i < COORDINATORS.length; i++) if (COORDINATORS[i].equalsIgnoreCase(word)) return i;
        return 0;
    }
}
