package dev.tether.similarity;

import dev.tether.io.InputFormatException;
import dev.tether.io.Utf8Text;
import dev.tether.pipeline.DocumentFiles;
import org.apache.uima.analysis_engine.AnalysisEngineProcessException;
import org.apache.uima.resource.ResourceInitializationException;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Deque;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Counts the contexts of raw text files for a thesaurus: every document is read as UTF-8, tagged by the built-in
 * preprocessing on {@code threads} threads, and counted by one {@link ContextCounter} in document order, so that
 * the counts (and their ids) do not depend on the thread count. Memory holds the counts and the few documents in
 * flight, not the corpus.
 *
 * <p>A document that is empty (or blank), binary (it holds NUL bytes) or not valid UTF-8 is skipped and counted by
 * reason in the {@link Summary}; so is one that cannot be read.
 */
public final class RawTextCounting {
    /** Why a document was skipped. */
    public enum Skip {
        EMPTY("empty"), BINARY("binary"), ENCODING("not valid UTF-8"), UNREADABLE("unreadable");

        private final String label;

        Skip(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /**
     * What was counted: documents, skipped documents by reason (with their files), entries below the inputs that are
     * not documents ({@link DocumentFiles}: other endings, hidden files, links), sentences and tokens.
     */
    public record Summary(int documents, Map<Skip, List<String>> skipped, long notDocuments, long sentences, long tokens,
                          double seconds) {
        public int skippedCount() {
            int n = 0;
            for (List<String> files : skipped.values()) n += files.size();
            return n;
        }
    }

    private final int threads;
    private final boolean lineBreaksEndSentences;

    public RawTextCounting(int threads) {
        this(threads, false);
    }

    /** With {@code lineBreaksEndSentences}, every line break ends a sentence (see {@link RawTextTagger}). */
    public RawTextCounting(int threads, boolean lineBreaksEndSentences) {
        if (threads < 1) throw new IllegalArgumentException("--threads must be at least 1, was " + threads);
        this.threads = threads;
        this.lineBreaksEndSentences = lineBreaksEndSentences;
    }

    /** Receives the tagged sentences of the counted documents, in document order. */
    public interface SentenceSink {
        void addSentence(String[] words, String[] tags);
    }

    /** Counts every document under {@code inputs} (files, or folders of {@code .txt} files) into {@code counter}. */
    public Summary count(List<Path> inputs, ContextCounter counter) throws IOException {
        return count(inputs, counter::addSentence);
    }

    /** Tags every document under {@code inputs} and hands its sentences to {@code sink}, in document order. */
    public Summary count(List<Path> inputs, SentenceSink sink) throws IOException {
        long start = System.nanoTime();
        List<Path> files = new ArrayList<>();
        long notDocuments = 0;
        for (Path p : inputs) {
            DocumentFiles.Listing listing = DocumentFiles.list(p);
            files.addAll(listing.documents());
            notDocuments += listing.skippedTotal();
        }
        Map<Skip, List<String>> skipped = new LinkedHashMap<>();
        int counted = 0;
        long sentences = 0, tokens = 0;
        List<RawTextTagger> taggers = Collections.synchronizedList(new ArrayList<>());
        ThreadLocal<RawTextTagger> tagger = ThreadLocal.withInitial(() -> {
            try {
                RawTextTagger t = new RawTextTagger(lineBreaksEndSentences);
                taggers.add(t);
                return t;
            } catch (ResourceInitializationException e) {
                throw new IllegalStateException("cannot start the built-in preprocessing: " + e.getMessage(), e);
            }
        });
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "thesaurus-tagging");
            t.setDaemon(true);
            return t;
        });
        try {
            Deque<Future<Document>> inFlight = new ArrayDeque<>();
            int next = 0;
            while (next < files.size() || !inFlight.isEmpty()) {
                while (next < files.size() && inFlight.size() < 2 * threads) {
                    Path file = files.get(next++);
                    inFlight.add(pool.submit(() -> Document.of(file, tagger.get())));
                }
                Document d = take(inFlight.poll());
                if (d.skip() != null) {
                    skipped.computeIfAbsent(d.skip(), k -> new ArrayList<>()).add(d.reason());
                    continue;
                }
                d.sentencesTo(sink);
                sentences += d.text().words().size();
                tokens += d.text().tokens();
                counted++;
            }
        } finally {
            pool.shutdownNow();
            for (RawTextTagger t : taggers) t.close();
        }
        return new Summary(counted, skipped, notDocuments, sentences, tokens, (System.nanoTime() - start) / 1e9);
    }

    private static Document take(Future<Document> f) throws IOException {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("counting interrupted", e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException r) throw r;
            throw new IOException(cause.getMessage(), cause);
        }
    }

    /** A raw text file's text, or why it is skipped (a reason that names the file). */
    public record Reading(String text, Skip skip, String reason) {
    }

    /**
     * Reads one raw text file as UTF-8 (a leading byte-order mark dropped); a file that cannot be read, holds NUL
     * bytes, is not valid UTF-8 or is blank is skipped, with the reason.
     */
    public static Reading read(Path file) {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            return new Reading(null, Skip.UNREADABLE, file + ": cannot be read (" + e.getMessage() + "); check its permissions");
        }
        return check(file.toString(), bytes);
    }

    /**
     * The text of a raw text file read elsewhere ({@code file} names it: a path or a file system URI), or why it is
     * skipped, by the same rules as {@link #read(Path)}.
     */
    public static Reading check(String file, byte[] bytes) {
        for (byte b : bytes) {
            if (b == 0) return new Reading(null, Skip.BINARY, file + ": holds NUL bytes, a binary file; give plain UTF-8 text, or move it out of the input");
        }
        String text;
        try {
            text = Utf8Text.decode(file, bytes);
        } catch (InputFormatException e) {
            return new Reading(null, Skip.ENCODING, e.getMessage());
        }
        if (!text.isEmpty() && text.charAt(0) == '\uFEFF') text = text.substring(1);
        if (text.isBlank()) return new Reading(null, Skip.EMPTY, file + ": empty (no text to count); add its text or move it out of the input");
        return new Reading(text, null, null);
    }

    /** One document: tagged, or skipped with a reason that names the file. */
    public record Document(String file, RawTextTagger.TaggedText text, Skip skip, String reason) {
        /** Reads and tags {@code file} with {@code tagger}, or says why it is skipped. */
        public static Document of(Path file, RawTextTagger tagger) {
            return of(file.toString(), read(file), tagger);
        }

        /** Tags what {@code reading} read of {@code file} with {@code tagger}, or says why it is skipped. */
        public static Document of(String file, Reading reading, RawTextTagger tagger) {
            if (reading.skip() != null) return new Document(file, null, reading.skip(), reading.reason());
            try {
                return new Document(file, tagger.tag(reading.text()), null, null);
            } catch (AnalysisEngineProcessException | RuntimeException e) {
                return new Document(file, null, Skip.UNREADABLE, file + ": preprocessing failed (" + e.getMessage() + ")");
            }
        }

        /** Hands the document's sentences to {@code sink}, in order. */
        public void sentencesTo(SentenceSink sink) {
            for (int i = 0; i < text.words().size(); i++) sink.addSentence(text.words().get(i), text.tags().get(i));
        }
    }
}
