package dev.tether.evaluation;

import dev.tether.treebank.GoldCoordination;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Accumulates the coordination scores of one evaluation run against gold trees: both conjunct heads right over
 * every gold coordination (a coordinator without a decision counts as wrong), exact match of the first and last
 * conjunct spans, scope decisions on the gold modifiers the system decided (with their coverage), the baselines of
 * the same run (nearest preceding word of the last conjunct's class; modifiers always shared; never shared), and a
 * table by the last conjunct's gold word class.
 */
public final class CoordinationEvaluation {
    private final Accuracy heads = new Accuracy();
    private final Accuracy nearest = new Accuracy();
    private final Accuracy spans = new Accuracy();
    private final Accuracy scope = new Accuracy();
    private final Accuracy alwaysShared = new Accuracy();
    private final Accuracy neverShared = new Accuracy();
    private final Accuracy decided = new Accuracy();
    private long goldModifiers;
    private final Map<String, Accuracy[]> byClass = new LinkedHashMap<>();

    /**
     * Scores one gold coordination against the system's decision for its coordinator ({@code null}: none) and the
     * baseline's first conjunct ({@code nearestLeft}, -1 when there is none); {@code wordClass} is the gold class
     * of the last conjunct (its universal tag).
     */
    public void add(GoldCoordination gold, PredictedCoordination predicted, int nearestLeft, String wordClass) {
        boolean right = predicted != null && predicted.left() == gold.left() && predicted.right() == gold.right();
        heads.add(right);
        nearest.add(nearestLeft == gold.left());
        spans.add(predicted != null && predicted.leftBegin() == gold.leftBegin() && predicted.leftEnd() == gold.leftEnd()
                && predicted.rightBegin() == gold.rightBegin() && predicted.rightEnd() == gold.rightEnd());
        Accuracy[] row = byClass.computeIfAbsent(wordClass, k -> new Accuracy[] {new Accuracy(), new Accuracy()});
        row[0].add(right);
        row[1].add(nearestLeft == gold.left());
        for (int k = 0; k < gold.modifiers().length; k++) {
            goldModifiers++;
            int m = -1;
            if (right) {
                for (int j = 0; j < predicted.modifiers().length; j++) if (predicted.modifiers()[j] == gold.modifiers()[k]) m = j;
            }
            decided.add(m >= 0);
            if (m < 0) continue;
            scope.add(predicted.shared()[m] == gold.shared()[k]);
            alwaysShared.add(gold.shared()[k]);
            neverShared.add(!gold.shared()[k]);
        }
    }

    /** Both conjunct heads right, over every gold coordination. */
    public Accuracy heads() { return heads; }
    /** Baseline: the nearest word before the coordinator of the last conjunct's class is the first conjunct. */
    public Accuracy nearestOfClass() { return nearest; }
    /** First and last conjunct spans both exactly right. */
    public Accuracy spans() { return spans; }
    /** Scope decisions right, over the gold modifiers of correctly found coordinations that the system decided. */
    public Accuracy scope() { return scope; }
    public Accuracy alwaysShared() { return alwaysShared; }
    public Accuracy neverShared() { return neverShared; }
    /** Gold modifiers the system decided, over all gold modifiers. */
    public Accuracy scopeCoverage() { return decided; }
    public long goldModifiers() { return goldModifiers; }
    /** Per gold class of the last conjunct: {heads right, baseline right}. */
    public Map<String, Accuracy[]> byClass() { return byClass; }
}
