package dev.tether.candidates;

import java.util.ArrayList;
import java.util.List;

import org.apache.uima.UimaContext;
import org.apache.uima.analysis_engine.AnalysisEngineProcessException;
import org.apache.uima.cas.CAS;
import org.apache.uima.cas.CASException;
import org.apache.uima.cas.TypeSystem;
import org.apache.uima.cas.text.AnnotationFS;
import org.apache.uima.fit.component.CasAnnotator_ImplBase;
import org.apache.uima.fit.descriptor.ConfigurationParameter;
import org.apache.uima.fit.descriptor.ResourceMetaData;
import org.apache.uima.fit.descriptor.TypeCapability;
import org.apache.uima.fit.util.CasUtil;
import org.apache.uima.jcas.JCas;
import org.apache.uima.jcas.cas.FSArray;
import org.apache.uima.jcas.cas.IntegerArray;
import org.apache.uima.jcas.cas.StringArray;
import org.apache.uima.jcas.tcas.Annotation;
import org.apache.uima.resource.ResourceInitializationException;
import org.apache.uima.util.Level;

import dev.tether.documents.DocumentLabel;
import dev.tether.type.AttachmentAmbiguity;
import dev.tether.type.QuadrupleCandidate;

/**
 * Finds every preposition with a nominal object and proposes all its plausible attachment sites (verbs, nouns,
 * adjectives and adverbs, nearest first), writing one {@link AttachmentAmbiguity} per preposition and a
 * {@link QuadrupleCandidate} where the classic verb–noun–preposition–noun configuration holds. The proposals come
 * from {@link HeadCandidateProposer}, the same code that treebank training uses, so training and use see the same
 * candidate sets.
 *
 * <p><b>Host types.</b> Sentences, tokens and tags are read from Tether's own types (written by the built-in
 * preprocessing) or from the host pipeline's types, named by {@link #PARAM_SENTENCE_TYPE}, {@link #PARAM_TOKEN_TYPE}
 * and {@link #PARAM_POS_FEATURE_PATH}; see {@link HostTypeMapping}. The annotations written point at the host's own
 * token annotations. Tags may come from the Penn Treebank tag set (Marcus et al. 1993) or the Universal Dependencies
 * UPOS set ({@link #PARAM_TAGSET}; {@link TagSet}).
 *
 * <p><b>Missing input.</b> A configured type or feature that the type system lacks fails when the type system is
 * first seen; a document with text but no sentences, no tokens, or no tags fails with an error naming the type and
 * the parameter. Tokens without a tag in an otherwise tagged document are analysed as untagged and counted in a
 * warning.
 *
 * <p><b>Bounded work.</b> A sentence longer than {@link #PARAM_MAX_SENTENCE_TOKENS} tokens is analysed in
 * consecutive windows of that many tokens (no head is proposed across a window boundary) and a warning is logged,
 * so the number of candidates per preposition never exceeds the window length.
 */
@ResourceMetaData(name = "Tether attachment candidate finder",
        description = "Prepositions with their objects and every plausible attachment site; verb-noun-preposition-noun quadruples.")
@TypeCapability(outputs = {"dev.tether.type.AttachmentAmbiguity", "dev.tether.type.QuadrupleCandidate"})
public class AttachmentCandidateFinder extends CasAnnotator_ImplBase {

    /** Full name of the sentence annotation type to read. Default: Tether's own sentence type. */
    public static final String PARAM_SENTENCE_TYPE = "sentenceType";
    @ConfigurationParameter(name = PARAM_SENTENCE_TYPE, mandatory = true, defaultValue = "dev.tether.type.Sentence")
    private String sentenceTypeName;

    /** Full name of the token annotation type to read. Default: Tether's own token type. */
    public static final String PARAM_TOKEN_TYPE = "tokenType";
    @ConfigurationParameter(name = PARAM_TOKEN_TYPE, mandatory = true, defaultValue = "dev.tether.type.Token")
    private String tokenTypeName;

