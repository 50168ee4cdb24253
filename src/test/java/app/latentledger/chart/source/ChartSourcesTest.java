package app.latentledger.chart.source;

import app.latentledger.chart.psychro.CoilProcessOverlay;
import app.latentledger.chart.timeline.TimelineData;
import app.latentledger.core.coil.AirReading;
import app.latentledger.core.coil.CoilCheck;
import app.latentledger.core.coil.CoilReadings;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.cycles.RunCycleAnalysis;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.measure.AirflowPoint;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.psychro.StandardAtmosphere;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.io.logcsv.LogCsvImporter;
import app.latentledger.io.logcsv.LogImport;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The charts draw exactly what the analyses found. */
class ChartSourcesTest {
    private static double f(double fahrenheit) {
        return Quantity.TEMPERATURE.fromDisplay(UnitSystem.IP, fahrenheit);
    }

    /**
     * The 1200 cfm case of the coil issue (75 °F / 50 % to 55 °F / 90 % at sea level): its ADP is
     * 51.6 °F, computed in CoilCaseTest from PsychroLib 2.5.0 states; the overlay carries the coil
     * result's own numbers unchanged.
     */
    @Test
    void coilOverlayCarriesTheResultsStates() {
        CoilReadings readings = new CoilReadings(101_325,
                new AirReading("return", f(75), 0.5 / 1.8, HumidityKind.RELATIVE_HUMIDITY, 50, 2),
                new AirReading("supply", f(55), 0.5 / 1.8, HumidityKind.RELATIVE_HUMIDITY, 90, 2),
                Quantity.AIRFLOW.fromDisplay(UnitSystem.IP, 1200), 0.1, AirflowPoint.ENTERING,
                Double.NaN, 0, null, Double.NaN, null);
        CoilResult r = CoilCheck.run(readings, ThresholdSettings.DEFAULTS, UnitSystem.IP);
        CoilProcessOverlay o = CoilChartSource.overlay("Before", r);
        assertEquals(r.entering().humidityRatio(), o.entering().humidityRatio(), 0);
        assertEquals(r.leaving().dryBulbC(), o.leaving().dryBulbC(), 0);
        assertEquals(51.6, Quantity.TEMPERATURE.toDisplay(UnitSystem.IP, o.adpC()), 0.1);
        assertTrue(Double.isNaN(o.coilTempC()), "no measured coil temperature: only the ADP is drawn");
        assertEquals("Before return", o.entering().label());
    }

    @Test
    void timelineHasEveryCycleAndItsRunTime() throws Exception {
        LogImport imported = new LogCsvImporter(UnitSystem.IP, Map.of(), null)
                .read(Path.of("field-data-samples/oversized-short-cycling.csv"));
        double p = StandardAtmosphere.pressurePa(0);
        RunCycleReport report = new RunCycleAnalysis(ThresholdSettings.DEFAULTS)
                .analyse(imported.series(), p, Quantity.AIRFLOW.fromDisplay(UnitSystem.IP, 1400));
        TimelineData t = LogTimelineSource.timeline(imported.series(), report, p, UnitSystem.IP, "test");
        assertEquals(report.cycles().size(), t.cycles().size());
        assertEquals(imported.series().size(), t.size());
        double onSamples = 0;
        for (boolean on : t.compressorOn()) {
            onSamples += on ? 1 : 0;
        }
        double interval = imported.series().nominalIntervalS();
        assertEquals(report.runtimeFraction(), onSamples * interval / report.durationS(),
                report.cycles().size() * interval / report.durationS() + 1e-9, "run time within a sample per cycle");
        for (int i = 0; i < t.cycles().size(); i++) {
            assertEquals(report.cycles().get(i).removedKg(), t.cycles().get(i).removedKg(), 0);
        }
    }
}
