package dev.tether.io;

import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/** SHA-256 digests, for source fingerprints in models and for model checksums. */
public final class Sha256 {
    private Sha256() {
    }

    public static MessageDigest newDigest() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java platform", e);
        }
    }

    public static String hex(byte[] bytes) {
        return HexFormat.of().formatHex(newDigest().digest(bytes));
    }
}
