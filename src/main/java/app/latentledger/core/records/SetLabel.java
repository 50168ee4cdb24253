package app.latentledger.core.records;

/**
 * What a reading set is in a before/after story: taken before the work, after it, or something
 * else (a check at another fan speed, a second look). Stored as the reading set's {@code label}
 * text ("before", "after", "other"); older sets may carry "" (no label) or the demo's words.
 */
public enum SetLabel {
    BEFORE, AFTER, OTHER;

    public String key() {
        return Check.key(this);
    }

    /** The label from its key, naming the choices when {@code key} is not one. */
    public static SetLabel parse(String field, String key) {
        return Check.choice(field, SetLabel.class, key);
    }
}
