package dev.tether.treebank;

import dev.tether.attachment.AttachmentExample;
import dev.tether.attachment.LabelledQuadruple;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Training events read off a treebank, with the counts that say how well the candidate proposer covers the gold
 * attachments: every gold attachment counts, whether or not the proposer found its preposition.
 */
public final class TreebankExamples {
    private final List<AttachmentExample> examples = new ArrayList<>();
    private final List<LabelledQuadruple> quadruples = new ArrayList<>();
    private int goldAttachments;
    private int missedPrepositions;
    private int goldAmongCandidates;
    private long candidateTotal;

    void addExample(AttachmentExample e) {
        examples.add(e);
        candidateTotal += e.query().size();
        if (e.gold() >= 0) goldAmongCandidates++;
    }

    void addQuadruple(LabelledQuadruple q) { quadruples.add(q); }
    void countGold() { goldAttachments++; }
    void countMissed() { missedPrepositions++; }

    /**
     * The first {@code share} of the examples (in file order, so whole stretches of text) with their quadruples, for
     * learning curves. Coverage counts are those of the kept part.
     */
    public TreebankExamples firstShare(double share) {
        if (!(share > 0 && share <= 1)) throw new IllegalArgumentException("share must be in (0, 1], got " + share);
        TreebankExamples part = new TreebankExamples();
        int keep = (int) Math.round(share * examples.size());
        java.util.Set<String> sources = new java.util.HashSet<>();
        for (AttachmentExample e : examples.subList(0, keep)) {
            part.addExample(e);
            sources.add(e.source());
        }
        for (LabelledQuadruple q : quadruples) if (sources.contains(q.source())) part.addQuadruple(q);
        part.goldAttachments = (int) Math.round(share * goldAttachments);
        part.missedPrepositions = (int) Math.round(share * missedPrepositions);
        return part;
    }

    /** One event per gold attachment whose preposition the proposer found; gold index -1 when the head is not a candidate. */
    public List<AttachmentExample> examples() { return Collections.unmodifiableList(examples); }
    /** Classic verb–noun–preposition–noun configurations whose gold head is the verb or the noun. */
    public List<LabelledQuadruple> quadruples() { return Collections.unmodifiableList(quadruples); }
    /** All gold prepositional attachments seen. */
    public int goldAttachments() { return goldAttachments; }
    /** Gold attachments whose preposition the proposer did not propose at all. */
    public int missedPrepositions() { return missedPrepositions; }
    /** Gold attachments whose gold head is among the proposed candidates. */
    public int goldAmongCandidates() { return goldAmongCandidates; }

    /** Gold head among the candidates, over all gold attachments (a missed preposition counts as a miss). */
    public double candidateRecall() {
        return goldAttachments == 0 ? 0 : (double) goldAmongCandidates / goldAttachments;
    }

    /** Average number of candidates per proposed gold preposition. */
    public double averageCandidates() {
        return examples.isEmpty() ? 0 : (double) candidateTotal / examples.size();
    }

    @Override public String toString() {
        return String.format(java.util.Locale.ROOT,
                "gold %d, missed prepositions %d, examples %d, quadruples %d, candidate recall %.4f, average candidates %.2f",
                goldAttachments, missedPrepositions, examples.size(), quadruples.size(), candidateRecall(),
                averageCandidates());
    }
}
