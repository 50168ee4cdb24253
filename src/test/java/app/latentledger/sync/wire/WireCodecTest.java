package app.latentledger.sync.wire;

import app.latentledger.bundle.BundleObjects;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPaperwork;
import app.latentledger.store.TestRecords;
import com.google.gson.JsonObject;
import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Every kind goes record → body → wire text → body → record and comes back equal. */
class WireCodecTest {
    private static final Instant EDITED = Instant.parse("2024-06-03T12:20:00Z");

    /** The record as the other end receives it: written as wire text and read back. */
    private static JsonObject overTheWire(SyncKind kind, String id, JsonObject body) {
        WireRecord sent = WireRecord.of(kind, id, body, null, EDITED);
        String text = WireCodec.GSON.toJson(WireCodec.toJson(sent));
        WireRecord received = WireCodec.fromJson(WireCodec.parse(text));
        assertEquals(sent.hash(), received.hash());
        assertEquals(sent.hash(), WireHash.of(received.body()), "the receiver computes the same hash");
        assertEquals(kind, received.kind());
        assertEquals(EDITED, received.editedAt());
        assertTrue(WireValidation.check(received).isEmpty(), () -> WireValidation.check(received).toString());
        return received.body();
    }

    @Test
    void siteSystemAndVisitRoundTrip() {
        Site site = TestRecords.site("site-1");
        HvacSystem system = TestRecords.system("sys-1", "site-1");
        Visit visit = TestRecords.visit("visit-1", "site-1", "sys-1");
        assertEquals(site, WireCodec.site(overTheWire(SyncKind.SITE, "site-1", WireCodec.body(site))));
        assertEquals(system, WireCodec.system(overTheWire(SyncKind.SYSTEM, "sys-1", WireCodec.body(system))));
        assertEquals(visit, WireCodec.visit(overTheWire(SyncKind.VISIT, "visit-1", WireCodec.body(visit))));
    }

    @Test
    void aSitesTimeZoneTravelsAndAnOlderBodyWithoutItIsStillAccepted() {
        Site zoned = TestRecords.site("site-1").withTimeZone("America/Chicago");
        JsonObject body = WireCodec.body(zoned);
        assertEquals("America/Chicago", body.get("timeZone").getAsString());
        assertEquals(zoned, WireCodec.site(overTheWire(SyncKind.SITE, "site-1", body)));
        // a site without a zone sends the body an older tablet sent, so its agreed hash stays the same
        Site plain = TestRecords.site("site-1");
        JsonObject older = new JsonObject();
        older.addProperty("id", plain.id());
        older.addProperty("name", plain.name());
        older.addProperty("address", plain.address());
        older.addProperty("elevationM", plain.elevationM());
        older.addProperty("notes", plain.notes());
        assertEquals(WireHash.of(older), WireHash.of(WireCodec.body(plain)));
        assertEquals(plain, WireCodec.site(overTheWire(SyncKind.SITE, "site-1", older)));
        // a zone that is not a region id is refused naming the field
        JsonObject bad = WireCodec.body(zoned);
        bad.addProperty("timeZone", "Central");
        List<Refusal> refused = WireValidation.check(WireRecord.of(SyncKind.SITE, "site-1", bad, null, EDITED));
        assertEquals(1, refused.size(), refused::toString);
        assertEquals("site time zone", refused.get(0).field());
        assertTrue(refused.get(0).message().contains("'Central'"), refused.get(0).message());
    }

    @Test
    void readingSetsRoundTripWithEveryColumnTyped() {
        ReadingSet full = TestRecords.fullReadingSet("rs-1", "visit-1", 3);
        ReadingSet minimal = TestRecords.minimalReadingSet("rs-2", "visit-1");
        JsonObject body = WireCodec.body(full);
        assertEquals(BundleObjects.readingColumns().size(), body.size(), "one member per readings.csv column");
        assertTrue(body.get("return_db_c").getAsJsonPrimitive().isNumber(), "numbers travel as JSON numbers");
        assertEquals(24.103, body.get("return_db_c").getAsDouble());
        assertEquals("wet-bulb", body.get("return_hum_kind").getAsString());
        assertEquals(full, WireCodec.readingSet(overTheWire(SyncKind.READINGS, "rs-1", body)));
        JsonObject small = WireCodec.body(minimal);
        assertTrue(small.get("coil_c").isJsonNull(), "an empty cell travels as null");
        assertEquals(minimal, WireCodec.readingSet(overTheWire(SyncKind.READINGS, "rs-2", small)));
    }

