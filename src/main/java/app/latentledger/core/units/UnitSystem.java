package app.latentledger.core.units;

import java.util.Locale;

/**
 * The two unit systems a tech can read and type in. Everything inside the core is SI;
 * conversion happens once, at input and at output, through {@link Quantity}.
 */
public enum UnitSystem {
    /** Inch-pound: °F, psia, ft, Btu/lb, ft³/lb, cfm, Btu/h. */
    IP,
    /** SI as the trade uses it: °C, kPa, m, kJ/kg, m³/kg, L/s, W. */
    SI;

    /** Parses {@code ip} or {@code si} (any case). */
    public static UnitSystem parse(String text) {
        if (text != null) {
            switch (text.trim().toLowerCase(Locale.ROOT)) {
                case "ip": return IP;
                case "si": return SI;
                default: break;
            }
        }
        throw new IllegalArgumentException("units '" + text + "' not understood; accepted: ip, si");
    }

    /** Lower-case key as used in commands and JSON ("ip" | "si"). */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }
}
