package dev.tether.coordination;

/**
 * A reading of a coordination as written out: its pair of conjunct heads, which of the pair's modifiers are shared,
 * and the spans of the first and last conjunct that follow (token positions, inclusive): a shared word before the
 * first conjunct stays outside it ("worn [bearings] and [seals]"), an unshared prepositional phrase after a nominal
 * last conjunct belongs to it, a shared object after a verbal one does not.
 */
public record Bracketing(ConjunctPair pair, boolean[] shared, int leftBegin, int leftEnd, int rightBegin, int rightEnd) {

    public static Bracketing of(ConjunctPair p, boolean[] shared) {
        int leftBegin = p.leftBegin();
        int rightEnd = p.rightEnd();
        for (int m = 0; m < shared.length; m++) {
            ScopeCandidate s = p.modifiers()[m];
            if (s.kind().before()) {
                if (shared[m]) leftBegin = Math.max(leftBegin, Math.min(s.end() + 1, p.left()));
            } else if (s.kind() == ModifierKind.PREPOSITIONAL) {
                if (!shared[m]) rightEnd = Math.max(rightEnd, s.end());
            } else if (shared[m]) {
                rightEnd = Math.max(p.right(), Math.min(rightEnd, s.begin() - 1));
            }
        }
        return new Bracketing(p, shared.clone(), leftBegin, p.leftEnd(), p.rightBegin(), rightEnd);
    }

    /** The reading {@code r} of {@code choice} over the candidates {@code c}. */
    public static Bracketing of(CoordinatorCandidates c, CoordinationChoice choice, int r) {
        ConjunctPair p = c.pair(choice.pair(r));
        boolean[] shared = new boolean[p.modifiers().length];
        for (int m = 0; m < shared.length; m++) shared[m] = choice.isShared(r, m);
        return of(p, shared);
    }
}
