package app.latentledger.core.measure;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.units.Quantity;

import java.util.List;

/**
 * Every range a field reading may take, once, with where it comes from. The field records, the
 * coil check, the keypad, the log analysis and the log importer all check against these entries,
 * so a value the keypad takes is a value the record keeps and the check works out.
 *
 * <p>The ranges are wider than any air a tech meets and narrower than the equations' validity, so
 * that a slipped decimal point is caught at the box rather than in a report.
 */
public final class FieldLimits {
    /** Source text for a range that is a judgement of the trade, not a published limit. */
    public static final String COMMON_PRACTICE = "common practice, no source";

    /**
     * One accepted range, SI.
     *
     * @param field    the field as a tech names it, e.g. "airflow"
     * @param quantity how the value and range are shown
     * @param minSi    lowest accepted value
     * @param maxSi    highest accepted value
     * @param source   why these ends
     */
    public record Limit(String field, Quantity quantity, double minSi, double maxSi, String source) {
        /** Refuses NaN or a value outside the range, naming this limit's own field. */
        public double check(double valueSi) {
            return check(field, valueSi);
        }

        /** Refuses NaN or a value outside the range, naming {@code as} (e.g. "return wet bulb"). */
        public double check(String as, double valueSi) {
            if (Double.isNaN(valueSi) || valueSi < minSi || valueSi > maxSi) {
                throw new InvalidInputException(as, quantity, valueSi, minSi, maxSi, null);
            }
            return valueSi;
        }

        /** True when the value lies in the range. */
        public boolean accepts(double valueSi) {
            return valueSi >= minSi && valueSi <= maxSi;
        }
    }

