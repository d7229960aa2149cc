package dev.tether.candidates;

import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.*;

/** Worked examples on hand-tagged sentences (Penn Treebank tags), each checkable against the rules by hand. */
class HeadCandidateProposerTest {
    private final HeadCandidateProposer proposer = new HeadCandidateProposer();

    /** Splits "word/TAG word/TAG ..." into words and tags. */
    private static String[][] tagged(String s) {
        String[] parts = s.split(" ");
        String[] words = new String[parts.length];
        String[] tags = new String[parts.length];
        for (int i = 0; i < parts.length; i++) {
            int slash = parts[i].lastIndexOf('/');
            words[i] = parts[i].substring(0, slash);
            tags[i] = parts[i].substring(slash + 1);
        }
        return new String[][]{words, tags};
    }

    private List<PrepositionCandidates> all(String s) {
        String[][] wt = tagged(s);
        return proposer.proposeAll(wt[0], wt[1]);
    }

    private static final String REPLACED = "Replaced/VBD the/DT impeller/NN on/IN the/DT starboard/NN pump/NN with/IN "
            + "a/DT spare/NN from/IN the/DT Harbourside/NNP stores/NNS ./.";

    @Test
    void classicQuadrupleNounBeforeThePrepositionAndItsVerb() {
        List<PrepositionCandidates> c = all(REPLACED);
        assertEquals(3, c.size(), "on, with, from");
        PrepositionCandidates on = c.get(0);
        assertEquals(3, on.preposition());
        assertEquals(6, on.object(), "the object is the last noun of 'starboard pump'");
        assertEquals(new PrepositionCandidates(3, 6, new int[]{2, 0}, new HeadClass[]{HeadClass.NOUN, HeadClass.VERB}, 0, 2), on);
        assertTrue(on.isQuadruple());
    }

    @Test
    void laterPhrasesSeeEveryEarlierHeadNearestFirst() {
        List<PrepositionCandidates> c = all(REPLACED);
        PrepositionCandidates with = c.get(1);
        assertEquals(9, with.object());
        assertArrayEquals(new int[]{6, 2, 0}, heads(with), "pump, impeller, Replaced; 'starboard' is inside a noun run");
        assertFalse(with.isQuadruple(), "a preposition stands between the verb and 'pump'");
        PrepositionCandidates from = c.get(2);
        assertEquals(13, from.object(), "'Harbourside stores' ends in 'stores'");
        assertArrayEquals(new int[]{9, 6, 2, 0}, heads(from));
    }

    @Test
    void logLineOpeningWithItsMainVerbProposesNoLaterVerb() {
        // Log style drops the subject: "Tested" is the main verb and takes an object, so "on every deck" is not a
        // fronted phrase and the later verb "logged" is no candidate.
        PrepositionCandidates on = all("Tested/VBN the/DT alarm/NN on/IN every/DT deck/NN and/CC logged/VBD the/DT results/NNS ./.").get(0);
        assertArrayEquals(new int[]{2, 0}, heads(on), "alarm, Tested");
    }

    @Test
    void capitalizedOpeningVerbMistaggedAsAdjectiveIsStillTheVerb() {
        // Taggers trained on edited text often read a log line's opening "Tested" as an adjective.
        PrepositionCandidates on = all("Tested/JJ the/DT alarm/NN on/IN every/DT deck/NN and/CC logged/VBD the/DT results/NNS ./.").get(0);
        assertArrayEquals(new int[]{2, 0}, heads(on), "alarm, Tested; no later verb");
        assertEquals(HeadClass.VERB, on.headClass(1));
        PrepositionCandidates adjective = all("Detailed/JJ reports/NNS on/IN the/DT hull/NN arrived/VBD ./.").get(0);
        assertTrue(adjective.indexOf(0) < 0 || adjective.headClass(adjective.indexOf(0)) != HeadClass.VERB,
                "without a determiner after it the opening word keeps its tag: " + adjective);
    }

