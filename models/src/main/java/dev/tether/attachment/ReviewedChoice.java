package dev.tether.attachment;

import dev.tether.candidates.HeadClass;

import java.util.List;

/**
 * A decision a person reviewed: the preposition, its object, the head words that were offered with their classes,
 * and the offered head the reviewer chose ({@code -1}: none of them is right). {@code weight} is how many training
 * cases it counts as.
 */
public record ReviewedChoice(String preposition, String object, List<String> heads, List<HeadClass> classes,
                             int chosen, double weight) {
    public ReviewedChoice {
        heads = List.copyOf(heads);
        classes = List.copyOf(classes);
        if (heads.size() != classes.size()) {
            throw new IllegalArgumentException(heads.size() + " heads but " + classes.size() + " classes");
        }
        if (chosen < -1 || chosen >= heads.size()) {
            throw new IllegalArgumentException("choice " + chosen + " is not one of the " + heads.size() + " offered heads");
        }
        if (!(weight > 0) || Double.isInfinite(weight)) throw new IllegalArgumentException("weight must be positive, got " + weight);
    }
}
