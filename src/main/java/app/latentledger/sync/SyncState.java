package app.latentledger.sync;

import app.latentledger.core.records.Timestamps;
import app.latentledger.store.Database;
import app.latentledger.sync.wire.Refusal;
import app.latentledger.sync.wire.SyncKind;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The tablet's side of the sync kept in the ledger (schema V10): account, cursor, per-record state, history. */
public final class SyncState {
    private final Database db;

    public SyncState(Database db) {
        this.db = db;
    }

    /** A record's agreed state with the server. */
    public record Row(SyncKind kind, String id, String syncedHash, String serverRevision, boolean samplesDone,
                      String refusedHash, Refusal refusal) {
    }

    /** How the last sync went. */
    public record LastSync(OffsetDateTime at, String outcome, String message) {
    }

    /** One revision seen from the server (or one of ours another revision outlived). */
    public record Revision(SyncKind kind, String id, String revision, String hash, String editedAt, String device,
                           String author, boolean deleted, String body, boolean applied, String note) {
    }

    public Optional<OfficeAccount> account() {
        return db.read(c -> {
            try (PreparedStatement p = c.prepareStatement("SELECT * FROM office_account WHERE id = 1");
                 ResultSet r = p.executeQuery()) {
                if (!r.next()) {
                    return Optional.empty();
                }
                return Optional.of(new OfficeAccount(r.getString("server_url"), r.getString("device_id"),
                        r.getString("device_name"), r.getString("company"), r.getString("technician"),
                        r.getString("role"), OffsetDateTime.parse(r.getString("enrolled_at"))));
            }
        });
    }

    /**
     * Keeps a new account and starts afresh: cursor 0 and no agreed hashes, so the first sync
     * offers every record (the server answers {@code unchanged} for any it already holds).
     */
    public void enrol(OfficeAccount a) {
        db.write(c -> {
            exec(c, "DELETE FROM office_account");
            exec(c, "DELETE FROM sync_record");
            try (PreparedStatement p = c.prepareStatement("INSERT INTO office_account (id, server_url, device_id,"
                    + " device_name, company, technician, role, enrolled_at) VALUES (1, ?, ?, ?, ?, ?, ?, ?)")) {
                p.setString(1, a.serverUrl());
                p.setString(2, a.deviceId());
                p.setString(3, a.deviceName());
                p.setString(4, a.company());
                p.setString(5, a.technician());
                p.setString(6, a.role());
                p.setString(7, Timestamps.text(a.enrolledAt()));
                p.executeUpdate();
            }
            return null;
        });
    }

    public String cursor() {
        return db.read(c -> {
            try (PreparedStatement p = c.prepareStatement("SELECT pull_cursor FROM office_account WHERE id = 1");
                 ResultSet r = p.executeQuery()) {
                return r.next() ? r.getString(1) : "0";
            }
        });
    }

