package dev.tether.similarity;

import java.util.Random;

/**
 * Invented, tagged sentences in the style of a ferry operator's maintenance logs, drawn from small word lists with a
 * fixed seed: parts are replaced, inspected and cleaned on engines and pumps, crew members do the work. Parts and
 * crew occur in different slots, so a thesaurus should find parts like parts and crew like crew.
 */
public final class FerryLogCorpus {
    static final String[] CREW = {"engineer", "deckhand", "mechanic", "mate", "skipper"};
    static final String[] PARTS = {"gasket", "valve", "seal", "filter", "impeller", "hose", "belt"};
    static final String[] MACHINES = {"pump", "engine", "winch", "compressor", "generator"};
    static final String[] VERBS = {"replaced", "inspected", "cleaned", "checked", "tightened"};
    static final String[] STATES = {"worn", "cracked", "loose", "new", "spare"};

    private FerryLogCorpus() {
    }

    /** A thesaurus of {@code sentences} sentences (seed 21), frequency floor 3, {@code neighbours} neighbours per word. */
    public static Thesaurus thesaurus(int sentences, int neighbours) {
        return ThesaurusBuilder.build(count(sentences, 21), ThesaurusSettings.DEFAULT.withMinFrequency(3).withNeighbours(neighbours), 1);
    }

    /** Feeds {@code sentences} sentences to {@code counter}. */
    public static ContextCounter count(int sentences, long seed) {
        ContextCounter counter = new ContextCounter();
        Random r = new Random(seed);
        for (int i = 0; i < sentences; i++) {
            String crew = pick(r, CREW), verb = pick(r, VERBS), state = pick(r, STATES), part = pick(r, PARTS),
                    machine = pick(r, MACHINES);
            if (r.nextBoolean()) {
                counter.addSentence(new String[] {"The", crew, verb, "the", state, part, "on", "the", machine, "."},
                        new String[] {"DT", "NN", "VBD", "DT", "JJ", "NN", "IN", "DT", "NN", "."});
            } else {
                counter.addSentence(new String[] {"The", crew, "on", "the", machine, "deck", verb, "a", part, "."},
                        new String[] {"DT", "NN", "IN", "DT", "NN", "NN", "VBD", "DT", "NN", "."});
            }
        }
        return counter;
    }

    private static String pick(Random r, String[] words) {
        return words[r.nextInt(words.length)];
    }
}
