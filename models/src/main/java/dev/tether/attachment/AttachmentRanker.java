package dev.tether.attachment;

import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.ranking.CandidateFeatures;
import dev.tether.ranking.FeatureSpace;
import dev.tether.ranking.RankerModel;
import dev.tether.vocabulary.WordNormalizer;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Chooses the head of a prepositional phrase with a learned log-linear ranker over all its candidates: the
 * candidates' features ({@link AttachmentFeatureExtractor}) scored by trained weights, with a softmax over the
 * candidate set. The probability of a decision is the ranker's; the count evidence of each candidate is kept for
 * the ledger, and {@link #explain} names the features that weighed most for the chosen head against the runner-up.
 * Immutable and thread-safe (one reusable feature buffer per thread).
 */
public final class AttachmentRanker {
    /** Version of the stored ranker (its feature templates and layout); a model with another fails to load. */
    public static final int VERSION = 1;

    private final RankerModel weights;
    private final Set<AttachmentFeatureFamily> families;
    private final AttachmentFeatureExtractor extractor;
    private final ThreadLocal<CandidateFeatures> buffers = ThreadLocal.withInitial(CandidateFeatures::new);

    public AttachmentRanker(RankerModel weights, Set<AttachmentFeatureFamily> families, HeadChoiceCounts counts,
                            QuadrupleCounts quadruples, WordNormalizer normalizer) {
        this.weights = weights;
        this.families = EnumSet.copyOf(families);
        this.extractor = new AttachmentFeatureExtractor(counts, quadruples, counts, normalizer, families);
    }

    public RankerModel weights() { return weights; }
    public Set<AttachmentFeatureFamily> families() { return EnumSet.copyOf(families); }

    public HeadChoice choose(AttachmentQuery q) {
        if (q.size() == 0) throw new IllegalArgumentException("no candidate heads for '" + q.preposition() + "'");
        CandidateFeatures f = buffers.get();
        HeadChoice base = extractor.extract(q, f);
        double[] p = new double[q.size()];
        weights.probabilities(f, p);
        return base.withProbabilities(p);
    }

    /** One feature's pull towards the chosen head, against the runner-up. */
    public record Reason(String text, double weight) {
    }

    /**
     * The features that weighed most for the chosen head of {@code choice} against its runner-up: each feature's
     * weight times the difference of its values, largest first, at most {@code limit}, only those in favour.
     */
    public List<Reason> explain(AttachmentQuery q, HeadChoice choice, int limit) {
        List<Reason> reasons = new ArrayList<>();
        int best = choice.best();
        int second = choice.runnerUp();
        if (best < 0 || second < 0) return reasons;
        CandidateFeatures f = new CandidateFeatures();
        extractor.extract(q, f);
        int n = f.to(best) - f.from(best) + f.to(second) - f.from(second);
        long[] keys = new long[n];
        double[] pull = new double[n];
        int k = 0;
        for (int e = f.from(best); e < f.to(best); e++) {
            long key = f.key(e);
            if (indexOf(keys, k, key) >= 0) continue;
            keys[k] = key;
            pull[k++] = weights.weightOf(key) * (f.valueOf(best, key) - f.valueOf(second, key));
        }
        for (int e = f.from(second); e < f.to(second); e++) {
            long key = f.key(e);
            if (indexOf(keys, k, key) >= 0) continue;
            keys[k] = key;
            pull[k++] = weights.weightOf(key) * (f.valueOf(best, key) - f.valueOf(second, key));
        }
        boolean[] used = new boolean[k];
        for (int r = 0; r < limit; r++) {
            int top = -1;
            for (int j = 0; j < k; j++) if (!used[j] && pull[j] > 1e-9 && (top < 0 || pull[j] > pull[top])) top = j;
            if (top < 0) break;
            used[top] = true;
            boolean ofBest = f.valueOf(best, keys[top]) != 0;
            String text = AttachmentFeature.describe(keys[top], q, ofBest ? best : second);
            reasons.add(new Reason(ofBest ? text : "against the runner-up: " + text, pull[top]));
        }
        return reasons;
    }

    /** The reasons of {@link #explain} as one line for a reviewer. */
    public static String sentence(AttachmentQuery q, HeadChoice choice, List<Reason> reasons) {
        int best = choice.best();
        int second = choice.runnerUp();
        if (second < 0) return String.format(Locale.ROOT, "'%s' (%s) is the only candidate", q.head(best), q.headClass(best).label());
        StringBuilder s = new StringBuilder(String.format(Locale.ROOT, "'%s' (%s, p=%.2f) over '%s' (%s, p=%.2f)",
                q.head(best), q.headClass(best).label(), choice.probability(best),
                q.head(second), q.headClass(second).label(), choice.probability(second)));
        if (reasons.isEmpty()) return s.append(": no single feature stands out").toString();
        s.append(", mainly for ");
        for (int i = 0; i < reasons.size(); i++) {
            if (i > 0) s.append(i == reasons.size() - 1 ? " and " : "; ");
            s.append(reasons.get(i).text()).append(String.format(Locale.ROOT, " (+%.2f)", reasons.get(i).weight()));
        }
        return s.toString();
    }

    private static int indexOf(long[] keys, int n, long key) {
        for (int i = 0; i < n; i++) if (keys[i] == key) return i;
        return -1;
    }

    /** Writes the ranker's version, families and weights (a model file section). */
    public static void write(RankerModel weights, Set<AttachmentFeatureFamily> families, DataOutput out) throws IOException {
        out.writeInt(VERSION);
        out.writeInt(AttachmentFeatureFamily.mask(families));
        weights.write(out);
    }

    /** What {@link #write} wrote; the counts are the model's own. */
    public static AttachmentRanker read(DataInput in, HeadChoiceCounts counts, QuadrupleCounts quadruples,
                                        WordNormalizer normalizer) throws IOException {
        int version = in.readInt();
        if (version != VERSION) {
            throw new IOException("its attachment ranker has version " + version + "; this build reads version " + VERSION
                    + ". Retrain the model with this version ('tether train')");
        }
        int mask = in.readInt();
        RankerModel weights = RankerModel.read(in);
        for (int i = 0; i < weights.space().size(); i++) AttachmentFeature.of(weights.space().key(i));
        return new AttachmentRanker(weights, AttachmentFeatureFamily.fromMask(mask), counts, quadruples, normalizer);
    }

    @Override public boolean equals(Object o) {
        return o instanceof AttachmentRanker && weights.equals(((AttachmentRanker) o).weights)
                && families.equals(((AttachmentRanker) o).families);
    }
    @Override public int hashCode() { return weights.hashCode(); }

    /** Features known to the ranker, for inspection. */
    public int featureCount() {
        return weights.space().size();
    }

}
