package app.latentledger.io.logcsv;

/** Numbers and missing readings as loggers write them. */
final class DecimalText {
    private DecimalText() {
    }

    /** An empty cell, NA, NaN, "-" or null: a missing reading, not an error. */
    static boolean missing(String v) {
        return v.isEmpty() || v.equalsIgnoreCase("nan") || v.equalsIgnoreCase("na") || v.equals("-")
                || v.equalsIgnoreCase("null");
    }

    /** {@link #missing(String)} of {@code v[from, to)}. */
    static boolean missing(char[] v, int from, int to) {
        int n = to - from;
        if (n == 0) {
            return true;
        }
        char c = v[from];
        if (n > 4 || c >= '0' && c <= '9') {
            return false;
        }
        return Cells.equalsIgnoreCase(v, from, to, "nan") || Cells.equalsIgnoreCase(v, from, to, "na")
                || Cells.equals(v, from, to, "-") || Cells.equalsIgnoreCase(v, from, to, "null");
    }

    private static final double[] POWERS_OF_TEN = new double[23];

    static {
        POWERS_OF_TEN[0] = 1;
        for (int i = 1; i < POWERS_OF_TEN.length; i++) {
            POWERS_OF_TEN[i] = POWERS_OF_TEN[i - 1] * 10;
        }
    }

    /**
     * A plain decimal number, or NaN. No hex, no NaN/Infinity words, no thousands separators.
     * Logger readings have a few digits: up to 15 significant digits without an exponent the value
     * is mantissa ÷ 10^k, both exact in a double, so the one division is correctly rounded and equals
     * Double.parseDouble (Clinger's fast path); anything else goes to Double.parseDouble.
     */
    static double parse(String v, boolean decimalComma) {
        char[] c = v.toCharArray();
        return parse(c, 0, c.length, decimalComma);
    }

    /** {@link #parse(String, boolean)} of {@code text[from, to)}: no String unless the JDK must parse it. */
    static double parse(char[] text, int from, int to, boolean decimalComma) {
        int n = to - from;
        if (n == 0 || n > 40) {
            return Double.NaN;
        }
        int i = 0;
        boolean negative = false;
        char first = text[from];
        if (first == '+' || first == '-') {
            negative = first == '-';
            i = 1;
        }
        long mantissa = 0;
        int digits = 0;
        int fraction = -1;
        boolean exponent = false;
        boolean anyDigit = false;
        for (; i < n; i++) {
            char c = text[from + i];
            if (c >= '0' && c <= '9') {
                anyDigit = true;
                if (fraction >= 0) {
                    fraction++;
                }
                if (mantissa != 0 || c != '0') {
                    digits++;
                }
                mantissa = digits <= 18 ? mantissa * 10 + (c - '0') : mantissa;
            } else if ((c == '.' || c == ',' && decimalComma) && fraction < 0) {
                fraction = 0;
            } else if ((c == 'e' || c == 'E') && i > 0) {
                exponent = true;
                break;
            } else {
                return Double.NaN;
            }
        }
        if (!anyDigit) {
            return Double.NaN;
        }
        if (!exponent && digits <= 15 && Math.max(0, fraction) < POWERS_OF_TEN.length) {
            double x = mantissa / POWERS_OF_TEN[Math.max(0, fraction)];
            return negative ? -x : x;
        }
        // rare forms (exponent, many digits): check the shape, then let the JDK parse it
        String v = new String(text, from, n);
        if (exponent) {
            String e = v.substring(i + 1);
            int j = e.startsWith("+") || e.startsWith("-") ? 1 : 0;
            if (j == e.length()) {
                return Double.NaN;
            }
            for (; j < e.length(); j++) {
                if (e.charAt(j) < '0' || e.charAt(j) > '9') {
                    return Double.NaN;
                }
            }
        }
        try {
            return Double.parseDouble(decimalComma ? v.replace(',', '.') : v);
        } catch (NumberFormatException ex) {
            return Double.NaN;
        }
    }
}
