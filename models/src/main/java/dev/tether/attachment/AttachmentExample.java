package dev.tether.attachment;

/**
 * A supervised training event for head choice: the query and the index of the gold head among its candidates
 * ({@code -1} when the gold head is not among them; such events still count towards candidate recall but teach
 * the model nothing). {@code source} says where it came from ("file:line") for error messages.
 */
public record AttachmentExample(AttachmentQuery query, int gold, String source) {
    public AttachmentExample {
        if (gold < -1 || gold >= query.size()) {
            throw new IllegalArgumentException(source + ": gold index " + gold + " outside 0.." + (query.size() - 1));
        }
    }
}
