package app.latentledger.core.records;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.HumidityKind;
import org.junit.jupiter.api.Test;

import java.time.OffsetDateTime;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Bad input refused at the record boundary, each message naming the field. */
class RecordsValidationTest {
    private static final OffsetDateTime T = OffsetDateTime.parse("2024-07-16T10:05:00-04:00");

    @Test
    void negativeNominalCapacityIsRefusedWithFieldAndRange() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new HvacSystem("s1", "site1", "Main",
                SystemType.SINGLE_STAGE, -3 * 3516.85, "", "", "", ""));
        assertEquals("system nominal capacity", e.field());
        // shown in tons in IP: 1 ton = 12 000 Btu/h = 3516.85 W (common practice, no source)
        assertTrue(e.message(app.latentledger.core.units.UnitSystem.IP).contains("-3 tons"), e.getMessage());
    }

    @Test
    void unknownPurposeNamesTheFieldAndTheChoices() {
        InvalidRecordException e = assertThrows(InvalidRecordException.class,
                () -> VisitPurpose.parse("visit purpose", "inspection"));
        assertEquals("visit purpose", e.field());
        assertTrue(e.getMessage().contains("'inspection' is not one of complaint, commissioning, before, after, follow-up"),
                e.getMessage());
        assertEquals(VisitPurpose.FOLLOW_UP, VisitPurpose.parse("visit purpose", "Follow_Up"));
    }

    @Test
    void missingSiteOnAVisitIsRefused() {
        InvalidRecordException e = assertThrows(InvalidRecordException.class,
                () -> new Visit("v1", null, "sys1", T, "Tech", VisitPurpose.COMPLAINT, ""));
        assertEquals("visit site", e.field());
        assertEquals("visit site refused: missing", e.getMessage());
    }

    @Test
    void aSiteTimeZoneMustBeARegionIdAndTheRefusalSaysWhatIsAccepted() {
        InvalidRecordException e = assertThrows(InvalidRecordException.class,
                () -> new Site("s", "x", "", 0, "", "America/Chicagoo"));
        assertEquals("site time zone", e.field());
        assertTrue(e.getMessage().contains("'America/Chicagoo'") && e.getMessage().contains("America/Chicago,"),
                e.getMessage());
        // a fixed offset would read a summer log an hour off once the clocks change
        assertEquals("site time zone", assertThrows(InvalidRecordException.class,
                () -> new Site("s", "x", "", 0, "", "-05:00")).field());
        assertEquals("America/Chicago", new Site("s", "x", "", 0, "", " america/chicago ").timeZone());
        assertEquals("", new Site("s", "x", "", 0, "", null).timeZone());
        assertEquals("", new Site("s", "x", "", 0, "").timeZone());
        assertEquals("America/Regina", new Site("s", "x", "", 0, "", "America/Regina").zone().orElseThrow().getId());
    }

    @Test
    void missingNameAndBadIdsAreRefused() {
        assertEquals("site name", assertThrows(InvalidRecordException.class,
                () -> new Site("s", "  ", "", 0, "")).field());
        assertEquals("site id", assertThrows(InvalidRecordException.class,
                () -> new Site("../etc", "x", "", 0, "")).field());
        assertEquals("site elevation", assertThrows(InvalidInputException.class,
                () -> new Site("s", "x", "", 9000, "")).field());
    }

    @Test
    void readingsOutOfRangeNameTheirField() {
        Measurement ok = new Measurement(24, 0.3);
        HumidityReading rh = new HumidityReading(HumidityKind.RELATIVE_HUMIDITY, new Measurement(55, 2));
        assertEquals("supply rh", assertThrows(InvalidInputException.class, () -> new ReadingSet("r", "v", T, "", "",
                ok, rh, ok, new HumidityReading(HumidityKind.RELATIVE_HUMIDITY, new Measurement(104, 2)),
                null, null, null, null, null, null, "")).field());
        assertEquals("return dry bulb tolerance", assertThrows(InvalidInputException.class, () -> new ReadingSet("r", "v", T,
                "", "", new Measurement(24, 30), rh, ok, rh, null, null, null, null, null, null, "")).field());
        assertEquals("airflow", assertThrows(InvalidInputException.class, () -> new ReadingSet("r", "v", T, "", "",
                ok, rh, ok, rh, null, null, null,
                new Airflow(new Measurement(0, 0), AirflowPoint.ENTERING, ""), null, null, "")).field());
        assertEquals("outdoor dry bulb", assertThrows(InvalidRecordException.class, () -> new ReadingSet("r", "v", T, "", "",
                ok, rh, ok, rh, null, rh, null, null, null, null, "")).field());
        assertEquals("return humidity", assertThrows(InvalidRecordException.class, () -> new ReadingSet("r", "v", T, "", "",
                ok, null, ok, rh, null, null, null, null, null, null, "")).field());
        assertEquals("condensate collection time", assertThrows(InvalidInputException.class, () -> new ReadingSet("r", "v",
                T, "", "", ok, rh, ok, rh, null, null, null, null, null,
                new Condensate(new Measurement(1e-3, 0), new Measurement(2, 0)), "")).field());
    }

    @Test
    void measurementRefusesNaNAndNegativeTolerance() {
        assertThrows(InvalidRecordException.class, () -> new Measurement(Double.NaN, 0));
        assertThrows(InvalidRecordException.class, () -> new Measurement(1, -0.1));
    }

    @Test
    void logSamplesMustLineUp() {
        assertThrows(InvalidRecordException.class, () -> new LogSamples(TimeBase.ELAPSED, new long[] {0, 1000},
                java.util.List.of(new LogChannel("return_db", "°C", new double[] {1}))));
        assertThrows(InvalidRecordException.class, () -> new LogSamples(TimeBase.ELAPSED, new long[] {1000, 0},
                java.util.List.of()));
        assertThrows(InvalidRecordException.class, () -> new ImportedLog("l", "v", "../x.csv", "", T,
                new LogSamples(TimeBase.ELAPSED, new long[0], java.util.List.of())));
    }

    @Test
    void snapshotMustHoldAJsonObject() {
        assertEquals("snapshot results", assertThrows(InvalidRecordException.class, () -> new ResultsSnapshot("x",
                SnapshotSubject.READING_SET, "r", "1.0", T, "[1,2]")).field());
    }

    @Test
    void timesKeepSecondsAndOffset() {
        assertEquals("2024-07-16T10:05:00-04:00", Timestamps.text(T));
        Visit v = new Visit("v", "s", "y", T.plusNanos(123_456_789), "Tech", VisitPurpose.AFTER, null);
        assertEquals(T, v.startedAt());
        assertEquals("", v.notes());
    }
}
