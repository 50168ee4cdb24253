package app.latentledger.core.records;

import app.latentledger.core.psychro.InputLimits;
import app.latentledger.core.units.Quantity;

/**
 * One humidity reading paired with a dry bulb: a wet bulb or dew point in °C, or an RH in %.
 *
 * @param kind  what was read
 * @param value the reading and its tolerance (K for temperatures, %RH for RH)
 */
public record HumidityReading(HumidityKind kind, Measurement value) {
    /** Widest believable tolerance: 10 K on a temperature, 20 %RH (common practice, no source). */
    static final double MAX_TEMPERATURE_TOLERANCE_K = 10;
    static final double MAX_RH_TOLERANCE_PCT = 20;

    public HumidityReading {
        Check.present("humidity kind", kind);
        Check.present("humidity value", value);
    }

    /** Range checks in the words of one position, e.g. "return". */
    HumidityReading checked(String where) {
        String field = where + " " + kind.key().replace('-', ' ');
        if (kind == HumidityKind.RH) {
            value.within(field, Quantity.RELATIVE_HUMIDITY, 0, 100, MAX_RH_TOLERANCE_PCT);
        } else {
            value.within(field, Quantity.TEMPERATURE, InputLimits.MIN_TEMP_C, InputLimits.MAX_TEMP_C,
                    MAX_TEMPERATURE_TOLERANCE_K);
        }
        return this;
    }
}
