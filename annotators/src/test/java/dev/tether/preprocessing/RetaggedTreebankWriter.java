package dev.tether.preprocessing;

import dev.tether.model.ModelFile;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes copies of CoNLL-U files with column 5 (XPOS) replaced by predicted Penn tags, for measuring what tagging
 * errors cost a ranker trained or scored on gold trees (a development tool, not part of the build). Run by hand with
 * the annotators test classpath:
 * {@code java -cp ... dev.tether.preprocessing.RetaggedTreebankWriter TRAIN DEV MODEL OUT-TRAIN OUT-DEV}: TRAIN is
 * tagged fold by fold by taggers trained without the fold ({@link HeldOutTagging}, 5 folds), DEV by the tagger of
 * MODEL (a model file with a tagger section). Every other column and line is kept as it is.
 */
public final class RetaggedTreebankWriter {
    private RetaggedTreebankWriter() {
    }

    public static void main(String[] args) throws Exception {
        Path train = Path.of(args[0]);
        Path dev = Path.of(args[1]);
        List<TreebankSentence> heldOut = HeldOutTagging.retag(ConlluReader.readAll(train), 5, train.getFileName().toString());
        write(train, heldOut, Path.of(args[3]));
        MemoizedBeamTagger tagger = new MemoizedBeamTagger(ModelTaggers.of(ModelFile.read(Path.of(args[2])))
                .orElseThrow(() -> new IllegalArgumentException(args[2] + " has no tagger section")));
        List<TreebankSentence> tagged = new ArrayList<>();
        for (TreebankSentence s : ConlluReader.readAll(dev)) tagged.add(s.withXposTags(tagger.tag(s.forms())));
        write(dev, tagged, Path.of(args[4]));
    }

    /** {@code in} with the tags of {@code tagged} (its sentences in order, one per word line) in column 5. */
    private static void write(Path in, List<TreebankSentence> tagged, Path out) throws Exception {
        StringBuilder b = new StringBuilder();
        int sentence = 0;
        int word = 0;
        boolean inSentence = false;
        for (String line : Files.readAllLines(in)) {
            if (line.isBlank()) {
                if (inSentence) {
                    if (word != tagged.get(sentence).size()) throw new IllegalStateException(in + ": sentence " + (sentence + 1) + " does not align");
                    sentence++;
                    word = 0;
                    inSentence = false;
                }
            } else if (!line.startsWith("#")) {
                inSentence = true;
                String[] columns = line.split("\t", -1);
                if (columns[0].chars().allMatch(Character::isDigit)) {
                    columns[4] = tagged.get(sentence).xposTags()[word++];
                    line = String.join("\t", columns);
                }
            }
            b.append(line).append('\n');
        }
        Files.writeString(out, b);
        System.out.println(out + ": " + sentence + " sentences");
    }
}