    @Test
    void verbMisreadAsAdjectiveOrPunctuationAfterItsSubjectIsStillAVerb() {
        // Web-trained taggers read some main verbs after their subject as adjectives or punctuation (seen on UD English
        // EWT dev: "BP shut/JJ its refinery", "Bush nominated/, two individuals"); invented log lines of the same shape.
        PrepositionCandidates in = all("Crew/NN shut/JJ the/DT valve/NN in/IN the/DT engine/NN room/NN ./.").get(0);
        assertEquals(HeadClass.VERB, in.headClass(in.indexOf(1)), "shut: " + in);
        PrepositionCandidates on = all("Bosun/NNP logged/, two/CD faults/NNS on/IN Tuesday/NNP ./.").get(0);
        assertTrue(on.indexOf(1) >= 0, "logged is a candidate: " + on);
        assertEquals(HeadClass.VERB, on.headClass(on.indexOf(1)));
        PrepositionCandidates plain = all("Crew/NN found/VBD the/DT valve/NN shut/JJ in/IN the/DT morning/NN ./.").get(0);
        assertTrue(plain.indexOf(4) < 0 || plain.headClass(plain.indexOf(4)) != HeadClass.VERB,
                "an adjective not between a subject and an object keeps its tag: " + plain);
    }

    @Test
    void prepositionMisreadAsParticleBeforeANameOrNumberIsStillAPreposition() {
        // "It closed on/RP Sunday", "out/RB of": EWT dev shapes, invented log lines.
        PrepositionCandidates on = all("Ferry/NNP docked/VBD on/RP Sunday/NNP ./.").get(0);
        assertEquals(2, on.preposition());
        assertEquals(3, on.object());
        List<PrepositionCandidates> out = all("Crew/NN pulled/VBD the/DT pump/NN out/RB of/IN the/DT bilge/NN ./.");
        assertEquals(4, out.get(0).preposition(), "'out of' is proposed at 'out': " + out);
        assertTrue(all("Crew/NN picked/VBD up/RP the/DT rope/NN ./.").isEmpty(), "a particle before a determiner stays a particle");
    }

    @Test
    void openingParticipleWithItsOwnPhraseLetsTheMainVerbFollow() {
        PrepositionCandidates on = all("Based/VBN on/IN the/DT log/NN ,/, the/DT engineer/NN replaced/VBD the/DT gasket/NN ./.").get(0);
        assertTrue(on.indexOf(7) >= 0, "'replaced' after the participle clause is a candidate: " + on);
        assertTrue(on.indexOf(0) >= 0, "'Based' itself stays a candidate: " + on);
    }

    /**
     * The Penn Treebank tags every "to" {@code TO} (Santorini 1990, the tagging guidelines); UD English EWT's XPOS
     * column tags prepositional "to" {@code IN} and keeps {@code TO} for the infinitive (visible in its train split:
     * 1,806 "to" ADP/IN, 3,266 PART/TO). A tagger trained from either gives the finder the same preposition.
     */
    private static final String TO_THE_WORKSHOP = "Moved/VBD the/DT pump/NN to/%s the/DT workshop/NN ./.";

    @Test
    void prepositionalToTaggedToAsInThePennTreebank() {
        List<PrepositionCandidates> c = all(String.format(TO_THE_WORKSHOP, "TO"));
        assertEquals(1, c.size());
        assertEquals(new PrepositionCandidates(3, 5, new int[]{2, 0}, new HeadClass[]{HeadClass.NOUN, HeadClass.VERB}, 0, 2), c.get(0));
    }

    @Test
    void prepositionalToTaggedInAsInTheEnglishWebTreebank() {
        List<PrepositionCandidates> c = all(String.format(TO_THE_WORKSHOP, "IN"));
        assertEquals(1, c.size());
        assertEquals(new PrepositionCandidates(3, 5, new int[]{2, 0}, new HeadClass[]{HeadClass.NOUN, HeadClass.VERB}, 0, 2), c.get(0));
        // Later phrases see the same heads under both conventions.
        String later = "Moved/VBD the/DT pump/NN to/%s the/DT workshop/NN for/IN repairs/NNS ./.";
        assertEquals(all(String.format(later, "TO")), all(String.format(later, "IN")));
    }

