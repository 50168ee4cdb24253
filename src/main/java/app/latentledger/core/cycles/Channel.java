package app.latentledger.core.cycles;

import app.latentledger.core.units.Quantity;

/**
 * What a logger column measures, with the field name of the project's generic log layout.
 * Analog channels are stored in SI (°C, % RH); status channels as 0/1.
 */
public enum Channel {
    RETURN_DB("return_db", Quantity.TEMPERATURE, "return dry bulb"),
    RETURN_RH("return_rh", Quantity.RELATIVE_HUMIDITY, "return relative humidity"),
    RETURN_WB("return_wb", Quantity.TEMPERATURE, "return wet bulb"),
    SUPPLY_DB("supply_db", Quantity.TEMPERATURE, "supply dry bulb"),
    SUPPLY_RH("supply_rh", Quantity.RELATIVE_HUMIDITY, "supply relative humidity"),
    SUPPLY_WB("supply_wb", Quantity.TEMPERATURE, "supply wet bulb"),
    COIL_TEMP("coil_temp", Quantity.TEMPERATURE, "coil temperature"),
    OUTDOOR_DB("outdoor_db", Quantity.TEMPERATURE, "outdoor dry bulb"),
    OUTDOOR_RH("outdoor_rh", Quantity.RELATIVE_HUMIDITY, "outdoor relative humidity"),
    /** Compressor (Y) status, 1 = running. */
    COMPRESSOR("compressor", null, "compressor status"),
    /** Blower (G) status, 1 = running. */
    FAN("fan", null, "blower status");

    private final String field;
    private final Quantity quantity;
    private final String label;

    Channel(String field, Quantity quantity, String label) {
        this.field = field;
        this.quantity = quantity;
        this.label = label;
    }

    /** Column name in the generic layout, e.g. "return_db". */
    public String field() {
        return field;
    }

    /** Unit of an analog channel; null for a status channel. */
    public Quantity quantity() {
        return quantity;
    }

    public String label() {
        return label;
    }

    public boolean isStatus() {
        return quantity == null;
    }

    public boolean isTemperature() {
        return quantity == Quantity.TEMPERATURE;
    }

    /** The channel for a generic-layout field name, or null. */
    public static Channel ofField(String field) {
        for (Channel c : values()) {
            if (c.field.equals(field)) {
                return c;
            }
        }
        return null;
    }
}
