package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.SubTuple;
import dev.tether.counts.TupleCounts;
import dev.tether.similarity.Thesaurus;
import dev.tether.vocabulary.Vocabulary;
import dev.tether.vocabulary.WordNormalizer;

import java.util.ArrayList;
import java.util.List;

/**
 * The back-off of {@link BackedOffScorer}, smoothed by distributional similarity where it would fall to a level with
 * little evidence (Dagan, Lee &amp; Pereira 1999; Zhao &amp; Lin 2004). When the whole quadruple was never seen and the
 * pooled triples hold fewer than {@link #MIN_TRIPLE_TRIALS} cases, the scorer replaces one word at a time — the verb,
 * the first noun or the object — by each of its {@link #NEIGHBOURS} nearest neighbours in the thesaurus (same class)
 * and reads the counts of the altered quadruple, every case weighted by the neighbour's similarity:
 * <ol>
 *   <li>{@link DecisionBasis#SIMILAR_QUADRUPLES}: whole quadruples with one word replaced, when any was seen;</li>
 *   <li>{@link DecisionBasis#SIMILAR_TRIPLES}: else the triples, pooled with the triples that contain a replaced word;</li>
 *   <li>else the plain back-off (pairs, preposition, default).</li>
 * </ol>
 * A word the counts never saw but the thesaurus knows still finds its neighbours, which is where smoothing helps most.
 * {@link #explain} names the neighbours that carried the most weight. Immutable and thread-safe; the neighbour lists
 * are mapped to count ids once, in the constructor, with which neighbours the counts saw in each slot with each
 * preposition ({@link NeighbourMasks}), so that a decision looks up only those.
 */
public final class SimilarityBackedOffScorer implements QuadrupleScorer {
    /** Neighbours consulted per word (chosen on a held-out fifth of the quadruple training split; see README). */
    public static final int NEIGHBOURS = 50;
    /** Fewer pooled triple cases than this count as little evidence (chosen on a held-out fifth of the quadruple training split; see README). */
    public static final double MIN_TRIPLE_TRIALS = 5;
    /** Power of the similarity that weights a neighbour's cases (chosen on a held-out fifth of the quadruple training split; see README). */
    public static final double POWER = 1;
    /** Weight of the pairs' cases beside the similar triples' (chosen on a held-out fifth of the quadruple training split; see README). */
    public static final double PAIR_BLEND = 1;

    private static final SubTuple[] TRIPLES = {SubTuple.VERB_NOUN1, SubTuple.VERB_NOUN2, SubTuple.NOUN1_NOUN2};

    private final QuadrupleCounts counts;
    private final Thesaurus thesaurus;
    private final WordNormalizer normalizer;
    private final BackedOffScorer plain;
    private final int neighbours;
    private final double minTripleTrials;
    private final double power;
    private final double pairBlend;
    /** The thesaurus's words' ids in the counts, and back. */
    private final ThesaurusIds countIds;
    /** Per slot (verb, first noun, object), which neighbours the counts saw there with each preposition. */
    private final NeighbourMasks[] seen;

    public SimilarityBackedOffScorer(QuadrupleCounts counts, Thesaurus thesaurus, WordNormalizer normalizer) {
        this(counts, thesaurus, normalizer, NEIGHBOURS, MIN_TRIPLE_TRIALS, POWER, PAIR_BLEND);
    }

    /**
     * @param neighbours      neighbours consulted per word
     * @param minTripleTrials pooled triple cases below which the triples count as little evidence
     * @param power           a neighbour's cases are weighted by its similarity to this power (sharper for more)
     * @param pairBlend       when the plain back-off fell to the pairs, how much their cases count beside the
     *                        similar triples' (0: the similar triples alone decide)
     */
    public SimilarityBackedOffScorer(QuadrupleCounts counts, Thesaurus thesaurus, WordNormalizer normalizer,
                                     int neighbours, double minTripleTrials, double power, double pairBlend) {
        this.power = power;
        this.pairBlend = pairBlend;
        this.counts = counts;
        this.thesaurus = thesaurus;
        this.normalizer = normalizer;
        this.plain = new BackedOffScorer(counts);
        this.neighbours = neighbours;
        this.minTripleTrials = minTripleTrials;
        this.countIds = new ThesaurusIds(counts.words(), thesaurus);
        this.seen = new NeighbourMasks[] {
                new NeighbourMasks(counts, 0, HeadClass.VERB, thesaurus, countIds, neighbours),
                new NeighbourMasks(counts, 1, HeadClass.NOUN, thesaurus, countIds, neighbours),
                new NeighbourMasks(counts, 2, HeadClass.NOUN, thesaurus, countIds, neighbours)};
    }

