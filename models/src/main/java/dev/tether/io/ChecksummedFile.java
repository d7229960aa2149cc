package dev.tether.io;

import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.function.Function;

/**
 * The frame shared by Tether's binary files (models, thesauri):
 * <pre>
 *   magic                     identifies the kind of file ("TETHER-MODEL\n", ...)
 *   format version            int
 *   payload length            long
 *   payload                   bytes
 *   SHA-256                   32 bytes over everything before it
 * </pre>
 * {@link #open} checks the frame and names the file and what to do in every error.
 */
public final class ChecksummedFile {
    public static final int DIGEST_BYTES = 32;

    /**
     * How a kind of file is named in messages.
     *
     * @param magic         the bytes that open the file
     * @param noun          "model", "thesaurus"
     * @param writtenBy     what to give instead: "a model written by 'tether train'"
     * @param again         how to get a good copy: "copy or train it again"
     * @param versionAdvice what to do with another version: "Retrain the model with this version ('tether train')."
     */
    public record Kind(String magic, String noun, String writtenBy, String again, String versionAdvice) {
        byte[] magicBytes() {
            return magic.getBytes(StandardCharsets.US_ASCII);
        }
    }

    /** Where the verified payload lies in the file's bytes, the file's digest, and its format version. */
    public record Payload(int offset, int length, byte[] digest, int version) {
    }

    private ChecksummedFile() {
    }

    /** The whole file: frame around {@code payload}. */
    public static byte[] frame(Kind kind, int version, ByteArrayOutputStream payload) {
        ByteArrayOutputStream file = new ByteArrayOutputStream(payload.size() + 64);
        try {
            DataOutputStream out = new DataOutputStream(file);
            out.write(kind.magicBytes());
            out.writeInt(version);
            out.writeLong(payload.size());
            payload.writeTo(out);
            out.flush();
        } catch (IOException e) {
            throw new UncheckedIOException("writing to memory cannot fail", e);
        }
        byte[] body = file.toByteArray();
        byte[] all = Arrays.copyOf(body, body.length + DIGEST_BYTES);
        System.arraycopy(Sha256.newDigest().digest(body), 0, all, body.length, DIGEST_BYTES);
        return all;
    }

    /**
     * Checks the frame of {@code bytes}, read from the file called {@code name}: magic, version, length and
     * checksum; each failure becomes {@code error.apply(message)}.
     */
    public static <E extends IOException> Payload open(byte[] bytes, Kind kind, int version, String name,
                                                       Function<String, E> error) throws E {
        return open(bytes, kind, version, version, name, error);
    }

    /** As {@link #open(byte[], Kind, int, String, Function)}, for a reader of every format version from {@code oldest} to {@code newest}. */
    public static <E extends IOException> Payload open(byte[] bytes, Kind kind, int oldest, int newest, String name,
                                                       Function<String, E> error) throws E {
        byte[] magic = kind.magicBytes();
        int header = magic.length + 4 + 8;
        if (bytes.length < magic.length || !Arrays.equals(Arrays.copyOf(bytes, magic.length), magic)) {
            throw error.apply(name + " is not a Tether " + kind.noun() + " file (it lacks the " + kind.noun()
                    + " header); give the path of " + kind.writtenBy());
        }
        if (bytes.length < header + DIGEST_BYTES) {
            throw error.apply(name + " is truncated (" + bytes.length + " bytes); " + kind.again());
        }
        ByteBuffer head = ByteBuffer.wrap(bytes, magic.length, 12);
        int found = head.getInt();
        long payloadLength = head.getLong();
        if (found < oldest || found > newest) {
            throw error.apply(name + " has " + kind.noun() + " format version " + found + "; this build of Tether reads version "
                    + (oldest == newest ? String.valueOf(newest) : oldest + " to " + newest) + ". " + kind.versionAdvice());
        }
        if (payloadLength < 0 || header + payloadLength + DIGEST_BYTES != bytes.length) {
            throw error.apply(name + " is truncated or has trailing bytes (expected "
                    + (header + payloadLength + DIGEST_BYTES) + " bytes, found " + bytes.length + "); " + kind.again());
        }
        int bodyLength = bytes.length - DIGEST_BYTES;
        var digest = Sha256.newDigest();
        digest.update(bytes, 0, bodyLength);
        byte[] actual = digest.digest();
        if (!Arrays.equals(actual, Arrays.copyOfRange(bytes, bodyLength, bytes.length))) {
            throw error.apply(name + " is damaged: its checksum does not match its content; " + kind.again());
        }
        return new Payload(header, (int) payloadLength, actual, found);
    }
}
