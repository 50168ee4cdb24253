package app.latentledger.store;

import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.StatedAccuracy;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;

/** The instruments of a visit and which of them took each reading set. */
public final class InstrumentRepository {
    private final Database db;

    InstrumentRepository(Database db) {
        this.db = db;
    }

    /** Saves a new or corrected instrument; its visit must exist and it cannot move to another visit. */
    public void save(Instrument i) {
        db.write(c -> {
            if (VisitRepository.find(c, i.visitId()).isEmpty()) {
                throw new InvalidRecordException("instrument visit", "no visit with id " + i.visitId() + " in this ledger");
            }
            Optional<Instrument> before = find(c, i.id());
            if (before.isPresent() && !before.get().visitId().equals(i.visitId())) {
                throw new InvalidRecordException("instrument visit", "instrument " + i.id() + " belongs to visit "
                        + before.get().visitId());
            }
            try (PreparedStatement p = c.prepareStatement("INSERT INTO instrument (id, visit_id, name, serial,"
                    + " calibrated_on, dry_bulb_tol_k, rh_tol_pct, wet_bulb_tol_k, dew_point_tol_k, coil_tol_k,"
                    + " airflow_tol_fraction) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) ON CONFLICT (id) DO UPDATE SET"
                    + " name = excluded.name, serial = excluded.serial, calibrated_on = excluded.calibrated_on,"
                    + " dry_bulb_tol_k = excluded.dry_bulb_tol_k, rh_tol_pct = excluded.rh_tol_pct,"
                    + " wet_bulb_tol_k = excluded.wet_bulb_tol_k, dew_point_tol_k = excluded.dew_point_tol_k,"
                    + " coil_tol_k = excluded.coil_tol_k, airflow_tol_fraction = excluded.airflow_tol_fraction")) {
                StatedAccuracy a = i.accuracy();
                p.setString(1, i.id());
                p.setString(2, i.visitId());
                p.setString(3, i.name());
                p.setString(4, i.serial());
                Sql.setNullableText(p, 5, i.calibratedOn() == null ? null : i.calibratedOn().toString());
                Sql.setNullableDouble(p, 6, a.dryBulbK());
                Sql.setNullableDouble(p, 7, a.relativeHumidityPct());
                Sql.setNullableDouble(p, 8, a.wetBulbK());
                Sql.setNullableDouble(p, 9, a.dewPointK());
                Sql.setNullableDouble(p, 10, a.coilK());
                Sql.setNullableDouble(p, 11, a.airflowFraction());
                p.executeUpdate();
            }
            return null;
        });
    }

    public Optional<Instrument> find(String id) {
        return db.read(c -> find(c, id));
    }

    static Optional<Instrument> find(Connection c, String id) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("SELECT * FROM instrument WHERE id = ?")) {
            p.setString(1, id);
            try (ResultSet r = p.executeQuery()) {
                return r.next() ? Optional.of(map(r)) : Optional.empty();
            }
        }
    }

    /** The visit's instruments in the order they were added (by name, then id). */
    public List<Instrument> forVisit(String visitId) {
        return list("SELECT * FROM instrument WHERE visit_id = ? ORDER BY name, id", visitId);
    }

    /** The instruments chosen for a reading set. */
    public List<Instrument> usedOn(String readingSetId) {
        return list("SELECT i.* FROM instrument i JOIN reading_set_instrument u ON u.instrument_id = i.id"
                + " WHERE u.reading_set_id = ? ORDER BY i.name, i.id", readingSetId);
    }

    /**
     * Chooses the instruments that took a reading set, replacing an earlier choice. Each must be
     * one of the set's own visit's instruments.
     */
    public void useOn(String readingSetId, List<String> instrumentIds) {
        db.write(c -> {
            ReadingSet set = ReadingSetRepository.find(c, readingSetId).orElseThrow(() ->
                    new InvalidRecordException("reading set", "no reading set with id " + readingSetId + " in this ledger"));
            List<String> ids = new ArrayList<>(new LinkedHashSet<>(instrumentIds));
            for (String id : ids) {
                Instrument i = find(c, id).orElseThrow(() ->
                        new InvalidRecordException("instrument", "no instrument with id " + id + " in this ledger"));
                if (!i.visitId().equals(set.visitId())) {
                    throw new InvalidRecordException("instrument", "instrument " + i.name() + " was recorded on visit "
                            + i.visitId() + ", not on this reading set's visit " + set.visitId());
                }
            }
            try (PreparedStatement p = c.prepareStatement("DELETE FROM reading_set_instrument WHERE reading_set_id = ?")) {
                p.setString(1, readingSetId);
                p.executeUpdate();
            }
            try (PreparedStatement p = c.prepareStatement(
                    "INSERT INTO reading_set_instrument (reading_set_id, instrument_id) VALUES (?, ?)")) {
                for (String id : ids) {
                    p.setString(1, readingSetId);
                    p.setString(2, id);
                    p.executeUpdate();
                }
            }
            return null;
        });
    }

    private List<Instrument> list(String sql, String parameter) {
        return db.read(c -> {
            List<Instrument> out = new ArrayList<>();
            try (PreparedStatement p = c.prepareStatement(sql)) {
                p.setString(1, parameter);
                try (ResultSet r = p.executeQuery()) {
                    while (r.next()) {
                        out.add(map(r));
                    }
                }
            }
            return out;
        });
    }

    private static Instrument map(ResultSet r) throws SQLException {
        String date = r.getString("calibrated_on");
        return new Instrument(r.getString("id"), r.getString("visit_id"), r.getString("name"), r.getString("serial"),
                date == null ? null : LocalDate.parse(date),
                new StatedAccuracy(Sql.nullableDouble(r, "dry_bulb_tol_k"), Sql.nullableDouble(r, "rh_tol_pct"),
                        Sql.nullableDouble(r, "wet_bulb_tol_k"), Sql.nullableDouble(r, "dew_point_tol_k"),
                        Sql.nullableDouble(r, "coil_tol_k"), Sql.nullableDouble(r, "airflow_tol_fraction")));
    }
}
