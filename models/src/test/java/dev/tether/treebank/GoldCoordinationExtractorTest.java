package dev.tether.treebank;

import dev.tether.coordination.ModifierKind;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Gold coordinations of invented sentences annotated by hand in UD style: the last conjunct is the {@code cc}'s head,
 * the first its {@code conj} head, and a modifier is shared when the enhanced graph (column 9) repeats it (the UD
 * guidelines on enhanced dependencies, https://universaldependencies.org/u/overview/enhanced-syntax.html).
 */
public class GoldCoordinationExtractorTest {
    public static List<TreebankSentence> ferry() throws Exception {
        return ConlluReader.readAll(Path.of(GoldCoordinationExtractorTest.class
                .getResource("/dev/tether/coordination/ferry-coordination.conllu").toURI()));
    }

    @Test
    void sharedSubjectOfTwoVerbsComesFromTheEnhancedGraph() throws Exception {
        GoldCoordination g = new GoldCoordinationExtractor().extract(ferry().get(0)).get(0);
        assertEquals(5, g.coordinator());
        assertEquals(2, g.left());
        assertEquals(6, g.right());
        assertArrayEquals(new int[] {1, 8}, g.modifiers(), "the subject before, the object after");
        assertEquals(ModifierKind.SUBJECT, g.kinds()[0]);
        assertEquals(ModifierKind.OBJECT, g.kinds()[1]);
        assertArrayEquals(new boolean[] {true, false}, g.shared());
        assertEquals(2, g.leftBegin(), "the shared subject is outside the first conjunct");
        assertEquals(4, g.leftEnd());
        assertEquals(6, g.rightBegin());
        assertEquals(8, g.rightEnd());
    }

    @Test
    void sharedPremodifierAndPhraseOfTwoNouns() throws Exception {
        GoldCoordination g = new GoldCoordinationExtractor().extract(ferry().get(1)).get(0);
        assertEquals(4, g.left());
        assertEquals(6, g.right());
        assertArrayEquals(new int[] {3, 9}, g.modifiers());
        assertEquals(ModifierKind.PREMODIFIER, g.kinds()[0]);
        assertEquals(ModifierKind.PREPOSITIONAL, g.kinds()[1]);
        assertArrayEquals(new boolean[] {true, true}, g.shared());
        assertEquals(4, g.leftEnd());
    }

    @Test
    void aClauseWithItsOwnSubjectSharesNothing() throws Exception {
        GoldCoordination g = new GoldCoordinationExtractor().extract(ferry().get(2)).get(0);
        assertEquals(2, g.left());
        assertEquals(8, g.right());
        assertArrayEquals(new int[] {1, 10}, g.modifiers());
        assertArrayEquals(new boolean[] {false, false}, g.shared());
    }
}
