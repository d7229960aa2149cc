package dev.tether.model;

import dev.tether.attachment.AttachmentRanker;
import dev.tether.attachment.LearnedQuadrupleScorer;
import dev.tether.coordination.CoordinationRanker;
import dev.tether.counts.HeadChoiceCounts;
import dev.tether.counts.QuadrupleCounts;
import dev.tether.io.AtomicFileWriter;
import dev.tether.io.ChecksummedFile;
import dev.tether.io.Sha256;
import dev.tether.similarity.Thesaurus;
import dev.tether.similarity.ThesaurusFile;
import dev.tether.similarity.ThesaurusFormatException;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.zip.Deflater;
import java.util.zip.DeflaterOutputStream;
import java.util.zip.Inflater;
import java.util.zip.InflaterInputStream;

/**
 * Tether's model file. Layout:
 * <pre>
 *   "TETHER-MODEL\n"          13 bytes, identifies the file
 *   format version            int
 *   payload length            long, bytes of the compressed payload
 *   payload                   deflate-compressed sections: count, then per section its name, length and bytes
 *   SHA-256                   32 bytes over everything before it
 * </pre>
 * Sections are {@code info} (normalizer version and sources), {@code quadruples} (the quadruple counts),
 * {@code head-choice} (the counts for choosing among all candidate heads), and, when the model has them,
 * {@code source-weights} (how much each source's events count, when some weight is not 1), {@code thesaurus} (a whole
 * thesaurus file, for similarity smoothing),
 * {@code attachment-ranker} (its own version, feature families, feature keys and weights), {@code tagger} (a
 * part-of-speech tagger, see {@link TaggerSection}, with a version of its own) and {@code coordination-ranker}
 * ({@link CoordinationRanker}: its version, families, coordination counts and two weight sets; a model without it, or
 * with another version of it, loads and makes no coordination decisions) and {@code domain-report} ({@link DomainReport}:
 * what raw text changed, with its own version; a model without it, or with another version of it, loads without a
 * report); a reader
 * skips sections it does not know, so newer writers can add some. Writing is atomic: a temporary file in the same
 * folder, forced to disk, then renamed over the target. The same model always gives the same bytes.
 */
public final class ModelFile {
    public static final int FORMAT_VERSION = 2;
    private static final ChecksummedFile.Kind KIND = new ChecksummedFile.Kind("TETHER-MODEL\n", "model",
            "a model written by 'tether train'", "copy or train it again", "Retrain the model with this version ('tether train').");
    private static final String INFO = "info";
    private static final String QUADRUPLES = "quadruples";
    private static final String HEAD_CHOICE = "head-choice";
    private static final String ATTACHMENT_RANKER = "attachment-ranker";
    private static final String TAGGER = "tagger";
    /** Optional: a whole thesaurus file (its own header, version and checksum), for similarity smoothing. */
    private static final String THESAURUS = "thesaurus";
    /** Optional: each source's weight, in source order; written only when some weight is not 1. */
    private static final String SOURCE_WEIGHTS = "source-weights";
    private static final String COORDINATION_RANKER = "coordination-ranker";
    /** Optional: what raw text changed ({@link DomainReport}, with a version of its own). */
    private static final String DOMAIN_REPORT = "domain-report";
    private static final String QUADRUPLE_SCORER = "quadruple-scorer";
    private static final java.util.logging.Logger LOG = java.util.logging.Logger.getLogger(ModelFile.class.getName());

    private ModelFile() {
    }

    /** Writes {@code model} to {@code target} atomically; on failure the target is untouched. */
    public static void write(TetherModel model, Path target) throws IOException {
        byte[] bytes = encode(model.normalizerVersion(), model.sources(), model.quadruples(), model.headChoice(),
                model.attachmentRanker().orElse(null), model.tagger().orElse(null), model.thesaurus().orElse(null),
                model.coordinationRanker().orElse(null), model.domainReport().orElse(null),
                model.learnedQuadrupleScorer().orElse(null));
        AtomicFileWriter.write(target, bytes, "model");
    }

