package app.latentledger.server;

import app.latentledger.core.units.UnitSystem;

import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.util.HashMap;
import java.util.Map;
import java.util.UUID;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static app.latentledger.server.OfficeHtml.esc;

/**
 * The office web page under {@code /office}: log in with the office e-mail and password, search
 * visits, open one with its verdicts and findings, download its bundle and PDF report, and manage
 * technicians and devices. Server-rendered HTML, no script.
 *
 * <p>Access: only office staff (role {@code office}, with a password) log in; a technician has no
 * password and cannot. Every page shows only the signed-in person's company; another company's visit,
 * person or device id answers 404. Not logged in: a redirect to the login page. Every form post
 * carries a CSRF token (the session's, or before login the login cookie's) and is refused with 403
 * without it; the session cookie is HttpOnly, SameSite=Strict and Secure when the server speaks TLS.
 */
final class OfficePages {
    static final String SESSION_COOKIE = "ll_office";
    static final String LOGIN_COOKIE = "ll_login";
    private static final Pattern VISIT = Pattern.compile("/office/visits/([^/]+)(/bundle|/report\\.pdf)?");
    private static final int MAX_FORM = 64 * 1024;

    private final OfficeDatabase db;
    private final OfficeSessions sessions;
    private final OfficeVisits visits;
    private final OfficePeople people;
    private final RateLimit loginLimit;
    private final boolean secure;
    /** Compared against when the e-mail is unknown, so a wrong e-mail takes as long as a wrong password. */
    private volatile String decoyHash;

    OfficePages(OfficeDatabase db, ServerConfig config, Accounts accounts, VisitBundles bundles) {
        this.db = db;
        this.sessions = new OfficeSessions(db);
        this.visits = new OfficeVisits(db, bundles);
        this.people = new OfficePeople(db, accounts);
        this.loginLimit = new RateLimit(config.enrolPerMinute(), System::nanoTime);
        this.secure = config.keystore() != null;
    }

    static boolean isOfficePath(String path) {
        return path.equals("/office") || path.startsWith("/office/");
    }

    /** Answers a request under /office; refusals are HTML pages too. */
    Reply handle(HttpCall call) {
        try {
            return route(call);
        } catch (ApiError e) {
            String body = "<p class=\"error\">" + esc(e.getMessage()) + "</p><p><a href=\"/office\">Back to the visits</a></p>";
            Reply page = OfficeHtml.page(e.status(), e.status() == 404 ? "Not found" : e.status() == 400 ? "Not accepted"
                    : "Refused", null, body);
            // the refusal's own headers (Retry-After, Allow, ...) go with the page
            for (Map.Entry<String, String> h : e.reply().headers().entrySet()) {
                if (!page.headers().containsKey(h.getKey())) {
                    page = page.withHeader(h.getKey(), h.getValue());
                }
            }
            return page;
        }
    }

    private Reply route(HttpCall call) {
        String path = call.path();
        String method = call.method();
        if (path.equals("/office/login")) {
            return method.equals("POST") ? login(call) : loginPage(call, 200, null);
        }
        String token = cookie(call, SESSION_COOKIE);
        OfficeSessions.Session s = sessions.find(token);
        if (s == null) {
            return OfficeHtml.redirect("/office/login");
        }
        Map<String, String> form = Map.of();
        if (method.equals("POST")) {
            form = form(call.body());
            checkCsrf(form.get("csrf"), s.csrf());
        } else if (!method.equals("GET")) {
            throw new ApiError(405, "method-not-allowed", method + " is not answered here.").header("Allow", "GET, POST");
        }
        switch (method + " " + path) {
            case "GET /office", "GET /office/" -> {
                return visits.search(s, call.query().get("q"));
            }
            case "GET /office/people" -> {
                return people.list(s);
            }
            case "POST /office/people/add" -> {
                return people.add(s, form.get("name"));
            }
            case "POST /office/people/code" -> {
                return people.code(s, form.get("person"));
            }
            case "POST /office/devices/revoke" -> {
                return people.revoke(s, form.get("device"));
            }
            case "POST /office/logout" -> {
                sessions.end(token, s);
                return OfficeHtml.redirect("/office/login").withHeader("Set-Cookie", SESSION_COOKIE + "=; Path=/office;"
                        + " Max-Age=0; HttpOnly; SameSite=Strict" + (secure ? "; Secure" : ""));
            }
            default -> {
                // visits below
            }
        }
        Matcher m = VISIT.matcher(path);
        if (m.matches() && method.equals("GET")) {
            UnitSystem units = units(call.query().get("units"));
            if (m.group(2) == null) {
                return visits.visit(s, m.group(1), units);
            }
            return m.group(2).equals("/bundle") ? visits.bundle(s, m.group(1)) : visits.report(s, m.group(1), units);
        }
        throw ApiError.notFound("There is no such page.");
    }

    // ---- login ---------------------------------------------------------------------------------

