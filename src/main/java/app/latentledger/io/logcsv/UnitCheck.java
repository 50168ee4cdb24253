package app.latentledger.io.logcsv;

import app.latentledger.core.cycles.Channel;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.Arrays;
import java.util.Locale;

/**
 * Refuses a log whose temperatures are implausible in the unit they were read in, so a °C file read
 * as °F (or the reverse) is never analysed. The test: an occupied house's return air lies between
 * 40 and 110 °F (4.4–43.3 °C), and air leaving a working cooling coil between 35 and 110 °F
 * (1.7–43.3 °C); a log whose return (else supply) dry bulb is outside that for more than half its
 * readings is not what the unit says. Bounds are common practice, no source: they are wide on
 * purpose, and 24 °C read as °F (−4 °C) or 75 °F read as °C is far outside them.
 */
final class UnitCheck {
    static final double RETURN_MIN_C = 40.0 * 5 / 9 - 32.0 * 5 / 9;
    static final double SUPPLY_MIN_C = 35.0 * 5 / 9 - 32.0 * 5 / 9;
    static final double MAX_C = (110.0 - 32.0) * 5 / 9;

    private UnitCheck() {
    }

    static void check(HeaderLayout header, double[][] analog, int n, UnitSystem unit, boolean fromHeader)
            throws LogRefusedException {
        Channel ch = analog[Channel.RETURN_DB.ordinal()] != null ? Channel.RETURN_DB
                : analog[Channel.SUPPLY_DB.ordinal()] != null ? Channel.SUPPLY_DB : null;
        if (ch == null) {
            return;
        }
        double min = ch == Channel.RETURN_DB ? RETURN_MIN_C : SUPPLY_MIN_C;
        double[] v = analog[ch.ordinal()];
        double[] seen = new double[n];
        int m = 0;
        int outside = 0;
        for (int i = 0; i < n; i++) {
            if (!Double.isNaN(v[i])) {
                seen[m++] = v[i];
                if (v[i] < min || v[i] > MAX_C) {
                    outside++;
                }
            }
        }
        if (m == 0 || outside * 2 <= m) {
            return;
        }
        Arrays.sort(seen, 0, m);
        String sym = Quantity.TEMPERATURE.symbol(unit);
        UnitSystem other = unit == UnitSystem.SI ? UnitSystem.IP : UnitSystem.SI;
        String column = header.names[header.analogColumn[ch.ordinal()]];
        String range = String.format(Locale.ROOT, "%.1f to %.1f %s (median %.1f %s)",
                Quantity.TEMPERATURE.toDisplay(unit, seen[0]), Quantity.TEMPERATURE.toDisplay(unit, seen[m - 1]), sym,
                Quantity.TEMPERATURE.toDisplay(unit, seen[m / 2]), sym);
        String bounds = String.format(Locale.ROOT, "%.0f to %.0f %s", Quantity.TEMPERATURE.toDisplay(unit, min),
                Quantity.TEMPERATURE.toDisplay(unit, MAX_C), sym);
        throw new LogRefusedException("column '" + column + "' (" + ch.label() + ") reads " + range + ", read as "
                + sym + (fromHeader ? " as its header states" : " (the settings' unit)") + ": most readings are"
                + " outside " + bounds + ", which " + (ch == Channel.RETURN_DB ? "an occupied house's return air"
                : "air leaving a cooling coil") + " stays within. "
                + (fromHeader ? "Check the header's unit." : "If the file is in " + Quantity.TEMPERATURE.symbol(other)
                + ", import it with " + Quantity.TEMPERATURE.symbol(other) + " units or write the unit in the header,"
                + " e.g. " + column + " [" + Quantity.TEMPERATURE.symbol(other) + "]."));
    }
}
