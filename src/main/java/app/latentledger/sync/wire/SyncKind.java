package app.latentledger.sync.wire;

import java.util.Locale;

/**
 * The kinds of record a tablet and the office server exchange, in the order parents come before
 * their children (a push and a page of changes list records in this order). Saved results
 * (snapshots) are not synced: the server computes them from the readings with the same core.
 */
public enum SyncKind {
    SITE, SYSTEM, VISIT, READINGS, LOG, INSTRUMENT, PAPERWORK, HOUSE;

    /** The word on the wire: {@code site}, {@code system}, … {@code house}. */
    public String wire() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The kind from its wire word; null when it is not one. */
    public static SyncKind fromWire(String word) {
        for (SyncKind k : values()) {
            if (k.wire().equals(word)) {
                return k;
            }
        }
        return null;
    }

    /** The wire words, for a message: "site, system, …, house". */
    public static String words() {
        StringBuilder b = new StringBuilder();
        for (SyncKind k : values()) {
            b.append(b.length() == 0 ? "" : ", ").append(k.wire());
        }
        return b.toString();
    }

    /** The body field that names this kind's parent ({@code siteId}, {@code systemId}, {@code visitId}), or null. */
    public String parentField() {
        return switch (this) {
            case SITE -> null;
            case SYSTEM, VISIT -> "siteId";
            case READINGS -> "visit_id";
            case LOG, INSTRUMENT, PAPERWORK, HOUSE -> "visitId";
        };
    }

    /** The body field that holds the record's own id ({@code id}; the visit for paperwork and house facts). */
    public String idField() {
        return switch (this) {
            case PAPERWORK, HOUSE -> "visitId";
            default -> "id";
        };
    }
}
