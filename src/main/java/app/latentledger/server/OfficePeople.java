package app.latentledger.server;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Timestamp;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.UUID;

import static app.latentledger.server.OfficeHtml.esc;

/**
 * The office page's technicians and devices: add a technician, give them a one-time enrol code
 * (shown once), see each device with when it was last seen, revoke a device. Every change is audited
 * with the office person who made it, and touches only the caller's company (another company's
 * person or device id answers 404).
 */
final class OfficePeople {
    static final int MAX_NAME = 200;
    private static final DateTimeFormatter SHOWN = DateTimeFormatter.ofPattern("uuuu-MM-dd HH:mm 'UTC'");

    private final OfficeDatabase db;
    private final Accounts accounts;

    OfficePeople(OfficeDatabase db, Accounts accounts) {
        this.db = db;
        this.accounts = accounts;
    }

    Reply list(OfficeSessions.Session s) {
        StringBuilder b = new StringBuilder("<h2>Technicians</h2><table><thead><tr><th>Name</th><th>Role</th>"
                + "<th>Enrol a tablet</th></tr></thead><tbody>");
        Sql.inTransaction(db, c -> {
            try (PreparedStatement ps = c.prepareStatement("select id, name, role from person where company_id = ?"
                    + " and disabled_at is null order by role desc, name")) {
                ps.setObject(1, s.companyId());
                ResultSet rs = ps.executeQuery();
                while (rs.next()) {
                    boolean tech = rs.getString(3).equals("technician");
                    b.append("<tr><td>").append(esc(rs.getString(2))).append("</td><td>").append(esc(rs.getString(3)))
                            .append("</td><td>");
                    if (tech) {
                        b.append("<form method=\"post\" action=\"/office/people/code\">").append(OfficeHtml.csrfField(s))
                                .append("<input type=\"hidden\" name=\"person\" value=\"").append(esc(rs.getString(1)))
                                .append("\"><button type=\"submit\">Issue a one-time enrol code</button></form>");
                    }
                    b.append("</td></tr>");
                }
            }
            b.append("</tbody></table><form method=\"post\" action=\"/office/people/add\">").append(OfficeHtml.csrfField(s))
                    .append("<label>New technician's name <input name=\"name\" required maxlength=\"" + MAX_NAME
                            + "\"></label><button type=\"submit\">Add technician</button></form>");
            b.append("<h2>Devices</h2><table><thead><tr><th>Device</th><th>Technician</th><th>Enrolled</th>"
                    + "<th>Last seen</th><th>State</th><th></th></tr></thead><tbody>");
            try (PreparedStatement ps = c.prepareStatement("select d.id, d.name, p.name, d.created_at, d.last_seen,"
                    + " d.revoked_at, d.expires_at < now() from device d join person p on p.id = d.person_id"
                    + " where d.company_id = ? order by p.name, d.created_at")) {
                ps.setObject(1, s.companyId());
                ResultSet rs = ps.executeQuery();
                while (rs.next()) {
                    boolean revoked = rs.getTimestamp(6) != null;
                    String state = revoked ? "revoked " + shown(rs.getTimestamp(6)) : rs.getBoolean(7) ? "expired" : "active";
                    b.append("<tr><td>").append(esc(rs.getString(2))).append("</td><td>").append(esc(rs.getString(3)))
                            .append("</td><td>").append(shown(rs.getTimestamp(4))).append("</td><td>")
                            .append(rs.getTimestamp(5) == null ? "never" : shown(rs.getTimestamp(5))).append("</td><td>")
                            .append(esc(state)).append("</td><td>");
                    if (!revoked) {
                        b.append("<form method=\"post\" action=\"/office/devices/revoke\">").append(OfficeHtml.csrfField(s))
                                .append("<input type=\"hidden\" name=\"device\" value=\"").append(esc(rs.getString(1)))
                                .append("\"><button type=\"submit\">Revoke</button></form>");
                    }
                    b.append("</td></tr>");
                }
            }
            return null;
        });
        b.append("</tbody></table>");
        return OfficeHtml.page(200, "Technicians and devices", s, b.toString());
    }

    private static String shown(Timestamp t) {
        return t == null ? "" : SHOWN.format(t.toInstant().atOffset(ZoneOffset.UTC));
    }

    /** Adds a technician by name (1 to 200 characters; a name already in the company is refused). */
    Reply add(OfficeSessions.Session s, String typed) {
        String name = typed == null ? "" : typed.strip();
        if (name.isEmpty() || name.length() > MAX_NAME) {
            throw OfficePages.badInput("name", typed, "1 to " + MAX_NAME + " characters");
        }
        Sql.inTransaction(db, c -> {
            try (PreparedStatement ps = c.prepareStatement("select 1 from person where company_id = ? and name = ?"
                    + " and role = 'technician'")) {
                ps.setObject(1, s.companyId());
                ps.setString(2, name);
                if (ps.executeQuery().next()) {
                    throw OfficePages.badInput("name", name, "a name not already used by a technician of the company");
                }
            }
            UUID person = UUID.randomUUID();
            try (PreparedStatement ps = c.prepareStatement(
                    "insert into person (id, company_id, name, role) values (?, ?, ?, 'technician')")) {
                ps.setObject(1, person);
                ps.setObject(2, s.companyId());
                ps.setString(3, name);
                ps.executeUpdate();
            }
            Audit.write(c, s.companyId(), s.personId(), null, "add-technician", null, person.toString(), null, name);
            return null;
        });
        return OfficeHtml.redirect("/office/people");
    }

    /** A one-time enrol code for a technician of the company, shown on this answer only. */
    Reply code(OfficeSessions.Session s, String personId) {
        UUID person = OfficePages.uuid("person", personId);
        String name = Sql.inTransaction(db, c -> {
            try (PreparedStatement ps = c.prepareStatement("select name from person where id = ? and company_id = ?"
                    + " and role = 'technician' and disabled_at is null")) {
                ps.setObject(1, person);
                ps.setObject(2, s.companyId());
                ResultSet rs = ps.executeQuery();
                if (!rs.next()) {
                    throw ApiError.notFound("There is no such technician.");
                }
                return rs.getString(1);
            }
        });
        String code = accounts.createEnrolCode(s.companyName(), name, "technician");
        return OfficeHtml.page(200, "Enrol code for " + name, s, "<p>Type this code on the tablet, in Settings → Office."
                + " It works once, within 24 hours, and is shown only now.</p><p class=\"code\" id=\"enrol-code\">"
                + esc(code) + "</p><p><a href=\"/office/people\">Back to technicians and devices</a></p>");
    }

    /** Revokes a device of the company: its token answers 401 from the next request on, on every instance. */
    Reply revoke(OfficeSessions.Session s, String deviceId) {
        UUID device = OfficePages.uuid("device", deviceId);
        Sql.inTransaction(db, c -> {
            try (PreparedStatement ps = c.prepareStatement("update device set revoked_at = now() where id = ?"
                    + " and company_id = ? and revoked_at is null returning name")) {
                ps.setObject(1, device);
                ps.setObject(2, s.companyId());
                ResultSet rs = ps.executeQuery();
                if (!rs.next()) {
                    throw ApiError.notFound("There is no such device, or it is revoked already.");
                }
                Audit.write(c, s.companyId(), s.personId(), device, "revoke-device", null, null, null,
                        "from the office page: " + rs.getString(1));
            }
            return null;
        });
        return OfficeHtml.redirect("/office/people");
    }
}
