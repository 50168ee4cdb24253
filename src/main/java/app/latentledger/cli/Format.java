package app.latentledger.cli;

import java.util.Locale;

/** Number formatting for readable tables: fixed decimals, the same on every locale. */
final class Format {
    private Format() {
    }

    static String fixed(double v, int decimals) {
        if (Double.isNaN(v)) {
            return "—";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "∞" : "−∞";
        }
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        return s.matches("-0\\.?0*") ? s.substring(1) : s;
    }

    /** A table row: label padded, value right-aligned, then the unit. */
    static String row(String label, String value, String unit) {
        return String.format(Locale.ROOT, "  %-22s %12s %s%n", label, value, unit).replaceAll(" +\n$", "\n");
    }
}
