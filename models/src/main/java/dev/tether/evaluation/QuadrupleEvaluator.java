package dev.tether.evaluation;

import dev.tether.attachment.AlwaysNounBaseline;
import dev.tether.attachment.BackedOffScorer;
import dev.tether.attachment.LabelledQuadruple;
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
 * Scores labelled quadruples with the model's backed-off scorer and, in the same run, with lexical association and
 * the two baselines (always noun; the majority attachment of each preposition in training).
 */
public final class QuadrupleEvaluator {
    public QuadrupleEvaluation evaluate(TetherModel model, List<LabelledQuadruple> items) {
        QuadrupleCounts counts = model.quadruples();
        BackedOffScorer plain = new BackedOffScorer(counts);
        SimilarityBackedOffScorer smoothed = model.quadrupleScorer() instanceof SimilarityBackedOffScorer s ? s : null;
        QuadrupleScorer main = model.quadrupleScorer();
        List<QuadrupleScorer> others = new java.util.ArrayList<>();
        for (QuadrupleScorer s : List.of(plain, new LexicalAssociationScorer(counts), new AlwaysNounBaseline(),
                new PrepositionMajorityBaseline(counts))) {
            if (!s.name().equals(main.name())) others.add(s);
        }
        QuadrupleEvaluation result = new QuadrupleEvaluation(main.name());
        for (LabelledQuadruple item : items) {
            Quadruple q = item.quadruple();
            int[] ids = counts.encode(model.normalizer(), q.verb(), q.noun1(), q.preposition(), q.noun2());
            if (ids[2] == 0) result.recordUnknownPreposition();
            QuadrupleDecision d = smoothed != null ? smoothed.decide(q) : main.decide(ids[0], ids[1], ids[2], ids[3]);
            if (smoothed != null) {
                QuadrupleDecision pd = plain.decide(ids[0], ids[1], ids[2], ids[3]);
                result.recordSmoothing(pd.basis(), pd.site() == item.site(), d.site() == item.site());
            }
            result.record(main.name(), d.site() == item.site());
            result.recordMain(d.basis(), item.site(), d.site());
            for (QuadrupleScorer s : others) {
                result.record(s.name(), s.decide(ids[0], ids[1], ids[2], ids[3]).site() == item.site());
            }
        }
        return result;
    }
}
