package dev.tether.ledger;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** UTF-16 and code-point offsets (Unicode Standard, ch. 3: a supplementary character is one code point, two UTF-16 units). */
class CodePointOffsetsTest {
    @Test
    void aSupplementaryCharacterShiftsLaterOffsetsByOne() {
        String text = "Seal \uD83D\uDEE0 on pump";   // U+1F6E0, hammer and wrench
        CodePointOffsets o = CodePointOffsets.of(text);
        assertEquals(14, o.length(), "5 + 1 + 8 code points");
        int pump = text.indexOf("pump");
        assertEquals(pump - 1, o.codePoint(pump));
        assertEquals(pump, o.utf16(pump - 1));
        assertEquals("pump", o.substring(o.codePoint(pump), o.codePoint(pump + 4)));
        assertEquals(5, o.codePoint(5));
        assertEquals(6, o.codePoint(7), "after the pair");
    }

    @Test
    void plainTextNeedsNoConversion() {
        CodePointOffsets o = CodePointOffsets.of("Greased the hinges.");
        assertEquals(7, o.codePoint(7));
        assertEquals(19, o.length());
    }
}
