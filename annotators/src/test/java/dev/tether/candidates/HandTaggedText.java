package dev.tether.candidates;

import java.util.ArrayList;
import java.util.List;

/**
 * A test sentence written as {@code word/TAG} pairs separated by single spaces, turned into document text and token
 * offsets. The tags are assigned by hand from the Penn Treebank tag set (Marcus et al. 1993), so finder tests do not
 * depend on a statistical tagger.
 */
final class HandTaggedText {
    final String text;
    final List<String> words = new ArrayList<>();
    final List<String> tags = new ArrayList<>();
    final List<int[]> spans = new ArrayList<>();

    HandTaggedText(String pairs) {
        StringBuilder text = new StringBuilder();
        for (String pair : pairs.trim().split(" ")) {
            int slash = pair.lastIndexOf('/');
            if (slash <= 0 || slash == pair.length() - 1) {
                throw new IllegalArgumentException("not a word/TAG pair: '" + pair + "'");
            }
            if (text.length() > 0) {
                text.append(' ');
            }
            String word = pair.substring(0, slash);
            spans.add(new int[] {text.length(), text.length() + word.length()});
            text.append(word);
            words.add(word);
            tags.add(pair.substring(slash + 1));
        }
        this.text = text.toString();
    }

    int size() { return words.size(); }
    int begin(int i) { return spans.get(i)[0]; }
    int end(int i) { return spans.get(i)[1]; }

    /** The maintenance-log sentence used across the finder tests (invented, fictional ferry operator). */
    static HandTaggedText gasketSentence() {
        return new HandTaggedText("The/DT engineer/NN replaced/VBD the/DT gasket/NN on/IN the/DT port/JJ engine/NN "
                + "with/IN a/DT spare/NN from/IN the/DT stores/NNS ./.");
    }
}
