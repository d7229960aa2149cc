package dev.tether.similarity;

import dev.tether.candidates.HeadClass;
import dev.tether.io.AtomicFileWriter;
import dev.tether.io.ChecksummedFile;
import dev.tether.vocabulary.WordNormalizer;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.EOFException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.zip.Deflater;
import java.util.zip.DeflaterOutputStream;
import java.util.zip.Inflater;
import java.util.zip.InflaterInputStream;

/**
 * Tether's thesaurus file. Layout:
 * <pre>
 *   "TETHER-THESAURUS\n"      17 bytes, identifies the file
 *   format version            int
 *   payload length            long, bytes of the compressed payload
 *   payload                   deflate-compressed: normalizer version, settings, corpus size, whether the vectors
 *                             are kept (since version 2), words (class, key), context vectors if kept (context ids
 *                             as gaps, weights), neighbour lists (ids, scores)
 *   SHA-256                   32 bytes over everything before it
 * </pre>
 * Writing is atomic (temporary file, then rename); the same thesaurus always gives the same bytes. Reading checks
 * the header, the version, the checksum, the normalization the words were keyed with, and the consistency of every
 * list, and fails with a message that names the file. Version 1 (always with vectors) is still read.
 */
public final class ThesaurusFile {
    public static final int FORMAT_VERSION = 2;
    /** The oldest version this build reads: version 1 files always kept their vectors. */
    public static final int OLDEST_READABLE = 1;
    private static final ChecksummedFile.Kind KIND = new ChecksummedFile.Kind("TETHER-THESAURUS\n", "thesaurus",
            "a file written by 'tether thesaurus build'", "copy or build it again",
            "Build the thesaurus again with this version ('tether thesaurus build').");

    private ThesaurusFile() {
    }

    /** Writes {@code thesaurus} to {@code target} atomically; on failure the target is untouched. */
    public static void write(Thesaurus thesaurus, Path target) throws IOException {
        AtomicFileWriter.write(target, encode(thesaurus), "thesaurus");
    }

    /** Reads the thesaurus at {@code file}; a foreign, damaged or other-version file fails with a message naming it. */
    public static Thesaurus read(Path file) throws IOException {
        if (Files.isDirectory(file)) {
            throw new ThesaurusFormatException(file + " is a directory, not a thesaurus file; give the path of a file written by 'tether thesaurus build'");
        }
        try {
            return decode(Files.readAllBytes(file), file.toString());
        } catch (NoSuchFileException e) {
            throw new ThesaurusFormatException(file + " does not exist; give the path of a file written by 'tether thesaurus build'");
        }
    }

    /** The bytes of a thesaurus file holding {@code t} (what {@link #write} writes; a model embeds them). */
    public static byte[] toBytes(Thesaurus t) throws IOException {
        return encode(t);
    }

    /** Decodes {@link #toBytes}; {@code name} names the bytes in messages. */
    public static Thesaurus fromBytes(byte[] bytes, String name) throws ThesaurusFormatException {
        return decode(bytes, name);
    }

    static byte[] encode(Thesaurus t) throws IOException {
        ByteArrayOutputStream payload = new ByteArrayOutputStream();
        Deflater deflater = new Deflater(Deflater.BEST_COMPRESSION);
        try (DataOutputStream out = new DataOutputStream(new DeflaterOutputStream(payload, deflater, 1 << 16))) {
            out.writeUTF(t.normalizerVersion());
            ThesaurusSettings s = t.settings();
            out.writeUTF(s.contexts().label());
            out.writeUTF(s.weighting().label());
            out.writeUTF(s.measure().label());
            out.writeInt(s.minFrequency());
            out.writeInt(s.maxContextWords());
            out.writeInt(s.neighbours());
            out.writeLong(t.sentences());
            out.writeLong(t.tokens());
            out.writeBoolean(t.hasVectors());
            int words = t.size();
            out.writeInt(words);
            for (int w = 0; w < words; w++) {
                out.writeByte(t.wordClass(w).ordinal());
                out.writeUTF(t.key(w));
            }
            ContextVectors v = t.vectors();
            if (v != null) {
                out.writeInt(v.contexts());
                for (int w = 0; w < words; w++) {
                    out.writeInt(v.end(w) - v.start(w));
                    int previous = -1;
                    for (int i = v.start(w); i < v.end(w); i++) {
                        out.writeInt(v.context(i) - previous);
                        previous = v.context(i);
                    }
                    for (int i = v.start(w); i < v.end(w); i++) out.writeFloat(v.weight(i));
                }
            }
            for (int w = 0; w < words; w++) {
                int n = t.neighbourCount(w);
                out.writeInt(n);
                for (int i = 0; i < n; i++) out.writeInt(t.neighbourId(w, i));
                for (int i = 0; i < n; i++) out.writeFloat(t.neighbourScore(w, i));
            }
        } finally {
            deflater.end();
        }
        return ChecksummedFile.frame(KIND, FORMAT_VERSION, payload);
    }

