package dev.tether.counts;

import dev.tether.vocabulary.Vocabulary;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

/** Writes and reads a vocabulary as its words in id order. */
public final class VocabularyCodec {
    private VocabularyCodec() {
    }

    public static void write(Vocabulary v, DataOutput out) throws IOException {
        List<String> words = v.words();
        out.writeInt(words.size());
        for (String w : words) out.writeUTF(w);
    }

    public static Vocabulary read(DataInput in) throws IOException {
        int n = in.readInt();
        if (n < 0 || n > Vocabulary.MAX_SIZE) throw new IOException("vocabulary size " + n + " out of range");
        List<String> words = new ArrayList<>(n);
        for (int i = 0; i < n; i++) words.add(in.readUTF());
        Vocabulary v = Vocabulary.frozenOf(words);
        if (v.size() != n) throw new IOException("the vocabulary repeats a word (" + n + " entries, " + v.size() + " distinct)");
        return v;
    }
}
