package dev.tether.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Invented labelled quadruples from a ferry operator's maintenance logs, written into a test's folder. */
final class FerryLogs {
    /** Training lines in the benchmark's format: 16 cases, 8 noun-attached. */
    static final String TRAINING = """
            1 replaced gasket with spare V
            2 replaced gasket with spare V
            3 replaced gasket from stores V
            4 inspected hull for corrosion V
            5 found crack in bulkhead N
            6 found crack near hatch N
            7 fitted valve with seal N
            8 cleaned filters in engine N
            9 cleaned filters with solvent V
            10 checked pumps for leaks V
            11 tightened bolts on ramp N
            12 tightened bolts with wrench V
            13 logged hours of engines N
            14 repaired leak in pipe N
            15 greased hinges of ramp N
            16 painted hull with primer V
            """;

    /**
     * Evaluation lines in Tether's own format: 8 cases, 5 noun-attached. Worked out by hand against {@link #TRAINING}
     * (after normalization: with = 6 cases, 1 noun; for = 2, 0 noun; in = 3, 3 noun; of = 2, 2 noun):
     * <pre>
     *   case                                    gold  backed-off (level)            always-noun  majority per prep.
     *   replaced gaskets with spares            verb  verb 0/2 (quadruple)     ok   wrong        verb ok
     *   found cracks in bulkheads               noun  noun 1/1 (quadruple)     ok   ok           noun ok
     *   logged hours of generator               noun  noun 1/1 (triples)       ok   ok           noun ok
     *   inspected hulls for corrosion           verb  verb 0/1 (quadruple)     ok   wrong        verb ok
     *   fitted valve with seals                 noun  noun 1/1 (quadruple)     ok   ok           verb wrong
     *   repaired leaks in pipes                 noun  noun 1/1 (quadruple)     ok   ok           noun ok
     *   cleaned filters with rags               noun  verb 0/1 (triples)       wrong ok          verb wrong
     *   tightened bolts with spanner            verb  verb 0/1 (triples)       ok   wrong        verb ok
     * </pre>
     * Backed-off 7/8 = 0.875; always-noun 5/8 = 0.625; majority per preposition 6/8 = 0.75.
     */
    static final String EVALUATION = "verb\tnoun1\tpreposition\tnoun2\tsite\n"
            + "replaced\tgaskets\twith\tspares\tverb\n"
            + "found\tcracks\tin\tbulkheads\tnoun\n"
            + "logged\thours\tof\tgenerator\tnoun\n"
            + "inspected\thulls\tfor\tcorrosion\tverb\n"
            + "fitted\tvalve\twith\tseals\tnoun\n"
            + "repaired\tleaks\tin\tpipes\tnoun\n"
            + "cleaned\tfilters\twith\trags\tnoun\n"
            + "tightened\tbolts\twith\tspanner\tverb\n";

    private FerryLogs() {
    }

    static Path write(Path dir, String name, String content) throws IOException {
        return Files.writeString(dir.resolve(name), content, StandardCharsets.UTF_8);
    }
}
