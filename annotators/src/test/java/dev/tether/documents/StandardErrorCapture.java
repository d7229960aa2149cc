package dev.tether.documents;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

/**
 * What the engines log while a piece of test code runs. The command line's logging back end (slf4j-simple, also on
 * the test class path) writes UIMA's log records to {@code System.err} as it finds it at each record, so swapping
 * {@code System.err} for the duration captures them.
 */
public final class StandardErrorCapture {
    /** Code under test. */
    @FunctionalInterface
    public interface Action {
        void run() throws Exception;
    }

    private StandardErrorCapture() {
    }

    /** Runs {@code action} and returns what was written to {@code System.err} meanwhile. */
    public static String during(Action action) throws Exception {
        PrintStream original = System.err;
        ByteArrayOutputStream captured = new ByteArrayOutputStream();
        try (PrintStream p = new PrintStream(captured, true, StandardCharsets.UTF_8)) {
            System.setErr(p);
            action.run();
        } finally {
            System.setErr(original);
        }
        String text = captured.toString(StandardCharsets.UTF_8);
        original.print(text); // keep it in the test log too
        return text;
    }

    /** How many times {@code part} occurs in {@code text}. */
    public static int count(String text, String part) {
        int n = 0;
        for (int i = text.indexOf(part); i >= 0; i = text.indexOf(part, i + part.length())) n++;
        return n;
    }
}
