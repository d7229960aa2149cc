package dev.tether.audit;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/** What the index page counts over all decisions of a run: by preposition, site class, evidence level, probability. */
final class RunSummary {
    static final int PROBABILITY_BINS = 10;
    /** Prepositions shown one by one; the rest are added up as "other". */
    private static final int PREPOSITIONS_SHOWN = 12;

    final Map<String, Long> byKind = new TreeMap<>();
    final Map<String, Long> byPreposition = new TreeMap<>();
    final Map<String, Long> bySiteClass = new TreeMap<>();
    final Map<String, Long> byLevel = new LinkedHashMap<>();
    final long[] probabilities = new long[PROBABILITY_BINS];
    long decisions;
    long lowConfidence;

    RunSummary() {
        for (String level : EvidenceLevels.ORDER) byLevel.put(level, 0L);
    }

    void add(LedgerEntry e) {
        decisions++;
        if (DocumentPage.lowConfidence(e)) lowConfidence++;
        byKind.merge(e.kind(), 1L, Long::sum);
        int bin = (int) Math.ceil(e.probability() * PROBABILITY_BINS) - 1;
        probabilities[Math.max(0, Math.min(PROBABILITY_BINS - 1, bin))]++;
        if (e instanceof AttachmentEntry a) {
            byPreposition.merge(a.preposition().text().toLowerCase(java.util.Locale.ROOT), 1L, Long::sum);
            bySiteClass.merge(a.headClass(), 1L, Long::sum);
            byLevel.merge(a.evidenceLevel(), 1L, Long::sum);
        }
    }

    /** The most frequent prepositions (ties alphabetical), then "other" for the rest. */
    List<Map.Entry<String, Long>> topPrepositions() {
        List<Map.Entry<String, Long>> all = new ArrayList<>(byPreposition.entrySet());
        all.sort((x, y) -> x.getValue().equals(y.getValue()) ? x.getKey().compareTo(y.getKey()) : Long.compare(y.getValue(), x.getValue()));
        if (all.size() <= PREPOSITIONS_SHOWN) return all;
        long rest = 0;
        for (Map.Entry<String, Long> e : all.subList(PREPOSITIONS_SHOWN, all.size())) rest += e.getValue();
        List<Map.Entry<String, Long>> shown = new ArrayList<>(all.subList(0, PREPOSITIONS_SHOWN));
        shown.add(Map.entry("(" + (all.size() - PREPOSITIONS_SHOWN) + " others)", rest));
        return shown;
    }

    static long[] values(List<Map.Entry<String, Long>> entries) {
        long[] v = new long[entries.size()];
        for (int i = 0; i < v.length; i++) v[i] = entries.get(i).getValue();
        return v;
    }

    static List<String> labels(List<Map.Entry<String, Long>> entries) {
        List<String> l = new ArrayList<>();
        for (Map.Entry<String, Long> e : entries) l.add(e.getKey());
        return l;
    }
}