    /** Reads the model at {@code file}; a foreign, truncated or damaged file fails with a message naming it. */
    public static TetherModel read(Path file) throws IOException {
        if (Files.isDirectory(file)) {
            throw new ModelFormatException(file + " is a directory, not a Tether model file; give the path of a model written by 'tether train'");
        }
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new ModelFormatException(file + " does not exist; give the path of a model written by 'tether train'");
        }
        return decode(bytes, file.toString());
    }

    /** Reads a model from a stream (for example a classpath resource) called {@code name} in messages. */
    public static TetherModel read(InputStream in, String name) throws IOException {
        return decode(in.readAllBytes(), name);
    }

    static byte[] encode(String normalizerVersion, List<ModelSource> sources, QuadrupleCounts quadruples,
                         HeadChoiceCounts headChoice, AttachmentRanker ranker, TaggerSection tagger, Thesaurus thesaurus) throws IOException {
        return pack(sections(normalizerVersion, sources, quadruples, headChoice, ranker, tagger, thesaurus));
    }

    static byte[] encode(String normalizerVersion, List<ModelSource> sources, QuadrupleCounts quadruples,
                         HeadChoiceCounts headChoice, AttachmentRanker ranker, TaggerSection tagger, Thesaurus thesaurus,
                         CoordinationRanker coordination) throws IOException {
        return encode(normalizerVersion, sources, quadruples, headChoice, ranker, tagger, thesaurus, coordination, null);
    }

    static byte[] encode(String normalizerVersion, List<ModelSource> sources, QuadrupleCounts quadruples,
                         HeadChoiceCounts headChoice, AttachmentRanker ranker, TaggerSection tagger, Thesaurus thesaurus,
                         CoordinationRanker coordination, DomainReport report) throws IOException {
        return encode(normalizerVersion, sources, quadruples, headChoice, ranker, tagger, thesaurus, coordination, report, null);
    }

    static byte[] encode(String normalizerVersion, List<ModelSource> sources, QuadrupleCounts quadruples,
                         HeadChoiceCounts headChoice, AttachmentRanker ranker, TaggerSection tagger, Thesaurus thesaurus,
                         CoordinationRanker coordination, DomainReport report, LearnedQuadrupleScorer learned) throws IOException {
        Map<String, byte[]> sections = sections(normalizerVersion, sources, quadruples, headChoice, ranker, tagger, thesaurus);
        if (coordination != null) sections.put(COORDINATION_RANKER, section(out -> CoordinationRanker.write(coordination, out)));
        if (report != null) sections.put(DOMAIN_REPORT, report.toBytes());
        if (learned != null) sections.put(QUADRUPLE_SCORER, section(out -> LearnedQuadrupleScorer.write(learned, out)));
        return pack(sections);
    }

    static byte[] encode(String normalizerVersion, List<ModelSource> sources, QuadrupleCounts quadruples,
                         HeadChoiceCounts headChoice, AttachmentRanker ranker, TaggerSection tagger) throws IOException {
        return encode(normalizerVersion, sources, quadruples, headChoice, ranker, tagger, null);
    }

    static Map<String, byte[]> sections(String normalizerVersion, List<ModelSource> sources, QuadrupleCounts quadruples,
                                        HeadChoiceCounts headChoice, AttachmentRanker ranker, TaggerSection tagger) throws IOException {
        return sections(normalizerVersion, sources, quadruples, headChoice, ranker, tagger, null);
    }

    /** The named sections of a model, in file order. */
    static Map<String, byte[]> sections(String normalizerVersion, List<ModelSource> sources, QuadrupleCounts quadruples,
                                        HeadChoiceCounts headChoice, AttachmentRanker ranker, TaggerSection tagger,
                                        Thesaurus thesaurus) throws IOException {
        Map<String, byte[]> sections = new LinkedHashMap<>();
        sections.put(INFO, section(out -> {
            out.writeUTF(normalizerVersion);
            out.writeInt(sources.size());
            for (ModelSource s : sources) {
                out.writeUTF(s.name());
                out.writeUTF(s.kind());
                out.writeLong(s.items());
                out.writeLong(s.skipped());
                out.writeUTF(s.sha256());
            }
        }));
        boolean weighted = false;
        for (ModelSource s : sources) weighted |= s.weight() != 1.0;
        if (weighted) {
            sections.put(SOURCE_WEIGHTS, section(out -> {
                out.writeInt(sources.size());
                for (ModelSource s : sources) out.writeDouble(s.weight());
            }));
        }
        sections.put(QUADRUPLES, section(quadruples::write));
        sections.put(HEAD_CHOICE, section(headChoice::write));
        if (ranker != null) {
            sections.put(ATTACHMENT_RANKER, section(out -> AttachmentRanker.write(ranker.weights(), ranker.families(), out)));
        }
        if (tagger != null) sections.put(TAGGER, section(tagger::write));
        if (thesaurus != null) sections.put(THESAURUS, ThesaurusFile.toBytes(thesaurus));
        return sections;
    }

    /** A whole file of the current format version holding {@code sections}. */
    static byte[] pack(Map<String, byte[]> sections) throws IOException {
        ByteArrayOutputStream payload = new ByteArrayOutputStream();
        Deflater deflater = new Deflater(Deflater.BEST_COMPRESSION);
        try (DataOutputStream out = new DataOutputStream(new DeflaterOutputStream(payload, deflater, 1 << 16))) {
            out.writeInt(sections.size());
            for (Map.Entry<String, byte[]> e : sections.entrySet()) {
                out.writeUTF(e.getKey());
                out.writeInt(e.getValue().length);
                out.write(e.getValue());
            }
        } finally {
            deflater.end();
        }
        return ChecksummedFile.frame(KIND, FORMAT_VERSION, payload);
    }

    static TetherModel decode(byte[] bytes, String name) throws ModelFormatException {
        ChecksummedFile.Payload framed = ChecksummedFile.open(bytes, KIND, FORMAT_VERSION, name, ModelFormatException::new);
        byte[] actual = framed.digest();
        try {
            Map<String, byte[]> sections = sections(bytes, framed.offset(), framed.length());
            byte[] info = sections.get(INFO);
            byte[] quads = sections.get(QUADRUPLES);
            byte[] heads = sections.get(HEAD_CHOICE);
            if (info == null || quads == null || heads == null) {
                throw new ModelFormatException(name + " lacks one of the sections 'info', 'quadruples', 'head-choice'; retrain it with 'tether train'");
            }
            DataInputStream in = new DataInputStream(new ByteArrayInputStream(info));
            String normalizer = in.readUTF();
            int n = in.readInt();
            List<ModelSource> sources = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                sources.add(new ModelSource(in.readUTF(), in.readUTF(), in.readLong(), in.readLong(), in.readUTF()));
            }
            byte[] weights = sections.get(SOURCE_WEIGHTS);
            if (weights != null) {
                DataInputStream w = new DataInputStream(new ByteArrayInputStream(weights));
                if (w.readInt() != sources.size()) throw new IOException("source weights do not match the sources");
                for (int i = 0; i < sources.size(); i++) {
                    ModelSource s = sources.get(i);
                    sources.set(i, new ModelSource(s.name(), s.kind(), s.items(), s.skipped(), s.sha256(), w.readDouble()));
                }
            }
            QuadrupleCounts counts = QuadrupleCounts.read(new DataInputStream(new ByteArrayInputStream(quads)));
            HeadChoiceCounts headChoice = HeadChoiceCounts.read(new DataInputStream(new ByteArrayInputStream(heads)));
            AttachmentRanker ranker = null;
            byte[] rankerBytes = sections.get(ATTACHMENT_RANKER);
            if (rankerBytes != null) {
                DataInputStream r = new DataInputStream(new ByteArrayInputStream(rankerBytes));
                int rankerVersion = r.readInt();
                if (rankerVersion != AttachmentRanker.VERSION) {
                    throw new ModelFormatException(name + " has an attachment ranker of version " + rankerVersion
                            + "; this build of Tether reads version " + AttachmentRanker.VERSION
                            + ". Retrain the model with this version ('tether train').");
                }
                ranker = AttachmentRanker.read(new DataInputStream(new ByteArrayInputStream(rankerBytes)), headChoice, counts,
                        new dev.tether.vocabulary.WordNormalizer());
            }
            byte[] tag = sections.get(TAGGER);
            TaggerSection tagger = tag == null ? null : TaggerSection.read(tag, name);
            byte[] thesaurusBytes = sections.get(THESAURUS);
            Thesaurus thesaurus = null;
            if (thesaurusBytes != null) {
                try {
                    thesaurus = ThesaurusFile.fromBytes(thesaurusBytes, "the thesaurus section of " + name);
                } catch (ThesaurusFormatException e) {
                    throw new ModelFormatException(e.getMessage() + " Retrain the model with this version ('tether train --thesaurus').", e);
                }
            }
            CoordinationRanker coordination = null;
            byte[] coordinationBytes = sections.get(COORDINATION_RANKER);
            if (coordinationBytes != null) {
                int version = CoordinationRanker.readVersion(coordinationBytes);
                if (CoordinationRanker.reads(version)) {
                    coordination = CoordinationRanker.read(new DataInputStream(new ByteArrayInputStream(coordinationBytes)));
                } else {
                    // A coordination ranker of another version is left out rather than refusing the whole model:
                    // attachment still works, and engines say that no coordination decisions are written.
                    LOG.warning(name + " has a coordination ranker of version " + version + "; this build reads versions "
                            + CoordinationRanker.OLDEST_READABLE + " to " + CoordinationRanker.VERSION + ", so the model makes no coordination decisions. Retrain it "
                            + "with 'tether train --conllu' to get them.");
                }
            }
            DomainReport report = null;
            byte[] reportBytes = sections.get(DOMAIN_REPORT);
            if (reportBytes != null) {
                int version = DomainReport.version(reportBytes);
                if (version == DomainReport.VERSION) {
                    report = DomainReport.fromBytes(reportBytes);
                } else {
                    // Only 'inspect' reads the report: a model with another version of it loads without one.
                    LOG.info(name + " has a domain report of version " + version + "; this build reads version "
                            + DomainReport.VERSION + ", so 'tether inspect' cannot show it. Train the model again to get one.");
                }
            }
            LearnedQuadrupleScorer learned = null;
            byte[] learnedBytes = sections.get(QUADRUPLE_SCORER);
            if (learnedBytes != null) {
                int version = LearnedQuadrupleScorer.readVersion(learnedBytes);
                if (version == LearnedQuadrupleScorer.VERSION) {
                    learned = LearnedQuadrupleScorer.read(new DataInputStream(new ByteArrayInputStream(learnedBytes)), counts,
                            thesaurus, new dev.tether.vocabulary.WordNormalizer());
                } else {
                    // Only the quadruple scorer reads it: a model with another version of it scores quadruples by back-off.
                    LOG.warning(name + " has a learned quadruple scorer of version " + version + "; this build reads version "
                            + LearnedQuadrupleScorer.VERSION + ", so quadruples are scored by the back-off. Retrain the model "
                            + "('tether train') to get the learned scorer back.");
                }
            }
            return new TetherModel(normalizer, sources, counts, headChoice, ranker, tagger, thesaurus, coordination, report,
                    learned, java.util.HexFormat.of().formatHex(actual).substring(0, 12));
        } catch (ModelFormatException e) {
            throw e;
        } catch (IOException | RuntimeException e) {
            throw new ModelFormatException(name + " is damaged: its content cannot be read (" + e.getMessage()
                    + "); copy or train it again", e);
        }
    }

    /** A fingerprint of the content that would be written for these parts. */
    static String fingerprint(byte[] encoded) {
        return Sha256.hex(Arrays.copyOfRange(encoded, 0, encoded.length - ChecksummedFile.DIGEST_BYTES)).substring(0, 12);
    }

    private static Map<String, byte[]> sections(byte[] bytes, int offset, int length) throws IOException {
        Map<String, byte[]> sections = new LinkedHashMap<>();
        Inflater inflater = new Inflater();
        try (DataInputStream in = new DataInputStream(new InflaterInputStream(
                new ByteArrayInputStream(bytes, offset, length), inflater, 1 << 16))) {
            int count = in.readInt();
            if (count < 0 || count > 1000) throw new IOException("implausible section count " + count);
            for (int i = 0; i < count; i++) {
                String name = in.readUTF();
                int size = in.readInt();
                if (size < 0) throw new IOException("negative section size");
                // Read what is there rather than allocating the claimed size up front: a damaged size must not
                // ask for gigabytes.
                byte[] data = in.readNBytes(size);
                if (data.length < size) throw new EOFException("section '" + name + "' ends early");
                sections.put(name, data);
            }
        } catch (EOFException e) {
            throw new IOException("payload ends early", e);
        } finally {
            inflater.end();
        }
        return sections;
    }

    private interface SectionWriter {
        void write(DataOutputStream out) throws IOException;
    }

    private static byte[] section(SectionWriter writer) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (DataOutputStream out = new DataOutputStream(bytes)) {
            writer.write(out);
        }
        return bytes.toByteArray();
    }
}
