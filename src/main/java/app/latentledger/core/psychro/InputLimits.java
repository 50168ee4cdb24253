package app.latentledger.core.psychro;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.measure.FieldLimits;
import app.latentledger.core.units.Quantity;

/**
 * Range checks against {@link FieldLimits}, the one table of accepted ranges. What a field reading may be: wider than any air a tech meets, narrower than the equations'
 * validity, so that a slipped decimal point is caught at the keypad rather than in a report.
 */
public final class InputLimits {
    /** −58 °F, the coldest outdoor air the app accepts ({@link FieldLimits#AIR_TEMPERATURE}). */
    public static final double MIN_TEMP_C = FieldLimits.AIR_TEMPERATURE.minSi();
    /** 203 °F, above any attic or supply-air reading. */
    public static final double MAX_TEMP_C = FieldLimits.AIR_TEMPERATURE.maxSi();
    /** −1500 ft (≈ −457 m), below the lowest inhabited land ({@link FieldLimits#ELEVATION}). */
    public static final double MIN_ELEVATION_M = FieldLimits.ELEVATION.minSi();
    /** 15 000 ft (≈ 4572 m), above the highest towns with air conditioning. */
    public static final double MAX_ELEVATION_M = FieldLimits.ELEVATION.maxSi();
    /** 50 kPa to 110 kPa (7.25 to 15.95 psia): {@link FieldLimits#PRESSURE}. */
    public static final double MIN_PRESSURE_PA = FieldLimits.PRESSURE.minSi();
    public static final double MAX_PRESSURE_PA = FieldLimits.PRESSURE.maxSi();

    private InputLimits() {
    }

    /** Refuses NaN or a temperature outside −50 to 95 °C (−58 to 203 °F), naming {@code field}. */
    public static void checkTemperature(String field, double tempC) {
        check(field, Quantity.TEMPERATURE, tempC, MIN_TEMP_C, MAX_TEMP_C, null);
    }

    public static void checkPressure(String field, double pressurePa) {
        check(field, Quantity.PRESSURE, pressurePa, MIN_PRESSURE_PA, MAX_PRESSURE_PA, null);
    }

    public static void checkElevation(String field, double elevationM) {
        check(field, Quantity.ELEVATION, elevationM, MIN_ELEVATION_M, MAX_ELEVATION_M, null);
    }

    public static void checkRelativeHumidity(String field, double pct) {
        check(field, Quantity.RELATIVE_HUMIDITY, pct, 0.0, 100.0, null);
    }

    /** Generic range check; NaN is always refused. */
    public static void check(String field, Quantity q, double value, double min, double max, String reason) {
        if (Double.isNaN(value) || value < min || value > max) {
            throw new InvalidInputException(field, q, value, min, max, reason);
        }
    }
}
