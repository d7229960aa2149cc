package dev.tether.attachment;

import dev.tether.candidates.HeadClass;
import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.HeadChoiceCountsBuilder;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.QuadrupleCountsBuilder;
import dev.tether.ranking.CandidateFeatures;
import dev.tether.similarity.ContextCounter;
import dev.tether.similarity.Thesaurus;
import dev.tether.similarity.ThesaurusBuilder;
import dev.tether.similarity.ThesaurusSettings;
import dev.tether.vocabulary.WordNormalizer;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The four similar-words pools of {@link AttachmentFeatureExtractor}, value by value, on an invented ferry-log case
 * ("fitted the valve with a flange"). The expected values are computed here from the definitions in the extractor's
 * Javadoc — over the thesaurus's nearest neighbours, the similarity-weighted hits and cases of the training records
 * that match each pool — from a plain list of records, not from the count tables, so a wrong table key shows.
 */
class SimilarWordsPoolsTest {
    private static final WordNormalizer NORMALIZER = new WordNormalizer();
    private static final String[] VERBS = {"fitted", "replaced", "mounted", "bolted", "cleaned", "greased"};
    private static final String[] NOUNS = {"valve", "gasket", "seal", "flange", "hose", "pump", "bearing", "filter"};

    /** One training case of a candidate: head key, class, object key, hits, cases (preposition "with"). */
    private record Case(String head, HeadClass headClass, String object, double hits, double trials) {
    }

    private static Thesaurus thesaurus() {
        ContextCounter counter = new ContextCounter();
        Random r = new Random(11);
        String[] crew = {"engineer", "mechanic", "deckhand"};
        for (int i = 0; i < 3000; i++) {
            counter.addSentence(new String[] {"The", crew[r.nextInt(3)], VERBS[r.nextInt(VERBS.length)], "the", "old",
                            NOUNS[r.nextInt(NOUNS.length)], "."},
                    new String[] {"DT", "NN", "VBD", "DT", "JJ", "NN", "."});
        }
        return ThesaurusBuilder.build(counter, ThesaurusSettings.DEFAULT.withMinFrequency(3).withMaxContextWords(1000), 1);
    }

    /** Random cases of every verb and noun with every object, and the exact ones fixed to give each seen level. */
    private static List<Case> cases() {
        Random r = new Random(5);
        List<Case> out = new ArrayList<>();
        for (String object : NOUNS) {
            String o = NORMALIZER.noun(object);
            for (String v : VERBS) {
                if (v.equals("fitted")) continue;
                int t = 1 + r.nextInt(6);
                out.add(new Case(NORMALIZER.verb(v), HeadClass.VERB, o, r.nextInt(t + 1), t));
            }
            for (String n : NOUNS) {
                if (n.equals("valve") || n.equals(object)) continue;
                int t = 1 + r.nextInt(6);
                out.add(new Case(NORMALIZER.noun(n), HeadClass.NOUN, o, r.nextInt(t + 1), t));
            }
        }
        // The candidates' own counts: 'fitted' seen 7 times with 'with' (five or more), 'valve' twice (under five),
        // and neither ever with the object 'flange' (nothing).
        out.add(new Case(NORMALIZER.verb("fitted"), HeadClass.VERB, NORMALIZER.noun("hose"), 5, 7));
        out.add(new Case(NORMALIZER.noun("valve"), HeadClass.NOUN, NORMALIZER.noun("pump"), 1, 2));
        return out;
    }

    private static HeadChoiceCounts counts(List<Case> cases, List<String> wordsFirst) {
        HeadChoiceCountsBuilder b = new HeadChoiceCountsBuilder();
        // Words added first under another preposition shift every word id, so statistics and lexicon ids differ.
        for (String w : wordsFirst) b.addLexical("during", w, HeadClass.NOUN.ordinal(), w, false, 1);
        for (Case c : cases) b.addLexical("with", c.head(), c.headClass().ordinal(), c.object(), c.hits(), c.trials());
        return b.build();
    }

