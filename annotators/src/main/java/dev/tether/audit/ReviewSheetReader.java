package dev.tether.audit;

import dev.tether.candidates.HeadClass;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads a {@link ReviewSheet} back after a reviewer marked it. Lines marked {@code ?} are skipped silently (not
 * reviewed); a line that does not parse, or whose mark is not one of the choices it offers, is reported with its
 * line number and skipped, and the rest is read. A file without the sheet's header is refused as a whole.
 */
public final class ReviewSheetReader {
    /** One head offered on a line. */
    public record Offered(Span head, HeadClass headClass, double probability) {
    }

    /**
     * One reviewed line: where the decision is, the heads offered (the decision's own choice first) and the index
     * of the one the reviewer chose, {@code -1} when none is right.
     */
    public record ReviewedLine(int line, String doc, Span preposition, Span object, List<Offered> offered, int chosen) {
        public ReviewedLine {
            offered = List.copyOf(offered);
        }
    }

    /** The reviewed lines and a message per line that could not be used ("FILE:LINE: what"). */
    public record Sheet(Path file, List<ReviewedLine> reviewed, List<String> problems, int unreviewed) {
        public Sheet {
            reviewed = List.copyOf(reviewed);
            problems = List.copyOf(problems);
        }
    }

    public Sheet read(Path file) throws IOException {
        if (!Files.isRegularFile(file)) throw new IOException(file + " does not exist or is not a file; give a review sheet written by 'tether audit --queue N'");
        List<ReviewedLine> reviewed = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        int unreviewed = 0;
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String first = in.readLine();
            if (first == null || !first.startsWith("# tether review sheet, format ")) {
                throw new IOException(file + ":1: not a Tether review sheet (its first line is '" + ReviewSheet.HEADER
                        + "'); write one with 'tether audit --queue N'");
            }
            if (!first.equals(ReviewSheet.HEADER)) {
                throw new IOException(file + ":1: '" + first + "': this Tether reads review sheet format " + ReviewSheet.FORMAT
                        + "; write the sheet again with 'tether audit --queue N'");
            }
            int number = 1;
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                number++;
                if (line.isBlank() || line.startsWith("#")) continue;
                try {
                    ReviewedLine r = parse(number, line);
                    if (r == null) unreviewed++;
                    else reviewed.add(r);
                } catch (IllegalArgumentException e) {
                    problems.add(file + ":" + number + ": " + e.getMessage() + "; line skipped");
                }
            }
        } catch (java.nio.charset.MalformedInputException e) {
            throw new IOException(file + " is not UTF-8 text", e);
        }
        return new Sheet(file, reviewed, problems, unreviewed);
    }

    /** The reviewed line, or null when it is marked as not reviewed; IllegalArgumentException saying what is wrong. */
    private static ReviewedLine parse(int number, String line) {
        String[] cols = line.split("\t", -1);
        if (cols.length < 6) {
            throw new IllegalArgumentException("expected at least 6 tab-separated columns (mark, document, preposition, "
                    + "object, margin, choices), found " + cols.length);
        }
        String mark = cols[0].trim();
        if (mark.equals("?")) return null;
        Span preposition = wordAt(cols[2]);
        Span object = wordAt(cols[3]);
        List<Offered> offered = new ArrayList<>();
        for (int k = 5; k < cols.length; k++) {
            String c = cols[k];
            int colon = c.indexOf(':');
            if (colon < 0 || !c.substring(0, colon).equals(Integer.toString(k - 4))) {
                throw new IllegalArgumentException("choice '" + c + "' does not start with its number " + (k - 4) + ":");
            }
            int space = c.lastIndexOf(' ');
            if (space < colon) throw new IllegalArgumentException("choice '" + c + "' has no probability");
            String head = c.substring(colon + 1, space);
            int slash = head.lastIndexOf('/', head.lastIndexOf('@'));
            if (slash < 0) throw new IllegalArgumentException("choice '" + c + "' is not N:word/class@offset probability");
            HeadClass cls = headClass(head.substring(slash + 1, head.lastIndexOf('@')), c);
            double p = probability(c.substring(space + 1), c);
            offered.add(new Offered(wordAt(head.substring(0, slash) + head.substring(head.lastIndexOf('@'))), cls, p));
        }
        int chosen;
        if (mark.equals("=")) {
            chosen = 0;
        } else if (mark.equalsIgnoreCase("x")) {
            chosen = -1;
        } else if (mark.matches("[0-9]{1,3}")) {
            chosen = Integer.parseInt(mark) - 1;
            if (chosen < 0 || chosen >= offered.size()) {
                throw new IllegalArgumentException("choice " + mark + " is not one of the " + offered.size() + " offered (1-"
                        + offered.size() + ")");
            }
        } else {
            throw new IllegalArgumentException("mark '" + mark + "' is not ?, =, x or a choice number");
        }
        return new ReviewedLine(number, ReviewSheet.unescape(cols[1]), preposition, object, offered, chosen);
    }

    private static Span wordAt(String field) {
        int at = field.lastIndexOf('@');
        if (at <= 0) throw new IllegalArgumentException("'" + field + "' is not word@offset");
        int begin;
        try {
            begin = Integer.parseInt(field.substring(at + 1));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("'" + field + "' is not word@offset");
        }
        if (begin < 0) throw new IllegalArgumentException("'" + field + "' has a negative offset");
        String word = ReviewSheet.unescape(field.substring(0, at));
        return new Span(begin, begin + word.codePointCount(0, word.length()), word);
    }

    private static HeadClass headClass(String label, String choice) {
        for (HeadClass c : HeadClass.values()) if (c.label().equals(label.toLowerCase(Locale.ROOT))) return c;
        throw new IllegalArgumentException("choice '" + choice + "' has the class '" + label + "', not verb, noun, adjective or adverb");
    }

    private static double probability(String s, String choice) {
        try {
            double p = Double.parseDouble(s);
            if (p >= 0 && p <= 1) return p;
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new IllegalArgumentException("choice '" + choice + "' has no probability in [0, 1]");
    }
}
