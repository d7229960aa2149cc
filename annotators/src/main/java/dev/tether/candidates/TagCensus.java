package dev.tether.candidates;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Counts, over one document's tags, how many belong to each {@link TagSet}, to choose the set when the finder is
 * told {@code auto} and to tell when the tags belong to neither (a host tagger with a tag set of its own, or the
 * wrong feature mapped). Tags known to both sets (SYM) count for both.
 */
public final class TagCensus {
    /** Fewer tags than this share of the document in the chosen set means the tags are not from it. */
    static final double MATCH_SHARE = 0.5;
    private static final int EXAMPLES = 5;

    private long tags;
    private long penn;
    private long universal;
    private final Set<String> unknown = new LinkedHashSet<>();
    private final Set<String> seen = new LinkedHashSet<>();

    public void add(String tag) {
        tags++;
        boolean isPenn = TagSet.PENN.contains(tag);
        boolean isUniversal = TagSet.UD.contains(tag);
        if (isPenn) penn++;
        if (isUniversal) universal++;
        if (seen.size() < EXAMPLES) seen.add(tag);
        if (!isPenn && !isUniversal && unknown.size() < EXAMPLES) unknown.add(tag);
    }

    /** The set most of the tags belong to (Penn on a tie). */
    public TagSet likeliest() {
        return universal > penn ? TagSet.UD : TagSet.PENN;
    }

    /** Whether at least {@link #MATCH_SHARE} of the tags belong to {@code set}. */
    public boolean matches(TagSet set) {
        long in = set == TagSet.PENN ? penn : universal;
        return tags == 0 || in >= MATCH_SHARE * tags;
    }

    long tags() {
        return tags;
    }

    /** Up to five tags of the document outside both sets, or else the first tags seen. */
    List<String> examples() {
        return new ArrayList<>(unknown.isEmpty() ? seen : unknown);
    }
}
