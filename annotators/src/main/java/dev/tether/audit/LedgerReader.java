package dev.tether.audit;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import dev.tether.ledger.LedgerWriter;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

/**
 * Reads the output folder of {@code tether annotate}: {@code run-summary.json} (ledger format, model) and every
 * {@code *.ledger.jsonl} under it, in path order. Refuses a folder whose ledger format is not {@link LedgerWriter#FORMAT},
 * a line that is not a JSON object or lacks a field, a kind it does not know, and a decision made by another model
 * than the summary names; every error names the file and line and what to do.
 */
public final class LedgerReader {
    public static final String SUMMARY = "run-summary.json";
    public static final String LEDGER_SUFFIX = ".ledger.jsonl";
    private static final JsonFactory JSON = new JsonFactory();

    public AuditedRun read(Path folder) throws IOException {
        if (!Files.isDirectory(folder)) throw new IOException(folder + " is not a folder; give the --out folder of 'tether annotate'");
        Path summaryFile = folder.resolve(SUMMARY);
        if (!Files.isRegularFile(summaryFile)) {
            throw new IOException(folder + " has no " + SUMMARY + "; give the --out folder of a finished 'tether annotate' run");
        }
        Map<String, Object> summary;
        try {
            Object value = parseJson(Files.readString(summaryFile, StandardCharsets.UTF_8));
            if (!(value instanceof Map)) throw new IOException(summaryFile + " is not a JSON object; re-run 'tether annotate'");
            summary = object(value);
        } catch (JsonProcessingException e) {
            throw new IOException(summaryFile + " is not JSON (" + e.getOriginalMessage() + "); re-run 'tether annotate'");
        }
        Object format = summary.get("ledgerFormat");
        if (format == null) {
            throw new IOException(summaryFile + " states no ledgerFormat: the ledgers were written by an older Tether; "
                    + "re-run 'tether annotate' to write them again");
        }
        if (!(format instanceof Integer) || (Integer) format != LedgerWriter.FORMAT) {
            throw new IOException(summaryFile + " says ledger format " + format + ", this Tether reads format "
                    + LedgerWriter.FORMAT + "; re-run 'tether annotate' with this Tether, or audit with the Tether that wrote it");
        }
        String modelId = summary.get("modelId") instanceof String m ? m : "";
        if (modelId.isEmpty()) throw new IOException(summaryFile + " names no modelId; re-run 'tether annotate'");
        Map<String, String> failed = new TreeMap<>();
        if (summary.get("failed") instanceof List<?> list) {
            for (Object f : list) {
                if (f instanceof Map<?, ?> m) failed.put(String.valueOf(m.get("doc")), String.valueOf(m.get("reason")));
            }
        }

        List<Path> ledgers;
        try (Stream<Path> walk = Files.walk(folder)) {
            ledgers = walk.filter(p -> p.getFileName().toString().endsWith(LEDGER_SUFFIX) && Files.isRegularFile(p))
                    .sorted().toList();
        }
        List<AuditedRun.LedgerDocument> documents = new ArrayList<>();
        for (Path ledger : ledgers) {
            String relative = folder.relativize(ledger).toString().replace('\\', '/');
            String doc = relative.substring(0, relative.length() - LEDGER_SUFFIX.length());
            documents.add(new AuditedRun.LedgerDocument(doc, ledger, readLedger(ledger, doc, modelId)));
        }
        return new AuditedRun(folder, summary.get("model") instanceof String m ? m : "", modelId, documents, failed);
    }

    private static List<LedgerEntry> readLedger(Path ledger, String doc, String modelId) throws IOException {
        List<LedgerEntry> entries = new ArrayList<>();
        try (BufferedReader in = Files.newBufferedReader(ledger, StandardCharsets.UTF_8)) {
            int number = 0;
            for (String text = in.readLine(); text != null; text = in.readLine()) {
                number++;
                if (text.isBlank()) continue;
                LedgerEntry e = parse(new Line(ledger, number), text, doc);
                if (!e.modelId().equals(modelId)) {
                    throw new IOException(ledger + ":" + number + ": decided by model " + e.modelId() + ", but " + SUMMARY
                            + " says the run used model " + modelId + "; the folder mixes runs of different models, "
                            + "re-run 'tether annotate' into an empty folder");
                }
                entries.add(e);
            }
        } catch (java.nio.charset.MalformedInputException e) {
            throw new IOException(ledger + " is not UTF-8 text; re-run 'tether annotate'", e);
        }
        return entries;
    }

    /** Where a field is read from, for error messages. */
    private record Line(Path file, int number) {
        IOException error(String what) {
            return new IOException(file + ":" + number + ": " + what);
        }
    }

    private static LedgerEntry parse(Line at, String text, String doc) throws IOException {
        Object value;
        try {
            value = parseJson(text);
        } catch (JsonProcessingException e) {
            throw at.error("not JSON (" + e.getOriginalMessage() + "); each line of a ledger is one JSON object, "
                    + "re-run 'tether annotate' to write it again");
        }
        if (!(value instanceof Map)) throw at.error("not a JSON object; each line of a ledger is one decision");
        Map<String, Object> o = object(value);
        String lineDoc = text(at, o, "doc");
        if (!lineDoc.equals(doc)) throw at.error("names document '" + lineDoc + "' but the file is the ledger of '" + doc + "'");
        String kind = text(at, o, "kind");
        switch (kind) {
            case AttachmentEntry.KIND: return attachment(at, o);
            case CoordinationEntry.KIND: return coordination(at, o);
            default:
                throw at.error("kind '" + kind + "' is not one this Tether reads (" + AttachmentEntry.KIND + ", "
                        + CoordinationEntry.KIND + "); audit with the Tether that wrote it");
        }
    }

