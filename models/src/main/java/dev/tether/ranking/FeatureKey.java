package dev.tether.ranking;

/**
 * Packs a feature template and up to three integer parts into one {@code long}: template in the top 8 bits, then
 * two 21-bit parts (word ids fit, see {@link dev.tether.vocabulary.Vocabulary#ID_BITS}) and a 14-bit part. No
 * strings are built to name a feature; what a key means is up to the template's owner.
 */
public final class FeatureKey {
    private static final int WIDE = 21;
    private static final int NARROW = 14;
    private static final long WIDE_MASK = (1L << WIDE) - 1;
    private static final long NARROW_MASK = (1L << NARROW) - 1;

    private FeatureKey() {
    }

    public static long of(int template, int a, int b, int c) {
        if (template < 0 || template > 255 || a < 0 || a > WIDE_MASK || b < 0 || b > WIDE_MASK || c < 0 || c > NARROW_MASK) {
            throw new IllegalArgumentException("feature key parts out of range: " + template + "/" + a + "/" + b + "/" + c);
        }
        return ((long) template << (2 * WIDE + NARROW)) | ((long) a << (WIDE + NARROW)) | ((long) b << NARROW) | c;
    }

    public static int template(long key) { return (int) (key >>> (2 * WIDE + NARROW)); }
    public static int a(long key) { return (int) ((key >>> (WIDE + NARROW)) & WIDE_MASK); }
    public static int b(long key) { return (int) ((key >>> NARROW) & WIDE_MASK); }
    public static int c(long key) { return (int) (key & NARROW_MASK); }
}
