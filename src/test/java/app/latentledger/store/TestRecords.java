package app.latentledger.store;

import app.latentledger.core.measure.AirflowBasis;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.CoilTemperatureKind;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.measure.ProbeMatch;
import app.latentledger.core.records.Airflow;
import app.latentledger.core.records.CoilTemperature;
import app.latentledger.core.records.Condensate;
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

import java.time.OffsetDateTime;
import java.util.List;

/** Invented test records (test data only; values are plausible field readings, not references). */
public final class TestRecords {
    public static final OffsetDateTime T0 = OffsetDateTime.parse("2024-06-03T08:15:30-04:00");

    private TestRecords() {
    }

    public static Site site(String id) {
        return new Site(id, "Test site " + id, "1 Test Lane, Saltreed", 10, "");
    }

    public static HvacSystem system(String id, String siteId) {
        return new HvacSystem(id, siteId, "Test system", SystemType.TWO_STAGE, 7033.7, "R-410A", "ECM", "auto", "");
    }

    public static Visit visit(String id, String siteId, String systemId) {
        return new Visit(id, siteId, systemId, T0, "Test Tech", VisitPurpose.FOLLOW_UP, "test visit");
    }

    /** Every optional part filled, so a round trip exercises every column. */
    public static ReadingSet fullReadingSet(String id, String visitId, int n) {
        return new ReadingSet(id, visitId, T0.plusMinutes(n), "set " + n, "probe A; psychrometer B",
                new Measurement(24.1 + n * 1e-3, 0.3), new HumidityReading(HumidityKind.WET_BULB, new Measurement(18.2, 0.3)),
                new Measurement(13.3, 0.3), new HumidityReading(HumidityKind.RELATIVE_HUMIDITY, new Measurement(91.5, 2)),
                new Measurement(31.0, 0.3), new HumidityReading(HumidityKind.DEW_POINT, new Measurement(23.9, 0.5)),
                new CoilTemperature(CoilTemperatureKind.COIL_SURFACE, new Measurement(8.4, 0.6)),
                new Airflow(new Measurement(0.5664, 0.0566), AirflowPoint.LEAVING, "traverse", AirflowBasis.STANDARD),
                new Measurement(101_200, 300),
                new Condensate(new Measurement(850e-6, 17e-6), new Measurement(900, 5)),
                "notes, with a comma and \"quotes\"\nand a second line", new ProbeMatch(true, 0.25));
    }

    /** Only what is required. */
    public static ReadingSet minimalReadingSet(String id, String visitId) {
        return new ReadingSet(id, visitId, T0, "", "",
                new Measurement(24, 0.3), new HumidityReading(HumidityKind.RELATIVE_HUMIDITY, new Measurement(55, 2)),
                new Measurement(13, 0.3), new HumidityReading(HumidityKind.RELATIVE_HUMIDITY, new Measurement(90, 2)),
                null, null, null, null, null, null, "");
    }

    /** A small log with a missing sample (NaN) in one channel. */
    public static ImportedLog log(String id, String visitId, int samples) {
        long[] t = new long[samples];
        double[] db = new double[samples];
        double[] fan = new double[samples];
        for (int i = 0; i < samples; i++) {
            t[i] = 1_717_416_000_000L + i * 1000L;
            db[i] = 24 + Math.sin(i / 300.0);
            fan[i] = (i / 600) % 2;
        }
        if (samples > 3) {
            db[3] = Double.NaN;
        }
        return new ImportedLog(id, visitId, "logger-07.csv", "T1=return_db; F=fan", T0,
                new LogSamples(TimeBase.EPOCH, t, List.of(new LogChannel("return_db", "°C", db),
                        new LogChannel("fan", "on/off", fan))));
    }
}
