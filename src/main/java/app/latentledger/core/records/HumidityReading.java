package app.latentledger.core.records;

import app.latentledger.core.measure.HumidityKind;

/**
 * One humidity reading paired with a dry bulb: a wet bulb or dew point in °C, or an RH in %.
 *
 * @param kind  what was read
 * @param value the reading and its tolerance (K for temperatures, %RH for RH)
 */
public record HumidityReading(HumidityKind kind, Measurement value) {
    public HumidityReading {
        Check.present("humidity kind", kind);
        Check.present("humidity value", value);
    }

    /** Range checks in the words of one position, e.g. "return". */
    HumidityReading checked(String where) {
        String field = where + " " + kind.key().replace('-', ' ');
        value.within(field, kind.limit(), kind.toleranceLimit().maxSi());
        return this;
    }
}
