package dev.tether.treebank;

import dev.tether.candidates.HeadClass;

/**
 * A prepositional attachment in a gold dependency tree: word indexes (0-based) of the preposition, its object (the
 * noun it introduces) and the attachment site; {@code headClass} is the site's word class, or {@code null} when the
 * site is of another class (a determiner, a symbol, ...).
 */
public record GoldAttachment(int preposition, int object, int head, HeadClass headClass) {
}
