package dev.tether.similarity;

import dev.tether.candidates.HeadCandidateProposer;
import dev.tether.candidates.HeadClass;
import dev.tether.candidates.PrepositionCandidates;
import dev.tether.vocabulary.Vocabulary;
import dev.tether.vocabulary.WordNormalizer;
import gnu.trove.list.array.TIntArrayList;
import gnu.trove.list.array.TLongArrayList;
import gnu.trove.map.hash.TIntIntHashMap;
import gnu.trove.map.hash.TLongIntHashMap;

import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;

/**
 * Counts the contexts of every noun, verb and adjective in sentences tagged with Penn Treebank tags, for a
 * {@link ThesaurusBuilder}. Two kinds of context are counted, and the builder chooses among them:
 * <ul>
 *   <li>window: every word within {@value #WINDOW} tokens either side in the same sentence, punctuation not
 *       counted (common practice);</li>
 *   <li>grammatical: a verb and the head of the noun phrase right after it (verb–object; "replaced the worn
 *       gasket"), a noun and the adjectives and nouns before it in its phrase (modifier–noun; "worn gasket",
 *       "engine room"), and a noun with a prepositional phrase whose nearest candidate head, from
 *       {@link HeadCandidateProposer}, is that noun (noun–preposition–noun; "room of the engine"). Each relation
 *       is counted from both ends, under its own name.</li>
 * </ul>
 * Words are keyed by {@link WordNormalizer}: nouns (Penn {@code NN*}) by {@link WordNormalizer#noun}, verbs
 * ({@code VB*}) by {@link WordNormalizer#verb}, adjectives ({@code JJ*}) and everything else by
 * {@link WordNormalizer#other}; a word's key carries its class, so the noun "book" and the verb "book" are two
 * entries. Ids and keys are integers and packed {@code long}s; the same sentences in the same order give the same
 * ids. Not thread-safe: one counter per counting thread, or feed it from one thread.
 *
 * <p>Counters of consecutive stretches of text merge exactly: {@link #append} adds the counts of a counter that
 * counted the sentences coming after this one's, and gives the ids that one counter over all the sentences would have
 * given (every id is assigned when its word, word class or context is first seen, so the later counter's new entries
 * keep their order behind this one's). {@link #toBytes} and {@link #fromBytes} carry a counter between processes
 * (the thesaurus built on Spark).
 */
public final class ContextCounter {
    /** Tokens either side of a word that count as its window. */
    public static final int WINDOW = 5;
    /** Most tokens between a verb and the head of its object (determiners, adjectives, numbers). */
    static final int OBJECT_REACH = 6;

    // Word classes in packed keys: HeadClass ordinals, then the rest.
    static final int OTHER = HeadClass.values().length;
    private static final int PUNCTUATION = -1;
    private static final int CLASS_SHIFT = Vocabulary.ID_BITS;

    // Relations, from the point of view of the word whose context it is.
    static final int WINDOW_WORD = 1, OBJECT = 2, OBJECT_OF = 3, MODIFIER = 4, MODIFIES = 5, PREPOSITION_OBJECT = 6,
            PREPOSITION_HEAD = 7;
    static final int RELATION_SHIFT = 48;
    static final int PREPOSITION_SHIFT = 24;
    private static final long WORD_KEY_MASK = (1L << PREPOSITION_SHIFT) - 1;
    private static final int BYTES_MAGIC = 0x54434331; // "TCC1": Tether context counts, layout 1

    private final WordNormalizer normalizer = new WordNormalizer();
    private final HeadCandidateProposer proposer = new HeadCandidateProposer();
    private final Vocabulary vocabulary = new Vocabulary();

    private final TIntIntHashMap targetIndex = new TIntIntHashMap(1 << 12, 0.5f, -1, -1);
    private final TIntArrayList targetKeys = new TIntArrayList();
    private final TLongArrayList targetTokens = new TLongArrayList();
    private final TLongIntHashMap contextIndex = new TLongIntHashMap(1 << 14, 0.5f, -1L, -1);
    private final TLongArrayList contextKeys = new TLongArrayList();
    private final TLongIntHashMap cells = new TLongIntHashMap(1 << 16, 0.5f, -1L, 0);
    private long sentences;
    private long tokens;

