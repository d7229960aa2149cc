package dev.tether.vocabulary;

import java.util.Locale;
import java.util.Map;

/**
 * Maps the surface forms of head words onto the keys the statistics are counted under. The choices, in the spirit
 * of the preprocessing Collins &amp; Brooks (1995) describe for the quadruple benchmark:
 * <ul>
 *   <li>everything is lower-cased;</li>
 *   <li>a four-digit number from 1600 to 2099 becomes the year class {@value #YEAR}; any other token made of digits
 *       and number punctuation ({@code 3,000}, {@code 1.5}, {@code 75%}, {@code 1/2}) becomes {@value #NUMBER};</li>
 *   <li>verbs are reduced to a stem: irregular forms through a small table of common irregular verbs, then one
 *       inflectional suffix ({@code -ing}, {@code -ed}, {@code -es}, {@code -s}) is stripped, a doubled final
 *       consonant is collapsed and a final {@code e} dropped, so that "replace", "replaced", "replacing" and
 *       "replaces" share the key {@code replac}. Keys are stems, not dictionary words: consistency matters, not
 *       spelling;</li>
 *   <li>nouns lose a plural ending: {@code -ies} becomes {@code -y}; {@code -sses, -shes, -ches, -xes, -zes} lose
 *       {@code -es}; other words in {@code -s} (but not {@code -ss, -us, -is}) lose the {@code -s}; a few irregular
 *       plurals come from a table;</li>
 *   <li>prepositions are only lower-cased.</li>
 * </ul>
 * Stateless and thread-safe. {@link #VERSION} is stored in every model so that a model is always scored with the
 * normalization it was counted with.
 */
public final class WordNormalizer {
    /** Identifies these rules in model files; change it whenever a rule changes. */
    public static final String VERSION = "tether-normalizer-1";
    /** The class of four-digit years. */
    public static final String YEAR = "<year>";
    /** The class of all other numbers. */
    public static final String NUMBER = "<num>";

    private static final Map<String, String> IRREGULAR_VERBS = Map.ofEntries(
            Map.entry("am", "be"), Map.entry("is", "be"), Map.entry("are", "be"), Map.entry("was", "be"),
            Map.entry("were", "be"), Map.entry("been", "be"), Map.entry("being", "be"), Map.entry("'s", "be"),
            Map.entry("'re", "be"), Map.entry("'m", "be"),
            Map.entry("has", "have"), Map.entry("had", "have"), Map.entry("having", "have"), Map.entry("'ve", "have"),
            Map.entry("does", "do"), Map.entry("did", "do"), Map.entry("done", "do"), Map.entry("doing", "do"),
            Map.entry("goes", "go"), Map.entry("went", "go"), Map.entry("gone", "go"),
            Map.entry("said", "say"), Map.entry("says", "say"), Map.entry("made", "make"),
            Map.entry("took", "take"), Map.entry("taken", "take"), Map.entry("got", "get"), Map.entry("gotten", "get"),
            Map.entry("gave", "give"), Map.entry("given", "give"), Map.entry("sold", "sell"), Map.entry("bought", "buy"),
            Map.entry("paid", "pay"), Map.entry("held", "hold"), Map.entry("left", "leave"), Map.entry("led", "lead"),
            Map.entry("rose", "rise"), Map.entry("risen", "rise"), Map.entry("fell", "fall"), Map.entry("fallen", "fall"),
            Map.entry("began", "begin"), Map.entry("begun", "begin"), Map.entry("brought", "bring"),
            Map.entry("came", "come"), Map.entry("found", "find"), Map.entry("built", "build"), Map.entry("kept", "keep"),
            Map.entry("knew", "know"), Map.entry("known", "know"), Map.entry("saw", "see"), Map.entry("seen", "see"),
            Map.entry("told", "tell"), Map.entry("thought", "think"), Map.entry("won", "win"), Map.entry("ran", "run"),
            Map.entry("sent", "send"), Map.entry("spent", "spend"), Map.entry("stood", "stand"),
            Map.entry("wrote", "write"), Map.entry("written", "write"), Map.entry("meant", "mean"),
            Map.entry("met", "meet"), Map.entry("lost", "lose"), Map.entry("felt", "feel"), Map.entry("heard", "hear"),
            Map.entry("became", "become"), Map.entry("chose", "choose"), Map.entry("chosen", "choose"),
            Map.entry("drove", "drive"), Map.entry("driven", "drive"), Map.entry("grew", "grow"), Map.entry("grown", "grow"),
            Map.entry("threw", "throw"), Map.entry("thrown", "throw"), Map.entry("broke", "break"),
            Map.entry("broken", "break"), Map.entry("spoke", "speak"), Map.entry("spoken", "speak"),
            Map.entry("bore", "bear"), Map.entry("borne", "bear"), Map.entry("caught", "catch"),
            Map.entry("taught", "teach"), Map.entry("sought", "seek"), Map.entry("fought", "fight"),
            Map.entry("lent", "lend"), Map.entry("bent", "bend"), Map.entry("dealt", "deal"), Map.entry("laid", "lay"),
            Map.entry("shook", "shake"), Map.entry("shaken", "shake"), Map.entry("wore", "wear"), Map.entry("worn", "wear"),
            Map.entry("tore", "tear"), Map.entry("torn", "tear"), Map.entry("froze", "freeze"),
            Map.entry("frozen", "freeze"), Map.entry("struck", "strike"), Map.entry("stuck", "stick"),
            Map.entry("understood", "understand"), Map.entry("withdrew", "withdraw"), Map.entry("withdrawn", "withdraw"),
            Map.entry("forgot", "forget"), Map.entry("forgotten", "forget"), Map.entry("fed", "feed"),
            Map.entry("fled", "flee"), Map.entry("hung", "hang"), Map.entry("slid", "slide"), Map.entry("ate", "eat"),
            Map.entry("eaten", "eat"), Map.entry("drew", "draw"), Map.entry("drawn", "draw"), Map.entry("flew", "fly"),
            Map.entry("flown", "fly"), Map.entry("sank", "sink"), Map.entry("sunk", "sink"));

