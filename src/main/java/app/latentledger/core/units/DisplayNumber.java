package app.latentledger.core.units;

import java.util.Locale;

/**
 * The one way a number is printed for a person: on the screen, in the PDF report, in the command
 * line's tables and in a finding's technical line, so the same value reads the same everywhere.
 * Files meant for programs (CSV, JSON) print plain numbers and do not use this.
 *
 * <ul>
 *   <li><b>Decimals per quantity</b> ({@link #decimals}): chosen once per quantity and unit system
 *       so the last digit shown is about the resolution of a field instrument, not more.</li>
 *   <li><b>Missing and infinite</b>: a value that does not exist (NaN) reads {@value #NONE}; an
 *       infinite one reads {@value #INFINITE} or {@code -∞}.</li>
 *   <li><b>Sign</b>: a negative number keeps its minus; a value that rounds to zero never shows
 *       "-0". A change ({@link #change}) always shows its sign: "+" for a rise, "-" for a fall,
 *       none when it rounds to zero.</li>
 *   <li><b>Grouping</b>: thousands are grouped with a comma ("14,414"), the same on every locale;
 *       the decimal separator is always a point. Text the tech may edit again ({@link #exact}) is
 *       never grouped, so it reads back as typed.</li>
 * </ul>
 */
public final class DisplayNumber {
    /** A value that does not exist: not measured, or not computable from what was measured. */
    public static final String NONE = "—";
    /** An infinite value (e.g. an open end of an accepted range). */
    public static final String INFINITE = "∞";

    private DisplayNumber() {
    }

    /**
     * Decimals a quantity is shown with, in the tech's units: the step of a field instrument or a
     * little finer (common practice, no source).
     */
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
            case WATER_VOLUME -> ip ? 1 : 0;
            case FRACTION_PERCENT -> 0;
            case ELEVATION, AIRFLOW, POWER, AIRFLOW_PER_CAPACITY, DURATION_SECONDS -> 0;
        };
    }

    /** The quantity a spread (tolerance, uncertainty) or a change of {@code q} is in: a temperature's is a difference. */
    public static Quantity spreadQuantity(Quantity q) {
        return q == Quantity.TEMPERATURE ? Quantity.TEMPERATURE_DIFFERENCE : q;
    }

    /** A number already in display units, with {@code decimals} places: "14,414", "-0.4", "—". */
    public static String number(double shown, int decimals) {
        if (Double.isNaN(shown)) {
            return NONE;
        }
        if (Double.isInfinite(shown)) {
            return shown > 0 ? INFINITE : "-" + INFINITE;
        }
        String s = String.format(Locale.ROOT, "%,." + decimals + "f", shown);
        return isNegativeZero(s) ? s.substring(1) : s;
    }

    /** An SI value in the tech's units with the quantity's decimals, no unit: "60.8". */
    public static String value(Quantity q, UnitSystem units, double si) {
        return value(q, units, si, decimals(q, units));
    }

    /** An SI value in the tech's units with {@code decimals} places, no unit. */
    public static String value(Quantity q, UnitSystem units, double si, int decimals) {
        return number(q.toDisplay(units, si), decimals);
    }

    /** "60.8 °F", or "—" (no unit after a missing value). */
    public static String withUnit(Quantity q, UnitSystem units, double si) {
        return withUnit(q, units, si, decimals(q, units));
    }

    public static String withUnit(Quantity q, UnitSystem units, double si, int decimals) {
        return unit(value(q, units, si, decimals), q.symbol(units));
    }

    /** "60.8 ± 1.1": a value with its tolerance or expanded uncertainty, no unit; the ± part left out when unknown. */
    public static String valueWithSpread(Quantity q, UnitSystem units, double si, double spreadSi, int decimals) {
        String v = value(q, units, si, decimals);
        if (v.equals(NONE) || !Double.isFinite(spreadSi)) {
            return v;
        }
        return v + " ± " + value(spreadQuantity(q), units, spreadSi, decimals);
    }

    /** "60.8 ± 1.1 °F", with the quantity's decimals. */
    public static String withSpread(Quantity q, UnitSystem units, double si, double spreadSi) {
        return withSpread(q, units, si, spreadSi, decimals(q, units));
    }

    public static String withSpread(Quantity q, UnitSystem units, double si, double spreadSi, int decimals) {
        return unit(valueWithSpread(q, units, si, spreadSi, decimals), q.symbol(units));
    }

    /** A change already in display units, signed: "+1.2", "-330", "0.0", "—". */
    public static String signed(double shownChange, int decimals) {
        String s = number(shownChange, decimals);
        boolean unsigned = s.startsWith("-") || s.equals(NONE) || s.equals(number(0, decimals));
        return unsigned ? s : "+" + s;
    }

    /**
     * A change of {@code q} from SI, signed, with its spread when known and the unit: "+1.2 ± 0.4 °F"
     * (a change of temperature is a temperature difference).
     */
    public static String change(Quantity q, UnitSystem units, double deltaSi, double spreadSi, int decimals) {
        if (!Double.isFinite(deltaSi)) {
            return NONE;
        }
        Quantity dq = spreadQuantity(q);
        String v = signed(dq.toDisplay(units, deltaSi), decimals);
        String u = Double.isFinite(spreadSi) ? " ± " + value(dq, units, spreadSi, decimals) : "";
        return unit(v + u, dq.symbol(units));
    }

    public static String change(Quantity q, UnitSystem units, double deltaSi, double spreadSi) {
        return change(q, units, deltaSi, spreadSi, decimals(spreadQuantity(q), units));
    }

    /**
     * A number as a tech types it and reads it back (a setting, an accepted range): at most four
     * decimals, no trailing zeros, no grouping, so it parses again as typed; "—" for NaN.
     */
    public static String exact(double shown) {
        if (Double.isNaN(shown) || Double.isInfinite(shown)) {
            return number(shown, 0);
        }
        String s = String.format(Locale.ROOT, "%.4f", shown).replaceAll("0+$", "").replaceAll("\\.$", "");
        return "-0".equals(s) ? "0" : s;
    }

    private static String unit(String value, String symbol) {
        return value.equals(NONE) || symbol.isEmpty() ? value : value + " " + symbol;
    }

    private static boolean isNegativeZero(String s) {
        if (!s.startsWith("-")) {
            return false;
        }
        for (int i = 1; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c != '0' && c != '.' && c != ',') {
                return false;
            }
        }
        return true;
    }
}
