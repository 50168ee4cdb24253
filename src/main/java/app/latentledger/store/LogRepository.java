package app.latentledger.store;

import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.InvalidRecordException;
import app.latentledger.core.visit.RecordRules;
import app.latentledger.core.records.LogChannel;
import app.latentledger.core.records.LogSamples;
import app.latentledger.core.records.TimeBase;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Imported logs with their samples, kept in chunks (see {@link SampleChunks}). */
public final class LogRepository {
    private final Database db;

    LogRepository(Database db) {
        this.db = db;
    }

    /**
     * Saves a log and all its samples in one transaction, replacing an earlier save of the same id.
     * Whatever path it came by, a log is stored only when it passes {@link RecordRules#log}.
     */
    public void save(ImportedLog log) {
        RecordRules.log(log.samples());
        saveUnchecked(log);
    }

    /** Saves without today's log rules, as an older build did; for tests of {@code visits check}. */
    void saveUnchecked(ImportedLog log) {
        db.write(c -> {
            if (VisitRepository.find(c, log.visitId()).isEmpty()) {
                throw new InvalidRecordException("log visit", "no visit with id " + log.visitId() + " in this ledger");
            }
            for (String table : new String[] {"log_chunk", "log_channel"}) {
                try (PreparedStatement p = c.prepareStatement("DELETE FROM " + table + " WHERE log_id = ?")) {
                    p.setString(1, log.id());
                    p.executeUpdate();
                }
            }
            LogSamples s = log.samples();
            try (PreparedStatement p = c.prepareStatement("INSERT INTO imported_log (id, visit_id, source_file_name,"
                    + " column_mapping, imported_at, imported_epoch_s, time_base, sample_count, conditions_stored,"
                    + " airflow_m3_per_s, airflow_from, fan_airflow_m3_per_s, time_zone)"
                    + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) ON CONFLICT (id) DO UPDATE SET"
                    + " visit_id = excluded.visit_id,"
                    + " source_file_name = excluded.source_file_name, column_mapping = excluded.column_mapping,"
                    + " imported_at = excluded.imported_at, imported_epoch_s = excluded.imported_epoch_s,"
                    + " time_base = excluded.time_base, sample_count = excluded.sample_count,"
                    + " conditions_stored = excluded.conditions_stored, airflow_m3_per_s = excluded.airflow_m3_per_s,"
                    + " airflow_from = excluded.airflow_from, fan_airflow_m3_per_s = excluded.fan_airflow_m3_per_s,"
                    + " time_zone = excluded.time_zone")) {
                p.setString(1, log.id());
                p.setString(2, log.visitId());
                p.setString(3, log.sourceFileName());
                p.setString(4, log.columnMapping());
                p.setString(5, Sql.time(log.importedAt()));
                p.setLong(6, log.importedAt().toEpochSecond());
                p.setString(7, s.timeBase().key());
                p.setInt(8, s.size());
                ImportedLog.KeptConditions k = log.kept();
                p.setInt(9, k == null ? 0 : 1);
                setReal(p, 10, k == null ? Double.NaN : k.airflowM3PerS());
                p.setString(11, k == null ? "" : k.airflowFrom());
                setReal(p, 12, k == null ? Double.NaN : k.fanAirflowM3PerS());
                p.setString(13, k == null ? "" : k.timeZone());
                p.executeUpdate();
            }
            List<LogChannel> channels = s.channels();
            double[][] columns = new double[channels.size()][];
            try (PreparedStatement p = c.prepareStatement(
                    "INSERT INTO log_channel (log_id, position, name, unit) VALUES (?, ?, ?, ?)")) {
                for (int i = 0; i < channels.size(); i++) {
                    p.setString(1, log.id());
                    p.setInt(2, i);
                    p.setString(3, channels.get(i).name());
                    p.setString(4, channels.get(i).unit());
                    p.executeUpdate();
                    columns[i] = channels.get(i).values();
                }
            }
            long[] times = s.timesMs();
            try (PreparedStatement p = c.prepareStatement("INSERT INTO log_chunk (log_id, chunk_no, first_sample,"
                    + " sample_count, times, samples) VALUES (?, ?, ?, ?, ?, ?)")) {
                for (int from = 0, chunk = 0; from < times.length; from += SampleChunks.CHUNK, chunk++) {
                    int count = Math.min(SampleChunks.CHUNK, times.length - from);
                    p.setString(1, log.id());
                    p.setInt(2, chunk);
                    p.setInt(3, from);
                    p.setInt(4, count);
                    p.setBytes(5, SampleChunks.times(times, from, count));
                    p.setBytes(6, SampleChunks.values(columns, from, count));
                    p.executeUpdate();
                }
            }
            return null;
        });
    }

    /** The log with all its samples. */
    public Optional<ImportedLog> find(String id) {
        return db.read(c -> find(c, id));
    }

    static Optional<ImportedLog> find(Connection c, String id) throws SQLException {
        try (PreparedStatement p = c.prepareStatement("SELECT * FROM imported_log WHERE id = ?")) {
            p.setString(1, id);
            try (ResultSet r = p.executeQuery()) {
                if (!r.next()) {
                    return Optional.empty();
                }
                ImportedLog.KeptConditions kept = r.getInt("conditions_stored") == 0 ? null
                        : new ImportedLog.KeptConditions(real(r, "airflow_m3_per_s"), r.getString("airflow_from"),
                        real(r, "fan_airflow_m3_per_s"), r.getString("time_zone"));
                return Optional.of(new ImportedLog(r.getString("id"), r.getString("visit_id"),
                        r.getString("source_file_name"), r.getString("column_mapping"),
                        Sql.time(r, "imported_at"), samples(c, id,
                        TimeBase.parse("log time base", r.getString("time_base")), r.getInt("sample_count")), kept));
            }
        }
    }

    private static void setReal(PreparedStatement p, int i, double v) throws SQLException {
        if (Double.isNaN(v)) {
            p.setNull(i, java.sql.Types.REAL);
        } else {
            p.setDouble(i, v);
        }
    }

    private static double real(ResultSet r, String column) throws SQLException {
        double v = r.getDouble(column);
        return r.wasNull() ? Double.NaN : v;
    }

    private static LogSamples samples(Connection c, String id, TimeBase base, int size) throws SQLException {
        List<String> names = new ArrayList<>();
        List<String> units = new ArrayList<>();
        try (PreparedStatement p = c.prepareStatement(
                "SELECT name, unit FROM log_channel WHERE log_id = ? ORDER BY position")) {
            p.setString(1, id);
            try (ResultSet r = p.executeQuery()) {
                while (r.next()) {
                    names.add(r.getString(1));
                    units.add(r.getString(2));
                }
            }
        }
        long[] times = new long[size];
        double[][] columns = new double[names.size()][size];
        int seen = 0;
        try (PreparedStatement p = c.prepareStatement(
                "SELECT first_sample, sample_count, times, samples FROM log_chunk WHERE log_id = ? ORDER BY chunk_no")) {
            p.setString(1, id);
            try (ResultSet r = p.executeQuery()) {
                while (r.next()) {
                    int from = r.getInt(1);
                    int count = r.getInt(2);
                    if (from != seen || from + count > size) {
                        throw new StoreException("log " + id + ": chunks do not cover samples 0 to " + size
                                + " in order (chunk at " + from + ")");
                    }
                    SampleChunks.readTimes(r.getBytes(3), times, from, count);
                    SampleChunks.readValues(r.getBytes(4), columns, from, count);
                    seen += count;
                }
            }
        }
        if (seen != size) {
            throw new StoreException("log " + id + ": " + seen + " samples stored, " + size + " expected");
        }
        List<LogChannel> channels = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            channels.add(new LogChannel(names.get(i), units.get(i), columns[i]));
        }
        return new LogSamples(base, times, channels);
    }

    /** Ids of the visit's logs, in import order. */
    public List<String> idsForVisit(String visitId) {
        return db.read(c -> {
            List<String> out = new ArrayList<>();
            try (PreparedStatement p = c.prepareStatement(
                    "SELECT id FROM imported_log WHERE visit_id = ? ORDER BY imported_epoch_s, rowid")) {
                p.setString(1, visitId);
                try (ResultSet r = p.executeQuery()) {
                    while (r.next()) {
                        out.add(r.getString(1));
                    }
                }
            }
            return out;
        });
    }

    /**
     * One kept log as a list shows it, read without its samples.
     *
     * @param importedAt when it was kept
     * @param samples    how many samples it holds
     * @param timeZone   the zone its clock times are shown in, "" when none was stored
     */
    public record Listed(String id, String sourceFileName, java.time.OffsetDateTime importedAt, int samples,
                         String timeZone) {
    }

    /** The visit's logs in import order, without their samples (a list of a visit's logs stays quick). */
    public List<Listed> listForVisit(String visitId) {
        return db.read(c -> {
            List<Listed> out = new ArrayList<>();
            try (PreparedStatement p = c.prepareStatement("SELECT id, source_file_name, imported_at, sample_count,"
                    + " time_zone FROM imported_log WHERE visit_id = ? ORDER BY imported_epoch_s, rowid")) {
                p.setString(1, visitId);
                try (ResultSet r = p.executeQuery()) {
                    while (r.next()) {
                        String zone = r.getString("time_zone");
                        out.add(new Listed(r.getString("id"), r.getString("source_file_name"),
                                Sql.time(r, "imported_at"), r.getInt("sample_count"), zone == null ? "" : zone));
                    }
                }
            }
            return out;
        });
    }

    /** The visit's logs with all samples. */
    public List<ImportedLog> forVisit(String visitId) {
        List<ImportedLog> out = new ArrayList<>();
        db.read(c -> {
            for (String id : idsForVisit(visitId)) {
                find(c, id).ifPresent(out::add);
            }
            return null;
        });
        return out;
    }
}
