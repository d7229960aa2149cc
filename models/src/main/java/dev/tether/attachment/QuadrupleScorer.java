package dev.tether.attachment;

/** Decides verb or noun attachment for quadruples given as word ids of the scorer's own model. */
public interface QuadrupleScorer {
    /** A short name for reports and JSON keys. */
    String name();

    /** Decides one quadruple of ids (0 for a word the model has not seen). */
    QuadrupleDecision decide(int verb, int noun1, int preposition, int noun2);
}