    @Test
    void infinitivalToIsNoPrepositionUnderEitherConvention() {
        // Both conventions tag the infinitive TO; its verb ends the search for an object.
        List<PrepositionCandidates> c = all("The/DT mate/NN wants/VBZ to/TO check/VB the/DT valve/NN in/IN the/DT workshop/NN ./.");
        assertEquals(1, c.size(), "only 'in': " + c);
        assertEquals(7, c.get(0).preposition());
    }

    @Test
    void frontedPhraseGetsTheMainVerbThatFollows() {
        PrepositionCandidates in = all("In/IN the/DT morning/NN ,/, the/DT crew/NN had/VBD already/RB checked/VBN the/DT seals/NNS ./.").get(0);
        assertEquals(2, in.object());
        assertArrayEquals(new int[]{8}, heads(in), "the main verb of 'had already checked'");
        assertEquals(HeadClass.VERB, in.headClass(0));
    }

    @Test
    void frontedPhraseBeforeBeGetsThePredicateToo() {
        PrepositionCandidates in = all("In/IN winter/NN the/DT ferry/NN is/VBZ slow/JJ ./.").get(0);
        assertArrayEquals(new int[]{4, 5}, heads(in));
        assertEquals(HeadClass.ADJECTIVE, in.headClass(1));
    }

    @Test
    void phraseOpeningAClauseAlsoGetsTheFollowingVerb() {
        PrepositionCandidates c = all("The/DT mate/NN said/VBD that/IN ,/, in/IN heavy/JJ seas/NNS ,/, the/DT hatch/NN leaks/VBZ ./.").get(0);
        assertEquals(5, c.preposition());
        assertArrayEquals(new int[]{2, 1, 11}, heads(c), "said, mate, and leaks after the comma-led phrase");
    }

    @Test
    void aVerbGroupStopsBeforeToAndTheNextGroupIsProposedToo() {
        PrepositionCandidates in = all("In/IN fact/NN the/DT crew/NN did/VBD n't/RB want/VB to/TO wait/VB ./.").get(0);
        assertArrayEquals(new int[]{6, 8}, heads(in), "'want' is the main verb of 'did n't want'; 'wait' heads the next group");
    }

    @Test
    void aParticipleClauseBeforeTheMainVerbLeavesTheMainVerbAmongTheCandidates() {
        PrepositionCandidates in = all("In/IN the/DT storm/NN ,/, ignoring/VBG the/DT forecast/NN ,/, the/DT skipper/NN "
                + "sailed/VBD ./.").get(0);
        assertArrayEquals(new int[]{4, 10}, heads(in), "ignoring, then sailed");
    }

    @Test
    void aPrepositionalPredicateAfterBeIsProposed() {
        // UD English EWT heads "the delay was about money" on "money" (copula and case depend on it).
        PrepositionCandidates in = all("In/IN my/PRP$ view/NN ,/, the/DT delay/NN was/VBD about/IN money/NN ./.").get(0);
        assertArrayEquals(new int[]{6, 8}, heads(in), "was, and the object of 'about'");
        assertEquals(HeadClass.NOUN, in.headClass(1));
    }

    @Test
    void aPhraseWithARelativeObjectGetsTheVerbOfTheRelativeClause() {
        PrepositionCandidates at = all("We/PRP found/VBD the/DT berth/NN at/IN which/WDT the/DT ferry/NN docks/VBZ ./.").get(0);
        assertEquals(5, at.object(), "'which' is the object, not 'ferry'");
        assertArrayEquals(new int[]{3, 1, 0, 8}, heads(at), "berth, found, We; and docks after the object");
    }

    @Test
    void coordinatedPrepositionsShareTheObject() {
        List<PrepositionCandidates> c = all("We/PRP sail/VBP on/IN or/CC about/IN May/NNP 3/CD ./.");
        assertEquals(2, c.size(), "on and about");
        assertEquals(5, c.get(0).object(), "'on' reaches past 'or about' to 'May'");
        assertEquals(5, c.get(1).object());
        assertEquals(6, all("The/DT crate/NN went/VBD on/IN to/TO the/DT quay/NN").get(0).object(), "'on to' is one preposition");
    }

