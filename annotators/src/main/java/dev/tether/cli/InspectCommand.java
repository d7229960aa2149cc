package dev.tether.cli;

import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.counts.SubTuple;
import dev.tether.model.ModelFile;
import dev.tether.model.ModelSource;
import dev.tether.model.TetherModel;

import java.io.IOException;
import java.io.PrintStream;
import java.util.Set;

/** {@code tether inspect}: what a model file holds. */
final class InspectCommand implements Command {
    @Override
    public String name() {
        return "inspect";
    }

    @Override
    public String usage() {
        return "inspect MODEL|default";
    }

    @Override
    public String help() {
        return "usage: tether " + usage() + "\n\n"
                + "Shows what a model file holds: its id, format and normalization versions, the training sources with\n"
                + "their checksums, the vocabulary, the distinct keys of every back-off level, the approximate heap, and for a\n"
                + "model trained with raw text its domain report (events per raw source, vocabulary overlap with the base\n"
                + "model, prepositions whose majority attachment changed).\n\n"
                + "  MODEL     a model file written by 'tether train'\n"
                + "  default   the shipped default model\n";
    }

    /** A source's weight as printed: up to four significant digits. */
    static String weight(double w) {
        return new java.math.BigDecimal(w).round(new java.math.MathContext(4)).stripTrailingZeros().toPlainString();
    }

    @Override
    public int run(String[] args, PrintStream out, PrintStream err) throws UsageException, IOException {
        CommandArguments a = new CommandArguments(name(), args, 1, Set.of(), Set.of(), 1);
        if (a.positional().size() != 1) throw new UsageException("give one model file, or 'default'");
        String path = a.positional().get(0);
        TetherModel m = ModelLocator.load(path);
        QuadrupleCounts q = m.quadruples();
        out.println("model          " + path + (ModelLocator.DEFAULT.equals(path) ? " (" + TetherModel.BUNDLED_RESOURCE + ")" : ""));
        out.println("id             " + m.id());
        out.println("format         version " + ModelFile.FORMAT_VERSION);
        out.println("normalization  " + m.normalizerVersion());
        out.println("sources (share: weight x items over the sum of all sources)");
        double all = 0;
        for (ModelSource s : m.sources()) all += s.weight() * s.items();
        for (ModelSource s : m.sources()) {
            out.printf("  %-12s %-36s %,10d items%s  weight %-7s share %5.1f%%  sha256 %s%n", s.kind(), s.name(), s.items(),
                    s.skipped() > 0 ? String.format(" (%,d skipped)", s.skipped()) : "", weight(s.weight()),
                    all > 0 ? 100 * s.weight() * s.items() / all : 0, s.sha256().substring(0, Math.min(16, s.sha256().length())));
        }
        out.printf("vocabulary     %,d words, %,d prepositions%n", q.words().size(), q.prepositions().size());
        out.printf("quadruples     %,.0f counted, %,.0f attached to the noun (%.1f%%)%n", q.total(), q.nounAttachments(),
                q.total() > 0 ? 100 * q.nounAttachments() / q.total() : 0);
        out.println("distinct keys per back-off level (all prepositions)");
        out.printf("  quadruple            %,10d%n", q.distinct(SubTuple.VERB_NOUN1_NOUN2));
        out.printf("  triples  v-n1-p      %,10d%n", q.distinct(SubTuple.VERB_NOUN1));
        out.printf("           v-p-n2      %,10d%n", q.distinct(SubTuple.VERB_NOUN2));
        out.printf("           n1-p-n2     %,10d%n", q.distinct(SubTuple.NOUN1_NOUN2));
        out.printf("  pairs    v-p         %,10d%n", q.distinct(SubTuple.VERB));
        out.printf("           n1-p        %,10d%n", q.distinct(SubTuple.NOUN1));
        out.printf("           p-n2        %,10d%n", q.distinct(SubTuple.NOUN2));
        HeadChoiceCounts h = m.headChoice();
        out.printf("head choice    %,d words, %,d prepositions, %,d structural keys%n", h.words().size(),
                h.prepositions().size(), h.structure().size());
        out.printf("  head with object     %,10d%n", h.distinct(HeadChoiceCounts.Part.HEAD_OBJECT));
        out.printf("  head                 %,10d%n", h.distinct(HeadChoiceCounts.Part.HEAD));
        out.printf("  class with object    %,10d%n", h.distinct(HeadChoiceCounts.Part.CLASS_OBJECT));
        out.printf("  class                %,10d%n", h.distinct(HeadChoiceCounts.Part.CLASS));
        RankerSummary.print(m, out);
        out.printf("approximate heap of the count tables: %.1f MB%n", (q.approximateBytes() + h.approximateBytes()) / 1e6);
        out.println(m.thesaurus().map(t -> String.format("thesaurus      %,d words (%,d nouns, %,d verbs, %,d adjectives), %d neighbours per word%s; approximate heap %.1f MB",
                        t.size(), t.size(dev.tether.candidates.HeadClass.NOUN), t.size(dev.tether.candidates.HeadClass.VERB),
                        t.size(dev.tether.candidates.HeadClass.ADJECTIVE), t.settings().neighbours(),
                        t.hasVectors() ? ", with vectors" : ", lists only (the coordination features do without it)", t.approximateBytes() / 1e6))
                .orElse("thesaurus      none (the similar-words features are off)"));
        out.println(m.tagger().map(t -> String.format("tagger         %s (%,d bytes)", t.description(), t.size()))
                .orElse("tagger         none (the built-in preprocessing uses the shipped OpenNLP tagger)"));
        DomainReportText.print(m, out);
        return Tether.OK;
    }
}
