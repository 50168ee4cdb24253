package app.latentledger.store;

import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.measure.ProbeMatch;
import app.latentledger.core.records.Airflow;
import app.latentledger.core.records.CoilTemperature;
import app.latentledger.core.records.Condensate;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Reading sets. A save has reached the disk when {@link #save} returns (synchronous=FULL). */
public final class ReadingSetRepository {
    private static final String[] COLUMNS = {
        "id", "visit_id", "taken_at", "taken_epoch_s", "label", "instrument",
        "return_db_c", "return_db_tol_k", "return_hum_kind", "return_hum_value", "return_hum_tol",
        "supply_db_c", "supply_db_tol_k", "supply_hum_kind", "supply_hum_value", "supply_hum_tol",
        "outdoor_db_c", "outdoor_db_tol_k", "outdoor_hum_kind", "outdoor_hum_value", "outdoor_hum_tol",
        "coil_kind", "coil_c", "coil_tol_k",
        "airflow_m3_per_s", "airflow_tol_m3_per_s", "airflow_point", "airflow_method",
        "station_pressure_pa", "station_pressure_tol_pa",
        "condensate_m3", "condensate_tol_m3", "condensate_s", "condensate_tol_s", "notes",
        "airflow_basis", "same_probe", "supply_dew_point_offset_k",
    };
    private static final String UPSERT = upsert();

    private final Database db;

    ReadingSetRepository(Database db) {
        this.db = db;
    }

    private static String upsert() {
        StringBuilder b = new StringBuilder("INSERT INTO reading_set (").append(String.join(", ", COLUMNS))
                .append(") VALUES (").append("?, ".repeat(COLUMNS.length - 1)).append("?) ON CONFLICT (id) DO UPDATE SET ");
        for (int i = 1; i < COLUMNS.length; i++) {
            b.append(i > 1 ? ", " : "").append(COLUMNS[i]).append(" = excluded.").append(COLUMNS[i]);
        }
        return b.toString();
    }

    /** Saves a new or changed reading set; its visit must exist. */
    public void save(ReadingSet s) {
        db.write(c -> {
            if (VisitRepository.find(c, s.visitId()).isEmpty()) {
                throw new InvalidRecordException("reading set visit", "no visit with id " + s.visitId() + " in this ledger");
            }
            try (PreparedStatement p = c.prepareStatement(UPSERT)) {
                int i = 1;
                p.setString(i++, s.id());
                p.setString(i++, s.visitId());
                p.setString(i++, Sql.time(s.takenAt()));
                p.setLong(i++, s.takenAt().toEpochSecond());
                p.setString(i++, s.label());
                p.setString(i++, s.instrument());
                Sql.setMeasurement(p, i, s.returnDryBulb());
                i += 2;
                i = humidity(p, i, s.returnHumidity());
                Sql.setMeasurement(p, i, s.supplyDryBulb());
                i += 2;
                i = humidity(p, i, s.supplyHumidity());
                Sql.setMeasurement(p, i, s.outdoorDryBulb());
                i += 2;
                i = humidity(p, i, s.outdoorHumidity());
                CoilTemperature coil = s.coilTemperature();
                Sql.setNullableText(p, i++, coil == null ? null : coil.kind().key());
                Sql.setMeasurement(p, i, coil == null ? null : coil.value());
                i += 2;
                Airflow a = s.airflow();
                Sql.setMeasurement(p, i, a == null ? null : a.volume());
                i += 2;
                Sql.setNullableText(p, i++, a == null ? null : a.point().key());
                Sql.setNullableText(p, i++, a == null ? null : a.method());
                Sql.setMeasurement(p, i, s.stationPressurePa());
                i += 2;
                Condensate k = s.condensate();
                Sql.setMeasurement(p, i, k == null ? null : k.volume());
                i += 2;
                Sql.setMeasurement(p, i, k == null ? null : k.seconds());
                i += 2;
                p.setString(i++, s.notes());
                p.setString(i++, a == null ? AirflowBasis.ACTUAL.key() : a.basis().key());
                p.setInt(i++, s.probes().sameInstrument() ? 1 : 0);
                p.setDouble(i, s.probes().supplyDewPointOffsetK());
                p.executeUpdate();
            }
            return null;
        });
    }

    private static int humidity(PreparedStatement p, int i, HumidityReading h) throws SQLException {
        Sql.setNullableText(p, i, h == null ? null : h.kind().key());
        Sql.setMeasurement(p, i + 1, h == null ? null : h.value());
        return i + 3;
    }

    public Optional<ReadingSet> find(String id) {
        return db.read(c -> find(c, id));
    }

    static Optional<ReadingSet> find(Connection c, String id) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("SELECT * FROM reading_set WHERE id = ?")) {
            p.setString(1, id);
            try (ResultSet r = p.executeQuery()) {
                return r.next() ? Optional.of(map(r)) : Optional.empty();
            }
        }
    }

    /** The visit's reading sets in the order they were taken. */
    public List<ReadingSet> forVisit(String visitId) {
        return db.read(c -> {
            List<ReadingSet> out = new ArrayList<>();
            try (PreparedStatement p = c.prepareStatement(
                    "SELECT * FROM reading_set WHERE visit_id = ? ORDER BY taken_epoch_s, id")) {
                p.setString(1, visitId);
                try (ResultSet r = p.executeQuery()) {
                    while (r.next()) {
                        out.add(map(r));
                    }
                }
            }
            return out;
        });
    }

    /** How many reading sets the ledger holds. */
    public int count() {
        return db.read(c -> {
            try (PreparedStatement p = c.prepareStatement("SELECT COUNT(*) FROM reading_set");
                 ResultSet r = p.executeQuery()) {
                r.next();
                return r.getInt(1);
            }
        });
    }

    private static HumidityReading humidity(ResultSet r, String prefix) throws SQLException {
        String kind = r.getString(prefix + "_hum_kind");
        if (kind == null) {
            return null;
        }
        return new HumidityReading(HumidityKind.parse(prefix + " humidity kind", kind),
                Sql.measurement(r, prefix + "_hum_value", prefix + "_hum_tol"));
    }

    private static ReadingSet map(ResultSet r) throws SQLException {
        String coilKind = r.getString("coil_kind");
        CoilTemperature coil = coilKind == null ? null : new CoilTemperature(
                CoilTemperatureKind.parse("coil temperature kind", coilKind), Sql.measurement(r, "coil_c", "coil_tol_k"));
        Measurement flow = Sql.measurement(r, "airflow_m3_per_s", "airflow_tol_m3_per_s");
        Airflow airflow = flow == null ? null : new Airflow(flow,
                AirflowPoint.parse("airflow point", r.getString("airflow_point")), r.getString("airflow_method"),
                AirflowBasis.parse("airflow basis", r.getString("airflow_basis")));
        Measurement volume = Sql.measurement(r, "condensate_m3", "condensate_tol_m3");
        Condensate condensate = volume == null ? null
                : new Condensate(volume, Sql.measurement(r, "condensate_s", "condensate_tol_s"));
        return new ReadingSet(r.getString("id"), r.getString("visit_id"), Sql.time(r, "taken_at"),
                r.getString("label"), r.getString("instrument"),
                Sql.measurement(r, "return_db_c", "return_db_tol_k"), humidity(r, "return"),
                Sql.measurement(r, "supply_db_c", "supply_db_tol_k"), humidity(r, "supply"),
                Sql.measurement(r, "outdoor_db_c", "outdoor_db_tol_k"), humidity(r, "outdoor"),
                coil, airflow, Sql.measurement(r, "station_pressure_pa", "station_pressure_tol_pa"),
                condensate, r.getString("notes"),
                new ProbeMatch(r.getInt("same_probe") == 1, r.getDouble("supply_dew_point_offset_k")));
    }
}
