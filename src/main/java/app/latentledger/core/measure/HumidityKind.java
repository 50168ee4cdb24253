package app.latentledger.core.measure;

import app.latentledger.core.units.Quantity;

/**
 * Which humidity reading a tech took beside the dry bulb at one point of the air stream. The store
 * keeps what was read (by {@link #key()}), never a conversion.
 */
public enum HumidityKind {
    /** Thermodynamic (aspirated psychrometer) wet bulb, °C inside. */
    WET_BULB("wet-bulb", "wet bulb", Quantity.TEMPERATURE),
    /** Relative humidity from a capacitive sensor, %. */
    RELATIVE_HUMIDITY("rh", "relative humidity", Quantity.RELATIVE_HUMIDITY),
    /** Dew point from a dew-point meter or chilled mirror, °C inside. */
    DEW_POINT("dew-point", "dew point", Quantity.TEMPERATURE);

    private final String key;
    private final String label;
    private final Quantity quantity;

    HumidityKind(String key, String label, Quantity quantity) {
        this.key = key;
        this.label = label;
        this.quantity = quantity;
    }

    /** Stable key: stored records, bundles, the draft file ("wet-bulb" | "rh" | "dew-point"). */
    public String key() {
        return key;
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

    /** The accepted range of the reading (a wet bulb or dew point is further held at or below its dry bulb). */
    public FieldLimits.Limit limit() {
        return this == RELATIVE_HUMIDITY ? FieldLimits.RELATIVE_HUMIDITY : FieldLimits.AIR_TEMPERATURE;
    }

    /** The accepted range of its tolerance. */
    public FieldLimits.Limit toleranceLimit() {
        return this == RELATIVE_HUMIDITY ? FieldLimits.RELATIVE_HUMIDITY_TOLERANCE : FieldLimits.TEMPERATURE_TOLERANCE;
    }

    /** The kind for {@code key}; refuses anything else naming {@code field} and the choices. */
    public static HumidityKind parse(String field, String key) {
        return Choices.parse(field, HumidityKind.class, key, HumidityKind::key);
    }
}
