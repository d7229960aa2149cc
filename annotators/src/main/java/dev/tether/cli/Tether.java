package dev.tether.cli;

import dev.tether.model.ModelFile;
import dev.tether.output.IoFailure;
import org.apache.uima.UIMAFramework;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.file.FileSystemException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.TreeMap;
import java.util.function.Supplier;

/**
 * The command line: {@code tether <command> [options]}. Exit codes: 0 success; 1 the run finished but some inputs
 * failed (listed in its summary); 2 the command line was wrong; 3 an input or model could not be used.
 * {@code tether <command> --help} describes one command, {@code tether --help} lists them, {@code tether --version}
 * prints the version.
 */
public final class Tether {
    static final int OK = 0;
    static final int SOME_FAILED = 1;
    static final int USAGE = 2;
    static final int INPUT = 3;

    /** Every verb of the command line; a new command is one more line here. */
    private static final List<Supplier<Command>> VERBS = List.of(
            AuditCommand::new,
            AnnotateCommand::new,
            EvaluateCommand::new,
            InspectCommand::new,
            ThesaurusCommand::new,
            TrainCommand::new);

    private final Map<String, Command> commands = new TreeMap<>();

    Tether() {
        for (Supplier<Command> verb : VERBS) {
            Command c = verb.get();
            commands.put(c.name(), c);
        }
    }

    public static void main(String[] args) {
        System.exit(new Tether().run(args, System.out, System.err));
    }

    /** Runs one command line and returns its exit code (for a main class of another launcher, such as spark-submit's). */
    public static int execute(String[] args, PrintStream out, PrintStream err) {
        return new Tether().run(args, out, err);
    }

    int run(String[] args, PrintStream out, PrintStream err) {
        if (args.length == 0) {
            printHelp(err);
            return USAGE;
        }
        if (args[0].equals("--help") || args[0].equals("help")) {
            if (args.length > 1 && commands.containsKey(args[1])) {
                out.print(commands.get(args[1]).help());
            } else {
                printHelp(out);
            }
            return OK;
        }
        if (args[0].equals("--version")) {
            printVersion(out);
            return OK;
        }
        Command command = commands.get(args[0]);
        if (command == null) {
            err.println("tether: unknown command '" + args[0] + "'" + suggestion(args[0]));
            printHelp(err);
            return USAGE;
        }
        for (int i = 1; i < args.length; i++) {
            if (args[i].equals("--help") || args[i].equals("-h")) {
                out.print(command.help());
                return OK;
            }
        }
        try {
            return command.run(args, out, err);
        } catch (UsageException e) {
            err.println("tether " + command.name() + ": " + e.getMessage());
            err.println("usage: tether " + command.usage());
            err.println("(tether " + command.name() + " --help describes every option)");
            return USAGE;
        } catch (IOException | UncheckedIOException e) {
            IOException io = e instanceof UncheckedIOException u ? u.getCause() : (IOException) e;
            err.println("tether " + command.name() + ": " + (io instanceof FileSystemException ? IoFailure.describe(io) : io.getMessage()));
            return INPUT;
        } catch (IllegalArgumentException | IllegalStateException e) {
            err.println("tether " + command.name() + ": " + e.getMessage());
            return INPUT;
        }
    }

    /** " — did you mean 'x'?" for the verb closest to {@code word}, when one is close; otherwise nothing. */
    private String suggestion(String word) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String verb : commands.keySet()) {
            int d = editDistance(word.toLowerCase(java.util.Locale.ROOT), verb);
            if (d < bestDistance) {
                best = verb;
                bestDistance = d;
            }
        }
        boolean close = best != null && (bestDistance <= Math.max(1, best.length() / 3)
                || (word.length() >= 3 && best.startsWith(word.toLowerCase(java.util.Locale.ROOT))));
        return close ? "; did you mean '" + best + "'?" : "";
    }

    /** Levenshtein distance (insertions, deletions and substitutions, each costing one). */
    static int editDistance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) previous[j] = j;
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int substitution = previous[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                current[j] = Math.min(substitution, Math.min(previous[j], current[j - 1]) + 1);
            }
            int[] t = previous;
            previous = current;
            current = t;
        }
        return previous[b.length()];
    }

    private void printHelp(PrintStream s) {
        s.println("usage: tether <command> [options]      (tether <command> --help for one command; tether --version)");
        List<Command> all = new ArrayList<>(commands.values());
        for (Command c : all) s.println("  " + c.usage());
    }

    private static void printVersion(PrintStream out) {
        out.println("tether " + version());
        out.println("model file format " + ModelFile.FORMAT_VERSION + ", UIMA " + UIMAFramework.getVersionString()
                + ", Java " + System.getProperty("java.version"));
    }

    /** Tether's version, from the build. */
    static String version() {
        Properties p = new Properties();
        try (InputStream in = Tether.class.getResourceAsStream("version.properties")) {
            if (in != null) p.load(in);
        } catch (IOException e) {
            // an unknown version is reported as such
        }
        return p.getProperty("version", "unknown");
    }
}
