package dev.tether.model;

import dev.tether.attachment.AmbiguousReestimation;
import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.RawAttachmentCounts;
import dev.tether.counts.TupleCounts;
import dev.tether.counts.WordFrequencies;
import dev.tether.vocabulary.Vocabulary;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * What text of a team's own domain changed in a model: computed by {@link ModelTrainer#build} when raw text is among
 * the sources, stored in the model's {@code domain-report} section, and shown by {@code tether inspect} and at the end
 * of {@code tether train}.
 * <ul>
 *   <li>{@link #sources()}: per raw source, what was counted: documents, tokens, prepositions with candidates, the
 *       unambiguous ones and the attachment events they gave (to a verb, to a noun), the co-occurrence trials (one per
 *       candidate head of every preposition), and the ambiguous configurations that re-estimation split, with the
 *       share it gave the noun.</li>
 *   <li>{@link #overlap()}: with a base model ({@code --base}), how much of the raw text's noun and verb vocabulary
 *       the base already counted (its quadruple and head-choice vocabularies, by normalized form), the share of the
 *       raw noun and verb tokens those words cover, and the most frequent words that are new.</li>
 *   <li>{@link #shifts()}: with a base model, the prepositions whose majority attachment (noun or verb, over all
 *       quadruple counts of the preposition) differs between the base and the merged model, with both pairs of
 *       counts.</li>
 * </ul>
 * The section carries {@link #VERSION}; a model without the section, or with another version of it, loads and has
 * no report ({@code TetherModel.domainReport()} is empty). Immutable; deterministic (new words are ordered by count,
 * then by word; prepositions by their sorted form).
 */
public record DomainReport(List<RawSource> sources, String base, Overlap overlap, int prepositionsCompared,
                           List<PrepositionShift> shifts) {
    /** Layout version of the section; change it whenever the layout below changes. */
    public static final int VERSION = 1;
    /** How many new words the report keeps. */
    public static final int NEW_WORDS = 10;

    /** What one raw source gave. */
    public record RawSource(String name, long documents, long skippedDocuments, long tokens, long prepositions,
                            long unambiguous, double verbEvents, double nounEvents, double cooccurrenceTrials,
                            long ambiguousConfigurations, int rounds, double reestimatedNoun, double weight) {
    }

    /** The raw text's noun and verb vocabulary against the base model's. */
    public record Overlap(int baseVocabulary, int rawWords, int rawWordsInBase, long rawTokens, long rawTokensCovered,
                          List<NewWord> newWords) {
        public Overlap {
            newWords = List.copyOf(newWords);
        }

        public double wordShare() {
            return rawWords == 0 ? 0 : (double) rawWordsInBase / rawWords;
        }

        public double tokenShare() {
            return rawTokens == 0 ? 0 : (double) rawTokensCovered / rawTokens;
        }
    }

    /** A raw word the base model never counted, with its occurrences in the raw text. */
    public record NewWord(String word, long count) {
    }

    /** A preposition's noun and verb attachment counts in the base and in the merged model. */
    public record PrepositionShift(String preposition, double baseNoun, double baseVerb, double mergedNoun,
                                   double mergedVerb) {
    }

    public DomainReport {
        sources = List.copyOf(sources);
        shifts = shifts == null ? List.of() : List.copyOf(shifts);
    }

    /** Whether the report compares with a base model (then {@link #overlap()} is set). */
    public boolean hasBase() {
        return overlap != null;
    }

    /** Which side a preposition's counts favour: 1 noun, -1 verb, 0 even. */
    static int majority(double noun, double verb) {
        return Double.compare(noun, verb);
    }

    /**
     * The report of a model built from {@code merged} counts, with the raw sources as added and the base models (none:
     * no overlap and no shifts); {@code baseName} names the base models in the report.
     */
    static DomainReport of(List<RawSource> sources, List<RawAttachmentCounts> raw, List<TetherModel> bases, String baseName,
                           QuadrupleCounts merged) {
        if (bases.isEmpty()) return new DomainReport(sources, null, null, 0, List.of());
        // The base's vocabulary: every word its quadruple or head-choice counts hold.
        Vocabulary baseWords = new Vocabulary();
        for (TetherModel b : bases) {
            for (String w : b.quadruples().words().words()) baseWords.add(w);
            for (String w : b.headChoice().words().words()) baseWords.add(w);
        }
        WordFrequencies.Builder rawWords = new WordFrequencies.Builder();
        for (RawAttachmentCounts r : raw) rawWords.addAll(r.words());
        WordFrequencies words = rawWords.build();
        int inBase = 0;
        long covered = 0;
        List<NewWord> unseen = new ArrayList<>();
        for (int i = 0; i < words.size(); i++) {
            if (baseWords.id(words.word(i)) != Vocabulary.UNKNOWN) {
                inBase++;
                covered += words.count(i);
            } else {
                unseen.add(new NewWord(words.word(i), words.count(i)));
            }
        }
        unseen.sort(Comparator.comparingLong(NewWord::count).reversed().thenComparing(NewWord::word));
        Overlap overlap = new Overlap(baseWords.size(), words.size(), inBase, words.total(), covered,
                List.copyOf(unseen.subList(0, Math.min(NEW_WORDS, unseen.size()))));

        // Per preposition: the base's noun and verb counts (summed over base models) against the merged model's.
        java.util.TreeMap<String, double[]> before = new java.util.TreeMap<>();
        for (TetherModel b : bases) {
            QuadrupleCounts q = b.quadruples();
            for (int p = 1; p <= q.prepositions().size(); p++) {
                double[] c = before.computeIfAbsent(q.prepositions().word(p), k -> new double[2]);
                c[0] += q.prepositionNounCount(p);
                c[1] += q.prepositionCount(p) - q.prepositionNounCount(p);
            }
        }
        List<PrepositionShift> shifts = new ArrayList<>();
        int compared = 0;
        for (var e : before.entrySet()) {
            double[] b = e.getValue();
            if (b[0] + b[1] <= 0) continue;
            int p = merged.prepositions().id(e.getKey());
            if (p == Vocabulary.UNKNOWN) continue;
            compared++;
            double noun = merged.prepositionNounCount(p);
            double verb = merged.prepositionCount(p) - noun;
            if (majority(b[0], b[1]) != majority(noun, verb)) {
                shifts.add(new PrepositionShift(e.getKey(), b[0], b[1], noun, verb));
            }
        }
        return new DomainReport(sources, baseName, overlap, compared, shifts);
    }

    /** What one raw source gave, from its counts, the estimate the model added, its weight and rounds. */
    static RawSource source(String name, RawAttachmentCounts raw, AmbiguousReestimation.Estimate estimate, double weight,
                            int rounds) {
        RawAttachmentCounts.Tally t = raw.tally();
        QuadrupleCounts events = raw.events();
        double trials = 0;
        HeadChoiceCounts c = raw.cooccurrence();
        for (int p = 1; p <= c.prepositions().size(); p++) {
            TupleCounts perClass = c.lexical(p, HeadChoiceCounts.Part.CLASS);
            for (int i = 0; i < perClass.size(); i++) trials += perClass.trialsAt(i);
        }
        double reestimatedNoun = rounds > 0 ? estimate.quadruples().nounAttachments() - events.nounAttachments() : 0;
        return new RawSource(name, t.documents(), t.skippedDocuments(), t.tokens(), t.prepositions(), t.unambiguous(),
                events.total() - events.nounAttachments(), events.nounAttachments(), trials,
                rounds > 0 ? t.ambiguousQuadruples() : 0, rounds, reestimatedNoun, weight);
    }

    /** The section's bytes. */
    byte[] toBytes() throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (DataOutputStream out = new DataOutputStream(bytes)) {
            out.writeInt(VERSION);
            out.writeInt(sources.size());
            for (RawSource s : sources) {
                out.writeUTF(s.name());
                out.writeLong(s.documents());
                out.writeLong(s.skippedDocuments());
                out.writeLong(s.tokens());
                out.writeLong(s.prepositions());
                out.writeLong(s.unambiguous());
                out.writeDouble(s.verbEvents());
                out.writeDouble(s.nounEvents());
                out.writeDouble(s.cooccurrenceTrials());
                out.writeLong(s.ambiguousConfigurations());
                out.writeInt(s.rounds());
                out.writeDouble(s.reestimatedNoun());
                out.writeDouble(s.weight());
            }
            out.writeBoolean(hasBase());
            if (hasBase()) {
                out.writeUTF(base);
                out.writeInt(overlap.baseVocabulary());
                out.writeInt(overlap.rawWords());
                out.writeInt(overlap.rawWordsInBase());
                out.writeLong(overlap.rawTokens());
                out.writeLong(overlap.rawTokensCovered());
                out.writeInt(overlap.newWords().size());
                for (NewWord w : overlap.newWords()) {
                    out.writeUTF(w.word());
                    out.writeLong(w.count());
                }
                out.writeInt(prepositionsCompared);
                out.writeInt(shifts.size());
                for (PrepositionShift s : shifts) {
                    out.writeUTF(s.preposition());
                    out.writeDouble(s.baseNoun());
                    out.writeDouble(s.baseVerb());
                    out.writeDouble(s.mergedNoun());
                    out.writeDouble(s.mergedVerb());
                }
            }
        }
        return bytes.toByteArray();
    }

    /** The version a section's bytes carry (they start with it). */
    static int version(byte[] section) throws IOException {
        return new DataInputStream(new ByteArrayInputStream(section)).readInt();
    }

    /** Reads a section of {@link #VERSION} (check {@link #version} first). */
    static DomainReport fromBytes(byte[] section) throws IOException {
        DataInputStream in = new DataInputStream(new ByteArrayInputStream(section));
        int version = in.readInt();
        if (version != VERSION) throw new IOException("domain report of version " + version + ", expected " + VERSION);
        int n = in.readInt();
        if (n < 0 || n > 10_000) throw new IOException("implausible number of raw sources " + n);
        List<RawSource> sources = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            sources.add(new RawSource(in.readUTF(), in.readLong(), in.readLong(), in.readLong(), in.readLong(), in.readLong(),
                    in.readDouble(), in.readDouble(), in.readDouble(), in.readLong(), in.readInt(), in.readDouble(),
                    in.readDouble()));
        }
        if (!in.readBoolean()) return new DomainReport(sources, null, null, 0, List.of());
        String base = in.readUTF();
        int baseVocabulary = in.readInt(), rawWords = in.readInt(), inBase = in.readInt();
        long tokens = in.readLong(), covered = in.readLong();
        int k = in.readInt();
        if (k < 0 || k > NEW_WORDS) throw new IOException("implausible number of new words " + k);
        List<NewWord> words = new ArrayList<>();
        for (int i = 0; i < k; i++) words.add(new NewWord(in.readUTF(), in.readLong()));
        int compared = in.readInt();
        int m = in.readInt();
        if (m < 0 || m > compared) throw new IOException("implausible number of shifted prepositions " + m);
        List<PrepositionShift> shifts = new ArrayList<>();
        for (int i = 0; i < m; i++) {
            shifts.add(new PrepositionShift(in.readUTF(), in.readDouble(), in.readDouble(), in.readDouble(), in.readDouble()));
        }
        return new DomainReport(sources, base, new Overlap(baseVocabulary, rawWords, inBase, tokens, covered, words),
                compared, shifts);
    }
}
