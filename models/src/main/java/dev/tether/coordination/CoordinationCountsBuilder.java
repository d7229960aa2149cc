package dev.tether.coordination;

import dev.tether.candidates.HeadClass;
import dev.tether.treebank.GoldCoordination;
import dev.tether.treebank.GoldCoordinationExtractor;
import dev.tether.treebank.TreebankSentence;
import dev.tether.vocabulary.Vocabulary;
import dev.tether.vocabulary.WordNormalizer;
import gnu.trove.map.hash.TLongIntHashMap;

/**
 * Counts {@link CoordinationCounts} from gold trees, in total and per fold (so a training event can read the counts
 * of the other folds, see {@link CoordinationCounts#without}). Words are keyed as {@link CoordinationWords} keys
 * them. Add sentences in a fixed order for the same ids every run. Not thread-safe.
 */
public final class CoordinationCountsBuilder {
    private final Vocabulary words = new Vocabulary();
    private final TLongIntHashMap total = new TLongIntHashMap(1 << 16, 0.5f, Long.MIN_VALUE, 0);
    private final TLongIntHashMap[] folds;
    private final CoordinationWords keys = new CoordinationWords(new WordNormalizer());
    private final GoldCoordinationExtractor gold = new GoldCoordinationExtractor();

    public CoordinationCountsBuilder(int folds) {
        this.folds = new TLongIntHashMap[folds];
        for (int f = 0; f < folds; f++) this.folds[f] = new TLongIntHashMap(1 << 14, 0.5f, Long.MIN_VALUE, 0);
    }

    /** Counts one gold sentence into the totals and into fold {@code fold} (-1: no fold). */
    public void add(TreebankSentence s, int fold) {
        int n = s.size();
        int[] ids = new int[n];
        HeadClass[] classes = new HeadClass[n];
        for (int i = 0; i < n; i++) {
            classes[i] = ConjunctCandidateProposer.classOfTag(s.xpos(i));
            if (classes[i] != null) {
                ids[i] = words.add(keys.key(s.form(i), s.xpos(i)));
                put(CoordinationCounts.key(CoordinationCounts.OCCURRENCE, ids[i], 0, classes[i].ordinal()), fold);
            }
        }
        for (GoldCoordination g : gold.extract(s)) {
            int l = g.left();
            int r = g.right();
            if (classes[l] == null || classes[r] == null) continue;
            put(CoordinationCounts.pair(ids[l], classes[l], ids[r], classes[r]), fold);
            put(CoordinationCounts.key(CoordinationCounts.CONJUNCT, ids[l], 0, classes[l].ordinal()), fold);
            put(CoordinationCounts.key(CoordinationCounts.CONJUNCT, ids[r], 0, classes[r].ordinal()), fold);
        }
        for (int d = 0; d < n; d++) {
            int h = s.head(d);
            if (h < 0 || classes[h] == null || classes[d] == null) continue;
            String rel = s.relation(d);
            ModifierKind kind = d < h ? beforeKind(rel) : afterKind(rel);
            if (kind == null) continue;
            put(CoordinationCounts.key(CoordinationCounts.MODIFIER, ids[d], ids[h], kind.ordinal()), fold);
            if (kind == ModifierKind.PREPOSITIONAL) {
                for (int k = 0; k < d; k++) {
                    if (s.head(k) == d && s.relation(k).equals("case")) {
                        int p = words.add(keys.preposition(s.form(k)));
                        put(CoordinationCounts.key(CoordinationCounts.PREPOSITION, p, ids[h], 0), fold);
                    }
                }
            }
        }
    }

    private static ModifierKind beforeKind(String relation) {
        switch (relation) {
            case "amod": case "compound": case "nummod": case "nmod:poss": return ModifierKind.PREMODIFIER;
            case "nsubj": case "nsubj:pass": case "expl": return ModifierKind.SUBJECT;
            default: return null;
        }
    }

    private static ModifierKind afterKind(String relation) {
        if (relation.equals("obj")) return ModifierKind.OBJECT;
        if (relation.equals("nmod:poss")) return null;
        return relation.startsWith("nmod") || relation.startsWith("obl") ? ModifierKind.PREPOSITIONAL : null;
    }

    private void put(long key, int fold) {
        total.adjustOrPutValue(key, 1, 1);
        if (fold >= 0) folds[fold].adjustOrPutValue(key, 1, 1);
    }

    /** All counts, with a frozen copy of the vocabulary. */
    public CoordinationCounts build() {
        return new CoordinationCounts(words.frozenCopy(), new TLongIntHashMap(total));
    }

    /** The counts of fold {@code f} alone (same vocabulary as {@link #build}). */
    public CoordinationCounts fold(int f, CoordinationCounts all) {
        return new CoordinationCounts(all.words(), new TLongIntHashMap(folds[f]));
    }
}
