package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.model.LoadedModels;
import dev.tether.ranking.CandidateFeatures;
import dev.tether.model.ModelHolder;
import dev.tether.model.TetherModel;
import dev.tether.type.AttachmentAmbiguity;
import dev.tether.type.AttachmentDecision;
import dev.tether.type.ScoredHead;
import org.apache.uima.UimaContext;
import org.apache.uima.analysis_engine.AnalysisEngineProcessException;
import org.apache.uima.fit.component.JCasAnnotator_ImplBase;
import org.apache.uima.fit.descriptor.ConfigurationParameter;
import org.apache.uima.fit.descriptor.ExternalResource;
import org.apache.uima.fit.descriptor.TypeCapability;
import org.apache.uima.fit.util.JCasUtil;
import org.apache.uima.jcas.JCas;
import org.apache.uima.jcas.cas.FSArray;
import org.apache.uima.jcas.cas.IntegerArray;
import org.apache.uima.jcas.cas.StringArray;
import org.apache.uima.jcas.tcas.Annotation;
import org.apache.uima.resource.ResourceInitializationException;
import org.apache.uima.util.Level;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Chooses the head of every prepositional phrase that the candidate finder marked, among all its candidates, and
 * writes an {@link AttachmentDecision} with the probability, the margin to the runner-up, the ranked candidates and
 * the statistic that decided. The model is loaded once per process and shared by all instances: bind a
 * {@link dev.tether.model.SharedModelResource} under {@link #RES_MODEL}, or name a model with {@link #PARAM_MODEL}.
 */
@TypeCapability(inputs = "dev.tether.type.AttachmentAmbiguity", outputs = "dev.tether.type.AttachmentDecision")
public class AttachmentResolver extends JCasAnnotator_ImplBase {
    /** Model location: {@code default} for the shipped model, or the path of a model file. Ignored when a shared model resource is bound. */
    public static final String PARAM_MODEL = "model";
    @ConfigurationParameter(name = PARAM_MODEL, mandatory = false, defaultValue = LoadedModels.DEFAULT)
    private String modelLocation;

    /** How many ranked candidates each decision keeps (the chosen one included). */
    public static final String PARAM_RANKING_SIZE = "rankingSize";
    @ConfigurationParameter(name = PARAM_RANKING_SIZE, mandatory = false, defaultValue = "5")
    private int rankingSize;

    /**
     * How heads are chosen: {@code auto} (the model's learned ranker when it has one, else the count-based score) or
     * {@code counts} (always the count-based score, the ranker's baseline).
     */
    public static final String PARAM_SCORER = "scorer";
    @ConfigurationParameter(name = PARAM_SCORER, mandatory = false, defaultValue = "auto")
    private String scorerName;

    /** Key of the optional shared model resource ({@link ModelHolder}). */
    public static final String RES_MODEL = "sharedModel";
    @ExternalResource(key = RES_MODEL, mandatory = false)
    private ModelHolder sharedModel;

    private TetherModel model;
    /** The ranker in use, or null when the count-based score chooses. */
    private AttachmentRanker ranker;
    /** Features of the decision at hand, reused for its evidence (one buffer per engine instance). */
    private final CandidateFeatures features = new CandidateFeatures();
    private long decisions;
    private long withoutCandidates;
    private long documents;

    @Override
    public void initialize(UimaContext context) throws ResourceInitializationException {
        super.initialize(context);
        if (rankingSize < 1) {
            throw new ResourceInitializationException(new IllegalArgumentException(
                    "parameter " + PARAM_RANKING_SIZE + " must be at least 1, got " + rankingSize));
        }
        if (!scorerName.equals("auto") && !scorerName.equals("counts")) {
            throw new ResourceInitializationException(new IllegalArgumentException(
                    "parameter " + PARAM_SCORER + " must be 'auto' or 'counts', got '" + scorerName + "'"));
        }
        boolean countsOnly = scorerName.equals("counts");
        try {
            model = sharedModel != null ? sharedModel.model() : LoadedModels.get(modelLocation);
        } catch (IOException e) {
            throw new ResourceInitializationException(new IOException("cannot load the model given by parameter "
                    + PARAM_MODEL + ": " + e.getMessage(), e));
        }
        ranker = countsOnly ? null : model.attachmentRanker().orElse(null);
        getLogger().log(Level.CONFIG, "attachment resolver uses model " + model.id()
                + (model.attachmentRanker().isPresent() ? " (learned ranker)" : " (count-based score: the model has no ranker)"));
    }

    /** The model this instance scores with (instances share it). */
    public TetherModel model() {
        return model;
    }

    @Override
    public void process(JCas jcas) throws AnalysisEngineProcessException {
        documents++;
        List<AttachmentAmbiguity> ambiguities = new ArrayList<>(JCasUtil.select(jcas, AttachmentAmbiguity.class));
        for (AttachmentAmbiguity a : ambiguities) {
            FSArray<?> candidates = a.getCandidates();
            if (candidates == null || candidates.size() == 0) {
                // The finder marks a preposition with no plausible head (a fragment such as "About the ferry.");
                // there is nothing to choose, so no decision is written, and the summary counts it.
                withoutCandidates++;
                continue;
            }
            AttachmentQuery query = query(a);
            HeadChoice choice = ranker == null ? model.headChoiceScorer().choose(query) : ranker.choose(query, features);
            write(jcas, a, query, choice);
            decisions++;
        }
    }

    /** The query an ambiguity asks (its candidates, tags, distances and punctuation), as the resolver scores it. */
    public static AttachmentQuery query(AttachmentAmbiguity a) {
        FSArray<?> candidates = a.getCandidates();
        StringArray classes = a.getCandidateClasses();
        IntegerArray distances = a.getCandidateDistances();
        StringArray tags = a.getCandidateTags();
        int n = candidates.size();
        Annotation preposition = a.getPreposition();
        String text = preposition.getCAS().getDocumentText();
        AttachmentQuery.Builder b = AttachmentQuery.builder(preposition.getCoveredText(),
                a.getObject() != null ? a.getObject().getCoveredText() : "")
                .objectTag(a.getObjectTag() != null ? a.getObjectTag() : "");
        int verb = -1;
        int noun = -1;
        for (int i = 0; i < n; i++) {
            Annotation head = (Annotation) candidates.get(i);
            String tag = tags != null && tags.get(i) != null ? tags.get(i) : "";
            b.candidate(head.getCoveredText(), tag, HeadClass.valueOf(classes.get(i).toUpperCase(Locale.ROOT)),
                    distances != null ? distances.get(i) : i + 1,
                    hasBreak(text, Math.min(head.getEnd(), preposition.getEnd()), Math.max(head.getBegin(), preposition.getBegin())));
            if (head == a.getQuadrupleVerb()) verb = i;
            if (head == a.getQuadrupleNoun()) noun = i;
        }
        if (verb >= 0 && noun >= 0) b.quadruple(verb, noun);
        return b.build();
    }

    /** Whether the text between two tokens holds a phrase break, as {@link AttachmentQuery#isBreak} defines it. */
    private static boolean hasBreak(String text, int from, int to) {
        for (int k = Math.max(0, from); k < Math.min(to, text.length()); k++) {
            char ch = text.charAt(k);
            if (ch == ',' || ch == ':' || ch == ';' || ch == '(' || ch == ')' || ch == '[' || ch == ']') return true;
            if (ch == '-' && (k == 0 || text.charAt(k - 1) == ' ' || text.charAt(k - 1) == '-')
                    && (k + 1 >= text.length() || text.charAt(k + 1) == ' ' || text.charAt(k + 1) == '-')) return true;
        }
        return false;
    }

    private void write(JCas jcas, AttachmentAmbiguity a, AttachmentQuery q, HeadChoice choice) {
        FSArray<?> candidates = a.getCandidates();
        int best = choice.best();
        AttachmentDecision d = new AttachmentDecision(jcas, a.getBegin(), a.getEnd());
        d.setPreposition(a.getPreposition());
        d.setObject(a.getObject());
        d.setHead((Annotation) candidates.get(best));
        d.setSiteClass(q.headClass(best).label());
        d.setProbability(choice.probability(best));
        d.setMargin(choice.margin());
        int[] order = choice.ranking();
        int k = Math.min(rankingSize, order.length);
        FSArray<ScoredHead> ranking = new FSArray<>(jcas, k);
        for (int r = 0; r < k; r++) {
            int i = order[r];
            ScoredHead s = new ScoredHead(jcas);
            s.setHead((Annotation) candidates.get(i));
            s.setSiteClass(q.headClass(i).label());
            s.setProbability(choice.probability(i));
            ranking.set(r, s);
        }
        d.setRanking(ranking);
        d.setEvidenceLevel(choice.evidence(best).label());
        d.setEvidenceCounts(Math.round(choice.evidenceHits(best)) + "/" + Math.round(choice.evidenceTrials(best)));
        d.setEvidence(ranker == null ? EvidenceText.describe(q, choice, best) : EvidenceText.describe(ranker, q, choice, best, features));
        d.setModelId(model.id());
        d.addToIndexes();
    }

    @Override
    public void collectionProcessComplete() throws AnalysisEngineProcessException {
        getLogger().log(Level.INFO, String.format(Locale.ROOT, "attachment resolver: %,d decisions in %,d documents (model %s); "
                + "%,d prepositions had no candidate head", decisions, documents, model.id(), withoutCandidates));
        super.collectionProcessComplete();
    }
}
