package dev.tether.preprocessing;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import java.util.zip.CRC32;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;

import dev.tether.model.TaggerSection;
import opennlp.tools.postag.POSModel;

/**
 * The bytes of an OpenNLP part-of-speech model as a Tether model file stores them (section layout version
 * {@link TaggerSection#VERSION}): OpenNLP's own zip, re-packed so that the same trained model always gives the same
 * bytes. OpenNLP stamps its zip with the time of writing (entry times, a date comment in the manifest) and its
 * manifest with the time of training ({@code Timestamp}); the re-packed zip keeps the entries in OpenNLP's order,
 * gives each a fixed time, drops the training time, writes the manifest's properties sorted and without comment, and
 * stores every entry uncompressed (the model file compresses its whole payload once).
 */
final class PosModelBytes {
    /** Manifest properties that record when a model was made, not what it is. */
    private static final List<String> VOLATILE_PROPERTIES = List.of("Timestamp");
    private static final String MANIFEST = "manifest.properties";
    /** Every entry's time; any fixed value does (this one is in the range zip's DOS time can hold). */
    private static final LocalDateTime ENTRY_TIME = LocalDateTime.of(2000, 1, 1, 0, 0);

    private PosModelBytes() {
    }

    /** The deterministic bytes of {@code model}. */
    static byte[] pack(POSModel model) throws IOException {
        ByteArrayOutputStream serialized = new ByteArrayOutputStream();
        model.serialize(serialized);
        ByteArrayOutputStream packed = new ByteArrayOutputStream();
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(serialized.toByteArray()));
             ZipOutputStream out = new ZipOutputStream(packed)) {
            for (ZipEntry e = in.getNextEntry(); e != null; e = in.getNextEntry()) {
                byte[] content = in.readAllBytes();
                if (MANIFEST.equals(e.getName())) content = stableManifest(content);
                CRC32 crc = new CRC32();
                crc.update(content);
                ZipEntry stored = new ZipEntry(e.getName());
                stored.setMethod(ZipEntry.STORED);
                stored.setSize(content.length);
                stored.setCompressedSize(content.length);
                stored.setCrc(crc.getValue());
                stored.setTimeLocal(ENTRY_TIME);
                out.putNextEntry(stored);
                out.write(content);
                out.closeEntry();
            }
        }
        return packed.toByteArray();
    }

    /** The model stored in {@code section}; bytes OpenNLP cannot read fail with a message naming the section's file. */
    static POSModel unpack(TaggerSection section) throws IOException {
        try {
            return new POSModel(new ByteArrayInputStream(section.bytes()));
        } catch (IOException | RuntimeException e) {
            // Not chained: callers report the innermost message, and OpenNLP's own ("manifest is null") names no file.
            throw new IOException("the tagger section of " + section.origin() + " cannot be read as an OpenNLP "
                    + "part-of-speech model (" + e + "); retrain the model with 'tether train', or with "
                    + "--no-tagger to use the shipped tagger");
        }
    }

    /** The manifest without volatile properties and without the date comment that {@link Properties#store} writes. */
    private static byte[] stableManifest(byte[] manifest) throws IOException {
        Properties properties = new Properties();
        properties.load(new StringReader(new String(manifest, StandardCharsets.ISO_8859_1)));
        VOLATILE_PROPERTIES.forEach(properties::remove);
        ByteArrayOutputStream written = new ByteArrayOutputStream();
        properties.store(written, null); // escapes anything outside ISO 8859-1, as Properties.load expects
        List<String> lines = new ArrayList<>();
        for (String line : written.toString(StandardCharsets.ISO_8859_1).split("\n")) {
            String l = line.strip();
            if (!l.isEmpty() && !l.startsWith("#")) lines.add(l);
        }
        lines.sort(null);
        return (String.join("\n", lines) + "\n").getBytes(StandardCharsets.ISO_8859_1);
    }
}
