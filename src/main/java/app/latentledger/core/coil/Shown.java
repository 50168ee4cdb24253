package app.latentledger.core.coil;

import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.Locale;

/** A number worded for a finding's technical line, in the tech's units. */
final class Shown {
    private Shown() {
    }

    static String of(Quantity q, UnitSystem units, double si, int decimals) {
        if (!Double.isFinite(si)) {
            return "n/a";
        }
        String unit = q.symbol(units);
        String v = String.format(Locale.ROOT, "%." + decimals + "f", q.toDisplay(units, si));
        if (v.matches("-0\\.?0*")) {
            v = v.substring(1);
        }
        return unit.isEmpty() ? v : v + " " + unit;
    }

    /** "value ± U unit" for an estimate. */
    static String of(Measurand m, UnitSystem units, Estimate e, int decimals) {
        String value = of(m.quantity(), units, e.valueSi(), decimals);
        if (!Double.isFinite(e.expandedSi())) {
            return value;
        }
        String u = String.format(Locale.ROOT, "%." + decimals + "f",
                m.uncertaintyQuantity().toDisplay(units, e.expandedSi()));
        String unit = m.quantity().symbol(units);
        return unit.isEmpty() ? value + " ± " + u
                : value.substring(0, value.length() - unit.length() - 1) + " ± " + u + " " + unit;
    }
}
