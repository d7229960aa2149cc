package dev.tether.candidates;

import java.util.ArrayList;
import java.util.List;

/**
 * Finds prepositions with a nominal object in a sentence tagged with Penn Treebank part-of-speech tags and proposes
 * every plausible attachment site. The same proposer serves the annotators at run time and treebank training, so
 * that both see the same candidate sets. Stateless and thread-safe.
 *
 * <p>Rules, each kept because it raised candidate recall on the development split of Universal Dependencies English
 * EWT (Silveira et al. 2014) without lowering attachment accuracy (measured with gold tags by
 * {@code DevSplitMeasurement} in the tests: recall 0.979, 4.63 candidates on average, 16 of 1,785 gold prepositions
 * not proposed; and end to end, raw text through the built-in preprocessing with the default model's tagger, with
 * {@code tether evaluate}: recall 0.961). The last five rules below were added together; each was checked alone on
 * EWT train as well, which none of them was tuned on (end to end, 15,536 gold attachments, recall 0.9596 before):
 * the nearest verb beyond the cap +20 heads, a predicate's noun or last adjective +14, words that are only
 * prepositions +2, closed-class tags on unknown words, nouns of time and "which" of any tag ±0 there (+2, +2 and +1
 * on dev, where the tagger has not seen the text); all together 0.9620 on train:
 * <ul>
 *   <li>A preposition is a token tagged {@code IN} or {@code TO} that is not a subordinator ("that", "whether", "if",
 *       "because", ...; "because of" is a preposition) and that has an object within {@value #OBJECT_WINDOW} tokens.
 *       Infinitival {@code to} has no object: a verb ends the search. "but" after "nothing", "anything", "all" and the
 *       like ("nothing but praise") is a preposition too.</li>
 *   <li>The object is the last noun of the first noun run after the preposition (skipping determiners, adjectives,
 *       possessives and the like), or a pronoun, number, address or stand-alone determiner or adjective ("of the
 *       best", "on their own"), a relative "which" with no noun after it ("with which"), a gerund that ends its
 *       phrase ("for sharing ,", "your obvious lurking"), or one of a few adverbial objects ("from here", "by far",
 *       "at least"). In a two-word preposition ("out of", "along with", "on to") the second word is skipped, and so
 *       are a coordinator and a second preposition ("on or about May 3", "in or around the area").</li>
 *   <li>Candidate heads before the preposition, nearest first, at most {@value #MAX_PRECEDING} within
 *       {@value #BACK_WINDOW} tokens: verbs; the last noun of each noun run, and the first word of a run of proper
 *       nouns (UD heads names on their first word); pronouns and wh-pronouns; numbers and determiners that stand
 *       alone ("one of", "all of"), "$" rather than the number after it (UD heads amounts on the currency sign);
 *       "which" and "how" right before the preposition ("which of these", "how about"); adjectives not followed by
 *       their noun; adverbs.</li>
 *   <li>Following heads when the phrase is fronted: no verb before it, or only a participle opening the sentence
 *       with a phrase of its own ("Based on the log, the engineer replaced ..."; not a log line's subjectless main
 *       verb: "Tested the alarm on every deck and logged ..."), or it opens a clause (after a comma, a coordinator, a relative
 *       pronoun, a colon, a bracket or another preposition), or its object is a relative "which"/"whom" (the phrase
 *       belongs to the relative clause: "the berth at which the ferry docks"). The following heads are the main verbs
 *       of the next {@value #FOLLOWING_GROUPS} verb groups (a participle clause or a bracket often comes before the
 *       main one); after a form of "be", its predicate too (an adjective, a noun, or the object of a preposition).</li>
 *   <li>"at least", "at most" and "by far" also get the head of the phrase after them ("at least two boats", "by far
 *       the best deckhand"), which UD makes their head.</li>
 *   <li>The nearest verb before the preposition is a candidate even beyond the cap of {@value #MAX_PRECEDING} ("has
 *       not supplied seals, gaskets, bolts and shims for the ramp at the pier per the contract").</li>
 *   <li>The predicate after a form of "be" is the noun of its phrase or the last of its adjectives ("is our main
 *       run", "be very much involved"), not the first adjective.</li>
 *   <li>Tagger errors on unknown words, undone: a word of letters tagged {@code IN} or {@code CC} that looks
 *       inflected and is no function word is a verb or noun, an interjection after "to" is a verb, a word tagged as
 *       punctuation after its subject is a verb, and "at", "of", "with" and the like are prepositions whatever
 *       their tag.</li>
 *   <li>A noun of time after a noun ("the briefing today at 10") leaves that noun a candidate; "which" or "whom" as
 *       the object makes the phrase part of a relative clause whatever its tag.</li>
 * </ul>
 * Every scan is bounded by a constant window, so a sentence of n tokens costs O(n) whatever its punctuation.
 */
