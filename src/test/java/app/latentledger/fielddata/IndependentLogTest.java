package app.latentledger.fielddata;

import app.latentledger.core.cycles.RunCycleAnalysis;
import app.latentledger.core.cycles.RunCycleReport;
import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.FindingCode;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.fielddata.IndependentLog.Config;
import app.latentledger.fielddata.IndependentLog.StillAir;
import app.latentledger.fielddata.IndependentLog.Truth;
import app.latentledger.io.logcsv.DateOrder;
import app.latentledger.io.logcsv.LogCsvImporter;
import app.latentledger.io.logcsv.LogImport;
import app.latentledger.io.logcsv.LogRefusedException;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

import java.io.StringReader;
import java.time.ZoneId;
import java.util.Map;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The log analysis on logs it was not built from ({@link IndependentLog}): truth is the integral of
 * that model. Targets: returned-water share within ±10 percentage points of the truth with and
 * without status columns, with 1 K of blower heat and RH probe lag up to 60 s; cycle counts within
 * ±1; median run length within 1 min.
 */
class IndependentLogTest {
    static final RunCycleAnalysis ANALYSIS = new RunCycleAnalysis(ThresholdSettings.DEFAULTS);
    private static final Pattern NEGATIVE_SHARE = Pattern.compile("-\\s?\\d+(\\.\\d+)?\\s?%");

    static LogImport read(Truth t, UnitSystem units) throws Exception {
        return new LogCsvImporter(units, Map.of(), DateOrder.AUTO, ZoneId.of("UTC"), null)
                .read(new StringReader(t.csv()), t.csv().length());
    }

    static RunCycleReport analyse(Config c, Truth t) throws Exception {
        LogImport imp = read(t, c.celsius ? UnitSystem.SI : UnitSystem.IP);
        return ANALYSIS.analyse(imp.series(), c.pressurePa, c.airflowM3PerS,
                c.fanAirflowM3PerS == c.airflowM3PerS ? Double.NaN : c.fanAirflowM3PerS);
    }

    static Config delay(double delayS, boolean status, double heatK, double rhLagS, StillAir still) {
        Config c = new Config();
        c.onOff = new double[] {600, 900, 420, 1080, 900, 1500};
        c.repeats = 3;
        c.fanOffDelayS = delayS;
        c.statusColumns = status;
        c.blowerHeatK = heatK;
        c.supplyRhLagS = rhLagS;
        c.stillAir = still;
        c.seed = (long) (delayS * 7 + heatK * 13 + rhLagS + (status ? 1 : 0) + still.ordinal() * 101);
        return c;
    }

    private static void noUndefinedWords(RunCycleReport r) {
        for (Finding f : r.findings()) {
            for (String s : new String[] {f.message(), f.technical()}) {
                assertFalse(NEGATIVE_SHARE.matcher(s).find(), "negative share in: " + s);
                assertFalse(s.contains("NaN") || s.contains("Infinity"), "undefined ratio in: " + s);
            }
        }
    }

    @ParameterizedTest(name = "fan-off delay {0} s, status columns {1}, blower heat {2} K, RH lag {3} s, still air {4}")
    @CsvSource({
        "0, false, 0, 20, WARMS",
        "120, false, 1.0, 60, WARMS",
        "180, false, 1.0, 60, WARMS",
        "180, false, 1.0, 45, COOLS",
        "120, false, 0, 30, COOLS",
        "180, true, 1.0, 60, WARMS",
        "60, true, 0, 20, COOLS",
        "60, false, 1.0, 60, WARMS",
    })
    @DisplayName("fan-off delays: returned share within ±10 points of the integrated truth, runs ±1, median run ±1 min")
    void fanOffDelays(double delayS, boolean status, double heatK, double rhLagS, StillAir still) throws Exception {
        Config c = delay(delayS, status, heatK, rhLagS, still);
        Truth t = IndependentLog.generate(c);
        RunCycleReport r = analyse(c, t);
        double share = r.reevaporationShare();
        System.out.printf("delay %s status %s heat %s lag %s %s: truth share %.3f runs %d median %.0f | tool share %.3f"
                        + " runs %d median %.0f delay %.0f%n", delayS, status, heatK, rhLagS, still, t.share(), t.runs(),
                t.medianOnS(), share, r.cycles().size(), r.medianOnS(), r.fanOffDelayMedianS());
        assertEquals(t.share(), share, 0.10, "returned share");
        assertEquals(t.runs(), r.cycles().size(), 1, "runs");
        assertEquals(t.medianOnS(), r.medianOnS(), 60, "median run");
        noUndefinedWords(r);
    }

