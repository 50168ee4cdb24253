package app.latentledger.report;

import app.latentledger.core.coil.Estimate;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.Locale;

/**
 * Numbers as the report and the export print them: fixed decimals per quantity (the same as the
 * {@code coil} command's table), the same on every locale, "—" for a value that does not exist.
 */
public final class Numbers {
    private Numbers() {
    }

    /** Decimals a quantity is shown with. */
    public static int decimals(Quantity q, UnitSystem units) {
        boolean ip = units == UnitSystem.IP;
        return switch (q) {
            case TEMPERATURE, TEMPERATURE_DIFFERENCE, RELATIVE_HUMIDITY, ENTHALPY, WATER_RATE_DAILY,
                    DURATION_MINUTES -> 1;
            case HUMIDITY_RATIO_FINE -> ip ? 1 : 2;
            case PRESSURE -> ip ? 3 : 2;
            case HUMIDITY_RATIO -> 5;
            case SPECIFIC_VOLUME, DENSITY, DIMENSIONLESS -> 3;
            case POWER_LARGE, WATER_RATE, POWER_PER_AIRFLOW, WATER_MASS -> 2;
            case WATER_MASS_DAILY, LENGTH, WIND_SPEED -> 1;
            case AREA, VOLUME -> 0;
            case WATER_VOLUME -> ip ? 1 : 0;
            case FRACTION_PERCENT -> 0;
            case ELEVATION, AIRFLOW, POWER, AIRFLOW_PER_CAPACITY, DURATION_SECONDS -> 0;
        };
    }

    /** The uncertainty of a temperature is a temperature difference. */
    public static Quantity spread(Quantity q) {
        return q == Quantity.TEMPERATURE ? Quantity.TEMPERATURE_DIFFERENCE : q;
    }

    public static String fixed(double v, int decimals) {
        if (Double.isNaN(v)) {
            return "—";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "∞" : "−∞";
        }
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        return s.matches("-0\\.?0*") ? s.substring(1) : s;
    }

    /** The value in display units, without unit. */
    public static String value(Quantity q, UnitSystem units, double si) {
        return Double.isFinite(si) ? fixed(q.toDisplay(units, si), decimals(q, units)) : "—";
    }

    /** "60.8 °F" (or "—"). */
    public static String withUnit(Quantity q, UnitSystem units, double si) {
        String v = value(q, units, si);
        String sym = q.symbol(units);
        return v.equals("—") || sym.isEmpty() ? v : v + " " + sym;
    }

    /** "60.8 ± 1.1 °F": a value with its tolerance or expanded uncertainty (omitted when NaN). */
    public static String withSpread(Quantity q, UnitSystem units, double si, double spreadSi) {
        return withSpread(q, units, si, spreadSi, decimals(q, units));
    }

    public static String withSpread(Quantity q, UnitSystem units, double si, double spreadSi, int decimals) {
        String v = Double.isFinite(si) ? fixed(q.toDisplay(units, si), decimals) : "—";
        if (v.equals("—")) {
            return v;
        }
        String sym = q.symbol(units);
        String u = Double.isFinite(spreadSi)
                ? " ± " + fixed(spread(q).toDisplay(units, spreadSi), decimals) : "";
        return v + u + (sym.isEmpty() ? "" : " " + sym);
    }

    public static String estimate(Quantity q, UnitSystem units, Estimate e) {
        return withSpread(q, units, e.valueSi(), e.expandedSi());
    }

    /** A signed change, "+1.20" or "−0.35", in display units (a difference of temperatures in °F/K). */
    public static String change(Quantity q, UnitSystem units, double deltaSi, double spreadSi) {
        return change(q, units, deltaSi, spreadSi, decimals(q, units));
    }

    public static String change(Quantity q, UnitSystem units, double deltaSi, double spreadSi, int decimals) {
        if (!Double.isFinite(deltaSi)) {
            return "—";
        }
        Quantity dq = spread(q);
        String v = fixed(dq.toDisplay(units, deltaSi), decimals);
        if (!v.startsWith("-") && !v.equals(fixed(0, decimals))) {
            v = "+" + v;
        }
        v = v.replace('-', '−');
        String u = Double.isFinite(spreadSi) ? " ± " + fixed(dq.toDisplay(units, spreadSi), decimals) : "";
        String sym = dq.symbol(units);
        return v + u + (sym.isEmpty() ? "" : " " + sym);
    }
}
