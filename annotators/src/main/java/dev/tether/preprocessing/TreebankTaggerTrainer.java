package dev.tether.preprocessing;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;

import dev.tether.model.TaggerSection;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;
import opennlp.tools.ml.maxent.GISTrainer;
import opennlp.tools.postag.POSModel;
import opennlp.tools.postag.POSSample;
import opennlp.tools.postag.POSTaggerFactory;
import opennlp.tools.postag.POSTaggerME;
import opennlp.tools.util.CollectionObjectStream;
import opennlp.tools.util.TrainingParameters;
import opennlp.tools.util.Version;

/**
 * Trains a part-of-speech tagger from the Penn Treebank tags of treebanks (CoNLL-U column 5, XPOS), with OpenNLP's
 * maximum entropy trainer, for the {@code tagger} section of a model. Sentences are used in the order they are
 * added, on a fixed number of threads ({@value #THREADS}; each sums its fixed share of the events and the shares are
 * added in thread order), so the same sentences always give the same bytes, on any machine.
 *
 * <p>Why maximum entropy: trained on UD English EWT train (Silveira et al. 2014), with 100 iterations and cutoff 5,
 * it tags 92.65% of the gold words of EWT dev right (the shipped OpenNLP model: 88.31%), and through the whole
 * pipeline on EWT dev's raw text it gives 78.32% attachment accuracy and 95.07% candidate recall (the shipped
 * tagger: 77.76%, 96.02%). OpenNLP's averaged perceptron, same iterations and cutoff, tags the gold words as well
 * (92.75%) but gives only 75.74% attachment accuracy and 92.89% candidate recall end to end: on the pipeline's own
 * tokens it tags more prepositions as adverbs, and the words after a mis-tagged {@code to} as verbs. Measured once on
 * the development machine (2 shared cores, December 2026); the commands are in DEVELOPERS.md.
 *
 * <p>A sentence is used only if every word has a tag; a file whose tags are mostly not Penn Treebank tags (a
 * treebank with another tag set in column 5) is left out whole, since the candidate finder reads Penn tags. Both are
 * counted in the file's {@link FileTally}, so a caller can say what was skipped.
 */
public final class TreebankTaggerTrainer {
    static final int ITERATIONS = 100;
    static final int CUTOFF = 5;
    /** Threads of the trainer; fixed, since the sums (and so the weights) depend on how the events are shared out. */
    static final int THREADS = 2;
    /** Least share of a file's tags that must be Penn Treebank tags for the file to be used. */
    static final double MIN_PENN_SHARE = 0.9;

    /**
     * The Penn Treebank tag set (Marcus et al. 1993) with the additions of the English Web Treebank's XPOS column
     * ({@code ADD}, {@code AFX}, {@code GW}, {@code HYPH}, {@code NFP}, {@code XX}).
     */
    private static final Set<String> PENN_TAGS = Set.of("CC", "CD", "DT", "EX", "FW", "IN", "JJ", "JJR", "JJS", "LS",
            "MD", "NN", "NNS", "NNP", "NNPS", "PDT", "POS", "PRP", "PRP$", "RB", "RBR", "RBS", "RP", "SYM", "TO", "UH",
            "VB", "VBD", "VBG", "VBN", "VBP", "VBZ", "WDT", "WP", "WP$", "WRB", "#", "$", ".", ",", ":", "``", "''",
            "-LRB-", "-RRB-", "ADD", "AFX", "GW", "HYPH", "NFP", "XX");

    /** What one treebank file gave: sentences read, sentences used, and why the others were not. */
    public record FileTally(String file, int sentences, int used, int untagged, boolean otherTagSet, String sampleTag) {
        /** A line for the training report. */
        public String summary() {
            if (otherTagSet) {
                return String.format(Locale.ROOT, "%s: column 5 (XPOS) does not hold Penn Treebank tags (for example '%s'); "
                        + "no tagger sentences taken from it", file, sampleTag);
            }
            if (used == 0) {
                return file + ": no sentence has a Penn Treebank tag for every word in column 5 (XPOS); "
                        + "no tagger sentences taken from it";
            }
            return String.format(Locale.ROOT, "%s: %,d of %,d sentences for the tagger%s", file, used, sentences,
                    untagged > 0 ? String.format(Locale.ROOT, " (%,d with words lacking a tag skipped)", untagged) : "");
        }
    }

