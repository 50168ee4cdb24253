package app.latentledger.server;

import app.latentledger.store.TestRecords;
import app.latentledger.sync.wire.SyncKind;
import app.latentledger.sync.wire.WireCodec;
import app.latentledger.sync.wire.WireHash;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.time.Instant;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Push, changes and history on a real PostgreSQL: idempotent, per-record refusals, revisions kept. */
class SyncPushTest {
    private static TestServer t;
    private static TestServer.Device tablet1;
    private static TestServer.Device tablet2;

    @BeforeAll
    static void start() throws Exception {
        t = TestServer.start(SyncPushTest.class);
        t.company("Saltreed Cooling");
        tablet1 = t.enrol("Saltreed Cooling", "Alice Marsh", "Tablet 1");
        tablet2 = t.enrol("Saltreed Cooling", "Bo Tidewell", "Tablet 2");
    }

    @AfterAll
    static void stop() throws Exception {
        if (t != null) {
            t.close();
        }
    }

    private static JsonArray push(TestServer.Device d, List<JsonObject> records) throws Exception {
        TestServer.Response r = t.post("/api/v1/sync/push", d, Wire.push(records));
        assertEquals(200, r.status(), r.text());
        JsonArray results = r.object().getAsJsonArray("results");
        assertEquals(records.size(), results.size(), "one result per record, in order");
        return results;
    }

    private static String status(JsonArray results, int i) {
        return results.get(i).getAsJsonObject().get("status").getAsString();
    }

    private long revisions(String kind, String id) throws Exception {
        return t.sql("select count(*) from record_revision where kind = '" + kind + "' and id = '" + id + "'");
    }

    @Test
    void aRetriedPushNeverDuplicates() throws Exception {
        Wire.Visit4 v = Wire.Visit4.fresh();
        JsonArray first = push(tablet1, v.records(Wire.T));
        for (int i = 0; i < 4; i++) {
            assertEquals("stored", status(first, i));
            assertEquals(1, first.get(i).getAsJsonObject().get("revision").getAsInt());
        }
        JsonArray again = push(tablet1, v.records(Wire.T));
        for (int i = 0; i < 4; i++) {
            assertEquals("unchanged", status(again, i));
        }
        assertEquals(1, revisions("readings", v.readings()));
        assertEquals(1, revisions("site", v.site()));
        // every stored revision was audited with its device, the retry added nothing
        assertEquals(4, t.sql("select count(*) from audit where action = 'push' and device_id = '" + tablet1.deviceId()
                + "' and record_id in ('" + v.site() + "','" + v.system() + "','" + v.visit() + "','" + v.readings() + "')"));
    }

    @Test
    void anOutOfRangeRecordIsRefusedWithFieldValueAndRangeAndTheRestLands() throws Exception {
        Wire.Visit4 v = Wire.Visit4.fresh();
        List<JsonObject> records = new ArrayList<>(v.records(Wire.T));
        String badSite = Wire.id();
        JsonObject body = WireCodec.body(TestRecords.site(badSite));
        body.addProperty("elevationM", 99_999);
        records.add(1, Wire.record(SyncKind.SITE, badSite, body, Wire.T));
        JsonArray results = push(tablet1, records);
        assertEquals("stored", status(results, 0));
        assertEquals("refused", status(results, 1));
        JsonObject refused = results.get(1).getAsJsonObject().getAsJsonObject("refused");
        // the core's name for the field, as the keypad and a bundle import name it
        assertTrue(refused.get("field").getAsString().contains("elevation"), refused.toString());
        assertTrue(refused.get("value").getAsString().contains("99999"), refused.toString());
        assertFalse(refused.get("range").getAsString().isEmpty(), refused.toString());
        assertTrue(results.get(1).getAsJsonObject().get("revision").isJsonNull());
        for (int i = 2; i < 5; i++) {
            assertEquals("stored", status(results, i), "the rest of the push lands");
        }
        assertEquals(0, revisions("site", badSite));
    }

    @Test
    void aBodyThatDoesNotMatchItsHashOrAChildWithoutParentIsRefused() throws Exception {
        Wire.Visit4 v = Wire.Visit4.fresh();
        List<JsonObject> records = v.records(Wire.T);
        JsonObject tampered = records.get(0).deepCopy();
        tampered.getAsJsonObject("body").addProperty("name", "Changed after hashing");
        // the system's site is neither in this push nor on the server
        JsonArray results = push(tablet1, List.of(tampered, records.get(1)));
        assertEquals("refused", status(results, 0));
        assertEquals("hash", results.get(0).getAsJsonObject().getAsJsonObject("refused").get("field").getAsString());
        assertEquals("refused", status(results, 1));
        JsonObject refused = results.get(1).getAsJsonObject().getAsJsonObject("refused");
        assertEquals("siteId", refused.get("field").getAsString());
        assertEquals(v.site(), refused.get("value").getAsString());
    }

