package app.latentledger.ui.present;

import app.latentledger.core.coil.Estimate;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

/**
 * Numbers worded for the screen, in the tech's units, without their unit (the screen sets the unit
 * in its own column). Every number is printed by {@link DisplayNumber}, so the screen reads exactly
 * like the PDF report and the command line.
 */
public final class Shown {
    public static final String NONE = DisplayNumber.NONE;

    private Shown() {
    }

    /** A number already in display units. */
    public static String number(double shown, int decimals) {
        return DisplayNumber.number(shown, decimals);
    }

    /** Value only, no unit, with the quantity's decimals. */
    public static String of(Quantity q, UnitSystem units, double si) {
        return DisplayNumber.value(q, units, si);
    }

    /** Value only, no unit, with {@code decimals} places. */
    public static String of(Quantity q, UnitSystem units, double si, int decimals) {
        return DisplayNumber.value(q, units, si, decimals);
    }

    /** "value ± U" (no unit) with the quantity's decimals, the ± part left out when there is no uncertainty. */
    public static String of(Quantity q, UnitSystem units, Estimate e) {
        if (e == null || !e.exists()) {
            return NONE;
        }
        return DisplayNumber.valueWithSpread(q, units, e.valueSi(), e.expandedSi(), DisplayNumber.decimals(q, units));
    }
}
