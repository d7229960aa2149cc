package dev.tether.model;

/**
 * One input a model was counted from: its file name (no folder, so models built on different machines are
 * byte-identical), its kind ({@code quadruples}, {@code treebank}, ...), how many training items it gave, how many
 * malformed lines were skipped, and the SHA-256 of its bytes.
 */
public record ModelSource(String name, String kind, long items, long skipped, String sha256) {
}
