package dev.tether.coordination;

import dev.tether.candidates.HeadClass;

import java.util.ArrayList;
import java.util.List;

/**
 * Proposes, for every coordinating conjunction of a Penn-tagged sentence, the plausible bracketings: one to three
 * readings of the last conjunct's head (the noun group after the coordinator, a clause's verb after it, an adjective
 * or adverb), and for each the plausible heads of the first conjunct before it (words of the same class first, a
 * few of other classes), with the words around the coordination whose scope is in question
 * ({@link ModifierKind}). Run time and treebank training share this code, so both see the same candidates.
 *
 * <p>Rules only widen or bound the candidate set; which bracketing is right is the ranker's job. The scan for a first
 * conjunct stops at clause punctuation ({@code ; : ( )} and sentence ends) but goes through commas (lists and
 * clauses joined by ", and"). <b>Bounds:</b> the scan covers at most {@link #BACK_WINDOW} tokens, keeps at most
 * {@link #MAX_SAME_CLASS} heads of the last conjunct's class and {@link #MAX_OTHER_CLASS} of each other class, and
 * counts what it leaves out ({@link CoordinatorCandidates#capped()}), so work per coordinator is bounded whatever
 * the sentence length. A coordinator at the start or end of a sentence, or with no word of any class on one side,
 * gets no candidates. Stateless and thread-safe.
 */
public final class ConjunctCandidateProposer {
    /** Tokens before the coordinator scanned for the first conjunct. */
    public static final int BACK_WINDOW = 40;
    /** First-conjunct heads of the last conjunct's class kept, nearest first. */
    public static final int MAX_SAME_CLASS = 8;
    /** First-conjunct heads kept of each other class. */
    public static final int MAX_OTHER_CLASS = 3;
    /** Readings of the last conjunct's head kept. */
    public static final int MAX_RIGHT = 5;
    /** Tokens after the coordinator scanned for the last conjunct. */
    public static final int FORWARD_WINDOW = 12;
    /** Premodifiers of a nominal first conjunct considered. */
    static final int MAX_PREMODIFIERS = 3;
    /** Tokens a noun or verb group may span. */
    static final int GROUP = 8;
    /** Tokens a clause after a verbal last conjunct may span. */
    static final int CLAUSE = 30;

    private static final String[] PRECONJUNCTIONS = {"both", "either", "neither", "whether"};
    /** Forms of "be", with the curly-apostrophe clitics and the unpunctuated ones of informal text ("it s", "i m", "you r"). */
    static final String[] FORMS_OF_BE = {"is", "was", "are", "were", "be", "been", "being", "am", "'s", "'m", "'re",
            "\u2019s", "\u2019m", "\u2019re", "s", "m", "r", "re"};
    static final String[] AUXILIARIES = {"have", "has", "had", "'ve", "'d", "do", "does", "did", "having", "\u2019ve", "\u2019d"};
    private static final String[] CLAUSE_OPENERS = {"if", "when", "since", "once", "because", "while", "although", "though",
            "unless", "whenever", "after", "before", "until"};
    private static final String[] SUBORDINATORS = {"because", "if", "that", "while", "as", "since", "though", "although",
            "unless", "whether", "than", "so", "once", "until", "after", "before"};

    static final byte OTHER = 0, NOUN = 1, PRONOUN = 2, NUMBER = 3, VERB = 4, PARTICIPLE = 5, ADJECTIVE = 6, ADVERB = 7,
            DETERMINER = 8, PREPOSITION = 9, MODAL = 10, TO = 11, COORDINATOR = 12, COMMA = 13, BARRIER = 14, INNER = 15,
            EXISTENTIAL = 16, WH = 17, PROPER = 18, SYMBOL = 19, CLOSE = 20, OPEN = 21;

    /** Every coordinator of the sentence with its candidates, in text order. */
    public List<CoordinatorCandidates> proposeAll(String[] words, String[] pennTags) {
        if (words.length != pennTags.length) {
            throw new IllegalArgumentException("words and tags differ in length: " + words.length + " vs " + pennTags.length
                    + "; give one Penn Treebank tag per word");
        }
        byte[] kinds = new byte[words.length];
        for (int i = 0; i < kinds.length; i++) kinds[i] = kind(pennTags[i]);
        List<CoordinatorCandidates> out = new ArrayList<>();
        for (int c = 0; c < words.length; c++) {
            if (!isCoordinator(words, kinds, c)) continue;
            CoordinatorCandidates found = propose(words, kinds, c);
            if (found != null) out.add(found);
        }
        return out;
    }

