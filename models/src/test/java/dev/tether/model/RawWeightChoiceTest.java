package dev.tether.model;

import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.QuadrupleCountsBuilder;
import dev.tether.vocabulary.WordNormalizer;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The raw weight is chosen on folds of the labelled quadruples: raw counts that decide held-out cases the labelled
 * counts get wrong get a weight, raw counts that only contradict the labels get none (weight 0). Invented ferry-log
 * quadruples.
 */
class RawWeightChoiceTest {
    private final WordNormalizer normalizer = new WordNormalizer();

    /** A letter suffix that makes word {@code i} unique (the normalizer folds digits, so "pump7" would not be). */
    private static String tag(int i) {
        return "" + (char) ('a' + i / 26) + (char) ('a' + i % 26);
    }

    /**
     * Every word but the preposition is new to the other folds, so the labelled counts decide a held-out quadruple by
     * its preposition alone: "of" is always the noun's, "with" half the verb's ("replaced the gasket with a spare")
     * and half the noun's ("fitted the hose with a clamp"), which the preposition level gives to the noun.
     */
    private static List<LabelledQuadruple> labelled() {
        List<LabelledQuadruple> out = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            out.add(new LabelledQuadruple(new Quadruple("swapped" + tag(i), "gasket" + tag(i), "with", "spare" + tag(i)), AttachmentSite.VERB, "log"));
            out.add(new LabelledQuadruple(new Quadruple("fitted" + tag(i), "hose" + tag(i), "with", "clamp" + tag(i)), AttachmentSite.NOUN, "log"));
            out.add(new LabelledQuadruple(new Quadruple("checked" + tag(i), "seal" + tag(i), "of", "pump" + tag(i)), AttachmentSite.NOUN, "log"));
        }
        return out;
    }

    /** Raw counts of the exact quadruples: "swapped ... with" and "checked ... of" with the sites given, "fitted ... with" to the noun. */
    private QuadrupleCounts raw(AttachmentSite withSite, AttachmentSite ofSite) {
        QuadrupleCountsBuilder b = new QuadrupleCountsBuilder();
        for (int i = 0; i < 40; i++) {
            b.add(normalizer.verb("swapped" + tag(i)), normalizer.noun("gasket" + tag(i)), normalizer.preposition("with"), normalizer.noun("spare" + tag(i)), withSite, 1.0);
            b.add(normalizer.verb("fitted" + tag(i)), normalizer.noun("hose" + tag(i)), normalizer.preposition("with"), normalizer.noun("clamp" + tag(i)), AttachmentSite.NOUN, 1.0);
            b.add(normalizer.verb("checked" + tag(i)), normalizer.noun("seal" + tag(i)), normalizer.preposition("of"), normalizer.noun("pump" + tag(i)), ofSite, 1.0);
        }
        return b.build();
    }

    @Test
    void rawCountsThatAgreeWithTheLabelsOnTheHeldOutQuadruplesGetAWeight() {
        RawWeightChoice.Result r = RawWeightChoice.choose(labelled(), List.of(), raw(AttachmentSite.VERB, AttachmentSite.NOUN), normalizer);
        // Without raw counts most of the 40 "swapped ... with" cases go to the noun: about 80 of 120 right.
        assertTrue(r.withoutRaw() < 0.75, () -> "without raw " + r.withoutRaw());
        double best = 0;
        for (double x : r.accuracy()) best = Math.max(best, x);
        assertTrue(best > r.withoutRaw() + 0.2, () -> java.util.Arrays.toString(r.accuracy()));
        assertTrue(r.weight() > 0, () -> "weight " + r.weight() + " " + java.util.Arrays.toString(r.accuracy()));
        assertEquals(120, r.quadruples());
    }

    @Test
    void rawCountsThatOnlyContradictTheLabelsGetNoWeight() {
        // The raw text attaches these "with" cases to the noun (as the preposition level already does) and "of" to
        // the verb: at any weight it gains nothing and overturns the "of" decisions the labelled counts get right.
        RawWeightChoice.Result r = RawWeightChoice.choose(labelled(), List.of(), raw(AttachmentSite.NOUN, AttachmentSite.VERB), normalizer);
        assertEquals(0.0, r.weight());
        for (double a : r.accuracy()) assertTrue(a < r.withoutRaw(), () -> java.util.Arrays.toString(r.accuracy()));
    }
}
