package dev.tether.evaluation;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.lang.reflect.Constructor;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.nio.charset.StandardCharsets;

/**
 * Runs Tether's command line in this process, exactly as {@code ./tether} would (same class, same arguments), and
 * keeps its exit code and output. The entry point {@code dev.tether.cli.Tether#run} is package-private to the
 * command-line package, so it is reached by reflection; {@code Tether.main} would end the test JVM.
 */
record CommandLineEntry(int exitCode, String out, String err) {
    static CommandLineEntry run(String... args) throws ReflectiveOperationException {
        Class<?> tether = Class.forName("dev.tether.cli.Tether");
        Constructor<?> constructor = tether.getDeclaredConstructor();
        constructor.setAccessible(true);
        Method run = tether.getDeclaredMethod("run", String[].class, PrintStream.class, PrintStream.class);
        run.setAccessible(true);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code;
        try (PrintStream o = new PrintStream(out, true, StandardCharsets.UTF_8);
             PrintStream e = new PrintStream(err, true, StandardCharsets.UTF_8)) {
            code = (Integer) run.invoke(constructor.newInstance(), args, o, e);
        } catch (InvocationTargetException e) {
            if (e.getCause() instanceof RuntimeException r) throw r;
            throw e;
        }
        return new CommandLineEntry(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    @Override
    public String toString() {
        return "exit " + exitCode + "\n--- out\n" + out + "--- err\n" + err;
    }
}
