package dev.tether.treebank;

import dev.tether.coordination.ConjunctCandidateProposer;
import dev.tether.coordination.ConjunctPair;
import dev.tether.coordination.CoordinatorCandidates;
import dev.tether.coordination.ScopeCandidate;

import java.nio.file.Path;
import java.util.List;

/**
 * One-off measurement of the conjunct candidate proposer on a CoNLL-U file with gold Penn tags: gold coordinations,
 * how often the coordinator is proposed, the gold last conjunct among its readings, the gold pair among the
 * candidates, candidate counts, and how many gold scope words the gold pair's candidates cover. Run by hand:
 * {@code java -cp models/target/classes:models/target/test-classes:<trove jar> dev.tether.treebank.CoordinationSplitMeasurement FILE}.
 */
public final class CoordinationSplitMeasurement {
    private static String window(TreebankSentence s, int from, int to) {
        StringBuilder b = new StringBuilder();
        for (int k = Math.max(0, from); k < Math.min(s.size(), to); k++) b.append(s.form(k)).append('/').append(s.xpos(k)).append(' ');
        return b.toString();
    }

    public static void main(String[] args) throws Exception {
        List<TreebankSentence> sentences = ConlluReader.readAll(Path.of(args[0]));
        GoldCoordinationExtractor gold = new GoldCoordinationExtractor();
        ConjunctCandidateProposer proposer = new ConjunctCandidateProposer();
        int n = 0, proposed = 0, rightFound = 0, pairFound = 0, candidates = 0, scope = 0, scopeCovered = 0, shared = 0;
        int leftSpan = 0, rightSpan = 0;
        for (TreebankSentence s : sentences) {
            CoordinatorCandidates[] by = new CoordinatorCandidates[s.size()];
            for (CoordinatorCandidates c : proposer.proposeAll(s.forms(), s.xposTags())) by[c.coordinator()] = c;
            for (GoldCoordination g : gold.extract(s)) {
                n++;
                scope += g.modifiers().length;
                for (boolean b : g.shared()) if (b) shared++;
                CoordinatorCandidates c = by[g.coordinator()];
                if (c == null) {
                    if (System.getenv("SHOW") != null) System.out.println("NOPROP " + s.form(g.coordinator()) + "/" + s.xpos(g.coordinator()) + " c=" + g.coordinator() + " n=" + s.size() + " R=" + s.form(g.right()) + "/" + s.xpos(g.right()) + " :: " + window(s, g.coordinator() - 4, g.coordinator() + 6));
                    continue;
                }
                proposed++;
                candidates += c.size();
                boolean right = false;
                for (ConjunctPair p : c.pairs()) right |= p.right() == g.right();
                if (right) rightFound++;
                else if (System.getenv("SHOW") != null) {
                    StringBuilder b = new StringBuilder("NORIGHT gold=" + s.form(g.right()) + "/" + s.xpos(g.right()) + " got");
                    for (ConjunctPair p : c.pairs()) if (b.indexOf("|" + p.right() + "|") < 0) b.append(" |" + p.right() + "| " + s.form(p.right()));
                    b.append("  :: ");
                    for (int k = g.coordinator(); k < Math.min(s.size(), g.coordinator() + 8); k++) b.append(s.form(k)).append('/').append(s.xpos(k)).append(' ');
                    System.out.println(b);
                }
                int i = c.indexOf(g.left(), g.right());
                if (i < 0) {
                    if (right && System.getenv("SHOW") != null) System.out.println("NOLEFT gold=" + s.form(g.left()) + "/" + s.xpos(g.left())
                            + " right=" + s.form(g.right()) + " :: " + window(s, g.left() - 2, g.coordinator() + 3));
                    continue;
                }
                pairFound++;
                ConjunctPair p = c.pair(i);
                if (p.rightBegin() == g.rightBegin() && p.rightEnd() == g.rightEnd()) rightSpan++;
                if (p.leftEnd() == g.leftEnd()) leftSpan++;
                for (int m : g.modifiers()) {
                    for (ScopeCandidate sc : p.modifiers()) if (sc.token() == m) scopeCovered++;
                }
            }
        }
        System.out.printf("gold %d, coordinator proposed %d, last conjunct among readings %d (%.1f%%), pair among candidates %d (%.1f%%), "
                        + "average candidates %.1f; scope words %d (shared %d), covered by the gold pair's candidates %d; "
                        + "right span right %d, left end right %d%n",
                n, proposed, rightFound, 100.0 * rightFound / n, pairFound, 100.0 * pairFound / n,
                (double) candidates / Math.max(1, proposed), scope, shared, scopeCovered, rightSpan, leftSpan);
    }
}
