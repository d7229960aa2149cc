package dev.tether.coordination;

import dev.tether.attachment.AttachmentRanker;
import dev.tether.candidates.HeadClass;
import dev.tether.candidates.HostTypeMapping;
import dev.tether.candidates.TagCensus;
import dev.tether.candidates.TagSet;
import dev.tether.documents.DocumentLabel;
import dev.tether.model.LoadedModels;
import dev.tether.model.ModelHolder;
import dev.tether.model.TetherModel;
import dev.tether.type.Conjunct;
import dev.tether.type.CoordinationDecision;
import dev.tether.type.CoordinationReading;
import org.apache.uima.UimaContext;
import org.apache.uima.analysis_engine.AnalysisEngineProcessException;
import org.apache.uima.cas.CAS;
import org.apache.uima.cas.CASException;
import org.apache.uima.cas.TypeSystem;
import org.apache.uima.cas.text.AnnotationFS;
import org.apache.uima.fit.component.CasAnnotator_ImplBase;
import org.apache.uima.fit.descriptor.ConfigurationParameter;
import org.apache.uima.fit.descriptor.ExternalResource;
import org.apache.uima.fit.descriptor.ResourceMetaData;
import org.apache.uima.fit.descriptor.TypeCapability;
import org.apache.uima.fit.util.CasUtil;
import org.apache.uima.jcas.JCas;
import org.apache.uima.jcas.cas.FSArray;
import org.apache.uima.jcas.tcas.Annotation;
import org.apache.uima.resource.ResourceInitializationException;
import org.apache.uima.util.Level;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Decides the scope of every coordination: for each coordinating conjunction, the candidate bracketings of
 * {@link ConjunctCandidateProposer} (the same code treebank training uses) are ranked by the model's
 * {@link CoordinationRanker}, and a {@link CoordinationDecision} is written with the conjuncts (spans and heads), the
 * shared and unshared modifiers, the probability, the margin, the k best alternative readings and the evidence. It
 * reads sentences and Penn- or UD-tagged tokens itself (Tether's types or the host's, like the attachment candidate
 * finder), so it runs alone or beside the attachment engines.
 *
 * <p>A model without a coordination ranker (trained before coordination scope existed, or with another version of it)
 * loads, and the engine logs one warning and writes no coordination decisions. <b>Bounded work:</b> sentences longer
 * than {@link #PARAM_MAX_SENTENCE_TOKENS} are analysed in windows, and the proposer's caps bound the candidates per
 * coordinator; a decision whose candidates the caps cut says so in its evidence.
 */
@ResourceMetaData(name = "Tether coordination resolver",
        description = "The scope of every coordination: conjuncts with their heads, shared modifiers, probability, alternatives and evidence.")
@TypeCapability(outputs = {"dev.tether.type.CoordinationDecision", "dev.tether.type.Conjunct"})
public class CoordinationResolver extends CasAnnotator_ImplBase {
    /** Full name of the sentence annotation type to read. Default: Tether's own sentence type. */
    public static final String PARAM_SENTENCE_TYPE = "sentenceType";
    @ConfigurationParameter(name = PARAM_SENTENCE_TYPE, mandatory = true, defaultValue = "dev.tether.type.Sentence")
    private String sentenceTypeName;

    /** Full name of the token annotation type to read. Default: Tether's own token type. */
    public static final String PARAM_TOKEN_TYPE = "tokenType";
    @ConfigurationParameter(name = PARAM_TOKEN_TYPE, mandatory = true, defaultValue = "dev.tether.type.Token")
    private String tokenTypeName;

    /** Feature path from the token to its part-of-speech tag ({@code pos}, or {@code posTag/value} and the like). */
    public static final String PARAM_POS_FEATURE_PATH = "posFeaturePath";
    @ConfigurationParameter(name = PARAM_POS_FEATURE_PATH, mandatory = true, defaultValue = "pos")
    private String posFeaturePath;

    /** Tag set of the tags: {@code penn}, {@code ud} or {@code auto} (per document). */
    public static final String PARAM_TAGSET = "tagset";
    @ConfigurationParameter(name = PARAM_TAGSET, mandatory = true, defaultValue = "auto")
    private String tagsetName;

    /** Largest number of tokens analysed as one unit; longer sentences are analysed in windows, with a warning. */
    public static final String PARAM_MAX_SENTENCE_TOKENS = "maxSentenceTokens";
    @ConfigurationParameter(name = PARAM_MAX_SENTENCE_TOKENS, mandatory = true, defaultValue = "300")
    private int maxSentenceTokens;

    /** Model location: {@code default} for the shipped model, or a model file. Not read when a shared model is bound. */
    public static final String PARAM_MODEL = "model";
    @ConfigurationParameter(name = PARAM_MODEL, mandatory = false, defaultValue = LoadedModels.DEFAULT)
    private String modelLocation;

    /** How many readings each decision keeps, the chosen one included (at least 1). */
    public static final String PARAM_READINGS = "readings";
    @ConfigurationParameter(name = PARAM_READINGS, mandatory = false, defaultValue = "4")
    private int readings;

    /** Key of the optional shared model resource ({@link ModelHolder}). */
    public static final String RES_MODEL = "sharedModel";
    @ExternalResource(key = RES_MODEL, mandatory = false)
    private ModelHolder sharedModel;

    private static final String MESSAGES = "dev.tether.coordination.CoordinationMessages";

    private final ConjunctCandidateProposer proposer = new ConjunctCandidateProposer();
    private TetherModel model;
    private CoordinationRanker ranker;
    private HostTypeMapping types;
    private TagSet configuredTags;
    private long documents;
    private long decisions;
    private long capped;
    private long windows;

    @Override
    public void initialize(UimaContext context) throws ResourceInitializationException {
        super.initialize(context);
        if (readings < 1) problem("parameter " + PARAM_READINGS + " must be at least 1, got " + readings);
        if (maxSentenceTokens < 3) problem("parameter " + PARAM_MAX_SENTENCE_TOKENS + " must be at least 3 (two conjuncts and a coordinator), got " + maxSentenceTokens);
        try {
            configuredTags = TagSet.parameter(tagsetName, PARAM_TAGSET);
        } catch (IllegalArgumentException e) {
            problem(e.getMessage());
        }
        try {
            model = sharedModel != null ? sharedModel.model() : LoadedModels.get(modelLocation);
        } catch (IOException e) {
            throw new ResourceInitializationException(new IOException("cannot load the model given by parameter "
                    + PARAM_MODEL + ": " + e.getMessage(), e));
        }
        ranker = model.coordinationRanker().orElse(null);
        if (ranker == null) {
            getLogger().log(Level.WARNING, "model " + model.id() + " has no coordination ranker (it was trained before "
                    + "coordination scope, or with another version of it): no coordination decisions are written. "
                    + "Retrain it with 'tether train --conllu' to get them");
        }
    }

    private void problem(String text) throws ResourceInitializationException {
        throw new ResourceInitializationException(MESSAGES, "problem", new Object[] {getClass().getSimpleName() + ": " + text});
    }

    /** The model this instance decides with. */
    public TetherModel model() { return model; }

    @Override
    public void typeSystemInit(TypeSystem typeSystem) throws AnalysisEngineProcessException {
        super.typeSystemInit(typeSystem);
        try {
            types = HostTypeMapping.resolve(typeSystem, sentenceTypeName, PARAM_SENTENCE_TYPE, tokenTypeName, PARAM_TOKEN_TYPE,
                    posFeaturePath, PARAM_POS_FEATURE_PATH);
        } catch (IllegalArgumentException e) {
            throw new AnalysisEngineProcessException(MESSAGES, "problem", new Object[] {getClass().getSimpleName() + ": " + e.getMessage()}, e);
        }
    }

    @Override
    public void process(CAS cas) throws AnalysisEngineProcessException {
        documents++;
        if (ranker == null) return;
        String text = cas.getDocumentText();
        if (text == null || text.isBlank()) return;
        JCas jcas;
        try {
            jcas = cas.getJCas();
        } catch (CASException e) {
            throw new AnalysisEngineProcessException(e);
        }
        TagSet tags = tagSetOf(cas);
        for (AnnotationFS sentence : CasUtil.select(cas, types.sentenceType())) {
            List<AnnotationFS> tokens = CasUtil.selectCovered(cas, types.tokenType(), sentence);
            if (tokens.size() > maxSentenceTokens) {
                windows++;
                getLogger().log(Level.WARNING, "Sentence at characters " + sentence.getBegin() + "-" + sentence.getEnd()
                        + " of " + DocumentLabel.of(cas) + " has " + tokens.size() + " tokens, more than "
                        + PARAM_MAX_SENTENCE_TOKENS + "=" + maxSentenceTokens + "; coordinations are analysed in windows of that many tokens");
            }
            for (int start = 0; start < tokens.size(); start += maxSentenceTokens) {
                analyse(jcas, tokens.subList(start, Math.min(tokens.size(), start + maxSentenceTokens)), tags);
            }
        }
    }

    private TagSet tagSetOf(CAS cas) {
        if (configuredTags != null) return configuredTags;
        TagCensus census = new TagCensus();
        for (AnnotationFS token : cas.getAnnotationIndex(types.tokenType())) {
            String tag = types.tagOf(token);
            if (tag != null) census.add(tag);
        }
        return census.likeliest();
    }

    private void analyse(JCas jcas, List<AnnotationFS> tokens, TagSet tagSet) {
        int n = tokens.size();
        String[] words = new String[n];
        String[] tags = new String[n];
        for (int i = 0; i < n; i++) {
            AnnotationFS token = tokens.get(i);
            words[i] = token.getCoveredText();
            String tag = types.tagOf(token);
            tags[i] = tagSet.toPenn(tag == null ? "" : tag, words[i]);
        }
        for (CoordinatorCandidates c : proposer.proposeAll(words, tags)) {
            CoordinationQuery q = new CoordinationQuery(words, tags, c);
            CoordinationChoice choice = ranker.choose(q, readings);
            write(jcas, tokens, q, choice);
            decisions++;
            if (c.capped() > 0) capped++;
        }
    }

    private void write(JCas jcas, List<AnnotationFS> tokens, CoordinationQuery q, CoordinationChoice choice) {
        CoordinatorCandidates c = q.candidates();
        Bracketing best = Bracketing.of(c, choice, 0);
        FSArray<Conjunct> conjuncts = conjuncts(jcas, tokens, best);
        Annotation first = conjuncts.get(0);
        Annotation last = conjuncts.get(conjuncts.size() - 1);
        CoordinationDecision d = new CoordinationDecision(jcas, first.getBegin(), last.getEnd());
        d.setCoordinator((Annotation) tokens.get(c.coordinator()));
        d.setConjuncts(conjuncts);
        d.setSharedModifiers(modifiers(jcas, tokens, best, true));
        d.setUnsharedModifiers(modifiers(jcas, tokens, best, false));
        d.setProbability(choice.probability(0));
        d.setMargin(choice.margin());
        FSArray<CoordinationReading> alternatives = new FSArray<>(jcas, choice.readings() - 1);
        for (int r = 1; r < choice.readings(); r++) {
            Bracketing b = Bracketing.of(c, choice, r);
            CoordinationReading reading = new CoordinationReading(jcas);
            reading.setConjuncts(conjuncts(jcas, tokens, b));
            reading.setSharedModifiers(modifiers(jcas, tokens, b, true));
            reading.setUnsharedModifiers(modifiers(jcas, tokens, b, false));
            reading.setProbability(choice.probability(r));
            alternatives.set(r - 1, reading);
        }
        d.setAlternatives(alternatives);
        d.setEvidence(evidence(q, choice, best));
        d.setModelId(model.id());
        d.addToIndexes();
    }

    private static FSArray<Conjunct> conjuncts(JCas jcas, List<AnnotationFS> tokens, Bracketing b) {
        ConjunctPair p = b.pair();
        int[] middle = p.middle();
        FSArray<Conjunct> out = new FSArray<>(jcas, 2 + middle.length);
        out.set(0, conjunct(jcas, tokens, b.leftBegin(), b.leftEnd(), p.left(), p.leftClass()));
        for (int i = 0; i < middle.length; i++) {
            int begin = middle[i];
            int end = middle[i];
            // A middle conjunct spans its comma-separated segment.
            while (begin > 0 && !",".equals(tokens.get(begin - 1).getCoveredText()) && begin - 1 > p.leftEnd()) begin--;
            while (end + 1 < tokens.size() && !",".equals(tokens.get(end + 1).getCoveredText()) && end + 1 < p.rightBegin() - 1) end++;
            out.set(1 + i, conjunct(jcas, tokens, begin, end, middle[i], p.rightClass()));
        }
        out.set(out.size() - 1, conjunct(jcas, tokens, b.rightBegin(), b.rightEnd(), p.right(), p.rightClass()));
        return out;
    }

    private static Conjunct conjunct(JCas jcas, List<AnnotationFS> tokens, int begin, int end, int head, HeadClass cls) {
        begin = Math.min(begin, head);
        end = Math.max(end, head);
        Conjunct k = new Conjunct(jcas, tokens.get(begin).getBegin(), tokens.get(end).getEnd());
        k.setHead((Annotation) tokens.get(head));
        k.setWordClass(cls.label());
        return k;
    }

    private static FSArray<Annotation> modifiers(JCas jcas, List<AnnotationFS> tokens, Bracketing b, boolean shared) {
        ScopeCandidate[] m = b.pair().modifiers();
        int count = 0;
        for (int i = 0; i < m.length; i++) if (b.shared()[i] == shared) count++;
        FSArray<Annotation> out = new FSArray<>(jcas, count);
        int k = 0;
        for (int i = 0; i < m.length; i++) if (b.shared()[i] == shared) out.set(k++, (Annotation) tokens.get(m[i].token()));
        return out;
    }

    /** The decision in words: the pair over the runner-up, the features that weighed most, the scope, and caps. */
    private String evidence(CoordinationQuery q, CoordinationChoice choice, Bracketing best) {
        String[] w = q.words();
        StringBuilder s = new StringBuilder(200);
        ConjunctPair p = best.pair();
        s.append('\'').append(w[p.left()]).append("' and '").append(w[p.right()]).append("' (").append(p.leftClass().label())
                .append(" + ").append(p.rightClass().label()).append(", p=");
        AttachmentRanker.twoDecimals(choice.pairProbability(0), s).append(')');
        if (choice.readings() > 1) {
            ConjunctPair second = q.candidates().pair(choice.pair(1));
            s.append(" over '").append(w[second.left()]).append("' and '").append(w[second.right()]).append("' (p=");
            AttachmentRanker.twoDecimals(choice.pairProbability(1), s).append(')');
            List<CoordinationRanker.Reason> reasons = ranker.explain(q, choice, 3);
            if (!reasons.isEmpty()) {
                s.append(", mainly for ");
                for (int i = 0; i < reasons.size(); i++) {
                    if (i > 0) s.append(i == reasons.size() - 1 ? " and " : "; ");
                    AttachmentRanker.twoDecimals(reasons.get(i).weight(), s.append(reasons.get(i).text()).append(" (+")).append(')');
                }
            }
        } else {
            s.append(", the only candidate pair");
        }
        for (int m = 0; m < p.modifiers().length; m++) {
            ScopeCandidate sc = p.modifiers()[m];
            s.append("; ").append(sc.kind().label()).append(" '").append(w[sc.token()]).append(best.shared()[m] ? "' shared (p=" : "' not shared (p=");
            double ps = choice.sharedProbability(0, m);
            AttachmentRanker.twoDecimals(best.shared()[m] ? ps : 1 - ps, s).append(')');
        }
        if (q.candidates().capped() > 0) {
            s.append("; caps: ").append(q.candidates().capped()).append(" more first-conjunct candidates left out (at most ")
                    .append(ConjunctCandidateProposer.MAX_SAME_CLASS).append(" of the last conjunct's class and ")
                    .append(ConjunctCandidateProposer.MAX_OTHER_CLASS).append(" of each other class within ")
                    .append(ConjunctCandidateProposer.BACK_WINDOW).append(" tokens)");
        }
        return s.toString();
    }

    @Override
    public void collectionProcessComplete() throws AnalysisEngineProcessException {
        getLogger().log(Level.INFO, String.format(Locale.ROOT, "coordination resolver: %,d decisions in %,d documents (model %s); "
                + "%,d with capped candidates, %,d sentences analysed in windows", decisions, documents, model.id(), capped, windows));
        super.collectionProcessComplete();
    }
}
