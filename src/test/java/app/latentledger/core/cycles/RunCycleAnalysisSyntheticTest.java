package app.latentledger.core.cycles;

import app.latentledger.core.findings.FindingCode;

import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.fielddata.SyntheticLog;
import app.latentledger.fielddata.SyntheticLog.Blower;
import app.latentledger.fielddata.SyntheticLog.Rows;
import app.latentledger.fielddata.SyntheticLog.Scenario;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Synthetic logs built from known cycles (invented data). Expected values are analytic: the
 * moisture a run removes is ṁ_da·ΔW_ss·∫₀^t_on (1 − e^(−s/τ)) ds = ṁ_da·ΔW_ss·(t_on + τ(e^(−t_on/τ) − 1)),
 * and a blower-on rest after a draining stop returns ṁ_da·ΔW_ss·(γ·t − γ²t²/(4·t_wet)) (Henderson &
 * Rengarajan 1996 linear decay, E5), with ṁ_da = V̇/v and v by ASHRAE Handbook—Fundamentals 2017
 * ch. 1 eq. 28, v = 0.287042 (t + 273.15)(1 + 1.607858 W)/p, computed here by hand.
 */
class RunCycleAnalysisSyntheticTest {
    private static final double AIRFLOW = 0.5; // m³/s (≈ 1060 cfm)
    private static final RunCycleAnalysis ANALYSIS = new RunCycleAnalysis(ThresholdSettings.DEFAULTS);

    /** Test coil: the supply stays below saturation right after a stop, so the model's W is kept exactly. */
    private static Scenario base(Blower blower, double... onOff) {
        Scenario s = new Scenario();
        s.intervalS = 10;
        s.leadOffS = 1200;
        s.onOff = onOff;
        s.fillToS = 0;
        s.blower = blower;
        s.returnDbC = 24;
        s.returnRhPct = 45;
        s.splitK = 9;
        s.steadyDryingW = 0.0012;
        return s;
    }

    private static Scenario repeated(Scenario s, int cycles) {
        double[] pattern = s.onOff;
        double[] all = new double[2 * cycles];
        for (int k = 0; k < cycles; k++) {
            all[2 * k] = pattern[(2 * k) % pattern.length];
            all[2 * k + 1] = pattern[(2 * k + 1) % pattern.length];
        }
        s.onOff = all;
        return s;
    }

    private static double dryAirPerM3(Rows r) {
        double t = r.scenario.returnDbC;
        double p = r.scenario.pressurePa;
        double pw = r.returnRh[0] / 100 * app.latentledger.core.psychro.SaturationPressure.pascals(t);
        double w = 0.621945 * pw / (p - pw); // HoF eq. 20
        return 1.0 / (0.287042e3 * (t + 273.15) * (1 + 1.607858 * w) / p);
    }

    private static double gross(double on, double tau) {
        return on + tau * (Math.exp(-on / tau) - 1);
    }

    private static double evaporated(double t, double twet, double gamma) {
        double x = Math.min(t, 2 * twet / gamma);
        return gamma * x - gamma * gamma * x * x / (4 * twet);
    }

    private static void assertTimings(Rows rows, RunCycleReport r) {
        List<double[]> truth = rows.runs;
        assertEquals(truth.size(), r.cycles().size(), "cycle count");
        double dt = rows.scenario.intervalS;
        for (int k = 0; k < truth.size(); k++) {
            Cycle c = r.cycles().get(k).cycle();
            assertEquals(truth.get(k)[0], c.startS(), dt, "start of run " + k);
            assertEquals(truth.get(k)[1] - truth.get(k)[0], c.onSeconds(), dt, "on-time of run " + k);
            double nextStart = k + 1 < truth.size() ? truth.get(k + 1)[0] : rows.t[rows.size() - 1];
            assertEquals(nextStart - truth.get(k)[1], c.offSeconds(), dt, "off-time of run " + k);
        }
    }

