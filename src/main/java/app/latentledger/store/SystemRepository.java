package app.latentledger.store;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.SystemType;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Systems at sites. */
public final class SystemRepository {
    private final Database db;

    SystemRepository(Database db) {
        this.db = db;
    }

    /** Saves a new or changed system; refuses one whose site is not in the ledger. */
    public void save(HvacSystem s) {
        db.write(c -> {
            if (SiteRepository.find(c, s.siteId()).isEmpty()) {
                throw new InvalidRecordException("system site", "no site with id " + s.siteId() + " in this ledger");
            }
            Optional<HvacSystem> before = find(c, s.id());
            if (before.isPresent() && !before.get().siteId().equals(s.siteId()) && hasVisits(c, s.id())) {
                // its visits are at the old site: moving the system would split them from it
                throw new InvalidRecordException("system site", "system " + s.id() + " has visits at site "
                        + before.get().siteId() + "; it cannot move to another site");
            }
            try (PreparedStatement p = c.prepareStatement("INSERT INTO hvac_system (id, site_id, label, type,"
                    + " nominal_capacity_w, refrigerant, blower_type, fan_setting, thermostat_notes, metering_device,"
                    + " filter) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) ON CONFLICT (id) DO UPDATE SET"
                    + " site_id = excluded.site_id,"
                    + " label = excluded.label, type = excluded.type, nominal_capacity_w = excluded.nominal_capacity_w,"
                    + " refrigerant = excluded.refrigerant, blower_type = excluded.blower_type,"
                    + " fan_setting = excluded.fan_setting, thermostat_notes = excluded.thermostat_notes,"
                    + " metering_device = excluded.metering_device, filter = excluded.filter")) {
                p.setString(1, s.id());
                p.setString(2, s.siteId());
                p.setString(3, s.label());
                p.setString(4, s.type().key());
                p.setDouble(5, s.nominalCapacityW());
                p.setString(6, s.refrigerant());
                p.setString(7, s.blowerType());
                p.setString(8, s.fanSetting());
                p.setString(9, s.thermostatNotes());
                p.setString(10, s.meteringDevice());
                p.setString(11, s.filter());
                p.executeUpdate();
            }
            return null;
        });
    }

    private static boolean hasVisits(Connection c, String systemId) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("SELECT 1 FROM visit WHERE system_id = ? LIMIT 1")) {
            p.setString(1, systemId);
            try (ResultSet r = p.executeQuery()) {
                return r.next();
            }
        }
    }

    public Optional<HvacSystem> find(String id) {
        return db.read(c -> find(c, id));
    }

    static Optional<HvacSystem> find(Connection c, String id) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("SELECT * FROM hvac_system WHERE id = ?")) {
            p.setString(1, id);
            try (ResultSet r = p.executeQuery()) {
                return r.next() ? Optional.of(map(r)) : Optional.empty();
            }
        }
    }

    public List<HvacSystem> forSite(String siteId) {
        return db.read(c -> {
            List<HvacSystem> out = new ArrayList<>();
            try (PreparedStatement p = c.prepareStatement("SELECT * FROM hvac_system WHERE site_id = ? ORDER BY label, id")) {
                p.setString(1, siteId);
                try (ResultSet r = p.executeQuery()) {
                    while (r.next()) {
                        out.add(map(r));
                    }
                }
            }
            return out;
        });
    }

    private static HvacSystem map(ResultSet r) throws SQLException {
        return new HvacSystem(r.getString("id"), r.getString("site_id"), r.getString("label"),
                SystemType.parse("system type", r.getString("type")), r.getDouble("nominal_capacity_w"),
                r.getString("refrigerant"), r.getString("blower_type"), r.getString("fan_setting"),
                r.getString("thermostat_notes"), r.getString("metering_device"), r.getString("filter"));
    }
}
