package dev.tether.counts;

import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.BackedOffScorer;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.LexicalAssociationScorer;
import dev.tether.attachment.Quadruple;
import dev.tether.attachment.QuadrupleScorer;
import dev.tether.io.QuadrupleReader;
import dev.tether.vocabulary.Vocabulary;
import dev.tether.vocabulary.WordNormalizer;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.function.Function;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

/**
 * Counts are mergeable: counting two shards apart and adding them gives the counts of their union. The two sides
 * number their words differently, so tables are compared by content (through the vocabularies), tuple by tuple.
 */
class QuadrupleCountsBuilderMergeTest {
    private static final WordNormalizer NORMALIZER = new WordNormalizer();

    @Test
    void countingHalvesApartAndAddingEqualsCountingTheUnion() throws Exception {
        List<LabelledQuadruple> all = fixture();
        for (long seed = 1; seed <= 5; seed++) {
            List<LabelledQuadruple> shuffled = new ArrayList<>(all);
            Collections.shuffle(shuffled, new Random(seed));
            List<LabelledQuadruple> first = shuffled.subList(0, shuffled.size() / 2);
            List<LabelledQuadruple> second = shuffled.subList(shuffled.size() / 2, shuffled.size());

            QuadrupleCounts union = count(all).build();
            QuadrupleCountsBuilder merged = new QuadrupleCountsBuilder();
            merged.addAll(count(first).build());
            merged.addAll(count(second).build());
            QuadrupleCounts fromShards = merged.build();
            // A builder that has counted one shard itself and then adds the other.
            QuadrupleCountsBuilder counting = count(first);
            counting.addAll(count(second).build());
            QuadrupleCounts mixed = counting.build();

            // The word ids differ, so a comparison of raw keys would prove nothing.
            assertNotEquals(union.words().words(), fromShards.words().words(), "seed " + seed);
            assertEquals(content(union), content(fromShards), "seed " + seed);
            assertEquals(content(union), content(mixed), "seed " + seed);
            assertEquals(union.total(), fromShards.total());
            assertEquals(union.nounAttachments(), fromShards.nounAttachments());

            for (Function<QuadrupleCounts, QuadrupleScorer> scorer : List.<Function<QuadrupleCounts, QuadrupleScorer>>of(
                    BackedOffScorer::new, LexicalAssociationScorer::new)) {
                assertSameDecisions(union, fromShards, scorer, all);
                assertSameDecisions(union, mixed, scorer, all);
            }
        }
    }

    @Test
    void addingAnEmptyTableChangesNothing() throws Exception {
        QuadrupleCounts union = count(fixture()).build();
        QuadrupleCountsBuilder b = count(fixture());
        b.addAll(new QuadrupleCountsBuilder().build());
        assertEquals(content(union), content(b.build()));
    }

    @Test
    void contentComparisonSeesADifferenceOfOneCase() throws Exception {
        // Guards the comparison itself: one extra case must show.
        List<LabelledQuadruple> all = fixture();
        QuadrupleCountsBuilder more = count(all);
        more.add("replac", "gasket", "with", "spare", AttachmentSite.NOUN, 1.0);
        assertNotEquals(content(count(all).build()), content(more.build()));
    }

    private static void assertSameDecisions(QuadrupleCounts a, QuadrupleCounts b,
                                            Function<QuadrupleCounts, QuadrupleScorer> scorer,
                                            List<LabelledQuadruple> items) {
        QuadrupleScorer sa = scorer.apply(a);
        QuadrupleScorer sb = scorer.apply(b);
        List<Quadruple> queries = new ArrayList<>();
        for (LabelledQuadruple lq : items) queries.add(lq.quadruple());
        // Combinations never seen together exercise the lower back-off levels.
        for (int i = 0; i + 1 < items.size(); i++) {
            Quadruple x = items.get(i).quadruple();
            Quadruple y = items.get(i + 1).quadruple();
            queries.add(new Quadruple(x.verb(), y.noun1(), x.preposition(), y.noun2()));
            queries.add(new Quadruple(y.verb(), x.noun1(), x.preposition(), "tugboat"));
        }
        for (Quadruple q : queries) {
            int[] ia = a.encode(NORMALIZER, q.verb(), q.noun1(), q.preposition(), q.noun2());
            int[] ib = b.encode(NORMALIZER, q.verb(), q.noun1(), q.preposition(), q.noun2());
            assertEquals(sa.decide(ia[0], ia[1], ia[2], ia[3]), sb.decide(ib[0], ib[1], ib[2], ib[3]),
                    sa.name() + " on " + q);
        }
    }

    static List<LabelledQuadruple> fixture() throws Exception {
        Path file = Path.of(QuadrupleCountsBuilderMergeTest.class.getResource("/dev/tether/io/ferry-logs.quadruples").toURI());
        return new QuadrupleReader(false).read(file).quadruples();
    }

    private static QuadrupleCountsBuilder count(List<LabelledQuadruple> items) {
        QuadrupleCountsBuilder b = new QuadrupleCountsBuilder();
        for (LabelledQuadruple lq : items) {
            Quadruple q = lq.quadruple();
            b.add(NORMALIZER.verb(q.verb()), NORMALIZER.noun(q.noun1()), NORMALIZER.preposition(q.preposition()),
                    NORMALIZER.noun(q.noun2()), lq.site(), 1.0);
        }
        return b;
    }

    /** Every count of {@code c} keyed by words, e.g. "with VERB_NOUN2 replac spare" -> [noun, all]. */
    static Map<String, List<Double>> content(QuadrupleCounts c) {
        Map<String, List<Double>> m = new TreeMap<>();
        Vocabulary words = c.words();
        for (int p = 1; p <= c.prepositions().size(); p++) {
            String prep = c.prepositions().word(p);
            m.put(prep + " (preposition)", List.of(c.prepositionNounCount(p), c.prepositionCount(p)));
            for (SubTuple part : SubTuple.values()) {
                TupleCounts t = c.table(p, part);
                for (int s = 0; s < t.size(); s++) {
                    put(m, prep + " " + part + " " + words(words, t.key(s), part.arity()), t.hitsAt(s), t.trialsAt(s));
                }
            }
        }
        for (int s = 0; s < c.verbs().size(); s++) {
            put(m, "(verb) " + words(words, c.verbs().key(s), 1), c.verbs().hitsAt(s), c.verbs().trialsAt(s));
        }
        for (int s = 0; s < c.nouns1().size(); s++) {
            put(m, "(noun1) " + words(words, c.nouns1().key(s), 1), c.nouns1().hitsAt(s), c.nouns1().trialsAt(s));
        }
        return m;
    }

    private static void put(Map<String, List<Double>> m, String key, double hits, double trials) {
        List<Double> previous = m.put(key, List.of(hits, trials));
        assertFalse(previous != null, "two slots decode to the same words: " + key);
    }

    private static String words(Vocabulary v, long key, int arity) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < arity; i++) {
            if (i > 0) sb.append(' ');
            sb.append(v.word(TupleKey.part(key, arity, i)));
        }
        return sb.toString();
    }
}
