package app.latentledger.server;

import com.google.gson.JsonObject;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Who may call what: no token, an unknown, revoked or expired token → 401 on every API route;
 * another company's token → 404 on this company's record ids (never 403: it must not learn they
 * exist); enrol codes are single use and expire (the rate limit: {@link EnrolRateLimitTest}).
 */
class AccessRulesTest {
    private static TestServer t;
    private static TestServer.Device alice;
    private static TestServer.Device mallory;
    private static Wire.Visit4 visit;
    private static String logId;

    @BeforeAll
    static void start() throws Exception {
        t = TestServer.start(AccessRulesTest.class, 1000);
        t.company("Saltreed Cooling");
        t.company("Heron Spit Air");
        alice = t.enrol("Saltreed Cooling", "Alice Marsh", "Tablet 1");
        mallory = t.enrol("Heron Spit Air", "Mal Reed", "Tablet 9");
        visit = Wire.Visit4.fresh();
        var log = Wire.log(visit.visit(), 50);
        logId = log.id();
        List<JsonObject> records = new java.util.ArrayList<>(visit.records(Wire.T));
        records.add(Wire.logRecord(log, Wire.T));
        TestServer.Response r = t.post("/api/v1/sync/push", alice, Wire.push(records));
        assertEquals(200, r.status(), r.text());
        r = t.send("PUT", "/api/v1/logs/" + logId + "/samples?offset=0", alice, Wire.samples(log), Map.of());
        assertEquals(200, r.status(), r.text());
    }

    @AfterAll
    static void stop() throws Exception {
        if (t != null) {
            t.close();
        }
    }

    /** Every route that needs a token, as (method, path). */
    private static List<String[]> apiRoutes() {
        return List.of(new String[] {"POST", "/api/v1/sync/push"}, new String[] {"GET", "/api/v1/sync/changes"},
                new String[] {"GET", "/api/v1/records/visit/" + visit.visit() + "/history"},
                new String[] {"GET", "/api/v1/logs/" + logId + "/samples/status"},
                new String[] {"PUT", "/api/v1/logs/" + logId + "/samples?offset=0"},
                new String[] {"GET", "/api/v1/logs/" + logId + "/samples"},
                new String[] {"GET", "/api/v1/visits/" + visit.visit() + "/bundle"});
    }

    private static TestServer.Response call(String[] route, TestServer.Device d) throws Exception {
        byte[] body = route[0].equals("GET") ? null : "{}".getBytes(StandardCharsets.UTF_8);
        return t.send(route[0], route[1], d, body, Map.of());
    }

    @Test
    void everyApiRouteRefusesAMissingOrForgedToken() throws Exception {
        TestServer.Device forged = new TestServer.Device(alice.deviceId() + ".not-the-secret", alice.deviceId());
        TestServer.Device garbage = new TestServer.Device("garbage", "");
        for (String[] route : apiRoutes()) {
            for (TestServer.Device d : new TestServer.Device[] {null, forged, garbage}) {
                TestServer.Response r = call(route, d);
                assertEquals(401, r.status(), route[0] + " " + route[1] + " with " + d + ": " + r.text());
                assertEquals("unauthorised", r.object().get("error").getAsString());
                assertTrue(r.object().get("message").getAsString().length() > 10);
            }
        }
    }

    @Test
    void anotherCompanysTokenGets404OnThisCompanysRecords() throws Exception {
        for (String[] route : apiRoutes()) {
            if (route[1].startsWith("/api/v1/sync/")) {
                continue; // not about one record: checked below by what the changes list holds
            }
            TestServer.Response r = call(route, mallory);
            assertEquals(404, r.status(), route[0] + " " + route[1] + ": " + r.text());
            assertFalse(r.text().contains("Saltreed"), r.text());
        }
        // the owner sees them
        assertEquals(200, t.get("/api/v1/records/visit/" + visit.visit() + "/history", alice).status());
        assertEquals(200, t.get("/api/v1/visits/" + visit.visit() + "/bundle", alice).status());
        // the other company's changes hold none of them
        TestServer.Response changes = t.get("/api/v1/sync/changes?after=0", mallory);
        assertEquals(200, changes.status());
        assertEquals(0, changes.object().getAsJsonArray("records").size(), changes.text());
    }

    @Test
    void aChildPointingAtAnotherCompanysParentIsRefusedAsMissing() throws Exception {
        Wire.Visit4 theirs = Wire.Visit4.fresh();
        // Mallory's system names Alice's site: to Heron Spit Air that site does not exist
        JsonObject body = app.latentledger.sync.wire.WireCodec.body(
                app.latentledger.store.TestRecords.system(theirs.system(), visit.site()));
        JsonObject system = Wire.record(app.latentledger.sync.wire.SyncKind.SYSTEM, theirs.system(), body, Wire.T);
        TestServer.Response r = t.post("/api/v1/sync/push", mallory, Wire.push(List.of(system)));
        assertEquals(200, r.status(), r.text());
        JsonObject result = r.object().getAsJsonArray("results").get(0).getAsJsonObject();
        assertEquals("refused", result.get("status").getAsString());
        assertEquals("siteId", result.getAsJsonObject("refused").get("field").getAsString());
        assertEquals(visit.site(), result.getAsJsonObject("refused").get("value").getAsString());
    }

