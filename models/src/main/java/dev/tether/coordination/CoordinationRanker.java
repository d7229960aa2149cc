package dev.tether.coordination;


import dev.tether.ranking.CandidateFeatures;
import dev.tether.ranking.RankerModel;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.WordNormalizer;
import gnu.trove.map.hash.TLongDoubleHashMap;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * Ranks the bracketings of a coordination with two learned conditional log-linear models of the generic ranker
 * ({@link dev.tether.ranking}): one over the candidate pairs of conjunct heads, one over "shared" against "not
 * shared" for each modifier around the chosen pair. Features come from {@link CoordinationFeatureExtractor} over the
 * model's coordination counts and, when one is given, a thesaurus ({@link #withThesaurus}; without one the
 * similarity features are absent, and a ranker trained without one never weighs them; a thesaurus of neighbour lists
 * only counts as none). Immutable and thread-safe
 * (two reusable feature buffers per thread: pair features, which {@link #choose} keeps until it has weighed the best
 * reading against the runner-up for the evidence, and scope features).
 */
public final class CoordinationRanker {
    /**
     * Version of the stored ranker (templates and layout); a model with a version this build does not read writes no
     * coordination decisions. 2 added templates after those of 1 (clause roles, conjunct shape, tags before the heads),
     * so a build that reads 2 reads 1 too, and a build that reads only 1 leaves a version-2 ranker out.
     */
    public static final int VERSION = 2;
    /** The oldest stored version this build reads. */
    public static final int OLDEST_READABLE = 1;

    /** Whether this build reads a stored ranker of {@code version}. */
    public static boolean reads(int version) {
        return version >= OLDEST_READABLE && version <= VERSION;
    }

    private final RankerModel pairWeights;
    private final RankerModel scopeWeights;
    private final Set<CoordinationFeatureFamily> families;
    private final CoordinationCounts counts;
    private final Thesaurus thesaurus;
    private final CoordinationFeatureExtractor extractor;
    /** Feature pulls kept with each choice for its evidence, strongest first ({@link #explain} asks for three). */
    static final int EXPLAINED = 6;

    private final ThreadLocal<CandidateFeatures> buffers = ThreadLocal.withInitial(CandidateFeatures::new);
    private final ThreadLocal<CandidateFeatures> scopeBuffers = ThreadLocal.withInitial(CandidateFeatures::new);

    public CoordinationRanker(RankerModel pairWeights, RankerModel scopeWeights, Set<CoordinationFeatureFamily> families,
                              CoordinationCounts counts, Thesaurus thesaurus) {
        this.pairWeights = pairWeights;
        this.scopeWeights = scopeWeights;
        this.families = EnumSet.copyOf(families);
        this.counts = counts;
        this.thesaurus = CoordinationFeatureExtractor.withVectors(thesaurus);
        this.extractor = new CoordinationFeatureExtractor(counts, thesaurus, new WordNormalizer(), families);
    }

    /** The same weights with features read from {@code t} (null: none). */
    public CoordinationRanker withThesaurus(Thesaurus t) {
        return new CoordinationRanker(pairWeights, scopeWeights, families, counts, t);
    }

    public RankerModel pairWeights() { return pairWeights; }
    public RankerModel scopeWeights() { return scopeWeights; }
    public CoordinationCounts counts() { return counts; }
    public Set<CoordinationFeatureFamily> families() { return EnumSet.copyOf(families); }
    public boolean hasThesaurus() { return thesaurus != null; }

    /**
     * Ranks the pairs of {@code q} and decides the scope of the modifiers of the best {@code k}; the choice keeps the
     * features that weigh most for its best reading against the runner-up ({@link #explain}).
     */
    public CoordinationChoice choose(CoordinationQuery q, int k) {
        CoordinatorCandidates cc = q.candidates();
        if (cc.size() == 0) throw new IllegalArgumentException("no candidate conjuncts for the coordinator at token " + cc.coordinator());
        CandidateFeatures f = buffers.get();
        CandidateFeatures scope = scopeBuffers.get();
        extractor.extractPairs(q, f);
        double[] p = new double[cc.size()];
        pairWeights.probabilities(f, p);
        int[] order = order(p);
        int readings = Math.min(Math.max(1, k), order.length);
        double[][] shared = new double[readings][];
        double[] two = new double[2];
        for (int r = 0; r < readings; r++) {
            ConjunctPair pair = cc.pair(order[r]);
            shared[r] = new double[pair.modifiers().length];
            for (int m = 0; m < shared[r].length; m++) {
                extractor.extractScope(q, pair, pair.modifiers()[m], scope);
                scopeWeights.probabilities(scope, two);
                shared[r][m] = two[1];
            }
        }
        CoordinationChoice choice = new CoordinationChoice(p, order, shared);
        if (choice.readings() < 2) return choice;
        return choice.withPulls(pulls(f, choice.pair(0), choice.pair(1), EXPLAINED));
    }

    /** Candidate indexes by descending probability; ties keep candidate order (nearest first). */
    static int[] order(double[] p) {
        Integer[] o = new Integer[p.length];
        for (int i = 0; i < o.length; i++) o[i] = i;
        java.util.Arrays.sort(o, (a, b) -> p[a] != p[b] ? Double.compare(p[b], p[a]) : Integer.compare(a, b));
        int[] out = new int[o.length];
        for (int i = 0; i < o.length; i++) out[i] = o[i];
        return out;
    }

    /** One feature's pull towards the chosen pair against the runner-up. */
    public record Reason(String text, double weight) {
    }

    /** The features that weighed most for the best pair of {@code choice} against its runner-up, at most {@code limit}. */
    public List<Reason> explain(CoordinationQuery q, CoordinationChoice choice, int limit) {
        if (choice.readings() < 2) return new ArrayList<>();
        Pulls kept = choice.pulls();
        if (kept != null && (limit <= kept.keys.length || kept.complete)) return kept.reasons(limit);
        return contrast(q, choice.pair(0), choice.pair(1), limit);
    }

    /** The features that weigh most for candidate pair {@code best} of {@code q} against pair {@code second}, at most {@code limit}. */
    List<Reason> contrast(CoordinationQuery q, int best, int second, int limit) {
        CandidateFeatures f = new CandidateFeatures();
        extractor.extractPairs(q, f);
        return pulls(f, best, second, limit).reasons(limit);
    }

    /**
     * The strongest positive pulls towards candidate {@code best} against {@code second}, at most {@code limit}: each
     * feature's weight times its value for the best pair, less the same for the other. Ties go to the lower key, so the
     * evidence reads the same on every run.
     */
    Pulls pulls(CandidateFeatures f, int best, int second, int limit) {
        TLongDoubleHashMap pull = new TLongDoubleHashMap(2 * (f.to(best) - f.from(best) + f.to(second) - f.from(second)) + 1);
        for (int e = f.from(best); e < f.to(best); e++) {
            double v = pairWeights.weightOf(f.key(e)) * f.value(e);
            pull.adjustOrPutValue(f.key(e), v, v);
        }
        for (int e = f.from(second); e < f.to(second); e++) {
            double v = -pairWeights.weightOf(f.key(e)) * f.value(e);
            pull.adjustOrPutValue(f.key(e), v, v);
        }
        long[] keys = pull.keys();
        double[] values = new double[keys.length];
        for (int i = 0; i < keys.length; i++) values[i] = pull.get(keys[i]);
        long[] topKeys = new long[Math.min(limit, keys.length)];
        double[] topValues = new double[topKeys.length];
        boolean[] taken = new boolean[keys.length];
        int found = 0;
        while (found < topKeys.length) {
            int top = -1;
            for (int i = 0; i < keys.length; i++) {
                if (taken[i] || values[i] <= 1e-9) continue;
                if (top < 0 || values[i] > values[top] || values[i] == values[top] && keys[i] < keys[top]) top = i;
            }
            if (top < 0) break;
            taken[top] = true;
            topKeys[found] = keys[top];
            topValues[found++] = values[top];
        }
        boolean complete = found < topKeys.length || found == keys.length;
        return new Pulls(java.util.Arrays.copyOf(topKeys, found), java.util.Arrays.copyOf(topValues, found), complete);
    }

    /** Features with their pulls, strongest first; {@code complete} when no other feature pulls that way. */
    record Pulls(long[] keys, double[] values, boolean complete) {
        List<Reason> reasons(int limit) {
            List<Reason> reasons = new ArrayList<>(Math.min(limit, keys.length));
            for (int i = 0; i < keys.length && i < limit; i++) {
                reasons.add(new Reason(CoordinationFeature.of(keys[i]).describe(keys[i]), values[i]));
            }
            return reasons;
        }
    }

    public static void write(CoordinationRanker r, DataOutput out) throws IOException {
        out.writeInt(VERSION);
        out.writeInt(CoordinationFeatureFamily.mask(r.families));
        r.counts.write(out);
        r.pairWeights.write(out);
        r.scopeWeights.write(out);
    }

    /** What {@link #write} wrote; the version is checked by the caller ({@link #readVersion}). */
    public static CoordinationRanker read(DataInput in) throws IOException {
        int version = in.readInt();
        if (!reads(version)) {
            throw new IOException("coordination ranker version " + version + ", this build reads " + OLDEST_READABLE + " to " + VERSION);
        }
        Set<CoordinationFeatureFamily> families = CoordinationFeatureFamily.fromMask(in.readInt());
        CoordinationCounts counts = CoordinationCounts.read(in);
        RankerModel pairs = RankerModel.read(in);
        RankerModel scope = RankerModel.read(in);
        for (int i = 0; i < pairs.space().size(); i++) CoordinationFeature.of(pairs.space().key(i));
        for (int i = 0; i < scope.space().size(); i++) CoordinationFeature.of(scope.space().key(i));
        return new CoordinationRanker(pairs, scope, families, counts, null);
    }

    public static int readVersion(byte[] section) {
        if (section.length < 4) return -1;
        return ((section[0] & 0xff) << 24) | ((section[1] & 0xff) << 16) | ((section[2] & 0xff) << 8) | (section[3] & 0xff);
    }

    @Override public boolean equals(Object o) {
        if (!(o instanceof CoordinationRanker)) return false;
        CoordinationRanker r = (CoordinationRanker) o;
        return pairWeights.equals(r.pairWeights) && scopeWeights.equals(r.scopeWeights) && families.equals(r.families)
                && counts.equals(r.counts);
    }
    @Override public int hashCode() { return pairWeights.hashCode() * 31 + scopeWeights.hashCode(); }
}
