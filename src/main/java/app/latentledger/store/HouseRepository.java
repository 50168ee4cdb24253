package app.latentledger.store;

import app.latentledger.core.coil.AirReading;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.house.VentilationType;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.util.Optional;

/** A house's facts (with its site) and its readings (with a visit), each saved in one transaction. */
public final class HouseRepository {
    private static final String[] WHERE = {"outdoor", "grille", "plenum", "space"};

    private final Database db;

    HouseRepository(Database db) {
        this.db = db;
    }

    /** Saves the facts of the house at {@code siteId}, replacing any earlier ones. */
    public void saveFacts(String siteId, HouseFacts f) {
        db.write(c -> {
            try (PreparedStatement p = c.prepareStatement("INSERT OR REPLACE INTO house_facts (site_id, floor_area_m2,"
                    + " ceiling_height_m, stories, bedrooms, occupants, cfm50_m3_per_s, ach50, shelter_class,"
                    + " wind_m_per_s, ventilation_type, ventilation_m3_per_s, erv_latent_effectiveness)"
                    + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
                p.setString(1, siteId);
                p.setDouble(2, f.floorAreaM2());
                p.setDouble(3, f.ceilingHeightM());
                p.setInt(4, f.stories());
                p.setInt(5, f.bedrooms());
                p.setInt(6, f.occupants());
                real(p, 7, f.cfm50M3PerS());
                real(p, 8, f.ach50());
                p.setInt(9, f.shelterClass());
                real(p, 10, f.windMPerS());
                p.setString(11, f.ventilationType().key());
                p.setDouble(12, f.ventilationM3PerS());
                real(p, 13, f.ervLatentEffectiveness());
                p.executeUpdate();
            }
            return null;
        });
    }

    public Optional<HouseFacts> facts(String siteId) {
        return db.read(c -> {
            try (PreparedStatement p = c.prepareStatement("SELECT * FROM house_facts WHERE site_id = ?")) {
                p.setString(1, siteId);
                try (ResultSet r = p.executeQuery()) {
                    if (!r.next()) {
                        return Optional.empty();
                    }
                    return Optional.of(new HouseFacts(r.getDouble("floor_area_m2"), r.getDouble("ceiling_height_m"),
                            r.getInt("stories"), r.getInt("bedrooms"), r.getInt("occupants"), real(r, "cfm50_m3_per_s"),
                            real(r, "ach50"), r.getInt("shelter_class"), real(r, "wind_m_per_s"),
                            VentilationType.parse(r.getString("ventilation_type")), r.getDouble("ventilation_m3_per_s"),
                            real(r, "erv_latent_effectiveness")));
                }
            }
        });
    }

    /** Saves the house readings of {@code visitId}, replacing any earlier ones. */
    public void saveReadings(String visitId, HouseVisitReadings h) {
        db.write(c -> {
            StringBuilder cols = new StringBuilder("visit_id, runtime_fraction");
            StringBuilder marks = new StringBuilder("?, ?");
            for (String w : WHERE) {
                cols.append(", ").append(w).append("_db_c, ").append(w).append("_db_tol_k, ").append(w)
                        .append("_hum_kind, ").append(w).append("_hum_value, ").append(w).append("_hum_tol");
                marks.append(", ?, ?, ?, ?, ?");
            }
            try (PreparedStatement p = c.prepareStatement("INSERT OR REPLACE INTO house_readings (" + cols
                    + ") VALUES (" + marks + ")")) {
                p.setString(1, visitId);
                real(p, 2, h.runtimeFraction());
                AirReading[] rs = {h.outdoor(), h.grille(), h.plenum(), h.space()};
                for (int i = 0; i < rs.length; i++) {
                    air(p, 3 + 5 * i, rs[i]);
                }
                p.executeUpdate();
            }
            return null;
        });
    }

    /** The house readings of {@code visitId}; {@link HouseVisitReadings#EMPTY} when none are kept. */
    public HouseVisitReadings readings(String visitId) {
        return db.read(c -> readings(c, visitId));
    }

    private static HouseVisitReadings readings(Connection c, String visitId) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("SELECT * FROM house_readings WHERE visit_id = ?")) {
            p.setString(1, visitId);
            try (ResultSet r = p.executeQuery()) {
                if (!r.next()) {
                    return HouseVisitReadings.EMPTY;
                }
                return new HouseVisitReadings(air(r, "outdoor"), air(r, "grille"), air(r, "plenum"), air(r, "space"),
                        real(r, "runtime_fraction"));
            }
        }
    }

    private static void air(PreparedStatement p, int at, AirReading a) throws SQLException {
        if (a == null) {
            for (int i = 0; i < 5; i++) {
                p.setNull(at + i, i == 2 ? Types.VARCHAR : Types.REAL);
            }
            return;
        }
        p.setDouble(at, a.dryBulbC());
        p.setDouble(at + 1, a.dryBulbTolK());
        p.setString(at + 2, kindKey(a.humidityKind()));
        p.setDouble(at + 3, a.humiditySi());
        p.setDouble(at + 4, a.humidityTolSi());
    }

    private static AirReading air(ResultSet r, String where) throws SQLException {
        String kind = r.getString(where + "_hum_kind");
        double db = real(r, where + "_db_c");
        if (kind == null || Double.isNaN(db)) {
            return null;
        }
        return new AirReading(where, db, r.getDouble(where + "_db_tol_k"), kind(kind), r.getDouble(where + "_hum_value"),
                r.getDouble(where + "_hum_tol"));
    }

    private static String kindKey(HumidityKind k) {
        return switch (k) {
            case WET_BULB -> "wet-bulb";
            case RELATIVE_HUMIDITY -> "rh";
            case DEW_POINT -> "dew-point";
        };
    }

    private static HumidityKind kind(String key) {
        return switch (key) {
            case "wet-bulb" -> HumidityKind.WET_BULB;
            case "rh" -> HumidityKind.RELATIVE_HUMIDITY;
            case "dew-point" -> HumidityKind.DEW_POINT;
            default -> throw new StoreException("unknown humidity kind '" + key + "' in house_readings");
        };
    }

    private static void real(PreparedStatement p, int i, double v) throws SQLException {
        if (Double.isNaN(v)) {
            p.setNull(i, Types.REAL);
        } else {
            p.setDouble(i, v);
        }
    }

    private static double real(ResultSet r, String col) throws SQLException {
        double v = r.getDouble(col);
        return r.wasNull() ? Double.NaN : v;
    }
}
