package dev.tether.cli;

import dev.tether.pipeline.DocumentFiles;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import dev.tether.candidates.HeadClass;
import dev.tether.evaluation.SimilarityEvaluation;
import dev.tether.evaluation.SimilarityEvaluator;
import dev.tether.io.WordPairReader;
import dev.tether.similarity.ContextChoice;
import dev.tether.similarity.ContextCounter;
import dev.tether.similarity.Neighbours;
import dev.tether.similarity.RawTextCounting;
import dev.tether.similarity.SimilarityMeasure;
import dev.tether.similarity.Thesaurus;
import dev.tether.similarity.ThesaurusBuilder;
import dev.tether.similarity.ThesaurusFile;
import dev.tether.similarity.ThesaurusSettings;
import dev.tether.similarity.Weighting;
import dev.tether.spark.SparkJob;
import dev.tether.spark.SparkLibraries;
import dev.tether.spark.SparkMaster;
import dev.tether.vocabulary.WordNormalizer;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * {@code tether thesaurus build|query|evaluate}: a distributional thesaurus from raw text, its neighbours, and its
 * agreement with human similarity judgements.
 */
final class ThesaurusCommand implements Command {
    private static final String BUILD = "thesaurus build --raw PATH... --out FILE [--contexts window|grammatical|all] "
            + "[--weighting relative|ppmi|ppmi-smoothed|ttest] [--measure cosine|lin|jaccard] [--min-frequency N] "
            + "[--max-context-words N] [--neighbours K] [--lists-only] [--line-sentences] [--threads N | --spark MASTER]";
    private static final String QUERY = "thesaurus query --thesaurus FILE [--top N] WORD...";
    private static final String EVALUATE = "thesaurus evaluate --thesaurus FILE --pairs CSV [--json]";

    @Override
    public String name() {
        return "thesaurus";
    }

    @Override
    public String usage() {
        return "thesaurus build|query|evaluate ...  ('tether thesaurus --help' for the options)";
    }

    @Override
    public int run(String[] args, PrintStream out, PrintStream err) throws UsageException, IOException {
        if (args.length < 2) throw new UsageException("give one of build, query, evaluate");
        String verb = args[1];
        boolean help = List.of(args).subList(1, args.length).contains("--help");
        switch (verb) {
            case "--help", "help" -> {
                out.print(help());
                return Tether.OK;
            }
            case "build" -> {
                if (help) return help(out, BUILD, BUILD_HELP);
                return build(args, out);
            }
            case "query" -> {
                if (help) return help(out, QUERY, QUERY_HELP);
                return query(args, out);
            }
            case "evaluate" -> {
                if (help) return help(out, EVALUATE, EVALUATE_HELP);
                return evaluate(args, out);
            }
            default -> throw new UsageException("unknown thesaurus command '" + verb + "'; give one of build, query, evaluate");
        }
    }

    private static final String BUILD_HELP = """
              --raw PATH...            plain UTF-8 text files, or folders of .txt files; empty, binary and badly
                                       encoded files are skipped and counted in the summary
              --out FILE               the thesaurus file to write (atomically)
              --contexts C             window (+-5 words), grammatical (verb-object, modifier-noun,
                                       noun-preposition-noun) or all; default %s
              --weighting W            relative, ppmi, ppmi-smoothed or ttest; default %s
              --measure M              cosine, lin or jaccard; default %s
              --min-frequency N        tokens a word needs to be in the thesaurus; default %d
              --max-context-words N    contexts shared by more words are pruned; default %d
              --neighbours K           neighbours stored per word; default %d
              --lists-only             keep the neighbour lists and drop the context vectors: a fraction of the
                                       size, all that attachment needs; 'evaluate' and the coordination features
                                       need the vectors
              --line-sentences         every line break ends a sentence (text written one entry per line); by
                                       default a line break is a space and the sentence detector decides
              --threads N              tagging and neighbour-search threads; default: all cores
              --spark MASTER           read, tag and count on Spark (local[N], spark://HOST:PORT, yarn); the
                                       thesaurus is the same, byte for byte
            """.formatted(ThesaurusSettings.DEFAULT.contexts().label(), ThesaurusSettings.DEFAULT.weighting().label(),
            ThesaurusSettings.DEFAULT.measure().label(), ThesaurusSettings.DEFAULT.minFrequency(),
            ThesaurusSettings.DEFAULT.maxContextWords(), ThesaurusSettings.DEFAULT.neighbours());
    private static final String QUERY_HELP = """
              --thesaurus FILE         a file written by 'tether thesaurus build'
              --top N                  neighbours shown per word; default all stored
              WORD...                  words as they appear in text; each is looked up as a noun, verb and adjective
            """;
    private static final String EVALUATE_HELP = """
              --thesaurus FILE         a file written by 'tether thesaurus build'
              --pairs CSV              judged pairs: ',word1,word2,similarity' with an index column, or
                                       'word1,word2,score' with or without a header
              --json                   print one JSON object: spearman, coverage, n (pairs covered), pairs
            """;

