package app.latentledger.server;

import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.Duration;
import java.time.Instant;
import java.util.Map;
import java.util.UUID;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Companies, people, devices and enrol codes. A tablet is enrolled once with a one-time code and
 * gets a device token {@code <device id>.<secret>}; only an Argon2id hash of the secret is stored,
 * so a copy of the database gives nobody a working token. Revoking a device stops its token on the
 * next request, on every instance (the device row is read on each request).
 */
public final class Accounts {
    /** How long an enrol code can be used. */
    public static final Duration CODE_LIFETIME = Duration.ofHours(24);
    private static final int MIN_PASSWORD = 12;
    private static final int MAX_CACHE = 10_000;

    private final OfficeDatabase db;
    private final Duration tokenLifetime;
    /**
     * Tokens already checked by this instance: SHA-256 of the token → the stored hash it matched.
     * Only a speed-up (Argon2 is slow on purpose): the device row, with its revocation and expiry,
     * is still read on every request, and a changed stored hash misses the cache.
     */
    private final Map<String, String> verified = new ConcurrentHashMap<>();

    public Accounts(OfficeDatabase db, Duration tokenLifetime) {
        this.db = db;
        this.tokenLifetime = tokenLifetime;
    }

    /** Creates a company with its first office account; returns the company id. */
    public UUID createCompany(String name, String officeEmail, String officePassword) {
        String n = name == null ? "" : name.strip();
        if (n.isEmpty() || n.length() > 200) {
            throw new ConfigException("--name '" + name + "': a company name of 1 to 200 characters is needed");
        }
        if (officeEmail == null || !officeEmail.matches("[^@\\s]+@[^@\\s]+")) {
            throw new ConfigException("--office-email '" + officeEmail + "' is not an e-mail address (name@host)");
        }
        if (officePassword == null || officePassword.length() < MIN_PASSWORD) {
            throw new ConfigException("the office password has " + (officePassword == null ? 0 : officePassword.length())
                    + " characters; at least " + MIN_PASSWORD + " are needed");
        }
        String hash = Secrets.hash(officePassword);
        UUID company = UUID.randomUUID();
        UUID person = UUID.randomUUID();
        return Sql.inTransaction(db, c -> {
            try (PreparedStatement ps = c.prepareStatement("select 1 from company where name = ?")) {
                ps.setString(1, n);
                if (ps.executeQuery().next()) {
                    throw new ConfigException("a company named '" + n + "' already exists");
                }
            }
            try (PreparedStatement ps = c.prepareStatement("insert into company (id, name) values (?, ?)")) {
                ps.setObject(1, company);
                ps.setString(2, n);
                ps.executeUpdate();
            }
            try (PreparedStatement ps = c.prepareStatement("insert into person (id, company_id, name, email, role,"
                    + " password_hash) values (?, ?, ?, ?, 'office', ?)")) {
                ps.setObject(1, person);
                ps.setObject(2, company);
                ps.setString(3, officeEmail);
                ps.setString(4, officeEmail);
                ps.setString(5, hash);
                ps.executeUpdate();
            }
            Audit.write(c, company, person, null, "create-company", null, null, null, n);
            return company;
        });
    }

    /** A one-time enrol code for a person of the company (a technician, created on first use of the name). */
    public String createEnrolCode(String companyName, String personName, String role) {
        String person = personName == null ? "" : personName.strip();
        if (person.isEmpty() || person.length() > 200) {
            throw new ConfigException("--technician '" + personName + "': a name of 1 to 200 characters is needed");
        }
        if (!role.equals("technician") && !role.equals("office")) {
            throw new ConfigException("--role '" + role + "' must be technician or office");
        }
        return Sql.inTransaction(db, c -> {
            UUID company = companyId(c, companyName);
            UUID personId = null;
            try (PreparedStatement ps = c.prepareStatement(
                    "select id from person where company_id = ? and name = ? and role = ?")) {
                ps.setObject(1, company);
                ps.setString(2, person);
                ps.setString(3, role);
                ResultSet rs = ps.executeQuery();
                if (rs.next()) {
                    personId = rs.getObject(1, UUID.class);
                }
            }
            if (personId == null) {
                personId = UUID.randomUUID();
                try (PreparedStatement ps = c.prepareStatement(
                        "insert into person (id, company_id, name, role) values (?, ?, ?, ?)")) {
                    ps.setObject(1, personId);
                    ps.setObject(2, company);
                    ps.setString(3, person);
                    ps.setString(4, role);
                    ps.executeUpdate();
                }
            }
            for (int attempt = 0; ; attempt++) {
                String code = Secrets.enrolCode();
                String selector = code.substring(0, 4);
                try (PreparedStatement ps = c.prepareStatement("insert into enrol_code (selector, company_id, person_id,"
                        + " code_hash, expires_at) values (?, ?, ?, ?, ?) on conflict (selector) do nothing")) {
                    ps.setString(1, selector);
                    ps.setObject(2, company);
                    ps.setObject(3, personId);
                    ps.setString(4, Secrets.hash(code));
                    ps.setTimestamp(5, Timestamp.from(Instant.now().plus(CODE_LIFETIME)));
                    if (ps.executeUpdate() == 1) {
                        Audit.write(c, company, personId, null, "create-enrol-code", null, null, null, person);
                        return code;
                    }
                }
                if (attempt > 20) {
                    // a used or expired code keeps its selector; clear old ones once the space fills
                    try (PreparedStatement ps = c.prepareStatement(
                            "delete from enrol_code where expires_at < now() and device_id is null")) {
                        ps.executeUpdate();
                    }
                }
            }
        });
    }

