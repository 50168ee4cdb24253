package app.latentledger.core.coil;

import app.latentledger.core.units.DisplayNumber;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

/** A number worded for a finding's technical line, in the tech's units, as every face prints it. */
final class Shown {
    private Shown() {
    }

    static String of(Quantity q, UnitSystem units, double si, int decimals) {
        return DisplayNumber.withUnit(q, units, si, decimals);
    }

    /** "value ± U unit" for an estimate. */
    static String of(Measurand m, UnitSystem units, Estimate e, int decimals) {
        return DisplayNumber.withSpread(m.quantity(), units, e.valueSi(), e.expandedSi(), decimals);
    }
}
