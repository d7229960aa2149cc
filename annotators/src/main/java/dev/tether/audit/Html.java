package dev.tether.audit;

/** Escaping and number formatting for the report's HTML and SVG. Everything that comes from a document passes {@link #escape}. */
final class Html {
    private Html() {
    }

    /** Text made safe for an HTML or SVG element or a quoted attribute: {@code & < > " '} become references. */
    static String escape(String s) {
        StringBuilder b = null;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            String r;
            switch (c) {
                case '&': r = "&amp;"; break;
                case '<': r = "&lt;"; break;
                case '>': r = "&gt;"; break;
                case '"': r = "&quot;"; break;
                case '\'': r = "&#39;"; break;
                default: r = null;
            }
            if (r == null && (c < 0x20 && c != '\n' && c != '\t' || c == 0x7f)) r = " ";
            if (r != null) {
                if (b == null) b = new StringBuilder(s.length() + 16).append(s, 0, i);
                b.append(r);
            } else if (b != null) {
                b.append(c);
            }
        }
        return b == null ? s : b.toString();
    }

    /** {@code x} with {@code digits} decimals, always with a point. */
    static String fixed(double x, int digits) {
        long scale = 1;
        for (int i = 0; i < digits; i++) scale *= 10;
        long v = Math.round(Math.abs(x) * scale);
        StringBuilder b = new StringBuilder(digits + 4);
        if (x < 0 && v != 0) b.append('-');
        b.append(v / scale);
        if (digits > 0) {
            String frac = Long.toString(v % scale);
            b.append('.');
            for (int i = frac.length(); i < digits; i++) b.append('0');
            b.append(frac);
        }
        return b.toString();
    }

    /** A share as a percentage with one decimal. */
    static String percent(double share) {
        return fixed(100 * share, 1) + "%";
    }

    /** A pixel coordinate: one decimal, no trailing zero. */
    static String px(double x) {
        long tenths = Math.round(x * 10);
        return tenths % 10 == 0 ? Long.toString(tenths / 10) : (tenths / 10) + "." + Math.abs(tenths % 10);
    }

    /** The opening of a report page: doctype, title, the inline stylesheet. */
    static void pageStart(StringBuilder out, String title) {
        out.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>")
                .append(escape(title)).append("</title>\n<style>\n").append(ReportStyle.CSS).append("</style>\n</head>\n<body>\n");
    }

    static void pageEnd(StringBuilder out) {
        out.append("<footer>Written by Tether's audit report. Automated decisions that feed safety, clinical or legal "
                + "use need review by a person.</footer>\n</body>\n</html>\n");
    }
}