    /**
     * The hardest case found: a 1-minute fan-off delay, no status columns, 60 s RH lag, 1 K blower heat,
     * and a still-air supply that warms toward the return's enthalpy. The returned share is now within
     * the ±10-point target (above, since the stop is dated at the kink where the still-air drift
     * begins), but the stop itself is still found late: the lagging humidity probe keeps the enthalpy
     * moving for the whole minute the blower runs on, so the plateau is only recognised in still air
     * and the delay reads about 160 s instead of 60 s. Kept as a measured limit (docs/methods.md) so a
     * change that worsens it fails.
     */
    @Test
    @DisplayName("known limit: 60 s fan-off delay, warming still air, no status: the delay found is late by at most 2 min")
    void shortDelayWarmingStillAir() throws Exception {
        Config c = delay(60, false, 1.0, 60, StillAir.WARMS);
        Truth t = IndependentLog.generate(c);
        RunCycleReport r = analyse(c, t);
        double late = r.fanOffDelayMedianS() - 60;
        System.out.printf("known limit: truth %.3f tool %.3f delay found %.0f s%n", t.share(), r.reevaporationShare(),
                r.fanOffDelayMedianS());
        assertTrue(late >= 0 && late <= 120, "delay found late by " + late + " s");
        assertEquals(t.share(), r.reevaporationShare(), 0.10, "returned share");
        noUndefinedWords(r);
    }

    @ParameterizedTest(name = "blower left on, status columns {0}, fan-only airflow {1} m³/s")
    @CsvSource({"false, 0.57", "true, 0.57", "false, 0.34", "true, 0.34"})
    @DisplayName("continuous blower (fan ON), with a slower fan-only speed given: share within ±10 points, finding says fan AUTO")
    void continuousBlower(boolean status, double fanFlow) throws Exception {
        Config c = delay(0, status, 1.0, 60, StillAir.WARMS);
        c.continuousFan = true;
        c.fanAirflowM3PerS = fanFlow;
        Truth t = IndependentLog.generate(c);
        RunCycleReport r = analyse(c, t);
        System.out.printf("continuous status %s fan %.2f: truth %.3f tool %.3f runs %d/%d%n", status, fanFlow, t.share(),
                r.reevaporationShare(), r.cycles().size(), t.runs());
        if (System.getenv("DBG") != null) {
            r.cycles().forEach(x -> System.out.printf("  on %.0f off %.0f blower %s %.0f ret %.4f%n", x.cycle().onSeconds(),
                    x.cycle().offSeconds(), x.cycle().offBlower(), x.cycle().blowerOnSeconds(), x.returnedKg()));
        }
        assertEquals(t.share(), r.reevaporationShare(), 0.10);
        assertEquals(t.runs(), r.cycles().size(), 1);
        assertEquals(t.medianOnS(), r.medianOnS(), 60);
        assertTrue(r.has(FindingCode.OFF_CYCLE_REEVAPORATION), r.findings().toString());
        assertFalse(r.has(FindingCode.FAN_OFF_DELAY_REEVAPORATION));
        noUndefinedWords(r);
    }