    /**
     * The login form. Before a session exists, its CSRF token is a random value in a short-lived
     * cookie of its own, echoed in the form (a page of another site can neither read the cookie nor,
     * with SameSite=Strict, send it).
     */
    private Reply loginPage(HttpCall call, int status, String error) {
        String pre = cookie(call, LOGIN_COOKIE);
        boolean fresh = pre == null || pre.length() < 20 || pre.length() > 100;
        if (fresh) {
            pre = Secrets.randomSecret();
        }
        String body = (error == null ? "" : "<p class=\"error\">" + esc(error) + "</p>")
                + "<form method=\"post\" action=\"/office/login\"><input type=\"hidden\" name=\"csrf\" value=\""
                + esc(pre) + "\"><label>Office e-mail <input type=\"email\" name=\"email\" required autocomplete=\"username\">"
                + "</label><label>Password <input type=\"password\" name=\"password\" required"
                + " autocomplete=\"current-password\"></label><button type=\"submit\">Log in</button></form>"
                + "<p>Only office staff log in here; technicians use their tablet.</p>";
        Reply r = OfficeHtml.page(status, "Log in", null, body);
        return fresh ? r.withHeader("Set-Cookie", LOGIN_COOKIE + "=" + pre + "; Path=/office/login; Max-Age=3600;"
                + " HttpOnly; SameSite=Strict" + (secure ? "; Secure" : "")) : r;
    }

    private Reply login(HttpCall call) {
        long wait = loginLimit.acquire(call.clientAddr());
        if (wait > 0) {
            throw new ApiError(429, "too-many-attempts", "Too many log-in attempts from this address; try again in "
                    + wait + " s.").header("Retry-After", String.valueOf(wait));
        }
        Map<String, String> form = form(call.body());
        checkCsrf(form.get("csrf"), cookie(call, LOGIN_COOKIE));
        String email = form.getOrDefault("email", "").strip();
        String password = form.getOrDefault("password", "");
        if (email.isEmpty() || email.length() > 320) {
            throw badInput("email", email, "an e-mail address of 1 to 320 characters");
        }
        UUID[] found = Sql.inTransaction(db, c -> {
            try (PreparedStatement ps = c.prepareStatement("select id, company_id, password_hash from person where"
                    + " lower(email) = lower(?) and role = 'office' and password_hash is not null and disabled_at is null")) {
                ps.setString(1, email);
                ResultSet rs = ps.executeQuery();
                if (!rs.next()) {
                    Secrets.matches(password, decoy());
                    return null;
                }
                if (Secrets.matches(password, rs.getString(3))) {
                    return new UUID[] {rs.getObject(1, UUID.class), rs.getObject(2, UUID.class)};
                }
                return null;
            }
        });
        if (found == null) {
            // one message for a wrong e-mail, a wrong password and a technician: nothing to learn from it
            return loginPage(call, 401, "That e-mail and password do not match an office account.");
        }
        String token = sessions.start(found[0], found[1]);
        return OfficeHtml.redirect("/office").withHeader("Set-Cookie", SESSION_COOKIE + "=" + token + "; Path=/office;"
                + " HttpOnly; SameSite=Strict" + (secure ? "; Secure" : ""));
    }

    private String decoy() {
        if (decoyHash == null) {
            decoyHash = Secrets.hash(Secrets.randomSecret());
        }
        return decoyHash;
    }

    // ---- request pieces ------------------------------------------------------------------------

    private static void checkCsrf(String sent, String expected) {
        if (sent == null || expected == null || !MessageDigest.isEqual(sent.getBytes(StandardCharsets.UTF_8),
                expected.getBytes(StandardCharsets.UTF_8))) {
            throw new ApiError(403, "csrf", "This form has expired or did not come from this page; open the page"
                    + " again and repeat.");
        }
    }

    static String cookie(HttpCall call, String name) {
        String header = call.header("Cookie");
        if (header == null) {
            return null;
        }
        for (String part : header.split(";")) {
            String p = part.strip();
            if (p.startsWith(name + "=")) {
                return p.substring(name.length() + 1);
            }
        }
        return null;
    }

    static Map<String, String> form(byte[] body) {
        if (body.length > MAX_FORM) {
            throw badInput("body", body.length + " bytes", "at most " + MAX_FORM + " bytes");
        }
        Map<String, String> out = new HashMap<>();
        String text = new String(body, StandardCharsets.UTF_8);
        for (String pair : text.split("&")) {
            if (pair.isEmpty()) {
                continue;
            }
            int eq = pair.indexOf('=');
            try {
                String k = URLDecoder.decode(eq < 0 ? pair : pair.substring(0, eq), StandardCharsets.UTF_8);
                String v = eq < 0 ? "" : URLDecoder.decode(pair.substring(eq + 1), StandardCharsets.UTF_8);
                out.putIfAbsent(k, v);
            } catch (IllegalArgumentException e) {
                throw badInput("body", pair, "an HTML form (application/x-www-form-urlencoded)");
            }
        }
        return out;
    }

    static UnitSystem units(String typed) {
        if (typed == null || typed.isEmpty()) {
            return UnitSystem.SI;
        }
        if (typed.equalsIgnoreCase("si")) {
            return UnitSystem.SI;
        }
        if (typed.equalsIgnoreCase("ip")) {
            return UnitSystem.IP;
        }
        throw badInput("units", typed, "si or ip");
    }

    static UUID uuid(String field, String typed) {
        try {
            if (typed != null && typed.length() == 36) {
                return UUID.fromString(typed);
            }
        } catch (IllegalArgumentException e) {
            // refused below
        }
        throw badInput(field, typed, "an id as 8-4-4-4-12 hexadecimal digits");
    }

    /** 400 whose sentence names the field, the value sent and what is accepted (shown on the page). */
    static ApiError badInput(String field, String value, String range) {
        String v = value == null ? "" : value.length() > 80 ? value.substring(0, 80) + "…" : value;
        return ApiError.badInput(field, v, range, "The field \"" + field + "\" got \"" + v + "\"; accepted: " + range + ".");
    }
}