public final class HeadCandidateProposer {

    /** Most tokens searched after the preposition for its object. */
    static final int OBJECT_WINDOW = 10;
    /** Most candidate heads proposed before the preposition (recall 0.955 at 6 on EWT dev; 0.952 at 5, 0.956 at 7). */
    static final int MAX_PRECEDING = 6;
    /** Most tokens searched before the preposition. */
    static final int BACK_WINDOW = 60;
    /** Most tokens searched after the object for a following head. */
    static final int FORWARD_WINDOW = 25;
    /** Verb groups after a fronted phrase whose main verbs are proposed (recall 0.9597 at 2 on EWT dev end to end, 0.9546 at 1). */
    static final int FOLLOWING_GROUPS = 2;
    /** Most tokens of a verb group ("would not have been"). */
    static final int VERB_GROUP = 5;
    /** Most tokens between a form of "be" and its predicate. */
    static final int PREDICATE_WINDOW = 5;
    /** Most nouns a noun run is followed through to find its last noun. */
    static final int MAX_RUN = 16;
    /** How far right of the preposition any rule looks. */
    private static final int RIGHT_REACH = OBJECT_WINDOW + MAX_RUN
            + FOLLOWING_GROUPS * (FORWARD_WINDOW + VERB_GROUP) + PREDICATE_WINDOW + OBJECT_WINDOW + MAX_RUN;
    /** Most tokens of a noun phrase between the classic quadruple's verb and its first noun. */
    static final int PHRASE_WINDOW = 8;

    private static final String[] SUBORDINATORS = {
            "that", "whether", "if", "because", "although", "though", "while", "whereas", "unless", "once", "so", "lest"};
    private static final String[] ADVERBIAL_OBJECTS = {
            "here", "there", "now", "far", "ever", "where", "then", "home", "today", "tomorrow", "yesterday",
            "tonight", "once", "later", "long", "before", "sure", "least", "most", "free", "general", "short", "all",
            "many", "few", "much", "more", "less", "instance", "example", "good", "certain"};
    private static final String[] EXCEPTIVE_PRONOUNS = {
            "nothing", "anything", "everything", "all", "none", "nobody", "anybody", "everybody", "anyone", "everyone", "noone"};
    /** First words of two-word prepositions ending in "of" that taggers read as adverbs ("out/RB of"). */
    private static final String[] FIRST_OF_TWO_WORD_PREPOSITIONS = {"out", "because", "instead", "ahead", "outside", "inside"};
    /** Prepositions that taggers read as particles or adverbs before a name or number ("closed on/RP Sunday"). */
    private static final String[] PREPOSITIONS_READ_AS_PARTICLES = {
            "on", "in", "at", "by", "for", "from", "with", "to", "into", "over", "through", "around", "after", "before", "since", "until"};
    /** Prepositions, subordinators and coordinators that end like an inflected word ("during", "unless", "plus"). */
    private static final String[] INFLECTED_FUNCTION_WORDS = {
            "during", "unless", "across", "towards", "besides", "whereas", "versus", "plus", "minus", "less", "thus",
            "times", "including", "regarding", "concerning", "considering", "following", "excluding", "according",
            "pending", "barring", "notwithstanding", "provided", "afterwards", "upwards", "downwards", "backwards"};
    /** Words that are prepositions whatever a tagger says. */
    private static final String[] ONLY_PREPOSITIONS = {
            "at", "of", "with", "from", "into", "onto", "upon", "during", "among", "towards", "toward", "via", "per"};
    /** Nouns of time that stand alone as adverbials after a noun ("the meeting today at 10"), not inside its run. */
    private static final String[] TIME_ADVERBIAL_NOUNS = {"today", "tonight", "tomorrow", "yesterday"};
    /** Objects of a preposition that make its phrase part of a relative clause ("the office to which it is sent"). */
    private static final String[] RELATIVE_OBJECTS = {"which", "whom"};
    private static final String[] FORMS_OF_BE = {"is", "was", "are", "were", "be", "been", "being", "am", "'s", "'m", "'re"};

