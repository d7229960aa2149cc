package dev.tether.pipeline;

import dev.tether.output.RunManifest;

import java.io.Serializable;

/**
 * One document of a collection run, as handed to whoever annotates it: its place in the sorted collection, its file,
 * its name in the output folder, and what an earlier run completed for it ({@code null}: nothing).
 */
public record DocumentTask(int index, String file, String doc, RunManifest.Entry earlier) implements Serializable {
}