    @ParameterizedTest(name = "continuous blower, 20 min on / 10 min off, status columns: {0}")
    @ValueSource(booleans = {true, false})
    @DisplayName("S4 timing (reference vectors, LatentVectors.java): counts, times, and moisture integrals against the analytic integrals")
    void continuousBlowerS4(boolean status) {
        Rows rows = SyntheticLog.generate(repeated(base(Blower.CONTINUOUS, 1200, 600), 6));
        assertEquals(0, rows.cappedSamples, "generator kept the model's humidity ratio everywhere");
        RunCycleReport r = ANALYSIS.analyse(rows.series(status), 101_325, AIRFLOW);
        assertEquals(status, r.compressorFromStatus());
        assertTimings(rows, r);
        double mda = AIRFLOW * dryAirPerM3(rows);
        double dw = rows.scenario.steadyDryingW;
        double removed = mda * dw * gross(1200, 45);
        double returned = mda * dw * evaporated(600, 1000, 1.5); // coil full at every stop: 1155 s > t_wet
        for (CycleResult c : r.cycles()) {
            assertEquals(BlowerState.ON, c.cycle().offBlower());
            assertEquals(removed, c.removedKg(), 0.01 * removed, "removed");
            assertEquals(returned, c.returnedKg(), 0.01 * returned, "returned");
            // onset: ΔW_ss(1 − e^(−t/τ)) = ΔW_ss/2 at t = τ ln 2 = 31.2 s
            assertEquals(45 * Math.log(2), c.moisture().onsetS(), 1.0, "onset");
        }
        // the reference vectors (LatentVectors.java) S4_2CPH_20ON_10OFF, P1: net/(ss × t_on) = 0.381, from H&R 1996 with the EnergyPlus-suggested values
        assertEquals(0.381, r.latentFractionMeasured(), 0.005);
        assertEquals(0.381, r.latentFractionPredicted(), 0.001);
        assertEquals("default", r.model().source().key());
        assertEquals(dw, r.steadyDryingW(), 1e-6);
        assertTrue(r.has(FindingCode.OFF_CYCLE_REEVAPORATION));
        assertFalse(r.has(FindingCode.SHORT_CYCLING));
        assertFalse(r.has(FindingCode.COIL_NEVER_WET));
        // the blower ran through every 600 s rest (the generator's truth), so the finding's evidence gives
        // that time and no fan-off delay, which would have nothing to show
        var offCycle = r.findings().stream().filter(f -> f.code() == FindingCode.OFF_CYCLE_REEVAPORATION)
                .findFirst().orElseThrow();
        for (var e : offCycle.evidence()) {
            assertFalse(Double.isNaN(e.valueSi()), e.key() + " has a value to show");
        }
        var blowerInRest = offCycle.evidence().stream().filter(e -> e.key().equals("blowerOnInRests")).findFirst()
                .orElseThrow();
        assertEquals(600, blowerInRest.valueSi(), 60, "median blower time in a rest, s");
    }

    @ParameterizedTest(name = "blower off in rests (AUTO), 10 min on / 15 min off, status columns: {0}")
    @ValueSource(booleans = {true, false})
    @DisplayName("AUTO blower: nothing returned, blower inferred off, removal per run analytic")
    void autoBlower(boolean status) {
        Rows rows = SyntheticLog.generate(repeated(base(Blower.AUTO, 600, 900), 5));
        RunCycleReport r = ANALYSIS.analyse(rows.series(status), 101_325, AIRFLOW);
        assertTimings(rows, r);
        double removed = AIRFLOW * dryAirPerM3(rows) * rows.scenario.steadyDryingW * gross(600, 45);
        for (CycleResult c : r.cycles()) {
            assertEquals(BlowerState.OFF, c.cycle().offBlower());
            assertEquals(removed, c.removedKg(), 0.01 * removed);
            assertEquals(0.0, c.returnedKg(), 1e-12);
        }
        assertFalse(r.has(FindingCode.OFF_CYCLE_REEVAPORATION));
        // no run ≥ 15 min: the steady rate is unknown, so the measured fraction is too
        assertTrue(Double.isNaN(r.latentFractionMeasured()));
        // model with no evaporation: gross(600)/600 = (600 + 45(e^(−600/45) − 1))/600 = 0.925
        assertEquals(gross(600, 45) / 600, r.latentFractionPredicted(), 1e-9);
    }