    // Word classes of Penn Treebank tags, as the rules above need them.
    private static final byte OTHER = 0, NOUN = 1, PROPER = 2, PRONOUN = 3, NUMBER = 4, VERB = 5, ADJECTIVE = 6,
            ADVERB = 7, DETERMINER = 8, WH_PRONOUN = 9, ADDRESS = 10, PREPOSITION = 11, TO = 12, MODAL = 13,
            DOLLAR = 14, EXISTENTIAL = 15, PHRASE_INNER = 16, CLAUSE_OPENER = 17, WH_ADVERB = 18, FOREIGN = 19,
            COORDINATOR = 20, RELATIVE_DETERMINER = 21, PARTICIPLE = 22, FULL_STOP = 23;

    /** Candidates for every preposition of the sentence, in sentence order. */
    public List<PrepositionCandidates> proposeAll(String[] words, String[] pennTags) {
        byte[] kinds = classify(words, pennTags);
        List<PrepositionCandidates> all = new ArrayList<>();
        for (int i = 0; i < kinds.length; i++) {
            PrepositionCandidates c = propose(words, kinds, i);
            if (c != null) all.add(c);
        }
        return all;
    }

    /** Candidates for the preposition at {@code index}, or {@code null} when it is not a preposition with an object. */
    public PrepositionCandidates propose(String[] words, String[] pennTags, int index) {
        checkLengths(words, pennTags);
        if (index < 0 || index >= words.length) {
            throw new IndexOutOfBoundsException("token " + index + " outside a sentence of " + words.length + " tokens");
        }
        // Every rule looks at most this far from the preposition, so a window of the sentence gives the same answer
        // as the whole sentence at a cost that does not grow with the sentence.
        int from = Math.max(0, index - BACK_WINDOW - 2);
        int to = Math.min(words.length, index + RIGHT_REACH + 2);
        byte[] kinds = new byte[to - from];
        for (int i = from; i < to; i++) kinds[i - from] = kind(pennTags[i]);
        correctMisreadVerbs(words, pennTags, kinds, from);
        correctClosedClassMisreads(words, pennTags, kinds, from);
        if (from == 0) correctOpeningVerb(words, pennTags, kinds);
        String[] windowWords = from == 0 && to == words.length ? words : java.util.Arrays.copyOfRange(words, from, to);
        PrepositionCandidates c = propose(windowWords, kinds, index - from);
        return c == null || from == 0 ? c : shifted(c, from);
    }

    private static PrepositionCandidates shifted(PrepositionCandidates c, int by) {
        int[] heads = new int[c.size()];
        HeadClass[] classes = new HeadClass[c.size()];
        for (int i = 0; i < heads.length; i++) {
            heads[i] = c.head(i) + by;
            classes[i] = c.headClass(i);
        }
        return new PrepositionCandidates(c.preposition() + by, c.object() + by, heads, classes,
                c.isQuadruple() ? c.quadrupleVerb() + by : -1, c.isQuadruple() ? c.quadrupleNoun() + by : -1);
    }

    /**
     * Log lines and headlines drop the subject ("Replaced the impeller ...", "Tested the alarm ..."), and taggers
     * trained on edited text often tag such a capitalized opening verb as an adjective or a proper noun. A first
     * word in -ed followed by a determiner, possessive or number is taken as the verb it almost always is.
     */
    private static void correctOpeningVerb(String[] words, String[] pennTags, byte[] kinds) {
        if (kinds.length < 2) return;
        String w = words[0];
        String tag = pennTags[0];
        String next = pennTags[1];
        boolean misread = "JJ".equals(tag) || "NNP".equals(tag) || "NN".equals(tag) || "VBN".equals(tag);
        boolean objectFollows = "DT".equals(next) || "PRP$".equals(next) || "CD".equals(next);
        if (misread && objectFollows && w.length() > 4 && Character.isUpperCase(w.charAt(0))
                && w.regionMatches(true, w.length() - 2, "ed", 0, 2)) {
            kinds[0] = VERB;
        }
    }

