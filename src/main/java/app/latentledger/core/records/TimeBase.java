package app.latentledger.core.records;

/** What a log's sample times count from. */
public enum TimeBase {
    /** Milliseconds since 1970-01-01T00:00Z: the file had date-times. */
    EPOCH,
    /** Milliseconds since the first sample: the file had only elapsed seconds. */
    ELAPSED;

    public String key() {
        return Check.key(this);
    }

    public static TimeBase parse(String field, String key) {
        return Check.choice(field, TimeBase.class, key);
    }
}
