package app.latentledger.core.settings;

import app.latentledger.core.units.DisplayNumber;

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

    /** The number as typed back: {@link DisplayNumber#exact}. */
    public static String text(double shown) {
        return DisplayNumber.exact(shown);
    }
}
