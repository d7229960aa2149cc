package dev.tether.spark;

import dev.tether.model.LoadedModels;
import dev.tether.output.AtomicFile;
import dev.tether.output.IoFailure;
import dev.tether.pipeline.DocumentFiles;

import java.io.IOException;
import java.io.Serializable;
import java.net.InetAddress;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * What one executor must be able to do before a job starts: read the inputs, read the model (with the driver's model
 * id), and write into the output folder. {@link #problems} runs inside a task and returns what failed, each naming the
 * executor's host, the path and what to do; the driver stops the run on any.
 */
record ExecutorCheck(List<String> inputs, String model, String modelId, String out) implements Serializable {

    List<String> problems() {
        String host;
        try {
            host = InetAddress.getLocalHost().getHostName();
        } catch (IOException e) {
            host = "(unknown host)";
        }
        List<String> problems = new ArrayList<>();
        for (String input : inputs) {
            if (DocumentFiles.isFileSystemUri(input)) {
                String why = InputLocations.problem(input);
                if (why != null) {
                    problems.add("executor on " + host + ": the input " + input + " " + why + "; check that every executor"
                            + " reaches that file system (its Hadoop configuration, HADOOP_CONF_DIR) and may read the input");
                }
                continue;
            }
            Path p = Path.of(input);
            if (!Files.exists(p)) {
                problems.add("executor on " + host + ": the input " + input + " does not exist there; put the input on a"
                        + " file system every executor reads (a shared folder)");
            } else if (!Files.isReadable(p)) {
                problems.add("executor on " + host + ": the input " + input + " cannot be read there (permission denied)");
            }
        }
        if (model != null) {
            String location = ExecutorModel.resolve(model);
            try {
                String id = LoadedModels.get(location).id();
                if (!id.equals(modelId)) {
                    problems.add("executor on " + host + ": the model " + location + " has id " + id + ", the driver's has id "
                            + modelId + "; give every executor the same model file");
                }
            } catch (IOException | RuntimeException e) {
                problems.add("executor on " + host + ": cannot read the model " + location + ": " + IoFailure.describe(e)
                        + "; ship it with spark-submit --files " + model + ", or put it on a path every executor reads");
            }
        }
        if (out != null) {
            String why = writable(Path.of(out));
            if (why != null) {
                problems.add("executor on " + host + ": cannot write into the output folder " + out + ": " + why
                        + "; give a folder on a file system every executor can write to");
            }
        }
        return problems;
    }

    /** Why nothing can be written at {@code folder} (or at its nearest existing parent, which the run will create it in). */
    private static String writable(Path folder) {
        Path p = folder.toAbsolutePath();
        while (p != null && !Files.exists(p)) p = p.getParent();
        if (p == null) return "no part of the path exists";
        if (!Files.isDirectory(p)) return p + " is not a folder";
        try {
            Path probe = Files.createTempFile(p, ".tether-write-check", AtomicFile.TEMPORARY_SUFFIX);
            Files.delete(probe);
            return null;
        } catch (IOException e) {
            return IoFailure.reason(e);
        }
    }
}
