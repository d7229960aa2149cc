package dev.tether.evaluation;

import dev.tether.attachment.AttachmentResolver;
import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.BackedOffScorer;
import dev.tether.attachment.QuadrupleDecision;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.model.TetherModel;
import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.GoldAttachment;
import dev.tether.treebank.GoldAttachmentExtractor;
import dev.tether.treebank.TreebankSentence;
import dev.tether.type.AttachmentAmbiguity;
import dev.tether.type.AttachmentDecision;
import dev.tether.type.Token;
import org.apache.uima.analysis_engine.AnalysisEngine;
import org.apache.uima.analysis_engine.AnalysisEngineProcessException;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
import org.apache.uima.jcas.cas.FSArray;
import org.apache.uima.jcas.tcas.Annotation;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * Runs a raw-text pipeline on the {@code # text} of every sentence of a CoNLL-U file (no gold tokens or tags reach
 * it) and matches its decisions to the gold prepositional attachments by character offsets: a decision answers a
 * gold attachment when their prepositions overlap, and is right when its head overlaps the gold head.
 */
public final class RunningTextEvaluator {
    private final AnalysisEngine pipeline;
    private final TetherModel model;
    private final GoldAttachmentExtractor gold = new GoldAttachmentExtractor();

    public RunningTextEvaluator(AnalysisEngine pipeline, TetherModel model) {
        this.pipeline = pipeline;
        this.model = model;
    }

    public RunningTextEvaluation evaluate(Path conllu) throws IOException, AnalysisEngineProcessException {
        RunningTextEvaluation result = new RunningTextEvaluation();
        JCas jcas;
        try {
            jcas = pipeline.newJCas();
        } catch (org.apache.uima.resource.ResourceInitializationException e) {
            throw new IOException("cannot create a CAS for the pipeline", e);
        }
        QuadrupleCounts counts = model.quadruples();
        BackedOffScorer binary = new BackedOffScorer(counts);
        long start = System.nanoTime();
        try (ConlluReader reader = ConlluReader.open(conllu)) {
            for (TreebankSentence s = reader.next(); s != null; s = reader.next()) {
                jcas.reset();
                jcas.setDocumentLanguage("en");
                jcas.setDocumentText(s.text());
                pipeline.process(jcas);
                result.sentences++;
                result.tokens += JCasUtil.select(jcas, Token.class).size();
                List<AttachmentDecision> decisions = List.copyOf(JCasUtil.select(jcas, AttachmentDecision.class));
                List<AttachmentAmbiguity> ambiguities = List.copyOf(JCasUtil.select(jcas, AttachmentAmbiguity.class));
                result.decisions += decisions.size();
                for (GoldAttachment g : gold.extract(s)) {
                    score(s, g, decisions, ambiguities, binary, result);
                }
            }
        }
        result.seconds = (System.nanoTime() - start) / 1e9;
        return result;
    }

    private void score(TreebankSentence s, GoldAttachment g, List<AttachmentDecision> decisions,
                       List<AttachmentAmbiguity> ambiguities, BackedOffScorer binary, RunningTextEvaluation result) {
        int pb = s.begin(g.preposition());
        int pe = s.end(g.preposition());
        int hb = s.begin(g.head());
        int he = s.end(g.head());
        String headClass = g.headClass() == null ? "other" : g.headClass().label();
        AttachmentDecision decision = null;
        for (AttachmentDecision d : decisions) {
            if (overlaps(d.getPreposition(), pb, pe)) {
                decision = d;
                break;
            }
        }
        AttachmentAmbiguity ambiguity = null;
        for (AttachmentAmbiguity a : ambiguities) {
            if (overlaps(a.getPreposition(), pb, pe)) {
                ambiguity = a;
                break;
            }
        }
        boolean right = decision != null && overlaps(decision.getHead(), hb, he);
        if (decision == null) result.missedPrepositions++;
        else result.calibration.add(Math.min(1, Math.max(0, decision.getProbability())), right);
        result.attachment.add(right);
        result.byHeadClass.get(headClass).add(right);
        boolean covered = false;
        boolean nearestRight = false;
        boolean binaryRight = false;
        if (ambiguity != null) {
            FSArray<?> candidates = ambiguity.getCandidates();
            int nearestNounOrVerb = -1;
            int nearestVerb = -1;
            int nearestNoun = -1;
            int bestDistance = Integer.MAX_VALUE;
            for (int i = 0; i < candidates.size(); i++) {
                Annotation c = (Annotation) candidates.get(i);
                if (overlaps(c, hb, he)) covered = true;
                String cls = ambiguity.getCandidateClasses().get(i);
                int distance = ambiguity.getCandidateDistances().get(i);
                if (distance <= 0) continue;
                boolean verb = "verb".equals(cls);
                boolean noun = "noun".equals(cls);
                if ((verb || noun) && distance < bestDistance) {
                    bestDistance = distance;
                    nearestNounOrVerb = i;
                }
                if (verb && nearestVerb < 0) nearestVerb = i;
                if (noun && nearestNoun < 0) nearestNoun = i;
            }
            nearestRight = nearestNounOrVerb >= 0 && overlaps((Annotation) candidates.get(nearestNounOrVerb), hb, he);
            int binaryChoice = nearestVerb < 0 ? nearestNoun : nearestNoun < 0 ? nearestVerb
                    : chooseBinary(binary, ambiguity, (Annotation) candidates.get(nearestVerb),
                    (Annotation) candidates.get(nearestNoun)) == AttachmentSite.VERB ? nearestVerb : nearestNoun;
            binaryRight = binaryChoice >= 0 && overlaps((Annotation) candidates.get(binaryChoice), hb, he);
        }
        result.candidateRecall.add(covered);
        boolean countRight = false;
        if (ambiguity != null && ambiguity.getCandidates().size() > 0) {
            int c = model.headChoiceScorer().choose(AttachmentResolver.query(ambiguity)).best();
            countRight = c >= 0 && overlaps((Annotation) ambiguity.getCandidates().get(c), hb, he);
        }
        result.baselines.get(RunningTextEvaluation.COUNT_SCORE).add(countRight);
        result.versusCountScore.add(right, countRight);
        result.baselines.get(RunningTextEvaluation.NEAREST_NOUN_OR_VERB).add(nearestRight);
        result.baselines.get(RunningTextEvaluation.VERB_OR_FIRST_NOUN).add(binaryRight);
    }

    private AttachmentSite chooseBinary(BackedOffScorer binary, AttachmentAmbiguity a, Annotation verb, Annotation noun) {
        String object = a.getObject() != null ? a.getObject().getCoveredText() : "";
        int[] ids = model.quadruples().encode(model.normalizer(), verb.getCoveredText(), noun.getCoveredText(),
                a.getPreposition().getCoveredText(), object);
        QuadrupleDecision d = binary.decide(ids[0], ids[1], ids[2], ids[3]);
        return d.site();
    }

    private static boolean overlaps(Annotation a, int begin, int end) {
        return a != null && a.getBegin() < end && begin < a.getEnd();
    }
}
