package dev.tether.counts;

/**
 * The structural description of a candidate head, without words: its class, its rank among the candidates of the
 * same class (nearest = 0, capped at 3), a distance bucket, how many verb candidates lie nearer to the preposition
 * (capped at 2), whether it is the nearest candidate of all, and whether punctuation separates it from the
 * preposition. Distances are token counts from the head to the
 * preposition; a head after the phrase has its own bucket.
 */
public final class StructureKey {
    private StructureKey() {
    }

    /** Distance buckets: 1, 2, 3, 4-5, 6-8, 9-14, 15+, and heads that follow the phrase. */
    public static int distanceBucket(int distance) {
        if (distance <= 0) return 7;
        if (distance <= 3) return distance - 1;
        if (distance <= 5) return 3;
        if (distance <= 8) return 4;
        if (distance <= 14) return 5;
        return 6;
    }

    public static long of(int headClass, int rankInClass, int distance, int verbsNearer, boolean nearest, boolean punctuated) {
        return TupleKey.of(headClass + 1, Math.min(rankInClass, 3) * 16 + distanceBucket(distance),
                (Math.min(verbsNearer, 2) * 2 + (nearest ? 1 : 0)) * 2 + (punctuated ? 1 : 0) + 1);
    }
}