    /** {hits, cases} of the pool of {@code slot} for the candidate (head, class), by the Javadoc's definition. */
    private static double[] expected(int slot, String head, HeadClass c, String object, List<Case> cases, Thesaurus t) {
        boolean byHead = slot == AttachmentFeature.SIMILAR_HEAD || slot == AttachmentFeature.SIMILAR_HEAD_WITH_OBJECT;
        int entry = byHead ? t.id(c, head) : t.id(HeadClass.NOUN, object);
        double[] pool = new double[2];
        int k = Math.min(AttachmentFeatureExtractor.NEIGHBOURS, t.neighbourCount(entry));
        for (int j = 0; j < k; j++) {
            String neighbour = t.key(t.neighbourId(entry, j));
            double s = t.neighbourScore(entry, j);
            if (!(s > 0)) continue;
            for (Case x : cases) {
                if (x.headClass() != c) continue;
                boolean match = switch (slot) {
                    case AttachmentFeature.SIMILAR_HEAD -> x.head().equals(neighbour);
                    case AttachmentFeature.SIMILAR_HEAD_WITH_OBJECT -> x.head().equals(neighbour) && x.object().equals(object);
                    case AttachmentFeature.SIMILAR_OBJECT -> x.head().equals(head) && x.object().equals(neighbour);
                    default -> x.object().equals(neighbour);
                };
                if (match) {
                    pool[0] += s * x.hits();
                    pool[1] += s * x.trials();
                }
            }
        }
        return pool;
    }

    /** The exact level's seen bucket, by definition: 0 no cases, 1 under five, 2 five or more. */
    private static int seen(int slot, String head, HeadClass c, String object, List<Case> cases) {
        double trials = 0;
        for (Case x : cases) {
            if (x.headClass() != c) continue;
            boolean match = switch (slot) {
                case AttachmentFeature.SIMILAR_HEAD -> x.head().equals(head);
                case AttachmentFeature.SIMILAR_CLASS_OBJECT -> x.object().equals(object);
                default -> x.head().equals(head) && x.object().equals(object);
            };
            if (match) trials += x.trials();
        }
        return trials == 0 ? 0 : trials < 5 ? 1 : 2;
    }

