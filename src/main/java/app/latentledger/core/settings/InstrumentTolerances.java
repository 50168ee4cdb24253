package app.latentledger.core.settings;

import app.latentledger.core.coil.Tolerances;

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
    /** The defaults of {@link Tolerances} (docs/methods.md §9.1; Title 24 RA3.7.2.2 for airflow). */
    public static final InstrumentTolerances DEFAULTS = new InstrumentTolerances(Tolerances.DRY_BULB_K,
            Tolerances.RELATIVE_HUMIDITY_PCT, Tolerances.WET_BULB_K, Tolerances.DEW_POINT_K, Tolerances.COIL_K,
            Tolerances.AIRFLOW_FRACTION, Tolerances.CONDENSATE_FRACTION);
}
