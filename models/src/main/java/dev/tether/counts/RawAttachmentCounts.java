package dev.tether.counts;

import dev.tether.io.AtomicFileWriter;
import dev.tether.io.ChecksummedFile;
import dev.tether.vocabulary.WordNormalizer;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.Deflater;
import java.util.zip.DeflaterOutputStream;
import java.util.zip.Inflater;
import java.util.zip.InflaterInputStream;

/**
 * What unlabelled text taught about attachment, before it joins a model: counted by
 * {@link RawAttachmentCountsBuilder}, one document or one shard at a time, and merged with
 * {@link RawAttachmentCountsBuilder#addAll}.
 * <ul>
 *   <li>{@link #events()}: the unambiguous attachments (a preposition whose candidate finder proposed one head only),
 *       as partial quadruples: a verb event counts (verb, preposition, object) and its sub-tuples with the verb
 *       outcome, a noun event (noun, preposition, object) with the noun outcome (Hindle &amp; Rooth 1993;
 *       Ratnaparkhi 1998).</li>
 *   <li>{@link #cooccurrence()}: head–preposition–object co-occurrence for the head-choice association statistics:
 *       every candidate of every preposition is a trial of its lexical and structural keys, and the head of an
 *       unambiguous attachment also a hit (so the structural rates lean to what the unambiguous rule picks: the
 *       nearest verb, or a nearest noun with no verb near).</li>
 *   <li>{@link #ambiguous()}: the ambiguous verb–noun–preposition–noun configurations, counted as trials only (no
 *       outcome), for re-estimation ({@code dev.tether.attachment.AmbiguousReestimation}), and
 *       {@link #ambiguousStructures()}: the structures of their verb and noun candidates, per preposition, so that
 *       re-estimation gives the structural rates their share too (added in format version 3).</li>
 *   <li>{@link #words()}: how often each noun and verb of the text occurred, keyed as the count tables key them,
 *       for the domain report's vocabulary overlap with a base model.</li>
 * </ul>
 * Counts are whole numbers and words are numbered in sorted order, so the same documents give the same counts and
 * the same bytes however they were sharded and in whatever order the shards were merged. Immutable.
 */
public final class RawAttachmentCounts {
    /** Layout version of the counts file; change it whenever the layout below changes. */
    public static final int FORMAT_VERSION = 3;
    private static final ChecksummedFile.Kind KIND = new ChecksummedFile.Kind("TETHER-RAW-COUNTS\n", "raw counts",
            "a counts file written by Tether's unlabelled attachment counter", "count the text again",
            "Count the text again with this version.");

    private final QuadrupleCounts events;
    private final HeadChoiceCounts cooccurrence;
    private final QuadrupleCounts ambiguous;
    private final AmbiguousStructures ambiguousStructures;
    private final WordFrequencies words;
    private final Tally tally;

    /**
     * Totals of the counted text: documents counted and skipped, sentences, tokens, prepositions with candidates,
     * unambiguous ones among them, and ambiguous quadruple configurations.
     */
    public record Tally(long documents, long skippedDocuments, long sentences, long tokens, long prepositions,
                        long unambiguous, long ambiguousQuadruples) {
        Tally plus(Tally o) {
            return new Tally(documents + o.documents, skippedDocuments + o.skippedDocuments, sentences + o.sentences,
                    tokens + o.tokens, prepositions + o.prepositions, unambiguous + o.unambiguous,
                    ambiguousQuadruples + o.ambiguousQuadruples);
        }

        static final Tally ZERO = new Tally(0, 0, 0, 0, 0, 0, 0);
    }

    RawAttachmentCounts(QuadrupleCounts events, HeadChoiceCounts cooccurrence, QuadrupleCounts ambiguous,
                        AmbiguousStructures ambiguousStructures, WordFrequencies words, Tally tally) {
        this.events = events;
        this.cooccurrence = cooccurrence;
        this.ambiguous = ambiguous;
        this.ambiguousStructures = ambiguousStructures;
        this.words = words;
        this.tally = tally;
    }

    public QuadrupleCounts events() { return events; }
    public HeadChoiceCounts cooccurrence() { return cooccurrence; }
    public QuadrupleCounts ambiguous() { return ambiguous; }
    public AmbiguousStructures ambiguousStructures() { return ambiguousStructures; }
    /** Occurrences of the text's nouns and verbs (tokens tagged NN* or VB*), by normalized form. */
    public WordFrequencies words() { return words; }
    public Tally tally() { return tally; }

    /** The counts as the bytes of a counts file (header, version, deflated payload, SHA-256). */
    public byte[] toBytes() {
        ByteArrayOutputStream payload = new ByteArrayOutputStream();
        Deflater deflater = new Deflater(Deflater.BEST_SPEED);
        try (DataOutputStream out = new DataOutputStream(new DeflaterOutputStream(payload, deflater, 1 << 16))) {
            out.writeUTF(WordNormalizer.VERSION);
            out.writeLong(tally.documents());
            out.writeLong(tally.skippedDocuments());
            out.writeLong(tally.sentences());
            out.writeLong(tally.tokens());
            out.writeLong(tally.prepositions());
            out.writeLong(tally.unambiguous());
            out.writeLong(tally.ambiguousQuadruples());
            events.write(out);
            cooccurrence.write(out);
            ambiguous.write(out);
            ambiguousStructures.write(out);
            words.write(out);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException("writing to memory cannot fail", e);
        } finally {
            deflater.end();
        }
        return ChecksummedFile.frame(KIND, FORMAT_VERSION, payload);
    }

    /** Writes the counts file atomically. */
    public void write(Path target) throws IOException {
        AtomicFileWriter.write(target, toBytes(), "raw counts");
    }

    /** Reads counts written by {@link #write}; another version, a damaged or a foreign file fails naming the file. */
    public static RawAttachmentCounts read(Path file) throws IOException {
        return fromBytes(Files.readAllBytes(file), file.toString());
    }

    /** Decodes {@link #toBytes}; {@code name} names the bytes in messages. */
    public static RawAttachmentCounts fromBytes(byte[] bytes, String name) throws RawCountsFormatException {
        ChecksummedFile.Payload framed = ChecksummedFile.open(bytes, KIND, FORMAT_VERSION, name, RawCountsFormatException::new);
        Inflater inflater = new Inflater();
        try (DataInputStream in = new DataInputStream(new InflaterInputStream(
                new ByteArrayInputStream(bytes, framed.offset(), framed.length()), inflater, 1 << 16))) {
            String normalizer = in.readUTF();
            if (!normalizer.equals(WordNormalizer.VERSION)) {
                throw new RawCountsFormatException(name + " was counted with normalization '" + normalizer
                        + "'; this build of Tether uses '" + WordNormalizer.VERSION + "'. Count the text again.");
            }
            Tally t = new Tally(in.readLong(), in.readLong(), in.readLong(), in.readLong(), in.readLong(), in.readLong(),
                    in.readLong());
            return new RawAttachmentCounts(QuadrupleCounts.read(in), HeadChoiceCounts.read(in), QuadrupleCounts.read(in),
                    AmbiguousStructures.read(in), WordFrequencies.read(in), t);
        } catch (RawCountsFormatException e) {
            throw e;
        } catch (IOException | RuntimeException e) {
            throw new RawCountsFormatException(name + " is damaged: its content cannot be read (" + e.getMessage()
                    + "); count the text again");
        } finally {
            inflater.end();
        }
    }
}