    @Test
    void aGerundThatEndsItsPhraseIsAnObject() {
        PrepositionCandidates c = all("We/PRP thanked/VBD them/PRP for/IN sharing/VBG ./.").get(0);
        assertEquals(4, c.object());
        assertArrayEquals(new int[]{2, 1, 0}, heads(c));
        assertEquals(6, all("He/PRP left/VBD because/IN of/IN their/PRP$ constant/JJ complaining/VBG").get(1).object());
        assertEquals(6, all("We/PRP thanked/VBD them/PRP for/IN checking/VBG the/DT hull/NN").get(0).object(),
                "a gerund with an object of its own is not the object: the search goes on to 'hull', as for a participle");
    }

    @Test
    void butAfterNothingIsAPreposition() {
        PrepositionCandidates but = all("They/PRP had/VBD nothing/NN but/CC praise/NN for/IN the/DT crew/NN").get(0);
        assertEquals(3, but.preposition());
        assertEquals(4, but.object());
        assertEquals(2, but.head(0), "nothing");
        assertTrue(all("They/PRP waited/VBD but/CC the/DT ferry/NN left/VBD").isEmpty(), "an ordinary 'but' is a coordinator");
    }

    @Test
    void degreePhrasesAlsoGetThePhraseAfterThem() {
        // UD English EWT attaches "at least" to the number or noun it modifies.
        PrepositionCandidates least = all("The/DT ferry/NN carries/VBZ at/IN least/JJS two/CD boats/NNS ./.").get(0);
        assertEquals(4, least.object());
        assertArrayEquals(new int[]{2, 1, 5}, heads(least), "carries, ferry, two (by distance; a tie goes to the earlier word)");
        PrepositionCandidates far = all("She/PRP is/VBZ by/IN far/RB the/DT best/JJS deckhand/NN ./.").get(0);
        assertEquals(3, far.object());
        assertTrue(far.indexOf(6) >= 0, "deckhand");
    }

    @Test
    void theCurrencySignHeadsAnAmount() {
        // Penn Treebank tag "$" for the sign; UD English EWT heads "$ 40" on "$".
        PrepositionCandidates c = all("It/PRP cost/VBD $/$ 40/CD for/IN the/DT rope/NN").get(0);
        assertArrayEquals(new int[]{2, 1, 0}, heads(c), "$, cost, It; not 40");
    }

    @Test
    void whichAndHowRightBeforeThePrepositionAreCandidates() {
        PrepositionCandidates of = all("Which/WDT of/IN these/DT fits/VBZ ?/.").get(0);
        assertArrayEquals(new int[]{0, 3}, heads(of), "Which, and the following verb");
        PrepositionCandidates about = all("How/WRB about/IN Tuesday/NNP ?/.").get(0);
        assertArrayEquals(new int[]{0}, heads(about));
        assertEquals(HeadClass.ADVERB, about.headClass(0));
    }

    @Test
    void aParticipleOpeningTheSentenceDoesNotStopTheFollowingHead() {
        PrepositionCandidates on = all("Based/VBN on/IN the/DT log/NN ,/, the/DT engineer/NN replaced/VBD the/DT seal/NN ./.").get(0);
        assertArrayEquals(new int[]{0, 7}, heads(on), "Based, and replaced");
    }

    @Test
    void onlyBecauseOfTakesASubordinatorAsAPreposition() {
        List<PrepositionCandidates> c = all("They/PRP made/VBD one/CD choice/NN ,/, that/IN of/IN waiting/VBG ./.");
        assertEquals(1, c.size());
        assertEquals(6, c.get(0).preposition(), "'of' only; 'that of' is not a two-word preposition");
    }

    @Test
    void subordinatorsAndInfinitivalToAreNotPrepositions() {
        assertTrue(all("She/PRP said/VBD that/IN the/DT valve/NN leaked/VBD").isEmpty());
        assertTrue(all("We/PRP went/VBD to/TO inspect/VB the/DT hull/NN").isEmpty());
        assertTrue(all("We/PRP stopped/VBD because/IN the/DT valve/NN leaked/VBD").isEmpty());
        List<PrepositionCandidates> c = all("We/PRP stopped/VBD because/IN of/IN the/DT storm/NN");
        assertEquals(2, c.get(0).preposition(), "'because of' is a preposition");
        assertEquals(5, c.get(0).object());
    }

