package app.latentledger.core.records;

import app.latentledger.core.settings.InstrumentTolerances;
import app.latentledger.core.units.Quantity;

/**
 * What an instrument's maker states for its accuracy, as ± half-widths; each part is null when the
 * instrument does not measure that quantity or the tech did not type it. Temperatures in K, RH in
 * %-points, airflow as a fraction of the reading. The limits are those the coil check accepts for a
 * tolerance (10 K, 50 %-points, half the reading).
 *
 * @param dryBulbK            dry-bulb probe
 * @param relativeHumidityPct RH sensor
 * @param wetBulbK            wet bulb (psychrometer)
 * @param dewPointK           dew point
 * @param coilK               coil or line temperature probe
 * @param airflowFraction     airflow instrument
 */
public record StatedAccuracy(Double dryBulbK, Double relativeHumidityPct, Double wetBulbK, Double dewPointK,
                             Double coilK, Double airflowFraction) {
    /** Nothing stated: the settings' tolerances apply. */
    public static final StatedAccuracy NONE = new StatedAccuracy(null, null, null, null, null, null);

    public StatedAccuracy {
        optional("stated dry-bulb accuracy", Quantity.TEMPERATURE_DIFFERENCE, dryBulbK, 10);
        optional("stated RH accuracy", Quantity.RELATIVE_HUMIDITY, relativeHumidityPct, 50);
        optional("stated wet-bulb accuracy", Quantity.TEMPERATURE_DIFFERENCE, wetBulbK, 10);
        optional("stated dew-point accuracy", Quantity.TEMPERATURE_DIFFERENCE, dewPointK, 10);
        optional("stated coil-probe accuracy", Quantity.TEMPERATURE_DIFFERENCE, coilK, 10);
        optional("stated airflow accuracy", Quantity.FRACTION_PERCENT, airflowFraction, 0.5);
    }

    public boolean isEmpty() {
        return equals(NONE);
    }

    /**
     * {@code base} with every part this instrument states put in its place; a part stated by
     * {@code other} as well keeps the wider of the two, since a reading is only as good as the
     * worse instrument that could have taken it.
     */
    public StatedAccuracy combine(StatedAccuracy other) {
        return new StatedAccuracy(wider(dryBulbK, other.dryBulbK), wider(relativeHumidityPct, other.relativeHumidityPct),
                wider(wetBulbK, other.wetBulbK), wider(dewPointK, other.dewPointK), wider(coilK, other.coilK),
                wider(airflowFraction, other.airflowFraction));
    }

    /** The tolerances a reading set taken with this instrument gets: stated parts over {@code base}. */
    public InstrumentTolerances over(InstrumentTolerances base) {
        return new InstrumentTolerances(or(dryBulbK, base.dryBulbK()), or(relativeHumidityPct, base.relativeHumidityPct()),
                or(wetBulbK, base.wetBulbK()), or(dewPointK, base.dewPointK()), or(coilK, base.coilK()),
                or(airflowFraction, base.airflowFraction()), base.condensateFraction());
    }

    private static Double wider(Double a, Double b) {
        if (a == null) {
            return b;
        }
        return b == null ? a : Double.valueOf(Math.max(a, b));
    }

    private static double or(Double v, double fallback) {
        return v == null ? fallback : v;
    }

    private static void optional(String field, Quantity q, Double v, double max) {
        if (v != null) {
            // a stated accuracy of 0 would claim a perfect instrument
            Check.range(field, q, v, 1e-9, max);
        }
    }
}
