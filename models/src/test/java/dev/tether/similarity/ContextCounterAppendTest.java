package dev.tether.similarity;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Counters of consecutive stretches of text, appended in order, hold exactly what one counter over all of it holds,
 * ids included, so a thesaurus counted in parts (on Spark) is the one counted in one pass. Invented ferry-log
 * sentences whose later stretches bring words, contexts and prepositions the earlier ones never saw.
 */
class ContextCounterAppendTest {
    private static List<String[][]> sentences(int n, long seed) {
        String[] crew = {"engineer", "deckhand", "mechanic", "mate", "skipper", "oiler", "bosun"};
        String[] parts = {"gasket", "valve", "seal", "filter", "impeller", "hose", "belt", "anode", "bearing"};
        String[] machines = {"pump", "engine", "winch", "compressor", "generator", "ramp", "thruster"};
        String[] verbs = {"replaced", "inspected", "cleaned", "checked", "tightened", "greased", "painted"};
        String[] prepositions = {"on", "in", "near", "under", "behind"};
        Random r = new Random(seed);
        List<String[][]> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            // The vocabulary widens as the log goes on: later sentences draw from more of each list.
            int reach = 3 + i * 5 / n;
            String c = crew[r.nextInt(Math.min(crew.length, reach))];
            String v = verbs[r.nextInt(Math.min(verbs.length, reach))];
            String p = parts[r.nextInt(Math.min(parts.length, reach + 2))];
            String m = machines[r.nextInt(Math.min(machines.length, reach))];
            String pr = prepositions[r.nextInt(Math.min(prepositions.length, reach - 2))];
            out.add(new String[][] {{"The", c, v, "the", "worn", p, pr, "the", m, "."},
                    {"DT", "NN", "VBD", "DT", "JJ", "NN", "IN", "DT", "NN", "."}});
        }
        return out;
    }

    private static ContextCounter count(List<String[][]> sentences, int from, int to) {
        ContextCounter c = new ContextCounter();
        for (int i = from; i < to; i++) c.addSentence(sentences.get(i)[0], sentences.get(i)[1]);
        return c;
    }

    @Test
    void stretchesAppendedInOrderHoldWhatOnePassHolds() throws IOException {
        List<String[][]> all = sentences(300, 7);
        byte[] onePass = count(all, 0, all.size()).toBytes();
        int[][] splits = {{0, 150, 300}, {0, 1, 299, 300}, {0, 40, 41, 200, 300}};
        for (int[] split : splits) {
            ContextCounter merged = count(all, split[0], split[1]);
            for (int k = 1; k + 1 < split.length; k++) {
                // Through bytes, as the parts travel from the executors.
                byte[] part = count(all, split[k], split[k + 1]).toBytes();
                merged.append(ContextCounter.fromBytes(part, "part " + k));
            }
            assertArrayEquals(onePass, merged.toBytes(), () -> "split at " + java.util.Arrays.toString(split));
        }
        ContextCounter whole = count(all, 0, all.size());
        ContextCounter halves = count(all, 0, 150);
        halves.append(count(all, 150, 300));
        assertEquals(whole.sentenceCount(), halves.sentenceCount());
        assertEquals(whole.tokenCount(), halves.tokenCount());
        assertEquals(whole.contextsOf(dev.tether.candidates.HeadClass.NOUN, "bear"), halves.contextsOf(dev.tether.candidates.HeadClass.NOUN, "bear"));
        // And the thesaurus built from them is the same, byte for byte.
        ThesaurusSettings settings = new ThesaurusSettings(ThesaurusSettings.DEFAULT.contexts(), ThesaurusSettings.DEFAULT.weighting(),
                ThesaurusSettings.DEFAULT.measure(), 2, ThesaurusSettings.DEFAULT.maxContextWords(), 5);
        byte[] a = ThesaurusFile.toBytes(ThesaurusBuilder.build(whole, settings, 1));
        byte[] b = ThesaurusFile.toBytes(ThesaurusBuilder.build(halves, settings, 2));
        assertTrue(ThesaurusBuilder.build(whole, settings, 1).size(dev.tether.candidates.HeadClass.NOUN) > 5);
        assertArrayEquals(a, b);
    }

    @Test
    void bytesThatAreNotContextCountsAreRefusedByName() {
        IOException e = assertThrows(IOException.class, () -> ContextCounter.fromBytes(new byte[] {1, 2, 3, 4, 5}, "task 3"));
        assertTrue(e.getMessage().startsWith("task 3: "), e.getMessage());
        byte[] cut = java.util.Arrays.copyOf(count(sentences(10, 1), 0, 10).toBytes(), 30);
        IOException early = assertThrows(IOException.class, () -> ContextCounter.fromBytes(cut, "task 4"));
        assertTrue(early.getMessage().contains("task 4") && early.getMessage().contains("end early"), early.getMessage());
    }
}