    /**
     * Taggers trained on web text sometimes tag a main verb after its subject as an adjective, or a word as
     * punctuation ("BP shut/JJ its refinery", "prices advanced/JJ 53 cents", "Bush nominated/, two judges"). A word
     * of letters tagged so, between a noun, name or pronoun and a determiner, possessive or number, is taken as a
     * verb; any other word of letters tagged as punctuation is no clause break. A preposition tagged as a particle or
     * adverb before a name or number ("closed on/RP Sunday"), and the first word of "out of" and the like tagged as
     * an adverb, are taken as prepositions. (Measured on UD English EWT dev end
     * to end with the EWT-trained tagger; see the class comment for the figures.) {@code kinds[k]} is the kind of
     * {@code words[k + offset]}.
     */
    private static void correctMisreadVerbs(String[] words, String[] pennTags, byte[] kinds, int offset) {
        for (int k = 0; k < kinds.length; k++) {
            String tag = pennTags[k + offset];
            boolean punctuationTag = ",".equals(tag) || ".".equals(tag) || ":".equals(tag);
            String word = words[k + offset];
            boolean adverbial = "RP".equals(tag) || "RB".equals(tag);
            if (adverbial && k + 1 < kinds.length) {
                String next = pennTags[k + 1 + offset];
                boolean firstOfTwo = isOneOf(word, FIRST_OF_TWO_WORD_PREPOSITIONS) && "of".equalsIgnoreCase(words[k + 1 + offset]);
                boolean beforeNameOrNumber = isOneOf(word, PREPOSITIONS_READ_AS_PARTICLES)
                        && ("NNP".equals(next) || "NNPS".equals(next) || "CD".equals(next));
                if (firstOfTwo || beforeNameOrNumber) kinds[k] = PREPOSITION;
                continue;
            }
            if (!(punctuationTag || "JJ".equals(tag)) || !isWordOfLetters(word)) continue;
            boolean afterSubject = k > 0 && (kinds[k - 1] == NOUN || kinds[k - 1] == PROPER || kinds[k - 1] == PRONOUN);
            String next = k + 1 < kinds.length ? pennTags[k + 1 + offset] : "";
            boolean objectFollows = "DT".equals(next) || "PRP$".equals(next) || "CD".equals(next);
            if (afterSubject && (objectFollows || punctuationTag)) {
                kinds[k] = VERB;
            } else if (punctuationTag) {
                kinds[k] = OTHER;
            }
        }
    }

    /**
     * A tagger that meets an unknown word sometimes gives it a closed-class tag ("forces on Tuesday condemned/CC
     * Sharon", "customers adds/IN entertainment"), and sometimes tags a preposition as a noun ("seeing the film at/NN
     * the cinema"). A word of letters tagged {@code IN} or {@code CC} that ends like an inflected verb or a plural
     * (-s, -ed, -ing) and is none of the few English prepositions and coordinators of that shape is read as a verb
     * after a subject, "to" or a modal, or when it ends in "-ed", and as a noun otherwise; an interjection right
     * after "to" or a modal is a verb ("to welcome/UH"); and a word that is only ever a preposition is one whatever
     * its tag. (Measured on UD English EWT end to end with the EWT-trained tagger; see the class comment.)
     */
    private static void correctClosedClassMisreads(String[] words, String[] pennTags, byte[] kinds, int offset) {
        for (int k = 0; k < kinds.length; k++) {
            String tag = pennTags[k + offset];
            String word = words[k + offset];
            boolean prepositionTag = "IN".equals(tag) || "TO".equals(tag);
            if (!prepositionTag && isOneOf(word, ONLY_PREPOSITIONS)) {
                kinds[k] = PREPOSITION;
                continue;
            }
            boolean closedTag = "IN".equals(tag) || "CC".equals(tag);
            boolean interjection = "UH".equals(tag);
            if (!(closedTag || interjection) || !isWordOfLetters(word)) continue;
            byte previous = k > 0 ? kinds[k - 1] : OTHER;
            boolean afterVerbMarker = previous == TO || previous == MODAL;
            if (interjection) {
                if (afterVerbMarker) kinds[k] = VERB;
                continue;
            }
            if (!looksInflected(word) || isOneOf(word, INFLECTED_FUNCTION_WORDS)) continue;
            boolean afterSubject = previous == NOUN || previous == PROPER || previous == PRONOUN;
            boolean past = word.regionMatches(true, word.length() - 2, "ed", 0, 2);
            kinds[k] = afterSubject || afterVerbMarker || past ? VERB : NOUN;
        }
    }

    /** Whether a word longer than three letters ends in -s, -ed or -ing. */
    private static boolean looksInflected(String w) {
        int n = w.length();
        return n > 3 && (w.regionMatches(true, n - 1, "s", 0, 1) || w.regionMatches(true, n - 2, "ed", 0, 2)
                || w.regionMatches(true, n - 3, "ing", 0, 3));
    }

    private static boolean isWordOfLetters(String w) {
        if (w.length() < 2) return false;
        for (int i = 0; i < w.length(); i++) if (!Character.isLetter(w.charAt(i))) return false;
        return true;
    }