    /**
     * Whether token {@code c} is a coordinating conjunction: a word tagged as one (not the first half of "both ...
     * and"), a slash between two words ("read / relax", "owner / baker"; not inside "and/or"), or the first word of
     * "as well as" or "rather than".
     */
    static boolean isCoordinator(String[] words, byte[] kinds, int c) {
        if (kinds[c] == COORDINATOR) return !isOneOf(words[c], PRECONJUNCTIONS);
        int n = words.length;
        if (words[c].equals("/")) {
            return c > 0 && c + 1 < n && classOf(words, kinds, c - 1) != null && classOf(words, kinds, c + 1) != null;
        }
        return connectiveLength(words, c) > 0;
    }

    /** Tokens of a multiword coordinator starting at {@code c} ("as well as": 3, "rather than": 2), 0 for none. */
    static int connectiveLength(String[] words, int c) {
        int n = words.length;
        if (c + 2 < n && words[c].equalsIgnoreCase("as") && words[c + 1].equalsIgnoreCase("well") && words[c + 2].equalsIgnoreCase("as")) return 3;
        if (c + 1 < n && words[c].equalsIgnoreCase("rather") && words[c + 1].equalsIgnoreCase("than")) return 2;
        return 0;
    }

    private CoordinatorCandidates propose(String[] words, byte[] kinds, int c) {
        int n = words.length;
        if (c == 0 || c == n - 1) return null;
        int[] rights = new int[MAX_RIGHT];
        HeadClass[] rightClasses = new HeadClass[MAX_RIGHT];
        int nr = rightHeads(words, kinds, c, rights, rightClasses);
        if (nr == 0) return null;
        List<ConjunctPair> pairs = new ArrayList<>();
        int capped = 0;
        int lowest = Math.max(0, c - BACK_WINDOW);
        for (int r = 0; r < nr; r++) {
            int[] perClass = new int[HeadClass.values().length];
            for (int k = c - 1; k >= lowest; k--) {
                // Clause punctuation ends the scan, except right before the coordinator ("; but", "( or").
                if (kinds[k] == CLOSE) {
                    // A bracketed aside ("Joan (3-5213), Bert (3-5076) or Kathy"): the scan goes on before its opening.
                    int open = openingBracket(kinds, k, lowest);
                    if (open < 0) break;
                    k = open;
                    continue;
                }
                if (isBarrier(kinds[k]) && k < c - 1) break;
                HeadClass cls = classOf(words, kinds, k);
                if (cls == null) continue;
                int limit = cls == rightClasses[r] ? MAX_SAME_CLASS : MAX_OTHER_CLASS;
                if (perClass[cls.ordinal()] >= limit) {
                    if (r == 0) capped++;
                    continue;
                }
                perClass[cls.ordinal()]++;
                pairs.add(pair(words, kinds, c, k, cls, rights[r], rightClasses[r]));
            }
            if (r == 0 && lowest > 0 && !barrierBetween(kinds, lowest, c)) capped += contentBefore(words, kinds, lowest);
        }
        if (pairs.isEmpty()) return null;
        return new CoordinatorCandidates(c, pairs, capped);
    }

    private static boolean isBarrier(byte kind) {
        return kind == BARRIER || kind == CLOSE || kind == OPEN;
    }

    /** The opening bracket that matches the closing one at {@code close}, not before {@code lowest}; -1 when none. */
    private static int openingBracket(byte[] kinds, int close, int lowest) {
        for (int k = close - 1; k >= lowest; k--) {
            if (kinds[k] == OPEN) return k;
            if (kinds[k] == BARRIER || kinds[k] == CLOSE) return -1;
        }
        return -1;
    }

    private static boolean barrierBetween(byte[] kinds, int from, int to) {
        for (int k = from; k < to; k++) if (isBarrier(kinds[k])) return true;
        return false;
    }

