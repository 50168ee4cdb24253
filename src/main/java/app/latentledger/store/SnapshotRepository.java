package app.latentledger.store;

import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.ResultsSnapshot;
import app.latentledger.core.records.SnapshotSubject;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Results snapshots: written once, never changed, so a report shows what it showed on the day. */
public final class SnapshotRepository {
    private final Database db;

    SnapshotRepository(Database db) {
        this.db = db;
    }

    /** Keeps a new snapshot; refuses to overwrite one with the same id but other content. */
    public void save(ResultsSnapshot s) {
        db.write(c -> {
            boolean subjectThere = s.subject() == SnapshotSubject.READING_SET
                    ? ReadingSetRepository.find(c, s.subjectId()).isPresent()
                    : exists(c, "SELECT 1 FROM imported_log WHERE id = ?", s.subjectId());
            if (!subjectThere) {
                throw new InvalidRecordException("snapshot " + s.subject().key(),
                        "no " + s.subject().key().replace('-', ' ') + " with id " + s.subjectId() + " in this ledger");
            }
            Optional<ResultsSnapshot> existing = find(c, s.id());
            if (existing.isPresent()) {
                if (!existing.get().equals(s)) {
                    throw new InvalidRecordException("snapshot id", "snapshot " + s.id()
                            + " is already stored with other content; snapshots are never changed");
                }
                return null;
            }
            try (PreparedStatement p = c.prepareStatement("INSERT INTO results_snapshot (id, reading_set_id, log_id,"
                    + " app_version, computed_at, json) VALUES (?, ?, ?, ?, ?, ?)")) {
                p.setString(1, s.id());
                Sql.setNullableText(p, 2, s.subject() == SnapshotSubject.READING_SET ? s.subjectId() : null);
                Sql.setNullableText(p, 3, s.subject() == SnapshotSubject.LOG ? s.subjectId() : null);
                p.setString(4, s.appVersion());
                p.setString(5, Sql.time(s.computedAt()));
                p.setString(6, s.json());
                p.executeUpdate();
            }
            return null;
        });
    }

    private static boolean exists(Connection c, String sql, String id) throws SQLException {
        try (PreparedStatement p = c.prepareStatement(sql)) {
            p.setString(1, id);
            try (ResultSet r = p.executeQuery()) {
                return r.next();
            }
        }
    }

    public Optional<ResultsSnapshot> find(String id) {
        return db.read(c -> find(c, id));
    }

    static Optional<ResultsSnapshot> find(Connection c, String id) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("SELECT * FROM results_snapshot WHERE id = ?")) {
            p.setString(1, id);
            try (ResultSet r = p.executeQuery()) {
                return r.next() ? Optional.of(map(r)) : Optional.empty();
            }
        }
    }

    /** Snapshots of one reading set or log, oldest first. */
    public List<ResultsSnapshot> forSubject(SnapshotSubject subject, String subjectId) {
        String column = subject == SnapshotSubject.READING_SET ? "reading_set_id" : "log_id";
        return db.read(c -> {
            List<ResultsSnapshot> out = new ArrayList<>();
            try (PreparedStatement p = c.prepareStatement(
                    "SELECT * FROM results_snapshot WHERE " + column + " = ? ORDER BY computed_at, id")) {
                p.setString(1, subjectId);
                try (ResultSet r = p.executeQuery()) {
                    while (r.next()) {
                        out.add(map(r));
                    }
                }
            }
            return out;
        });
    }

    private static ResultsSnapshot map(ResultSet r) throws SQLException {
        String readingSet = r.getString("reading_set_id");
        return new ResultsSnapshot(r.getString("id"),
                readingSet != null ? SnapshotSubject.READING_SET : SnapshotSubject.LOG,
                readingSet != null ? readingSet : r.getString("log_id"), r.getString("app_version"),
                Sql.time(r, "computed_at"), r.getString("json"));
    }
}
