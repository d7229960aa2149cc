package dev.tether.audit;

import dev.tether.ledger.CodePointOffsets;

/** A document's text with its sentences, as the report draws it. Offsets count code points, as in the ledger. */
public record DocumentText(CodePointOffsets text, int[] sentenceBegins, int[] sentenceEnds) {
    public int sentences() {
        return sentenceBegins.length;
    }

    /** Index of the sentence that holds code point {@code offset}, or -1. */
    public int sentenceAt(int offset) {
        int lo = 0;
        int hi = sentenceBegins.length - 1;
        while (lo <= hi) {
            int mid = (lo + hi) >>> 1;
            if (sentenceBegins[mid] > offset) hi = mid - 1;
            else if (sentenceEnds[mid] <= offset) lo = mid + 1;
            else return mid;
        }
        return -1;
    }
}
