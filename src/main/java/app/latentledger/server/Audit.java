package app.latentledger.server;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Types;
import java.util.UUID;

/**
 * The audit trail: one row for every write (who, which device, when, what, which record), in the
 * same transaction as the write, so a write without its row cannot exist.
 */
final class Audit {
    private Audit() {
    }

    static void write(Connection c, UUID company, UUID person, UUID device, String action, String kind,
                      String recordId, Integer revision, String detail) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("insert into audit (company_id, person_id, device_id, action,"
                + " kind, record_id, revision, detail) values (?, ?, ?, ?, ?, ?, ?, ?)")) {
            ps.setObject(1, company);
            ps.setObject(2, person);
            ps.setObject(3, device);
            ps.setString(4, action);
            ps.setString(5, kind);
            ps.setString(6, recordId);
            if (revision == null) {
                ps.setNull(7, Types.INTEGER);
            } else {
                ps.setInt(7, revision);
            }
            ps.setString(8, detail);
            ps.executeUpdate();
        }
    }

    static void write(Connection c, Caller who, String action, String kind, String recordId, Integer revision,
                      String detail) throws SQLException {
        write(c, who.companyId(), who.personId(), who.deviceId(), action, kind, recordId, revision, detail);
    }
}
