package app.latentledger.report;

import app.latentledger.core.coil.Estimate;
import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

/**
 * A coil-check estimate as the report prints it: {@link DisplayNumber} with its expanded
 * uncertainty, so the PDF reads exactly like the screen.
 */
final class Numbers {
    private Numbers() {
    }

    /** "14,414 ± 3,849 Btu/h", with the quantity's decimals; "—" when it does not exist. */
    static String estimate(Quantity q, UnitSystem units, Estimate e) {
        return DisplayNumber.withSpread(q, units, e.valueSi(), e.expandedSi());
    }
}