    /** Counts one sentence: its tokens and one Penn Treebank tag per token. */
    public void addSentence(String[] words, String[] tags) {
        if (words.length != tags.length) {
            throw new IllegalArgumentException("words and tags differ in length: " + words.length + " vs " + tags.length);
        }
        sentences++;
        tokens += words.length;
        int n = words.length;
        int[] keys = new int[n];
        int[] classes = new int[n];
        int[] target = new int[n];
        int[] kept = new int[n];
        int keptCount = 0;
        for (int i = 0; i < n; i++) {
            classes[i] = wordClass(words[i], tags[i]);
            target[i] = -1;
            if (classes[i] == PUNCTUATION) continue;
            keys[i] = key(words[i], classes[i]);
            kept[keptCount++] = i;
            if (classes[i] == HeadClass.NOUN.ordinal() || classes[i] == HeadClass.VERB.ordinal()
                    || classes[i] == HeadClass.ADJECTIVE.ordinal()) {
                target[i] = targetOf(keys[i]);
                targetTokens.setQuick(target[i], targetTokens.getQuick(target[i]) + 1);
            }
        }
        for (int k = 0; k < keptCount; k++) {
            int t = target[kept[k]];
            if (t < 0) continue;
            int from = Math.max(0, k - WINDOW), to = Math.min(keptCount - 1, k + WINDOW);
            for (int j = from; j <= to; j++) {
                if (j != k) count(t, WINDOW_WORD, 0, keys[kept[j]]);
            }
        }
        verbObjects(tags, keys, classes, target);
        modifiers(tags, keys, classes, target);
        nounPrepositionNouns(words, tags, keys, target);
    }

    private void verbObjects(String[] tags, int[] keys, int[] classes, int[] target) {
        int be = vocabulary.id("be");
        for (int i = 0; i < tags.length; i++) {
            if (classes[i] != HeadClass.VERB.ordinal() || (keys[i] & Vocabulary.MAX_SIZE) == be) continue;
            int end = Math.min(tags.length, i + 1 + OBJECT_REACH);
            for (int j = i + 1; j < end; j++) {
                if (isNoun(tags[j])) {
                    int head = endOfNounRun(tags, j);
                    count(target[i], OBJECT, 0, keys[head]);
                    count(target[head], OBJECT_OF, 0, keys[i]);
                    break;
                }
                if (!isPremodifier(tags[j])) break;
            }
        }
    }

    private void modifiers(String[] tags, int[] keys, int[] classes, int[] target) {
        int i = 0;
        while (i < tags.length) {
            if (!isNoun(tags[i])) {
                i++;
                continue;
            }
            int head = endOfNounRun(tags, i);
            int first = i;
            while (first > 0 && classes[first - 1] == HeadClass.ADJECTIVE.ordinal()) first--;
            for (int m = first; m < head; m++) {
                count(target[head], MODIFIER, 0, keys[m]);
                count(target[m], MODIFIES, 0, keys[head]);
            }
            i = head + 1;
        }
    }

    private void nounPrepositionNouns(String[] words, String[] tags, int[] keys, int[] target) {
        for (PrepositionCandidates c : proposer.proposeAll(words, tags)) {
            int object = c.object();
            if (c.size() == 0 || !isNoun(tags[object])) continue;
            int head = c.head(0);
            if (c.headClass(0) != HeadClass.NOUN || head > c.preposition() || !isNoun(tags[head])) continue;
            int preposition = vocabulary.add(normalizer.preposition(words[c.preposition()]));
            count(target[head], PREPOSITION_OBJECT, preposition, keys[object]);
            count(target[object], PREPOSITION_HEAD, preposition, keys[head]);
        }
    }

    private void count(int target, int relation, int preposition, int wordKey) {
        if (target < 0) return;
        long contextKey = ((long) relation << RELATION_SHIFT) | ((long) preposition << PREPOSITION_SHIFT) | wordKey;
        cells.adjustOrPutValue(cellKey(target, contextOf(contextKey)), 1, 1);
    }

    private int contextOf(long contextKey) {
        int context = contextIndex.get(contextKey);
        if (context < 0) {
            context = contextKeys.size();
            contextIndex.put(contextKey, context);
            contextKeys.add(contextKey);
        }
        return context;
    }

    private int targetOf(int key) {
        int t = targetIndex.get(key);
        if (t < 0) {
            t = targetKeys.size();
            targetIndex.put(key, t);
            targetKeys.add(key);
            targetTokens.add(0);
        }
        return t;
    }

    private int key(String word, int wordClass) {
        String normalized;
        if (wordClass == HeadClass.NOUN.ordinal()) normalized = normalizer.noun(word);
        else if (wordClass == HeadClass.VERB.ordinal()) normalized = normalizer.verb(word);
        else normalized = normalizer.other(word);
        return (wordClass << CLASS_SHIFT) | vocabulary.add(normalized);
    }

