package app.latentledger.core.coil;

/** Which coil temperature a check compared with the dew point. */
public enum CoilTemperatureSource {
    /** A reading the tech took (its kind says whether the surface or the refrigerant saturation). */
    MEASURED("measured"),
    /**
     * The apparatus dew point worked out from the entering and leaving states: no independent coil
     * reading, the same two readings as the humidity-ratio drop.
     */
    APPARATUS_DEW_POINT("apparatus-dew-point"),
    /** Neither: none measured and no apparatus dew point. */
    NONE("none");

    private final String key;

    CoilTemperatureSource(String key) {
        this.key = key;
    }

    /** JSON key: "measured" | "apparatus-dew-point" | "none". */
    public String key() {
        return key;
    }
}