    private static AttachmentEntry attachment(Line at, Map<String, Object> o) throws IOException {
        Map<String, Object> head = objectField(at, o, "head");
        List<AttachmentEntry.Alternative> alternatives = new ArrayList<>();
        for (Map<String, Object> a : objects(at, o, "alternatives")) {
            alternatives.add(new AttachmentEntry.Alternative(span(at, a, "head"), text(at, a, "class"), number(at, a, "probability")));
        }
        Map<String, Object> evidence = objectField(at, o, "evidence");
        return new AttachmentEntry(at.number(), span(at, o, "preposition"), span(at, o, "object"), span(at, o, "head"),
                text(at, head, "class"), number(at, o, "probability"), number(at, o, "margin"), alternatives,
                text(at, evidence, "level"), evidence.get("counts") instanceof String c ? c : "", text(at, evidence, "text"),
                text(at, evidence, "model"));
    }

    private static CoordinationEntry coordination(Line at, Map<String, Object> o) throws IOException {
        List<CoordinationEntry.Conjunct> conjuncts = new ArrayList<>();
        for (Map<String, Object> c : objects(at, o, "conjuncts")) {
            conjuncts.add(new CoordinationEntry.Conjunct(spanOf(at, c, "conjunct"), span(at, c, "head")));
        }
        Map<String, Object> evidence = objectField(at, o, "evidence");
        return new CoordinationEntry(at.number(), span(at, o, "coordinator"), conjuncts, number(at, o, "probability"),
                number(at, o, "margin"), text(at, evidence, "text"), text(at, evidence, "model"));
    }

    private static Object field(Line at, Map<String, Object> o, String name) throws IOException {
        Object v = o.get(name);
        if (v == null) throw at.error("no '" + name + "'; re-run 'tether annotate' to write the ledger again");
        return v;
    }

    private static Map<String, Object> objectField(Line at, Map<String, Object> o, String name) throws IOException {
        Object v = field(at, o, name);
        if (!(v instanceof Map)) throw at.error("'" + name + "' is not an object");
        return object(v);
    }

    private static List<Map<String, Object>> objects(Line at, Map<String, Object> o, String name) throws IOException {
        Object v = field(at, o, name);
        if (!(v instanceof List<?> list)) throw at.error("'" + name + "' is not a list");
        List<Map<String, Object>> all = new ArrayList<>();
        for (Object e : list) {
            if (!(e instanceof Map)) throw at.error("an element of '" + name + "' is not an object");
            all.add(object(e));
        }
        return all;
    }

    private static String text(Line at, Map<String, Object> o, String name) throws IOException {
        Object v = field(at, o, name);
        if (!(v instanceof String s)) throw at.error("'" + name + "' is not a string");
        return s;
    }

    private static double number(Line at, Map<String, Object> o, String name) throws IOException {
        Object v = field(at, o, name);
        double d = v instanceof Number n ? n.doubleValue() : Double.NaN;
        if (!(d >= 0 && d <= 1)) throw at.error("'" + name + "' is not a number in [0, 1]");
        return d;
    }

    private static Span span(Line at, Map<String, Object> o, String name) throws IOException {
        return spanOf(at, objectField(at, o, name), name);
    }

    private static Span spanOf(Line at, Map<String, Object> s, String name) throws IOException {
        Object b = s.get("begin");
        Object e = s.get("end");
        if (!(b instanceof Integer begin) || !(e instanceof Integer end) || begin < 0 || end < begin) {
            throw at.error("'" + name + "' has no valid begin and end");
        }
        return new Span(begin, end, text(at, s, "text"));
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> object(Object value) {
        return (Map<String, Object>) value;
    }

    /** One JSON value as maps, lists, strings, numbers, booleans and null; the whole text must be that one value. */
    private static Object parseJson(String text) throws IOException {
        try (JsonParser p = JSON.createParser(text)) {
            JsonToken first = p.nextToken();
            if (first == null) throw new JsonProcessingException("no JSON value") { };
            Object v = value(p, first);
            if (p.nextToken() != null) throw new JsonProcessingException("more than one JSON value", p.currentLocation()) { };
            return v;
        }
    }

    private static Object value(JsonParser p, JsonToken t) throws IOException {
        switch (t) {
            case START_OBJECT: {
                Map<String, Object> m = new LinkedHashMap<>();
                for (JsonToken k = p.nextToken(); k != JsonToken.END_OBJECT; k = p.nextToken()) {
                    String name = p.currentName();
                    m.put(name, value(p, p.nextToken()));
                }
                return m;
            }
            case START_ARRAY: {
                List<Object> l = new ArrayList<>();
                for (JsonToken e = p.nextToken(); e != JsonToken.END_ARRAY; e = p.nextToken()) l.add(value(p, e));
                return l;
            }
            case VALUE_STRING: return p.getText();
            case VALUE_NUMBER_INT: return p.getNumberType() == JsonParser.NumberType.INT ? (Object) p.getIntValue() : (Object) p.getLongValue();
            case VALUE_NUMBER_FLOAT: return p.getDoubleValue();
            case VALUE_TRUE: return Boolean.TRUE;
            case VALUE_FALSE: return Boolean.FALSE;
            default: return null;
        }
    }
}