    private static byte[] classify(String[] words, String[] pennTags) {
        checkLengths(words, pennTags);
        byte[] kinds = new byte[words.length];
        for (int i = 0; i < kinds.length; i++) kinds[i] = kind(pennTags[i]);
        correctMisreadVerbs(words, pennTags, kinds, 0);
        correctClosedClassMisreads(words, pennTags, kinds, 0);
        correctOpeningVerb(words, pennTags, kinds);
        return kinds;
    }

    private static void checkLengths(String[] words, String[] pennTags) {
        if (words.length != pennTags.length) {
            throw new IllegalArgumentException("words and tags differ in length: " + words.length + " vs " + pennTags.length
                    + "; give one Penn Treebank tag per word");
        }
    }

    private PrepositionCandidates propose(String[] words, byte[] kinds, int p) {
        if (!isPreposition(words, kinds, p)) return null;
        int object = findObject(words, kinds, p);
        if (object < 0) return null;

        int[] before = new int[MAX_PRECEDING + 1];
        HeadClass[] beforeClasses = new HeadClass[MAX_PRECEDING + 1];
        int found = 0;
        boolean verbBefore = false;
        int verbsBefore = 0, lastVerb = -1;
        int lowest = Math.max(0, p - BACK_WINDOW);
        for (int k = p - 1; k >= lowest && !(verbBefore && found >= MAX_PRECEDING); k--) {
            HeadClass c = candidateClass(words, kinds, k);
            boolean firstVerb = c == HeadClass.VERB && !verbBefore;
            if (c == HeadClass.VERB) {
                verbBefore = true;
                verbsBefore++;
                lastVerb = k;
            }
            if (c != null && (found < MAX_PRECEDING || firstVerb)) {
                before[found] = k;
                beforeClasses[found] = c;
                found++;
            }
        }
        // Two verb groups, each with a predicate, and the phrase after a degree phrase.
        int[] after = new int[2 * FOLLOWING_GROUPS + 1];
        HeadClass[] afterClasses = new HeadClass[after.length];
        int following = 0;
        // "Based on the log, ..." opens with a participle clause; "Tested the alarm on every deck" (log style, no
        // subject) opens with its main verb, which takes an object and does block.
        boolean openingParticiple = verbsBefore == 1 && lastVerb == 0 && kinds[0] == PARTICIPLE
                && kinds.length > 1 && (kinds[1] == PREPOSITION || kinds[1] == TO);
        boolean relative = (kinds[object] == WH_PRONOUN || kinds[object] == RELATIVE_DETERMINER)
                || isOneOf(words[object], RELATIVE_OBJECTS);
        if (!verbBefore || p == 0 || opensClause(kinds[p - 1]) || relative || openingParticiple) {
            following = followingHeads(words, kinds, object, after, afterClasses);
        }
        if (object == p + 1 && isDegreePhrase(words, p)) {
            following = insertInOrder(degreeTarget(kinds, object), kinds, after, afterClasses, following);
        }
        int[] heads = new int[found + following];
        HeadClass[] classes = new HeadClass[found + following];
        mergeByDistance(p, before, beforeClasses, found, after, afterClasses, following, heads, classes);

        int quadrupleNoun = -1, quadrupleVerb = -1;
        if (p > 0 && isNominal(kinds[p - 1])) {
            int verb = verbBeforePhrase(kinds, p - 1);
            for (int i = 0; i < found; i++) {
                if (before[i] == verb) {
                    quadrupleNoun = p - 1;
                    quadrupleVerb = verb;
                }
            }
        }
        return new PrepositionCandidates(p, object, heads, classes, quadrupleVerb, quadrupleNoun);
    }

    private static boolean isPreposition(String[] words, byte[] kinds, int p) {
        if (kinds[p] == COORDINATOR && "but".equalsIgnoreCase(words[p]) && p > 0 && isOneOf(words[p - 1], EXCEPTIVE_PRONOUNS)) {
            return true;
        }
        if (kinds[p] != PREPOSITION && kinds[p] != TO) return false;
        if (!isOneOf(words[p], SUBORDINATORS)) return true;
        return p + 1 < words.length && "of".equalsIgnoreCase(words[p + 1])
                && "because".equalsIgnoreCase(words[p]);
    }

