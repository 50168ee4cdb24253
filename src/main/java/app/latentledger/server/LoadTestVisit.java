package app.latentledger.server;

import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.records.HumidityReading;
import app.latentledger.core.records.HvacSystem;
import app.latentledger.core.records.ImportedLog;
import app.latentledger.core.records.LogChannel;
import app.latentledger.core.records.LogSamples;
import app.latentledger.core.records.Measurement;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.Site;
import app.latentledger.core.records.SystemType;
import app.latentledger.core.records.TimeBase;
import app.latentledger.core.records.Visit;
import app.latentledger.core.records.VisitPurpose;
import app.latentledger.sync.wire.SyncKind;
import app.latentledger.sync.wire.WireCodec;
import app.latentledger.sync.wire.WireRecord;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;

import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.List;
import java.util.UUID;

/**
 * One invented visit a simulated tablet syncs in the load test: a site in Saltreed, its system,
 * the visit, a before and an after reading set and a 24-hour log (a sample every 30 s, return and
 * supply dry bulb and the fan), as the shared wire codec writes them.
 */
final class LoadTestVisit {
    static final OffsetDateTime T0 = OffsetDateTime.parse("2026-06-03T08:00:00-04:00");
    /** 24 h at one sample every 30 s. */
    static final int SAMPLES = 24 * 120;

    final List<WireRecord> records;
    final String logId;
    final byte[] samples;

    LoadTestVisit(int tablet, int visit) {
        String site = UUID.randomUUID().toString();
        String system = UUID.randomUUID().toString();
        String visitId = UUID.randomUUID().toString();
        logId = UUID.randomUUID().toString();
        Site s = new Site(site, "Load test house " + tablet + "-" + visit, tablet + " Heron Lane, Saltreed", 12, "");
        HvacSystem sy = new HvacSystem(system, site, "Main", SystemType.SINGLE_STAGE, 10_550, "R-410A", "PSC", "on", "");
        Visit v = new Visit(visitId, site, system, T0, "Load Tech " + tablet, VisitPurpose.FOLLOW_UP, "load test");
        ReadingSet before = readings(visitId, 0, 24.4, 55);
        ReadingSet after = readings(visitId, 60, 23.9, 50);
        long[] t = new long[SAMPLES];
        double[] ret = new double[SAMPLES];
        double[] sup = new double[SAMPLES];
        double[] fan = new double[SAMPLES];
        long start = T0.toInstant().toEpochMilli();
        for (int i = 0; i < SAMPLES; i++) {
            t[i] = start + i * 30_000L;
            boolean on = (i / 40) % 3 != 2; // 20 min on, 10 min off
            fan[i] = on ? 1 : 0;
            ret[i] = 24 + 0.8 * Math.sin(i * 2 * Math.PI / SAMPLES);
            sup[i] = on ? 13.5 + 0.3 * Math.sin(i / 7.0) : ret[i] - 0.5;
        }
        ImportedLog log = new ImportedLog(logId, visitId, "logger-load.csv", "T1=return_db; T2=supply_db; F=fan", T0,
                new LogSamples(TimeBase.EPOCH, t, List.of(new LogChannel("return_db", "°C", ret),
                        new LogChannel("supply_db", "°C", sup), new LogChannel("fan", "on/off", fan))));
        Instant edited = Instant.now();
        records = List.of(WireRecord.of(SyncKind.SITE, site, WireCodec.body(s), null, edited),
                WireRecord.of(SyncKind.SYSTEM, system, WireCodec.body(sy), null, edited),
                WireRecord.of(SyncKind.VISIT, visitId, WireCodec.body(v), null, edited),
                WireRecord.of(SyncKind.READINGS, before.id(), WireCodec.body(before), null, edited),
                WireRecord.of(SyncKind.READINGS, after.id(), WireCodec.body(after), null, edited),
                WireRecord.of(SyncKind.LOG, logId, WireCodec.body(log), null, edited));
        samples = WireCodec.samples(log);
    }

    private static ReadingSet readings(String visitId, int minutes, double returnDb, double returnRh) {
        return new ReadingSet(UUID.randomUUID().toString(), visitId, T0.plusMinutes(minutes), "", "",
                new Measurement(returnDb, 0.3), new HumidityReading(HumidityKind.RELATIVE_HUMIDITY,
                new Measurement(returnRh, 2)), new Measurement(13, 0.3),
                new HumidityReading(HumidityKind.RELATIVE_HUMIDITY, new Measurement(90, 2)),
                null, null, null, null, null, null, "");
    }

    String pushBody() {
        JsonArray a = new JsonArray();
        records.forEach(r -> a.add(WireCodec.toJson(r)));
        JsonObject o = new JsonObject();
        o.add("records", a);
        return Reply.GSON.toJson(o);
    }
}