    /**
     * Feature path from the token to its Penn Treebank tag: a string feature of the token ({@code pos}, the default,
     * for Tether's own token type) or features separated by {@code /} ending in a string feature ({@code posTag/value}
     * when the token references a separate part-of-speech annotation).
     */
    public static final String PARAM_POS_FEATURE_PATH = "posFeaturePath";
    @ConfigurationParameter(name = PARAM_POS_FEATURE_PATH, mandatory = true, defaultValue = "pos")
    private String posFeaturePath;

    /**
     * Largest number of tokens analysed as one unit. A longer sentence is analysed in consecutive windows of this many
     * tokens, heads are not proposed across a window boundary, and a warning is logged. Edited English sentences
     * rarely exceed 100 tokens (common practice), so the default of 300 only affects text without sentence
     * punctuation.
     */
    public static final String PARAM_MAX_SENTENCE_TOKENS = "maxSentenceTokens";
    @ConfigurationParameter(name = PARAM_MAX_SENTENCE_TOKENS, mandatory = true, defaultValue = "300")
    private int maxSentenceTokens;

    /**
     * Tag set of the host's part-of-speech tags: {@code penn} (Penn Treebank), {@code ud} (Universal Dependencies
     * UPOS: NOUN, VERB, ADP ...) or {@code auto} (per document, whichever most tags belong to). UD tags are mapped to
     * Penn tags ({@link TagSet}). When most of a document's tags belong to neither (or not to the set named), one
     * warning per document names the feature path and examples of the tags seen.
     */
    public static final String PARAM_TAGSET = "tagset";
    @ConfigurationParameter(name = PARAM_TAGSET, mandatory = true, defaultValue = "auto")
    private String tagsetName;

    /** Resource bundle of this engine's exception messages (UIMA exceptions take their message from a bundle). */
    private static final String MESSAGES = "dev.tether.candidates.FinderMessages";

    private final HeadCandidateProposer proposer = new HeadCandidateProposer();
    private HostTypeMapping types;
    /** The configured tag set, or {@code null} for {@code auto}. */
    private TagSet configuredTags;

    private long documents;
    private long sentences;
    private long sentencesCut;
    private long ambiguities;
    private long quadruples;

    @Override
    public void initialize(UimaContext context) throws ResourceInitializationException {
        super.initialize(context);
        if (maxSentenceTokens < 2) {
            throw new ResourceInitializationException(MESSAGES, "problem", new Object[] {"Parameter "
                    + PARAM_MAX_SENTENCE_TOKENS + " of " + getClass().getSimpleName()
                    + " must be at least 2 (a preposition and its object), was " + maxSentenceTokens});
        }
        try {
            configuredTags = TagSet.parameter(tagsetName, PARAM_TAGSET);
        } catch (IllegalArgumentException e) {
            throw new ResourceInitializationException(MESSAGES, "problem", new Object[] {getClass().getSimpleName()
                    + ": " + e.getMessage()});
        }
    }

    @Override
    public void typeSystemInit(TypeSystem typeSystem) throws AnalysisEngineProcessException {
        super.typeSystemInit(typeSystem);
        try {
            types = HostTypeMapping.resolve(typeSystem, sentenceTypeName, PARAM_SENTENCE_TYPE,
                    tokenTypeName, PARAM_TOKEN_TYPE, posFeaturePath, PARAM_POS_FEATURE_PATH);
        } catch (IllegalArgumentException e) {
            throw new AnalysisEngineProcessException(MESSAGES, "problem",
                    new Object[] {getClass().getSimpleName() + ": " + e.getMessage()}, e);
        }
    }

