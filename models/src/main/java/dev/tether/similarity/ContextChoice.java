package dev.tether.similarity;

import java.util.Locale;

/** Which contexts make up a word's vector. */
public enum ContextChoice {
    /** The words within {@value ContextCounter#WINDOW} tokens either side, in the same sentence (common practice). */
    WINDOW("window"),
    /** Verb–object, modifier–noun and noun–preposition–noun relations. */
    GRAMMATICAL("grammatical"),
    /** Both. */
    ALL("all");

    private final String label;

    ContextChoice(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    boolean window() {
        return this != GRAMMATICAL;
    }

    boolean grammatical() {
        return this != WINDOW;
    }

    public static ContextChoice of(String label) {
        for (ContextChoice c : values()) {
            if (c.label.equals(label.toLowerCase(Locale.ROOT))) return c;
        }
        throw new IllegalArgumentException("unknown context choice '" + label + "'; choose one of window, grammatical, all");
    }
}
