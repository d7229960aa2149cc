package dev.tether.coordination;

/**
 * A word next to a coordination that may be shared by its conjuncts: {@code token} is the head word of the modifier
 * (the adjective or noun of a premodifier, the head of a subject or object, the object of a preposition), and
 * {@code [begin, end]} the tokens of the modifier phrase. {@code preposition} is the preposition of a prepositional
 * modifier, -1 otherwise.
 */
public record ScopeCandidate(int token, ModifierKind kind, int begin, int end, int preposition) {
}
