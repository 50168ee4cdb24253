package app.latentledger.sync.wire;

import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.store.TestRecords;
import com.google.gson.JsonObject;
import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Refusals name field, value and range. The limits asserted are the project's own range table
 * (FieldLimits: relative humidity 0–100 %, elevation −450 to 4500 m) and the psychrometric fact
 * that a wet bulb cannot exceed its dry bulb (ASHRAE Handbook—Fundamentals 2017 ch. 1).
 */
class WireValidationTest {
    private static final Instant EDITED = Instant.parse("2024-06-03T12:20:00Z");
    private static final Site SITE = TestRecords.site("site-1");
    private static final HvacSystem SYSTEM = TestRecords.system("sys-1", "site-1");
    private static final Visit VISIT = TestRecords.visit("visit-1", "site-1", "sys-1");
    private static final WireValidation.Parents ALL = WireValidation.Parents.of(Map.of("site-1", SITE),
            Map.of("sys-1", SYSTEM), Map.of("visit-1", VISIT));

    private static WireRecord record(SyncKind kind, String id, JsonObject body) {
        return WireRecord.of(kind, id, body, null, EDITED);
    }

    @Test
    void aRelativeHumidityAbove100IsRefusedWithFieldValueAndRange() {
        JsonObject body = WireCodec.body(TestRecords.minimalReadingSet("rs-1", "visit-1"));
        body.addProperty("return_hum_value", 150);
        List<Refusal> r = WireValidation.check(record(SyncKind.READINGS, "rs-1", body));
        assertEquals(1, r.size(), r::toString);
        assertEquals("return rh", r.get(0).field());
        assertEquals("150 %", r.get(0).value());
        assertEquals("0 to 100 %", r.get(0).range());
        assertTrue(r.get(0).message().contains("150"), r.get(0).message());
    }

    @Test
    void anElevationOutOfRangeIsRefused() {
        JsonObject body = WireCodec.body(SITE);
        body.addProperty("elevationM", 9000);
        Refusal r = WireValidation.check(record(SyncKind.SITE, "site-1", body)).get(0);
        assertTrue(r.field().contains("elevation"), r.field());
        assertEquals("9000 m", r.value());
        assertEquals("-450 to 4500 m", r.range());
    }

    @Test
    void aWetBulbAboveItsDryBulbIsRefusedOnceTheSiteIsKnown() {
        JsonObject body = WireCodec.body(TestRecords.minimalReadingSet("rs-1", "visit-1"));
        body.addProperty("return_hum_kind", "wet-bulb");
        body.addProperty("return_hum_value", 26.0);
        body.addProperty("return_hum_tol", 0.3);
        WireRecord r = record(SyncKind.READINGS, "rs-1", body);
        List<Refusal> refused = WireValidation.check(r, ALL);
        assertEquals(1, refused.size(), refused::toString);
        assertTrue(refused.get(0).field().contains("return"), refused.get(0).toString());
        assertEquals("26 °C", refused.get(0).value());
    }

    @Test
    void aRecordWhoseParentIsNowhereIsRefusedNamingTheParentField() {
        WireRecord visit = record(SyncKind.VISIT, "visit-2", WireCodec.body(TestRecords.visit("visit-2", "site-9", "sys-1")));
        Refusal r = WireValidation.check(visit, ALL).get(0);
        assertEquals("siteId", r.field());
        assertEquals("site-9", r.value());
        WireRecord log = record(SyncKind.LOG, "log-1", WireCodec.body(TestRecords.log("log-1", "visit-7", 10)));
        assertEquals("visitId", WireValidation.check(log, ALL).get(0).field());
        assertTrue(WireValidation.check(log).isEmpty(), "without parents only the record itself is checked");
    }

    @Test
    void aHashThatIsNotTheBodysIsRefused() {
        JsonObject body = WireCodec.body(SITE);
        WireRecord r = new WireRecord(SyncKind.SITE, "site-1", "0".repeat(64), null, EDITED, false, body);
        Refusal refusal = WireValidation.check(r).get(0);
        assertEquals("hash", refusal.field());
        assertEquals(WireHash.of(body), refusal.range());
    }

    @Test
    void aBodyWhoseIdIsNotTheRecordsIsRefused() {
        Refusal r = WireValidation.check(record(SyncKind.SITE, "site-2", WireCodec.body(SITE))).get(0);
        assertEquals("id", r.field());
    }

    @Test
    void aNonFiniteNumberIsRefused() {
        JsonObject body = WireCodec.body(SITE);
        body.addProperty("elevationM", Double.POSITIVE_INFINITY);
        WireRecord r = new WireRecord(SyncKind.SITE, "site-1", "0".repeat(64), null, EDITED, false, body);
        assertEquals("elevationM", WireValidation.check(r).get(0).field());
    }

    @Test
    void aMissingTextFieldIsRefusedNamingIt() {
        JsonObject body = WireCodec.body(VISIT);
        body.remove("technician");
        assertEquals("technician", WireValidation.check(record(SyncKind.VISIT, "visit-1", body)).get(0).field());
    }

    @Test
    void logSamplesOutOfRangeOrBackwardsInTimeAreRefused() {
        ImportedLog log = TestRecords.log("log-1", "visit-1", 20);
        String good = new String(WireCodec.samples(log), StandardCharsets.UTF_8);
        String hot = good.replace("\n1717416005000,", "\n1717416005000,500.0").replaceFirst(",500\\.0[0-9.E-]*,", ",500.0,");
        String backwards = good.replace("\n1717416005000,", "\n1717416001500,");
        for (String samples : List.of(hot, backwards)) {
            byte[] bytes = samples.getBytes(StandardCharsets.UTF_8);
            JsonObject body = WireCodec.body(log);
            body.addProperty("samplesBytes", bytes.length);
            body.addProperty("samplesSha256", WireHash.sha256(bytes));
            List<Refusal> r = WireValidation.checkSamples(record(SyncKind.LOG, "log-1", body), bytes);
            assertEquals(1, r.size(), samples);
            assertTrue(r.get(0).message().contains(samples == hot ? "500" : "earlier"), r.get(0).message());
        }
        byte[] bytes = good.getBytes(StandardCharsets.UTF_8);
        JsonObject body = WireCodec.body(log);
        body.addProperty("samplesSha256", "0".repeat(64));
        assertEquals("samplesSha256", WireValidation.checkSamples(record(SyncKind.LOG, "log-1", body), bytes).get(0).field());
    }
}