    /** The head of the preposition's object, or -1 when the preposition introduces no noun phrase. */
    private static int findObject(String[] words, byte[] kinds, int p) {
        int n = kinds.length;
        int end = Math.min(n, p + 1 + OBJECT_WINDOW);
        int start = p + 1;
        if (start < n && (kinds[start] == PREPOSITION || kinds[start] == TO) && !isOneOf(words[start], SUBORDINATORS)) start++;
        else if (start + 1 < n && kinds[start] == COORDINATOR && (kinds[start + 1] == PREPOSITION || kinds[start + 1] == TO)
                && !isOneOf(words[start + 1], SUBORDINATORS)) start += 2;
        if (start == p + 1 && start < n && isDegreePhrase(words, p)) return start;
        if (start < n && (kinds[start] == ADVERB || kinds[start] == WH_ADVERB || kinds[start] == ADJECTIVE)
                && isOneOf(words[start], ADVERBIAL_OBJECTS) && !startsPhrase(kinds, start + 1)) {
            return start;
        }
        for (int k = start; k < end; k++) {
            switch (kinds[k]) {
                case NOUN, PROPER -> {
                    return endOfRun(kinds, k);
                }
                case NUMBER, DOLLAR -> {
                    int j = k;
                    while (j + 1 < end && (kinds[j + 1] == NUMBER || isNoun(kinds[j + 1]))) j++;
                    return j;
                }
                case PRONOUN, WH_PRONOUN, EXISTENTIAL, ADDRESS -> {
                    return k;
                }
                case DETERMINER -> {
                    if (!continuesAfterDeterminer(kinds, k + 1)) return k;
                }
                case ADJECTIVE -> {
                    if (!continuesAfterAdjective(kinds, k + 1)) return k;
                }
                case RELATIVE_DETERMINER -> {
                    if (!continuesAfterDeterminer(kinds, k + 1)) return k;
                }
                case PARTICIPLE -> {
                    if (words[k].toLowerCase(java.util.Locale.ROOT).endsWith("ing") && !continuesAfterGerund(kinds, k + 1)) return k;
                }
                case ADVERB, PHRASE_INNER -> { }
                default -> {
                    return -1;
                }
            }
        }
        return -1;
    }

    /** The last noun of the run starting at {@code k}, following at most {@value #MAX_RUN} nouns. */
    private static int endOfRun(byte[] kinds, int k) {
        int limit = Math.min(kinds.length - 1, k + MAX_RUN);
        while (k < limit && isNoun(kinds[k + 1])) k++;
        return k;
    }

    /** Whether a gerund at {@code k - 1} has something after it that continues a phrase (an object or a noun it modifies). */
    private static boolean continuesAfterGerund(byte[] kinds, int k) {
        if (k >= kinds.length) return false;
        byte b = kinds[k];
        return b != CLAUSE_OPENER && b != COORDINATOR && b != FULL_STOP;
    }

    /** Adds {@code head} (unless -1 or already there) to the following heads, kept in sentence order; returns the count. */
    private static int insertInOrder(int head, byte[] kinds, int[] after, HeadClass[] afterClasses, int count) {
        if (head < 0) return count;
        int at = count;
        while (at > 0 && after[at - 1] >= head) {
            if (after[at - 1] == head) return count;
            at--;
        }
        System.arraycopy(after, at, after, at + 1, count - at);
        System.arraycopy(afterClasses, at, afterClasses, at + 1, count - at);
        after[at] = head;
        afterClasses[at] = kinds[head] == ADJECTIVE ? HeadClass.ADJECTIVE : HeadClass.NOUN;
        return count + 1;
    }

    /** "at least", "at most", "by far": a degree phrase whose object modifies the phrase that follows it. */
    private static boolean isDegreePhrase(String[] words, int p) {
        if (p + 1 >= words.length) return false;
        String a = words[p], b = words[p + 1];
        return ("at".equalsIgnoreCase(a) && ("least".equalsIgnoreCase(b) || "most".equalsIgnoreCase(b)))
                || ("by".equalsIgnoreCase(a) && "far".equalsIgnoreCase(b));
    }

    /** The head of the phrase after a degree phrase ("at least [two] ...", "by far the best [salon]"), or -1. */
    private static int degreeTarget(byte[] kinds, int object) {
        int n = kinds.length;
        for (int k = object + 1; k < n && k <= object + PREDICATE_WINDOW; k++) {
            byte b = kinds[k];
            if (b == NUMBER) return k;
            if (isNoun(b)) return endOfRun(kinds, k);
            if (b == ADJECTIVE) {
                if (k + 1 < n && (isNoun(kinds[k + 1]) || kinds[k + 1] == ADJECTIVE)) continue;
                return k;
            }
            if (b != DETERMINER && b != PHRASE_INNER && b != ADVERB && b != PREPOSITION) return -1;
        }
        return -1;
    }