    @Test
    void prepositionalToHasAnObject() {
        PrepositionCandidates to = all("We/PRP sent/VBD the/DT pump/NN to/TO the/DT workshop/NN").get(0);
        assertEquals(6, to.object());
        assertArrayEquals(new int[]{3, 1, 0}, heads(to));
        assertEquals(1, to.quadrupleVerb());
        assertEquals(3, to.quadrupleNoun());
    }

    @Test
    void pronounsNumbersAndStandAloneWordsAsObjectsAndHeads() {
        PrepositionCandidates c = all("One/CD of/IN them/PRP failed/VBD").get(0);
        assertEquals(2, c.object());
        assertArrayEquals(new int[]{0, 3}, heads(c),
                "a number standing alone takes the phrase; no verb precedes it, so the following 'failed' is proposed");
        PrepositionCandidates own = all("She/PRP sailed/VBD on/IN her/PRP$ own/JJ ./.").get(0);
        assertEquals(4, own.object(), "a stand-alone adjective closes the phrase");
        PrepositionCandidates far = all("It/PRP is/VBZ better/JJR by/IN far/RB ./.").get(0);
        assertEquals(4, far.object());
        assertArrayEquals(new int[]{2, 1, 0}, heads(far), "adjective, verb, pronoun");
        assertEquals(HeadClass.ADJECTIVE, far.headClass(0));
    }

    @Test
    void prenominalAdjectivesAndNonFinalNounsAreNotCandidatesButAFirstProperNounIs() {
        PrepositionCandidates c = all("Captain/NNP Ida/NNP Marsh/NNP of/IN the/DT Brackwater/NNP Line/NNP inspected/VBD "
                + "the/DT old/JJ brass/NN gear/NN on/IN deck/NN").get(1);
        assertEquals(12, c.preposition());
        assertArrayEquals(new int[]{11, 7, 6, 5, 2, 0}, heads(c),
                "gear, inspected, Line and Brackwater (last and first word of a name), Marsh and Captain; not old, brass, Ida");
        assertEquals(7, c.quadrupleVerb());
        assertEquals(11, c.quadrupleNoun());
    }

    @Test
    void nearestCandidatesAreBoundedInNumber() {
        String s = "Keep/VB oil/NN ,/, rags/NNS ,/, rope/NN ,/, paint/NN ,/, tape/NN ,/, fuses/NNS ,/, bulbs/NNS ,/, "
                + "and/CC filters/NNS in/IN the/DT locker/NN";
        PrepositionCandidates c = all(s).get(0);
        assertEquals(HeadCandidateProposer.MAX_PRECEDING + 1, c.size(), "the bound, and the nearest verb beyond it");
        assertEquals(16, c.head(0), "filters is the nearest");
        assertEquals(HeadCandidateProposer.MAX_PRECEDING, c.indexOf(0), "the verb beyond the bound comes last");
        assertFalse(c.isQuadruple(), "a coordinator, not a verb, precedes 'filters'");
        PrepositionCandidates noVerb = all(s.substring(s.indexOf(' ') + 1)).get(0);
        assertEquals(HeadCandidateProposer.MAX_PRECEDING, noVerb.size(), "without a verb the bound holds: " + noVerb);
    }

    @Test
    void participleInsideTheNounPhraseIsNotTheQuadrupleVerb() {
        PrepositionCandidates c = all("They/PRP found/VBD the/DT broken/VBN seal/NN in/IN the/DT bilge/NN").get(0);
        assertEquals(1, c.quadrupleVerb());
        assertEquals(4, c.quadrupleNoun());
    }

    @Test
    void proposingOnePrepositionAgreesWithProposingAll() {
        String[] tagset = {"NN", "NNS", "NNP", "VB", "VBD", "VBN", "VBG", "VBZ", "IN", "IN", "IN", "TO", "DT", "JJ",
                "RB", "PRP", "PRP$", "CD", "CC", ",", ".", "WDT", "WP", "MD", "POS", "ADD"};
        String[] wordset = {"the", "of", "that", "to", "is", "far", "own", "John", "because", "out"};
        Random random = new Random(7);
        int n = 3000;
        String[] words = new String[n];
        String[] tags = new String[n];
        for (int i = 0; i < n; i++) {
            tags[i] = tagset[random.nextInt(tagset.length)];
            words[i] = wordset[random.nextInt(wordset.length)];
        }
        List<PrepositionCandidates> all = proposer.proposeAll(words, tags);
        assertFalse(all.isEmpty());
        int next = 0;
        for (int i = 0; i < n; i++) {
            PrepositionCandidates one = proposer.propose(words, tags, i);
            if (next < all.size() && all.get(next).preposition() == i) {
                assertEquals(all.get(next++), one, "token " + i);
            } else {
                assertNull(one, "token " + i);
            }
        }
        assertEquals(all.size(), next);
    }