    @Test
    @DisplayName("90 s fan-off delay from the fan column: returned = E(90 s) = 130.4 s of steady removal (reference vectors, LatentVectors.java)")
    void fanDelay() {
        Scenario s = repeated(base(Blower.DELAY, 1500, 900), 4);
        s.fanDelayS = 90;
        Rows rows = SyntheticLog.generate(s);
        assertEquals(0, rows.cappedSamples);
        RunCycleReport r = ANALYSIS.analyse(rows.series(true), 101_325, AIRFLOW);
        assertTimings(rows, r);
        double returned = AIRFLOW * dryAirPerM3(rows) * s.steadyDryingW * 130.444;
        for (CycleResult c : r.cycles()) {
            assertEquals(90, c.cycle().blowerOnSeconds(), 1e-9);
            assertEquals(BlowerState.OFF, c.cycle().offBlower());
            assertEquals(returned, c.returnedKg(), 0.01 * returned);
        }
    }

    @Test
    @DisplayName("short cycling, 5 min on / 5 min off with continuous blower: the reference vectors (LatentVectors.java) S1 predicts no net removal")
    void shortCyclingContinuous() {
        Rows rows = SyntheticLog.generate(repeated(base(Blower.CONTINUOUS, 300, 300), 12));
        RunCycleReport r = ANALYSIS.analyse(rows.series(true), 101_325, AIRFLOW);
        assertTimings(rows, r);
        assertTrue(r.cyclesPerHour() > 3);
        assertEquals(0.0, r.latentFractionPredicted(), 1e-9); // S1_6CPH_5ON_5OFF_P1: 0.000
        assertTrue(r.has(FindingCode.SHORT_CYCLING));
        assertTrue(r.has(FindingCode.SHORT_CYCLING_LIMITS_LATENT));
        assertTrue(r.has(FindingCode.OFF_CYCLE_REEVAPORATION));
    }

    @Test
    @DisplayName("fit recovers t_wet 1200 s and γ 1.2 from long blower-on rests that dry the coil (docs/methods.md §9.9)")
    void fitsModelToLongRests() {
        Scenario s = repeated(base(Blower.CONTINUOUS, 1800, 2700), 4);
        s.twetS = 1200;
        s.gamma = 1.2;
        Rows rows = SyntheticLog.generate(s);
        assertEquals(0, rows.cappedSamples);
        RunCycleReport r = ANALYSIS.analyse(rows.series(false), 101_325, AIRFLOW);
        assertEquals("fitted", r.model().source().key());
        assertEquals(1200, r.model().twetS(), 0.02 * 1200);
        assertEquals(1.2, r.model().gamma(), 0.02 * 1.2);
        assertEquals(4, r.fitRests());
    }

    @ParameterizedTest(name = "noisy sensors (0.05 K, 0.3 % RH, 20 s probe lag), blower {0}, no status columns")
    @ValueSource(strings = {"CONTINUOUS", "AUTO"})
    @DisplayName("noisy sensors: counts exact, times within one sample, blower state inferred")
    void noisy(String blower) {
        Scenario s = repeated(base(Blower.valueOf(blower), 900, 700, 1500, 500, 420, 900), 6);
        s.noiseK = 0.05;
        s.noiseRhPct = 0.3;
        s.supplyLagS = 20;
        Rows rows = SyntheticLog.generate(s);
        RunCycleReport r = ANALYSIS.analyse(rows.series(false), 101_325, AIRFLOW);
        assertTimings(rows, r);
        BlowerState expected = s.blower == Blower.AUTO ? BlowerState.OFF : BlowerState.ON;
        for (CycleResult c : r.cycles()) {
            assertEquals(expected, c.cycle().offBlower(), "rest after " + c.cycle().startS());
        }
    }

