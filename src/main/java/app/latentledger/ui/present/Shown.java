package app.latentledger.ui.present;

import app.latentledger.core.coil.Estimate;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.Locale;

/** Numbers worded for the screen, in the tech's units; a dash for a number that does not exist. */
public final class Shown {
    public static final String NONE = "—";

    private Shown() {
    }

    public static String number(double shown, int decimals) {
        if (!Double.isFinite(shown)) {
            return NONE;
        }
        String v = String.format(Locale.ROOT, "%,." + decimals + "f", shown);
        return v.matches("-0\\.?0*") ? v.substring(1) : v;
    }

    /** Value only, no unit. */
    public static String of(Quantity q, UnitSystem units, double si, int decimals) {
        return Double.isFinite(si) ? number(q.toDisplay(units, si), decimals) : NONE;
    }

    /** "value ± U" (no unit), the ± part left out when there is no uncertainty. */
    public static String of(Quantity q, UnitSystem units, Estimate e, int decimals) {
        if (e == null || !e.exists()) {
            return NONE;
        }
        String v = of(q, units, e.valueSi(), decimals);
        if (!Double.isFinite(e.expandedSi())) {
            return v;
        }
        Quantity uq = q == Quantity.TEMPERATURE ? Quantity.TEMPERATURE_DIFFERENCE : q;
        return v + " ± " + number(uq.toDisplay(units, e.expandedSi()), decimals);
    }
}
