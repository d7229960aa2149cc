package dev.tether.preprocessing;

import java.util.ArrayList;
import java.util.List;

import opennlp.tools.util.Span;

/**
 * Widens spans so that none begins or ends between the two UTF-16 halves of a character outside the Basic
 * Multilingual Plane (an emoji, a mathematical letter). OpenNLP's models see UTF-16 units and may cut such a
 * character in two; a token holding half a character cannot be written as XML or JSON. Spans that then overlap are
 * merged, so the result is still sorted and disjoint.
 */
final class CodePointSpans {
    private CodePointSpans() {
    }

    /** {@code spans} (sorted, disjoint, offsets into {@code text}) aligned to code point boundaries. */
    static Span[] align(Span[] spans, CharSequence text) {
        if (!hasSupplementary(text)) return spans;
        List<Span> out = new ArrayList<>(spans.length);
        for (Span s : spans) {
            int start = s.getStart();
            int end = s.getEnd();
            if (start > 0 && start < text.length() && Character.isLowSurrogate(text.charAt(start))
                    && Character.isHighSurrogate(text.charAt(start - 1))) start--;
            if (end > 0 && end < text.length() && Character.isHighSurrogate(text.charAt(end - 1))
                    && Character.isLowSurrogate(text.charAt(end))) end++;
            if (!out.isEmpty() && start < out.get(out.size() - 1).getEnd()) {
                Span previous = out.remove(out.size() - 1);
                out.add(new Span(previous.getStart(), Math.max(end, previous.getEnd()), previous.getType()));
            } else {
                out.add(new Span(start, end, s.getType()));
            }
        }
        return out.toArray(new Span[0]);
    }

    private static boolean hasSupplementary(CharSequence text) {
        for (int i = 0; i < text.length(); i++) {
            if (Character.isSurrogate(text.charAt(i))) return true;
        }
        return false;
    }
}