    @Test
    @DisplayName("a coil above the dew point removes nothing: coil-never-wet")
    void dryCoil() {
        Scenario s = repeated(base(Blower.AUTO, 1200, 900), 4);
        s.steadyDryingW = 0;
        Rows rows = SyntheticLog.generate(s);
        RunCycleReport r = ANALYSIS.analyse(rows.series(true), 101_325, AIRFLOW);
        assertEquals(4, r.cycles().size());
        assertTrue(r.has(FindingCode.COIL_NEVER_WET));
        assertTrue(Double.isNaN(r.steadyDryingW()));
    }

    @Test
    @DisplayName("supply probe reading 5 % RH high over a dried coil with the blower on: sensor-offset")
    void sensorOffset() {
        Scenario s = repeated(base(Blower.CONTINUOUS, 1200, 3600), 3);
        s.supplyRhOffsetPct = 5;
        Rows rows = SyntheticLog.generate(s);
        RunCycleReport r = ANALYSIS.analyse(rows.series(false), 101_325, AIRFLOW);
        assertEquals(5, r.sensorOffsetRhPct(), 0.3);
        assertTrue(r.has(FindingCode.SENSOR_OFFSET));
        Scenario clean = repeated(base(Blower.CONTINUOUS, 1200, 3600), 3);
        RunCycleReport ok = ANALYSIS.analyse(SyntheticLog.generate(clean).series(false), 101_325, AIRFLOW);
        assertEquals(0, ok.sensorOffsetRhPct(), 0.1);
        assertFalse(ok.has(FindingCode.SENSOR_OFFSET));
    }

    @ParameterizedTest(name = "a 15 min gap inside the third run, status columns: {0}")
    @ValueSource(booleans = {true, false})
    @DisplayName("a gap breaks the record: the run across it is dropped, nothing is integrated over it")
    void gap(boolean status) {
        Rows rows = SyntheticLog.generate(repeated(base(Blower.AUTO, 1200, 900), 5));
        double gapFrom = rows.runs.get(2)[0] + 300;
        double gapTo = gapFrom + 900;
        LogSeries full = rows.series(status);
        int n = 0;
        for (int i = 0; i < full.size(); i++) {
            if (full.timeS(i) < gapFrom || full.timeS(i) >= gapTo) {
                n++;
            }
        }
        double[] t = new double[n];
        java.util.Map<Channel, double[]> a = new java.util.EnumMap<>(Channel.class);
        java.util.Map<Channel, byte[]> st = new java.util.EnumMap<>(Channel.class);
        for (Channel c : full.channels()) {
            if (c.isStatus()) {
                st.put(c, new byte[n]);
            } else {
                a.put(c, new double[n]);
            }
        }
        int k = 0;
        for (int i = 0; i < full.size(); i++) {
            if (full.timeS(i) >= gapFrom && full.timeS(i) < gapTo) {
                continue;
            }
            t[k] = full.timeS(i);
            for (Channel c : full.channels()) {
                if (c.isStatus()) {
                    st.get(c)[k] = full.status(c, i);
                } else {
                    a.get(c)[k] = full.value(c, i);
                }
            }
            k++;
        }
        RunCycleReport r = ANALYSIS.analyse(new LogSeries(t, a, st, null), 101_325, AIRFLOW);
        assertEquals(4, r.cycles().size());
        double removed = AIRFLOW * dryAirPerM3(rows) * rows.scenario.steadyDryingW * gross(1200, 45);
        for (CycleResult c : r.cycles()) {
            assertEquals(1200, c.cycle().onSeconds(), 10);
            assertEquals(removed, c.removedKg(), 0.01 * removed);
        }
        // the rest before the broken run ends where that run started
        assertEquals(rows.runs.get(2)[0] - rows.runs.get(1)[1], r.cycles().get(1).cycle().offSeconds(), 10);
        // the run after the gap is whole and so is its rest
        assertTrue(r.cycles().get(2).cycle().offComplete());
        assertEquals(rows.runs.get(0)[0], r.cycles().get(0).cycle().startS(), 10);
        assertEquals(rows.runs.get(3)[0], r.cycles().get(2).cycle().startS(), 10);
    }
}
