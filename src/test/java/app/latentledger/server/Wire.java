package app.latentledger.server;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.store.TestRecords;
import app.latentledger.sync.wire.SyncKind;
import app.latentledger.sync.wire.WireCodec;
import app.latentledger.sync.wire.WireRecord;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

import java.time.Instant;
import java.util.List;
import java.util.UUID;

/** Pushes for the tests, made with the shared wire codec from invented records (store.TestRecords). */
final class Wire {
    static final Instant T = Instant.parse("2026-06-03T12:15:30Z");

    private Wire() {
    }

    static String id() {
        return UUID.randomUUID().toString();
    }

    /** One site, system, visit and reading set, parents first. */
    record Visit4(String site, String system, String visit, String readings) {
        static Visit4 fresh() {
            return new Visit4(id(), id(), id(), id());
        }

        List<JsonObject> records(Instant at) {
            Site s = TestRecords.site(site);
            HvacSystem sy = TestRecords.system(system, site);
            Visit v = TestRecords.visit(visit, site, system);
            ReadingSet r = TestRecords.fullReadingSet(readings, visit, 1);
            return List.of(record(SyncKind.SITE, site, WireCodec.body(s), at),
                    record(SyncKind.SYSTEM, system, WireCodec.body(sy), at),
                    record(SyncKind.VISIT, visit, WireCodec.body(v), at),
                    record(SyncKind.READINGS, readings, WireCodec.body(r), at));
        }
    }

    static JsonObject record(SyncKind kind, String id, JsonObject body, Instant editedAt) {
        return WireCodec.toJson(WireRecord.of(kind, id, body, null, editedAt));
    }

    static JsonObject deletion(SyncKind kind, String id, Instant editedAt) {
        return WireCodec.toJson(WireRecord.deletion(kind, id, null, editedAt));
    }

    static JsonObject logRecord(ImportedLog log, Instant editedAt) {
        return record(SyncKind.LOG, log.id(), WireCodec.body(log), editedAt);
    }

    static byte[] samples(ImportedLog log) {
        return WireCodec.samples(log);
    }

    static ImportedLog log(String visitId, int samples) {
        return TestRecords.log(id(), visitId, samples);
    }

    static String push(List<JsonObject> records) {
        JsonArray a = new JsonArray();
        records.forEach(a::add);
        JsonObject o = new JsonObject();
        o.add("records", a);
        return o.toString();
    }
}
