package dev.tether.spark;

import dev.tether.model.LoadedModels;
import org.apache.spark.SparkFiles;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Where an executor finds the model the driver was given: {@code default} is the shipped model inside the job jar; a
 * file is read at the same path when the executor sees it (a shared folder), and otherwise from the copy that
 * {@code spark-submit --files} shipped to every executor (found by its file name).
 */
final class ExecutorModel {
    private ExecutorModel() {
    }

    /** The location to load on this executor; the given one when neither copy exists (loading then names it). */
    static String resolve(String location) {
        if (location == null || location.isBlank() || LoadedModels.DEFAULT.equals(location)) return LoadedModels.DEFAULT;
        Path given = Path.of(location);
        if (Files.isRegularFile(given)) return location;
        Path name = given.getFileName();
        if (name != null) {
            try {
                Path shipped = Path.of(SparkFiles.get(name.toString()));
                if (Files.isRegularFile(shipped)) return shipped.toString();
            } catch (RuntimeException e) {
                // no Spark environment here (outside a task): only the given path counts
            }
        }
        return location;
    }
}
