package dev.tether.evaluation;

import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.RawAttachmentCounts;
import dev.tether.io.QuadrupleReader;
import dev.tether.vocabulary.WordNormalizer;
import org.apache.commons.math3.stat.correlation.SpearmansCorrelation;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The external check of counting unlabelled text: the unambiguous attachments that {@code tether train --raw} finds
 * in plain text reproduce each preposition's preference for the noun or the verb as labelled data measure it.
 *
 * <p>Raw text: the 100,000-word slice in data/similarity/rg-65-slice (Brown Corpus, MASC, State of the Union
 * addresses; provenance in data/similarity/README.md), counted with no re-estimation, so that only unambiguous
 * attachments (after Ratnaparkhi 1998) are counted. Labelled data: the training split of the quadruple benchmark of
 * Ratnaparkhi, Reynar &amp; Roukos (1994), data/rrr/training (20,801 quadruples from the Wall Street Journal; README
 * there), whose quadruples were labelled by hand in the Penn Treebank; each preposition's noun share is read off
 * that file in the test ("of" attaches to the noun in 99.1% of its 5,577 cases, "to" in 18.7% of 2,673). The two
 * texts share nothing but the language.
 *
 * <p>Compared: every preposition with at least {@value #MIN_RAW} unambiguous raw events and {@value #MIN_LABELLED}
 * benchmark cases, so that each noun share has a standard error of at most 0.05. Checks: "of" is noun-attached in
 * most raw events, and the rank correlation (Spearman) of the noun shares over the compared prepositions is above a
 * floor. Measured on this slice: see {@link #MEASURED}. Surefire runs with this module's folder as working directory.
 */
class RawPrepositionPreferenceTest {
    static final int MIN_RAW = 100;
    static final int MIN_LABELLED = 200;
    /**
     * Spearman's correlation measured with this build over the 10 prepositions compared (as, at, by, for, from, in,
     * of, on, to, with; deterministic counting): {@value}. "of" is noun-attached in 93.8% of its 1,407 raw events
     * (99.1% of its 5,577 benchmark cases).
     */
    static final double MEASURED = 0.7333;
    /**
     * The floor, 0.08 below the measurement, for changes of the tagger or the candidate finder that move a
     * preposition by a rank. It is the one-sided 2.5% critical value of Spearman's correlation for 10 pairs (0.648 in
     * the standard tables, value recalled from memory): a ranking unrelated to the benchmark's reaches it once in forty.
     */
    static final double FLOOR = 0.65;

    @TempDir
    Path dir;

    @Test
    void unambiguousRawAttachmentsRankPrepositionsAsTheLabelledBenchmarkDoes() throws Exception {
        Path counts = dir.resolve("slice.counts");
        CommandLineEntry run = CommandLineEntry.run("train", "--raw", "data/similarity/rg-65-slice", "--reestimate", "0",
                "--threads", "2", "--save-raw-counts", counts.toString(), "--out", dir.resolve("slice.tether").toString());
        assertEquals(0, run.exitCode(), run.toString());
        QuadrupleCounts raw = RawAttachmentCounts.read(counts).events();

        WordNormalizer normalizer = new WordNormalizer();
        Map<String, int[]> labelled = new TreeMap<>();
        for (LabelledQuadruple q : new QuadrupleReader(false).read(Path.of("data/rrr/training")).quadruples()) {
            int[] c = labelled.computeIfAbsent(normalizer.preposition(q.quadruple().preposition()), k -> new int[2]);
            if (q.site() == AttachmentSite.NOUN) c[0]++;
            c[1]++;
        }
        List<String> compared = new ArrayList<>();
        List<Double> rawShare = new ArrayList<>();
        List<Double> labelledShare = new ArrayList<>();
        StringBuilder table = new StringBuilder("preposition  raw events  noun share  benchmark cases  noun share\n");
        for (var e : labelled.entrySet()) {
            int p = raw.prepositions().id(e.getKey());
            if (p == 0 || raw.prepositionCount(p) < MIN_RAW || e.getValue()[1] < MIN_LABELLED) continue;
            compared.add(e.getKey());
            rawShare.add(raw.prepositionNounCount(p) / raw.prepositionCount(p));
            labelledShare.add((double) e.getValue()[0] / e.getValue()[1]);
            table.append(String.format("%-12s %10.0f  %10.3f  %15d  %10.3f%n", e.getKey(), raw.prepositionCount(p),
                    rawShare.get(rawShare.size() - 1), e.getValue()[1], labelledShare.get(labelledShare.size() - 1)));
        }
        double rho = new SpearmansCorrelation().correlation(rawShare.stream().mapToDouble(Double::doubleValue).toArray(),
                labelledShare.stream().mapToDouble(Double::doubleValue).toArray());
        System.out.print(table);
        System.out.printf("Spearman over %d prepositions: %.4f (floor %.2f, measured %.4f)%n", compared.size(), rho, FLOOR, MEASURED);

        int of = raw.prepositions().id("of");
        assertTrue(raw.prepositionNounCount(of) / raw.prepositionCount(of) > 0.5, table::toString);
        assertEquals(10, compared.size(), table::toString);
        assertTrue(rho >= FLOOR, () -> "Spearman " + rho + " below the floor " + FLOOR + "\n" + table);
    }
}