    private static boolean startsPhrase(byte[] kinds, int k) {
        return k < kinds.length && (isNoun(kinds[k]) || kinds[k] == ADJECTIVE || kinds[k] == NUMBER);
    }

    private static boolean continuesAfterDeterminer(byte[] kinds, int k) {
        if (k >= kinds.length) return false;
        byte b = kinds[k];
        return isNoun(b) || b == ADJECTIVE || b == NUMBER || b == ADVERB || b == PHRASE_INNER || b == PARTICIPLE;
    }

    private static boolean continuesAfterAdjective(byte[] kinds, int k) {
        if (k >= kinds.length) return false;
        byte b = kinds[k];
        return isNoun(b) || b == ADJECTIVE || b == NUMBER || b == PHRASE_INNER || b == FOREIGN || b == ADDRESS
                || b == PRONOUN || b == PARTICIPLE;
    }

    /** The class of token {@code k} as a candidate head, or {@code null} when it cannot be one. */
    private static HeadClass candidateClass(String[] words, byte[] kinds, int k) {
        byte next = k + 1 < kinds.length ? kinds[k + 1] : OTHER;
        switch (kinds[k]) {
            case VERB:
            case PARTICIPLE:
                return HeadClass.VERB;
            case PROPER:
                if (next == PROPER && (k == 0 || kinds[k - 1] != PROPER)) return HeadClass.NOUN;
                return isNoun(next) ? null : HeadClass.NOUN;
            case NOUN:
                if (isNoun(next) && isOneOf(words[k + 1], TIME_ADVERBIAL_NOUNS)) return HeadClass.NOUN;
                return isNoun(next) ? null : HeadClass.NOUN;
            case PRONOUN:
            case WH_PRONOUN:
            case ADDRESS:
                return HeadClass.NOUN;
            case NUMBER:
                if (k > 0 && kinds[k - 1] == DOLLAR) return null;
                return isNoun(next) ? null : HeadClass.NOUN;
            case DOLLAR:
                return next == NUMBER ? HeadClass.NOUN : null;
            case WH_ADVERB:
                return next == PREPOSITION ? HeadClass.ADVERB : null;
            case RELATIVE_DETERMINER:
                return next == PREPOSITION ? HeadClass.NOUN : null;
            case DETERMINER:
                return next == PREPOSITION ? HeadClass.NOUN : null;
            case ADJECTIVE:
                return isNoun(next) || next == ADJECTIVE || next == NUMBER ? null : HeadClass.ADJECTIVE;
            case ADVERB:
                return HeadClass.ADVERB;
            default:
                return null;
        }
    }

    private static boolean opensClause(byte kind) {
        return kind == CLAUSE_OPENER || kind == COORDINATOR || kind == RELATIVE_DETERMINER || kind == WH_PRONOUN
                || kind == PREPOSITION;
    }

    /**
     * Writes the main verb of each of the next {@value #FOLLOWING_GROUPS} verb groups after {@code from}, each followed
     * by its predicate when the verb is a form of "be"; returns how many heads were written. A verb group runs through
     * auxiliaries, modals and adverbs but stops before "to": "do n't want to be" has the main verb "want".
     */
    private static int followingHeads(String[] words, byte[] kinds, int from, int[] heads, HeadClass[] classes) {
        int n = kinds.length;
        int written = 0;
        int end = Math.min(n, from + 1 + FORWARD_WINDOW);
        for (int k = from + 1, g = 0; k < end && g < FOLLOWING_GROUPS; k++) {
            if (!isVerb(kinds[k])) continue;
            int main = k;
            for (int j = k + 1; j < n && j < k + VERB_GROUP; j++) {
                byte b = kinds[j];
                if (isVerb(b)) main = j;
                else if (b != ADVERB && b != MODAL) break;
            }
            heads[written] = main;
            classes[written++] = HeadClass.VERB;
            g++;
            k = main;
            end = Math.min(n, main + 1 + FORWARD_WINDOW);
            if (!isOneOf(words[main], FORMS_OF_BE)) continue;
            int predicate = predicateAfter(words, kinds, main);
            if (predicate < 0) continue;
            heads[written] = predicate;
            classes[written++] = kinds[predicate] == ADJECTIVE ? HeadClass.ADJECTIVE
                    : kinds[predicate] == ADVERB ? HeadClass.ADVERB : HeadClass.NOUN;
        }
        return written;
    }

