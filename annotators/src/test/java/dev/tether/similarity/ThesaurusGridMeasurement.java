package dev.tether.similarity;

import dev.tether.evaluation.SimilarityEvaluation;
import dev.tether.evaluation.SimilarityEvaluator;
import dev.tether.io.WordPairReader;

import java.io.BufferedReader;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

/**
 * Measures every context choice × weighting × measure on the development similarity sets, for the README's table.
 * Not a test (it reads {@code ../shared/datasets}); run from the repository root:
 * <pre>
 *   mvn -B -q -pl annotators -am test-compile -DskipTests
 *   java -Xmx6g -cp "annotators/target/test-classes:annotators/target/classes:annotators/target/lib/*" \
 *       dev.tether.similarity.ThesaurusGridMeasurement ../shared/datasets/raw ../shared/datasets/similarity \
 *       /tmp/tether-raw-tagged.txt [minFrequency] [maxContextWords]
 * </pre>
 * The raw text is tagged once by the built-in preprocessing and cached in the third argument (one sentence a line,
 * words and tags separated by a tab); later runs count from the cache, so the grid costs counting and building only.
 */
public final class ThesaurusGridMeasurement {
    public static void main(String[] args) throws IOException {
        Path raw = Path.of(args[0]);
        Path sets = Path.of(args[1]);
        Path cache = Path.of(args[2]);
        ThesaurusSettings base = ThesaurusSettings.DEFAULT;
        if (args.length > 3) base = base.withMinFrequency(Integer.parseInt(args[3]));
        if (args.length > 4) base = base.withMaxContextWords(Integer.parseInt(args[4]));
        String only = args.length > 5 ? args[5] : null;

        ContextCounter counter = new ContextCounter();
        long start = System.nanoTime();
        if (!Files.exists(cache)) {
            List<Path> folders;
            try (Stream<Path> s = Files.list(raw)) {
                folders = s.filter(Files::isDirectory).sorted().toList();
            }
            try (BufferedWriter w = Files.newBufferedWriter(cache, StandardCharsets.UTF_8)) {
                RawTextCounting.Summary summary = new RawTextCounting(2).count(folders, (words, tags) -> {
                    counter.addSentence(words, tags);
                    try {
                        w.write(String.join(" ", words));
                        w.write('\t');
                        w.write(String.join(" ", tags));
                        w.write('\n');
                    } catch (IOException e) {
                        throw new UncheckedIOException(e);
                    }
                });
                System.out.printf("tagged %,d documents (%,d skipped), %,d sentences, %,d tokens in %.1f s%n",
                        summary.documents(), summary.skippedCount(), summary.sentences(), summary.tokens(), summary.seconds());
            }
        } else {
            try (BufferedReader r = Files.newBufferedReader(cache, StandardCharsets.UTF_8)) {
                for (String line = r.readLine(); line != null; line = r.readLine()) {
                    int tab = line.indexOf('\t');
                    counter.addSentence(line.substring(0, tab).split(" "), line.substring(tab + 1).split(" "));
                }
            }
            System.out.printf("counted %,d sentences, %,d tokens from %s in %.1f s%n", counter.sentenceCount(),
                    counter.tokenCount(), cache, (System.nanoTime() - start) / 1e9);
        }

        List<Path> files;
        try (Stream<Path> s = Files.list(sets)) {
            files = s.filter(p -> p.toString().endsWith(".csv")).sorted().toList();
        }
        List<List<WordPairReader.WordPair>> pairs = new ArrayList<>();
        for (Path f : files) pairs.add(new WordPairReader().read(f));
        StringBuilder header = new StringBuilder("| contexts | weighting | measure |");
        for (Path f : files) header.append(' ').append(f.getFileName().toString().replace(".csv", "")).append(" |");
        header.append(" mean | build s |");
        System.out.println(header);
        SimilarityEvaluator evaluator = new SimilarityEvaluator();
        for (ContextChoice c : ContextChoice.values()) {
            for (Weighting w : Weighting.values()) {
                for (SimilarityMeasure m : SimilarityMeasure.values()) {
                    if (only != null && !only.equals(c.label() + "/" + w.label() + "/" + m.label())
                            && !only.equals(c.label())) continue;
                    long t0 = System.nanoTime();
                    Thesaurus t = ThesaurusBuilder.build(counter, base.withContexts(c).withWeighting(w).withMeasure(m), 2);
                    double seconds = (System.nanoTime() - t0) / 1e9;
                    StringBuilder row = new StringBuilder("| " + c.label() + " | " + w.label() + " | " + m.label() + " |");
                    double sum = 0;
                    for (List<WordPairReader.WordPair> p : pairs) {
                        SimilarityEvaluation e = evaluator.evaluate(t, p);
                        sum += e.spearman();
                        row.append(String.format(" %.3f (%.0f%%) |", e.spearman(), 100 * e.coverage()));
                    }
                    row.append(String.format(" %.3f | %.1f |", sum / pairs.size(), seconds));
                    System.out.println(row);
                }
            }
        }
    }
}
