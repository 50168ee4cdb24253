package app.latentledger.core.records;

/** Where a coil temperature came from. */
public enum CoilTemperatureKind {
    /** A probe on the fins or tubes of the coil. */
    COIL_SURFACE,
    /** Saturation temperature from the suction pressure (certified technicians only). */
    EVAPORATOR_SATURATION;

    public String key() {
        return Check.key(this);
    }

    public static CoilTemperatureKind parse(String field, String key) {
        return Check.choice(field, CoilTemperatureKind.class, key);
    }
}
