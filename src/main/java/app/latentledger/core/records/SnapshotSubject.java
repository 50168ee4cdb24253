package app.latentledger.core.records;

/** What a results snapshot was computed from. */
public enum SnapshotSubject {
    READING_SET, LOG;

    public String key() {
        return Check.key(this);
    }

    public static SnapshotSubject parse(String field, String key) {
        return Check.choice(field, SnapshotSubject.class, key);
    }
}
