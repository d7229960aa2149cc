package dev.tether.ledger;

import java.util.Arrays;

/**
 * Converts UIMA's offsets (UTF-16 code units, Java's {@code String} index) into Unicode code points, the unit the
 * ledger uses: what Python strings, JSON tools and most readers index by. Built once per document; a lookup is a
 * binary search over the positions of the characters outside the Basic Multilingual Plane, and the identity when
 * there are none.
 */
final class CodePointOffsets {
    /** UTF-16 index of the low half of every surrogate pair, ascending. */
    private final int[] lowHalves;

    private CodePointOffsets(int[] lowHalves) {
        this.lowHalves = lowHalves;
    }

    static CodePointOffsets of(String text) {
        if (text == null) return new CodePointOffsets(new int[0]);
        int[] found = new int[16];
        int n = 0;
        for (int i = 1; i < text.length(); i++) {
            if (Character.isLowSurrogate(text.charAt(i)) && Character.isHighSurrogate(text.charAt(i - 1))) {
                if (n == found.length) found = Arrays.copyOf(found, n * 2);
                found[n++] = i;
            }
        }
        return new CodePointOffsets(Arrays.copyOf(found, n));
    }

    /** The code point index of the UTF-16 index {@code utf16}: minus one for every pair that ends before it. */
    int codePoint(int utf16) {
        if (lowHalves.length == 0) return utf16;
        int pos = Arrays.binarySearch(lowHalves, utf16);
        int pairsBefore = pos >= 0 ? pos : -pos - 1;
        return utf16 - pairsBefore;
    }
}
