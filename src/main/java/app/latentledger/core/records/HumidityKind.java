package app.latentledger.core.records;

/** Which humidity reading the instrument gave; the store keeps what was read, not a conversion. */
public enum HumidityKind {
    /** Wet-bulb temperature, °C. */
    WET_BULB,
    /** Relative humidity, %. */
    RH,
    /** Dew-point temperature, °C. */
    DEW_POINT;

    public String key() {
        return Check.key(this);
    }

    public static HumidityKind parse(String field, String key) {
        return Check.choice(field, HumidityKind.class, key);
    }
}
