package app.latentledger.core.records;

/** How the system's capacity steps: it decides how much latent removal to expect at part load. */
public enum SystemType {
    SINGLE_STAGE, TWO_STAGE, VARIABLE_CAPACITY;

    /** The word stored and typed: "single-stage", "two-stage", "variable-capacity". */
    public String key() {
        return Check.key(this);
    }

    public static SystemType parse(String field, String key) {
        return Check.choice(field, SystemType.class, key);
    }
}
