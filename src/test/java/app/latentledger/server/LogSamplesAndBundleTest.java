package app.latentledger.server;

import app.latentledger.bundle.BundleContent;
import app.latentledger.bundle.Bundles;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.store.Ledger;
import app.latentledger.store.TestRecords;
import app.latentledger.sync.wire.SyncKind;
import app.latentledger.sync.wire.WireCodec;
import app.latentledger.sync.wire.WireHash;
import com.google.gson.JsonObject;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A log's samples move in chunks and resume; a wrong offset gets 409, a wrong SHA-256 422. And the
 * round trip: a visit made on one tablet, pushed, downloaded as a bundle and imported on another,
 * equals the first tablet's own export of it, record by record (compared by canonical hash).
 */
class LogSamplesAndBundleTest {
    private static TestServer t;
    private static TestServer.Device tablet;
    private static TestServer.Device other;

    @BeforeAll
    static void start() throws Exception {
        t = TestServer.start(LogSamplesAndBundleTest.class);
        t.company("Saltreed Cooling");
        t.company("Heron Spit Air");
        tablet = t.enrol("Saltreed Cooling", "Alice Marsh", "Tablet 1");
        other = t.enrol("Heron Spit Air", "Mal Reed", "Tablet 9");
    }

    @AfterAll
    static void stop() throws Exception {
        if (t != null) {
            t.close();
        }
    }

    private static JsonObject status(String logId) throws Exception {
        TestServer.Response r = t.get("/api/v1/logs/" + logId + "/samples/status", tablet);
        assertEquals(200, r.status(), r.text());
        return r.object();
    }

    private static TestServer.Response put(String logId, long offset, byte[] chunk) throws Exception {
        return t.send("PUT", "/api/v1/logs/" + logId + "/samples?offset=" + offset, tablet, chunk,
                Map.of("Content-Type", "text/csv"));
    }

    private static ImportedLog pushedLog(int samples) throws Exception {
        Wire.Visit4 v = Wire.Visit4.fresh();
        ImportedLog log = Wire.log(v.visit(), samples);
        List<JsonObject> records = new ArrayList<>(v.records(Wire.T));
        records.add(Wire.logRecord(log, Wire.T));
        TestServer.Response r = t.post("/api/v1/sync/push", tablet, Wire.push(records));
        assertEquals(200, r.status(), r.text());
        assertEquals("stored", r.object().getAsJsonArray("results").get(4).getAsJsonObject().get("status").getAsString(),
                r.text());
        return log;
    }

    @Test
    void samplesResumeAfterABreakAndAWrongOffsetGets409() throws Exception {
        assertEquals(404, t.get("/api/v1/logs/" + Wire.id() + "/samples/status", tablet).status(),
                "no log record pushed: 404");
        ImportedLog log = pushedLog(3000);
        byte[] all = Wire.samples(log);
        assertTrue(all.length > 3 * 1024, "several chunks: " + all.length);
        assertEquals(0, status(log.id()).get("receivedBytes").getAsLong());
        int chunk = all.length / 3;
        assertEquals(200, put(log.id(), 0, Arrays.copyOfRange(all, 0, chunk)).status());
        // the connection broke; the tablet asks where it stands and goes on from there
        assertEquals(chunk, status(log.id()).get("receivedBytes").getAsLong());
        TestServer.Response wrong = put(log.id(), 0, Arrays.copyOfRange(all, 0, chunk));
        assertEquals(409, wrong.status(), "the first chunk again: not where the upload stands");
        assertEquals(chunk, wrong.object().get("receivedBytes").getAsLong());
        assertEquals(409, put(log.id(), chunk + 5, Arrays.copyOfRange(all, chunk + 5, all.length)).status());
        TestServer.Response bad = put(log.id(), -1, new byte[] {1});
        assertEquals(400, bad.status());
        assertEquals("offset", bad.object().get("field").getAsString());
        TestServer.Response past = put(log.id(), chunk, Arrays.copyOf(Arrays.copyOfRange(all, chunk, all.length),
                all.length - chunk + 10));
        assertEquals(400, past.status(), "past the declared size");
        assertEquals("body", past.object().get("field").getAsString());
        assertEquals(409, t.get("/api/v1/logs/" + log.id() + "/samples", tablet).status(), "not complete yet");
        TestServer.Response last = put(log.id(), chunk, Arrays.copyOfRange(all, chunk, all.length));
        assertEquals(200, last.status(), last.text());
        assertTrue(last.object().get("complete").getAsBoolean());
        assertTrue(status(log.id()).get("complete").getAsBoolean());
        TestServer.Response whole = t.get("/api/v1/logs/" + log.id() + "/samples", tablet);
        assertEquals(200, whole.status());
        assertArrayEquals(all, whole.body());
        TestServer.Response rest = t.send("GET", "/api/v1/logs/" + log.id() + "/samples", tablet, null,
                Map.of("Range", "bytes=" + chunk + "-"));
        assertEquals(206, rest.status());
        assertArrayEquals(Arrays.copyOfRange(all, chunk, all.length), rest.body());
        assertEquals(404, t.get("/api/v1/logs/" + log.id() + "/samples", other).status(), "another company: 404");
        assertTrue(t.sql("select count(*) from audit where action = 'samples-complete' and record_id = '" + log.id() + "'")
                == 1);
    }

