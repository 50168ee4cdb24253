package app.latentledger.io.logcsv;

/**
 * Small comparisons on a cell held as {@code chars[from, to)} in the row splitter's buffer, each
 * giving exactly what the String method it replaces gives, so the importer needs no String per
 * cell.
 */
final class Cells {
    private Cells() {
    }

    /** {@code new String(s, from, to - from).equalsIgnoreCase(word)}, by the same per-char rule. */
    static boolean equalsIgnoreCase(char[] s, int from, int to, String word) {
        if (to - from != word.length()) {
            return false;
        }
        for (int i = 0; i < word.length(); i++) {
            char a = s[from + i];
            char b = word.charAt(i);
            if (a == b) {
                continue;
            }
            // String.regionMatches(true, ...): equal upper cases, or equal lower cases of those
            char ua = Character.toUpperCase(a);
            char ub = Character.toUpperCase(b);
            if (ua != ub && Character.toLowerCase(ua) != Character.toLowerCase(ub)) {
                return false;
            }
        }
        return true;
    }

    /** {@code new String(s, from, to - from).equals(word)}. */
    static boolean equals(char[] s, int from, int to, String word) {
        if (to - from != word.length()) {
            return false;
        }
        for (int i = 0; i < word.length(); i++) {
            if (s[from + i] != word.charAt(i)) {
                return false;
            }
        }
        return true;
    }

    /**
     * The cell {@link LogCsvImporter#clean} makes of an already trimmed cell {@code s[from, to)}:
     * stripped of white space, a leading byte-order mark and surrounding quotes, in that order.
     *
     * @return the start in the high 32 bits and the end in the low 32 bits
     */
    static long clean(char[] s, int from, int to) {
        int a = from;
        int b = to;
        while (a < b && Character.isWhitespace(s[a])) {
            a++;
        }
        while (b > a && Character.isWhitespace(s[b - 1])) {
            b--;
        }
        if (a < b && s[a] == '\uFEFF') {
            a++;
            while (a < b && Character.isWhitespace(s[a])) {
                a++;
            }
            while (b > a && Character.isWhitespace(s[b - 1])) {
                b--;
            }
        }
        if (b - a >= 2 && s[a] == '"' && s[b - 1] == '"') {
            a++;
            b--;
            while (a < b && Character.isWhitespace(s[a])) {
                a++;
            }
            while (b > a && Character.isWhitespace(s[b - 1])) {
                b--;
            }
        }
        return ((long) a << 32) | (b & 0xFFFF_FFFFL);
    }
}
