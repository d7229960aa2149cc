package dev.tether.attachment;

/** A quadruple with its gold attachment; {@code source} says where it came from ("file:line"). */
public record LabelledQuadruple(Quadruple quadruple, AttachmentSite site, String source) {
}
