package app.latentledger.core.cycles;

import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.fielddata.SyntheticLog;
import app.latentledger.fielddata.SyntheticLog.Blower;
import app.latentledger.fielddata.SyntheticLog.Rows;
import app.latentledger.fielddata.SyntheticLog.Scenario;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.util.EnumMap;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Logs cut where a tech really starts and stops a logger: in the middle of a run (invented
 * synthetic data). Expected values are analytic, as in {@link RunCycleAnalysisSyntheticTest}: a run
 * removes ṁ_da·ΔW_ss·(t_on + τ(e^(−t_on/τ) − 1)) and a blower-on rest after a draining stop returns
 * ṁ_da·ΔW_ss·(γt − γ²t²/(4t_wet)) (Henderson &amp; Rengarajan 1996, linear decay, E5, with the
 * EnergyPlus-suggested t_wet 1000 s, γ 1.5, τ 45 s the generator uses), ṁ_da = V̇/v with v by ASHRAE
 * Handbook—Fundamentals 2017 ch. 1 eq. 28, v = 0.287042 (t + 273.15)(1 + 1.607858 W)/p, W by eq. 20,
 * computed here by hand.
 */
class RunCycleLogEdgesTest {
    private static final double AIRFLOW = 0.5; // m³/s
    private static final RunCycleAnalysis ANALYSIS = new RunCycleAnalysis(ThresholdSettings.DEFAULTS);

    /** 20 min on / 15 min off, four runs, blower on in the rests. */
    private static Rows fourRuns() {
        Scenario s = new Scenario();
        s.intervalS = 10;
        s.leadOffS = 1200;
        s.onOff = new double[] {1200, 900, 1200, 900, 1200, 900, 1200, 900};
        s.blower = Blower.CONTINUOUS;
        s.returnDbC = 24;
        s.returnRhPct = 45;
        s.splitK = 9;
        s.steadyDryingW = 0.0012;
        return SyntheticLog.generate(s);
    }

    /** The samples with fromS ≤ t &lt; toS, times counted again from the first kept sample. */
    private static LogSeries window(LogSeries full, double fromS, double toS) {
        int first = -1;
        int n = 0;
        for (int i = 0; i < full.size(); i++) {
            if (full.timeS(i) >= fromS && full.timeS(i) < toS) {
                first = first < 0 ? i : first;
                n++;
            }
        }
        double[] t = new double[n];
        Map<Channel, double[]> a = new EnumMap<>(Channel.class);
        Map<Channel, byte[]> st = new EnumMap<>(Channel.class);
        for (Channel c : full.channels()) {
            if (c.isStatus()) {
                byte[] v = new byte[n];
                for (int k = 0; k < n; k++) {
                    v[k] = full.status(c, first + k);
                }
                st.put(c, v);
            } else {
                double[] v = new double[n];
                for (int k = 0; k < n; k++) {
                    v[k] = full.value(c, first + k);
                }
                a.put(c, v);
            }
        }
        for (int k = 0; k < n; k++) {
            t[k] = full.timeS(first + k) - full.timeS(first);
        }
        return new LogSeries(t, a, st, null);
    }

    private static double dryAirPerM3(Rows r) {
        double t = r.scenario.returnDbC;
        double p = r.scenario.pressurePa;
        double pw = r.scenario.returnRhPct / 100 * app.latentledger.core.psychro.SaturationPressure.pascals(t);
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

    @ParameterizedTest(name = "log stops 10 min into the fourth run, status columns: {0}")
    @ValueSource(booleans = {true, false})
    @DisplayName("a run still going when the log ends is not part of the rest before it")
    void logEndsDuringARun(boolean status) {
        Rows rows = fourRuns();
        double cut = rows.runs.get(3)[0] + 600;
        RunCycleReport r = ANALYSIS.analyse(window(rows.series(status), 0, cut), 101_325, AIRFLOW);
        assertEquals(3, r.cycles().size(), "three runs with both ends seen");
        Cycle third = r.cycles().get(2).cycle();
        // the third rest ends where the fourth run starts: 15 min, and it is whole
        assertEquals(rows.runs.get(3)[0] - rows.runs.get(2)[1], third.offSeconds(), 10, "third rest");
        assertTrue(third.offComplete(), "the third rest ended at a start that was seen");
        double mda = AIRFLOW * dryAirPerM3(rows);
        double dw = rows.scenario.steadyDryingW;
        double returned = mda * dw * evaporated(900, 1000, 1.5);
        // before the fix the fourth run's 10 min of drying were counted as negative "returned" water
        assertEquals(returned, r.cycles().get(2).returnedKg(), 0.01 * returned, "returned in the third rest");
        assertEquals(3 * returned, r.returnedKg(), 0.03 * returned, "returned over the log");
        assertEquals(3 * mda * dw * gross(1200, 45), r.removedKg(), 0.03 * mda * dw * 1200, "removed over the log");
    }

    @ParameterizedTest(name = "log starts 10 min into the first run, status columns: {0}")
    @ValueSource(booleans = {true, false})
    @DisplayName("run-time share and net rate cover the same time as the runs they count")
    void logStartsDuringARun(boolean status) {
        Rows rows = fourRuns();
        double from = rows.runs.get(0)[0] + 600;
        RunCycleReport r = ANALYSIS.analyse(window(rows.series(status), from, Double.POSITIVE_INFINITY), 101_325,
                AIRFLOW);
        assertEquals(3, r.cycles().size(), "the first run's start was not seen");
        // the three counted cycles: 3 × 1200 s on out of 3 × (1200 + 900) s — 4/7 = 0.571 by hand
        // (the unit's duty cycle, t_on/(t_on + t_off), H&R 1996 / EnergyPlus E3); the whole log is
        // 600 + 900 + 3 × 2100 s and the old "counted run time ÷ log duration" gave 3600/7800 = 0.46
        assertEquals(1200.0 / 2100.0, r.runtimeFraction(), 30.0 / 2100, "run-time share");
        double mda = AIRFLOW * dryAirPerM3(rows);
        double dw = rows.scenario.steadyDryingW;
        double net = mda * dw * (gross(1200, 45) - evaporated(900, 1000, 1.5));
        // net per cycle over the cycle's own 2100 s, not over minutes whose water was never counted
        assertEquals(net / 2100, r.netRemovalKgPerS(), 0.02 * net / 2100, "net removal rate");
    }
}