    /** Any air temperature: −50 to 95 °C (−58 to 203 °F), colder than any outdoor air served, hotter than any attic. */
    public static final Limit AIR_TEMPERATURE = new Limit("temperature", Quantity.TEMPERATURE, -50.0, 95.0,
            COMMON_PRACTICE);
    /** Relative humidity, 0 to 100 % (its definition, ASHRAE Handbook—Fundamentals 2017 ch. 1). */
    public static final Limit RELATIVE_HUMIDITY = new Limit("relative humidity", Quantity.RELATIVE_HUMIDITY, 0, 100,
            "definition of relative humidity (ASHRAE Handbook—Fundamentals 2017 ch. 1)");
    /** ± on any temperature reading: up to 10 K (18 °F); wider is a typo, not an instrument. */
    public static final Limit TEMPERATURE_TOLERANCE = new Limit("temperature tolerance",
            Quantity.TEMPERATURE_DIFFERENCE, 0, 10, COMMON_PRACTICE);
    /** ± on an RH reading: up to 20 %-points; the loosest field RH sensor is ±5 % RH. */
    public static final Limit RELATIVE_HUMIDITY_TOLERANCE = new Limit("relative humidity tolerance",
            Quantity.RELATIVE_HUMIDITY, 0, 20, COMMON_PRACTICE);
    /** A cooling coil: −30 to 35 °C (about −20 to 95 °F), from a frozen coil to a stopped one on a hot day. */
    public static final Limit COIL_TEMPERATURE = new Limit("coil temperature", Quantity.TEMPERATURE, -30.0, 35.0,
            COMMON_PRACTICE);
    /**
     * Airflow through one coil: 0.0094 to 25 m³/s (20 to about 53 000 cfm). Decided once for the
     * keypad, the stored reading set, the coil check and the log analysis (they used to say
     * 0.0094–25, 0.0094–47.2 and 0.02–10): 20 cfm is below any air handler, and 53 000 cfm is a
     * 130-ton rooftop unit, beyond any coil this tool is for; no stored reading set lies outside it.
     */
    public static final Limit AIRFLOW = new Limit("airflow", Quantity.AIRFLOW, 0.0094, 25.0, COMMON_PRACTICE);
    /** ± on an airflow reading, as a fraction of it: up to 50 % (a rule-of-thumb 400 cfm/ton is about ±30 %). */
    public static final Limit AIRFLOW_TOLERANCE = new Limit("airflow tolerance", Quantity.FRACTION_PERCENT, 0, 0.5,
            COMMON_PRACTICE);
    /** Nameplate total cooling capacity: 500 W to 200 kW (0.14 to 57 tons), a window unit to a light-commercial rooftop. */
    public static final Limit NOMINAL_CAPACITY = new Limit("nominal capacity", Quantity.POWER_LARGE, 500, 200_000,
            COMMON_PRACTICE);
    /** Water caught in one timed catch: up to 50 L, far beyond any drain. */
    public static final Limit CONDENSATE_VOLUME = new Limit("condensate volume", Quantity.WATER_VOLUME, 0, 0.05,
            COMMON_PRACTICE);
    /** ± on the volume caught, as a fraction of it: up to 50 %. */
    public static final Limit CONDENSATE_VOLUME_TOLERANCE = new Limit("condensate volume tolerance",
            Quantity.FRACTION_PERCENT, 0, 0.5, COMMON_PRACTICE);
    /** Collection time of a catch: 30 s to 24 h. */
    public static final Limit COLLECTION_TIME = new Limit("condensate collection time", Quantity.DURATION_MINUTES,
            30, 86_400, COMMON_PRACTICE);
    /** Outdoor air's share of the coil airflow by volume: 0 to 100 %. */
    public static final Limit OUTDOOR_FRACTION = new Limit("outdoor-air fraction", Quantity.FRACTION_PERCENT, 0, 1,
            "a share of the coil airflow lies between 0 and 100 %");
    /** ± on the outdoor-air share: up to 50 %-points. */
    public static final Limit OUTDOOR_FRACTION_TOLERANCE = new Limit("outdoor-air fraction tolerance",
            Quantity.FRACTION_PERCENT, 0, 0.5, COMMON_PRACTICE);
    /**
     * Barometric pressure: 50 to 110 kPa (7.25 to 15.95 psia), the standard atmosphere at 5600 m and a
     * record sea-level high (108.4 kPa) plus margin.
     */
    public static final Limit PRESSURE = new Limit("pressure", Quantity.PRESSURE, 50_000.0, 110_000.0,
            "standard atmosphere (ASHRAE Handbook—Fundamentals 2017 ch. 1, eq. 3) at 5600 m; sea-level record high");
    /** ± on a measured station pressure: up to 5 kPa, wider than weather's spread around the standard atmosphere. */
    public static final Limit PRESSURE_TOLERANCE = new Limit("station pressure tolerance", Quantity.PRESSURE, 0,
            5_000, COMMON_PRACTICE);
    /** Site elevation: −450 to 4500 m (−1500 to 15 000 ft), Dead Sea shore to the highest towns with cooling. */
    public static final Limit ELEVATION = new Limit("elevation", Quantity.ELEVATION, -450.0, 4500.0, COMMON_PRACTICE);
    /**
     * A supply probe's offset against the return probe, as a dew-point difference found by reading
     * both in the same air: ±5 K (±9 °F). A larger offset is a broken probe, not one to correct.
     */
    public static final Limit SUPPLY_DEW_POINT_OFFSET = new Limit("supply dew-point offset",
            Quantity.TEMPERATURE_DIFFERENCE, -5, 5, COMMON_PRACTICE);

    private FieldLimits() {
    }

    /** Every range, for the methods document and a test that each has a source. */
    public static List<Limit> all() {
        return List.of(AIR_TEMPERATURE, RELATIVE_HUMIDITY, TEMPERATURE_TOLERANCE, RELATIVE_HUMIDITY_TOLERANCE,
                COIL_TEMPERATURE, AIRFLOW, AIRFLOW_TOLERANCE, NOMINAL_CAPACITY, CONDENSATE_VOLUME,
                CONDENSATE_VOLUME_TOLERANCE, COLLECTION_TIME, OUTDOOR_FRACTION, OUTDOOR_FRACTION_TOLERANCE, PRESSURE,
                PRESSURE_TOLERANCE, ELEVATION, SUPPLY_DEW_POINT_OFFSET);
    }
}
