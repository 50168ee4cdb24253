package app.latentledger.cli;

import app.latentledger.core.units.DisplayNumber;

import java.util.Locale;
import java.util.regex.Pattern;

/** Readable tables: numbers as the app and the report print them, labels padded, units after. */
final class Format {
    /** Spaces left at the end of a row whose unit is empty. */
    private static final Pattern TRAILING_SPACES = Pattern.compile(" +\n$");

    private Format() {
    }

    /** A number in display units, printed as everywhere else ({@link DisplayNumber#number}). */
    static String fixed(double v, int decimals) {
        return DisplayNumber.number(v, decimals);
    }

    /** A table row: label padded, value right-aligned, then the unit. */
    static String row(String label, String value, String unit) {
        String row = String.format(Locale.ROOT, "  %-26s %12s %s%n", label, value, unit);
        return TRAILING_SPACES.matcher(row).replaceAll("\n");
    }
}
