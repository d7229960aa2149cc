package dev.tether.preprocessing;

import dev.tether.io.Sha256;
import opennlp.tools.ml.ArrayMath;
import opennlp.tools.ml.maxent.GISModel;
import opennlp.tools.ml.model.Context;
import opennlp.tools.ml.model.UniformPrior;
import opennlp.tools.postag.ConfigurablePOSContextGenerator;
import opennlp.tools.postag.POSModel;
import opennlp.tools.util.StringUtil;
import opennlp.tools.util.featuregen.FeatureGeneratorUtil;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.lang.ref.WeakReference;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The parameters of a part-of-speech model trained with OpenNLP's default feature set, filed by feature family, so
 * that the scores of a position are summed from per-token lookups instead of from feature strings built and hashed
 * anew at every position.
 *
 * <p>OpenNLP's default set ({@code pos-default-features.xml}) gives a position {@code i} of words {@code w}: {@code def};
 * {@code suf=} and {@code pre=} with the last and first one to four characters of {@code w[i]}; {@code w=} with
 * {@code w[i]} lower-cased, and the same prefixed {@code p1}, {@code p2}, {@code n1}, {@code n2} for the words one and
 * two before and after; {@code S=begin} (and {@code p1S=begin}, {@code p2S=begin}) when {@code i} (or the word one,
 * two before) is the first; {@code wc=} the word's class and {@code w&c=} word and class; {@code t=} the previous tag
 * and {@code t2=} the two previous tags. Here a word is lower-cased (as {@link StringUtil#toLowerCase} does), classed
 * (with OpenNLP's own {@link FeatureGeneratorUtil#tokenFeature}) and looked up in each family when a {@link Scorer}
 * first meets it; a position then adds the parameters of its features in the order OpenNLP lists them, with the
 * model's uniform prior and the same exponentiation and normalisation as {@link GISModel#eval}, so the scores are the same doubles.
 * {@code FeatureFamilyIndexEwtTest} (test-corpora) compares them with {@link GISModel#eval} over OpenNLP's own
 * contexts at every position of UD English EWT sentences.
 *
 * <p>Immutable and safe to share; a {@link Scorer} is for one thread.
 */
public final class FeatureFamilyIndex {
    /** Where OpenNLP keeps a part-of-speech model's feature descriptor, when the model carries one. */
    private static final String DESCRIPTOR_ARTIFACT = "generator.featuregen";
    private static final String DEFAULT_DESCRIPTOR = "/opennlp/tools/postag/pos-default-features.xml";
    /**
     * SHA-256 of the feature descriptor this index implements: OpenNLP 2.5.8's {@code pos-default-features.xml}. A
     * model with another descriptor (its own, or a later OpenNLP's default) is tagged through OpenNLP's generator.
     */
    private static final String DESCRIPTOR_SHA256 = "d6737d09cec55717e2e10e70be03c5a15a1708d1b35b3017390862e784c40c3a";
    /** OpenNLP's default prefix and suffix length. */
    private static final int AFFIX = 4;
    /** The window families, in the order OpenNLP's window generator lists them: the word, then before, then after. */
    private static final String[] WINDOW = {"w=", "p1w=", "p2w=", "n1w=", "n2w="};
    /** Most features one position can have: def, 4 + 4 affixes, 5 window words, 1 sentence start, 2 class, 2 tag. */
    private static final int MAX_FEATURES = 1 + 2 * AFFIX + WINDOW.length + 1 + 2 + 2;
    /** Words a {@link Scorer} keeps the features of: about 12 MB at most. */
    static final int WORDS_KEPT = 50_000;

    private final int outcomes;
    private final UniformPrior prior = new UniformPrior();
    private final Context def;
    /** {@code S=begin}, {@code p1S=begin}, {@code p2S=begin}: the first word is this position, one before, two before. */
    private final Context[] begin;
    private final Map<String, Context>[] window;
    private final Map<String, Context> suffix;
    private final Map<String, Context> prefix;
    private final Map<String, Context> wordClass;
    private final Map<String, Context> wordAndClass;
    private final Map<String, Context> tag;
    private final Map<String, Context> tagPair;

    @SuppressWarnings("unchecked")
    private FeatureFamilyIndex(GISModel model) {
        this.outcomes = model.getNumOutcomes();
        String[] names = new String[outcomes];
        for (int o = 0; o < outcomes; o++) names[o] = model.getOutcome(o);
        prior.setLabels(names, null);
        Map<String, Context> predicates = (Map<String, Context>) model.getDataStructures()[1];
        this.def = predicates.get("def");
        this.begin = new Context[] {predicates.get("S=begin"), predicates.get("p1S=begin"), predicates.get("p2S=begin")};
        this.window = new Map[WINDOW.length];
        for (int d = 0; d < WINDOW.length; d++) window[d] = family(predicates, WINDOW[d]);
        this.suffix = family(predicates, "suf=");
        this.prefix = family(predicates, "pre=");
        this.wordClass = family(predicates, "wc=");
        this.wordAndClass = family(predicates, "w&c=");
        this.tag = family(predicates, "t=");
        this.tagPair = family(predicates, "t2=");
    }

    private static Map<String, Context> family(Map<String, Context> predicates, String prefix) {
        Map<String, Context> out = new HashMap<>();
        for (Map.Entry<String, Context> e : predicates.entrySet()) {
            if (e.getKey().startsWith(prefix)) out.put(e.getKey().substring(prefix.length()), e.getValue());
        }
        return out;
    }

    /**
     * The index of {@code pos}, or empty when its contexts are not OpenNLP's default feature set over a maximum
     * entropy model (a model with another feature descriptor than {@link #DESCRIPTOR_SHA256}'s, or one of the OpenNLP
     * 1.5 generation, which has another context generator): those are tagged through OpenNLP's own generator. Built once per loaded model and
     * shared (a tagger is made per engine instance, and building takes about 15 ms).
     */
    public static Optional<FeatureFamilyIndex> of(POSModel pos) {
        synchronized (BUILT) {
            Optional<FeatureFamilyIndex> index = null;
            for (Iterator<Built> it = BUILT.iterator(); it.hasNext(); ) {
                Built b = it.next();
                POSModel model = b.model.get();
                if (model == null) it.remove();
                else if (model == pos) index = b.index;
            }
            if (index == null) {
                index = build(pos);
                BUILT.add(new Built(new WeakReference<>(pos), index));
            }
            return index;
        }
    }

    /** An index built for a model, held as long as the model is (OpenNLP's models compare by content, not identity). */
    private record Built(WeakReference<POSModel> model, Optional<FeatureFamilyIndex> index) {
    }

    private static final List<Built> BUILT = new ArrayList<>();

    private static Optional<FeatureFamilyIndex> build(POSModel pos) {
        if (!(pos.getArtifact("pos.model") instanceof GISModel model)) return Optional.empty();
        if (!(pos.getFactory().getPOSContextGenerator(1) instanceof ConfigurablePOSContextGenerator)) return Optional.empty();
        Object descriptor = pos.getArtifact(DESCRIPTOR_ARTIFACT);
        byte[] bytes = descriptor == null ? defaultDescriptor() : descriptor instanceof byte[] b ? b : null;
        if (bytes == null || !DESCRIPTOR_SHA256.equals(Sha256.hex(bytes))) return Optional.empty();
        return Optional.of(new FeatureFamilyIndex(model));
    }

    private static byte[] defaultDescriptor() {
        try (InputStream in = ConfigurablePOSContextGenerator.class.getResourceAsStream(DEFAULT_DESCRIPTOR)) {
            if (in == null) throw new IllegalStateException("OpenNLP's " + DEFAULT_DESCRIPTOR + " is not on the class path");
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read OpenNLP's " + DEFAULT_DESCRIPTOR, e);
        }
    }

    /**
     * {@code word} lower-cased code point by code point with {@link Character#toLowerCase(int)}, the same string as
     * OpenNLP's {@link StringUtil#toLowerCase} (which maps a stream of code points), without the stream; {@code word}
     * itself when nothing changes.
     */
    static String lowerCase(String word) {
        int i = 0;
        while (i < word.length()) {
            int c = word.codePointAt(i);
            if (Character.toLowerCase(c) != c) break;
            i += Character.charCount(c);
        }
        if (i == word.length()) return word;
        StringBuilder out = new StringBuilder(word.length()).append(word, 0, i);
        while (i < word.length()) {
            int c = word.codePointAt(i);
            out.appendCodePoint(Character.toLowerCase(c));
            i += Character.charCount(c);
        }
        return out.toString();
    }

    /** Number of outcomes (tags) of the model; a score array has this length. */
    public int outcomes() {
        return outcomes;
    }

    /** A scorer for one thread: it keeps the features of the words it has seen (see {@link Scorer}). */
    public Scorer scorer() {
        return new Scorer();
    }

    /** One word's features in every family that depends on the word alone. */
    private final class WordFeatures {
        final Context[] suffixes;
        final Context[] prefixes;
        /** The word's lower-cased form in each window family ({@link #WINDOW}). */
        final Context[] windowed = new Context[WINDOW.length];
        final Context wordClass;
        final Context wordAndClass;

        WordFeatures(String word) {
            int affixes = Math.min(AFFIX, word.length());
            suffixes = new Context[affixes];
            prefixes = new Context[affixes];
            for (int k = 0; k < affixes; k++) {
                suffixes[k] = suffix.get(word.substring(Math.max(word.length() - k - 1, 0)));
                prefixes[k] = prefix.get(word.substring(0, Math.min(k + 1, word.length())));
            }
            String lower = lowerCase(word);
            for (int d = 0; d < WINDOW.length; d++) windowed[d] = window[d].get(lower);
            String className = FeatureGeneratorUtil.tokenFeature(word);
            wordClass = FeatureFamilyIndex.this.wordClass.get(className);
            wordAndClass = FeatureFamilyIndex.this.wordAndClass.get(lower + "," + className);
        }
    }

    /**
     * Scores the positions of one sentence at a time, for one thread. The features of a word depend on the word
     * alone, so they are looked up once and kept (up to {@value #WORDS_KEPT} words; then the store starts afresh, so
     * memory stays bounded): running text repeats its words, and a kept word costs one lookup instead of fifteen.
     */
    public final class Scorer {
        private final Map<String, WordFeatures> seen = new HashMap<>();
        private final Context[] features = new Context[MAX_FEATURES];
        private WordFeatures[] sentence = new WordFeatures[0];
        private int length;

        private Scorer() {
        }

        /** Starts a sentence: the positions {@link #score} asks about are those of {@code words}. */
        public void start(String[] words) {
            if (sentence.length < words.length) sentence = new WordFeatures[Math.max(words.length, 2 * sentence.length)];
            length = words.length;
            for (int j = 0; j < length; j++) {
                WordFeatures f = seen.get(words[j]);
                if (f == null) {
                    if (seen.size() >= WORDS_KEPT) seen.clear();
                    f = new WordFeatures(words[j]);
                    seen.put(words[j], f);
                }
                sentence[j] = f;
            }
        }

        /**
         * The probabilities of every tag at position {@code i} of the sentence, given the tag before it and the one
         * before that ({@code null} where the position has none), into {@code out} (length {@link #outcomes()}), as
         * {@link GISModel#eval} gives them for OpenNLP's context.
         */
        public void score(int i, String previousTag, String tagBeforeThat, double[] out) {
            int n = 0;
            WordFeatures word = sentence[i];
            features[n++] = def;
            for (Context c : word.suffixes) features[n++] = c;
            for (Context c : word.prefixes) features[n++] = c;
            features[n++] = word.windowed[0];
            if (i >= 1) features[n++] = sentence[i - 1].windowed[1];
            if (i >= 2) features[n++] = sentence[i - 2].windowed[2];
            if (i + 1 < length) features[n++] = sentence[i + 1].windowed[3];
            if (i + 2 < length) features[n++] = sentence[i + 2].windowed[4];
            if (i <= 2) features[n++] = begin[i];
            features[n++] = word.wordClass;
            features[n++] = word.wordAndClass;
            if (i >= 1) {
                features[n++] = tag.get(previousTag);
                if (i >= 2) features[n++] = tagPair.get(tagBeforeThat + "," + previousTag);
            }
            Arrays.fill(features, n, MAX_FEATURES, null);
            prior.logPrior(out, features, null);
            ArrayMath.sumFeatures(features, null, out);
            double normal = 0;
            for (int o = 0; o < outcomes; o++) {
                out[o] = StrictMath.exp(out[o]);
                normal += out[o];
            }
            for (int o = 0; o < outcomes; o++) out[o] /= normal;
        }
    }
}
