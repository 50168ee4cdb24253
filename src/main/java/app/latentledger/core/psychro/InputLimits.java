package app.latentledger.core.psychro;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.units.Quantity;

/**
 * What a field reading may be. Wider than any air a tech meets, narrower than the equations'
 * validity, so that a slipped decimal point is caught at the keypad rather than in a report.
 */
public final class InputLimits {
    /** −60 °F, the coldest outdoor air the app accepts (common practice, no source). */
    public static final double MIN_TEMP_C = -50.0;
    /** 200 °F, above any attic or supply-air reading (common practice, no source). */
    public static final double MAX_TEMP_C = 95.0;
    /** −1500 ft (≈ −457 m), below the lowest inhabited land (Dead Sea shore, −430 m). */
    public static final double MIN_ELEVATION_M = -450.0;
    /** 15 000 ft (≈ 4572 m), above the highest towns with air conditioning. */
    public static final double MAX_ELEVATION_M = 4500.0;
    /**
     * 50 kPa to 110 kPa (7.25 to 15.95 psia): the standard atmosphere at 5600 m and a record
     * sea-level high (108.4 kPa) plus margin.
     */
    public static final double MIN_PRESSURE_PA = 50_000.0;
    public static final double MAX_PRESSURE_PA = 110_000.0;

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
