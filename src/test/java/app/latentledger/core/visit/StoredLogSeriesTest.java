package app.latentledger.core.visit;

import app.latentledger.core.cycles.Channel;
import app.latentledger.core.cycles.LogSeries;
import app.latentledger.core.cycles.RunCycleAnalysis;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.psychro.StandardAtmosphere;
import app.latentledger.core.records.LogChannel;
import app.latentledger.core.records.LogSamples;
import app.latentledger.core.records.TimeBase;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.io.logcsv.LogCsvImporter;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A stored log read back for the analysis. The outside check is the importer: a field-data sample
 * read from its CSV, stored and read back, must give the analysis the same series and so the same
 * cycles as the file read directly.
 */
class StoredLogSeriesTest {

    @Test
    void storedAndReadBackGivesTheSameAnalysisAsTheFile() throws Exception {
        LogSeries fromFile = new LogCsvImporter(UnitSystem.IP, Map.of(), null)
                .read(Path.of("field-data-samples/oversized-short-cycling.csv")).series();
        LogSamples stored = StoredLogSeries.samples(fromFile);
        StoredLogSeries back = StoredLogSeries.of(stored, ZoneOffset.ofHours(-4));
        assertTrue(back.ignored().isEmpty(), back.ignored()::toString);
        assertEquals(fromFile.size(), back.series().size());
        assertEquals(fromFile.channels(), back.series().channels());
        for (int i = 0; i < fromFile.size(); i += 97) {
            assertEquals(fromFile.timeS(i), back.series().timeS(i), 1e-3, "time of sample " + i);
            assertEquals(fromFile.value(Channel.RETURN_DB, i), back.series().value(Channel.RETURN_DB, i), 0);
        }
        double p = StandardAtmosphere.pressurePa(0);
        double flow = Quantity.AIRFLOW.fromDisplay(UnitSystem.IP, 1400);
        RunCycleAnalysis analysis = new RunCycleAnalysis(ThresholdSettings.DEFAULTS);
        RunCycleReport a = analysis.analyse(fromFile, p, flow);
        RunCycleReport b = analysis.analyse(back.series(), p, flow);
        assertEquals(a.cycles().size(), b.cycles().size());
        assertEquals(a.cyclesPerHour(), b.cyclesPerHour(), 1e-9);
        assertEquals(a.latentFractionMeasured(), b.latentFractionMeasured(), 1e-9);
    }

    @Test
    void repeatedTimesUnknownFieldsAndForeignUnitsAreLeftOut() {
        long[] t = {0, 1000, 1000, 2000};
        LogSamples s = new LogSamples(TimeBase.ELAPSED, t, List.of(
                new LogChannel("return_db", "°C", new double[] {24, 24.1, 99, 24.2}),
                new LogChannel("supply_db", "°F", new double[] {55, 55, 55, 55}),
                new LogChannel("door_contact", "on/off", new double[] {0, 1, 1, 0}),
                new LogChannel("compressor", "on/off", new double[] {0, 0.9, 1, Double.NaN})));
        StoredLogSeries r = StoredLogSeries.of(s, null);
        LogSeries series = r.series();
        assertEquals(3, series.size(), "the repeated time is dropped, the first sample at it kept");
        assertEquals(24.1, series.value(Channel.RETURN_DB, 1), 0);
        assertFalse(series.has(Channel.SUPPLY_DB), "a supply in °F is not read as °C");
        assertEquals(2, r.ignored().size(), r.ignored()::toString);
        assertEquals(0, series.status(Channel.COMPRESSOR, 0));
        assertEquals(1, series.status(Channel.COMPRESSOR, 1), "0.9 counts as on");
        assertEquals(LogSeries.UNKNOWN, series.status(Channel.COMPRESSOR, 2), "NaN is unknown");
        assertNull(series.origin(), "an elapsed-seconds log has no clock");
    }

    @Test
    void epochLogsKeepTheirClockAtTheVisitOffset() {
        long first = 1_721_137_200_000L; // 2024-07-16T13:40:00Z, computed by hand: 19920 days × 86400 s + 13 h 40 min
        LogSamples s = new LogSamples(TimeBase.EPOCH, new long[] {first, first + 60_000},
                List.of(new LogChannel("return_db", "", new double[] {24, 24})));
        LogSeries series = StoredLogSeries.of(s, ZoneOffset.ofHours(-4)).series();
        assertEquals("2024-07-16T09:40:00-04:00", series.origin().label(0));
        assertEquals("2024-07-16T09:41:00-04:00", series.origin().label(60));
        assertEquals(60, series.timeS(1), 0);
    }

    @Test
    void aLogNeedsTwoDistinctTimes() {
        LogSamples s = new LogSamples(TimeBase.ELAPSED, new long[] {5, 5},
                List.of(new LogChannel("return_db", "°C", new double[] {24, 24})));
        assertThrows(IllegalArgumentException.class, () -> StoredLogSeries.of(s, null));
    }
}
