package dev.tether.candidates;

import org.apache.uima.cas.CAS;
import org.apache.uima.cas.Feature;
import org.apache.uima.cas.FeatureStructure;
import org.apache.uima.cas.Type;
import org.apache.uima.cas.TypeSystem;

/**
 * Where a pipeline keeps its sentences, tokens and part-of-speech tags: a sentence type, a token type and a feature
 * path from the token to its tag, resolved once against a CAS type system and checked there.
 *
 * <p>The tag path is either one string feature of the token ({@code pos}) or a chain of features separated by
 * {@code /} whose last feature holds the tag string ({@code posTag/value}: the token references a separate
 * part-of-speech annotation). Every feature before the last must reference a feature structure; the last must be a
 * {@code uima.cas.String} (or a subtype of it). Each problem is reported with the type, the feature and the engine
 * parameter that maps it, so the message says what to change.
 */
public final class HostTypeMapping {

    private final Type sentenceType;
    private final Type tokenType;
    private final Feature[] tagPath;
    private final String tagPathText;

    private HostTypeMapping(Type sentenceType, Type tokenType, Feature[] tagPath, String tagPathText) {
        this.sentenceType = sentenceType;
        this.tokenType = tokenType;
        this.tagPath = tagPath;
        this.tagPathText = tagPathText;
    }

    /**
     * Resolves the configured names against {@code typeSystem}.
     *
     * @param sentenceTypeName full name of the sentence annotation type
     * @param sentenceParam    name of the parameter that configures it (for messages)
     * @param tokenTypeName    full name of the token annotation type
     * @param tokenParam       name of the parameter that configures it
     * @param tagPathText      feature path from the token to its tag string, steps separated by {@code /}
     * @param tagPathParam     name of the parameter that configures it
     * @throws IllegalArgumentException naming the missing or ill-typed type or feature and the parameter to set
     */
    public static HostTypeMapping resolve(TypeSystem typeSystem, String sentenceTypeName, String sentenceParam,
                                          String tokenTypeName, String tokenParam,
                                          String tagPathText, String tagPathParam) {
        Type sentence = annotationType(typeSystem, sentenceTypeName, "sentence", sentenceParam);
        Type token = annotationType(typeSystem, tokenTypeName, "token", tokenParam);
        Feature[] path = tagPath(typeSystem, token, tagPathText, tagPathParam);
        return new HostTypeMapping(sentence, token, path, tagPathText);
    }

    public Type sentenceType() { return sentenceType; }
    public Type tokenType() { return tokenType; }
    /** The tag path as configured, e.g. {@code pos} or {@code posTag/value}. */
    public String tagPathText() { return tagPathText; }

    /** The tag of {@code token}, or {@code null} when the token (or a structure on the way) carries none. */
    public String tagOf(FeatureStructure token) {
        FeatureStructure fs = token;
        int last = tagPath.length - 1;
        for (int i = 0; i < last; i++) {
            fs = fs.getFeatureValue(tagPath[i]);
            if (fs == null) {
                return null;
            }
        }
        return fs.getStringValue(tagPath[last]);
    }

    private static Type annotationType(TypeSystem ts, String name, String role, String param) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("No " + role + " type is configured; set parameter '" + param
                    + "' to the full name of the pipeline's " + role + " annotation type");
        }
        Type type = ts.getType(name);
        if (type == null) {
            throw new IllegalArgumentException("The " + role + " type '" + name + "' is not in the CAS type system; set "
                    + "parameter '" + param + "' to the full name of the pipeline's " + role + " annotation type, or "
                    + "add the type system that defines it");
        }
        if (!ts.subsumes(ts.getType(CAS.TYPE_NAME_ANNOTATION), type)) {
            throw new IllegalArgumentException("The " + role + " type '" + name + "' (parameter '" + param
                    + "') is not an annotation type (a subtype of " + CAS.TYPE_NAME_ANNOTATION + "); set the parameter "
                    + "to a type whose instances have begin and end offsets");
        }
        return type;
    }

    private static Feature[] tagPath(TypeSystem ts, Type tokenType, String pathText, String param) {
        if (pathText == null || pathText.isBlank()) {
            throw new IllegalArgumentException("No part-of-speech feature path is configured; set parameter '" + param
                    + "' to a string feature of " + tokenType.getName() + " (e.g. pos) or a path such as posTag/value");
        }
        String[] steps = pathText.split("/", -1);
        Feature[] path = new Feature[steps.length];
        Type current = tokenType;
        for (int i = 0; i < steps.length; i++) {
            String step = steps[i].trim();
            Feature feature = step.isEmpty() ? null : current.getFeatureByBaseName(step);
            if (feature == null) {
                throw new IllegalArgumentException("The type '" + current.getName() + "' has no feature '" + step
                        + "' (step " + (i + 1) + " of the part-of-speech path '" + pathText + "' in parameter '" + param
                        + "'); set the parameter to the path from the token type " + tokenType.getName()
                        + " to the tag string, steps separated by '/'");
            }
            Type range = feature.getRange();
            boolean lastStep = i == steps.length - 1;
            if (lastStep && !ts.subsumes(ts.getType(CAS.TYPE_NAME_STRING), range)) {
                throw new IllegalArgumentException("The feature '" + current.getName() + ":" + step + "' ends the "
                        + "part-of-speech path '" + pathText + "' (parameter '" + param + "') but holds "
                        + range.getName() + ", not a string; extend the path to the feature that holds the tag string");
            }
            if (!lastStep && (range.isPrimitive() || range.isArray())) {
                throw new IllegalArgumentException("The feature '" + current.getName() + ":" + step + "' in the "
                        + "part-of-speech path '" + pathText + "' (parameter '" + param + "') holds "
                        + range.getName() + ", which has no features to follow; only the last step may be a string");
            }
            path[i] = feature;
            current = range;
        }
        return path;
    }
}
