package dev.tether.ledger;

/**
 * Converts between UIMA's UTF-16 offsets and the ledger's Unicode code-point offsets for one text. A text without
 * surrogate pairs (most text) needs no table: both offsets are the same.
 */
public final class CodePointOffsets {
    private final String text;
    /** Code-point offset of each UTF-16 offset, or null when the two agree. */
    private final int[] toCodePoint;
    /** UTF-16 offset of each code-point offset, or null when the two agree. */
    private final int[] toUtf16;

    private CodePointOffsets(String text) {
        this.text = text;
        int length = text.length();
        int codePoints = text.codePointCount(0, length);
        if (codePoints == length) {
            toCodePoint = null;
            toUtf16 = null;
            return;
        }
        toCodePoint = new int[length + 1];
        toUtf16 = new int[codePoints + 1];
        int cp = 0;
        for (int i = 0; i < length; i++) {
            toCodePoint[i] = cp;
            if (!(Character.isLowSurrogate(text.charAt(i)) && i > 0 && Character.isHighSurrogate(text.charAt(i - 1)))) {
                toUtf16[cp] = i;
                cp++;
            }
        }
        toCodePoint[length] = cp;
        toUtf16[cp] = length;
    }

    public static CodePointOffsets of(String text) {
        return new CodePointOffsets(text);
    }

    public String text() { return text; }

    /** Code points in the whole text. */
    public int length() {
        return toUtf16 == null ? text.length() : toUtf16.length - 1;
    }

    public int codePoint(int utf16Offset) {
        return toCodePoint == null ? utf16Offset : toCodePoint[utf16Offset];
    }

    public int utf16(int codePointOffset) {
        return toUtf16 == null ? codePointOffset : toUtf16[codePointOffset];
    }

    /** The text between two code-point offsets. */
    public String substring(int begin, int end) {
        return text.substring(utf16(begin), utf16(end));
    }
}
