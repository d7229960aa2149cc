package dev.tether.treebank;

import dev.tether.attachment.AttachmentExample;
import dev.tether.attachment.AttachmentQuery;
import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;
import dev.tether.candidates.HeadCandidateProposer;
import dev.tether.candidates.PrepositionCandidates;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * Turns gold dependency trees into supervised training events for head choice: the proposer runs on the forms and
 * language-specific tags (Penn Treebank tags in English treebanks) exactly as it does at run time, and each gold
 * attachment becomes an {@link AttachmentExample} over the candidates it proposes for that preposition, plus a
 * {@link LabelledQuadruple} when the candidates form the classic quadruple and the gold head is its verb or noun.
 */
public final class TreebankExampleExtractor {
    private final HeadCandidateProposer proposer;
    private final GoldAttachmentExtractor gold = new GoldAttachmentExtractor();

    public TreebankExampleExtractor(HeadCandidateProposer proposer) {
        this.proposer = proposer;
    }

    /** Events from every sentence of a CoNLL-U file (plain or gzip). */
    public TreebankExamples extract(Path conllu) throws IOException {
        TreebankExamples out = new TreebankExamples();
        try (ConlluReader reader = ConlluReader.open(conllu)) {
            for (TreebankSentence s = reader.next(); s != null; s = reader.next()) add(s, out);
        }
        return out;
    }

    /** Adds the events of one sentence to {@code out}. */
    public void add(TreebankSentence s, TreebankExamples out) {
        List<GoldAttachment> attachments = gold.extract(s);
        if (attachments.isEmpty()) return;
        String[] words = s.forms();
        String[] tags = s.xposTags();
        PrepositionCandidates[] byPreposition = new PrepositionCandidates[words.length];
        for (PrepositionCandidates c : proposer.proposeAll(words, tags)) byPreposition[c.preposition()] = c;
        for (GoldAttachment g : attachments) {
            out.countGold();
            PrepositionCandidates c = byPreposition[g.preposition()];
            if (c == null) {
                out.countMissed();
                continue;
            }
            String source = s.location(g.preposition());
            out.addExample(new AttachmentExample(AttachmentQuery.of(words, tags, c), c.indexOf(g.head()), source));
            if (c.isQuadruple() && c.object() >= 0) {
                AttachmentSite site = g.head() == c.quadrupleVerb() ? AttachmentSite.VERB
                        : g.head() == c.quadrupleNoun() ? AttachmentSite.NOUN : null;
                if (site != null) {
                    Quadruple q = new Quadruple(words[c.quadrupleVerb()], words[c.quadrupleNoun()],
                            words[c.preposition()], words[c.object()]);
                    out.addQuadruple(new LabelledQuadruple(q, site, source));
                }
            }
        }
    }
}
