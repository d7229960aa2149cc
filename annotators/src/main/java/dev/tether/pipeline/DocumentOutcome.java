package dev.tether.pipeline;

import dev.tether.output.RunManifest;

import java.io.Serializable;

/**
 * What became of one document of a collection run: written (its manifest entry; its files still temporary, or already
 * committed under their final names), reused from an earlier run (the earlier entry), or failed (the reason).
 */
public record DocumentOutcome(int index, RunManifest.Entry entry, boolean reused, boolean committed, String reason)
        implements Serializable {

    public static DocumentOutcome written(int index, RunManifest.Entry entry) {
        return new DocumentOutcome(index, entry, false, false, null);
    }

    public static DocumentOutcome reused(int index, RunManifest.Entry entry) {
        return new DocumentOutcome(index, entry, true, false, null);
    }

    public static DocumentOutcome failed(int index, String reason) {
        return new DocumentOutcome(index, null, false, false, reason);
    }

    /** This outcome once its files have their final names. */
    public DocumentOutcome asCommitted() {
        return new DocumentOutcome(index, entry, reused, true, reason);
    }

    public boolean isFailure() {
        return entry == null;
    }
}
