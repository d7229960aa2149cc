package dev.tether.io;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class WordPairReaderTest {
    @TempDir
    Path dir;

    private List<WordPairReader.WordPair> read(String text) throws IOException {
        Path f = dir.resolve("pairs.csv");
        Files.writeString(f, text);
        return new WordPairReader().read(f);
    }

    @Test
    void readsTheIndexedFormWithItsHeader() throws IOException {
        assertEquals(List.of(new WordPairReader.WordPair("gem", "jewel", 3.94), new WordPairReader.WordPair("cord", "smile", 0.02)),
                read(",word1,word2,similarity\n0,gem,jewel,3.94\n1,cord,smile,0.02\n2,,,\n"));
    }

    @Test
    void readsThreeColumnsWithOrWithoutAHeader() throws IOException {
        List<WordPairReader.WordPair> expected = List.of(new WordPairReader.WordPair("hull", "keel", 7.5));
        assertEquals(expected, read("word1,word2,score\r\nhull,keel,7.5\r\n"));
        assertEquals(expected, read("hull,keel,7.5\n\n"));
    }

    @Test
    void aBadLineFailsWithFileAndLine() throws IOException {
        Path f = dir.resolve("pairs.csv");
        Files.writeString(f, "word1,word2,score\nhull,keel,7.5\nhull,keel\n");
        InputFormatException e = assertThrows(InputFormatException.class, () -> new WordPairReader().read(f));
        assertEquals(f + ":3: has 2 columns, the file's first line 3", e.getMessage());
        Files.writeString(f, "word1,word2,score\nhull,keel,high\n");
        assertEquals(f + ":2: is not 'word1,word2,score' with a numeric score: hull,keel,high",
                assertThrows(InputFormatException.class, () -> new WordPairReader().read(f)).getMessage());
        Files.writeString(f, "word1,word2,score\n");
        assertEquals(f + ": holds no word pairs",
                assertThrows(InputFormatException.class, () -> new WordPairReader().read(f)).getMessage());
    }
}
