package dev.tether.counts;

import dev.tether.attachment.AttachmentQuery;
import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.CandidateStructure;
import dev.tether.attachment.HeadChoiceScorer;
import dev.tether.candidates.HeadClass;
import dev.tether.vocabulary.WordNormalizer;

/**
 * Counts the prepositions of unlabelled text, one candidate set ({@link AttachmentQuery}) at a time, into
 * {@link RawAttachmentCounts}. Every count is a whole number, so builders add up exactly: count documents or shards
 * apart, {@link #addAll} the results in any order, and {@link #build} gives the same counts (and, with words numbered
 * in sorted order, the same bytes) as counting everything in one builder. Not thread-safe; one builder per thread.
 */
public final class RawAttachmentCountsBuilder {
    private final WordNormalizer normalizer = new WordNormalizer();
    private QuadrupleCountsBuilder events = new QuadrupleCountsBuilder();
    private HeadChoiceCountsBuilder cooccurrence = new HeadChoiceCountsBuilder();
    private QuadrupleCountsBuilder ambiguous = new QuadrupleCountsBuilder();
    private AmbiguousStructures.Builder ambiguousStructures = new AmbiguousStructures.Builder();
    private WordFrequencies.Builder words = new WordFrequencies.Builder();
    // Noun and verb tokens by surface form: normalized once per distinct form, in build(), not once per token.
    private WordFrequencies.Builder nounForms = new WordFrequencies.Builder();
    private WordFrequencies.Builder verbForms = new WordFrequencies.Builder();
    private RawAttachmentCounts.Tally tally = RawAttachmentCounts.Tally.ZERO;
    private long prepositions;
    private long unambiguous;
    private long ambiguousQuadruples;

    /**
     * Counts one preposition with its candidates (words as in the text; normalized here). A preposition without an
     * object or without candidates teaches nothing and is not counted.
     */
    public void add(AttachmentQuery q) {
        if (q.size() == 0 || q.object().isEmpty()) return;
        prepositions++;
        String p = normalizer.preposition(q.preposition());
        String o = normalizer.noun(q.object());
        int sole = soleHead(q);
        long[] structure = CandidateStructure.keys(q);
        for (int i = 0; i < q.size(); i++) {
            HeadClass c = q.headClass(i);
            cooccurrence.addLexical(p, HeadChoiceScorer.headKey(normalizer, q.head(i), c), c.ordinal(), o, i == sole, 1.0);
            cooccurrence.addStructure(structure[i], i == sole, 1.0);
        }
        if (sole >= 0) {
            unambiguous++;
            HeadClass c = q.headClass(sole);
            if (c == HeadClass.VERB) events.addPartial(normalizer.verb(q.head(sole)), null, p, o, AttachmentSite.VERB, 1.0);
            else if (c == HeadClass.NOUN) events.addPartial(null, normalizer.noun(q.head(sole)), p, o, AttachmentSite.NOUN, 1.0);
        } else if (q.quadrupleVerb() >= 0 && q.quadrupleNoun() >= 0) {
            ambiguousQuadruples++;
            ambiguous.add(normalizer.verb(q.head(q.quadrupleVerb())), normalizer.noun(q.head(q.quadrupleNoun())), p, o,
                    AttachmentSite.VERB, 1.0);
            ambiguousStructures.add(p, structure[q.quadrupleVerb()], structure[q.quadrupleNoun()]);
        }
    }

    /**
     * The candidate an unambiguous preposition attaches to, or -1 when it is ambiguous. Unambiguous, after
     * Ratnaparkhi (1998): the finder proposed one head only; or the nearest head to the left lies within
     * {@value #WINDOW} tokens with no phrase break between and is a verb (no noun between the verb and the
     * preposition), or is a noun, adjective or adverb with no verb among the heads within {@value #WINDOW} tokens to
     * the left.
     */
    static int soleHead(AttachmentQuery q) {
        if (q.size() == 1) return 0;
        int nearest = -1;
        for (int i = 0; i < q.size(); i++) {
            int d = q.distance(i);
            if (d > 0 && (nearest < 0 || d < q.distance(nearest))) nearest = i;
        }
        if (nearest < 0 || q.distance(nearest) > WINDOW || q.punctuated(nearest)) return -1;
        if (q.headClass(nearest) == HeadClass.VERB) return nearest;
        for (int i = 0; i < q.size(); i++) {
            if (q.headClass(i) == HeadClass.VERB && q.distance(i) > 0 && q.distance(i) <= WINDOW) return -1;
        }
        return nearest;
    }

