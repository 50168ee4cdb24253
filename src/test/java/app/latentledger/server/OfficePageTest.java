package app.latentledger.server;

import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.report.PlainWords;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static app.latentledger.server.OfficeHtml.esc;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The office page over HTTP against the real PostgreSQL: login and sessions, CSRF refusal, search,
 * the visit page's verdicts and findings, downloads, technicians and devices, and the access rules
 * (another company's ids → 404, not logged in → the login page, a technician cannot log in).
 */
class OfficePageTest {
    private static final String SCRIPT_SITE = "<script>alert('x')</script> Brine Works";
    private static TestServer t;
    private static TestServer.Device alice;
    private static TestServer.Device mallory;
    private static OfficeWeb.Made scripted;
    private static OfficeWeb.Made plain;
    private static OfficeWeb.Made theirs;

    @BeforeAll
    static void start() throws Exception {
        t = TestServer.start(OfficePageTest.class, 1000);
        t.company("Saltreed Cooling");
        t.company("Heron Spit Air");
        alice = t.enrol("Saltreed Cooling", "Alice Marsh", "Tablet 1");
        mallory = t.enrol("Heron Spit Air", "Mal Reed", "Tablet 9");
        scripted = OfficeWeb.visit(SCRIPT_SITE, "4 Kelp Row, Saltreed", "Alice Marsh");
        plain = OfficeWeb.visit("Gull Point Bakery", "17 Tidewater Road, Saltreed", "Bram Oyster");
        theirs = OfficeWeb.visit("Heron Spit Chandlery", "2 Quay Steps, Saltreed", "Mal Reed");
        OfficeWeb.push(t, alice, scripted);
        OfficeWeb.push(t, alice, plain);
        OfficeWeb.push(t, mallory, theirs);
    }

    @AfterAll
    static void stop() throws Exception {
        if (t != null) {
            t.close();
        }
    }

    @Test
    void withoutASessionEveryPageSendsToTheLoginPage() throws Exception {
        OfficeWeb anon = new OfficeWeb(t);
        for (String path : List.of("/office", "/office/people", "/office/visits/" + scripted.visit().id(),
                "/office/visits/" + scripted.visit().id() + "/bundle", "/office/visits/" + scripted.visit().id() + "/report.pdf")) {
            TestServer.Response r = anon.get(path);
            assertEquals(303, r.status(), path);
            assertEquals("/office/login", r.headers().firstValue("location").orElseThrow(), path);
        }
        anon.session = "made-up-session-token-of-forty-characters";
        assertEquals(303, anon.get("/office").status());
        assertEquals(303, anon.postRaw("/office/devices/revoke", OfficeWeb.form("device", alice.deviceId())).status());
    }

    @Test
    void loginSetsAStrictHttpOnlyCookieAndRefusesWrongPasswordsAndTechnicians() throws Exception {
        OfficeWeb web = new OfficeWeb(t);
        TestServer.Response ok = web.tryLogin(OfficeWeb.email("Saltreed Cooling"), OfficeWeb.PASSWORD);
        assertEquals(303, ok.status(), ok.text());
        String cookie = ok.headers().firstValue("set-cookie").orElseThrow();
        assertTrue(cookie.startsWith(OfficePages.SESSION_COOKIE + "="), cookie);
        assertTrue(cookie.contains("HttpOnly") && cookie.contains("SameSite=Strict"), cookie);
        assertFalse(cookie.contains("Secure"), "plain HTTP on loopback: no Secure flag, " + cookie);
        // only a hash of the token is stored
        String token = cookie.substring(cookie.indexOf('=') + 1, cookie.indexOf(';'));
        assertEquals(0, t.sql("select count(*) from office_session where token_hash = '" + token + "'"));
        assertEquals(1, t.sql("select count(*) from office_session where token_hash = '"
                + Secrets.sha256(token.getBytes(StandardCharsets.UTF_8)) + "'"));

        TestServer.Response wrong = web.tryLogin(OfficeWeb.email("Saltreed Cooling"), "not the password at all");
        assertEquals(401, wrong.status());
        assertTrue(wrong.text().contains("do not match an office account"), wrong.text());
        assertEquals(401, web.tryLogin("nobody@saltreed.example", OfficeWeb.PASSWORD).status());

        // a technician with an e-mail and a password still cannot log in to the office page
        t.sql("update person set email = 'alice@saltreed.example', password_hash = '"
                + Secrets.hash(OfficeWeb.PASSWORD) + "' where name = 'Alice Marsh'");
        assertEquals(401, web.tryLogin("alice@saltreed.example", OfficeWeb.PASSWORD).status());
    }

    @Test
    void aLoginOrFormPostWithoutTheCsrfTokenIsRefused() throws Exception {
        TestServer.Response page = t.get("/office/login", null);
        String pre = page.headers().firstValue("set-cookie").orElseThrow();
        pre = pre.substring(0, pre.indexOf(';'));
        TestServer.Response r = t.send("POST", "/office/login", null, OfficeWeb.form("email", OfficeWeb.email("Saltreed Cooling"),
                "password", OfficeWeb.PASSWORD), Map.of("Cookie", pre, "Content-Type", "application/x-www-form-urlencoded"));
        assertEquals(403, r.status(), r.text());
        r = t.send("POST", "/office/login", null, OfficeWeb.form("csrf", "guessed-value-of-twenty-chars", "email",
                OfficeWeb.email("Saltreed Cooling"), "password", OfficeWeb.PASSWORD),
                Map.of("Cookie", pre, "Content-Type", "application/x-www-form-urlencoded"));
        assertEquals(403, r.status(), r.text());

        OfficeWeb web = new OfficeWeb(t).login("Saltreed Cooling");
        long people = t.sql("select count(*) from person");
        assertEquals(403, web.postRaw("/office/people/add", OfficeWeb.form("name", "Cora Pike")).status());
        assertEquals(403, web.postRaw("/office/people/add", OfficeWeb.form("csrf", "x", "name", "Cora Pike")).status());
        // another session's token is no good either
        OfficeWeb other = new OfficeWeb(t).login("Saltreed Cooling");
        String otherToken = OfficeWeb.csrf(other.get("/office/people").text());
        assertEquals(403, web.postRaw("/office/people/add", OfficeWeb.form("csrf", otherToken, "name", "Cora Pike")).status());
        assertEquals(403, web.postRaw("/office/logout", new byte[0]).status());
        assertEquals(people, t.sql("select count(*) from person"), "a refused form changed nothing");
    }

    @Test
    void searchFindsTheCompanysVisitsByNameAddressAndTechnicianAndEscapesEverything() throws Exception {
        OfficeWeb web = new OfficeWeb(t).login("Saltreed Cooling");
        String all = web.get("/office").text();
        assertTrue(all.contains(esc(SCRIPT_SITE)), all);
        assertTrue(all.contains("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt;"), all);
        assertFalse(all.contains("<script>"), "no raw script tag on the page");
        assertTrue(all.contains("Gull Point Bakery"));
        assertFalse(all.contains("Heron Spit Chandlery"), "another company's visit is not listed");

        String byAddress = web.get("/office?q=Tidewater").text();
        assertTrue(byAddress.contains("Gull Point Bakery") && !byAddress.contains("Brine Works"), byAddress);
        String byTech = web.get("/office?q=bram").text();
        assertTrue(byTech.contains("Gull Point Bakery") && !byTech.contains("Brine Works"), byTech);
        String byName = web.get("/office?q=" + java.net.URLEncoder.encode("<script>", StandardCharsets.UTF_8)).text();
        assertTrue(byName.contains("Brine Works") && !byName.contains("Gull Point"), byName);
        String theirName = web.get("/office?q=Chandlery").text();
        assertTrue(theirName.contains("No visit matches."), theirName);
        // a % is a letter to search for, not a wildcard
        assertTrue(web.get("/office?q=%25").text().contains("No visit matches."));

        TestServer.Response tooLong = web.get("/office?q=" + "a".repeat(201));
        assertEquals(400, tooLong.status());
        assertTrue(tooLong.text().contains("&quot;q&quot;") && tooLong.text().contains("0 to 200 characters"), tooLong.text());
    }

    @Test
    void theVisitPageShowsTheCoreVerdictAndFindingsOfEachReadingSet() throws Exception {
        OfficeWeb web = new OfficeWeb(t).login("Saltreed Cooling");
        TestServer.Response r = web.get("/office/visits/" + scripted.visit().id());
        assertEquals(200, r.status(), r.text());
        String html = r.text();
        assertFalse(html.contains("<script>"));
        assertTrue(html.contains(esc(SCRIPT_SITE)));
        // the page must say what the app's own coil check says on the same records (its numbers are tested elsewhere)
        CoilResult expected = ReadingSetCheck.run(scripted.readings(), scripted.system(), scripted.site(),
                ThresholdSettings.DEFAULTS, UnitSystem.SI);
        assertTrue(html.contains(esc(PlainWords.verdict(expected.verdict()))), html);
        for (Finding f : expected.findings()) {
            assertTrue(html.contains(esc(f.message())), f.code() + " missing: " + html);
            assertTrue(html.contains(f.code().key()), html);
        }
        assertEquals(expected.findings().size(), count(html, "<li class=\""), html);

        TestServer.Response bad = web.get("/office/visits/" + scripted.visit().id() + "?units=furlongs");
        assertEquals(400, bad.status());
        assertTrue(bad.text().contains("&quot;units&quot;") && bad.text().contains("furlongs")
                && bad.text().contains("si or ip"), bad.text());
    }

    private static int count(String s, String what) {
        Matcher m = Pattern.compile(Pattern.quote(what)).matcher(s);
        int n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }

    @Test
    void anotherCompanysVisitIsNotFoundOnEveryVisitPage() throws Exception {
        OfficeWeb heron = new OfficeWeb(t).login("Heron Spit Air");
        for (String tail : List.of("", "/bundle", "/report.pdf")) {
            TestServer.Response r = heron.get("/office/visits/" + scripted.visit().id() + tail);
            assertEquals(404, r.status(), tail + ": " + r.text());
            assertFalse(r.text().contains("Brine Works"));
        }
        assertEquals(200, heron.get("/office/visits/" + theirs.visit().id()).status());
        assertEquals(404, heron.get("/office/visits/no-such-visit").status());
    }

    @Test
    void theBundleAndTheReportDownload() throws Exception {
        OfficeWeb web = new OfficeWeb(t).login("Saltreed Cooling");
        TestServer.Response zip = web.get("/office/visits/" + plain.visit().id() + "/bundle");
        assertEquals(200, zip.status(), zip.text());
        assertEquals("application/zip", zip.headers().firstValue("content-type").orElseThrow());
        assertEquals('P', zip.body()[0]);
        assertEquals('K', zip.body()[1]);
        TestServer.Response pdf = web.get("/office/visits/" + plain.visit().id() + "/report.pdf");
        assertEquals(200, pdf.status(), pdf.text());
        assertEquals("application/pdf", pdf.headers().firstValue("content-type").orElseThrow());
        assertTrue(new String(pdf.body(), 0, 5, StandardCharsets.ISO_8859_1).startsWith("%PDF-"));
        try (var doc = org.apache.pdfbox.Loader.loadPDF(pdf.body())) {
            String text = new org.apache.pdfbox.text.PDFTextStripper().getText(doc);
            assertTrue(text.contains("Gull Point Bakery"), text);
        }
    }

    @Test
    void officeStaffAddATechnicianIssueACodeAndRevokeADevice() throws Exception {
        OfficeWeb web = new OfficeWeb(t).login("Saltreed Cooling");
        TestServer.Response added = web.post("/office/people/add", "name", "Cora <b>Pike</b>");
        assertEquals(303, added.status(), added.text());
        String people = web.get("/office/people").text();
        assertTrue(people.contains("Cora &lt;b&gt;Pike&lt;/b&gt;"), people);
        assertEquals(1, t.sql("select count(*) from audit where action = 'add-technician' and detail = 'Cora <b>Pike</b>'"));

        TestServer.Response empty = web.post("/office/people/add", "name", "   ");
        assertEquals(400, empty.status());
        assertTrue(empty.text().contains("&quot;name&quot;") && empty.text().contains("1 to 200 characters"), empty.text());
        TestServer.Response twice = web.post("/office/people/add", "name", "Cora <b>Pike</b>");
        assertEquals(400, twice.status());

        // the code is shown once and enrols a tablet through the API
        String cora = String.valueOf(t.sqlText("select id::text from person where name = 'Cora <b>Pike</b>'"));
        TestServer.Response code = web.post("/office/people/code", "person", cora);
        assertEquals(200, code.status(), code.text());
        Matcher m = Pattern.compile("id=\"enrol-code\">([0-9A-Z-]{14})<").matcher(code.text());
        assertTrue(m.find(), code.text());
        TestServer.Response enrolled = t.post("/api/v1/enrol", null, "{\"code\":\"" + m.group(1) + "\",\"deviceName\":\"Tablet 4\"}");
        assertEquals(200, enrolled.status(), enrolled.text());
        assertEquals("Cora <b>Pike</b>", enrolled.object().get("technician").getAsString());
        TestServer.Device coraTablet = new TestServer.Device(enrolled.object().get("token").getAsString(),
                enrolled.object().get("deviceId").getAsString());
        assertEquals(200, t.get("/api/v1/sync/changes", coraTablet).status());
        assertTrue(web.get("/office/people").text().contains("Tablet 4"));

        // bad and foreign ids
        assertEquals(400, web.post("/office/people/code", "person", "not-an-id").status());
        String heronPerson = String.valueOf(t.sqlText("select p.id::text from person p join company c on c.id = p.company_id"
                + " where c.name = 'Heron Spit Air' and p.role = 'technician'"));
        assertEquals(404, web.post("/office/people/code", "person", heronPerson).status());
        assertEquals(404, web.post("/office/devices/revoke", "device", mallory.deviceId()).status());
        assertEquals(200, t.get("/api/v1/sync/changes", mallory).status(), "another company's device untouched");

        // revoke: the token answers 401 on the API at once, and the office person is in the audit row
        TestServer.Response revoked = web.post("/office/devices/revoke", "device", coraTablet.deviceId());
        assertEquals(303, revoked.status(), revoked.text());
        assertEquals(401, t.get("/api/v1/sync/changes", coraTablet).status());
        assertEquals(1, t.sql("select count(*) from audit a join person p on p.id = a.person_id where a.action ="
                + " 'revoke-device' and a.device_id = '" + coraTablet.deviceId() + "' and p.role = 'office'"));
        assertEquals(404, web.post("/office/devices/revoke", "device", coraTablet.deviceId()).status(), "only once");
        assertEquals(400, web.post("/office/devices/revoke", "device", "12345").status());
    }

    @Test
    void logOutEndsTheSessionOnTheServer() throws Exception {
        OfficeWeb web = new OfficeWeb(t).login("Saltreed Cooling");
        assertEquals(200, web.get("/office").status());
        TestServer.Response out = web.post("/office/logout");
        assertEquals(303, out.status());
        assertTrue(out.headers().firstValue("set-cookie").orElseThrow().contains("Max-Age=0"));
        assertEquals(303, web.get("/office").status(), "the old cookie opens nothing");
    }

    @Test
    void pagesSendNoScriptPolicyAndAreNotCached() throws Exception {
        OfficeWeb web = new OfficeWeb(t).login("Saltreed Cooling");
        TestServer.Response r = web.get("/office");
        assertTrue(r.headers().firstValue("content-security-policy").orElseThrow().contains("default-src 'none'"));
        assertEquals("no-store", r.headers().firstValue("cache-control").orElseThrow());
        assertEquals(405, t.send("PUT", "/office", null, new byte[0],
                Map.of("Cookie", OfficePages.SESSION_COOKIE + "=" + web.session)).status());
    }
}
