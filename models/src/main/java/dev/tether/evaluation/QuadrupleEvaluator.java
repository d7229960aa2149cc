package dev.tether.evaluation;

import dev.tether.attachment.AlwaysNounBaseline;
import dev.tether.attachment.BackedOffScorer;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.LearnedQuadrupleScorer;
import dev.tether.attachment.LexicalAssociationScorer;
import dev.tether.attachment.PrepositionMajorityBaseline;
import dev.tether.attachment.Quadruple;
import dev.tether.attachment.QuadrupleDecision;
import dev.tether.attachment.QuadrupleScorer;
import dev.tether.attachment.SimilarityBackedOffScorer;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.model.TetherModel;

import java.util.List;

/**
 * Scores labelled quadruples with the model's quadruple scorer and, in the same run, with the plain back-off, the
 * back-off smoothed by the thesaurus (when the model has one), lexical association and the two baselines (always
 * noun; the majority attachment of each preposition in training). When the model's scorer is not the plain back-off,
 * it is also compared with it item by item, grouped by the level the plain back-off decided at.
 */
public final class QuadrupleEvaluator {
    public QuadrupleEvaluation evaluate(TetherModel model, List<LabelledQuadruple> items) {
        QuadrupleCounts counts = model.quadruples();
        BackedOffScorer plain = new BackedOffScorer(counts);
        QuadrupleScorer main = model.quadrupleScorer();
        List<QuadrupleScorer> others = new java.util.ArrayList<>();
        List<QuadrupleScorer> candidates = new java.util.ArrayList<>(List.of(plain));
        model.thesaurus().ifPresent(t -> candidates.add(new SimilarityBackedOffScorer(counts, t, model.normalizer())));
        candidates.addAll(List.of(new LexicalAssociationScorer(counts), new AlwaysNounBaseline(), new PrepositionMajorityBaseline(counts)));
        for (QuadrupleScorer s : candidates) if (!s.name().equals(main.name())) others.add(s);
        boolean againstPlain = main instanceof LearnedQuadrupleScorer || main instanceof SimilarityBackedOffScorer;
        QuadrupleEvaluation result = new QuadrupleEvaluation(main.name());
        for (LabelledQuadruple item : items) {
            Quadruple q = item.quadruple();
            int[] ids = counts.encode(model.normalizer(), q.verb(), q.noun1(), q.preposition(), q.noun2());
            if (ids[2] == 0) result.recordUnknownPreposition();
            QuadrupleDecision d = decide(main, q, ids);
            if (againstPlain) {
                QuadrupleDecision pd = plain.decide(ids[0], ids[1], ids[2], ids[3]);
                result.recordSmoothing(pd.basis(), pd.site() == item.site(), d.site() == item.site());
            }
            result.record(main.name(), d.site() == item.site());
            result.recordMain(d.basis(), item.site(), d.site());
            for (QuadrupleScorer s : others) result.record(s.name(), decide(s, q, ids).site() == item.site());
        }
        return result;
    }

    /** Scorers that read the thesaurus decide from the words, so that words the counts never saw find neighbours. */
    private static QuadrupleDecision decide(QuadrupleScorer s, Quadruple q, int[] ids) {
        if (s instanceof LearnedQuadrupleScorer l) return l.decide(q);
        if (s instanceof SimilarityBackedOffScorer similar) return similar.decide(q);
        return s.decide(ids[0], ids[1], ids[2], ids[3]);
    }
}