    private static int wordClass(String word, String tag) {
        boolean content = false;
        for (int i = 0; i < word.length() && !content; i++) content = Character.isLetterOrDigit(word.charAt(i));
        if (!content) return PUNCTUATION;
        if (isNoun(tag)) return HeadClass.NOUN.ordinal();
        if (tag.startsWith("VB")) return HeadClass.VERB.ordinal();
        if (tag.startsWith("JJ")) return HeadClass.ADJECTIVE.ordinal();
        if (tag.startsWith("RB")) return HeadClass.ADVERB.ordinal();
        return OTHER;
    }

    private static boolean isNoun(String tag) {
        return tag.startsWith("NN");
    }

    private static boolean isPremodifier(String tag) {
        return tag.equals("DT") || tag.equals("PDT") || tag.equals("PRP$") || tag.startsWith("JJ") || tag.equals("CD");
    }

    private static int endOfNounRun(String[] tags, int from) {
        int j = from;
        while (j + 1 < tags.length && isNoun(tags[j + 1])) j++;
        return j;
    }

    /**
     * Adds the counts of {@code later}, which counted the sentences that follow the ones counted here; the result is
     * what one counter would hold after counting both stretches in order, ids included.
     */
    public void append(ContextCounter later) {
        int[] word = new int[later.vocabulary.size() + 1];
        List<String> words = later.vocabulary.words();
        for (int i = 0; i < words.size(); i++) word[i + 1] = vocabulary.add(words.get(i));
        int[] target = new int[later.targetKeys.size()];
        for (int t = 0; t < target.length; t++) {
            target[t] = targetOf(remapWordKey(later.targetKeys.getQuick(t), word));
            targetTokens.setQuick(target[t], targetTokens.getQuick(target[t]) + later.targetTokens.getQuick(t));
        }
        int[] context = new int[later.contextKeys.size()];
        for (int c = 0; c < context.length; c++) {
            long key = later.contextKeys.getQuick(c);
            int preposition = (int) ((key >>> PREPOSITION_SHIFT) & Vocabulary.MAX_SIZE);
            long remapped = ((long) relationOf(key) << RELATION_SHIFT) | ((long) word[preposition] << PREPOSITION_SHIFT)
                    | remapWordKey((int) (key & WORD_KEY_MASK), word);
            context[c] = contextOf(remapped);
        }
        later.cells.forEachEntry((cell, count) -> {
            cells.adjustOrPutValue(cellKey(target[cellTarget(cell)], context[cellContext(cell)]), count, count);
            return true;
        });
        sentences += later.sentences;
        tokens += later.tokens;
    }

    private static int remapWordKey(int wordKey, int[] word) {
        return (classOf(wordKey) << CLASS_SHIFT) | word[wordOf(wordKey)];
    }

