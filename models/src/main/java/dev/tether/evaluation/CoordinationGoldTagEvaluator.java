package dev.tether.evaluation;

import dev.tether.coordination.Bracketing;
import dev.tether.coordination.ConjunctCandidateProposer;
import dev.tether.coordination.CoordinationChoice;
import dev.tether.coordination.CoordinationQuery;
import dev.tether.coordination.CoordinationRanker;
import dev.tether.coordination.CoordinatorCandidates;
import dev.tether.coordination.ScopeCandidate;
import dev.tether.treebank.GoldCoordination;
import dev.tether.treebank.GoldCoordinationExtractor;
import dev.tether.treebank.TreebankSentence;

/**
 * Scores the coordination ranker on gold trees with the treebank's own tokens and Penn tags (no preprocessing), so
 * that its errors are separated from tagging errors. The baseline takes, for the last conjunct's gold head, the
 * nearest word before the coordinator with the same universal tag (the figure of the coordination issue: 55.5% on
 * UD English EWT dev).
 */
public final class CoordinationGoldTagEvaluator {
    private final ConjunctCandidateProposer proposer = new ConjunctCandidateProposer();
    private final GoldCoordinationExtractor gold = new GoldCoordinationExtractor();

    public void add(TreebankSentence s, CoordinationRanker ranker, CoordinationEvaluation into) {
        String[] words = s.forms();
        String[] tags = s.xposTags();
        CoordinatorCandidates[] by = new CoordinatorCandidates[words.length];
        for (CoordinatorCandidates c : proposer.proposeAll(words, tags)) by[c.coordinator()] = c;
        for (GoldCoordination g : gold.extract(s)) {
            PredictedCoordination predicted = null;
            CoordinatorCandidates c = by[g.coordinator()];
            if (c != null && ranker != null) {
                CoordinationChoice choice = ranker.choose(new CoordinationQuery(words, tags, c), 1);
                predicted = predicted(Bracketing.of(c, choice, 0));
            }
            into.add(g, predicted, nearestOfClass(s, g), s.upos(g.right()));
        }
    }

    /** A bracketing in token positions of the same sentence. */
    public static PredictedCoordination predicted(Bracketing b) {
        ScopeCandidate[] m = b.pair().modifiers();
        int[] tokens = new int[m.length];
        for (int i = 0; i < m.length; i++) tokens[i] = m[i].token();
        return new PredictedCoordination(b.pair().left(), b.pair().right(), b.leftBegin(), b.leftEnd(), b.rightBegin(),
                b.rightEnd(), tokens, b.shared());
    }

    /** The nearest word before the coordinator with the last conjunct's universal tag, or -1. */
    static int nearestOfClass(TreebankSentence s, GoldCoordination g) {
        for (int k = g.coordinator() - 1; k >= 0; k--) if (s.upos(k).equals(s.upos(g.right()))) return k;
        return -1;
    }
}
