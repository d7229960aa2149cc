package dev.tether.model;

/**
 * One input a model was counted from: its file name (no folder, so models built on different machines are
 * byte-identical), its kind ({@code quadruples}, {@code treebank}, {@code raw}, ...), how many training items it
 * gave, how many malformed lines (or, for raw text, unusable documents) were skipped, the SHA-256 of its bytes, and
 * how much one of its events counts in the model ({@code weight}; 1 unless chosen otherwise on development data).
 */
public record ModelSource(String name, String kind, long items, long skipped, String sha256, double weight) {
    public ModelSource(String name, String kind, long items, long skipped, String sha256) {
        this(name, kind, items, skipped, sha256, 1.0);
    }
}
