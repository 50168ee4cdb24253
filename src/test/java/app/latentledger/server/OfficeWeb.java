package app.latentledger.server;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPurpose;
import app.latentledger.store.TestRecords;
import app.latentledger.sync.wire.SyncKind;
import app.latentledger.sync.wire.WireCodec;
import com.google.gson.JsonObject;

import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** A browser's side of the office page for the tests: cookies, the CSRF field, form posts; and invented visits. */
final class OfficeWeb {
    static final String PASSWORD = "correct horse battery staple";
    private static final Pattern CSRF = Pattern.compile("name=\"csrf\" value=\"([^\"]+)\"");

    private final TestServer t;
    String session;

    OfficeWeb(TestServer t) {
        this.t = t;
    }

    static String email(String company) {
        return company.toLowerCase(java.util.Locale.ROOT).replaceAll("[^a-z]", "") + "@saltreed.example";
    }

    /** Logs in as the company's office account (made by {@link TestServer#company}); asserts success. */
    OfficeWeb login(String company) throws Exception {
        TestServer.Response r = tryLogin(email(company), PASSWORD);
        assertEquals(303, r.status(), r.text());
        String cookie = r.headers().firstValue("set-cookie").orElseThrow();
        session = cookie.substring(cookie.indexOf('=') + 1, cookie.indexOf(';'));
        return this;
    }

    TestServer.Response tryLogin(String email, String password) throws Exception {
        TestServer.Response page = t.get("/office/login", null);
        assertEquals(200, page.status(), page.text());
        String c = page.headers().firstValue("set-cookie").orElseThrow();
        String pre = c.substring(0, c.indexOf(';'));
        return t.send("POST", "/office/login", null, form("csrf", csrf(page.text()), "email", email, "password", password),
                Map.of("Cookie", pre, "Content-Type", "application/x-www-form-urlencoded"));
    }

    static String csrf(String html) {
        Matcher m = CSRF.matcher(html);
        if (!m.find()) {
            throw new AssertionError("no CSRF field in the page: " + html);
        }
        return m.group(1).replace("&amp;", "&");
    }

    TestServer.Response get(String path) throws Exception {
        return t.send("GET", path, null, null, session == null ? Map.of() : Map.of("Cookie", OfficePages.SESSION_COOKIE + "=" + session));
    }

    /** Posts a form with this session's CSRF token (read from the people page, as a browser would). */
    TestServer.Response post(String path, String... fields) throws Exception {
        String token = csrf(get("/office/people").text());
        String[] all = new String[fields.length + 2];
        all[0] = "csrf";
        all[1] = token;
        System.arraycopy(fields, 0, all, 2, fields.length);
        return postRaw(path, form(all));
    }

    TestServer.Response postRaw(String path, byte[] body) throws Exception {
        Map<String, String> h = new LinkedHashMap<>();
        h.put("Content-Type", "application/x-www-form-urlencoded");
        if (session != null) {
            h.put("Cookie", OfficePages.SESSION_COOKIE + "=" + session);
        }
        return t.send("POST", path, null, body, h);
    }

    static byte[] form(String... kv) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < kv.length; i += 2) {
            if (b.length() > 0) {
                b.append('&');
            }
            b.append(URLEncoder.encode(kv[i], StandardCharsets.UTF_8)).append('=')
                    .append(URLEncoder.encode(kv[i + 1], StandardCharsets.UTF_8));
        }
        return b.toString().getBytes(StandardCharsets.UTF_8);
    }

    /** An invented visit with a named site, address and technician, and one full reading set. */
    record Made(Site site, HvacSystem system, Visit visit, ReadingSet readings) {
        List<JsonObject> records() {
            return List.of(Wire.record(SyncKind.SITE, site.id(), WireCodec.body(site), Wire.T),
                    Wire.record(SyncKind.SYSTEM, system.id(), WireCodec.body(system), Wire.T),
                    Wire.record(SyncKind.VISIT, visit.id(), WireCodec.body(visit), Wire.T),
                    Wire.record(SyncKind.READINGS, readings.id(), WireCodec.body(readings), Wire.T));
        }
    }

    static Made visit(String siteName, String address, String technician) {
        String site = Wire.id();
        String system = Wire.id();
        String visit = Wire.id();
        Site s = new Site(site, siteName, address, 10, "");
        HvacSystem sy = TestRecords.system(system, site);
        Visit base = TestRecords.visit(visit, site, system);
        Visit v = new Visit(visit, site, system, base.startedAt(), technician, VisitPurpose.FOLLOW_UP, "");
        return new Made(s, sy, v, TestRecords.fullReadingSet(Wire.id(), visit, 1));
    }

    static void push(TestServer t, TestServer.Device d, Made m) throws Exception {
        TestServer.Response r = t.post("/api/v1/sync/push", d, Wire.push(m.records()));
        assertEquals(200, r.status(), r.text());
        for (var e : r.object().getAsJsonArray("results")) {
            assertEquals("stored", e.getAsJsonObject().get("status").getAsString(), r.text());
        }
    }
}