    @Test
    void aVeryLongSentenceWithoutPunctuationGivesBoundedCandidateSets() {
        int n = 50_000;
        String[] words = new String[n];
        String[] tags = new String[n];
        for (int i = 0; i < n; i++) {
            switch (i % 5) {
                case 0 -> { words[i] = "checked"; tags[i] = "VBD"; }
                case 1 -> { words[i] = "the"; tags[i] = "DT"; }
                case 2 -> { words[i] = "valve"; tags[i] = "NN"; }
                case 3 -> { words[i] = "on"; tags[i] = "IN"; }
                default -> { words[i] = "deck"; tags[i] = "NN"; }
            }
        }
        List<PrepositionCandidates> all = proposer.proposeAll(words, tags);
        assertEquals(n / 5, all.size());
        for (PrepositionCandidates c : all) {
            assertTrue(c.size() <= HeadCandidateProposer.MAX_PRECEDING + 2, c.toString());
            assertEquals(c.preposition() - 1, c.quadrupleNoun());
        }
        String[] nouns = new String[n];
        String[] nounTags = new String[n];
        java.util.Arrays.fill(nouns, "valve");
        java.util.Arrays.fill(nounTags, "NN");
        nouns[0] = "on";
        nounTags[0] = "IN";
        PrepositionCandidates longRun = proposer.proposeAll(nouns, nounTags).get(0);
        assertEquals(HeadCandidateProposer.MAX_RUN + 1, longRun.object(), "a noun run is followed a bounded distance");
    }

    @Test
    void tagsAndWordsMustPair() {
        assertThrows(IllegalArgumentException.class, () -> proposer.proposeAll(new String[]{"a"}, new String[0]));
        assertThrows(IndexOutOfBoundsException.class, () -> proposer.propose(new String[]{"a"}, new String[]{"DT"}, 3));
    }

    @Test
    void theNearestVerbBeyondTheCapIsStillACandidate() {
        // Six nouns and adverbs fill the candidates before any verb is reached; the nearest verb is added anyway
        // (candidate recall on UD English EWT, measured: see the class comment).
        List<PrepositionCandidates> c = all("The/DT yard/NN has/VBZ not/RB supplied/VBN spare/JJ seals/NNS ,/, gaskets/NNS ,/, "
                + "bolts/NNS and/CC shims/NNS for/IN the/DT aft/JJ ramp/NN at/IN Harbourside/NNP per/IN the/DT contract/NN ./.");
        PrepositionCandidates per = c.get(2);
        assertEquals(19, per.preposition());
        assertEquals(7, per.size(), "six within the cap and the verb: " + per);
        assertEquals(4, per.head(6), "supplied");
        assertEquals(HeadClass.VERB, per.headClass(6));
        PrepositionCandidates at = c.get(1);
        assertEquals(6, at.size(), "a verb within the cap adds nothing beyond it: " + at);
    }