    @Test
    void twoTabletsEditingOneRecordKeepBothRevisionsAndTheNewestIsCurrent() throws Exception {
        Wire.Visit4 v = Wire.Visit4.fresh();
        push(tablet1, v.records(Wire.T));
        Instant early = Wire.T.plusSeconds(60);
        Instant late = Wire.T.plusSeconds(120);
        JsonObject byBo = WireCodec.body(TestRecords.site(v.site()));
        byBo.addProperty("notes", "gate code 1234 (Bo)");
        JsonObject byAlice = WireCodec.body(TestRecords.site(v.site()));
        byAlice.addProperty("notes", "dog in yard (Alice)");
        // Bo's later edit arrives first; Alice's earlier one afterwards must not take over
        JsonArray r2 = push(tablet2, List.of(Wire.record(SyncKind.SITE, v.site(), byBo, late)));
        assertEquals("stored", status(r2, 0));
        JsonArray r1 = push(tablet1, List.of(Wire.record(SyncKind.SITE, v.site(), byAlice, early)));
        assertEquals("kept-as-revision", status(r1, 0));

        TestServer.Response h = t.get("/api/v1/records/site/" + v.site() + "/history", tablet1);
        assertEquals(200, h.status(), h.text());
        JsonArray revisions = h.object().getAsJsonArray("revisions");
        assertEquals(3, revisions.size(), h.text());
        JsonObject current = null;
        Set<String> authors = new HashSet<>();
        for (var e : revisions) {
            JsonObject o = e.getAsJsonObject();
            authors.add(o.get("author").getAsString());
            if (o.get("current").getAsBoolean()) {
                assertTrue(current == null, "one current revision");
                current = o;
            }
        }
        assertEquals(Set.of("Alice Marsh", "Bo Tidewell"), authors);
        assertEquals(WireHash.of(byBo), current.get("hash").getAsString(), "the latest edit is current");
        assertEquals(tablet2.deviceId(), current.get("device").getAsString());

        // the changes list carries the current one
        JsonObject site = find(changesFrom("0"), "site", v.site());
        assertEquals("gate code 1234 (Bo)", site.getAsJsonObject("body").get("notes").getAsString());
    }

    @Test
    void aDeletionMovesTheRecordToTheBinAndPushingItAgainRestoresIt() throws Exception {
        Wire.Visit4 v = Wire.Visit4.fresh();
        push(tablet1, v.records(Wire.T));
        JsonArray d = push(tablet1, List.of(Wire.deletion(SyncKind.READINGS, v.readings(), Wire.T.plusSeconds(10))));
        assertEquals("stored", status(d, 0));
        JsonObject seen = find(changesFrom("0"), "readings", v.readings());
        assertTrue(seen.get("deleted").getAsBoolean());
        assertTrue(seen.get("body").isJsonNull());
        JsonObject restore = v.records(Wire.T.plusSeconds(20)).get(3);
        assertEquals("stored", status(push(tablet1, List.of(restore)), 0));
        assertFalse(find(changesFrom("0"), "readings", v.readings()).get("deleted").getAsBoolean());
        // deleting again (same fixed hash, a later time) is a new revision, not "unchanged"
        assertEquals("stored", status(push(tablet1, List.of(Wire.deletion(SyncKind.READINGS, v.readings(),
                Wire.T.plusSeconds(30)))), 0));
        assertEquals(4, revisions("readings", v.readings()));
    }

    @Test
    void changesPageWithACursorAndParentsComeBeforeChildren() throws Exception {
        String start = endCursor();
        Wire.Visit4 v = Wire.Visit4.fresh();
        push(tablet1, v.records(Wire.T));
        // the site is edited after its children were made: its new change comes after theirs
        JsonObject edited = WireCodec.body(TestRecords.site(v.site()));
        edited.addProperty("notes", "edited later");
        push(tablet2, List.of(Wire.record(SyncKind.SITE, v.site(), edited, Wire.T.plusSeconds(5))));
        List<JsonObject> seen = new ArrayList<>();
        String cursor = start;
        int pages = 0;
        boolean more = true;
        while (more) {
            JsonObject page = changes(cursor, 1);
            JsonArray records = page.getAsJsonArray("records");
            Set<String> onPage = new HashSet<>();
            for (var e : records) {
                JsonObject o = e.getAsJsonObject();
                String kind = o.get("kind").getAsString();
                // every parent named is on this page before it, or on an earlier one
                for (var p : SyncService.parentsOf(new SyncService.Current(kind, "", 0, "", Wire.T, false,
                        o.get("body").isJsonNull() ? null : o.getAsJsonObject("body"), null, null, 0)).entrySet()) {
                    String key = p.getKey() + "/" + p.getValue();
                    assertTrue(onPage.contains(key) || seen.stream().anyMatch(s -> key.equals(
                            s.get("kind").getAsString() + "/" + s.get("id").getAsString())),
                            kind + " came before its parent " + key);
                }
                onPage.add(kind + "/" + o.get("id").getAsString());
            }
            records.forEach(e -> seen.add(e.getAsJsonObject()));
            more = page.get("more").getAsBoolean();
            String next = page.get("cursor").getAsString();
            assertTrue(Long.parseLong(next) > Long.parseLong(cursor), "the cursor moves on");
            cursor = next;
            pages++;
        }
        assertEquals(4, pages, "limit 1: one change per page");
        assertEquals("edited later", find(seen, "site", v.site()).getAsJsonObject("body").get("notes").getAsString());
        assertEquals(0, changes(cursor, 10).getAsJsonArray("records").size(), "nothing after the last cursor");
    }