    private static UUID companyId(Connection c, String companyName) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("select id from company where name = ?")) {
            ps.setString(1, companyName == null ? "" : companyName.strip());
            ResultSet rs = ps.executeQuery();
            if (!rs.next()) {
                throw new ConfigException("no company named '" + companyName + "'");
            }
            return rs.getObject(1, UUID.class);
        }
    }

    /** What an enrolment returns: the token is shown only here. */
    public record Enrolment(UUID deviceId, String token, String company, String technician, String role) {
    }

    /** Uses a one-time code; 401 for an unknown, used or expired code (one message: no hint which). */
    public Enrolment enrol(String typedCode, String deviceName) {
        String code = Secrets.normaliseCode(typedCode);
        if (code == null) {
            throw ApiError.badInput("code", typedCode, "12 letters and digits as XXXX-XXXX-XXXX",
                    "the enrol code must be 12 letters and digits, e.g. 7K3M-Q9XA-2BWD");
        }
        String name = deviceName == null ? "" : deviceName.strip();
        if (name.isEmpty() || name.length() > 100) {
            throw ApiError.badInput("deviceName", deviceName, "1 to 100 characters",
                    "the device name must have 1 to 100 characters");
        }
        String secret = Secrets.randomSecret();
        String secretHash = Secrets.hashToken(secret);
        UUID deviceId = UUID.randomUUID();
        return Sql.inTransaction(db, c -> {
            UUID company;
            UUID person;
            String codeHash;
            try (PreparedStatement ps = c.prepareStatement("select company_id, person_id, code_hash from enrol_code"
                    + " where selector = ? and used_at is null and expires_at > now() for update")) {
                ps.setString(1, code.substring(0, 4));
                ResultSet rs = ps.executeQuery();
                if (!rs.next()) {
                    throw ApiError.unauthorised("this enrol code is unknown, already used or expired; ask the office"
                            + " for a new one");
                }
                company = rs.getObject(1, UUID.class);
                person = rs.getObject(2, UUID.class);
                codeHash = rs.getString(3);
            }
            if (!Secrets.matches(code, codeHash)) {
                throw ApiError.unauthorised("this enrol code is unknown, already used or expired; ask the office"
                        + " for a new one");
            }
            try (PreparedStatement ps = c.prepareStatement("insert into device (id, company_id, person_id, name,"
                    + " token_hash, expires_at) values (?, ?, ?, ?, ?, ?)")) {
                ps.setObject(1, deviceId);
                ps.setObject(2, company);
                ps.setObject(3, person);
                ps.setString(4, name);
                ps.setString(5, secretHash);
                ps.setTimestamp(6, Timestamp.from(Instant.now().plus(tokenLifetime)));
                ps.executeUpdate();
            }
            try (PreparedStatement ps = c.prepareStatement(
                    "update enrol_code set used_at = now(), device_id = ? where selector = ?")) {
                ps.setObject(1, deviceId);
                ps.setString(2, code.substring(0, 4));
                ps.executeUpdate();
            }
            Audit.write(c, company, person, deviceId, "enrol", null, null, null, name);
            try (PreparedStatement ps = c.prepareStatement("select c.name, p.name, p.role from company c join person p"
                    + " on p.company_id = c.id where p.id = ?")) {
                ps.setObject(1, person);
                ResultSet rs = ps.executeQuery();
                rs.next();
                return new Enrolment(deviceId, deviceId + "." + secret, rs.getString(1), rs.getString(2),
                        rs.getString(3));
            }
        });
    }

    /** The caller behind a bearer token; 401 when it is missing, unknown, revoked or expired. */
    public Caller authenticate(String authorization) {
        if (authorization == null || !authorization.regionMatches(true, 0, "Bearer ", 0, 7)) {
            throw ApiError.unauthorised("no device token: send Authorization: Bearer <token> (enrol first)");
        }
        String token = authorization.substring(7).strip();
        int dot = token.indexOf('.');
        UUID deviceId;
        try {
            deviceId = dot == 36 ? UUID.fromString(token.substring(0, dot)) : null;
        } catch (IllegalArgumentException e) {
            deviceId = null;
        }
        if (deviceId == null) {
            throw ApiError.unauthorised("this device token is not valid; enrol the device again");
        }
        String secret = token.substring(dot + 1);
        UUID id = deviceId;
        Caller caller;
        String storedHash;
        // one connection for the look-up and the last-seen note: a request holds at most one at a time
        try (Connection c = db.connection()) {
            try (PreparedStatement ps = c.prepareStatement("select d.token_hash, d.person_id, d.company_id, p.role,"
                    + " co.name, p.name from device d join person p on p.id = d.person_id join company co"
                    + " on co.id = d.company_id where d.id = ? and d.revoked_at is null and d.expires_at > now()"
                    + " and p.disabled_at is null")) {
                ps.setObject(1, id);
                ResultSet rs = ps.executeQuery();
                if (!rs.next()) {
                    throw ApiError.unauthorised("this device token is revoked, expired or unknown; enrol the device again");
                }
                storedHash = rs.getString(1);
                caller = new Caller(id, rs.getObject(2, UUID.class), rs.getObject(3, UUID.class), rs.getString(4),
                        rs.getString(5), rs.getString(6));
            }
            String key = Secrets.sha256(token.getBytes(StandardCharsets.UTF_8));
            if (!storedHash.equals(verified.get(key))) {
                if (!Secrets.matches(secret, storedHash)) {
                    throw ApiError.unauthorised("this device token is revoked, expired or unknown; enrol the device again");
                }
                if (verified.size() > MAX_CACHE) {
                    verified.clear();
                }
                verified.put(key, storedHash);
            }
            // when the device was last seen, at most once a minute (not a write per request)
            try (PreparedStatement ps = c.prepareStatement("update device set last_seen = now() where id = ? and"
                    + " (last_seen is null or last_seen < now() - interval '1 minute')")) {
                ps.setObject(1, id);
                ps.executeUpdate();
            }
        } catch (SQLException e) {
            throw new IllegalStateException("database: " + e.getMessage(), e);
        }
        return caller;
    }

    /**
     * A device for a technician of the company without the enrol round trip (the load test makes
     * hundreds; an enrol code's deliberate Argon2 cost would dominate). Audited like an enrolment.
     *
     * @return the token
     */
    String issueDevice(UUID company, String technician, String deviceName) {
        String secret = Secrets.randomSecret();
        String secretHash = Secrets.hashToken(secret);
        UUID person = UUID.randomUUID();
        UUID device = UUID.randomUUID();
        return Sql.inTransaction(db, c -> {
            try (PreparedStatement ps = c.prepareStatement(
                    "insert into person (id, company_id, name, role) values (?, ?, ?, 'technician')")) {
                ps.setObject(1, person);
                ps.setObject(2, company);
                ps.setString(3, technician);
                ps.executeUpdate();
            }
            try (PreparedStatement ps = c.prepareStatement("insert into device (id, company_id, person_id, name,"
                    + " token_hash, expires_at) values (?, ?, ?, ?, ?, ?)")) {
                ps.setObject(1, device);
                ps.setObject(2, company);
                ps.setObject(3, person);
                ps.setString(4, deviceName);
                ps.setString(5, secretHash);
                ps.setTimestamp(6, Timestamp.from(Instant.now().plus(tokenLifetime)));
                ps.executeUpdate();
            }
            Audit.write(c, company, person, device, "issue-device", null, null, null, deviceName);
            return device + "." + secret;
        });
    }

    /** Revokes a device's token at once; returns false when no such device. */
    public boolean revokeDevice(UUID device) {
        return Sql.inTransaction(db, c -> {
            UUID company;
            UUID person;
            try (PreparedStatement ps = c.prepareStatement("update device set revoked_at = now() where id = ?"
                    + " and revoked_at is null returning company_id, person_id")) {
                ps.setObject(1, device);
                ResultSet rs = ps.executeQuery();
                if (!rs.next()) {
                    return false;
                }
                company = rs.getObject(1, UUID.class);
                person = rs.getObject(2, UUID.class);
            }
            Audit.write(c, company, person, device, "revoke-device", null, null, null, null);
            return true;
        });
    }
}
