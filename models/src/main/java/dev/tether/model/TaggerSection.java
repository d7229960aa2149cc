package dev.tether.model;

import java.io.ByteArrayInputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.util.Arrays;

/**
 * The part-of-speech tagger a model carries (section {@code tagger} of the model file), trained from the Penn
 * Treebank tags of a treebank. The statistics core does not read it: the bytes are opaque here, and the built-in
 * preprocessing of the annotators decodes them. Section layout: {@link #VERSION} (int), a one-line description of
 * how the tagger was trained (modified UTF-8), the length of the bytes (int), the bytes. Immutable.
 */
public final class TaggerSection {
    /** Layout of the bytes; a reader refuses any other version. Change it whenever the annotators' packing changes. */
    public static final int VERSION = 1;

    private final String description;
    private final byte[] bytes;
    private final String origin;

    /**
     * @param description how the tagger was trained, for {@code tether inspect} (algorithm, sentences, sources)
     * @param bytes       the tagger as its decoder expects it; copied
     * @param origin      where the section comes from (a model file, or the model being trained), for messages
     */
    public TaggerSection(String description, byte[] bytes, String origin) {
        if (bytes.length == 0) throw new IllegalArgumentException("a tagger section needs bytes");
        this.description = description;
        this.bytes = bytes.clone();
        this.origin = origin;
    }

    public String description() { return description; }
    /** A copy of the tagger's bytes. */
    public byte[] bytes() { return bytes.clone(); }
    public int size() { return bytes.length; }
    /** The model file this section was read from (or what a trained one calls itself), as messages name it. */
    public String origin() { return origin; }

    void write(DataOutputStream out) throws IOException {
        out.writeInt(VERSION);
        out.writeUTF(description);
        out.writeInt(bytes.length);
        out.write(bytes);
    }

    /** Reads the section's bytes; another version fails with a message naming {@code file}. */
    static TaggerSection read(byte[] section, String file) throws IOException {
        DataInputStream in = new DataInputStream(new ByteArrayInputStream(section));
        int version = in.readInt();
        if (version != VERSION) {
            throw new ModelFormatException(file + " carries a tagger section of version " + version
                    + "; this build reads version " + VERSION + ". Retrain the model with this version ('tether train'),"
                    + " or with --no-tagger to use the shipped tagger");
        }
        String description = in.readUTF();
        int length = in.readInt();
        if (length <= 0 || length != in.available()) {
            throw new IOException("tagger section claims " + length + " bytes, holds " + in.available());
        }
        return new TaggerSection(description, in.readNBytes(length), file);
    }

    /** Equal when the description and the bytes are; where the section came from does not count. */
    @Override public boolean equals(Object o) {
        return o instanceof TaggerSection t && description.equals(t.description) && Arrays.equals(bytes, t.bytes);
    }

    @Override public int hashCode() {
        return description.hashCode() * 31 + Arrays.hashCode(bytes);
    }

    @Override public String toString() {
        return "tagger (" + description + ", " + bytes.length + " bytes)";
    }
}
