package dev.tether.spark;

/**
 * Whether Spark's classes can be loaded. Spark is a {@code provided} dependency: a UIMA pipeline that adds Tether does
 * not get it, the {@code tether} launcher adds it for {@code --spark}, and a cluster's {@code spark-submit} brings its
 * own. This class touches no Spark class, so the command line can ask before it loads any.
 */
public final class SparkLibraries {
    private SparkLibraries() {
    }

    /** Fails with what to do when Spark is not on the class path. */
    public static void require() {
        try {
            Class.forName("org.apache.spark.api.java.JavaSparkContext", false, SparkLibraries.class.getClassLoader());
        } catch (ClassNotFoundException | LinkageError e) {
            throw new IllegalStateException("the Spark libraries are not on the class path: run through the ./tether"
                    + " launcher, which adds them for --spark, or on a cluster through spark-submit with Tether's job jar"
                    + " (see README, 'Running on Spark')");
        }
    }
}