    @Test
    @DisplayName("a 3-minute fan-off delay without status columns is reported as a fan-off delay, not as fan ON")
    void fanOffDelayFinding() throws Exception {
        Config c = delay(180, false, 1.0, 45, StillAir.COOLS);
        RunCycleReport r = analyse(c, IndependentLog.generate(c));
        assertTrue(r.has(FindingCode.FAN_OFF_DELAY_REEVAPORATION), r.findings().toString());
        assertFalse(r.has(FindingCode.OFF_CYCLE_REEVAPORATION));
        assertEquals(180, r.fanOffDelayMedianS(), 60, "median fan-off delay, s");
        Finding f = r.findings().stream().filter(x -> x.code() == FindingCode.FAN_OFF_DELAY_REEVAPORATION).findFirst()
                .orElseThrow();
        assertFalse(f.nextChecks().get(0).contains("Set the thermostat fan to AUTO"), f.nextChecks().get(0));
    }

    @Test
    @DisplayName("1 K of blower heat over a dry coil is no probe offset (compared in moisture terms); a real +5 % RH is")
    void blowerHeatIsNoOffset() throws Exception {
        Config c = delay(0, false, 1.0, 30, StillAir.WARMS);
        c.continuousFan = true;
        c.onOff = new double[] {900, 3600};
        c.repeats = 4;
        RunCycleReport r = analyse(c, IndependentLog.generate(c));
        assertEquals(0, r.sensorOffsetRhPct(), 1.5, "no offset with perfect probes and blower heat");
        assertFalse(r.has(FindingCode.SENSOR_OFFSET));
        assertTrue(r.sensorCheckSeconds() >= 600, "the check rests on ≥ 10 min over a dry coil");
    }

    @Test
    @DisplayName("a °C file is refused under °F settings, and read when its headers say °C")
    void celsiusFile() throws Exception {
        Config c = delay(120, false, 0, 30, StillAir.COOLS);
        c.celsius = true;
        Truth t = IndependentLog.generate(c);
        LogRefusedException e = assertThrows(LogRefusedException.class, () -> read(t, UnitSystem.IP));
        assertTrue(e.getMessage().contains("°F") && e.getMessage().contains("return_db"), e.getMessage());
        c.headerUnits = true;
        Truth labelled = IndependentLog.generate(c);
        LogImport ip = read(labelled, UnitSystem.IP);
        assertEquals(UnitSystem.SI, ip.report().temperatureUnit());
        RunCycleReport r = ANALYSIS.analyse(ip.series(), c.pressurePa, c.airflowM3PerS);
        assertEquals(labelled.share(), r.reevaporationShare(), 0.10);
    }

    @Test
    @DisplayName("a °F file is refused under °C settings")
    void fahrenheitFile() throws Exception {
        Config c = delay(120, false, 0, 30, StillAir.COOLS);
        Truth t = IndependentLog.generate(c);
        assertThrows(LogRefusedException.class, () -> read(t, UnitSystem.SI));
    }

    @Test
    @DisplayName("a US-date file (M/d/yyyy h:mm:ss AM/PM) gives the same cycles as its ISO twin")
    void usDates() throws Exception {
        Config c = delay(120, true, 0, 30, StillAir.COOLS);
        c.usDates = true;
        Truth us = IndependentLog.generate(c);
        c.usDates = false;
        c.isoOffset = "";
        Truth iso = IndependentLog.generate(c);
        // one day, all dates 7/6/2026: month/day or day/month cannot be told, so the tech is asked
        LogRefusedException e = assertThrows(LogRefusedException.class, () -> read(us, UnitSystem.IP));
        assertTrue(e.getMessage().contains("mdy or dmy"), e.getMessage());
        LogImport a = new LogCsvImporter(UnitSystem.IP, Map.of(), DateOrder.MDY, ZoneId.of("UTC"), null)
                .read(new StringReader(us.csv()), us.csv().length());
        LogImport b = read(iso, UnitSystem.IP);
        assertEquals(DateOrder.MDY, a.report().dateOrder());
        assertEquals(b.series().origin().label(0), a.series().origin().label(0));
        assertEquals(ANALYSIS.analyse(b.series(), 101_325, 0.57).cycles().size(),
                ANALYSIS.analyse(a.series(), 101_325, 0.57).cycles().size());
    }

