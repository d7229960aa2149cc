package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.QuadrupleCountsBuilder;
import dev.tether.counts.SubTuple;
import dev.tether.counts.TupleCounts;
import dev.tether.counts.TupleKey;
import dev.tether.similarity.FerryLogCorpus;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.WordNormalizer;
import org.junit.jupiter.api.Test;

import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A neighbour's bit is set exactly when the quadruple counts saw the neighbour in that slot with that preposition,
 * for every thesaurus word, slot and preposition of an invented ferry-log fixture; the similarity-smoothed back-off
 * skips the others, which can add no cases.
 */
class NeighbourMasksTest {
    private static final String[] VERBS = {"replaced", "inspected", "cleaned", "checked"};
    private static final String[] PARTS = {"gasket", "valve", "seal", "filter", "impeller", "hose"};
    private static final String[] MACHINES = {"pump", "engine", "winch", "compressor"};
    private static final String[] PREPOSITIONS = {"on", "with", "for"};

    @Test
    void aBitIsSetExactlyForTheNeighboursTheCountsSawInTheSlot() {
        Thesaurus thesaurus = FerryLogCorpus.thesaurus(600, 20);
        WordNormalizer normalizer = new WordNormalizer();
        QuadrupleCountsBuilder builder = new QuadrupleCountsBuilder();
        Random r = new Random(9);
        for (int i = 0; i < 300; i++) {
            builder.add(normalizer.verb(VERBS[r.nextInt(VERBS.length)]), normalizer.noun(PARTS[r.nextInt(4)]),
                    PREPOSITIONS[r.nextInt(PREPOSITIONS.length)], normalizer.noun(MACHINES[r.nextInt(3)]),
                    r.nextBoolean() ? dev.tether.attachment.AttachmentSite.NOUN : dev.tether.attachment.AttachmentSite.VERB, 1);
        }
        QuadrupleCounts counts = builder.build();
        ThesaurusIds countIds = new ThesaurusIds(counts.words(), thesaurus);
        SubTuple[] singles = {SubTuple.VERB, SubTuple.NOUN1, SubTuple.NOUN2};
        HeadClass[] classes = {HeadClass.VERB, HeadClass.NOUN, HeadClass.NOUN};
        int set = 0, clear = 0;
        for (int slot = 0; slot < 3; slot++) {
            NeighbourMasks masks = new NeighbourMasks(counts, slot, classes[slot], thesaurus, countIds, 20);
            for (int t = 0; t < thesaurus.size(); t++) {
                if (thesaurus.wordClass(t) != classes[slot]) continue;
                for (int p = 1; p <= counts.prepositions().size(); p++) {
                    long mask = masks.mask(t, p);
                    TupleCounts single = counts.table(p, singles[slot]);
                    for (int j = 0; j < thesaurus.neighbourCount(t); j++) {
                        int w = countIds.countId(thesaurus.neighbourId(t, j));
                        boolean seen = w != 0 && single.find(TupleKey.of(w)) != TupleCounts.ABSENT;
                        assertEquals(seen, (mask & (1L << j)) != 0, "slot " + slot + ", " + thesaurus.key(t) + ", neighbour " + j);
                        if (seen) set++;
                        else clear++;
                    }
                }
            }
        }
        assertTrue(set > 0 && clear > 0, "the fixture has neighbours seen and unseen: " + set + " / " + clear);
    }
}
