package app.latentledger.core.coil;

import app.latentledger.core.units.Quantity;

/** Which humidity reading a tech took beside the dry bulb at one point of the air stream. */
public enum HumidityKind {
    /** Thermodynamic (aspirated psychrometer) wet bulb, °C inside. */
    WET_BULB("wet bulb", Quantity.TEMPERATURE),
    /** Relative humidity from a capacitive sensor, %. */
    RELATIVE_HUMIDITY("relative humidity", Quantity.RELATIVE_HUMIDITY),
    /** Dew point from a dew-point meter or chilled mirror, °C inside. */
    DEW_POINT("dew point", Quantity.TEMPERATURE);

    private final String label;
    private final Quantity quantity;

    HumidityKind(String label, Quantity quantity) {
        this.label = label;
        this.quantity = quantity;
    }

    /** What a tech calls the reading. */
    public String label() {
        return label;
    }

    /** How the reading is shown and typed. */
    public Quantity quantity() {
        return quantity;
    }

    /** How its tolerance is shown: temperatures as differences, RH in points of %. */
    public Quantity toleranceQuantity() {
        return this == RELATIVE_HUMIDITY ? Quantity.RELATIVE_HUMIDITY : Quantity.TEMPERATURE_DIFFERENCE;
    }
}