    static Config hotWeek(double continuousC) {
        Config c = new Config();
        c.outdoor = true;
        c.days = 7;
        c.intervalS = 60;
        c.continuousC = continuousC;
        c.statusColumns = false;
        c.seed = (long) continuousC;
        return c;
    }

    @Test
    @DisplayName("hot week, right-sized (truth: continuous running at 37 °C, none at 18 °C): load line within 2 K, no oversized finding")
    void loadLineRightSized() throws Exception {
        Config c = hotWeek(37);
        Truth t = IndependentLog.generate(c);
        RunCycleReport r = analyse(c, t);
        assertTrue(r.loadLine() != null);
        System.out.printf("load line: balance %.1f continuous %.1f hot %.2f ± %.2f over %d h at %.1f%n",
                r.loadLine().balanceC(), r.loadLine().continuousC(), r.loadLine().hotRuntimeFraction(),
                r.loadLine().hotRuntimeU(), r.loadLine().hotHours(), r.loadLine().hotOutdoorC());
        assertEquals(37, r.loadLine().continuousC(), 2.0);
        assertEquals(18, r.loadLine().balanceC(), 2.0);
        assertTrue(r.loadLine().hours() >= 150, "a week of hours: " + r.loadLine().hours());
        assertFalse(r.has(FindingCode.OVERSIZED_FOR_LOAD));
    }

    @Test
    @DisplayName("hot week, oversized (truth: continuous only at 60 °C): runtime in the hottest hours stays low, finding with its U")
    void loadLineOversized() throws Exception {
        Config c = hotWeek(60);
        Truth t = IndependentLog.generate(c);
        RunCycleReport r = analyse(c, t);
        // truth over the same hottest hours: the generator's own runtime fraction per hour
        double[] hot = t.hours().stream().sorted((a, b) -> Double.compare(b[0], a[0])).limit(r.loadLine().hotHours())
                .mapToDouble(h -> h[1]).toArray();
        double truthHot = java.util.Arrays.stream(hot).average().orElseThrow();
        assertEquals(truthHot, r.loadLine().hotRuntimeFraction(), Math.max(0.05, r.loadLine().hotRuntimeU()));
        assertTrue(r.has(FindingCode.OVERSIZED_FOR_LOAD), r.findings().toString());
        noUndefinedWords(r);
    }

    @Test
    @DisplayName("house gains moisture while the unit is off: humid-while-off, trend within 30 % of the model's")
    void humidWhileOff() throws Exception {
        Config c = new Config();
        c.onOff = new double[] {600, 3600};
        c.repeats = 4;
        c.returnW = 0.0128;
        c.houseAirKg = 8000;
        c.moistureGainKgPerS = 3.0 / 3600;
        c.infiltrationKgPerS = 0;
        Truth t = IndependentLog.generate(c);
        RunCycleReport r = analyse(c, t);
        assertTrue(r.has(FindingCode.HUMID_WHILE_OFF), r.findings().toString());
        assertEquals(t.offGainPerS() * 3600, r.house().offTrendPerHour(), 0.3 * t.offGainPerS() * 3600);
        Config dry = new Config();
        dry.onOff = new double[] {600, 3600};
        dry.repeats = 4;
        dry.returnW = 0.0128;
        dry.houseAirKg = 8000;
        dry.moistureGainKgPerS = 0.3 / 3600;
        dry.infiltrationKgPerS = 0;
        RunCycleReport quiet = analyse(dry, IndependentLog.generate(dry));
        assertFalse(quiet.has(FindingCode.HUMID_WHILE_OFF), quiet.findings().toString());
    }
}