    @Override
    public String name() {
        return "similarity-backed-off";
    }

    /** Decides a quadruple of count ids; words the counts never saw (id 0) cannot be looked up in the thesaurus. */
    @Override
    public QuadrupleDecision decide(int v, int n1, int p, int n2) {
        Vocabulary w = counts.words();
        return decideKeys(v, n1, p, n2, v > 0 ? w.word(v) : null, n1 > 0 ? w.word(n1) : null, n2 > 0 ? w.word(n2) : null, null, null);
    }

    /** Decides a quadruple of count ids whose normalized words are given too (so unseen words still find neighbours). */
    QuadrupleDecision decide(int v, int n1, int p, int n2, String verbKey, String nounKey, String objectKey) {
        return decideKeys(v, n1, p, n2, verbKey, nounKey, objectKey, null, null);
    }

    /** As {@link #decide(int, int, int, int, String, String, String)}, given the plain back-off's decision of the same quadruple. */
    QuadrupleDecision decide(int v, int n1, int p, int n2, String verbKey, String nounKey, String objectKey, QuadrupleDecision plainDecision) {
        return decideKeys(v, n1, p, n2, verbKey, nounKey, objectKey, null, plainDecision);
    }

    /** Decides a quadruple given as words in the text (normalized here). */
    public QuadrupleDecision decide(Quadruple q) {
        return decide(q, null);
    }

    /** Like {@link #decide(Quadruple)}; fills {@code deciders} (when not null) with the neighbours that decided it. */
    public QuadrupleDecision decide(Quadruple q, List<String> deciders) {
        String v = normalizer.verb(q.verb());
        String n1 = normalizer.noun(q.noun1());
        String n2 = normalizer.noun(q.noun2());
        Vocabulary w = counts.words();
        return decideKeys(w.id(v), w.id(n1), counts.prepositions().id(normalizer.preposition(q.preposition())), w.id(n2),
                v, n1, n2, deciders, null);
    }

    /** The neighbours that decided {@code q}, heaviest first, as "slot word→neighbour (weight)"; empty when none did. */
    public List<String> explain(Quadruple q) {
        List<String> deciders = new ArrayList<>();
        decide(q, deciders);
        return deciders;
    }

    private QuadrupleDecision decideKeys(int v, int n1, int p, int n2, String vk, String n1k, String n2k, List<String> deciders,
                                         QuadrupleDecision plainDecision) {
        QuadrupleDecision base = plainDecision != null ? plainDecision : plain.decide(v, n1, p, n2);
        if (p <= 0 || base.basis() == DecisionBasis.QUADRUPLE
                || (base.basis() == DecisionBasis.TRIPLES && base.count() >= minTripleTrials)) {
            return base;
        }
        double[] quad = new double[2];
        double[] triples = new double[2];
        if (base.basis() == DecisionBasis.TRIPLES) {
            triples[0] = base.nounCount();
            triples[1] = base.count();
        }
        List<Contribution> contributions = deciders == null ? null : new ArrayList<>();
        substitute(0, HeadClass.VERB, vk, v, v, n1, p, n2, quad, triples, contributions);
        substitute(1, HeadClass.NOUN, n1k, n1, v, n1, p, n2, quad, triples, contributions);
        substitute(2, HeadClass.NOUN, n2k, n2, v, n1, p, n2, quad, triples, contributions);
        QuadrupleDecision d;
        if (quad[1] > 0) d = decision(quad, DecisionBasis.SIMILAR_QUADRUPLES);
        else if (triples[1] > 0 && triples[1] > (base.basis() == DecisionBasis.TRIPLES ? base.count() : 0)) {
            if (base.basis() == DecisionBasis.PAIRS && pairBlend > 0) {
                triples[0] += pairBlend * base.nounCount();
                triples[1] += pairBlend * base.count();
            }
            d = decision(triples, DecisionBasis.SIMILAR_TRIPLES);
        } else return base;
        if (contributions != null) {
            boolean quadLevel = d.basis() == DecisionBasis.SIMILAR_QUADRUPLES;
            contributions.removeIf(c -> quadLevel ? c.quadWeight <= 0 : c.tripleWeight <= 0);
            contributions.sort((a, b) -> Double.compare(quadLevel ? b.quadWeight : b.tripleWeight, quadLevel ? a.quadWeight : a.tripleWeight));
            for (int i = 0; i < Math.min(3, contributions.size()); i++) {
                Contribution c = contributions.get(i);
                StringBuilder line = new StringBuilder().append(c.slot).append(' ').append(c.word).append('\u2192').append(c.neighbour).append(" (");
                deciders.add(AttachmentRanker.twoDecimals(quadLevel ? c.quadWeight : c.tripleWeight, line).append(')').toString());
            }
        }
        return d;
    }

