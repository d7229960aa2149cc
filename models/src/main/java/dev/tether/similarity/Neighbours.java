package dev.tether.similarity;

/**
 * The nearest neighbours of one word, best first: ids into the {@link Thesaurus} and their scores. A view over the
 * thesaurus's arrays: immutable, no copying and no boxing on lookup.
 */
public final class Neighbours {
    static final Neighbours NONE = new Neighbours(null, 0, 0);

    private final Thesaurus thesaurus;
    private final int offset;
    private final int size;

    Neighbours(Thesaurus thesaurus, int offset, int size) {
        this.thesaurus = thesaurus;
        this.offset = offset;
        this.size = size;
    }

    /** How many neighbours (at most the thesaurus's k; 0 for an unknown word). */
    public int size() {
        return size;
    }

    public boolean isEmpty() {
        return size == 0;
    }

    /** The thesaurus id of the {@code i}-th nearest neighbour. */
    public int id(int i) {
        check(i);
        return thesaurus.neighbourIdAt(offset + i);
    }

    /** The similarity of the {@code i}-th nearest neighbour (non-increasing in {@code i}). */
    public float score(int i) {
        check(i);
        return thesaurus.neighbourScoreAt(offset + i);
    }

    /** The normalized key of the {@code i}-th nearest neighbour. */
    public String key(int i) {
        return thesaurus.key(id(i));
    }

    private void check(int i) {
        if (i < 0 || i >= size) throw new IndexOutOfBoundsException("neighbour " + i + " of " + size);
    }
}
