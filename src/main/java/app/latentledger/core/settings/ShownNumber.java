package app.latentledger.core.settings;

import java.util.Locale;

/** A setting's number as a tech reads and types it: at most four decimals, no trailing zeros. */
public final class ShownNumber {
    private static final java.util.regex.Pattern DECIMAL =
            java.util.regex.Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    private ShownNumber() {
    }

    /** A typed plain decimal (decimal point or comma; no hex, NaN or Infinity), or null when it is not one. */
    public static Double parse(String typed) {
        String t = typed == null ? "" : typed.trim().replace(',', '.');
        return DECIMAL.matcher(t).matches() ? Double.valueOf(t) : null;
    }

    public static String text(double shown) {
        if (Double.isNaN(shown)) {
            return "—";
        }
        String s = String.format(Locale.ROOT, "%.4f", shown).replaceAll("0+$", "").replaceAll("\\.$", "");
        return "-0".equals(s) ? "0" : s;
    }
}