    /** Content words before {@code from} within {@link #BACK_WINDOW} more tokens (what the window leaves out, bounded). */
    private static int contentBefore(String[] words, byte[] kinds, int from) {
        int count = 0;
        for (int k = from - 1; k >= Math.max(0, from - BACK_WINDOW) && !isBarrier(kinds[k]); k--) {
            if (classOf(words, kinds, k) != null) count++;
        }
        return count;
    }

    /** The readings of the last conjunct's head after coordinator {@code c}; returns how many. */
    private static int rightHeads(String[] words, byte[] kinds, int c, int[] heads, HeadClass[] classes) {
        int n = words.length;
        int s = c + Math.max(1, connectiveLength(words, c));
        // "and, ...", "and/or": the conjunct starts after them.
        while (s < n && s <= c + 3 && (kinds[s] == COMMA || kinds[s] == COORDINATOR || kinds[s] == SYMBOL)) s++;
        if (s >= n || isBarrier(kinds[s]) && s == n - 1) return 0;
        int end = Math.min(n, c + FORWARD_WINDOW);
        int count = 0;
        int v = s;
        while (v < end && kinds[v] == ADVERB) v++;
        if (v < n && (isVerb(kinds[v]) || kinds[v] == MODAL || kinds[v] == TO)) {
            int[] head = mainVerb(words, kinds, v);
            if (head[0] >= 0) count = add(heads, classes, count, head[0], HeadClass.values()[head[1]]);
        }
        if (kinds[s] == ADJECTIVE || kinds[s] == ADVERB) {
            count = add(heads, classes, count, s, kinds[s] == ADJECTIVE ? HeadClass.ADJECTIVE : HeadClass.ADVERB);
        }
        // "and very dangerous": an adjective after adverbs.
        if (v > s && v < n && kinds[v] == ADJECTIVE) count = add(heads, classes, count, v, HeadClass.ADJECTIVE);
        // "and in Washington": the conjunct is the object of the preposition.
        int g = kinds[s] == PREPOSITION && !isOneOf(words[s], SUBORDINATORS) && s + 1 < n ? s + 1 : s;
        int noun = nounGroupHead(kinds, g);
        if (noun >= 0) {
            count = add(heads, classes, count, noun, HeadClass.NOUN);
            // "ham and cheese sandwich": the first noun of a compound may be the conjunct.
            int first = g;
            while (first < noun && !(kinds[first] == NOUN || kinds[first] == PROPER || kinds[first] == NUMBER)) first++;
            if (first < noun && !(kinds[first] == PROPER && kinds[noun] == PROPER)) count = add(heads, classes, count, first, HeadClass.NOUN);
            // "Urban Development", "Rodale Books": a name may also be headed by its last word (a compound in UD).
            int last = noun;
            while (kinds[noun] == PROPER && last + 1 < n && last + 1 < g + GROUP && kinds[last + 1] == PROPER) last++;
            if (last > noun) count = add(heads, classes, count, last, HeadClass.NOUN);
        }
        // "but if you want to reach me, write": after a subordinate clause, the main clause's verb.
        if (isOneOf(words[s], CLAUSE_OPENERS)) {
            for (int k = s + 1; k < n && k <= s + CLAUSE; k++) {
                if (isBarrier(kinds[k]) || kinds[k] == COORDINATOR) break;
                if (kinds[k] != COMMA) continue;
                int m = k + 1;
                while (m < n && kinds[m] == ADVERB) m++;
                if (m < n && (isVerb(kinds[m]) || kinds[m] == MODAL)) {
                    int[] head = mainVerb(words, kinds, m);
                    if (head[0] >= 0) count = add(heads, classes, count, head[0], HeadClass.values()[head[1]]);
                } else {
                    for (int j = m; j < n && j < m + GROUP; j++) {
                        if (kinds[j] == VERB || kinds[j] == MODAL) {
                            int[] head = mainVerb(words, kinds, j);
                            if (head[0] >= 0) count = add(heads, classes, count, head[0], HeadClass.values()[head[1]]);
                            break;
                        }
                        if (isBarrier(kinds[j]) || kinds[j] == COMMA) break;
                    }
                }
                break;
            }
        }
        // A clause after the coordinator ("... and the engineer replaced the seals", "but if one raises doubts"):
        // the first verb group within the window.
        for (int k = Math.max(s, noun + 1); k < end; k++) {
            if (isBarrier(kinds[k]) || kinds[k] == COORDINATOR) break;
            if (kinds[k] == VERB || kinds[k] == MODAL) {
                int[] head = mainVerb(words, kinds, k);
                if (head[0] >= 0) count = add(heads, classes, count, head[0], HeadClass.values()[head[1]]);
                break;
            }
        }
        if (count == 0 && kinds[s] == PARTICIPLE) count = add(heads, classes, count, s, HeadClass.VERB);
        return count;
    }

