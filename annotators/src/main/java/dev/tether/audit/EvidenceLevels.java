package dev.tether.audit;

/** The ledger's {@code evidence.level} values in a reviewer's words, most specific first. */
final class EvidenceLevels {
    static final String[] ORDER = {"head-with-object", "head", "class-with-object", "class", "none"};

    private EvidenceLevels() {
    }

    static String describe(String level) {
        switch (level) {
            case "head-with-object": return "Seen with this head word, preposition and object";
            case "head": return "Seen with this head word and preposition";
            case "class-with-object": return "Seen with a head of this word class, this preposition and object";
            case "class": return "Seen only with a head of this word class and this preposition";
            case "none": return "No statistic; position alone";
            default: return "Level '" + level + "'";
        }
    }
}