    @Override
    public void process(CAS cas) throws AnalysisEngineProcessException {
        documents++;
        String text = cas.getDocumentText();
        if (text == null || text.isBlank()) {
            return;
        }
        JCas jcas;
        try {
            jcas = cas.getJCas();
        } catch (CASException e) {
            throw new AnalysisEngineProcessException(e);
        }
        List<AnnotationFS> sentenceList = new ArrayList<>(CasUtil.select(cas, types.sentenceType()));
        if (sentenceList.isEmpty()) {
            throw missingInput(cas, "no annotations of the sentence type '" + types.sentenceType().getName()
                    + "'; run a sentence splitter before this engine or set parameter '" + PARAM_SENTENCE_TYPE
                    + "' to the type your pipeline writes");
        }
        if (cas.getAnnotationIndex(types.tokenType()).size() == 0) {
            throw missingInput(cas, "no annotations of the token type '" + types.tokenType().getName()
                    + "'; run a tokenizer before this engine or set parameter '" + PARAM_TOKEN_TYPE
                    + "' to the type your pipeline writes");
        }
        if (!anyTokenTagged(cas)) {
            throw missingInput(cas, "no part-of-speech tags: the feature path '" + types.tagPathText()
                    + "' is empty on every token of type '" + types.tokenType().getName()
                    + "'; run a part-of-speech tagger before this engine or set parameter '" + PARAM_POS_FEATURE_PATH
                    + "' to the path that holds the tags");
        }
        DocumentTally tally = new DocumentTally();
        tally.tags = tagSetOf(cas);
        for (AnnotationFS sentence : sentenceList) {
            List<AnnotationFS> tokens = CasUtil.selectCovered(cas, types.tokenType(), sentence);
            sentences++;
            if (tokens.size() > maxSentenceTokens) {
                sentencesCut++;
                getLogger().log(Level.WARNING, "Sentence at characters " + sentence.getBegin() + "-"
                        + sentence.getEnd() + " of " + DocumentLabel.of(cas) + " has " + tokens.size()
                        + " tokens, more than " + PARAM_MAX_SENTENCE_TOKENS + "=" + maxSentenceTokens
                        + "; it is analysed in windows of that many tokens and no head is proposed across a window boundary");
            }
            for (int start = 0; start < tokens.size(); start += maxSentenceTokens) {
                analyse(jcas, tokens.subList(start, Math.min(tokens.size(), start + maxSentenceTokens)), tally);
            }
        }
        if (tally.untagged > 0) {
            getLogger().log(Level.WARNING, tally.untagged + " of " + tally.tokens + " tokens of " + DocumentLabel.of(cas)
                    + " have no part-of-speech tag at '" + types.tagPathText() + "' (parameter "
                    + PARAM_POS_FEATURE_PATH + "); they were analysed as untagged and cannot be heads or objects");
        }
    }

    /** Whether at least one token of the document has a tag; stops at the first tagged token. */
    private boolean anyTokenTagged(CAS cas) {
        for (AnnotationFS token : cas.getAnnotationIndex(types.tokenType())) {
            if (types.tagOf(token) != null) {
                return true;
            }
        }
        return false;
    }

    /**
     * The tag set of this document's tags: the configured one, or for {@code auto} the one most tags belong to. Warns
     * once when most tags belong to neither set (or not to the configured one).
     */
    private TagSet tagSetOf(CAS cas) {
        TagCensus census = new TagCensus();
        for (AnnotationFS token : cas.getAnnotationIndex(types.tokenType())) {
            String tag = types.tagOf(token);
            if (tag != null) census.add(tag);
        }
        TagSet chosen = configuredTags != null ? configuredTags : census.likeliest();
        if (!census.matches(chosen)) {
            getLogger().log(Level.WARNING, "The part-of-speech tags of " + DocumentLabel.of(cas) + " at feature path '"
                    + types.tagPathText() + "' of " + types.tokenType().getName() + " are mostly not "
                    + (configuredTags != null ? "from the " + chosen + " tag set" : "Penn Treebank or Universal Dependencies tags")
                    + " (examples: " + String.join(", ", census.examples()) + "); few or no prepositions will be found. "
                    + "Set parameter '" + PARAM_POS_FEATURE_PATH + "' to the feature that holds the tags, or '"
                    + PARAM_TAGSET + "' to penn, ud or auto");
        }
        return chosen;
    }