    private static final String[] SLOTS = {"verb", "noun", "object"};


    private static final class Contribution {
        final String slot, word, neighbour;
        double quadWeight, tripleWeight;

        Contribution(String slot, String word, String neighbour) {
            this.slot = slot;
            this.word = word;
            this.neighbour = neighbour;
        }
    }

    /** Adds the evidence of the quadruple with word {@code slot} replaced by each of its neighbours. */
    private void substitute(int slot, HeadClass wordClass, String key, int countId, int v, int n1, int p, int n2,
                            double[] quad, double[] triples, List<Contribution> contributions) {
        if (key == null) return;
        int t = countIds.entry(wordClass, countId, key);
        if (t == Thesaurus.UNKNOWN) return;
        int k = Math.min(neighbours, thesaurus.neighbourCount(t));
        // Only the neighbours the counts saw in this slot with this preposition can add anything; in neighbour order.
        long mask = seen[slot].mask(t, p);
        for (int i = 0; i < k; i++) {
            if (i < 64 && (mask & (1L << i)) == 0) {
                if ((mask >>> i) == 0) break;
                continue;
            }
            int nt = thesaurus.neighbourId(t, i);
            double score = thesaurus.neighbourScore(t, i);
            if (!(score > 0)) continue;
            double s = power == 1 ? score : Math.pow(score, power);
            int id = countIds.countId(nt);
            if (id == 0) continue;
            int sv = slot == 0 ? id : v, sn1 = slot == 1 ? id : n1, sn2 = slot == 2 ? id : n2;
            double qw = 0, tw = 0;
            if (sv > 0 && sn1 > 0 && sn2 > 0) {
                long e = counts.table(p, SubTuple.VERB_NOUN1_NOUN2).find(SubTuple.VERB_NOUN1_NOUN2.key(sv, sn1, sn2));
                if (e != TupleCounts.ABSENT) {
                    quad[0] += s * TupleCounts.hitsIn(e);
                    quad[1] += s * TupleCounts.trialsIn(e);
                    qw = s * TupleCounts.trialsIn(e);
                }
            }
            for (SubTuple part : TRIPLES) {
                if (!contains(part, slot)) continue;
                int a = sv, b = sn1, c = sn2;
                if (!known(part, a, b, c)) continue;
                long e = counts.table(p, part).find(part.key(a, b, c));
                if (e != TupleCounts.ABSENT) {
                    triples[0] += s * TupleCounts.hitsIn(e);
                    triples[1] += s * TupleCounts.trialsIn(e);
                    tw += s * TupleCounts.trialsIn(e);
                }
            }
            if (contributions != null && (qw > 0 || tw > 0)) {
                Contribution c = new Contribution(SLOTS[slot], key, thesaurus.key(nt));
                c.quadWeight = qw;
                c.tripleWeight = tw;
                contributions.add(c);
            }
        }
    }

    private static boolean contains(SubTuple part, int slot) {
        switch (part) {
            case VERB_NOUN1: return slot == 0 || slot == 1;
            case VERB_NOUN2: return slot == 0 || slot == 2;
            default: return slot == 1 || slot == 2;
        }
    }

    private static boolean known(SubTuple part, int v, int n1, int n2) {
        switch (part) {
            case VERB_NOUN1: return v > 0 && n1 > 0;
            case VERB_NOUN2: return v > 0 && n2 > 0;
            default: return n1 > 0 && n2 > 0;
        }
    }

    private static QuadrupleDecision decision(double[] e, DecisionBasis basis) {
        double pn = e[0] / e[1];
        return new QuadrupleDecision(pn >= 0.5 ? AttachmentSite.NOUN : AttachmentSite.VERB, pn, basis, e[0], e[1], pn);
    }
}