    @Test
    void badParametersAreRefusedNamingFieldValueAndRange() throws Exception {
        String[][] cases = {
                {"/api/v1/sync/changes?after=-4", "after", "-4"},
                {"/api/v1/sync/changes?after=abc", "after", "abc"},
                {"/api/v1/sync/changes?limit=0", "limit", "0"},
                {"/api/v1/sync/changes?limit=1001", "limit", "1001"},
                {"/api/v1/records/snapshot/x/history", "kind", "snapshot"},
        };
        for (String[] c : cases) {
            TestServer.Response r = t.get(c[0], tablet1);
            assertEquals(400, r.status(), c[0]);
            assertEquals(c[1], r.object().get("field").getAsString(), c[0]);
            assertEquals(c[2], r.object().get("value").getAsString(), c[0]);
            assertFalse(r.object().get("range").getAsString().isEmpty(), c[0]);
        }
        String[][] pushes = {
                {"not json", "body"},
                {"{\"records\": 5}", "records"},
                {"{\"records\": []}", "records"},
        };
        for (String[] p : pushes) {
            TestServer.Response r = t.post("/api/v1/sync/push", tablet1, p[0]);
            assertEquals(400, r.status(), p[0]);
            assertEquals(p[1], r.object().get("field").getAsString(), p[0]);
        }
        List<JsonObject> many = new ArrayList<>();
        for (int i = 0; i < 501; i++) {
            many.add(Wire.record(SyncKind.SITE, Wire.id(), WireCodec.body(TestRecords.site("s")), Wire.T));
        }
        TestServer.Response r = t.post("/api/v1/sync/push", tablet1, Wire.push(many));
        assertEquals(400, r.status());
        assertEquals("501", r.object().get("value").getAsString());
        // a record that cannot be read is refused alone, naming its field
        JsonArray results = push(tablet1, List.of(com.google.gson.JsonParser.parseString(
                "{\"kind\": \"planet\", \"id\": \"x\", \"hash\": \"h\", \"editedAt\": \"2026-01-01T00:00:00Z\"}")
                .getAsJsonObject()));
        assertEquals("refused", status(results, 0));
        assertEquals("kind", results.get(0).getAsJsonObject().getAsJsonObject("refused").get("field").getAsString());
        assertEquals(404, t.get("/api/v1/records/site/" + Wire.id() + "/history", tablet1).status());
    }

    private static JsonObject changes(String after, int limit) throws Exception {
        TestServer.Response r = t.get("/api/v1/sync/changes?after=" + after + "&limit=" + limit, tablet1);
        assertEquals(200, r.status(), r.text());
        return r.object();
    }

    private static List<JsonObject> changesFrom(String after) throws Exception {
        List<JsonObject> all = new ArrayList<>();
        JsonObject page;
        String cursor = after;
        do {
            page = changes(cursor, 1000);
            page.getAsJsonArray("records").forEach(e -> all.add(e.getAsJsonObject()));
            cursor = page.get("cursor").getAsString();
        } while (page.get("more").getAsBoolean());
        return all;
    }

    /** The cursor after everything there is now. */
    private static String endCursor() throws Exception {
        JsonObject page;
        String cursor = "0";
        do {
            page = changes(cursor, 1000);
            cursor = page.get("cursor").getAsString();
        } while (page.get("more").getAsBoolean());
        return cursor;
    }

    private static JsonObject find(List<JsonObject> records, String kind, String id) {
        JsonObject found = null;
        for (JsonObject o : records) {
            if (o.get("kind").getAsString().equals(kind) && o.get("id").getAsString().equals(id)) {
                found = o;
            }
        }
        assertTrue(found != null, "no " + kind + " " + id + " in the changes");
        return found;
    }
}