    private final List<POSSample> samples = new ArrayList<>();
    private final List<String> files = new ArrayList<>();
    private final int iterations;
    private long words;

    /** A trainer of the model's own tagger: {@value #ITERATIONS} iterations. */
    public TreebankTaggerTrainer() {
        this(ITERATIONS);
    }

    /** A trainer that stops after {@code iterations} iterations of the maximum entropy trainer (at least 1). */
    public TreebankTaggerTrainer(int iterations) {
        if (iterations < 1) throw new IllegalArgumentException("a tagger needs at least 1 iteration, got " + iterations);
        this.iterations = iterations;
    }

    /** Reads a CoNLL-U file (plain or gzip) and keeps its usable sentences. */
    public FileTally add(Path conllu) throws IOException {
        return add(conllu.getFileName().toString(), ConlluReader.readAll(conllu));
    }

    /** Keeps the usable sentences of {@code sentences}; {@code name} is how the tally and the description name them. */
    public FileTally add(String name, List<TreebankSentence> sentences) {
        List<POSSample> usable = new ArrayList<>();
        int untagged = 0;
        long tagged = 0, penn = 0;
        String sampleTag = null;
        for (TreebankSentence s : sentences) {
            String[] tags = s.xposTags();
            boolean complete = tags.length > 0;
            for (String t : tags) {
                if (t == null || t.isEmpty() || "_".equals(t)) {
                    complete = false;
                    continue;
                }
                tagged++;
                if (PENN_TAGS.contains(t)) penn++;
                else if (sampleTag == null) sampleTag = t;
            }
            if (complete) usable.add(new POSSample(s.forms(), tags));
            else untagged++;
        }
        boolean otherTagSet = tagged > 0 && penn < MIN_PENN_SHARE * tagged;
        if (!otherTagSet && !usable.isEmpty()) {
            samples.addAll(usable);
            files.add(name);
            for (POSSample u : usable) words += u.getSentence().length;
        }
        return new FileTally(name, sentences.size(), otherTagSet ? 0 : usable.size(), untagged, otherTagSet, sampleTag);
    }

    /** Sentences kept so far. */
    public int sentences() {
        return samples.size();
    }

    /** Trains on every kept sentence; call only when {@link #sentences()} is above zero. */
    public TaggerSection train() throws IOException {
        if (samples.isEmpty()) {
            throw new IllegalStateException("no sentence with Penn Treebank tags to train a tagger on");
        }
        TrainingParameters parameters = new TrainingParameters();
        parameters.put(TrainingParameters.ALGORITHM_PARAM, GISTrainer.MAXENT_VALUE);
        parameters.put(TrainingParameters.ITERATIONS_PARAM, iterations);
        parameters.put(TrainingParameters.CUTOFF_PARAM, CUTOFF);
        parameters.put(TrainingParameters.THREADS_PARAM, THREADS);
        POSModel model = POSTaggerME.train("en", new CollectionObjectStream<>(samples), parameters, new POSTaggerFactory());
        Set<String> tags = new TreeSet<>();
        for (POSSample s : samples) tags.addAll(List.of(s.getTags()));
        String description = String.format(Locale.ROOT,
                "OpenNLP %s maximum entropy, %d iterations, cutoff %d, %d threads; %,d sentences, %,d words, %d tags from %s",
                Version.currentVersion(), iterations, CUTOFF, THREADS, samples.size(), words, tags.size(), String.join(", ", files));
        return new TaggerSection(description, PosModelBytes.pack(model), "the model being trained");
    }
}
