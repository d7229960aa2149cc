package dev.tether.attachment;

import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.ranking.CandidateFeatures;
import dev.tether.ranking.RankerModel;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.WordNormalizer;

import java.io.DataInput;
import java.io.DataOutput;
import java.io.IOException;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * Chooses the head of a prepositional phrase with a learned log-linear ranker over all its candidates: the
 * candidates' features ({@link AttachmentFeatureExtractor}) scored by trained weights, with a softmax over the
 * candidate set. The probability of a decision is the ranker's; the count evidence of each candidate is kept for
 * the ledger, and {@link #explain} names the features that weighed most for the chosen head against the runner-up
 * (with the thesaurus neighbours behind a similar-words feature). Immutable and thread-safe (one reusable feature
 * buffer per thread).
 */
public final class AttachmentRanker {
    /** Version of the stored ranker (its feature templates and layout); a model with another fails to load. */
    public static final int VERSION = 2;

    private final RankerModel weights;
    private final Set<AttachmentFeatureFamily> families;
    private final AttachmentFeatureExtractor extractor;
    private final HeadChoiceCounts counts;
    private final QuadrupleCounts quadruples;
    private final WordNormalizer normalizer;
    private final ThreadLocal<CandidateFeatures> buffers = ThreadLocal.withInitial(CandidateFeatures::new);

    public AttachmentRanker(RankerModel weights, Set<AttachmentFeatureFamily> families, HeadChoiceCounts counts,
                            QuadrupleCounts quadruples, WordNormalizer normalizer) {
        this(weights, families, counts, quadruples, normalizer, null);
    }

    /** {@code thesaurus} (may be null) feeds the similar-words features when that family is on. */
    public AttachmentRanker(RankerModel weights, Set<AttachmentFeatureFamily> families, HeadChoiceCounts counts,
                            QuadrupleCounts quadruples, WordNormalizer normalizer, Thesaurus thesaurus) {
        this.weights = weights;
        this.families = EnumSet.copyOf(families);
        this.counts = counts;
        this.quadruples = quadruples;
        this.normalizer = normalizer;
        this.extractor = new AttachmentFeatureExtractor(counts, quadruples, counts, normalizer, families, thesaurus);
    }

    /** The same ranker reading {@code thesaurus} for its similar-words features (the model's own thesaurus). */
    public AttachmentRanker withThesaurus(Thesaurus thesaurus) {
        if (thesaurus == extractor.thesaurus().orElse(null)) return this;
        return new AttachmentRanker(weights, families, counts, quadruples, normalizer, thesaurus);
    }

    public RankerModel weights() { return weights; }
    public Set<AttachmentFeatureFamily> families() { return EnumSet.copyOf(families); }

    public HeadChoice choose(AttachmentQuery q) {
        return choose(q, buffers.get());
    }

    /**
     * As {@link #choose(AttachmentQuery)}, extracting into the caller's buffer, which then holds the query's features
     * for {@link #explain(AttachmentQuery, HeadChoice, CandidateFeatures, int)} (one buffer per thread).
     */
    public HeadChoice choose(AttachmentQuery q, CandidateFeatures f) {
        if (q.size() == 0) throw new IllegalArgumentException("no candidate heads for '" + q.preposition() + "'");
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
        CandidateFeatures f = new CandidateFeatures();
        extractor.extract(q, f);
        return explain(q, choice, f, limit);
    }

    /** As {@link #explain(AttachmentQuery, HeadChoice, int)}, from the features {@link #choose} left in {@code f}. */
    public List<Reason> explain(AttachmentQuery q, HeadChoice choice, CandidateFeatures f, int limit) {
        List<Reason> reasons = new ArrayList<>();
        int best = choice.best();
        int second = choice.runnerUp();
        if (best < 0 || second < 0) return reasons;
        // Each feature's pull: its weight times (value for the best - value for the runner-up), over the union of the
        // two candidates' keys, by a merge of their entries sorted by key.
        SortedFeatures b = SortedFeatures.of(f, best);
        SortedFeatures o = SortedFeatures.of(f, second);
        long[] keys = new long[b.keys.length + o.keys.length];
        double[] pull = new double[keys.length];
        double[] ofBestValue = new double[keys.length];
        int k = 0;
        for (int i = 0, j = 0; i < b.keys.length || j < o.keys.length; ) {
            long key = j >= o.keys.length || (i < b.keys.length && b.keys[i] <= o.keys[j]) ? b.keys[i] : o.keys[j];
            double vb = i < b.keys.length && b.keys[i] == key ? b.values[i++] : 0;
            double vs = j < o.keys.length && o.keys[j] == key ? o.values[j++] : 0;
            keys[k] = key;
            ofBestValue[k] = vb;
            pull[k++] = weights.weightOf(key) * (vb - vs);
        }
        boolean[] used = new boolean[k];
        for (int r = 0; r < limit; r++) {
            int top = -1;
            for (int j = 0; j < k; j++) if (!used[j] && pull[j] > 1e-9 && (top < 0 || pull[j] > pull[top])) top = j;
            if (top < 0) break;
            used[top] = true;
            boolean ofBest = ofBestValue[top] != 0;
            String text = AttachmentFeature.describe(keys[top], q, ofBest ? best : second);
            List<String> neighbours = extractor.neighboursBehind(keys[top], q, ofBest ? best : second, 3);
            if (!neighbours.isEmpty()) text += ", neighbours " + String.join(", ", neighbours);
            reasons.add(new Reason(ofBest ? text : "against the runner-up: " + text, pull[top]));
        }
        return reasons;
    }

    /** The reasons of {@link #explain} as one line for a reviewer. */
    public static String sentence(AttachmentQuery q, HeadChoice choice, List<Reason> reasons) {
        int best = choice.best();
        int second = choice.runnerUp();
        if (second < 0) return "'" + q.head(best) + "' (" + q.headClass(best).label() + ") is the only candidate";
        StringBuilder s = new StringBuilder(160);
        s.append('\'').append(q.head(best)).append("' (").append(q.headClass(best).label()).append(", p=");
        twoDecimals(choice.probability(best), s).append(") over '").append(q.head(second)).append("' (")
                .append(q.headClass(second).label()).append(", p=");
        twoDecimals(choice.probability(second), s).append(')');
        if (reasons.isEmpty()) return s.append(": no single feature stands out").toString();
        s.append(", mainly for ");
        for (int i = 0; i < reasons.size(); i++) {
            if (i > 0) s.append(i == reasons.size() - 1 ? " and " : "; ");
            twoDecimals(reasons.get(i).weight(), s.append(reasons.get(i).text()).append(" (+")).append(')');
        }
        return s.toString();
    }

    /**
     * Appends {@code v} rounded to two decimals ("0.82", "-1.05"); the evidence of every decision is built with it, so
     * it avoids the cost of a format string.
     */
    public static StringBuilder twoDecimals(double v, StringBuilder s) {
        long hundredths = Math.round(Math.abs(v) * 100);
        if (v < 0 && hundredths > 0) s.append('-');
        s.append(hundredths / 100).append('.');
        long rest = hundredths % 100;
        if (rest < 10) s.append('0');
        return s.append(rest);
    }

    /**
     * One candidate's features as distinct keys in ascending order with their values, a key's entries added in the
     * order they were extracted (as {@link CandidateFeatures#valueOf} adds them), in O(n log n).
     */
    private record SortedFeatures(long[] keys, double[] values) {
        static SortedFeatures of(CandidateFeatures f, int candidate) {
            int from = f.from(candidate), to = f.to(candidate);
            long[] all = new long[to - from];
            for (int e = from; e < to; e++) all[e - from] = f.key(e);
            java.util.Arrays.sort(all);
            int distinct = 0;
            for (int i = 0; i < all.length; i++) if (i == 0 || all[i] != all[i - 1]) all[distinct++] = all[i];
            long[] keys = java.util.Arrays.copyOf(all, distinct);
            double[] values = new double[distinct];
            for (int e = from; e < to; e++) values[java.util.Arrays.binarySearch(keys, f.key(e))] += f.value(e);
            return new SortedFeatures(keys, values);
        }
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