    /** How far left of the preposition (tokens) the unambiguous-attachment rule looks. */
    static final int WINDOW = 6;

    /**
     * Counts one token of the text with its Penn tag: a noun (NN*) or verb (VB*) joins {@link RawAttachmentCounts#words()}
     * under its normalized form; other tokens are not counted there.
     */
    public void addToken(String word, String pennTag) {
        if (pennTag == null || pennTag.length() < 2) return;
        if (pennTag.startsWith("NN")) nounForms.add(word);
        else if (pennTag.startsWith("VB")) verbForms.add(word);
    }

    /** Counts that a document was read (its sentences and tokens), or that one was skipped. */
    public void addDocument(long sentences, long tokens) {
        tally = tally.plus(new RawAttachmentCounts.Tally(1, 0, sentences, tokens, 0, 0, 0));
    }

    public void addSkippedDocument() {
        tally = tally.plus(new RawAttachmentCounts.Tally(0, 1, 0, 0, 0, 0, 0));
    }

    /** Adds every count of {@code other} (a document's, a shard's or a whole corpus's). */
    public void addAll(RawAttachmentCounts other) {
        events.addAll(other.events());
        cooccurrence.addAll(other.cooccurrence());
        ambiguous.addAll(other.ambiguous());
        ambiguousStructures.addAll(other.ambiguousStructures());
        words.addAll(other.words());
        tally = tally.plus(other.tally());
    }

    /** The counts so far, words numbered in sorted order. */
    public RawAttachmentCounts build() {
        WordFrequencies all = allWords();
        return new RawAttachmentCounts(events.buildSorted(), cooccurrence.buildSorted(), ambiguous.buildSorted(),
                ambiguousStructures.build(), all, wholeTally());
    }

    /**
     * What {@link #build} gives, emptying this builder table by table as each one is built, so that the builder and
     * the counts it builds are never both whole in memory (a partition's tables are about the size of a corpus's);
     * the builder is empty afterwards.
     */
    public RawAttachmentCounts buildAndEmpty() {
        WordFrequencies all = allWords();
        words = new WordFrequencies.Builder();
        nounForms = new WordFrequencies.Builder();
        verbForms = new WordFrequencies.Builder();
        QuadrupleCounts builtEvents = events.buildSorted();
        events = new QuadrupleCountsBuilder();
        HeadChoiceCounts builtCooccurrence = cooccurrence.buildSorted();
        cooccurrence = new HeadChoiceCountsBuilder();
        QuadrupleCounts builtAmbiguous = ambiguous.buildSorted();
        ambiguous = new QuadrupleCountsBuilder();
        AmbiguousStructures builtStructures = ambiguousStructures.build();
        ambiguousStructures = new AmbiguousStructures.Builder();
        RawAttachmentCounts.Tally whole = wholeTally();
        tally = RawAttachmentCounts.Tally.ZERO;
        prepositions = 0;
        unambiguous = 0;
        ambiguousQuadruples = 0;
        return new RawAttachmentCounts(builtEvents, builtCooccurrence, builtAmbiguous, builtStructures, all, whole);
    }

    private WordFrequencies allWords() {
        WordFrequencies.Builder all = new WordFrequencies.Builder();
        all.addAll(words.build());
        WordFrequencies nouns = nounForms.build();
        for (int i = 0; i < nouns.size(); i++) all.add(normalizer.noun(nouns.word(i)), nouns.count(i));
        WordFrequencies verbs = verbForms.build();
        for (int i = 0; i < verbs.size(); i++) all.add(normalizer.verb(verbs.word(i)), verbs.count(i));
        return all.build();
    }

    private RawAttachmentCounts.Tally wholeTally() {
        return tally.plus(new RawAttachmentCounts.Tally(0, 0, 0, 0, prepositions, unambiguous, ambiguousQuadruples));
    }
}
