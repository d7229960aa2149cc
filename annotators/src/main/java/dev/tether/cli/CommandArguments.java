package dev.tether.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Parses {@code --name value...} options and positional words. An option takes every following word up to the next
 * option; flags (declared up front) take none. Unknown options are errors, so a typo never passes silently.
 */
final class CommandArguments {
    private final Map<String, List<String>> options = new LinkedHashMap<>();
    private final List<String> positional = new ArrayList<>();

    CommandArguments(String command, String[] args, int from, Set<String> valued, Set<String> flags) throws UsageException {
        String current = null;
        for (int i = from; i < args.length; i++) {
            String a = args[i];
            if (a.startsWith("--")) {
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
            } else if (current != null) {
                options.get(current).add(a);
            } else {
                positional.add(a);
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

    List<String> positional() {
        return positional;
    }
}
