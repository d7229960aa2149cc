package dev.tether.coordination;

import dev.tether.candidates.HeadClass;
import org.junit.jupiter.api.Test;

import java.util.Arrays;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The conjunct candidates on invented ferry-maintenance sentences, hand-tagged. */
class ConjunctCandidateProposerTest {
    private final ConjunctCandidateProposer proposer = new ConjunctCandidateProposer();

    private static final TaggedWords BEARINGS = TaggedWords.of(
            "Inspectors/NNS checked/VBD the/DT worn/JJ bearings/NNS and/CC seals/NNS on/IN the/DT pump/NN ./.");

    @Test
    void nominalCoordinationOffersTheNounPairWithItsPremodifierAndPhraseInQuestion() {
        List<CoordinatorCandidates> all = proposer.proposeAll(BEARINGS.words, BEARINGS.tags);
        assertEquals(1, all.size());
        CoordinatorCandidates c = all.get(0);
        assertEquals(BEARINGS.index("and"), c.coordinator());
        int i = c.indexOf(BEARINGS.index("bearings"), BEARINGS.index("seals"));
        assertTrue(i >= 0, "bearings + seals among the candidates");
        ConjunctPair p = c.pair(i);
        assertEquals(HeadClass.NOUN, p.leftClass());
        assertEquals(HeadClass.NOUN, p.rightClass());
        List<ScopeCandidate> m = Arrays.asList(p.modifiers());
        assertTrue(m.stream().anyMatch(s -> s.kind() == ModifierKind.PREMODIFIER && s.token() == BEARINGS.index("worn")), m::toString);
        assertTrue(m.stream().anyMatch(s -> s.kind() == ModifierKind.PREPOSITIONAL && s.token() == BEARINGS.index("pump")), m::toString);
        // "Inspectors" (the other noun before) is a candidate too: the ranker, not a rule, prefers "bearings".
        assertTrue(c.indexOf(BEARINGS.index("Inspectors"), BEARINGS.index("seals")) >= 0);
    }

    @Test
    void clauseAfterTheCoordinatorOffersItsVerbAndTheSubjectInQuestion() {
        TaggedWords s = TaggedWords.of("The/DT crew/NN inspected/VBD the/DT hull/NN and/CC replaced/VBD the/DT anodes/NNS ./.");
        CoordinatorCandidates c = proposer.proposeAll(s.words, s.tags).get(0);
        int i = c.indexOf(s.index("inspected"), s.index("replaced"));
        assertTrue(i >= 0);
        ConjunctPair p = c.pair(i);
        assertTrue(Arrays.stream(p.modifiers()).anyMatch(m -> m.kind() == ModifierKind.SUBJECT && m.token() == s.index("crew")));
        assertTrue(Arrays.stream(p.modifiers()).anyMatch(m -> m.kind() == ModifierKind.OBJECT && m.token() == s.index("anodes")));
    }

    @Test
    void anExistentialBeAfterAnAdverbHeadsItsClauseAndAnInformalBeIsACopula() {
        // UD makes an existential "be" the head of its clause, and the predicate, not the copula, the head of a
        // copular clause (https://universaldependencies.org/u/dep/expl.html, .../u/dep/cop.html).
        TaggedWords there = TaggedWords.of("The/DT pump/NN leaked/VBD and/CC there/EX still/RB are/VBP loose/JJ bolts/NNS ./.");
        CoordinatorCandidates c = proposer.proposeAll(there.words, there.tags).get(0);
        assertTrue(c.indexOf(there.index("leaked"), there.index("are")) >= 0, "the existential 'are' is a reading");
        assertTrue(c.indexOf(there.index("leaked"), there.index("bolts")) < 0, "its noun is not the clause's head");
        TaggedWords informal = TaggedWords.of("the/DT belt/NN slipped/VBD and/CC it/PRP s/VBZ loose/JJ now/RB");
        CoordinatorCandidates d = proposer.proposeAll(informal.words, informal.tags).get(0);
        assertTrue(d.indexOf(informal.index("slipped"), informal.index("loose")) >= 0, "the predicate after 's' is a reading");
    }

    @Test
    void aCoordinatorAtEitherEndOfTheSentenceGetsNoCandidates() {
        TaggedWords start = TaggedWords.of("And/CC the/DT ramp/NN jammed/VBD");
        TaggedWords end = TaggedWords.of("Check/VB the/DT ramp/NN and/CC");
        assertTrue(proposer.proposeAll(start.words, start.tags).isEmpty());
        assertTrue(proposer.proposeAll(end.words, end.tags).isEmpty());
    }

    @Test
    void tenCoordinatorsAndNestingStayBoundedPerCoordinator() {
        StringBuilder b = new StringBuilder("Deckhands/NNS cleaned/VBD");
        for (int i = 0; i < 10; i++) b.append(" valve").append(i).append("/NN and/CC gasket").append(i).append("/NN");
        b.append(" ./.");
        TaggedWords s = TaggedWords.of(b.toString());
        List<CoordinatorCandidates> all = proposer.proposeAll(s.words, s.tags);
        assertEquals(10, all.size());
        for (CoordinatorCandidates c : all) assertTrue(c.size() <= bound(), () -> "candidates " + c.size());
        // Nested: "pumps and (valves or seals)": both coordinators get their own candidates.
        TaggedWords nested = TaggedWords.of("Greased/VBD pumps/NNS and/CC valves/NNS or/CC seals/NNS ./.");
        List<CoordinatorCandidates> two = proposer.proposeAll(nested.words, nested.tags);
        assertEquals(2, two.size());
        assertTrue(two.get(1).indexOf(nested.index("valves"), nested.index("seals")) >= 0);
        assertTrue(two.get(1).indexOf(nested.index("pumps"), nested.index("seals")) >= 0);
    }

