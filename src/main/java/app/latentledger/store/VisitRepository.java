package app.latentledger.store;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPurpose;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Visits, newest first in lists. */
public final class VisitRepository {
    private final Database db;

    VisitRepository(Database db) {
        this.db = db;
    }

    /** Saves a new or changed visit; its site and system must exist and the system must be at that site. */
    public void save(Visit v) {
        db.write(c -> {
            if (SiteRepository.find(c, v.siteId()).isEmpty()) {
                throw new InvalidRecordException("visit site", "no site with id " + v.siteId() + " in this ledger");
            }
            Optional<HvacSystem> system = SystemRepository.find(c, v.systemId());
            if (system.isEmpty()) {
                throw new InvalidRecordException("visit system", "no system with id " + v.systemId() + " in this ledger");
            }
            if (!system.get().siteId().equals(v.siteId())) {
                throw new InvalidRecordException("visit system", "system " + v.systemId() + " is at site "
                        + system.get().siteId() + ", not at " + v.siteId());
            }
            try (PreparedStatement p = c.prepareStatement("INSERT INTO visit (id, site_id, system_id, started_at,"
                    + " started_epoch_s, technician, purpose, notes) VALUES (?, ?, ?, ?, ?, ?, ?, ?)"
                    + " ON CONFLICT (id) DO UPDATE SET site_id = excluded.site_id, system_id = excluded.system_id,"
                    + " started_at = excluded.started_at, started_epoch_s = excluded.started_epoch_s,"
                    + " technician = excluded.technician, purpose = excluded.purpose, notes = excluded.notes")) {
                p.setString(1, v.id());
                p.setString(2, v.siteId());
                p.setString(3, v.systemId());
                p.setString(4, Sql.time(v.startedAt()));
                p.setLong(5, v.startedAt().toEpochSecond());
                p.setString(6, v.technician());
                p.setString(7, v.purpose().key());
                p.setString(8, v.notes());
                p.executeUpdate();
            }
            return null;
        });
    }

    public Optional<Visit> find(String id) {
        return db.read(c -> find(c, id));
    }

    static Optional<Visit> find(Connection c, String id) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("SELECT * FROM visit WHERE id = ?")) {
            p.setString(1, id);
            try (ResultSet r = p.executeQuery()) {
                return r.next() ? Optional.of(map(r)) : Optional.empty();
            }
        }
    }

    /** Visits whose id starts with {@code prefix} (so a tech can type the first few characters). */
    public List<Visit> withIdPrefix(String prefix) {
        return query("SELECT * FROM visit WHERE substr(id, 1, length(?1)) = ?1 ORDER BY started_epoch_s DESC, id", prefix);
    }

    /** Every visit, newest first. */
    public List<Visit> all() {
        return query("SELECT * FROM visit ORDER BY started_epoch_s DESC, id", null);
    }

    public List<Visit> forSite(String siteId) {
        return query("SELECT * FROM visit WHERE site_id = ?1 ORDER BY started_epoch_s DESC, id", siteId);
    }

    private List<Visit> query(String sql, String parameter) {
        return db.read(c -> {
            List<Visit> out = new ArrayList<>();
            try (PreparedStatement p = c.prepareStatement(sql)) {
                if (parameter != null) {
                    p.setString(1, parameter);
                }
                try (ResultSet r = p.executeQuery()) {
                    while (r.next()) {
                        out.add(map(r));
                    }
                }
            }
            return out;
        });
    }

    private static Visit map(ResultSet r) throws SQLException {
        return new Visit(r.getString("id"), r.getString("site_id"), r.getString("system_id"),
                Sql.time(r, "started_at"), r.getString("technician"),
                VisitPurpose.parse("visit purpose", r.getString("purpose")), r.getString("notes"));
    }
}
