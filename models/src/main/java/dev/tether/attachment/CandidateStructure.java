package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.StructureKey;

/** The structural keys of a query's candidates, computed the same way for training and for scoring. */
public final class CandidateStructure {
    private CandidateStructure() {
    }

    /** One {@link StructureKey} per candidate, in candidate order (nearest first). */
    public static long[] keys(AttachmentQuery q) {
        int n = q.size();
        long[] keys = new long[n];
        int[] seenOfClass = new int[HeadClass.values().length];
        int verbsNearer = 0;
        for (int i = 0; i < n; i++) {
            HeadClass c = q.headClass(i);
            keys[i] = StructureKey.of(c.ordinal(), seenOfClass[c.ordinal()]++, q.distance(i), verbsNearer, i == 0, q.punctuated(i));
            if (c == HeadClass.VERB && q.distance(i) > 0) verbsNearer++;
        }
        return keys;
    }
}