    private static int add(int[] heads, HeadClass[] classes, int count, int head, HeadClass cls) {
        for (int i = 0; i < count; i++) if (heads[i] == head) return count;
        if (count == heads.length) return count;
        heads[count] = head;
        classes[count] = cls;
        return count + 1;
    }

    /**
     * The main word of the verb group starting at {@code v}: its first verb that is not an auxiliary ("will try to
     * catch": try), its last auxiliary when it has no other verb, or the predicate after a form of "be" ("is old",
     * "was a mechanic"); {@code {index, HeadClass ordinal}}, index -1 when there is none.
     */
    static int[] mainVerb(String[] words, byte[] kinds, int v) {
        int n = words.length;
        int last = -1;
        for (int k = v; k < n && k < v + GROUP; k++) {
            byte kind = kinds[k];
            if (isVerb(kind)) {
                last = k;
                if (!isAuxiliary(words[k])) return new int[] {k, HeadClass.VERB.ordinal()};
            } else if (kind == MODAL) {
                if (last < 0) last = k;
            } else if (!(kind == ADVERB || kind == TO)) {
                break;
            }
        }
        if (last < 0) return new int[] {-1, 0};
        // "there was no way", "there still are": the existential "be" is the head.
        int before = v - 1;
        while (before > 0 && before > v - 3 && kinds[before] == ADVERB) before--;
        boolean existential = before >= 0 && kinds[before] == EXISTENTIAL;
        if (!existential && isOneOf(words[last], FORMS_OF_BE) && last + 1 < n) {
            int p = last + 1;
            while (p < n && p < last + 4 && (kinds[p] == ADVERB || kinds[p] == DETERMINER && p + 1 < n && kinds[p + 1] == ADJECTIVE)) p++;
            if (p < n && kinds[p] == ADJECTIVE && (p + 1 >= n || !isNounish(kinds[p + 1]))) return new int[] {p, HeadClass.ADJECTIVE.ordinal()};
            if (p < n && (kinds[p] == DETERMINER || kinds[p] == ADJECTIVE || isNounish(kinds[p]))) {
                int h = nounGroupHead(kinds, p);
                if (h >= 0) return new int[] {h, HeadClass.NOUN.ordinal()};
            }
            if (p < n && kinds[p] == PARTICIPLE) return new int[] {p, HeadClass.VERB.ordinal()};
            // "are not in the same cage", "is by the beach": the object of a prepositional predicate.
            if (p + 1 < n && kinds[p] == PREPOSITION && !isOneOf(words[p], SUBORDINATORS)) {
                int h = nounGroupHead(kinds, p + 1);
                if (h >= 0) return new int[] {h, HeadClass.NOUN.ordinal()};
            }
        }
        return new int[] {last, HeadClass.VERB.ordinal()};
    }

    /** The head of the noun group starting at {@code s} (its last noun or number, or a pronoun), or -1. */
    static int nounGroupHead(byte[] kinds, int s) {
        int n = kinds.length;
        if (s < n && kinds[s] == PRONOUN) return s;
        int head = -1;
        for (int k = s; k < n && k < s + GROUP; k++) {
            byte kind = kinds[k];
            if (kind == NOUN || kind == NUMBER || kind == PROPER) {
                // A run of proper nouns is headed by its first ("Donald Rumsfeld"), as UD's flat relation does.
                if (!(kind == PROPER && k > s && kinds[k - 1] == PROPER && head >= 0 && kinds[head] == PROPER)) head = k;
                continue;
            }
            if (head >= 0) {
                if (kind == INNER) continue;   // "the pump 's seals", "two-stroke"
                break;
            }
            if (kind == DETERMINER || kind == ADJECTIVE || kind == INNER || kind == ADVERB || kind == PARTICIPLE) continue;
            break;
        }
        return head;
    }

    /** First token of the noun group that ends with {@code head}. */
    static int groupBegin(byte[] kinds, int head) {
        int b = head;
        while (b - 1 >= 0 && head - b < GROUP && isGroupInner(kinds[b - 1])) b--;
        return b;
    }

