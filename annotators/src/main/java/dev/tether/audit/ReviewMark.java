package dev.tether.audit;

/**
 * A reviewer's verdict on one decision, from a review sheet: the sheet's line, the head the reviewer chose (null
 * when none of the offered heads was right) and its offset, and whether the decision now in the ledger agrees.
 */
public record ReviewMark(int sheetLine, String chosenHead, int chosenBegin, boolean agrees) {
}
