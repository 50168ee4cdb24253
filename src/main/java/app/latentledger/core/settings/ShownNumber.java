package app.latentledger.core.settings;

import java.util.Locale;

/** A setting's number as a tech reads and types it: at most four decimals, no trailing zeros. */
public final class ShownNumber {
    private ShownNumber() {
    }

    public static String text(double shown) {
        if (Double.isNaN(shown)) {
            return "—";
        }
        String s = String.format(Locale.ROOT, "%.4f", shown).replaceAll("0+$", "").replaceAll("\\.$", "");
        return "-0".equals(s) ? "0" : s;
    }
}
