package app.latentledger.core.text;

/**
 * Text from records (a site name, notes, a file name inside a bundle) made safe to print on a
 * terminal: control characters (C0, DEL, C1, which start escape sequences that can clear the
 * screen or set the window title) and the Unicode bidirectional controls (which can show
 * "Invoice" + U+202E + "FDP.exe" reversed) are written as visible {@code \\uXXXX} escapes (the JSON spelling, so
 * JSON output stays valid and decodes to the stored text), so what the tech
 * reads is what is stored. Tab stays a tab; line breaks are kept only where the caller allows them.
 * Unicode bidi controls: U+061C, U+200E, U+200F, U+202A to U+202E, U+2066 to U+2069 (Unicode
 * Standard Annex #9, "Explicit Directional Formatting Characters").
 */
public final class TerminalText {
    private TerminalText() {
    }

    /** One-line text: every control character escaped, line breaks included. */
    public static String escape(String s) {
        return escape(s, false);
    }

    /** @param keepLineBreaks true keeps '\n' (multi-line notes); '\r' is always escaped */
    public static String escape(String s, boolean keepLineBreaks) {
        if (s == null) {
            return null;
        }
        StringBuilder b = null;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            boolean unsafe = unsafe(c) && !(c == '\t') && !(keepLineBreaks && c == '\n');
            if (unsafe && b == null) {
                b = new StringBuilder(s.length() + 16).append(s, 0, i);
            }
            if (b != null) {
                if (unsafe) {
                    b.append(String.format("\\u%04X", (int) c));
                } else {
                    b.append(c);
                }
            }
        }
        return b == null ? s : b.toString();
    }

    /** True for a character that changes how a terminal shows what follows. */
    public static boolean unsafe(char c) {
        return c < 0x20 || c == 0x7F || (c >= 0x80 && c <= 0x9F) || c == 0x061C || c == 0x200E || c == 0x200F
                || (c >= 0x202A && c <= 0x202E) || (c >= 0x2066 && c <= 0x2069);
    }
}
