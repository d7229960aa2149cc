package dev.tether.output;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.ByteBuffer;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeMap;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;

/**
 * The documents of an output folder that are complete: one JSON object per line, {@value #FILE} in the output
 * folder. Each entry names the document, the SHA-256 of its input bytes, the settings that shaped its output (model
 * id, options), its output files with their SHA-256, and its counts. A document appears only after all its output
 * files have their final names, so a run that is killed at any moment leaves a manifest that lists exactly the
 * documents that need no work.
 *
 * <p>During a run, entries are appended as documents complete (a later line for the same
 * document replaces an earlier one; a line {@code {"doc":…,"removed":true}} withdraws it; a torn last line from a
 * killed run is ignored). At the end of the run the manifest is rewritten atomically, sorted by document, so a
 * finished run leaves the same manifest whatever the thread count or the number of interruptions.
 */
public final class RunManifest implements AutoCloseable {
    public static final String FILE = "run-manifest.jsonl";
    private static final JsonFactory JSON = new JsonFactory();

    /** One complete document. {@code outputs} maps each output file name (relative to the folder) to its SHA-256. */
    public record Entry(String doc, String inputSha256, String settings, Map<String, String> outputs, long decisions,
                        long characters) implements java.io.Serializable {
        public Entry {
            outputs = Collections.unmodifiableMap(new LinkedHashMap<>(outputs));
        }
    }

    private final Path file;
    private final Map<String, Entry> entries;
    private FileChannel journal;

    private RunManifest(Path file, Map<String, Entry> entries) {
        this.file = file;
        this.entries = entries;
    }

    /** The manifest of {@code folder}: what an earlier run completed there, or nothing. */
    public static RunManifest open(Path folder) throws IOException {
        Path file = folder.resolve(FILE);
        Map<String, Entry> entries = new TreeMap<>();
        if (Files.isRegularFile(file)) {
            try (BufferedReader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
                for (String line = r.readLine(); line != null; line = r.readLine()) {
                    readLine(line, entries);
                }
            } catch (java.nio.charset.MalformedInputException e) {
                entries.clear(); // not written by Tether; every document is done again
            }
        }
        return new RunManifest(file, entries);
    }

    /** Forgets every entry (a fresh run). */
    public synchronized void clear() {
        entries.clear();
    }

    /** The entry of {@code doc}, or {@code null} when it is not complete. */
    public synchronized Entry get(String doc) {
        return entries.get(doc);
    }

    /** All complete documents, sorted by name. */
    public synchronized Map<String, Entry> entries() {
        return new TreeMap<>(entries);
    }

    /**
     * Records that {@code entry}'s outputs are complete (handed to the operating system before it returns; not forced
     * to disk, see {@link AtomicFile}).
     */
    public synchronized void complete(Entry entry) throws IOException {
        entries.put(entry.doc(), entry);
        append(line(entry));
    }

    /** Records that {@code doc} has no complete output any more. */
    public synchronized void withdraw(String doc) throws IOException {
        if (entries.remove(doc) == null) return;
        StringWriter w = new StringWriter();
        try (JsonGenerator g = JSON.createGenerator(w)) {
            g.writeStartObject();
            g.writeStringField("doc", doc);
            g.writeBooleanField("removed", true);
            g.writeEndObject();
        }
        append(w + "\n");
    }

    /** Rewrites the manifest atomically with the complete documents in sorted order. */
    public synchronized void compact() throws IOException {
        closeJournal();
        AtomicFile.write(file, out -> {
            for (Entry e : new TreeMap<>(entries).values()) out.write(line(e).getBytes(StandardCharsets.UTF_8));
        });
    }

    @Override
    public synchronized void close() throws IOException {
        closeJournal();
    }

    private void closeJournal() throws IOException {
        if (journal != null) {
            journal.close();
            journal = null;
        }
    }

    private void append(String line) throws IOException {
        if (journal == null) {
            // A killed run may have left a torn line: start on a line of our own.
            boolean tornLine = false;
            if (Files.isRegularFile(file) && Files.size(file) > 0) {
                try (FileChannel read = FileChannel.open(file, StandardOpenOption.READ)) {
                    ByteBuffer last = ByteBuffer.allocate(1);
                    read.read(last, read.size() - 1);
                    tornLine = last.get(0) != '\n';
                }
            }
            journal = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.WRITE, StandardOpenOption.APPEND);
            if (tornLine) journal.write(ByteBuffer.wrap(new byte[] {'\n'}));
        }
        journal.write(ByteBuffer.wrap(line.getBytes(StandardCharsets.UTF_8)));
    }

    private static String line(Entry e) throws IOException {
        StringWriter w = new StringWriter();
        try (JsonGenerator g = JSON.createGenerator(w)) {
            g.writeStartObject();
            g.writeStringField("doc", e.doc());
            g.writeStringField("input", e.inputSha256());
            g.writeStringField("settings", e.settings());
            g.writeObjectFieldStart("outputs");
            for (Map.Entry<String, String> o : e.outputs().entrySet()) g.writeStringField(o.getKey(), o.getValue());
            g.writeEndObject();
            g.writeNumberField("decisions", e.decisions());
            g.writeNumberField("characters", e.characters());
            g.writeEndObject();
        }
        return w + "\n";
    }

    /** Adds (or withdraws) the entry of one line; a line that does not parse is ignored (a torn last line). */
    private static void readLine(String line, Map<String, Entry> entries) {
        if (line.isBlank()) return;
        String doc = null;
        String input = null;
        String settings = null;
        Map<String, String> outputs = new LinkedHashMap<>();
        long decisions = -1;
        long characters = -1;
        boolean removed = false;
        try (JsonParser p = JSON.createParser(line)) {
            if (p.nextToken() != JsonToken.START_OBJECT) return;
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String name = p.currentName();
                JsonToken value = p.nextToken();
                switch (name) {
                    case "doc" -> doc = p.getValueAsString();
                    case "input" -> input = p.getValueAsString();
                    case "settings" -> settings = p.getValueAsString();
                    case "decisions" -> decisions = p.getValueAsLong(-1);
                    case "characters" -> characters = p.getValueAsLong(-1);
                    case "removed" -> removed = p.getValueAsBoolean();
                    case "outputs" -> {
                        if (value != JsonToken.START_OBJECT) return;
                        while (p.nextToken() == JsonToken.FIELD_NAME) {
                            String out = p.currentName();
                            p.nextToken();
                            outputs.put(out, p.getValueAsString());
                        }
                    }
                    default -> p.skipChildren();
                }
            }
            if (p.currentToken() != JsonToken.END_OBJECT) return;
        } catch (IOException e) {
            return;
        }
        if (doc == null) return;
        if (removed) {
            entries.remove(doc);
        } else if (input != null && settings != null && decisions >= 0 && characters >= 0 && !outputs.isEmpty()) {
            entries.put(doc, new Entry(doc, input, settings, outputs, decisions, characters));
        }
    }
}
