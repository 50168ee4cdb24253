package app.latentledger.core.records;

import app.latentledger.core.measure.CoilTemperatureKind;

/**
 * A measured coil temperature, °C, with its tolerance in K.
 *
 * @param kind  surface probe or evaporator saturation
 * @param value the reading
 */
public record CoilTemperature(CoilTemperatureKind kind, Measurement value) {
    public CoilTemperature {
        Check.present("coil temperature kind", kind);
        Check.present("coil temperature", value);
    }
}
