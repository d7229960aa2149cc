package dev.tether.cli;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

/** One run of the command line with its exit code and what it printed. */
record CommandLineRun(int exitCode, String out, String err) {
    static CommandLineRun of(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code;
        try (PrintStream o = new PrintStream(out, true, StandardCharsets.UTF_8);
             PrintStream e = new PrintStream(err, true, StandardCharsets.UTF_8)) {
            code = new Tether().run(args, o, e);
        }
        return new CommandLineRun(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    @Override
    public String toString() {
        return "exit " + exitCode + "\n--- out\n" + out + "--- err\n" + err;
    }
}
