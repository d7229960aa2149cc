package dev.tether.treebank;

import dev.tether.coordination.ConjunctCandidateProposer;
import dev.tether.coordination.ConjunctPair;
import dev.tether.coordination.CoordinationExample;
import dev.tether.coordination.CoordinationQuery;
import dev.tether.coordination.CoordinatorCandidates;

import java.util.ArrayList;
import java.util.List;

/**
 * Turns gold trees into coordination training events: the proposer runs on the forms and Penn tags exactly as at run
 * time, and each gold coordination whose coordinator it proposed becomes a {@link CoordinationExample} over its
 * candidates, with the tree's scope decisions for the modifiers of the gold pair.
 */
public final class CoordinationExampleExtractor {
    private final ConjunctCandidateProposer proposer;
    private final GoldCoordinationExtractor gold = new GoldCoordinationExtractor();

    public CoordinationExampleExtractor(ConjunctCandidateProposer proposer) {
        this.proposer = proposer;
    }

    /** The events of one sentence. */
    public List<CoordinationExample> extract(TreebankSentence s) {
        List<GoldCoordination> all = gold.extract(s);
        List<CoordinationExample> out = new ArrayList<>();
        if (all.isEmpty()) return out;
        String[] words = s.forms();
        String[] tags = s.xposTags();
        CoordinatorCandidates[] by = new CoordinatorCandidates[words.length];
        for (CoordinatorCandidates c : proposer.proposeAll(words, tags)) by[c.coordinator()] = c;
        for (GoldCoordination g : all) {
            CoordinatorCandidates c = by[g.coordinator()];
            if (c == null) continue;
            int index = c.indexOf(g.left(), g.right());
            Boolean[] shared = new Boolean[0];
            if (index >= 0) {
                ConjunctPair p = c.pair(index);
                shared = new Boolean[p.modifiers().length];
                for (int m = 0; m < shared.length; m++) {
                    for (int k = 0; k < g.modifiers().length; k++) {
                        if (g.modifiers()[k] == p.modifiers()[m].token() && g.kinds()[k] == p.modifiers()[m].kind()) shared[m] = g.shared()[k];
                    }
                }
            }
            out.add(new CoordinationExample(new CoordinationQuery(words, tags, c), index, shared, s.location(g.coordinator())));
        }
        return out;
    }
}
