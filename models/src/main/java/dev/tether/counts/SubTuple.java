package dev.tether.counts;

/**
 * The parts of a verb–noun–preposition–noun quadruple that the back-off counts, once the preposition is fixed
 * (counts are kept per preposition, so the preposition is never part of a key). Collins &amp; Brooks (1995) use the
 * whole quadruple, the three triples that contain the preposition, and the three pairs that contain it.
 */
public enum SubTuple {
    VERB_NOUN1_NOUN2(3), VERB_NOUN1(2), VERB_NOUN2(2), NOUN1_NOUN2(2), VERB(1), NOUN1(1), NOUN2(1);

    private final int arity;

    SubTuple(int arity) {
        this.arity = arity;
    }

    public int arity() {
        return arity;
    }

    /** The packed key of this part of the quadruple (v, n1, n2 are word ids). */
    public long key(int v, int n1, int n2) {
        switch (this) {
            case VERB_NOUN1_NOUN2: return TupleKey.of(v, n1, n2);
            case VERB_NOUN1: return TupleKey.of(v, n1);
            case VERB_NOUN2: return TupleKey.of(v, n2);
            case NOUN1_NOUN2: return TupleKey.of(n1, n2);
            case VERB: return TupleKey.of(v);
            case NOUN1: return TupleKey.of(n1);
            case NOUN2: return TupleKey.of(n2);
            default: throw new AssertionError(this);
        }
    }
}
