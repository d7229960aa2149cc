package dev.tether.attachment;

import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.SubTuple;
import dev.tether.counts.TupleKey;

/**
 * Lexical association after Hindle &amp; Rooth (1993), "Structural Ambiguity and Lexical Relations":
 * <pre>
 *   LA(v, n1, p) = log2( P(p | v) / P(p | n1) )
 *   P(p | v)  = ( f(v, p, verb-attached) + f(p, verb-attached) / f(verb-attached) ) / ( f(v) + 1 )
 *   P(p | n1) = ( f(n1, p, noun-attached) + f(p, noun-attached) / f(noun-attached) ) / ( f(n1) + 1 )
 * </pre>
 * Each conditional is smoothed towards the preposition's overall rate for that site, as in the paper. Verb
 * attachment when LA &gt; 0, noun attachment otherwise. The noun object n2 plays no part. The probability reported
 * is the logistic transform of the log-ratio, {@code 1 / (1 + 2^LA)} for the noun. The paper's extra factor for the
 * noun taking no preposition is left out: labelled quadruples say nothing about nouns without one.
 */
public final class LexicalAssociationScorer implements QuadrupleScorer {
    private final QuadrupleCounts counts;
    private final double verbAttachments;
    private final double nounAttachments;

    public LexicalAssociationScorer(QuadrupleCounts counts) {
        this.counts = counts;
        this.nounAttachments = counts.nounAttachments();
        this.verbAttachments = counts.total() - counts.nounAttachments();
    }

    @Override
    public String name() {
        return "lexical-association";
    }

    @Override
    public QuadrupleDecision decide(int v, int n1, int p, int n2) {
        if (p <= 0 || p > counts.prepositions().size() || verbAttachments <= 0 || nounAttachments <= 0) {
            return new QuadrupleDecision(AttachmentSite.NOUN, 1.0, DecisionBasis.DEFAULT, 0, 0, 0);
        }
        double pNoun = counts.prepositionNounCount(p);
        double pVerb = counts.prepositionCount(p) - pNoun;
        long vKey = SubTuple.VERB.key(v, n1, n2);
        long nKey = SubTuple.NOUN1.key(v, n1, n2);
        double fvp = counts.table(p, SubTuple.VERB).trialsOf(vKey) - counts.table(p, SubTuple.VERB).hitsOf(vKey);
        double fnp = counts.table(p, SubTuple.NOUN1).hitsOf(nKey);
        double fv = counts.verbs().trialsOf(TupleKey.of(v));
        double fn = counts.nouns1().trialsOf(TupleKey.of(n1));
        double probVerb = (fvp + pVerb / verbAttachments) / (fv + 1);
        double probNoun = (fnp + pNoun / nounAttachments) / (fn + 1);
        double la;
        if (probVerb <= 0 && probNoun <= 0) {
            la = 0;
        } else if (probNoun <= 0) {
            la = Double.POSITIVE_INFINITY;
        } else if (probVerb <= 0) {
            la = Double.NEGATIVE_INFINITY;
        } else {
            la = Math.log(probVerb / probNoun) / Math.log(2);
        }
        double pn = 1 / (1 + Math.pow(2, la));
        return new QuadrupleDecision(la > 0 ? AttachmentSite.VERB : AttachmentSite.NOUN, pn,
                DecisionBasis.LEXICAL_ASSOCIATION, fnp, fvp + fnp, la);
    }
}