    /** Stores the cursor; call inside the transaction that applied the page it ends. */
    void setCursor(Connection c, String cursor) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("UPDATE office_account SET pull_cursor = ? WHERE id = 1")) {
            p.setString(1, cursor);
            p.executeUpdate();
        }
    }

    public Optional<LastSync> lastSync() {
        return db.read(c -> {
            try (PreparedStatement p = c.prepareStatement(
                    "SELECT last_sync_at, last_outcome, last_message FROM office_account WHERE id = 1");
                 ResultSet r = p.executeQuery()) {
                if (!r.next() || r.getString(1) == null) {
                    return Optional.empty();
                }
                return Optional.of(new LastSync(OffsetDateTime.parse(r.getString(1)), r.getString(2), r.getString(3)));
            }
        });
    }

    void recordOutcome(OffsetDateTime at, String outcome, String message) {
        db.write(c -> {
            try (PreparedStatement p = c.prepareStatement("UPDATE office_account SET last_sync_at = ?, last_outcome = ?,"
                    + " last_message = ? WHERE id = 1")) {
                p.setString(1, Timestamps.text(at));
                p.setString(2, outcome);
                p.setString(3, message);
                p.executeUpdate();
            }
            return null;
        });
    }

    /** Every record's agreed state, by kind and id. */
    public Map<String, Row> rows() {
        return db.read(c -> {
            Map<String, Row> out = new HashMap<>();
            try (PreparedStatement p = c.prepareStatement("SELECT * FROM sync_record"); ResultSet r = p.executeQuery()) {
                while (r.next()) {
                    Row row = row(r);
                    out.put(key(row.kind(), row.id()), row);
                }
            }
            return out;
        });
    }

    Optional<Row> row(Connection c, SyncKind kind, String id) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("SELECT * FROM sync_record WHERE kind = ? AND record_id = ?")) {
            p.setString(1, kind.wire());
            p.setString(2, id);
            try (ResultSet r = p.executeQuery()) {
                return r.next() ? Optional.of(row(r)) : Optional.empty();
            }
        }
    }

    private static Row row(ResultSet r) throws SQLException {
        String field = r.getString("refused_field");
        Refusal refusal = field == null ? null : new Refusal(field, r.getString("refused_value"),
                r.getString("refused_range"), r.getString("refused_message"));
        return new Row(SyncKind.fromWire(r.getString("kind")), r.getString("record_id"), r.getString("synced_hash"),
                r.getString("server_revision"), r.getInt("samples_done") == 1, r.getString("refused_hash"), refusal);
    }

    static String key(SyncKind kind, String id) {
        return kind.wire() + "/" + id;
    }

    /** The server holds {@code hash} as this record's revision; any earlier refusal is over. */
    void synced(SyncKind kind, String id, String hash, String revision, boolean samplesDone) {
        db.write(c -> {
            synced(c, kind, id, hash, revision, samplesDone);
            return null;
        });
    }

    void synced(Connection c, SyncKind kind, String id, String hash, String revision, boolean samplesDone)
            throws SQLException {
        try (PreparedStatement p = c.prepareStatement("INSERT INTO sync_record (kind, record_id, synced_hash,"
                + " server_revision, synced_at, samples_done) VALUES (?, ?, ?, ?, ?, ?)"
                + " ON CONFLICT (kind, record_id) DO UPDATE SET synced_hash = excluded.synced_hash,"
                + " server_revision = COALESCE(excluded.server_revision, server_revision),"
                + " synced_at = excluded.synced_at, samples_done = excluded.samples_done, refused_hash = NULL,"
                + " refused_field = NULL, refused_value = NULL, refused_range = NULL, refused_message = NULL")) {
            p.setString(1, kind.wire());
            p.setString(2, id);
            p.setString(3, hash);
            p.setString(4, revision);
            p.setString(5, Timestamps.text(OffsetDateTime.now()));
            p.setInt(6, samplesDone ? 1 : 0);
            p.executeUpdate();
        }
    }

    void samplesDone(SyncKind kind, String id) {
        db.write(c -> {
            try (PreparedStatement p = c.prepareStatement(
                    "UPDATE sync_record SET samples_done = 1 WHERE kind = ? AND record_id = ?")) {
                p.setString(1, kind.wire());
                p.setString(2, id);
                p.executeUpdate();
            }
            return null;
        });
    }

    /** The server refused {@code hash} of this record; it stays waiting, and the refusal is shown. */
    void refused(SyncKind kind, String id, String hash, Refusal r) {
        db.write(c -> {
            try (PreparedStatement p = c.prepareStatement("INSERT INTO sync_record (kind, record_id, refused_hash,"
                    + " refused_field, refused_value, refused_range, refused_message) VALUES (?, ?, ?, ?, ?, ?, ?)"
                    + " ON CONFLICT (kind, record_id) DO UPDATE SET refused_hash = excluded.refused_hash,"
                    + " refused_field = excluded.refused_field, refused_value = excluded.refused_value,"
                    + " refused_range = excluded.refused_range, refused_message = excluded.refused_message")) {
                p.setString(1, kind.wire());
                p.setString(2, id);
                p.setString(3, hash);
                p.setString(4, r.field());
                p.setString(5, r.value());
                p.setString(6, r.range());
                p.setString(7, r.message());
                p.executeUpdate();
            }
            return null;
        });
    }

    void addRevision(Connection c, Revision v) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("INSERT INTO sync_revision (kind, record_id, revision, hash,"
                + " edited_at, device, author, deleted, body, seen_at, applied, note)"
                + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) ON CONFLICT (kind, record_id, revision) DO UPDATE SET"
                + " applied = MAX(applied, excluded.applied), note = excluded.note")) {
            p.setString(1, v.kind().wire());
            p.setString(2, v.id());
            p.setString(3, v.revision());
            p.setString(4, v.hash());
            p.setString(5, v.editedAt());
            p.setString(6, v.device());
            p.setString(7, v.author());
            p.setInt(8, v.deleted() ? 1 : 0);
            p.setString(9, v.body());
            p.setString(10, Timestamps.text(OffsetDateTime.now()));
            p.setInt(11, v.applied() ? 1 : 0);
            p.setString(12, v.note());
            p.executeUpdate();
        }
    }

    void addRevision(Revision v) {
        db.write(c -> {
            addRevision(c, v);
            return null;
        });
    }

    /** The revisions kept of one record, newest seen first. */
    public List<Revision> history(SyncKind kind, String id) {
        return revisions("SELECT * FROM sync_revision WHERE kind = ? AND record_id = ? ORDER BY seen_at DESC, rowid DESC",
                kind.wire(), id);
    }

    /** Pulled revisions not put into the ledger because their log samples were not complete yet. */
    List<Revision> waitingForSamples() {
        return revisions("SELECT * FROM sync_revision WHERE applied = 0 AND note = ? ORDER BY rowid", NOTE_SAMPLES);
    }

    /** A later revision of the record was put into the ledger: earlier ones waiting for samples wait no more. */
    void supersede(Connection c, SyncKind kind, String id) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("UPDATE sync_revision SET note = 'superseded by a later revision'"
                + " WHERE kind = ? AND record_id = ? AND applied = 0 AND note = ?")) {
            p.setString(1, kind.wire());
            p.setString(2, id);
            p.setString(3, NOTE_SAMPLES);
            p.executeUpdate();
        }
    }

    static final String NOTE_SAMPLES = "log samples not complete on the server yet";

    private List<Revision> revisions(String sql, String... parameters) {
        return db.read(c -> {
            List<Revision> out = new ArrayList<>();
            try (PreparedStatement p = c.prepareStatement(sql)) {
                for (int i = 0; i < parameters.length; i++) {
                    p.setString(i + 1, parameters[i]);
                }
                try (ResultSet r = p.executeQuery()) {
                    while (r.next()) {
                        out.add(new Revision(SyncKind.fromWire(r.getString("kind")), r.getString("record_id"),
                                r.getString("revision"), r.getString("hash"), r.getString("edited_at"),
                                r.getString("device"), r.getString("author"), r.getInt("deleted") == 1,
                                r.getString("body"), r.getInt("applied") == 1, r.getString("note")));
                    }
                }
            }
            return out;
        });
    }

    private static void exec(Connection c, String sql) throws SQLException {
        try (PreparedStatement p = c.prepareStatement(sql)) {
            p.executeUpdate();
        }
    }
}
