package app.latentledger.server;

import java.nio.charset.StandardCharsets;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Timestamp;
import java.time.Duration;
import java.time.Instant;
import java.util.UUID;

/**
 * Sessions of the office page, kept in the database (table {@code office_session}) so every instance
 * behind a load balancer knows them. The cookie is 256 random bits; the table holds only its
 * SHA-256. Each session has its own CSRF token, which every form sends back.
 */
final class OfficeSessions {
    /** How long a login lasts: a working day; then the office logs in again. */
    static final Duration LIFETIME = Duration.ofHours(12);

    private final OfficeDatabase db;

    OfficeSessions(OfficeDatabase db) {
        this.db = db;
    }

    /** A signed-in office person. */
    record Session(UUID personId, UUID companyId, String personName, String companyName, String csrf) {
        /** The caller as the API's services see it (no device: the office page is not a tablet). */
        Caller caller() {
            return new Caller(null, personId, companyId, "office", companyName, personName);
        }
    }

    /** Starts a session; returns the cookie's token (shown only in the Set-Cookie header). */
    String start(UUID person, UUID company) {
        String token = Secrets.randomSecret();
        String csrf = Secrets.randomSecret();
        return Sql.inTransaction(db, c -> {
            // old sessions of anybody are dropped here: no separate clean-up job
            try (PreparedStatement ps = c.prepareStatement("delete from office_session where expires_at < now()")) {
                ps.executeUpdate();
            }
            try (PreparedStatement ps = c.prepareStatement("insert into office_session (token_hash, company_id,"
                    + " person_id, csrf, expires_at) values (?, ?, ?, ?, ?)")) {
                ps.setString(1, hash(token));
                ps.setObject(2, company);
                ps.setObject(3, person);
                ps.setString(4, csrf);
                ps.setTimestamp(5, Timestamp.from(Instant.now().plus(LIFETIME)));
                ps.executeUpdate();
            }
            Audit.write(c, company, person, null, "office-login", null, null, null, null);
            return token;
        });
    }

    /** The live session of a cookie token, or null (unknown, expired, or its person disabled). */
    Session find(String token) {
        if (token == null || token.isEmpty() || token.length() > 100) {
            return null;
        }
        return Sql.inTransaction(db, c -> {
            try (PreparedStatement ps = c.prepareStatement("select s.person_id, s.company_id, p.name, co.name, s.csrf"
                    + " from office_session s join person p on p.id = s.person_id join company co on co.id ="
                    + " s.company_id where s.token_hash = ? and s.expires_at > now() and p.disabled_at is null"
                    + " and p.role = 'office'")) {
                ps.setString(1, hash(token));
                ResultSet rs = ps.executeQuery();
                if (!rs.next()) {
                    return null;
                }
                return new Session(rs.getObject(1, UUID.class), rs.getObject(2, UUID.class), rs.getString(3),
                        rs.getString(4), rs.getString(5));
            }
        });
    }

    /** Ends the session of a cookie token (log out). */
    void end(String token, Session s) {
        Sql.inTransaction(db, c -> {
            try (PreparedStatement ps = c.prepareStatement("delete from office_session where token_hash = ?")) {
                ps.setString(1, hash(token));
                ps.executeUpdate();
            }
            Audit.write(c, s.companyId(), s.personId(), null, "office-logout", null, null, null, null);
            return null;
        });
    }

    private static String hash(String token) {
        return Secrets.sha256(token.getBytes(StandardCharsets.UTF_8));
    }
}