    /** This counter as bytes, for {@link #fromBytes}: the same counts give the same bytes. */
    public byte[] toBytes() {
        java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
        try (DataOutputStream out = new DataOutputStream(bytes)) {
            out.writeInt(BYTES_MAGIC);
            List<String> words = vocabulary.words();
            out.writeInt(words.size());
            for (String w : words) out.writeUTF(w);
            out.writeInt(targetKeys.size());
            for (int t = 0; t < targetKeys.size(); t++) {
                out.writeInt(targetKeys.getQuick(t));
                out.writeLong(targetTokens.getQuick(t));
            }
            out.writeInt(contextKeys.size());
            for (int c = 0; c < contextKeys.size(); c++) out.writeLong(contextKeys.getQuick(c));
            long[] cellKeys = cells.keys();
            long[] plain = new long[cellKeys.length];
            for (int i = 0; i < cellKeys.length; i++) plain[i] = ((long) cellTarget(cellKeys[i]) << 32) | (cellContext(cellKeys[i]) & 0xffffffffL);
            java.util.Arrays.sort(plain);
            out.writeInt(plain.length);
            for (long cell : plain) {
                out.writeLong(cell);
                out.writeInt(cells.get(cellKey((int) (cell >>> 32), (int) cell)));
            }
            out.writeLong(sentences);
            out.writeLong(tokens);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return bytes.toByteArray();
    }

    /** The counter that {@link #toBytes} wrote; {@code what} names the bytes in the error when they are not one. */
    public static ContextCounter fromBytes(byte[] data, String what) throws IOException {
        ContextCounter c = new ContextCounter();
        try (DataInputStream in = new DataInputStream(new java.io.ByteArrayInputStream(data))) {
            if (in.readInt() != BYTES_MAGIC) throw new IOException(what + ": not the context counts of this Tether version; run the driver and every executor with the same Tether jar");
            int words = in.readInt();
            for (int i = 0; i < words; i++) c.vocabulary.add(in.readUTF());
            int targets = in.readInt();
            for (int t = 0; t < targets; t++) {
                c.targetOf(in.readInt());
                c.targetTokens.setQuick(t, in.readLong());
            }
            int contexts = in.readInt();
            for (int i = 0; i < contexts; i++) c.contextOf(in.readLong());
            int cellCount = in.readInt();
            for (int i = 0; i < cellCount; i++) {
                long cell = in.readLong();
                c.cells.put(cellKey((int) (cell >>> 32), (int) cell), in.readInt());
            }
            c.sentences = in.readLong();
            c.tokens = in.readLong();
        } catch (java.io.EOFException e) {
            throw new IOException(what + ": the context counts end early", e);
        }
        return c;
    }

    // --- read access for the builder -------------------------------------------------------------------------

    int targets() { return targetKeys.size(); }
    int targetKey(int target) { return targetKeys.getQuick(target); }
    long targetTokens(int target) { return targetTokens.getQuick(target); }
    int contexts() { return contextKeys.size(); }
    long contextKey(int context) { return contextKeys.getQuick(context); }
    TLongIntHashMap cells() { return cells; }
    Vocabulary vocabulary() { return vocabulary; }

    /**
     * The contexts counted for one word, readable ("window:the", "object:gasket", "on:pump", ...), with their
     * counts; for tests and inspection, not for hot paths.
     */
    java.util.SortedMap<String, Integer> contextsOf(HeadClass wordClass, String key) {
        java.util.SortedMap<String, Integer> found = new java.util.TreeMap<>();
        int id = vocabulary.id(key);
        int t = id == Vocabulary.UNKNOWN ? -1 : targetIndex.get((wordClass.ordinal() << CLASS_SHIFT) | id);
        if (t < 0) return found;
        cells.forEachEntry((cell, count) -> {
            if (cellTarget(cell) == t) found.merge(describe(contextKeys.getQuick(cellContext(cell))), count, Integer::sum);
            return true;
        });
        return found;
    }

    private String describe(long contextKey) {
        int relation = relationOf(contextKey);
        String word = vocabulary.word(wordOf((int) contextKey));
        String preposition = vocabulary.word((int) ((contextKey >>> PREPOSITION_SHIFT) & Vocabulary.MAX_SIZE));
        return switch (relation) {
            case WINDOW_WORD -> "window:" + word;
            case OBJECT -> "object:" + word;
            case OBJECT_OF -> "object-of:" + word;
            case MODIFIER -> "modifier:" + word;
            case MODIFIES -> "modifies:" + word;
            case PREPOSITION_OBJECT -> preposition + ":" + word;
            case PREPOSITION_HEAD -> word + ":" + preposition;
            default -> "?" + relation;
        };
    }

    // Trove hashes a long by folding its halves together (high ^ low), so target and context ids packed side by
    // side would collide whenever target ^ context agree. Cell keys are therefore multiplied by an odd constant, a
    // bijection on 64 bits that spreads the low bits into the high half, and multiplied back when read.
    private static final long MIX = 0x9E3779B97F4A7C15L;
    private static final long UNMIX = inverse(MIX);

    static long cellKey(int target, int context) {
        return (((long) target << 32) | (context & 0xffffffffL)) * MIX;
    }

    static int cellTarget(long cellKey) {
        return (int) ((cellKey * UNMIX) >>> 32);
    }

    static int cellContext(long cellKey) {
        return (int) (cellKey * UNMIX);
    }

    /** The multiplicative inverse of an odd number modulo 2^64 (Newton's iteration doubles the correct bits). */
    private static long inverse(long odd) {
        long x = odd;
        for (int i = 0; i < 5; i++) x *= 2 - odd * x;
        return x;
    }

    /** The class of a packed word key. */
    static int classOf(int wordKey) {
        return wordKey >>> CLASS_SHIFT;
    }

    /** The vocabulary id of a packed word key. */
    static int wordOf(int wordKey) {
        return wordKey & Vocabulary.MAX_SIZE;
    }

    static int relationOf(long contextKey) {
        return (int) (contextKey >>> RELATION_SHIFT);
    }

    /** Number of sentences counted so far. */
    public long sentenceCount() {
        return sentences;
    }

    /** Number of tokens counted so far. */
    public long tokenCount() {
        return tokens;
    }
}
