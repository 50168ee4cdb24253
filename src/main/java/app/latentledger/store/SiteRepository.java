package app.latentledger.store;

import app.latentledger.core.records.Site;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Sites: saved (new or changed) and read back. */
public final class SiteRepository {
    private final Database db;

    SiteRepository(Database db) {
        this.db = db;
    }

    /** Saves a new site or the new state of an existing one, in one transaction. */
    public void save(Site s) {
        db.write(c -> {
            try (PreparedStatement p = c.prepareStatement("INSERT INTO site (id, name, address, elevation_m, notes, time_zone)"
                    + " VALUES (?, ?, ?, ?, ?, ?) ON CONFLICT (id) DO UPDATE SET name = excluded.name,"
                    + " address = excluded.address, elevation_m = excluded.elevation_m, notes = excluded.notes,"
                    + " time_zone = excluded.time_zone")) {
                p.setString(1, s.id());
                p.setString(2, s.name());
                p.setString(3, s.address());
                p.setDouble(4, s.elevationM());
                p.setString(5, s.notes());
                // NULL, not "", for a site without a zone, as every site kept before V11 has
                p.setString(6, s.timeZone().isEmpty() ? null : s.timeZone());
                p.executeUpdate();
            }
            return null;
        });
    }

    public Optional<Site> find(String id) {
        return db.read(c -> find(c, id));
    }

    static Optional<Site> find(Connection c, String id) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("SELECT * FROM site WHERE id = ?")) {
            p.setString(1, id);
            try (ResultSet r = p.executeQuery()) {
                return r.next() ? Optional.of(map(r)) : Optional.empty();
            }
        }
    }

    /** All sites by name. */
    public List<Site> all() {
        return db.read(c -> {
            List<Site> out = new ArrayList<>();
            try (PreparedStatement p = c.prepareStatement("SELECT * FROM site ORDER BY name, id");
                 ResultSet r = p.executeQuery()) {
                while (r.next()) {
                    out.add(map(r));
                }
            }
            return out;
        });
    }

    private static Site map(ResultSet r) throws SQLException {
        return new Site(r.getString("id"), r.getString("name"), r.getString("address"),
                r.getDouble("elevation_m"), r.getString("notes"), r.getString("time_zone"));
    }
}
