package dev.tether.preprocessing;

import opennlp.tools.tokenize.TokenizerME;
import opennlp.tools.util.Span;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The edges of {@link MemoizedTokenizer} against OpenNLP's own {@link TokenizerME} with the shipped English model
 * (invented ferry-log lines; the check on real text is {@code MemoizedTokenizerEwtTest} in test-corpora).
 */
class MemoizedTokenizerTest {
    private static final String[] LINES = {
            "Replaced the gasket on the port engine's raw-water pump, then logged it (see p. 4).",
            "Replaced the gasket on the port engine's raw-water pump, then logged it (see p. 4).",
            "Crew:\tAda,  Bo\nand Cy didn't   check the U.S.-made valves; \"ok\" -- 3.5 bar?!",
            "  leading and trailing white space  ",
            "",
            " \t\n ",
            "x",
            "Torque 𝑘 = 40 Nm 🙂 per bolt, i.e. per 𝑘𝑔 of load.",
            "MV Tern Hollow / MV Sandpiper: hull #2 inspected @ 06:30 & 18:00.",
    };

    @Test
    void givesTheSpansOfOpenNlpsTokenizerWhetherATokenIsNewOrSeenBefore() throws Exception {
        var model = EnglishPreprocessingModels.shared().tokenizerModel();
        TokenizerME reference = new TokenizerME(model);
        MemoizedTokenizer tokenizer = new MemoizedTokenizer(model);
        for (int round = 0; round < 2; round++) {
            for (String line : LINES) {
                Span[] expected = reference.tokenizePos(line);
                assertArrayEquals(expected, tokenizer.tokenizePos(line), () -> "line: " + line.replace("\n", "\\n"));
            }
        }
        assertTrue(tokenizer.remembered() > 20, "the second round reads from the cache: " + tokenizer.remembered());
    }

    @Test
    void aFullCacheStartsOverAndStillGivesTheSameSpans() throws Exception {
        var model = EnglishPreprocessingModels.shared().tokenizerModel();
        TokenizerME reference = new TokenizerME(model);
        MemoizedTokenizer tokenizer = new MemoizedTokenizer(model);
        StringBuilder distinct = new StringBuilder();
        for (int i = 0; i < MemoizedTokenizer.CAPACITY + 10; i++) distinct.append("bolt").append(i).append(i % 7 == 0 ? ", " : " ");
        String text = distinct.toString();
        assertArrayEquals(reference.tokenizePos(text), tokenizer.tokenizePos(text));
        assertTrue(tokenizer.remembered() <= MemoizedTokenizer.CAPACITY, "bounded: " + tokenizer.remembered());
        assertEquals(reference.tokenizePos(LINES[0]).length, tokenizer.tokenizePos(LINES[0]).length);
    }
}
