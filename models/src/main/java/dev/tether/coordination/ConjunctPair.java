package dev.tether.coordination;

import dev.tether.candidates.HeadClass;

/**
 * One bracketing of a coordination: the heads of the first and of the last conjunct, their classes, the heads of
 * the conjuncts in between (a comma list, "pumps, valves and seals"), the spans of the first and last conjunct
 * ({@code [leftBegin, leftEnd]} and {@code [rightBegin, rightEnd]}, token positions, inclusive), and the words around
 * it whose scope is to be decided. Immutable.
 */
public record ConjunctPair(int left, HeadClass leftClass, int right, HeadClass rightClass, int[] middle,
                           int leftBegin, int leftEnd, int rightBegin, int rightEnd, ScopeCandidate[] modifiers) {
}
