package app.latentledger.sync.wire;

import com.google.gson.JsonObject;

import java.time.Instant;
import java.util.Objects;

/**
 * One record as the tablet and the office server exchange it.
 *
 * @param kind     what it is
 * @param id       the record's own id (for paperwork and house facts, the visit's)
 * @param hash     {@link WireHash#of} the body; for a deletion, of an empty object
 * @param baseHash the hash this edit was made from (the last one synced), or null for a new record
 * @param editedAt when the tablet last changed it
 * @param deleted  true when it was deleted (moved to the recycle bin)
 * @param body     the record's fields ({@link WireCodec}); null when deleted
 */
public record WireRecord(SyncKind kind, String id, String hash, String baseHash, Instant editedAt, boolean deleted,
                         JsonObject body) {
    public WireRecord {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(hash, "hash");
        Objects.requireNonNull(editedAt, "editedAt");
    }

    /** A live record with its hash computed from the body. */
    public static WireRecord of(SyncKind kind, String id, JsonObject body, String baseHash, Instant editedAt) {
        return new WireRecord(kind, id, WireHash.of(body), baseHash, editedAt, false, body);
    }

    /** A deletion: no body, the hash of an empty object. */
    public static WireRecord deletion(SyncKind kind, String id, String baseHash, Instant editedAt) {
        return new WireRecord(kind, id, WireHash.DELETED, baseHash, editedAt, true, null);
    }
}
