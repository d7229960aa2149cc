package dev.tether.treebank;

import dev.tether.coordination.ModifierKind;

/**
 * One coordination of a gold tree: the coordinator, the heads of the first and last conjunct, the heads of the
 * conjuncts between them, the spans of the first and last conjunct (token positions, inclusive), and the words around
 * it whose scope the tree settles: each with its kind and whether the enhanced graph shares it with the last
 * conjunct. All positions 0-based.
 */
public record GoldCoordination(int coordinator, int left, int right, int[] middle, int leftBegin, int leftEnd,
                               int rightBegin, int rightEnd, int[] modifiers, ModifierKind[] kinds, boolean[] shared) {
}
