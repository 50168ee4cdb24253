package app.latentledger.core.coil;

import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;

/**
 * The one table of default instrument tolerances, for the app, the command line and the field
 * guide: each the ± half-width the instrument's stated accuracy gives for typical field kit, read
 * as a rectangular distribution. All overridable per reading and in the settings. Where a value
 * comes from is in docs/methods.md, "Default instrument tolerances".
 */
public final class Tolerances {
    /** ±0.5 °F dry bulb (thermistor or RTD probe; common practice, no source). */
    public static final double DRY_BULB_K = 0.5 / 1.8;
    /** ±2 %RH: capacitive polymer sensor between 10 and 90 % RH (common practice, no source). */
    public static final double RELATIVE_HUMIDITY_PCT = 2.0;
    /** ±3 %RH: the same sensors outside 10–90 % RH, where they are slower and less sure. */
    public static final double RELATIVE_HUMIDITY_EXTREME_PCT = 3.0;
    /** ±0.5 °F wet bulb (aspirated psychrometer; ASTM E337 puts ±2–3 % RH on db and depression within ±0.2 °C). */
    public static final double WET_BULB_K = 0.5 / 1.8;
    /** ±1 °F dew point (field dew-point meter; common practice, no source). */
    public static final double DEW_POINT_K = 1.0 / 1.8;
    /** ±1 °F coil surface probe (common practice, no source). */
    public static final double COIL_K = 1.0 / 1.8;
    /**
     * ±1.8 °F evaporator saturation: a ±3.5 psi suction gauge (California Title 24 Part 6 RA3.2.2.2,
     * 2013) at about 2 psi/°F for R-410A near 40 °F.
     */
    public static final double EVAPORATOR_SATURATION_K = 1.8 / 1.8;
    /** ±10 % of reading, airflow (California Title 24 Part 6 RA3.7.2.2, 2013: airflow instruments ±10 %). */
    public static final double AIRFLOW_FRACTION = 0.10;
    /** ±2 % of the volume caught (graduated cylinder ±1–2 %; common practice, no source). */
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

    /**
     * An RH sensor's default tolerance at its reading: ±2 % RH inside 10–90 %, ±3 % RH outside,
     * given the tolerance {@code inBand} the tech's settings hold for the inside of the band.
     */
    public static double relativeHumidityPct(double readingPct, double inBand) {
        boolean extreme = readingPct < 10 || readingPct > 90;
        return extreme ? Math.max(inBand, inBand + (RELATIVE_HUMIDITY_EXTREME_PCT - RELATIVE_HUMIDITY_PCT)) : inBand;
    }

    /** Default tolerance of a coil temperature of {@code kind}, K, given the settings' surface-probe tolerance. */
    public static double coil(CoilTemperatureKind kind, double surfaceProbeK) {
        return kind == CoilTemperatureKind.EVAPORATOR_SATURATION ? EVAPORATOR_SATURATION_K : surfaceProbeK;
    }
}
