package dev.tether.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * {@code tether evaluate --conllu FILE --gold-tags} on the six sentences of UD English EWT dev (Silveira et al. 2014;
 * provenance beside the fixture) whose 12 gold attachments were counted by hand: the same gold count as the running
 * text evaluation, and the ceiling of a verb-or-noun choice bounds both baselines that can only pick one of the two.
 */
class GoldTagEvaluateTest {
    private static final int GOLD_ATTACHMENTS = 12;

    @TempDir
    Path dir;

    @Test
    void reportsHeadChoiceOnGoldTagsWithBaselinesAndCeiling() throws Exception {
        Path conllu = dir.resolve("six.conllu");
        try (InputStream in = GoldTagEvaluateTest.class.getResourceAsStream("ewt-dev-six-sentences.conllu")) {
            assertNotNull(in);
            Files.copy(in, conllu);
        }
        CommandLineRun run = CommandLineRun.of("evaluate", "--model", "default", "--conllu", conllu.toString(), "--gold-tags", "--json");
        assertEquals(Tether.OK, run.exitCode(), run::toString);
        JsonNode json = new ObjectMapper().readTree(run.out());
        assertEquals("gold", json.get("tags").asText());
        assertEquals(GOLD_ATTACHMENTS, json.get("n").asInt());
        JsonNode attachment = json.get("attachment");
        assertEquals(GOLD_ATTACHMENTS, attachment.get("n").asInt());
        assertEquals((double) attachment.get("correct").asInt() / GOLD_ATTACHMENTS, attachment.get("accuracy").asDouble(), 1e-12);
        JsonNode baselines = json.get("baselines");
        int ceiling = baselines.get("verb-or-noun-ceiling").get("correct").asInt();
        int binary = baselines.get("verb-or-first-noun").get("correct").asInt();
        assertTrue(binary <= ceiling, "a choice between the nearest verb and noun cannot beat its own ceiling: " + run.out());
        assertTrue(attachment.get("candidateRecall").asDouble() >= attachment.get("accuracy").asDouble(),
                "a head that is not a candidate cannot be chosen: " + run.out());
    }
}
