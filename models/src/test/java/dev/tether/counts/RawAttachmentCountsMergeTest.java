package dev.tether.counts;

import dev.tether.attachment.AttachmentQuery;
import dev.tether.candidates.HeadClass;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Raw counts of shards merge to the same bytes in any grouping and order, and to the counts of one builder. */
class RawAttachmentCountsMergeTest {
    private static final String[] VERBS = {"replaced", "logged", "checked", "fitted", "drained"};
    private static final String[] NOUNS = {"gasket", "pump", "hull", "valve", "deck", "engine", "tank"};
    private static final String[] PREPOSITIONS = {"on", "with", "from", "in", "of"};

    /** Invented candidate sets from the ferry logs: a verb 3 tokens left, a noun right before, sometimes more. */
    private static List<AttachmentQuery> queries(long seed, int n) {
        Random r = new Random(seed);
        List<AttachmentQuery> qs = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            AttachmentQuery.Builder b = AttachmentQuery.builder(PREPOSITIONS[r.nextInt(PREPOSITIONS.length)],
                    NOUNS[r.nextInt(NOUNS.length)]);
            int shape = r.nextInt(3);
            if (shape == 0) {
                b.candidate(VERBS[r.nextInt(VERBS.length)], "VBD", HeadClass.VERB, 1, false);
            } else {
                b.candidate(NOUNS[r.nextInt(NOUNS.length)], "NN", HeadClass.NOUN, 1, false);
                b.candidate(VERBS[r.nextInt(VERBS.length)], "VBD", HeadClass.VERB, 3, false);
                if (shape == 2) b.candidate(NOUNS[r.nextInt(NOUNS.length)], "NN", HeadClass.NOUN, 5, false);
                b.quadruple(1, 0);
            }
            qs.add(b.build());
        }
        return qs;
    }

    private static RawAttachmentCounts count(List<AttachmentQuery> qs) {
        RawAttachmentCountsBuilder b = new RawAttachmentCountsBuilder();
        for (AttachmentQuery q : qs) {
            b.add(q);
            tokens(q, b);
        }
        b.addDocument(1, 10L * qs.size());
        return b.build();
    }

    @Test
    void shardsMergeToTheSameBytesInAnyOrderAndGrouping() {
        List<AttachmentQuery> a = queries(1, 300), b = queries(2, 200), c = queries(3, 250);
        List<AttachmentQuery> all = new ArrayList<>(a);
        all.addAll(b);
        all.addAll(c);
        RawAttachmentCountsBuilder one = new RawAttachmentCountsBuilder();
        for (AttachmentQuery q : all) {
            one.add(q);
            tokens(q, one);
        }
        one.addDocument(1, 3000);
        one.addDocument(1, 2000);
        one.addDocument(1, 2500);
        byte[] single = one.build().toBytes();

        RawAttachmentCountsBuilder abc = new RawAttachmentCountsBuilder();
        for (RawAttachmentCounts s : List.of(count(a), count(b), count(c))) abc.addAll(s);
        RawAttachmentCountsBuilder cba = new RawAttachmentCountsBuilder();
        for (RawAttachmentCounts s : List.of(count(c), count(b), count(a))) cba.addAll(s);
        // (b + c) first, then a: associativity.
        RawAttachmentCountsBuilder bc = new RawAttachmentCountsBuilder();
        bc.addAll(count(b));
        bc.addAll(count(c));
        RawAttachmentCountsBuilder bcThenA = new RawAttachmentCountsBuilder();
        bcThenA.addAll(count(a));
        bcThenA.addAll(bc.build());

        assertArrayEquals(single, abc.build().toBytes());
        assertArrayEquals(single, cba.build().toBytes());
        assertArrayEquals(single, bcThenA.build().toBytes());
        assertEquals(750, abc.build().tally().prepositions());
        // Every query's object and first candidate were counted as words: 750 objects and 750 heads.
        assertEquals(1500, abc.build().words().total());
    }

    @Test
    void buildingAndEmptyingGivesTheSameBytesAndLeavesAnEmptyBuilder() {
        RawAttachmentCountsBuilder b = new RawAttachmentCountsBuilder();
        for (AttachmentQuery q : queries(4, 400)) {
            b.add(q);
            tokens(q, b);
        }
        b.addDocument(3, 4000);
        b.addSkippedDocument();
        byte[] built = b.build().toBytes();
        RawAttachmentCounts emptied = b.buildAndEmpty();
        assertArrayEquals(built, emptied.toBytes(), "the same counts, whichever way they are built");
        assertEquals(400, emptied.tally().prepositions());
        assertArrayEquals(new RawAttachmentCountsBuilder().build().toBytes(), b.build().toBytes(), "nothing is left");
        b.addAll(emptied);
        assertArrayEquals(built, b.build().toBytes(), "the emptied builder counts again from nothing");
    }

    /** The words of a query's sentence as the counter sees tokens: the object (a noun) and the first candidate. */
    private static void tokens(AttachmentQuery q, RawAttachmentCountsBuilder b) {
        b.addToken(q.object(), "NN");
        b.addToken(q.head(0), q.headClass(0) == HeadClass.VERB ? "VBD" : "NN");
    }

    /** Ratnaparkhi's (1998) rule: a verb right before the phrase is unambiguous, a noun with a verb near is not. */
    @Test
    void unambiguousRuleFollowsTheNearestHeadAndTheWindow() {
        AttachmentQuery verbFirst = AttachmentQuery.builder("to", "dock").candidate("returned", "VBD", HeadClass.VERB, 1, false)
                .candidate("ferry", "NN", HeadClass.NOUN, 3, false).build();
        AttachmentQuery nounNearVerb = AttachmentQuery.builder("on", "deck").candidate("crack", "NN", HeadClass.NOUN, 1, false)
                .candidate("found", "VBD", HeadClass.VERB, 3, false).build();
        AttachmentQuery nounFarFromVerb = AttachmentQuery.builder("of", "valve").candidate("seat", "NN", HeadClass.NOUN, 1, false)
                .candidate("found", "VBD", HeadClass.VERB, 9, false).build();
        AttachmentQuery broken = AttachmentQuery.builder("in", "port").candidate("stopped", "VBD", HeadClass.VERB, 2, true)
                .candidate("engine", "NN", HeadClass.NOUN, 4, false).build();
        assertEquals(0, RawAttachmentCountsBuilder.soleHead(verbFirst));
        assertEquals(-1, RawAttachmentCountsBuilder.soleHead(nounNearVerb));
        assertEquals(0, RawAttachmentCountsBuilder.soleHead(nounFarFromVerb));
        assertEquals(-1, RawAttachmentCountsBuilder.soleHead(broken));
    }

    @Test
    void countsFileOfAnotherVersionOrDamagedFailsNamingIt() {
        byte[] bytes = count(queries(4, 50)).toBytes();
        byte[] otherVersion = bytes.clone();
        otherVersion["TETHER-RAW-COUNTS\n".length() + 3] = 99;
        RawCountsFormatException e = assertThrows(RawCountsFormatException.class,
                () -> RawAttachmentCounts.fromBytes(otherVersion, "shard-7.counts"));
        assertTrue(e.getMessage().contains("shard-7.counts") && e.getMessage().contains("version 99"), e.getMessage());
        byte[] damaged = bytes.clone();
        damaged[damaged.length / 2] ^= 1;
        e = assertThrows(RawCountsFormatException.class, () -> RawAttachmentCounts.fromBytes(damaged, "shard-7.counts"));
        assertTrue(e.getMessage().contains("checksum"), e.getMessage());
    }
}
