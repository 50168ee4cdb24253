package app.latentledger.store;

import app.latentledger.core.records.Timestamps;
import app.latentledger.core.records.Measurement;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.OffsetDateTime;

/** Column helpers shared by the repositories: optional values, date-times, measurements. */
final class Sql {
    private Sql() {
    }

    static void setNullableDouble(PreparedStatement p, int i, Double v) throws SQLException {
        if (v == null) {
            p.setNull(i, Types.REAL);
        } else {
            p.setDouble(i, v);
        }
    }

    static void setNullableText(PreparedStatement p, int i, String v) throws SQLException {
        if (v == null) {
            p.setNull(i, Types.VARCHAR);
        } else {
            p.setString(i, v);
        }
    }

    static Double nullableDouble(ResultSet r, String column) throws SQLException {
        double v = r.getDouble(column);
        return r.wasNull() ? null : v;
    }

    /** Value and tolerance columns into a measurement; null when the value column is null. */
    static Measurement measurement(ResultSet r, String value, String tolerance) throws SQLException {
        Double v = nullableDouble(r, value);
        if (v == null) {
            return null;
        }
        Double t = nullableDouble(r, tolerance);
        return new Measurement(v, t == null ? 0 : t);
    }

    static void setMeasurement(PreparedStatement p, int i, Measurement m) throws SQLException {
        setNullableDouble(p, i, m == null ? null : m.valueSi());
        setNullableDouble(p, i + 1, m == null ? null : m.toleranceSi());
    }

    /** ISO-8601 with offset, e.g. 2024-07-16T09:40:00-04:00: readable in the file and exact. */
    static String time(OffsetDateTime t) {
        return Timestamps.text(t);
    }

    static OffsetDateTime time(ResultSet r, String column) throws SQLException {
        return OffsetDateTime.parse(r.getString(column));
    }
}