    private static final Map<String, String> IRREGULAR_NOUNS = Map.ofEntries(
            Map.entry("men", "man"), Map.entry("women", "woman"), Map.entry("children", "child"),
            Map.entry("people", "person"), Map.entry("feet", "foot"), Map.entry("teeth", "tooth"),
            Map.entry("mice", "mouse"), Map.entry("geese", "goose"), Map.entry("indices", "index"),
            Map.entry("analyses", "analysis"), Map.entry("crises", "crisis"), Map.entry("knives", "knife"),
            Map.entry("lives", "life"), Map.entry("wives", "wife"), Map.entry("halves", "half"),
            Map.entry("shelves", "shelf"), Map.entry("leaves", "leaf"));

    /** The key of a noun (first noun, noun inside the phrase, or any nominal head). */
    public String noun(String word) {
        String w = word.toLowerCase(Locale.ROOT);
        String numeric = numberClass(w);
        if (numeric != null) return numeric;
        String irregular = IRREGULAR_NOUNS.get(w);
        if (irregular != null) return irregular;
        int n = w.length();
        if (n > 4 && w.endsWith("ies")) return w.substring(0, n - 3) + "y";
        if (n > 4 && (w.endsWith("sses") || w.endsWith("shes") || w.endsWith("ches") || w.endsWith("xes") || w.endsWith("zes"))) {
            return w.substring(0, n - 2);
        }
        if (n > 3 && w.endsWith("s") && !w.endsWith("ss") && !w.endsWith("us") && !w.endsWith("is") && !w.endsWith("'s")) {
            return w.substring(0, n - 1);
        }
        return w;
    }

    /** The key of a verb. */
    public String verb(String word) {
        String w = word.toLowerCase(Locale.ROOT);
        String numeric = numberClass(w);
        if (numeric != null) return numeric;
        String irregular = IRREGULAR_VERBS.get(w);
        if (irregular != null) w = irregular;
        return verbStem(w);
    }

    /** The key of a preposition. */
    public String preposition(String word) {
        return word.toLowerCase(Locale.ROOT);
    }

    /** The key of an adjective or adverb: lower case and number classes only. */
    public String other(String word) {
        String w = word.toLowerCase(Locale.ROOT);
        String numeric = numberClass(w);
        return numeric != null ? numeric : w;
    }

    private static String verbStem(String w) {
        String s = w;
        int n = s.length();
        if (n > 4 && s.endsWith("ies")) {
            s = s.substring(0, n - 3) + "y";
        } else if (n > 4 && s.endsWith("ied")) {
            s = s.substring(0, n - 3) + "y";
        } else if (n > 5 && s.endsWith("ing") && hasVowel(s, n - 3)) {
            s = s.substring(0, n - 3);
        } else if (n > 4 && s.endsWith("ed") && hasVowel(s, n - 2)) {
            s = s.substring(0, n - 2);
        } else if (n > 4 && (s.endsWith("sses") || s.endsWith("shes") || s.endsWith("ches") || s.endsWith("xes") || s.endsWith("zes"))) {
            s = s.substring(0, n - 2);
        } else if (n > 3 && s.endsWith("s") && !s.endsWith("ss") && !s.endsWith("us") && !s.endsWith("is")) {
            s = s.substring(0, n - 1);
        }
        n = s.length();
        if (n > 3 && s.charAt(n - 1) == s.charAt(n - 2) && isConsonant(s.charAt(n - 1))) {
            s = s.substring(0, n - 1);
        } else if (n > 3 && s.charAt(n - 1) == 'e') {
            s = s.substring(0, n - 1);
        }
        return s;
    }

    private static boolean hasVowel(String s, int end) {
        for (int i = 0; i < end; i++) {
            if ("aeiouy".indexOf(s.charAt(i)) >= 0) return true;
        }
        return false;
    }

    private static boolean isConsonant(char c) {
        return c >= 'a' && c <= 'z' && "aeiou".indexOf(c) < 0;
    }

    /** {@link #YEAR}, {@link #NUMBER}, or {@code null} when the token is not a number. */
    static String numberClass(String w) {
        int n = w.length();
        if (n == 0) return null;
        boolean digit = false;
        for (int i = 0; i < n; i++) {
            char c = w.charAt(i);
            if (c >= '0' && c <= '9') {
                digit = true;
            } else if (c != ',' && c != '.' && c != '%' && c != '/' && c != '-' && c != ':') {
                return null;
            }
        }
        if (!digit) return null;
        if (n == 4 && (w.startsWith("16") || w.startsWith("17") || w.startsWith("18") || w.startsWith("19") || w.startsWith("20"))
                && Character.isDigit(w.charAt(2)) && Character.isDigit(w.charAt(3))) {
            return YEAR;
        }
        return NUMBER;
    }
}
