package dev.tether.cli;

import dev.tether.spark.SparkMaster;

/** The {@code --spark MASTER} option shared by the commands that run on Spark. */
final class SparkOption {
    private SparkOption() {
    }

    /** The master named by the option, {@code null} without it; a value that names no master is a usage error. */
    static SparkMaster master(String value) throws UsageException {
        if (value == null) return null;
        try {
            return SparkMaster.parse(value);
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
    }
}