    @Test
    void everyPoolHoldsTheSimilarityWeightedCasesOfItsNeighboursUnderItsSeenLevel() {
        Thesaurus t = thesaurus();
        List<Case> cases = cases();
        HeadChoiceCounts statistics = counts(cases, List.of());
        HeadChoiceCounts lexicon = counts(cases, List.of("anchor", "bollard", "cleat", "davit"));
        assertFalse(statistics.words().id("valve") == lexicon.words().id("valve"), "the fixture gives the two count sets other ids");
        QuadrupleCountsBuilder q4 = new QuadrupleCountsBuilder();
        q4.add("replaced", "valve", "with", "flange", AttachmentSite.VERB, 2);
        q4.add("bolted", "hose", "with", "flange", AttachmentSite.VERB, 2);
        q4.add("replaced", "gasket", "with", "flange", AttachmentSite.NOUN, 1);
        QuadrupleCounts quadruples = q4.build();
        AttachmentFeatureExtractor extractor = new AttachmentFeatureExtractor(statistics, quadruples, lexicon, NORMALIZER,
                EnumSet.of(AttachmentFeatureFamily.SIMILAR_WORDS), t);

        AttachmentQuery q = AttachmentQuery.builder("with", "flange").objectTag("NN")
                .candidate("valve", "NN", HeadClass.NOUN, 2, false)
                .candidate("fitted", "VBD", HeadClass.VERB, 4, false)
                .quadruple(1, 0).build();
        CandidateFeatures f = new CandidateFeatures();
        extractor.extract(q, f);

        String object = NORMALIZER.noun("flange");
        String[] heads = {NORMALIZER.noun("valve"), NORMALIZER.verb("fitted")};
        HeadClass[] classes = {HeadClass.NOUN, HeadClass.VERB};
        Set<Integer> levelsSeen = new HashSet<>();
        for (int i = 0; i < 2; i++) {
            for (int slot = AttachmentFeature.SIMILAR_HEAD; slot <= AttachmentFeature.SIMILAR_CLASS_OBJECT; slot++) {
                double[] pool = expected(slot, heads[i], classes[i], object, cases, t);
                int level = seen(slot, heads[i], classes[i], object, cases);
                levelsSeen.add(level);
                assertTrue(pool[1] > 0, "the fixture gives pool " + slot + " of candidate " + i + " some cases");
                int c = classes[i].ordinal();
                String where = "candidate " + heads[i] + ", pool " + slot;
                assertEquals(Math.log((pool[0] + 0.5) / (pool[1] - pool[0] + 0.5)),
                        f.valueOf(i, AttachmentFeature.SIMILAR_LOG_ODDS.key(slot, level, c)), 1e-9, where);
                assertEquals(Math.log1p(pool[1]), f.valueOf(i, AttachmentFeature.SIMILAR_TRIALS.key(slot, level, c)), 1e-9, where);
                for (int other = 0; other < 3; other++) {
                    if (other == level) continue;
                    assertEquals(0, f.valueOf(i, AttachmentFeature.SIMILAR_TRIALS.key(slot, other, c)), 0.0, where + ": only its own level");
                }
            }
        }
        assertEquals(Set.of(0, 1, 2), levelsSeen, "the fixture exercises every seen level");

        // The quadruple estimate: 'fitted valve with flange' was never seen; its neighbours' quadruples decide.
        SimilarityBackedOffScorer smoothed = new SimilarityBackedOffScorer(quadruples, t, NORMALIZER, AttachmentFeatureExtractor.NEIGHBOURS,
                SimilarityBackedOffScorer.MIN_TRIPLE_TRIALS, SimilarityBackedOffScorer.POWER, SimilarityBackedOffScorer.PAIR_BLEND);
        QuadrupleDecision d = smoothed.decide(new Quadruple("fitted", "valve", "with", "flange"));
        assertTrue(d.basis() == DecisionBasis.SIMILAR_QUADRUPLES || d.basis() == DecisionBasis.SIMILAR_TRIPLES,
                "the fixture's quadruple is decided by its neighbours: " + d.basis());
        double pn = Math.max(1e-3, Math.min(1 - 1e-3, d.nounProbability()));
        double logit = Math.log(pn / (1 - pn));
        assertEquals(logit, f.valueOf(0, AttachmentFeature.SIMILAR_QUADRUPLE_ESTIMATE.key(d.basis().ordinal(), 1, 0)), 1e-9);
        assertEquals(-logit, f.valueOf(1, AttachmentFeature.SIMILAR_QUADRUPLE_ESTIMATE.key(d.basis().ordinal(), 0, 0)), 1e-9);

        // The evidence names the heaviest neighbour of a pool first.
        List<String> named = extractor.neighboursBehind(AttachmentFeature.SIMILAR_TRIALS.key(AttachmentFeature.SIMILAR_HEAD,
                seen(AttachmentFeature.SIMILAR_HEAD, heads[1], HeadClass.VERB, object, cases), HeadClass.VERB.ordinal()), q, 1, 3);
        assertFalse(named.isEmpty(), "the evidence names the neighbours behind the verb's pool");
        String heaviest = null;
        double most = -1;
        int entry = t.id(HeadClass.VERB, heads[1]);
        for (int j = 0; j < Math.min(AttachmentFeatureExtractor.NEIGHBOURS, t.neighbourCount(entry)); j++) {
            String n = t.key(t.neighbourId(entry, j));
            double w = 0;
            for (Case x : cases) if (x.headClass() == HeadClass.VERB && x.head().equals(n)) w += t.neighbourScore(entry, j) * x.trials();
            if (w > most) {
                most = w;
                heaviest = n;
            }
        }
        assertTrue(named.get(0).startsWith(heaviest + " ("), named + " should start with " + heaviest);
        assertFalse(extractor.neighboursBehind(AttachmentFeature.SIMILAR_QUADRUPLE_ESTIMATE.key(d.basis().ordinal(), 1, 0), q, 0, 3).isEmpty(),
                "and the neighbours behind the quadruple estimate");
    }
}
