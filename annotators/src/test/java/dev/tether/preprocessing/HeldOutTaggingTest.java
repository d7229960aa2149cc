package dev.tether.preprocessing;

import dev.tether.treebank.ConlluReader;
import dev.tether.treebank.TreebankSentence;
import opennlp.tools.postag.POSTagFormat;
import opennlp.tools.postag.POSTaggerME;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Held-out tagging of the invented, hand-tagged ferry-log treebank: each fold is tagged by a tagger trained on the
 * other folds only (the jackknife of common practice), so its tags are as wrong as a new text's would be, not as right
 * as the training text's; everything but column 5 stays as it was.
 */
class HeldOutTaggingTest {
    private static List<TreebankSentence> fixture() throws Exception {
        return ConlluReader.readAll(Path.of(HeldOutTaggingTest.class.getResource("/dev/tether/preprocessing/ferry-logs-tagged.conllu").toURI()));
    }

    private static double agreement(List<TreebankSentence> gold, List<TreebankSentence> tagged) {
        long same = 0, all = 0;
        for (int s = 0; s < gold.size(); s++) {
            for (int i = 0; i < gold.get(s).size(); i++) {
                all++;
                if (gold.get(s).xpos(i).equals(tagged.get(s).xpos(i))) same++;
            }
        }
        return (double) same / all;
    }

    /**
     * The fixture with, in each sentence of its last fifth, the first common noun replaced by the invented word
     * "kelvor" tagged {@code VBZ}: a word only that fold has, with a tag its context does not suggest, so a tagger that
     * saw the fold can learn it and one that did not cannot.
     */
    private static List<TreebankSentence> withAWordOnlyTheLastFoldHas() throws Exception {
        List<TreebankSentence> sentences = new java.util.ArrayList<>(fixture());
        int n = sentences.size();
        for (int s = n * 4 / 5; s < n; s++) {
            TreebankSentence t = sentences.get(s);
            String[] forms = t.forms();
            String[] xpos = t.xposTags();
            for (int i = 0; i < forms.length; i++) {
                if (!xpos[i].equals("NN")) continue;
                forms[i] = "kelvor";
                xpos[i] = "VBZ";
                break;
            }
            int size = t.size();
            String[] relations = new String[size];
            int[] heads = new int[size], begins = new int[size], ends = new int[size], lines = new int[size];
            for (int i = 0; i < size; i++) {
                relations[i] = t.relation(i);
                heads[i] = t.head(i);
                begins[i] = t.begin(i);
                ends[i] = t.end(i);
                lines[i] = t.line(i);
            }
            sentences.set(s, new TreebankSentence(t.source(), t.text(), forms, t.uposTags(), xpos, heads, relations, begins, ends, lines));
        }
        return sentences;
    }

    @Test
    void eachFoldIsTaggedByATaggerThatNeverSawIt() throws Exception {
        List<TreebankSentence> sentences = withAWordOnlyTheLastFoldHas();
        int n = sentences.size();
        List<TreebankSentence> retagged = HeldOutTagging.retag(sentences, 5, "ferry-logs-tagged.conllu");
        assertEquals(n, retagged.size());
        for (int s = 0; s < n; s++) {
            TreebankSentence a = sentences.get(s), b = retagged.get(s);
            assertArrayEquals(a.forms(), b.forms());
            assertEquals(a.text(), b.text());
            for (int i = 0; i < a.size(); i++) {
                assertEquals(a.head(i), b.head(i));
                assertEquals(a.relation(i), b.relation(i));
                assertEquals(a.line(i), b.line(i));
            }
        }
        assertEquals(retagged, HeldOutTagging.retag(sentences, 5, "ferry-logs-tagged.conllu"), "the same sentences get the same tags");

        // The last fold, tagged again by hand: by a tagger of the other four folds, and by one of all five.
        int from = n * 4 / 5;
        List<TreebankSentence> lastFold = sentences.subList(from, n);
        List<TreebankSentence> lastRetagged = retagged.subList(from, n);
        TreebankTaggerTrainer others = new TreebankTaggerTrainer(HeldOutTagging.ITERATIONS);
        others.add("others", sentences.subList(0, from));
        POSTaggerME heldOut = new POSTaggerME(PosModelBytes.unpack(others.train()), POSTagFormat.PENN);
        for (int s = 0; s < lastFold.size(); s++) {
            assertArrayEquals(heldOut.tag(lastFold.get(s).forms()), lastRetagged.get(s).xposTags(), "sentence " + (from + s));
        }
        TreebankTaggerTrainer everything = new TreebankTaggerTrainer(HeldOutTagging.ITERATIONS);
        everything.add("all", sentences);
        POSTaggerME sawIt = new POSTaggerME(PosModelBytes.unpack(everything.train()), POSTagFormat.PENN);
        List<TreebankSentence> byOneThatSawIt = lastFold.stream().map(t -> t.withXposTags(sawIt.tag(t.forms()))).toList();
        double heldOutAgreement = agreement(lastFold, lastRetagged);
        double seenAgreement = agreement(lastFold, byOneThatSawIt);
        assertTrue(heldOutAgreement < seenAgreement,
                "held-out tags agree less with the treebank (" + heldOutAgreement + ") than a tagger that saw the fold (" + seenAgreement + ")");
        assertTrue(heldOutAgreement > 0.6, "but a held-out tagger still tags most words right: " + heldOutAgreement);
    }

    @Test
    void fewerThanTwoFoldsIsRefused() throws Exception {
        assertThrows(IllegalArgumentException.class, () -> HeldOutTagging.retag(fixture(), 1, "ferry-logs-tagged.conllu"));
    }

    @Test
    void theFoldTaggersStopAfterTheirOwnIterations() throws Exception {
        // The fold taggers train for fewer iterations than the model's own tagger (that keeps training the default
        // model under two minutes). A fold is tagged by a tagger of exactly the iterations asked for: one iteration
        // gives the tags of a one-iteration tagger, and they agree with the treebank less than a full tagger's.
        List<TreebankSentence> sentences = withAWordOnlyTheLastFoldHas();
        int n = sentences.size(), from = n * 4 / 5;
        List<TreebankSentence> once = HeldOutTagging.retag(sentences, 5, 1, "ferry-logs-tagged.conllu");
        List<TreebankSentence> full = HeldOutTagging.retag(sentences, 5, TreebankTaggerTrainer.ITERATIONS, "ferry-logs-tagged.conllu");
        TreebankTaggerTrainer others = new TreebankTaggerTrainer(1);
        others.add("others", sentences.subList(0, from));
        POSTaggerME oneIteration = new POSTaggerME(PosModelBytes.unpack(others.train()), POSTagFormat.PENN);
        for (int s = from; s < n; s++) {
            assertArrayEquals(oneIteration.tag(sentences.get(s).forms()), once.get(s).xposTags(), "sentence " + s);
        }
        double onceAgreement = agreement(sentences, once), fullAgreement = agreement(sentences, full);
        assertTrue(onceAgreement < fullAgreement, "one iteration (" + onceAgreement + ") against "
                + TreebankTaggerTrainer.ITERATIONS + " (" + fullAgreement + ")");
        assertTrue(HeldOutTagging.ITERATIONS < TreebankTaggerTrainer.ITERATIONS);
        assertThrows(IllegalArgumentException.class, () -> new TreebankTaggerTrainer(0));
    }
}
