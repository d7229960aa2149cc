package dev.tether.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads human word-similarity judgements from comma-separated text, in either of two forms:
 * <ul>
 *   <li>{@code ,word1,word2,similarity}: a header whose first column is empty, then an index column (the form of
 *       the sets in Tether's development data);</li>
 *   <li>{@code word1,word2,score}: three columns, with or without a header line (a first line whose score is not a
 *       number is taken as the header).</li>
 * </ul>
 * Blank lines are skipped, and so are rows whose words and score are all empty (an index with nothing after it, as
 * at the end of some distributed sets); any other line that does not fit fails with the file and line.
 */
public final class WordPairReader {

    /** One judged pair. */
    public record WordPair(String first, String second, double score) {
    }

    public List<WordPair> read(Path file) throws IOException {
        String text = Utf8Text.decode(file, Files.readAllBytes(file));
        if (!text.isEmpty() && text.charAt(0) == '\uFEFF') text = text.substring(1);
        String[] lines = text.split("\r?\n", -1);
        List<WordPair> pairs = new ArrayList<>();
        int columns = -1;
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i].strip();
            if (line.isEmpty()) continue;
            String[] f = line.split(",", -1);
            if (columns < 0) {
                columns = f.length;
                if (columns != 3 && columns != 4) {
                    throw new InputFormatException(file, i + 1, "has " + columns + " columns; give 'word1,word2,score' "
                            + "or the indexed form ',word1,word2,similarity'");
                }
                if (!isNumber(f[columns - 1].strip())) continue; // the header
            }
            if (f.length == columns && f[columns - 1].isBlank() && f[columns - 2].isBlank() && f[columns - 3].isBlank()) continue;
            if (f.length != columns) {
                throw new InputFormatException(file, i + 1, "has " + f.length + " columns, the file's first line " + columns);
            }
            String first = f[columns - 3].strip();
            String second = f[columns - 2].strip();
            String score = f[columns - 1].strip();
            if (first.isEmpty() || second.isEmpty() || !isNumber(score)) {
                throw new InputFormatException(file, i + 1, "is not 'word1,word2,score' with a numeric score: " + line);
            }
            pairs.add(new WordPair(first, second, Double.parseDouble(score)));
        }
        if (pairs.isEmpty()) throw new InputFormatException(file, 0, "holds no word pairs");
        return pairs;
    }

    private static boolean isNumber(String s) {
        try {
            return Double.isFinite(Double.parseDouble(s));
        } catch (NumberFormatException e) {
            return false;
        }
    }
}
