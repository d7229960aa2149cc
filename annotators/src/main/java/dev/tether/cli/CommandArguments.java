package dev.tether.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Parses {@code --name value...} options and positional words. An option takes every following word up to the next
 * option; flags (declared up front) take none. Everything else is an error, so a typo never passes silently: an
 * unknown option, a single-dash word ({@code -v}, {@code -json}: Tether's options have two dashes), and a
 * positional word where the command takes none (or more of them than it takes).
 */
final class CommandArguments {
    private final Map<String, List<String>> options = new LinkedHashMap<>();
    private final List<String> positional = new ArrayList<>();

    /** A command that takes no positional words. */
    CommandArguments(String command, String[] args, int from, Set<String> valued, Set<String> flags) throws UsageException {
        this(command, args, from, valued, flags, 0);
    }

    /** A command that takes up to {@code maxPositional} positional words before its options. */
    CommandArguments(String command, String[] args, int from, Set<String> valued, Set<String> flags, int maxPositional)
            throws UsageException {
        String current = null;
        for (int i = from; i < args.length; i++) {
            String a = args[i];
            if (a.startsWith("--") && a.length() > 2) {
                String name = a.substring(2);
                if (flags.contains(name)) {
                    options.put(name, List.of());
                    current = null;
                } else if (valued.contains(name)) {
                    options.computeIfAbsent(name, k -> new ArrayList<>());
                    current = name;
                } else {
                    throw new UsageException("'" + command + "' has no option --" + name + "; options: "
                            + String.join(", ", describe(valued, flags)));
                }
            } else if (a.startsWith("-") && a.length() > 1 && !(current != null && a.matches("-[0-9.]+"))) {
                String hint = a.startsWith("--") ? "" : valued.contains(a.substring(1)) || flags.contains(a.substring(1))
                        ? "; did you mean -" + a + "?" : "; Tether's options start with two dashes";
                throw new UsageException("'" + a + "' is not an option of '" + command + "'" + hint
                        + " (a file whose name starts with a dash can be given as ./" + a + ")");
            } else if (current != null) {
                options.get(current).add(a);
            } else if (positional.size() < maxPositional) {
                positional.add(a);
            } else {
                throw new UsageException("unexpected word '" + a + "'"
                        + (maxPositional == 0 ? ": '" + command + "' takes only options" : "")
                        + "; options: " + String.join(", ", describe(valued, flags)));
            }
        }
        for (String name : valued) {
            if (options.containsKey(name) && options.get(name).isEmpty()) {
                throw new UsageException("--" + name + " needs a value");
            }
        }
    }

    private static List<String> describe(Set<String> valued, Set<String> flags) {
        List<String> all = new ArrayList<>();
        valued.stream().sorted().forEach(v -> all.add("--" + v));
        flags.stream().sorted().forEach(f -> all.add("--" + f));
        return all;
    }

    boolean has(String name) {
        return options.containsKey(name);
    }

    List<String> values(String name) {
        return options.getOrDefault(name, List.of());
    }

    /** The single value of {@code name}, or {@code fallback} when absent. */
    String value(String name, String fallback) throws UsageException {
        List<String> v = values(name);
        if (v.isEmpty()) return fallback;
        if (v.size() > 1) throw new UsageException("--" + name + " takes one value, got " + v.size() + ": " + v);
        return v.get(0);
    }

    String required(String name) throws UsageException {
        String v = value(name, null);
        if (v == null) throw new UsageException("--" + name + " is required");
        return v;
    }

    /** The value of {@code name} as a whole number of at least {@code min}, or {@code fallback} when absent. */
    int integer(String name, int min, int fallback) throws UsageException {
        String v = value(name, null);
        if (v == null) return fallback;
        try {
            int n = Integer.parseInt(v);
            if (n >= min) return n;
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new UsageException("--" + name + " takes a whole number of at least " + min + ", got '" + v + "'");
    }

    List<String> positional() {
        return positional;
    }
}