    private static boolean isGroupInner(byte kind) {
        return kind == NOUN || kind == PROPER || kind == NUMBER || kind == ADJECTIVE || kind == DETERMINER || kind == INNER || kind == PARTICIPLE;
    }

    private static ConjunctPair pair(String[] words, byte[] kinds, int c, int left, HeadClass leftClass, int right,
                                     HeadClass rightClass) {
        int n = words.length;
        // The first conjunct ends before the coordinator, or before the first comma of a list.
        int leftEnd = c - 1;
        while (leftEnd > left && kinds[leftEnd] == COMMA) leftEnd--;
        int[] middle = middleHeads(words, kinds, left, c, rightClass);
        if (middle.length > 0) {
            int k = left + 1;
            while (k < c && kinds[k] != COMMA) k++;
            leftEnd = k - 1;
        }
        List<ScopeCandidate> modifiers = new ArrayList<>(4);
        int leftBegin = left;
        if (leftClass == HeadClass.NOUN && kinds[left] != PRONOUN) {
            leftBegin = groupBegin(kinds, left);
            int found = 0;
            for (int k = left - 1; k >= leftBegin && found < MAX_PREMODIFIERS; k--) {
                byte kind = kinds[k];
                if (kind == ADJECTIVE || kind == NOUN || kind == PROPER || kind == NUMBER || kind == PARTICIPLE) {
                    modifiers.add(new ScopeCandidate(k, ModifierKind.PREMODIFIER, k, k, -1));
                    found++;
                }
            }
        }
        // A verbal (or predicative) first conjunct: its auxiliaries, a copula, then a subject.
        int b = left;
        if (leftClass != HeadClass.NOUN || kinds[left] != PRONOUN) {
            if (leftClass == HeadClass.NOUN) b = groupBegin(kinds, left);
            int k = b - 1;
            boolean predicate = leftClass == HeadClass.VERB;
            // Before a verb: its auxiliaries; before a noun or adjective: a copula ("the pump is old and leaky").
            while (k >= 0 && b - k < GROUP && (kinds[k] == ADVERB || kinds[k] == MODAL || kinds[k] == TO
                    || (isVerb(kinds[k]) && (leftClass == HeadClass.VERB ? isAuxiliary(words[k]) : isOneOf(words[k], FORMS_OF_BE))))) {
                if (isVerb(kinds[k])) predicate = true;
                k--;
            }
            if (predicate && k >= 0 && (kinds[k] == NOUN || kinds[k] == PROPER || kinds[k] == PRONOUN || kinds[k] == NUMBER || kinds[k] == EXISTENTIAL
                    || kinds[k] == WH)) {
                int subjectBegin = kinds[k] == NOUN || kinds[k] == PROPER || kinds[k] == NUMBER ? groupBegin(kinds, k) : k;
                modifiers.add(new ScopeCandidate(k, ModifierKind.SUBJECT, subjectBegin, k, -1));
                leftBegin = subjectBegin;
            } else if (predicate) {
                leftBegin = Math.min(leftBegin, k + 1);
            }
        }
        int rightBegin = c + 1;
        while (rightBegin < right && kinds[rightBegin] == COMMA) rightBegin++;
        int rightEnd = right;
        if (rightClass == HeadClass.NOUN) {
            int p = right + 1;
            if (p + 1 < n && kinds[p] == PREPOSITION && !isOneOf(words[p], SUBORDINATORS)) {
                int object = nounGroupHead(kinds, p + 1);
                if (object >= 0) modifiers.add(new ScopeCandidate(object, ModifierKind.PREPOSITIONAL, p, object, p));
            }
        } else if (rightClass == HeadClass.VERB) {
            int p = right + 1;
            if (p < n && (kinds[p] == DETERMINER || isNounish(kinds[p]) || kinds[p] == ADJECTIVE)) {
                int object = nounGroupHead(kinds, p);
                if (object >= 0) modifiers.add(new ScopeCandidate(object, ModifierKind.OBJECT, p, object, -1));
            }
            int k = right + 1;
            while (k < n && k <= right + CLAUSE && !isBarrier(kinds[k]) && kinds[k] != COMMA && kinds[k] != COORDINATOR) k++;
            rightEnd = k - 1;
        }
        return new ConjunctPair(left, leftClass, right, rightClass, middle, leftBegin, leftEnd, rightBegin, rightEnd,
                modifiers.toArray(new ScopeCandidate[0]));
    }

