package app.latentledger.core.coil;

/**
 * Default instrument tolerances, each the ± half-width a maker would state for typical field kit.
 * All overridable per reading. Sources: docs/methods.md §9.1 (common practice, no source, for
 * probes; ±10 % of reading for airflow instruments from California Title 24 Part 6 RA3.7.2.2, 2013).
 */
public final class Tolerances {
    /** ±0.5 °F dry bulb. */
    public static final double DRY_BULB_K = 0.5 / 1.8;
    /** ±2 %RH (capacitive sensor, 10–90 % RH). */
    public static final double RELATIVE_HUMIDITY_PCT = 2.0;
    /** ±0.5 °F wet bulb (aspirated psychrometer). */
    public static final double WET_BULB_K = 0.5 / 1.8;
    /** ±1 °F dew point (field dew-point meter; common practice, no source). */
    public static final double DEW_POINT_K = 1.0 / 1.8;
    /** ±1 °F coil temperature (clamp-on or surface probe). */
    public static final double COIL_K = 1.0 / 1.8;
    /** ±10 % of reading, airflow. */
    public static final double AIRFLOW_FRACTION = 0.10;
    /** ±2 % of the volume caught (graduated cylinder). */
    public static final double CONDENSATE_FRACTION = 0.02;
    /** ±5 s on a stopwatch-timed catch (common practice, no source). */
    public static final double CONDENSATE_TIMING_S = 5.0;

    /**
     * ±5 %-points on the outdoor-air share of the airflow (a flow-hood ratio or a damper setting
     * read by eye; common practice, no source).
     */
    public static final double OUTDOOR_FRACTION = 0.05;

    private Tolerances() {
    }

    /** Default tolerance of a humidity reading of {@code kind}, SI. */
    public static double humidity(HumidityKind kind) {
        switch (kind) {
            case WET_BULB: return WET_BULB_K;
            case RELATIVE_HUMIDITY: return RELATIVE_HUMIDITY_PCT;
            case DEW_POINT: return DEW_POINT_K;
            default: throw new IllegalStateException(kind.name());
        }
    }
}
