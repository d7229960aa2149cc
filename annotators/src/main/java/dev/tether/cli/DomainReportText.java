package dev.tether.cli;

import dev.tether.model.DomainReport;
import dev.tether.model.TetherModel;

import java.io.PrintStream;

/**
 * Prints a model's {@link DomainReport}: at the end of {@code tether train} and in {@code tether inspect}. Whole
 * counts print as whole numbers; counts that weights or re-estimation made fractional keep one decimal.
 */
final class DomainReportText {
    private DomainReportText() {
    }

    static void print(TetherModel model, PrintStream out) {
        if (model.domainReport().isEmpty()) {
            out.println("domain report  none: the model was trained without raw text, or by a version of Tether that"
                    + " stored no domain report (or another layout of it); train it again with --raw (and --base) to get one");
            return;
        }
        DomainReport r = model.domainReport().get();
        out.println(r.hasBase() ? "domain report (raw text against the base model " + r.base() + ")" : "domain report (raw text)");
        for (DomainReport.RawSource s : r.sources()) {
            out.printf("  raw source %s: %,d documents%s, %,d tokens, %,d prepositions with candidates, weight %s%n", s.name(),
                    s.documents(), s.skippedDocuments() > 0 ? String.format(" (%,d skipped)", s.skippedDocuments()) : "",
                    s.tokens(), s.prepositions(), InspectCommand.weight(s.weight()));
            double events = s.verbEvents() + s.nounEvents();
            out.printf("    unambiguous    %,d prepositions: %s attachment events, %s to a verb and %s to a noun"
                            + " (%s to an adjective or adverb, counted as co-occurrence only)%n",
                    s.unambiguous(), count(events), count(s.verbEvents()), count(s.nounEvents()), count(s.unambiguous() - events));
            out.printf("    co-occurrence  %s candidate heads counted with their preposition and object%n",
                    count(s.cooccurrenceTrials()));
            if (s.rounds() > 0) {
                out.printf("    re-estimated   %,d ambiguous verb-noun configurations split in %d round%s: %s to the noun,"
                                + " %s to the verb%n", s.ambiguousConfigurations(), s.rounds(), s.rounds() == 1 ? "" : "s",
                        count(s.reestimatedNoun()), count(s.ambiguousConfigurations() - s.reestimatedNoun()));
            } else {
                out.println("    re-estimated   none (--reestimate 0: ambiguous cases not counted)");
            }
        }
        if (!r.hasBase()) {
            out.println("  vocabulary and prepositions: no base model to compare with (train with --base to see them)");
            return;
        }
        DomainReport.Overlap o = r.overlap();
        out.printf("  vocabulary     %,d noun and verb forms in the raw text, %,d (%.1f%%) counted in the base (%,d words);%n",
                o.rawWords(), o.rawWordsInBase(), 100 * o.wordShare(), o.baseVocabulary());
        out.printf("                 they cover %,d of the raw text's %,d noun and verb tokens (%.1f%%)%n",
                o.rawTokensCovered(), o.rawTokens(), 100 * o.tokenShare());
        if (!o.newWords().isEmpty()) {
            StringBuilder words = new StringBuilder();
            for (DomainReport.NewWord w : o.newWords()) {
                words.append(words.length() == 0 ? "" : ", ").append(w.word()).append(' ').append(String.format("%,d", w.count()));
            }
            out.println("    most frequent new words  " + words);
        }
        out.printf("  prepositions   %d of %d compared changed majority attachment (noun/verb counts, base -> merged)%s%n",
                r.shifts().size(), r.prepositionsCompared(), r.shifts().isEmpty() ? "" : ":");
        for (DomainReport.PrepositionShift p : r.shifts()) {
            out.printf("    %-12s noun %s / verb %s  ->  noun %s / verb %s   now %s%n", p.preposition(), count(p.baseNoun()),
                    count(p.baseVerb()), count(p.mergedNoun()), count(p.mergedVerb()), side(p.mergedNoun(), p.mergedVerb()));
        }
    }

    private static String side(double noun, double verb) {
        return noun > verb ? "noun" : noun < verb ? "verb" : "even";
    }

    /** A count: whole numbers as such, others with one decimal. */
    static String count(double c) {
        return c == Math.rint(c) ? String.format("%,.0f", c) : String.format("%,.1f", c);
    }
}