    /**
     * The predicate after a form of "be": an adjective, a noun, a clause-final adverb, or the object of a preposition
     * ("was among the plaintiffs": UD heads such a clause on "plaintiffs"); -1 when there is none.
     */
    private static int predicateAfter(String[] words, byte[] kinds, int be) {
        int n = kinds.length;
        for (int m = be + 1; m < n && m < be + PREDICATE_WINDOW; m++) {
            byte b = kinds[m];
            if (b == ADJECTIVE && !continuesAfterAdjective(kinds, m + 1)) return m;
            if (b == ADVERB && m + 1 < n && (kinds[m + 1] == CLAUSE_OPENER || kinds[m + 1] == FULL_STOP)) return m;
            if (isNoun(b)) return endOfRun(kinds, m);
            if (b == PREPOSITION && !isOneOf(words[m], SUBORDINATORS)) return findObject(words, kinds, m);
            if (b != DETERMINER && b != ADVERB && b != NUMBER && b != PHRASE_INNER && b != ADJECTIVE) return -1;
        }
        return -1;
    }

    /** The verb right before the noun phrase that ends at {@code noun}, or -1 when something else precedes it. */
    private static int verbBeforePhrase(byte[] kinds, int noun) {
        int lowest = Math.max(0, noun - PHRASE_WINDOW);
        for (int k = noun - 1; k >= lowest; k--) {
            byte b = kinds[k];
            boolean prenominal = b == PARTICIPLE && k > 0 && (kinds[k - 1] == DETERMINER || kinds[k - 1] == PHRASE_INNER);
            if (isVerb(b) && !prenominal) return k;
            if (!(isNoun(b) || prenominal || b == DETERMINER || b == ADJECTIVE || b == NUMBER || b == PHRASE_INNER)) return -1;
        }
        return -1;
    }

    private static void mergeByDistance(int p, int[] before, HeadClass[] beforeClasses, int nBefore,
                                        int[] after, HeadClass[] afterClasses, int nAfter,
                                        int[] heads, HeadClass[] classes) {
        int i = 0, j = 0, out = 0;
        while (i < nBefore || j < nAfter) {
            boolean takeBefore = j >= nAfter || (i < nBefore && p - before[i] <= after[j] - p);
            if (takeBefore) {
                heads[out] = before[i];
                classes[out++] = beforeClasses[i++];
            } else {
                heads[out] = after[j];
                classes[out++] = afterClasses[j++];
            }
        }
    }

    private static boolean isVerb(byte kind) {
        return kind == VERB || kind == PARTICIPLE;
    }

    private static boolean isNoun(byte kind) {
        return kind == NOUN || kind == PROPER;
    }

    private static boolean isNominal(byte kind) {
        return kind == NOUN || kind == PROPER || kind == PRONOUN || kind == NUMBER;
    }

    private static boolean isOneOf(String word, String[] list) {
        for (String s : list) {
            if (s.equalsIgnoreCase(word)) return true;
        }
        return false;
    }

    private static byte kind(String tag) {
        if (tag == null) return OTHER;
        switch (tag) {
            case "NN": case "NNS": return NOUN;
            case "NNP": case "NNPS": return PROPER;
            case "PRP": return PRONOUN;
            case "CD": return NUMBER;
            case "VB": case "VBD": case "VBP": case "VBZ": return VERB;
            case "VBG": case "VBN": return PARTICIPLE;
            case ".": return FULL_STOP;
            case "JJ": case "JJR": case "JJS": return ADJECTIVE;
            case "RB": case "RBR": case "RBS": return ADVERB;
            case "DT": return DETERMINER;
            case "WP": return WH_PRONOUN;
            case "WRB": return WH_ADVERB;
            case "WDT": return RELATIVE_DETERMINER;
            case "ADD": return ADDRESS;
            case "IN": return PREPOSITION;
            case "TO": return TO;
            case "MD": return MODAL;
            case "$": return DOLLAR;
            case "EX": return EXISTENTIAL;
            case "FW": return FOREIGN;
            case "CC": return COORDINATOR;
            case ",": case ":": case "-LRB-": return CLAUSE_OPENER;
            // Tokens that may sit inside a noun phrase before its head ("all the", "my", "'s", "well-known").
            case "PDT": case "PRP$": case "POS": case "HYPH": case "WP$": case "``": case "''": case "NFP": case "AFX":
                return PHRASE_INNER;
            default: return OTHER;
        }
    }
}
