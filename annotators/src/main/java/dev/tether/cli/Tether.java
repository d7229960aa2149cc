package dev.tether.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.util.Map;
import java.util.TreeMap;

/**
 * The command line: {@code tether <command> [options]}. Exit codes: 0 success; 1 the run finished but some inputs
 * failed (listed in its summary); 2 the command line was wrong; 3 an input or model could not be used.
 */
public final class Tether {
    static final int OK = 0;
    static final int SOME_FAILED = 1;
    static final int USAGE = 2;
    static final int INPUT = 3;

    private final Map<String, Command> commands = new TreeMap<>();

    Tether() {
        register(new TrainCommand());
        register(new EvaluateCommand());
        register(new InspectCommand());
        register(new AnnotateCommand());
        register(new ThesaurusCommand());
    }

    private void register(Command c) {
        commands.put(c.name(), c);
    }

    public static void main(String[] args) {
        System.exit(new Tether().run(args, System.out, System.err));
    }

    int run(String[] args, PrintStream out, PrintStream err) {
        if (args.length == 0 || args[0].equals("--help") || args[0].equals("help")) {
            printHelp(args.length == 0 ? err : out);
            return args.length == 0 ? USAGE : OK;
        }
        Command command = commands.get(args[0]);
        if (command == null) {
            err.println("tether: unknown command '" + args[0] + "'");
            printHelp(err);
            return USAGE;
        }
        try {
            return command.run(args, out, err);
        } catch (UsageException e) {
            err.println("tether " + command.name() + ": " + e.getMessage());
            err.println("usage: tether " + command.usage());
            return USAGE;
        } catch (IOException | UncheckedIOException | IllegalArgumentException | IllegalStateException e) {
            err.println("tether " + command.name() + ": " + e.getMessage());
            return INPUT;
        }
    }

    private void printHelp(PrintStream s) {
        s.println("usage: tether <command> [options]");
        for (Command c : commands.values()) s.println("  " + c.usage());
    }
}
