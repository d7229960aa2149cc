package dev.tether.io;

import dev.tether.attachment.AttachmentSite;
import dev.tether.attachment.LabelledQuadruple;
import dev.tether.attachment.Quadruple;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

/**
 * Reads labelled quadruples in either of two formats, told apart by the first line:
 * <ul>
 *   <li>the benchmark's: one example per line, whitespace separated, {@code id verb noun1 preposition noun2 V|N}
 *       (Ratnaparkhi, Reynar &amp; Roukos 1994);</li>
 *   <li>Tether's own: tab separated with the header {@value #HEADER_TEXT} and the site written {@code verb} or
 *       {@code noun}; lines starting with {@code #} are comments.</li>
 * </ul>
 * Blank lines are ignored. A malformed line is an error naming file and line, unless skipping was asked for; then it
 * is skipped and counted.
 */
public final class QuadrupleReader {
    /** Header of Tether's own tab-separated format. */
    public static final String HEADER_TEXT = "verb\tnoun1\tpreposition\tnoun2\tsite";
    private static final Pattern WHITESPACE = Pattern.compile("\\s+");
    private static final int REASONS_KEPT = 5;

    private final boolean skipMalformed;

    public QuadrupleReader(boolean skipMalformed) {
        this.skipMalformed = skipMalformed;
    }

    public QuadrupleSet read(Path file) throws IOException {
        if (Files.isDirectory(file)) {
            throw new InputFormatException(file, 0, "is a directory; give a file of labelled quadruples");
        }
        if (!Files.isReadable(file)) {
            throw new InputFormatException(file, 0, "cannot be read (missing or no permission)");
        }
        byte[] bytes = Files.readAllBytes(file);
        String text = Utf8Text.decode(file, bytes);
        String[] lines = text.split("\r?\n", -1);
        int first = 0;
        while (first < lines.length && lines[first].isBlank()) first++;
        boolean own = first < lines.length && lines[first].strip().equals(HEADER_TEXT);
        List<LabelledQuadruple> out = new ArrayList<>();
        List<String> reasons = new ArrayList<>();
        int skipped = 0;
        for (int i = own ? first + 1 : 0; i < lines.length; i++) {
            String line = lines[i];
            if (line.isBlank() || (own && line.startsWith("#"))) continue;
            String source = file.getFileName() + ":" + (i + 1);
            String problem = own ? parseOwn(line, source, out) : parseBenchmark(line, source, out);
            if (problem != null) {
                if (!skipMalformed) {
                    throw new InputFormatException(file, i + 1, problem
                            + ". Fix the line, or pass --skip-malformed to skip and count such lines.");
                }
                skipped++;
                if (reasons.size() < REASONS_KEPT) reasons.add(source + ": " + problem);
            }
        }
        if (out.isEmpty()) {
            throw new InputFormatException(file, 0, skipped > 0
                    ? "holds no usable quadruple (" + skipped + " malformed lines skipped)"
                    : "holds no quadruples; expected lines 'id verb noun1 preposition noun2 V|N' or the header '"
                    + HEADER_TEXT.replace('\t', ' ') + "' (tab separated)");
        }
        return new QuadrupleSet(file.getFileName().toString(), Sha256.hex(bytes), out, skipped, reasons);
    }

    private static String parseBenchmark(String line, String source, List<LabelledQuadruple> out) {
        String[] f = WHITESPACE.split(line.strip());
        if (f.length != 6) {
            return "expected 6 fields 'id verb noun1 preposition noun2 V|N', found " + f.length;
        }
        AttachmentSite site = AttachmentSite.ofLabel(f[5]);
        if (site == null) return "unknown label '" + f[5] + "'; expected V or N";
        out.add(new LabelledQuadruple(new Quadruple(f[1], f[2], f[3], f[4]), site, source));
        return null;
    }

    private static String parseOwn(String line, String source, List<LabelledQuadruple> out) {
        String[] f = line.split("\t", -1);
        if (f.length != 5) return "expected 5 tab-separated fields 'verb noun1 preposition noun2 site', found " + f.length;
        for (int k = 0; k < 4; k++) {
            if (f[k].isBlank()) return "field " + (k + 1) + " is empty";
        }
        String label = f[4].strip();
        AttachmentSite site = "verb".equals(label) ? AttachmentSite.VERB : "noun".equals(label) ? AttachmentSite.NOUN : null;
        if (site == null) return "unknown site '" + label + "'; expected verb or noun";
        out.add(new LabelledQuadruple(new Quadruple(f[0].strip(), f[1].strip(), f[2].strip(), f[3].strip()), site, source));
        return null;
    }
}
