package app.latentledger.core.settings;

import app.latentledger.core.coil.Tolerances;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;

/**
 * The ± half-widths a tech's instruments are taken to have when a reading gives none; the coil
 * check uses them as its defaults. Temperatures in K, RH in %-points, airflow and condensate as a
 * fraction of the reading.
 *
 * @param dryBulbK            dry-bulb probe
 * @param relativeHumidityPct RH probe, %-points
 * @param wetBulbK            wet bulb (psychrometer)
 * @param dewPointK           dew-point meter
 * @param coilK               coil or line temperature probe
 * @param airflowFraction     airflow instrument, fraction of reading
 * @param condensateFraction  condensate volume caught, fraction of reading
 */
public record InstrumentTolerances(double dryBulbK, double relativeHumidityPct, double wetBulbK, double dewPointK,
                                   double coilK, double airflowFraction, double condensateFraction) {
    /** The defaults of {@link Tolerances}, the one table (docs/methods.md, "Default instrument tolerances"). */
    public static final InstrumentTolerances DEFAULTS = new InstrumentTolerances(Tolerances.DRY_BULB_K,
            Tolerances.RELATIVE_HUMIDITY_PCT, Tolerances.WET_BULB_K, Tolerances.DEW_POINT_K, Tolerances.COIL_K,
            Tolerances.AIRFLOW_FRACTION, Tolerances.CONDENSATE_FRACTION);

    /** The tolerance a fresh humidity reading of {@code kind} gets, SI (K, or %-points of RH). */
    public double humidity(HumidityKind kind) {
        return switch (kind) {
            case WET_BULB -> wetBulbK;
            case RELATIVE_HUMIDITY -> relativeHumidityPct;
            case DEW_POINT -> dewPointK;
        };
    }

    /**
     * The tolerance a humidity reading of {@code kind} with value {@code valueSi} gets when the tech
     * types none: {@link #humidity(HumidityKind)}, and for RH outside 10–90 % one %-point more
     * ({@link Tolerances#relativeHumidityPct}: capacitive sensors are slower and less sure near
     * saturation, where a supply probe reads). The one rule the app's pad and {@code coil} share.
     */
    public double humidity(HumidityKind kind, double valueSi) {
        return kind == HumidityKind.RELATIVE_HUMIDITY ? Tolerances.relativeHumidityPct(valueSi, relativeHumidityPct)
                : humidity(kind);
    }

    /**
     * The tolerance a fresh coil temperature of {@code kind} gets, K: the surface probe's from these
     * settings, a gauge saturation reading's from the one table ({@link Tolerances#coil}).
     */
    public double coil(CoilTemperatureKind kind) {
        return Tolerances.coil(kind, coilK);
    }
}