    /**
     * Every sub-command with its options (what {@code tether thesaurus --help} prints; a command line that answers
     * {@code --help} for the whole verb prints this too).
     */
    public String help() {
        return "usage: tether " + BUILD + "\n" + BUILD_HELP + "usage: tether " + QUERY + "\n" + QUERY_HELP
                + "usage: tether " + EVALUATE + "\n" + EVALUATE_HELP;
    }

    private static int help(PrintStream out, String usage, String options) {
        out.println("usage: tether " + usage);
        out.print(options);
        return Tether.OK;
    }

    private int build(String[] args, PrintStream out) throws UsageException, IOException {
        CommandArguments a = new CommandArguments("thesaurus build", args, 2, Set.of("raw", "out", "contexts", "weighting",
                "measure", "min-frequency", "max-context-words", "neighbours", "threads", "spark"), Set.of("lists-only", "line-sentences"));
        noPositional(a, BUILD);
        if (!a.has("raw")) throw new UsageException("--raw is required: give the text files or folders to learn from");
        Path target = Path.of(a.required("out"));
        ThesaurusSettings d = ThesaurusSettings.DEFAULT;
        ThesaurusSettings settings;
        try {
            settings = new ThesaurusSettings(
                    ContextChoice.of(a.value("contexts", d.contexts().label())),
                    Weighting.of(a.value("weighting", d.weighting().label())),
                    SimilarityMeasure.of(a.value("measure", d.measure().label())),
                    integer(a, "min-frequency", d.minFrequency()),
                    integer(a, "max-context-words", d.maxContextWords()),
                    integer(a, "neighbours", d.neighbours()));
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        SparkMaster spark = SparkOption.master(a.value("spark", null));
        if (spark != null && a.has("threads")) {
            throw new UsageException("--threads and --spark exclude each other: on Spark the master sets how many"
                    + " taggers run side by side (local[N], or the cluster's executor cores)");
        }
        int threads = integer(a, "threads", Runtime.getRuntime().availableProcessors());
        if (threads < 1) throw new UsageException("--threads must be at least 1");
        List<Path> inputs = new ArrayList<>();
        if (spark == null) {
            for (String r : a.values("raw")) {
                DocumentFiles.requireLocal(r, "--raw");
                inputs.add(Path.of(r));
            }
        }

        try (HeapPeak heap = HeapPeak.start()) {
            long start = System.nanoTime();
            ContextCounter counter = new ContextCounter();
            RawTextCounting.Summary counted;
            String where;
            if (spark == null) {
                counted = new RawTextCounting(threads, a.has("line-sentences")).count(inputs, counter);
                where = threads + " threads";
            } else {
                List<String> locations = a.values("raw");
                for (String r : locations) {
                    if (!DocumentFiles.isFileSystemUri(r) && !java.nio.file.Files.exists(Path.of(r))) {
                        throw new IOException(r + " does not exist; give raw text files or folders of .txt files");
                    }
                }
                SparkLibraries.require();
                try (SparkJob job = SparkJob.start(spark, "tether thesaurus build")) {
                    job.checkExecutors(locations, null, null, null);
                    counted = job.countContexts(locations, counter, a.has("line-sentences"));
                    where = "Spark " + spark.url() + ", " + job.parallelism() + " task slots";
                }
            }
            long built = System.nanoTime();
            Thesaurus full = ThesaurusBuilder.build(counter, settings, threads);
            Thesaurus thesaurus = a.has("lists-only") ? full.listsOnly(settings.neighbours()) : full;
            double buildSeconds = (System.nanoTime() - built) / 1e9;
            ThesaurusFile.write(thesaurus, target);
            double seconds = (System.nanoTime() - start) / 1e9;

            out.printf("read     %,d documents, %,d sentences, %,d tokens (%.1f s, %s)%n", counted.documents(),
                    counted.sentences(), counted.tokens(), counted.seconds(), where);
            out.printf("skipped  %,d documents%s%n", counted.skippedCount(), counted.skippedCount() == 0 ? "" : ":");
            for (Map.Entry<RawTextCounting.Skip, List<String>> e : counted.skipped().entrySet()) {
                out.printf("  %-16s %,d%n", e.getKey().label(), e.getValue().size());
                for (String f : e.getValue().subList(0, Math.min(5, e.getValue().size()))) out.println("    " + f);
                if (e.getValue().size() > 5) out.printf("    ... and %,d more%n", e.getValue().size() - 5);
            }
            if (counted.notDocuments() > 0) {
                out.printf("not read %,d entries below the inputs that are not %s documents (other endings, hidden files, links)%n",
                        counted.notDocuments(), DocumentFiles.EXTENSION);
            }
            out.printf("words    %,d nouns, %,d verbs, %,d adjectives with at least %d tokens%n", thesaurus.size(HeadClass.NOUN),
                    thesaurus.size(HeadClass.VERB), thesaurus.size(HeadClass.ADJECTIVE), settings.minFrequency());
            out.printf("vectors  %,d contexts (%s), %,d weights (%s); neighbours by %s, k=%d (%.1f s)%s%n", full.contexts(),
                    settings.contexts().label(), full.vectorEntries(), settings.weighting().label(),
                    settings.measure().label(), settings.neighbours(), buildSeconds,
                    thesaurus.hasVectors() ? "" : "; vectors not kept (--lists-only)");
            out.printf("wrote    %s  (%.1f s in all, peak heap %.0f MB)%n", target, seconds, heap.peakBytes() / 1e6);
            return counted.documents() == 0 ? Tether.INPUT : counted.skippedCount() > 0 ? Tether.SOME_FAILED : Tether.OK;
        }
    }

    private int query(String[] args, PrintStream out) throws UsageException, IOException {
        CommandArguments a = new CommandArguments("thesaurus query", args, 2, Set.of("thesaurus", "top"), Set.of());
        // An option takes the words after it, so in "--thesaurus FILE WORD..." the words after the option's first
        // value are the words to look up.
        List<String> file = a.values("thesaurus");
        List<String> topValue = a.values("top");
        if (file.isEmpty()) throw new UsageException("--thesaurus is required");
        List<String> words = new ArrayList<>(a.positional());
        words.addAll(file.subList(1, file.size()));
        if (!topValue.isEmpty()) words.addAll(topValue.subList(1, topValue.size()));
        if (words.isEmpty()) throw new UsageException("give at least one word; usage: tether " + QUERY);
        Thesaurus thesaurus = ThesaurusFile.read(Path.of(file.get(0)));
        int top = topValue.isEmpty() ? Integer.MAX_VALUE : parse("top", topValue.get(0));
        if (top < 1) throw new UsageException("--top must be at least 1");
        WordNormalizer normalizer = new WordNormalizer();
        for (String word : words) {
            boolean found = false;
            for (HeadClass c : new HeadClass[] {HeadClass.NOUN, HeadClass.VERB, HeadClass.ADJECTIVE}) {
                String key = c == HeadClass.NOUN ? normalizer.noun(word) : c == HeadClass.VERB ? normalizer.verb(word) : normalizer.other(word);
                int id = thesaurus.id(c, key);
                if (id == Thesaurus.UNKNOWN) continue;
                found = true;
                Neighbours n = thesaurus.neighbours(id);
                out.printf("%s (%s '%s'): %d neighbours%n", word, c.label(), key, n.size());
                for (int i = 0; i < Math.min(top, n.size()); i++) out.printf("  %-24s %.4f%n", n.key(i), n.score(i));
            }
            if (!found) out.printf("%s: not in the thesaurus (as a noun, verb or adjective)%n", word);
        }
        return Tether.OK;
    }

    private int evaluate(String[] args, PrintStream out) throws UsageException, IOException {
        CommandArguments a = new CommandArguments("thesaurus evaluate", args, 2, Set.of("thesaurus", "pairs"), Set.of("json"));
        noPositional(a, EVALUATE);
        String file = a.required("thesaurus");
        Thesaurus thesaurus = ThesaurusFile.read(Path.of(file));
        if (!thesaurus.hasVectors()) {
            throw new UsageException(file + " keeps neighbour lists only (built with --lists-only), and judging word pairs "
                    + "needs the similarity of any two words; give a thesaurus built without --lists-only");
        }
        Path pairsFile = Path.of(a.required("pairs"));
        SimilarityEvaluation e = new SimilarityEvaluator().evaluate(thesaurus, new WordPairReader().read(pairsFile));
        if (a.has("json")) {
            try (JsonGenerator g = new JsonFactory().createGenerator(out)) {
                g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
                g.writeStartObject();
                g.writeStringField("pairs_file", pairsFile.toString());
                if (Double.isNaN(e.spearman())) g.writeNullField("spearman");
                else g.writeNumberField("spearman", round(e.spearman()));
                g.writeNumberField("coverage", round(e.coverage()));
                g.writeNumberField("n", e.covered());
                g.writeNumberField("pairs", e.pairs());
                g.writeStringField("weighting", thesaurus.settings().weighting().label());
                g.writeStringField("measure", thesaurus.settings().measure().label());
                g.writeStringField("contexts", thesaurus.settings().contexts().label());
                g.writeEndObject();
            }
            out.println();
        } else {
            out.printf("%s: Spearman %.4f over %d of %d pairs (coverage %.1f%%)%n", pairsFile.getFileName(), e.spearman(),
                    e.covered(), e.pairs(), 100 * e.coverage());
        }
        return Tether.OK;
    }

    private static double round(double x) {
        return Math.round(x * 10000) / 10000.0;
    }

    private static void noPositional(CommandArguments a, String usage) throws UsageException {
        if (!a.positional().isEmpty()) {
            throw new UsageException("unexpected word '" + a.positional().get(0) + "'; usage: tether " + usage);
        }
    }

    private static int integer(CommandArguments a, String name, int fallback) throws UsageException {
        String v = a.value(name, null);
        return v == null ? fallback : parse(name, v);
    }

    private static int parse(String name, String v) throws UsageException {
        try {
            return Integer.parseInt(v);
        } catch (NumberFormatException e) {
            throw new UsageException("--" + name + " takes a whole number, got '" + v + "'");
        }
    }
}
