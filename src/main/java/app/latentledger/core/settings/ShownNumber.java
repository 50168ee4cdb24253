package app.latentledger.core.settings;

import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.TypedNumber;
import app.latentledger.core.units.UnitSystem;

/** A setting's number as a tech reads and types it: at most four decimals, no trailing zeros. */
public final class ShownNumber {
    private ShownNumber() {
    }

    /**
     * A typed plain decimal by the app's one number rule ({@link TypedNumber}: a decimal point, no
     * comma, hex, NaN or Infinity), or null when it is not one.
     */
    public static Double parse(String typed) {
        return TypedNumber.isNumber(typed) ? Double.valueOf(typed.strip()) : null;
    }

    /** The number as typed back: {@link DisplayNumber#exact}. */
    public static String text(double shown) {
        return DisplayNumber.exact(shown);
    }

    /**
     * An SI value in the tech's units at the quantity's shown decimals ({@link DisplayNumber#decimals}),
     * ungrouped so it can be typed back: 2000 J/kg reads "0.9" Btu/lb, not "0.8598". Only the text
     * is rounded; the stored value keeps every digit.
     */
    public static String rounded(Quantity q, UnitSystem units, double si) {
        double step = Math.pow(10, DisplayNumber.decimals(q, units));
        return text(Math.round(q.toDisplay(units, si) * step) / step);
    }
}
