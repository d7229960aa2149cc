package dev.tether.treebank;

import dev.tether.attachment.AttachmentExample;
import dev.tether.candidates.HeadClass;
import dev.tether.candidates.HeadCandidateProposer;

import java.nio.file.Path;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * One-off measurement on a CoNLL-U file (the development split of UD English EWT): gold attachment count, the
 * nearest-noun-or-verb baseline and the two-way verb/noun ceiling with gold universal tags, and the proposer's
 * candidate recall and size with gold Penn tags. Run by hand:
 * {@code java -cp models/target/classes:models/target/test-classes:<trove jar> dev.tether.treebank.DevSplitMeasurement FILE}.
 */
public final class DevSplitMeasurement {
    public static void main(String[] args) throws Exception {
        Path file = Path.of(args[0]);
        List<TreebankSentence> sentences = ConlluReader.readAll(file);
        GoldAttachmentExtractor gold = new GoldAttachmentExtractor();
        int n = 0, nearest = 0, ceiling = 0;
        Map<HeadClass, Integer> byClass = new EnumMap<>(HeadClass.class);
        int otherClass = 0, after = 0;
        for (TreebankSentence s : sentences) {
            for (GoldAttachment g : gold.extract(s)) {
                n++;
                if (g.headClass() == null) otherClass++; else byClass.merge(g.headClass(), 1, Integer::sum);
                if (g.head() > g.preposition()) after++;
                int nv = -1, nn = -1, near = -1;
                for (int k = g.preposition() - 1; k >= 0; k--) {
                    HeadClass c = GoldAttachmentExtractor.headClass(s.upos(k));
                    if (c == HeadClass.VERB && nv < 0) nv = k;
                    if (c == HeadClass.NOUN && nn < 0) nn = k;
                    if ((c == HeadClass.VERB || c == HeadClass.NOUN) && near < 0) near = k;
                }
                if (near == g.head()) nearest++;
                if (g.head() == nv || g.head() == nn) ceiling++;
            }
        }
        System.out.printf("sentences %d, gold attachments %d, heads by class %s, other %d, head after preposition %d%n",
                sentences.size(), n, byClass, otherClass, after);
        System.out.printf("nearest noun-or-verb %d (%.4f); best of nearest verb/noun %d (%.4f)%n",
                nearest, (double) nearest / n, ceiling, (double) ceiling / n);
        TreebankExampleExtractor extractor = new TreebankExampleExtractor(new HeadCandidateProposer());
        TreebankExamples examples = extractor.extract(file);
        System.out.println(examples);
        int[] rank = new int[12];
        for (AttachmentExample e : examples.examples()) if (e.gold() >= 0) rank[Math.min(e.gold(), 11)]++;
        System.out.println("gold rank among candidates: " + java.util.Arrays.toString(rank));
        int v = 0;
        for (var q : examples.quadruples()) if (q.site() == dev.tether.attachment.AttachmentSite.VERB) v++;
        System.out.printf("quadruples %d (V %d, N %d)%n", examples.quadruples().size(), v, examples.quadruples().size() - v);
        long t0 = System.nanoTime();
        int props = 0;
        HeadCandidateProposer p = new HeadCandidateProposer();
        for (int r = 0; r < 5; r++) for (TreebankSentence s : sentences) props += p.proposeAll(s.forms(), s.xposTags()).size();
        System.out.printf("proposed prepositions per pass %d; %.1f ms per pass%n", props / 5, (System.nanoTime() - t0) / 5e6);
    }
}
