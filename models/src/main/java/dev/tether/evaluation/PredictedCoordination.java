package dev.tether.evaluation;

/**
 * A coordination decision as the evaluation compares it with gold: heads and spans of the first and last conjunct,
 * and the modifiers decided with their scope, all as token positions of the gold sentence (-1 where a predicted token
 * matches no gold word).
 */
public record PredictedCoordination(int left, int right, int leftBegin, int leftEnd, int rightBegin, int rightEnd,
                                    int[] modifiers, boolean[] shared) {
}