    /** Heads of the comma-separated conjuncts between {@code left} and {@code c}; none unless every segment has one. */
    private static int[] middleHeads(String[] words, byte[] kinds, int left, int c, HeadClass cls) {
        int commas = 0;
        for (int k = left + 1; k < c; k++) if (kinds[k] == COMMA) commas++;
        if (commas == 0) return new int[0];
        int[] heads = new int[commas];
        int found = 0;
        int k = left + 1;
        while (k < c && kinds[k] != COMMA) k++;
        while (k < c) {
            int from = k + 1;
            int to = from;
            while (to < c && kinds[to] != COMMA) to++;
            if (to > from) {
                int head = -1;
                for (int j = from; j < to; j++) {
                    if (classOf(words, kinds, j) == cls) {
                        head = j;
                        if (cls == HeadClass.VERB) break;
                    }
                }
                if (head < 0) return new int[0];
                heads[found++] = head;
            }
            k = to;
        }
        return java.util.Arrays.copyOf(heads, found);
    }

    /** The conjunct class of token {@code k}, or null when it cannot head a conjunct. */
    static HeadClass classOf(String[] words, byte[] kinds, int k) {
        switch (kinds[k]) {
            case NOUN: case PROPER: case PRONOUN: case NUMBER: return HeadClass.NOUN;
            case VERB: case PARTICIPLE: case MODAL: return HeadClass.VERB;
            case ADJECTIVE: return HeadClass.ADJECTIVE;
            case ADVERB: return HeadClass.ADVERB;
            default: return null;
        }
    }

    /** Whether the word class of a Penn tag can head a conjunct, as the proposer reads it (null otherwise). */
    public static HeadClass classOfTag(String tag) {
        byte k = kind(tag);
        switch (k) {
            case NOUN: case PROPER: case PRONOUN: case NUMBER: return HeadClass.NOUN;
            case VERB: case PARTICIPLE: case MODAL: return HeadClass.VERB;
            case ADJECTIVE: return HeadClass.ADJECTIVE;
            case ADVERB: return HeadClass.ADVERB;
            default: return null;
        }
    }

    static boolean isAuxiliary(String word) {
        return isOneOf(word, FORMS_OF_BE) || isOneOf(word, AUXILIARIES);
    }

    static boolean isVerb(byte kind) {
        return kind == VERB || kind == PARTICIPLE;
    }

    private static boolean isFiniteVerb(String[] words, byte[] kinds, int k) {
        return kinds[k] == VERB;
    }

    static boolean isNounish(byte kind) {
        return kind == NOUN || kind == PROPER || kind == PRONOUN || kind == NUMBER;
    }

    /** Whether {@code word} is one of {@code list}, ignoring case. */
    static boolean isOneOf(String word, String[] list) {
        for (String s : list) if (s.equalsIgnoreCase(word)) return true;
        return false;
    }

    static byte kind(String tag) {
        if (tag == null) return OTHER;
        switch (tag) {
            case "NN": case "NNS": case "ADD": return NOUN;
            case "NNP": case "NNPS": return PROPER;
            case "PRP": return PRONOUN;
            case "CD": return NUMBER;
            case "VB": case "VBD": case "VBP": case "VBZ": return VERB;
            case "VBG": case "VBN": return PARTICIPLE;
            case "JJ": case "JJR": case "JJS": return ADJECTIVE;
            case "RB": case "RBR": case "RBS": return ADVERB;
            case "DT": case "PDT": return DETERMINER;
            case "IN": return PREPOSITION;
            case "MD": return MODAL;
            case "TO": return TO;
            case "CC": return COORDINATOR;
            case ",": return COMMA;
            case "EX": return EXISTENTIAL;
            case "WP": case "WDT": return WH;
            case ".": case ":": return BARRIER;
            case "-LRB-": return OPEN;
            case "-RRB-": return CLOSE;
            case "SYM": return SYMBOL;
            case "PRP$": case "POS": case "HYPH": case "WP$": case "``": case "''": return INNER;
            default: return OTHER;
        }
    }
}
