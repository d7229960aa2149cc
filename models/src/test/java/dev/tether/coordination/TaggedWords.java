package dev.tether.coordination;

/** Hand-tagged word/TAG pairs (Penn Treebank tags, Marcus et al. 1993) of an invented ferry-maintenance sentence. */
final class TaggedWords {
    final String[] words;
    final String[] tags;

    private TaggedWords(String[] words, String[] tags) {
        this.words = words;
        this.tags = tags;
    }

    static TaggedWords of(String pairs) {
        String[] p = pairs.trim().split(" ");
        String[] w = new String[p.length];
        String[] t = new String[p.length];
        for (int i = 0; i < p.length; i++) {
            int slash = p[i].lastIndexOf('/');
            w[i] = p[i].substring(0, slash);
            t[i] = p[i].substring(slash + 1);
        }
        return new TaggedWords(w, t);
    }

    int index(String word) {
        for (int i = 0; i < words.length; i++) if (words[i].equals(word)) return i;
        throw new IllegalArgumentException("no word " + word);
    }
}