    static Thesaurus decode(byte[] bytes, String name) throws ThesaurusFormatException {
        ChecksummedFile.Payload framed = ChecksummedFile.open(bytes, KIND, OLDEST_READABLE, FORMAT_VERSION, name,
                ThesaurusFormatException::new);
        Inflater inflater = new Inflater();
        try (DataInputStream in = new DataInputStream(new InflaterInputStream(
                new ByteArrayInputStream(bytes, framed.offset(), framed.length()), inflater, 1 << 16))) {
            String normalizer = in.readUTF();
            if (!normalizer.equals(WordNormalizer.VERSION)) {
                throw new ThesaurusFormatException(name + " keys its words with normalization '" + normalizer
                        + "'; this build of Tether uses '" + WordNormalizer.VERSION + "'. Build the thesaurus again ('tether thesaurus build').");
            }
            ThesaurusSettings settings = new ThesaurusSettings(ContextChoice.of(in.readUTF()), Weighting.of(in.readUTF()),
                    SimilarityMeasure.of(in.readUTF()), in.readInt(), in.readInt(), in.readInt());
            long sentences = in.readLong();
            long tokens = in.readLong();
            boolean hasVectors = framed.version() < 2 || in.readBoolean();
            int words = count(in.readInt(), "word count");
            String[] keys = new String[words];
            HeadClass[] classes = new HeadClass[words];
            for (int w = 0; w < words; w++) {
                int c = in.readUnsignedByte();
                if (c >= HeadClass.values().length) throw new IOException("word " + w + " has an unknown class " + c);
                classes[w] = HeadClass.values()[c];
                keys[w] = in.readUTF();
                if (w > 0 && (classes[w].ordinal() < classes[w - 1].ordinal()
                        || (classes[w] == classes[w - 1] && keys[w].compareTo(keys[w - 1]) <= 0))) {
                    throw new IOException("words out of order at " + w);
                }
            }
            ContextVectors vectors = hasVectors ? readVectors(in, words) : null;
            int[] nStart = new int[words + 1];
            int[] ids = new int[16];
            float[] scores = new float[16];
            for (int w = 0; w < words; w++) {
                int n = count(in.readInt(), "neighbour count");
                if (n > settings.neighbours()) throw new IOException("word " + w + " has " + n + " neighbours, more than k");
                int at = nStart[w];
                if (at + n > ids.length) {
                    ids = Arrays.copyOf(ids, Math.max(at + n, ids.length * 2));
                    scores = Arrays.copyOf(scores, ids.length);
                }
                for (int i = 0; i < n; i++) {
                    int id = in.readInt();
                    if (id < 0 || id >= words || id == w || classes[id] != classes[w]) throw new IOException("bad neighbour id " + id + " of word " + w);
                    ids[at + i] = id;
                }
                for (int i = 0; i < n; i++) {
                    float s = in.readFloat();
                    if (!Float.isFinite(s) || (i > 0 && s > scores[at + i - 1])) throw new IOException("neighbour scores out of order in word " + w);
                    scores[at + i] = s;
                }
                nStart[w + 1] = at + n;
            }
            if (in.read() != -1) throw new IOException("payload has trailing bytes");
            return new Thesaurus(normalizer, settings, sentences, tokens, keys, classes, vectors, nStart,
                    Arrays.copyOf(ids, nStart[words]), Arrays.copyOf(scores, nStart[words]));
        } catch (ThesaurusFormatException e) {
            throw e;
        } catch (EOFException e) {
            throw new ThesaurusFormatException(name + " is damaged: its content ends early; copy or build it again", e);
        } catch (IOException | RuntimeException e) {
            throw new ThesaurusFormatException(name + " is damaged: its content cannot be read (" + e.getMessage()
                    + "); copy or build it again", e);
        } finally {
            inflater.end();
        }
    }

    private static ContextVectors readVectors(DataInputStream in, int words) throws IOException {
        int contexts = count(in.readInt(), "context count");
        int[] start = new int[words + 1];
        int[] context = new int[16];
        float[] weight = new float[16];
        for (int w = 0; w < words; w++) {
            int n = count(in.readInt(), "vector length");
            int at = start[w];
            if (at + n > context.length) {
                int size = Math.max(at + n, context.length * 2);
                context = Arrays.copyOf(context, size);
                weight = Arrays.copyOf(weight, size);
            }
            int previous = -1;
            for (int i = 0; i < n; i++) {
                int gap = in.readInt();
                if (gap <= 0 || (long) previous + gap >= contexts) throw new IOException("context ids out of order in word " + w);
                previous += gap;
                context[at + i] = previous;
            }
            for (int i = 0; i < n; i++) {
                float x = in.readFloat();
                if (!(x > 0) || !Float.isFinite(x)) throw new IOException("weight " + x + " in word " + w);
                weight[at + i] = x;
            }
            start[w + 1] = at + n;
        }
        return new ContextVectors(start, Arrays.copyOf(context, start[words]), Arrays.copyOf(weight, start[words]), contexts);
    }

    private static int count(int n, String what) throws IOException {
        if (n < 0) throw new IOException("negative " + what + " " + n);
        return n;
    }
}
