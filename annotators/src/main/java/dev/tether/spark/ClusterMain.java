package dev.tether.spark;

import dev.tether.cli.Tether;
import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;

import java.util.Arrays;

/**
 * The main class of Tether's job jar under {@code spark-submit}: the arguments are a command of {@code tether}
 * ({@code annotate ...} or {@code train ...}) without {@code --spark}, which it runs on the context that
 * spark-submit's settings describe ({@code --master}, memory, {@code --files}). The exit code is the command's.
 */
public final class ClusterMain {
    private ClusterMain() {
    }

    public static void main(String[] args) {
        if (Arrays.asList(args).contains("--spark")) {
            System.err.println("tether: under spark-submit the master is spark-submit's --master; leave --spark out");
            System.exit(2);
        }
        JavaSparkContext context = new JavaSparkContext(new SparkConf().setAppName("tether " + (args.length > 0 ? args[0] : "")));
        int code;
        try {
            SparkJob.lend(context);
            String[] withMaster = Arrays.copyOf(args, args.length + 2);
            withMaster[args.length] = "--spark";
            withMaster[args.length + 1] = context.master();
            code = Tether.execute(withMaster, System.out, System.err);
        } finally {
            SparkJob.lend(null);
            context.stop();
        }
        System.exit(code);
    }
}
