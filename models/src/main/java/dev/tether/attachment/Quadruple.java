package dev.tether.attachment;

/** The four head words of the classic attachment question: verb, first noun, preposition, noun inside the phrase. */
public record Quadruple(String verb, String noun1, String preposition, String noun2) {
    @Override public String toString() {
        return verb + " " + noun1 + " " + preposition + " " + noun2;
    }
}