    @Test
    void aFiftyThousandTokenSentenceHasBoundedCandidatesAndSaysWhenCapsBit() {
        int n = 50_000;
        String[] w = new String[n];
        String[] t = new String[n];
        for (int i = 0; i < n; i++) {
            boolean coordinator = i % 5 == 4;
            w[i] = coordinator ? "and" : "bolt" + (i % 97);
            t[i] = coordinator ? "CC" : "NN";
        }
        long start = System.nanoTime();
        List<CoordinatorCandidates> all = proposer.proposeAll(w, t);
        long millis = (System.nanoTime() - start) / 1_000_000;
        assertEquals(n / 5 - (t[n - 1].equals("CC") ? 1 : 0), all.size());
        long capped = all.stream().filter(c -> c.capped() > 0).count();
        for (CoordinatorCandidates c : all) assertTrue(c.size() <= bound());
        assertTrue(capped > all.size() / 2, "the window cap bites in a run-on sentence and is counted: " + capped);
        System.out.printf("50,000-token sentence: %,d coordinators, %,d capped, %d ms%n", all.size(), capped, millis);
    }

    private static int bound() {
        return ConjunctCandidateProposer.MAX_RIGHT
                * (ConjunctCandidateProposer.MAX_SAME_CLASS + 3 * ConjunctCandidateProposer.MAX_OTHER_CLASS);
    }

    @Test
    void aSlashBetweenTwoWordsCoordinatesThemButNotInsideAndOr() {
        TaggedWords s = TaggedWords.of("The/DT owner/NN //SYM skipper/NN signed/VBD the/DT seals/NNS and/CC //SYM or/CC gaskets/NNS ./.");
        List<CoordinatorCandidates> all = proposer.proposeAll(s.words, s.tags);
        CoordinatorCandidates slash = all.get(0);
        assertEquals(2, slash.coordinator());
        assertTrue(slash.indexOf(s.index("owner"), s.index("skipper")) >= 0);
        // "and/or": the two words are the coordinators, the slash between them is not.
        assertTrue(all.stream().noneMatch(c -> c.coordinator() == 8), all::toString);
    }

    @Test
    void asWellAsAndRatherThanCoordinateWhatFollowsThem() {
        TaggedWords s = TaggedWords.of("Replace/VB the/DT filters/NNS as/RB well/RB as/IN the/DT hoses/NNS ./.");
        CoordinatorCandidates c = proposer.proposeAll(s.words, s.tags).get(0);
        assertEquals(s.index("as"), c.coordinator());
        assertTrue(c.indexOf(s.index("filters"), s.index("hoses")) >= 0);
        TaggedWords r = TaggedWords.of("They/PRP patched/VBD the/DT hull/NN rather/RB than/IN replace/VB the/DT plate/NN ./.");
        CoordinatorCandidates d = proposer.proposeAll(r.words, r.tags).get(0);
        assertTrue(d.indexOf(r.index("patched"), r.index("replace")) >= 0);
    }

    @Test
    void theBackwardScanStepsOverABracketedAside() {
        TaggedWords s = TaggedWords.of("Call/VB Ines/NNP (/-LRB- ext./NN 52/CD )/-RRB- ,/, Bo/NNP (/-LRB- ext./NN 61/CD )/-RRB- or/CC Ada/NNP ./.");
        CoordinatorCandidates c = proposer.proposeAll(s.words, s.tags).get(0);
        assertTrue(c.indexOf(s.index("Ines"), s.index("Ada")) >= 0, "the first item of the list, before two asides");
    }

    @Test
    void aNameAfterTheCoordinatorIsOfferedWithItsFirstAndItsLastWord() {
        TaggedWords s = TaggedWords.of("Logs/NNS from/IN Harbour/NNP Ops/NNP and/CC North/NNP Quay/NNP Works/NNP ./.");
        CoordinatorCandidates c = proposer.proposeAll(s.words, s.tags).get(0);
        assertTrue(c.indexOf(s.index("Harbour"), s.index("North")) >= 0);
        assertTrue(c.indexOf(s.index("Ops"), s.index("Works")) >= 0);
    }

    @Test
    void afterASubordinateClauseTheMainClauseVerbIsAReading() {
        TaggedWords s = TaggedWords.of("The/DT pump/NN failed/VBD but/CC if/IN the/DT seal/NN holds/VBZ ,/, keep/VB the/DT ferry/NN running/VBG ./.");
        CoordinatorCandidates c = proposer.proposeAll(s.words, s.tags).get(0);
        assertTrue(c.indexOf(s.index("failed"), s.index("keep")) >= 0);
        assertTrue(c.indexOf(s.index("failed"), s.index("holds")) >= 0, "the subordinate clause's verb stays a reading");
    }
}
