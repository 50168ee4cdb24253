package app.latentledger.cli;

import java.util.Locale;
import java.util.regex.Pattern;

/** Number formatting for readable tables: fixed decimals, the same on every locale. */
final class Format {
    /** "-0", "-0.0", "-0.00": a negative value that rounds to zero prints without its sign. */
    private static final Pattern NEGATIVE_ZERO = Pattern.compile("-0\\.?0*");

    /** Spaces left at the end of a row whose unit is empty. */
    private static final Pattern TRAILING_SPACES = Pattern.compile(" +\n$");

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
        // compiled once: a week-long log's table formats thousands of numbers in a cold JVM
        return s.startsWith("-0") && NEGATIVE_ZERO.matcher(s).matches() ? s.substring(1) : s;
    }

    /** A table row: label padded, value right-aligned, then the unit. */
    static String row(String label, String value, String unit) {
        String row = String.format(Locale.ROOT, "  %-22s %12s %s%n", label, value, unit);
        return TRAILING_SPACES.matcher(row).replaceAll("\n");
    }
}
