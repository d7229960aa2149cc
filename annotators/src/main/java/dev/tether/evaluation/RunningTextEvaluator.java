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
import dev.tether.evaluation.CoordinationEvaluation;
import dev.tether.evaluation.PredictedCoordination;
import dev.tether.treebank.TreebankSentence;
import dev.tether.type.AttachmentAmbiguity;
import dev.tether.type.AttachmentDecision;
import dev.tether.type.Conjunct;
import dev.tether.type.CoordinationDecision;
import dev.tether.treebank.GoldCoordination;
import dev.tether.treebank.GoldCoordinationExtractor;
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
    private final GoldCoordinationExtractor coordinationGold = new GoldCoordinationExtractor();

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
                result.attachmentOutcomes.startSentence();
                for (GoldAttachment g : gold.extract(s)) {
                    score(s, g, decisions, ambiguities, binary, result);
                }
                scoreCoordination(s, jcas, result.coordination);
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
        result.attachmentOutcomes.add(right);
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

    /**
     * Matches the pipeline's coordination decisions to the gold coordinations by the coordinator's offsets and maps
     * their tokens to gold words by offsets; the baseline reads the pipeline's own tags.
     */
    private void scoreCoordination(TreebankSentence s, JCas jcas, CoordinationEvaluation into) {
        List<GoldCoordination> golds = coordinationGold.extract(s);
        if (golds.isEmpty()) return;
        List<CoordinationDecision> decisions = List.copyOf(JCasUtil.select(jcas, CoordinationDecision.class));
        List<Token> tokens = List.copyOf(JCasUtil.select(jcas, Token.class));
        for (GoldCoordination g : golds) {
            int cb = s.begin(g.coordinator());
            int ce = s.end(g.coordinator());
            PredictedCoordination predicted = null;
            for (CoordinationDecision d : decisions) {
                if (overlaps(d.getCoordinator(), cb, ce)) {
                    predicted = predicted(s, d);
                    break;
                }
            }
            into.add(g, predicted, nearestOfClass(s, g, tokens), s.upos(g.right()));
        }
    }

    private static PredictedCoordination predicted(TreebankSentence s, CoordinationDecision d) {
        FSArray<?> conjuncts = d.getConjuncts();
        Conjunct first = (Conjunct) conjuncts.get(0);
        Conjunct last = (Conjunct) conjuncts.get(conjuncts.size() - 1);
        FSArray<?> shared = d.getSharedModifiers();
        FSArray<?> unshared = d.getUnsharedModifiers();
        int[] modifiers = new int[shared.size() + unshared.size()];
        boolean[] flags = new boolean[modifiers.length];
        for (int i = 0; i < shared.size(); i++) {
            modifiers[i] = word(s, (Annotation) shared.get(i));
            flags[i] = true;
        }
        for (int i = 0; i < unshared.size(); i++) modifiers[shared.size() + i] = word(s, (Annotation) unshared.get(i));
        return new PredictedCoordination(word(s, first.getHead()), word(s, last.getHead()), wordAt(s, first.getBegin()),
                wordAt(s, first.getEnd() - 1), wordAt(s, last.getBegin()), wordAt(s, last.getEnd() - 1), modifiers, flags);
    }

    /** The gold word a pipeline token overlaps first, or -1. */
    private static int word(TreebankSentence s, Annotation a) {
        for (int i = 0; i < s.size(); i++) if (overlaps(a, s.begin(i), s.end(i))) return i;
        return -1;
    }

    private static int wordAt(TreebankSentence s, int offset) {
        for (int i = 0; i < s.size(); i++) if (s.begin(i) <= offset && offset < s.end(i)) return i;
        return -1;
    }

    /**
     * Baseline: the nearest token before the coordinator whose tag (read as a universal tag) is that of the token at the
     * gold last conjunct's head, as the pipeline tagged both; as a gold word, or -1.
     */
    private static int nearestOfClass(TreebankSentence s, GoldCoordination g, List<Token> tokens) {
        Token right = null;
        int coordinator = -1;
        for (int t = 0; t < tokens.size(); t++) {
            Token k = tokens.get(t);
            if (right == null && overlaps(k, s.begin(g.right()), s.end(g.right()))) right = k;
            if (coordinator < 0 && overlaps(k, s.begin(g.coordinator()), s.end(g.coordinator()))) coordinator = t;
        }
        if (right == null || coordinator < 0) return -1;
        String cls = universal(right.getPos());
        for (int t = coordinator - 1; t >= 0; t--) {
            if (universal(tokens.get(t).getPos()).equals(cls)) return word(s, tokens.get(t));
        }
        return -1;
    }

    /** A Penn tag read as the universal tag it usually corresponds to (common practice). */
    static String universal(String penn) {
        if (penn == null) return "X";
        switch (penn) {
            case "NN": case "NNS": return "NOUN";
            case "NNP": case "NNPS": return "PROPN";
            case "PRP": case "WP": case "EX": return "PRON";
            case "CD": return "NUM";
            case "MD": return "AUX";
            case "DT": case "PDT": case "WDT": case "PRP$": return "DET";
            case "IN": case "TO": return "ADP";
            case "CC": return "CCONJ";
            default:
                if (penn.startsWith("VB")) return "VERB";
                if (penn.startsWith("JJ")) return "ADJ";
                if (penn.startsWith("RB") || penn.equals("WRB")) return "ADV";
                return penn;
        }
    }

    private static boolean overlaps(Annotation a, int begin, int end) {
        return a != null && a.getBegin() < end && begin < a.getEnd();
    }
}