    @Test
    void unknownWordsGivenClosedClassTagsAreReadAsVerbsOrNouns() {
        // Taggers give some unknown words the tag of a closed class (seen on UD English EWT dev: "forces on Tuesday
        // condemned/CC Sharon", "customers adds/IN entertainment to the meal"); invented lines of the same shape.
        PrepositionCandidates to = all("The/DT crew/NN adds/IN grease/NN to/IN the/DT winch/NN ./.").get(0);
        assertEquals(HeadClass.VERB, to.headClass(to.indexOf(2)), "adds after its subject is a verb: " + to);
        PrepositionCandidates like = all("There/EX are/VBP also/RB checks/IN like/IN bilge/NN soundings/NNS ./.").get(0);
        assertEquals(HeadClass.NOUN, like.headClass(like.indexOf(3)), "checks is a noun: " + like);
        PrepositionCandidates by = all("The/DT mate/NN wants/VBZ to/TO welcome/UH the/DT surveyor/NN by/IN name/NN ./.").get(0);
        assertEquals(HeadClass.VERB, by.headClass(by.indexOf(4)), "an interjection after 'to' is a verb: " + by);
        List<PrepositionCandidates> plain = all("The/DT crew/NN worked/VBD during/IN the/DT night/NN plus/CC the/DT weekend/NN ./.");
        assertEquals(1, plain.size(), "'during' and 'plus' keep their classes: " + plain);
        assertTrue(plain.get(0).indexOf(6) < 0, "'plus' is no candidate head");
    }

    @Test
    void aWordThatIsOnlyEverAPrepositionIsOneWhateverItsTag() {
        PrepositionCandidates at = all("The/DT mate/NN logged/VBD the/DT leak/NN at/NN Pier/NNP 4/CD ./.").get(0);
        assertEquals(5, at.preposition());
        assertArrayEquals(new int[]{4, 2, 1}, heads(at), "leak, logged, mate");
    }

    @Test
    void aWordOfLettersTaggedAsPunctuationAfterItsSubjectIsAVerb() {
        // "buses ply/. frequently between ..." (seen on UD English EWT dev); an invented line of the same shape.
        PrepositionCandidates between = all("Two/CD ferries/NNS ply/. daily/RB between/IN Harbourside/NNP and/CC Gull/NNP Island/NNP ./.").get(0);
        assertTrue(between.indexOf(2) >= 0, "ply is a candidate: " + between);
        assertEquals(HeadClass.VERB, between.headClass(between.indexOf(2)));
    }

    @Test
    void aNounOfTimeAfterANounLeavesThatNounACandidate() {
        // "the meeting today at 10": "today" is an adverbial of its own, not the last word of "meeting today".
        PrepositionCandidates at = all("Crews/NNS attend/VBP the/DT safety/NN briefing/NN today/NN at/IN 10/CD ./.").get(0);
        assertArrayEquals(new int[]{5, 4, 1, 0}, heads(at), "today, briefing, attend, Crews: " + at);
        PrepositionCandidates plain = all("Crews/NNS attend/VBP the/DT safety/NN briefing/NN room/NN at/IN 10/CD ./.").get(0);
        assertArrayEquals(new int[]{5, 1, 0}, heads(plain), "'briefing room' is one run: " + plain);
    }

    @Test
    void whichAsAnObjectMakesThePhrasePartOfTheRelativeClauseWhateverItsTag() {
        // "the entity to which/DT it is addressed" (seen on UD English EWT dev with a web-trained tagger).
        PrepositionCandidates to = all("Send/VB the/DT log/NN to/IN the/DT office/NN to/IN which/DT it/PRP is/VBZ addressed/VBN ./.").get(1);
        assertTrue(to.indexOf(10) >= 0, "addressed, after the relative clause's subject, is a candidate: " + to);
    }

    @Test
    void thePredicateOfBeIsTheNounOrLastAdjectiveOfItsPhrase() {
        // A fronted phrase also gets the predicate of a following "be": the noun of "our main meal" and the last
        // adjective of "very much involved", not the first adjective (UD heads such clauses on the predicate).
        PrepositionCandidates in = all("In/IN winter/NN the/DT evening/NN crossing/NN is/VBZ our/PRP$ main/JJ run/NN ./.").get(0);
        assertTrue(in.indexOf(8) >= 0, "run: " + in);
        assertTrue(in.indexOf(7) < 0, "not main: " + in);
        PrepositionCandidates like = all("Like/IN Ben/NNP ,/, I/PRP will/MD still/RB be/VB very/RB much/JJ involved/JJ ./.").get(0);
        assertTrue(like.indexOf(9) >= 0, "involved: " + like);
        assertTrue(like.indexOf(8) < 0, "not much: " + like);
    }

    private static int[] heads(PrepositionCandidates c) {
        int[] h = new int[c.size()];
        for (int i = 0; i < h.length; i++) h[i] = c.head(i);
        return h;
    }
}
