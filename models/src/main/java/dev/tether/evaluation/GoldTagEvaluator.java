package dev.tether.evaluation;

import dev.tether.attachment.AttachmentExample;
import dev.tether.attachment.AttachmentQuery;
import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.BackedOffScorer;
import dev.tether.attachment.HeadChoice;
import dev.tether.attachment.HeadChoiceScorer;
import dev.tether.candidates.HeadClass;
import dev.tether.model.TetherModel;
import dev.tether.treebank.TreebankExamples;

/** Scores a model's head choice on treebank examples built from gold tokens and tags (see {@link GoldTagEvaluation}). */
public final class GoldTagEvaluator {
    public GoldTagEvaluation evaluate(TetherModel model, TreebankExamples examples) {
        GoldTagEvaluation result = new GoldTagEvaluation();
        HeadChoiceScorer scorer = model.headChoiceScorer();
        BackedOffScorer binary = new BackedOffScorer(model.quadruples());
        for (AttachmentExample e : examples.examples()) {
            AttachmentQuery q = e.query();
            int gold = e.gold();
            result.candidateRecall.add(gold >= 0);
            HeadChoice chosen = q.size() > 0 ? model.chooseHead(q) : null;
            boolean right = chosen != null && gold >= 0 && chosen.best() == gold;
            result.attachment.add(right);
            if (chosen != null && chosen.best() >= 0) result.calibration.add(Math.min(1, chosen.probability(chosen.best())), right);
            boolean countRight = q.size() > 0 && gold >= 0 && scorer.choose(q).best() == gold;
            result.comparisons.get(GoldTagEvaluation.COUNT_SCORE).add(countRight);
            result.versusCountScore.add(right, countRight);
            int nearest = -1;
            int verb = -1;
            int noun = -1;
            for (int i = 0; i < q.size(); i++) {
                if (q.distance(i) <= 0) continue;
                boolean isVerb = q.headClass(i) == HeadClass.VERB;
                boolean isNoun = q.headClass(i) == HeadClass.NOUN;
                if ((isVerb || isNoun) && (nearest < 0 || q.distance(i) < q.distance(nearest))) nearest = i;
                if (isVerb && (verb < 0 || q.distance(i) < q.distance(verb))) verb = i;
                if (isNoun && (noun < 0 || q.distance(i) < q.distance(noun))) noun = i;
            }
            int choice = verb < 0 ? noun : noun < 0 ? verb : chooseBinary(model, binary, q, verb, noun);
            result.comparisons.get(GoldTagEvaluation.NEAREST_NOUN_OR_VERB).add(gold >= 0 && nearest == gold);
            result.comparisons.get(GoldTagEvaluation.VERB_OR_FIRST_NOUN).add(gold >= 0 && choice == gold);
            result.comparisons.get(GoldTagEvaluation.VERB_OR_NOUN_CEILING).add(gold >= 0 && (gold == verb || gold == noun));
        }
        int missed = examples.missedPrepositions();
        for (int i = 0; i < missed; i++) {
            result.attachment.add(false);
            result.candidateRecall.add(false);
            result.versusCountScore.add(false, false);
            for (Accuracy a : result.comparisons.values()) a.add(false);
        }
        return result;
    }

    private static int chooseBinary(TetherModel model, BackedOffScorer binary, AttachmentQuery q, int verb, int noun) {
        int[] ids = model.quadruples().encode(model.normalizer(), q.head(verb), q.head(noun), q.preposition(), q.object());
        return binary.decide(ids[0], ids[1], ids[2], ids[3]).site() == AttachmentSite.VERB ? verb : noun;
    }
}