    @Test
    void aRevokedDeviceGets401AtOnce() throws Exception {
        TestServer.Device d = t.enrol("Saltreed Cooling", "Alice Marsh", "Tablet 2");
        assertEquals(200, t.get("/api/v1/sync/changes", d).status());
        assertTrue(t.accounts.revokeDevice(java.util.UUID.fromString(d.deviceId())));
        for (String[] route : apiRoutes()) {
            assertEquals(401, call(route, d).status(), route[1]);
        }
        assertEquals(1, t.sql("select count(*) from audit where action = 'revoke-device' and device_id = '"
                + d.deviceId() + "'"));
    }

    @Test
    void anExpiredDeviceTokenGets401() throws Exception {
        TestServer.Device d = t.enrol("Saltreed Cooling", "Alice Marsh", "Tablet 3");
        assertEquals(200, t.get("/api/v1/sync/changes", d).status());
        t.sql("update device set expires_at = now() - interval '1 second' where id = '" + d.deviceId() + "'");
        for (String[] route : apiRoutes()) {
            assertEquals(401, call(route, d).status(), route[1]);
        }
    }

    @Test
    void anEnrolCodeWorksOnceAndTheTokenIsStoredOnlyHashed() throws Exception {
        String code = t.accounts.createEnrolCode("Saltreed Cooling", "Bo Tidewell", "technician");
        JsonObject in = new JsonObject();
        in.addProperty("code", code.toLowerCase(java.util.Locale.ROOT));
        in.addProperty("deviceName", "Tablet 4");
        TestServer.Response first = t.post("/api/v1/enrol", null, in.toString());
        assertEquals(200, first.status(), first.text());
        JsonObject o = first.object();
        assertEquals("Saltreed Cooling", o.get("company").getAsString());
        assertEquals("Bo Tidewell", o.get("technician").getAsString());
        assertEquals("technician", o.get("role").getAsString());
        String token = o.get("token").getAsString();
        // the database holds an Argon2id hash, never the token or its secret
        assertEquals(0, t.sql("select count(*) from device where token_hash like '%" + token.substring(37, 50) + "%'"));
        assertEquals(1, t.sql("select count(*) from device where id = '" + o.get("deviceId").getAsString()
                + "' and token_hash like '$argon2id$%'"));
        TestServer.Response again = t.post("/api/v1/enrol", null, in.toString());
        assertEquals(401, again.status(), again.text());
        assertFalse(t.accessLogText().contains(code), "the code never reaches the access log");
        assertFalse(t.accessLogText().contains(token.substring(37)), "the token never reaches the access log");
    }

    @Test
    void anExpiredEnrolCodeIsRefused() throws Exception {
        String code = t.accounts.createEnrolCode("Saltreed Cooling", "Cy Fenn", "technician");
        t.sql("update enrol_code set expires_at = now() - interval '1 second' where selector = '"
                + code.substring(0, 4) + "'");
        JsonObject in = new JsonObject();
        in.addProperty("code", code);
        in.addProperty("deviceName", "Tablet 5");
        assertEquals(401, t.post("/api/v1/enrol", null, in.toString()).status());
    }

    @Test
    void enrolRefusesBadInputNamingTheField() throws Exception {
        TestServer.Response r = t.post("/api/v1/enrol", null, "{\"code\": \"12\", \"deviceName\": \"T\"}");
        assertEquals(400, r.status());
        assertEquals("code", r.object().get("field").getAsString());
        assertEquals("12", r.object().get("value").getAsString());
        assertTrue(r.object().get("range").getAsString().contains("XXXX-XXXX-XXXX"));
        r = t.post("/api/v1/enrol", null, "{\"code\": \"ABCD-EFGH-JKMN\", \"deviceName\": \"\"}");
        assertEquals(400, r.status());
        assertEquals("deviceName", r.object().get("field").getAsString());
        r = t.post("/api/v1/enrol", null, "not json");
        assertEquals(400, r.status());
        assertEquals("body", r.object().get("field").getAsString());
    }

    @Test
    void healthNeedsNothingAndReadyChecksTheDatabase() throws Exception {
        TestServer.Response h = t.get("/health", null);
        assertEquals(200, h.status());
        assertEquals("up", h.object().get("status").getAsString());
        TestServer.Response r = t.get("/ready", null);
        assertEquals(200, r.status());
        assertEquals(405, t.post("/health", null, "{}").status());
        assertEquals(404, t.get("/nothing-here", null).status());
    }

    @Test
    void theAccessLogHasOneJsonLinePerRequestWithTheDevice() throws Exception {
        t.get("/api/v1/sync/changes?after=0&limit=7", alice);
        // the line is written once the answer has gone out, so it may land a moment after the client has it
        String mine = null;
        for (long until = System.nanoTime() + 5_000_000_000L; mine == null && System.nanoTime() < until; ) {
            for (String line : t.accessLogText().split("\n")) {
                JsonObject o = com.google.gson.JsonParser.parseString(line).getAsJsonObject();
                assertTrue(o.has("time") && o.has("method") && o.has("status") && o.has("ms"), line);
                assertFalse(o.get("path").getAsString().contains("?"), line);
                if (o.get("path").getAsString().equals("/api/v1/sync/changes") && o.get("status").getAsInt() == 200
                        && o.has("device") && o.get("device").getAsString().equals(alice.deviceId())) {
                    mine = line;
                }
            }
            if (mine == null) {
                Thread.sleep(20);
            }
        }
        assertNotNull(mine, "a line for the request with the caller's device:\n" + t.accessLogText());
    }
}
