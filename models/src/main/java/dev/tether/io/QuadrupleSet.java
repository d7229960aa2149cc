package dev.tether.io;

import dev.tether.attachment.LabelledQuadruple;

import java.util.List;

/**
 * The labelled quadruples read from one file, with the number of malformed lines that were skipped (only ever
 * non-zero when skipping was asked for) and the first few reasons, so that nothing is dropped silently.
 */
public record QuadrupleSet(String name, String sha256, List<LabelledQuadruple> quadruples, int skipped,
                           List<String> skippedReasons) {
    public QuadrupleSet {
        quadruples = List.copyOf(quadruples);
        skippedReasons = List.copyOf(skippedReasons);
    }
}
