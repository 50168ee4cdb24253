package app.latentledger.core.coil;

/**
 * What a measured coil temperature is. The two differ by several degrees (fin and air-film
 * resistance put the coil surface above the refrigerant), so the result always says which one
 * stood in for "the coil" (docs/methods.md §9.3, common practice, no source).
 */
public enum CoilTemperatureKind {
    /** A probe on the fins or tubes of the wet coil. */
    COIL_SURFACE("coil-surface", "coil surface temperature"),
    /** Evaporator (suction) saturation temperature from a certified technician's gauge reading. */
    EVAPORATOR_SATURATION("evaporator-saturation", "evaporator saturation temperature");

    private final String key;
    private final String label;

    CoilTemperatureKind(String key, String label) {
        this.key = key;
        this.label = label;
    }

    /** Stable key used on the command line and in JSON. */
    public String key() {
        return key;
    }

    public String label() {
        return label;
    }

    /** Parses a key ("coil-surface" | "evaporator-saturation"). */
    public static CoilTemperatureKind parse(String text) {
        for (CoilTemperatureKind k : values()) {
            if (k.key.equalsIgnoreCase(text == null ? "" : text.trim())) {
                return k;
            }
        }
        throw new IllegalArgumentException("coil temperature kind '" + text
                + "' not understood; accepted: coil-surface, evaporator-saturation");
    }
}