    /** Proposes candidates for one window of tokens and writes the annotations. */
    private void analyse(JCas jcas, List<AnnotationFS> tokens, DocumentTally tally) {
        int n = tokens.size();
        String[] words = new String[n];
        String[] tags = new String[n];
        for (int i = 0; i < n; i++) {
            AnnotationFS token = tokens.get(i);
            words[i] = token.getCoveredText();
            String tag = types.tagOf(token);
            if (tag == null) {
                tally.untagged++;
                tag = "";
            }
            tags[i] = tally.tags.toPenn(tag, words[i]);
        }
        tally.tokens += n;
        for (PrepositionCandidates found : proposer.proposeAll(words, tags)) {
            write(jcas, tokens, tags, found);
        }
    }

    private void write(JCas jcas, List<AnnotationFS> tokens, String[] tags, PrepositionCandidates found) {
        Annotation preposition = (Annotation) tokens.get(found.preposition());
        Annotation object = (Annotation) tokens.get(found.object());
        AttachmentAmbiguity ambiguity = new AttachmentAmbiguity(jcas,
                Math.min(preposition.getBegin(), object.getBegin()), Math.max(preposition.getEnd(), object.getEnd()));
        ambiguity.setPreposition(preposition);
        ambiguity.setObject(object);
        FSArray<Annotation> candidates = new FSArray<>(jcas, found.size());
        StringArray classes = new StringArray(jcas, found.size());
        IntegerArray distances = new IntegerArray(jcas, found.size());
        StringArray candidateTags = new StringArray(jcas, found.size());
        for (int i = 0; i < found.size(); i++) {
            candidates.set(i, (Annotation) tokens.get(found.head(i)));
            classes.set(i, found.headClass(i).label());
            distances.set(i, found.preposition() - found.head(i));
            candidateTags.set(i, tags[found.head(i)]);
        }
        ambiguity.setCandidates(candidates);
        ambiguity.setCandidateClasses(classes);
        ambiguity.setCandidateDistances(distances);
        ambiguity.setCandidateTags(candidateTags);
        ambiguity.setObjectTag(tags[found.object()]);
        if (found.isQuadruple()) {
            Annotation verb = (Annotation) tokens.get(found.quadrupleVerb());
            Annotation noun1 = (Annotation) tokens.get(found.quadrupleNoun());
            ambiguity.setQuadrupleVerb(verb);
            ambiguity.setQuadrupleNoun(noun1);
            QuadrupleCandidate quadruple = new QuadrupleCandidate(jcas,
                    Math.min(verb.getBegin(), ambiguity.getBegin()), Math.max(noun1.getEnd(), ambiguity.getEnd()));
            quadruple.setVerb(verb);
            quadruple.setNoun1(noun1);
            quadruple.setPreposition(preposition);
            quadruple.setNoun2(object);
            quadruple.addToIndexes();
            quadruples++;
        }
        ambiguity.addToIndexes();
        ambiguities++;
    }

    private AnalysisEngineProcessException missingInput(CAS cas, String what) {
        return new AnalysisEngineProcessException(MESSAGES, "problem",
                new Object[] {getClass().getSimpleName() + ": " + DocumentLabel.of(cas) + " has " + what});
    }

    @Override
    public void collectionProcessComplete() throws AnalysisEngineProcessException {
        super.collectionProcessComplete();
        getLogger().log(Level.INFO, "Candidate finder: " + documents + " documents, " + sentences + " sentences ("
                + sentencesCut + " analysed in windows of " + maxSentenceTokens + " tokens), " + ambiguities
                + " attachment ambiguities, " + quadruples + " quadruple candidates");
    }

    /** Token counts of one document, for the warning about untagged tokens. */
    private static final class DocumentTally {
        long tokens;
        long untagged;
        TagSet tags;
    }
}
