package dev.tether.evaluation;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The external check of the distributional thesaurus: build one with the command line from the raw-text slice in
 * data/similarity/rg-65-slice (100,000 words of the Brown Corpus, MASC and the State of the Union addresses, every
 * line that holds a judged word; provenance in data/similarity/README.md), and rank the 65 noun pairs of
 * Rubenstein &amp; Goodenough (1965), "Contextual correlates of synonymy", by similarity against the mean human
 * judgements (data/similarity/rg-65.csv). Surefire runs with this module's folder as working directory.
 */
class ThesaurusRg65Test {
    /**
     * The floor. The settings are the defaults except the frequency floor (3 instead of 5, for a text 28 times
     * smaller). Measured with them on this slice: Spearman {@value #MEASURED} over 58 of 65 pairs, with the built-in
     * preprocessing tagging with the default model's tagger (0.3521 when it tagged with the shipped OpenNLP model). The
     * build is deterministic, so the floor sits just under the measurement, to catch any change that makes the
     * thesaurus worse; it is also far above chance: a random ranking of 58 pairs has a Spearman correlation of 0 with a
     * standard deviation of 1/sqrt(57) = 0.13 (so the floor is about 2.5 standard deviations above it). The floor was
     * set under the earlier 0.3521 and is kept, 0.05 under today's figure.
     */
    private static final double FLOOR = 0.33;
    private static final double MEASURED = 0.3809;

    @TempDir
    Path dir;

    @Test
    void rankingOfRubensteinGoodenoughPairsCorrelatesWithTheHumanJudgements() throws Exception {
        Path thesaurus = dir.resolve("rg-65-slice.thesaurus");
        CommandLineEntry build = CommandLineEntry.run("thesaurus", "build", "--raw", "data/similarity/rg-65-slice",
                "--out", thesaurus.toString(), "--contexts", "all", "--weighting", "ppmi", "--measure", "cosine",
                "--min-frequency", "3", "--max-context-words", "5000", "--threads", "2");
        assertEquals(0, build.exitCode(), build.toString());
        assertTrue(build.out().contains("102,864 tokens"), build.out());

        CommandLineEntry evaluate = CommandLineEntry.run("thesaurus", "evaluate", "--thesaurus", thesaurus.toString(),
                "--pairs", "data/similarity/rg-65.csv", "--json");
        assertEquals(0, evaluate.exitCode(), evaluate.toString());
        JsonNode json = new ObjectMapper().readTree(evaluate.out());
        assertEquals(65, json.get("pairs").asInt());
        // Coverage: the seven pairs with "serf", "madhouse", "tumbler", "asylum" or "woodland" (fewer than three
        // occurrences as nouns in the slice) are not scored.
        assertEquals(58, json.get("n").asInt());
        double spearman = json.get("spearman").asDouble();
        System.out.printf("RG-65 on the test slice: Spearman %.4f over %d of 65 pairs (floor %.2f, measured %.4f)%n",
                spearman, json.get("n").asInt(), FLOOR, MEASURED);
        assertTrue(spearman >= FLOOR, () -> "Spearman " + spearman + " below the floor " + FLOOR);
    }
}