    @Test
    void aLogRoundTripsWithItsSamplesBytesAndChecksum() {
        ImportedLog log = TestRecords.log("log-1", "visit-1", 1200);
        JsonObject body = WireCodec.body(log);
        byte[] samples = WireCodec.samples(log);
        assertEquals(samples.length, body.get("samplesBytes").getAsLong());
        assertEquals(WireHash.sha256(samples), body.get("samplesSha256").getAsString());
        String csv = new String(samples, StandardCharsets.UTF_8);
        assertTrue(csv.startsWith("time_ms,return_db,fan\n1717416000000,"), csv.substring(0, 60));
        assertTrue(csv.contains("\n1717416003000,,0.0\n"), "a missing sample is an empty cell, as in a bundle");
        ImportedLog back = WireCodec.log(overTheWire(SyncKind.LOG, "log-1", body), samples);
        assertEquals(log, back);
        assertTrue(WireValidation.checkSamples(WireRecord.of(SyncKind.LOG, "log-1", body, null, EDITED), samples).isEmpty());
    }

    @Test
    void instrumentPaperworkAndHouseRoundTrip() {
        var instrument = WireSamples.instrument("inst-1", "visit-1");
        JsonObject ib = WireCodec.body(instrument, List.of("rs-1", "rs-2"));
        BundleObjects.InstrumentObject back = WireCodec.instrument(overTheWire(SyncKind.INSTRUMENT, "inst-1", ib));
        assertEquals(instrument, back.instrument());
        assertEquals(List.of("rs-1", "rs-2"), back.usedOn());

        VisitPaperwork w = WireSamples.paperwork("visit-1");
        assertEquals(w, WireCodec.paperwork(overTheWire(SyncKind.PAPERWORK, "visit-1", WireCodec.body(w))));

        HouseRecord h = WireSamples.house("visit-1", "site-1");
        JsonObject hb = WireCodec.body(h);
        assertTrue(hb.getAsJsonObject("facts").get("cfm50M3PerS").isJsonNull(), "a value not given travels as null");
        assertEquals(h, WireCodec.house(overTheWire(SyncKind.HOUSE, "visit-1", hb)));
        HouseRecord readingsOnly = new HouseRecord("visit-2", "site-1", null, h.readings());
        assertEquals(readingsOnly, WireCodec.house(overTheWire(SyncKind.HOUSE, "visit-2", WireCodec.body(readingsOnly))));
    }

    @Test
    void aDeletionTravelsWithoutABody() {
        WireRecord d = WireRecord.deletion(SyncKind.VISIT, "visit-1", "abc", EDITED);
        WireRecord back = WireCodec.fromJson(WireCodec.parse(WireCodec.GSON.toJson(WireCodec.toJson(d))));
        assertEquals(d, back);
        assertNull(back.body());
        assertTrue(WireCodec.GSON.toJson(WireCodec.toJson(d)).contains("\"body\":null"));
        assertTrue(WireValidation.check(back).isEmpty());
    }

    @Test
    void wireNamesAreTheContractsWords() {
        assertEquals(List.of("site", "system", "visit", "readings", "log", "instrument", "paperwork", "house"),
                java.util.Arrays.stream(SyncKind.values()).map(SyncKind::wire).toList());
        WireException e = assertThrows(WireException.class, () -> WireCodec.fromJson(WireCodec.parse(
                "{\"kind\":\"snapshot\",\"id\":\"x\",\"hash\":\"h\",\"editedAt\":\"2024-06-03T12:20:00Z\"}")));
        assertEquals("kind", e.refusal().field());
        assertEquals("snapshot", e.refusal().value());
    }
}
