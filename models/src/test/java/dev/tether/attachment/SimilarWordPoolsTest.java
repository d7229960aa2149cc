package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.HeadChoiceCounts.Part;
import dev.tether.counts.HeadChoiceCountsBuilder;
import dev.tether.counts.QuadrupleCountsBuilder;
import dev.tether.counts.TupleCounts;
import dev.tether.counts.TupleKey;
import dev.tether.similarity.FerryLogCorpus;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.WordNormalizer;
import org.junit.jupiter.api.Test;

import java.util.EnumSet;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The similar-words pools summed at load give exactly the doubles of the per-candidate sums they replace, for every
 * slot, thesaurus word, preposition, class and partner word of an invented ferry-log fixture (so the ranker's
 * features, and a model's decisions, do not depend on which of the two computed them).
 */
class SimilarWordPoolsTest {
    private static final String[] VERBS = {"replaced", "inspected", "cleaned", "checked", "tightened"};
    private static final String[] PARTS = {"gasket", "valve", "seal", "filter", "impeller", "hose", "belt"};
    private static final String[] MACHINES = {"pump", "engine", "winch", "compressor", "generator"};
    private static final String[] CREW = {"engineer", "deckhand", "mechanic", "mate", "skipper"};
    private static final String[] PREPOSITIONS = {"on", "with", "for", "of"};

    @Test
    void thePoolsSummedAtLoadEqualThePerCandidateSums() {
        Thesaurus thesaurus = FerryLogCorpus.thesaurus(600, 20);
        WordNormalizer normalizer = new WordNormalizer();
        HeadChoiceCountsBuilder counts = new HeadChoiceCountsBuilder();
        Random r = new Random(7);
        // Some words are left out of the counts, so that pools mix neighbours with counts and without.
        for (int i = 0; i < 400; i++) {
            String p = PREPOSITIONS[r.nextInt(PREPOSITIONS.length)];
            String object = normalizer.noun(r.nextBoolean() ? MACHINES[r.nextInt(4)] : PARTS[r.nextInt(6)]);
            boolean verb = r.nextBoolean();
            String head = verb ? normalizer.verb(VERBS[r.nextInt(4)]) : normalizer.noun(r.nextBoolean() ? PARTS[r.nextInt(6)] : CREW[r.nextInt(4)]);
            counts.addLexical(p, head, verb ? HeadClass.VERB.ordinal() : HeadClass.NOUN.ordinal(), object, r.nextBoolean(), 1 + r.nextInt(3));
        }
        HeadChoiceCounts statistics = counts.build();
        AttachmentFeatureExtractor extractor = new AttachmentFeatureExtractor(statistics, new QuadrupleCountsBuilder().build(),
                statistics, normalizer, EnumSet.allOf(AttachmentFeatureFamily.class), thesaurus);
        SimilarWordPools pools = extractor.pools();
        assertTrue(pools.size() > 0);
        assertTrue(pools.pairsHold(), "every event is counted at every level");

        int[] found = new int[4];
        double[] fast = new double[2];
        double[] slow = new double[2];
        for (int sp = 1; sp <= statistics.prepositions().size(); sp++) {
            for (int head = 0; head < thesaurus.size(); head++) {
                int c = thesaurus.wordClass(head).ordinal();
                int sh = Math.max(0, statistics.words().id(thesaurus.key(head)));
                for (int object = -1; object < thesaurus.size(); object++) {
                    if (object >= 0 && thesaurus.wordClass(object) != HeadClass.NOUN) continue;
                    int so = object < 0 ? 0 : Math.max(0, statistics.words().id(thesaurus.key(object)));
                    int headPool = pools.head(head, sp, c);
                    int objectPool = object < 0 ? -1 : pools.object(object, sp, c);
                    for (int slot = AttachmentFeature.SIMILAR_HEAD; slot <= AttachmentFeature.SIMILAR_CLASS_OBJECT; slot++) {
                        int objectEntry = object < 0 ? Thesaurus.UNKNOWN : object;
                        long headPair = sh == 0 ? TupleCounts.ABSENT : statistics.lexical(sp, Part.HEAD).find(TupleKey.of(sh, c + 1));
                        long objectPair = so == 0 ? TupleCounts.ABSENT : statistics.lexical(sp, Part.CLASS_OBJECT).find(TupleKey.of(c + 1, so));
                        boolean a = extractor.pooled(slot, sp, c, sh, head, headPool, so, objectEntry, objectPool, headPair, objectPair, fast);
                        boolean b = extractor.pool(slot, sp, c, sh, head, so, objectEntry, slow, null);
                        String where = "slot " + slot + ", preposition " + sp + ", head " + thesaurus.key(head)
                                + ", object " + (object < 0 ? "none" : thesaurus.key(object));
                        assertEquals(b, a, where);
                        assertEquals(slow[0], fast[0], 0.0, where);
                        assertEquals(slow[1], fast[1], 0.0, where);
                        if (a) found[slot]++;
                    }
                }
            }
        }
        for (int slot = 0; slot < 4; slot++) assertTrue(found[slot] > 0, "slot " + slot + " pooled some cases: " + found[slot]);
    }
}
