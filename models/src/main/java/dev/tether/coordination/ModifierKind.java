package dev.tether.coordination;

import java.util.Locale;

/**
 * The kinds of word next to a coordination whose scope is in question: does it belong to the nearer conjunct only,
 * or is it shared by both? Before the first conjunct: a premodifier of a nominal conjunct ("worn bearings and seals")
 * or the subject of a verbal or predicative one ("the crew inspected the pump and replaced the seals"). After the
 * last conjunct: the object of a prepositional phrase ("the covers and seals of the pump") or the object of a
 * verbal one ("inspected and replaced the seals").
 */
public enum ModifierKind {
    PREMODIFIER(true), SUBJECT(true), PREPOSITIONAL(false), OBJECT(false);

    private final boolean before;

    ModifierKind(boolean before) {
        this.before = before;
    }

    /** Whether the word stands before the first conjunct (else after the last). */
    public boolean before() { return before; }

    public String label() { return name().toLowerCase(Locale.ROOT); }
}