    @Test
    void samplesThatDoNotMatchTheirHashAreDroppedWith422() throws Exception {
        ImportedLog log = pushedLog(200);
        byte[] all = Wire.samples(log);
        byte[] corrupt = all.clone();
        corrupt[corrupt.length / 2] ^= 1;
        TestServer.Response r = put(log.id(), 0, corrupt);
        assertEquals(422, r.status(), r.text());
        assertEquals("samplesSha256", r.object().get("field").getAsString());
        assertEquals(0, status(log.id()).get("receivedBytes").getAsLong(), "chunks dropped: send again from 0");
        assertEquals(0, t.sql("select count(*) from log_sample_chunk where log_id = '" + log.id() + "'"));
        assertEquals(200, put(log.id(), 0, all).status());
        assertTrue(status(log.id()).get("complete").getAsBoolean());
        TestServer.Response big = put(log.id(), 0, new byte[LogSamples.MAX_CHUNK + 1]);
        assertEquals(400, big.status());
        assertEquals("body", big.object().get("field").getAsString());
    }

    @Test
    void aVisitThroughTheServerEqualsAnExportOfIt(@TempDir Path dir) throws Exception {
        Wire.Visit4 ids = Wire.Visit4.fresh();
        Site site = TestRecords.site(ids.site());
        HvacSystem system = TestRecords.system(ids.system(), ids.site());
        Visit visit = TestRecords.visit(ids.visit(), ids.site(), ids.system());
        ReadingSet before = TestRecords.fullReadingSet(ids.readings(), ids.visit(), 1);
        ReadingSet after = TestRecords.minimalReadingSet(Wire.id(), ids.visit());
        ImportedLog log = TestRecords.log(Wire.id(), ids.visit(), 900);
        Path exported = dir.resolve("export.zip");
        try (Ledger a = Ledger.open(dir.resolve("tablet-a"))) {
            a.sites().save(site);
            a.systems().save(system);
            a.visits().save(visit);
            a.readings().save(before);
            a.readings().save(after);
            a.logs().save(log);
            // tablet A pushes what its ledger holds, read back through the codec as its sync would
            List<JsonObject> records = List.of(
                    Wire.record(SyncKind.SITE, site.id(), WireCodec.body(a.sites().find(site.id()).orElseThrow()), Wire.T),
                    Wire.record(SyncKind.SYSTEM, system.id(), WireCodec.body(a.systems().find(system.id()).orElseThrow()),
                            Wire.T),
                    Wire.record(SyncKind.VISIT, visit.id(), WireCodec.body(a.visits().find(visit.id()).orElseThrow()), Wire.T),
                    Wire.record(SyncKind.READINGS, before.id(), WireCodec.body(before), Wire.T),
                    Wire.record(SyncKind.READINGS, after.id(), WireCodec.body(after), Wire.T),
                    Wire.logRecord(a.logs().forVisit(visit.id()).get(0), Wire.T));
            TestServer.Response r = t.post("/api/v1/sync/push", tablet, Wire.push(records));
            assertEquals(200, r.status(), r.text());
            r.object().getAsJsonArray("results").forEach(e -> assertEquals("stored",
                    e.getAsJsonObject().get("status").getAsString(), e.toString()));
            TestServer.Response early = t.get("/api/v1/visits/" + visit.id() + "/bundle", tablet);
            assertEquals(409, early.status(), "the log's samples are not in yet: " + early.text());
            assertEquals(200, put(log.id(), 0, WireCodec.samples(a.logs().forVisit(visit.id()).get(0))).status());
            Bundles.exportVisit(a, visit.id(), exported);
        }
        TestServer.Response download = t.get("/api/v1/visits/" + visit.id() + "/bundle", tablet);
        assertEquals(200, download.status(), download.text());
        assertEquals("application/zip", download.headers().firstValue("Content-Type").orElse(""));
        Path fromServer = dir.resolve("server.zip");
        Files.write(fromServer, download.body());
        try (Ledger b = Ledger.open(dir.resolve("tablet-b")); Ledger c = Ledger.open(dir.resolve("tablet-c"))) {
            Bundles.importBundle(b, fromServer);
            Bundles.importBundle(c, exported);
            assertEquals(canonical(Bundles.ofVisit(c, visit.id())), canonical(Bundles.ofVisit(b, visit.id())));
        }
        assertEquals(404, t.get("/api/v1/visits/" + visit.id() + "/bundle", other).status());
    }

    /** Every record of the content as kind:canonical-hash, in order (saved results left out: not synced). */
    private static List<String> canonical(BundleContent b) {
        List<String> out = new ArrayList<>();
        out.add("site:" + WireHash.of(WireCodec.body(b.site())));
        b.systems().forEach(s -> out.add("system:" + WireHash.of(WireCodec.body(s))));
        b.visits().forEach(v -> out.add("visit:" + WireHash.of(WireCodec.body(v))));
        b.readings().stream().map(r -> "readings:" + WireHash.of(WireCodec.body(r))).sorted().forEach(out::add);
        b.logs().forEach(l -> out.add("log:" + WireHash.of(WireCodec.body(l))));
        assertEquals(2, b.readings().size());
        assertEquals(1, b.logs().size());
        return out;
    }
}
