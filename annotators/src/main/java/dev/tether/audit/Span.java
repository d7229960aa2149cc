package dev.tether.audit;

/** A stretch of a document as the ledger gives it: code-point offsets and the text they cover. */
public record Span(int begin, int end, String text) {
}
