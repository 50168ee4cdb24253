package app.latentledger.core.cycles;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class LatentDegradationModelTest {
    private static final LatentDegradationModel P1 = LatentDegradationModel.DEFAULTS;

    @Test
    @DisplayName("defaults are the EnergyPlus IO Reference suggestions: t_wet 1000 s, gamma 1.5, tau 45 s, N_max 3")
    void defaults() {
        assertEquals(1000.0, P1.twetS());
        assertEquals(1.5, P1.gamma());
        assertEquals(45.0, P1.tauS());
        assertEquals(3.0, P1.nMaxPerHour());
        assertEquals("default", P1.source());
    }

    @Test
    @DisplayName("H&R 1996 documented behaviour: continuous fan, P1 — no net latent removal up to X ≈ 0.5"
            + " (reference vectors, LatentVectors.java break-even X = 0.562)")
    void noNetRemovalAtLowRuntimeWithContinuousFan() {
        for (double x = 0.05; x <= 0.55; x += 0.05) {
            assertEquals(0.0, P1.latentRatio(P1.onTimeS(x), P1.offTimeS(x)), 1e-12, "X = " + x);
        }
        // break-even runtime fractions,docs/methods.md §3.6 (derived from E3–E7)
        assertEquals(0.562, breakEven(P1), 0.001);
        assertEquals(0.580, breakEven(new LatentDegradationModel(1400, 1.5, 45, 3, "x")), 0.001);
        assertEquals(0.545, breakEven(new LatentDegradationModel(1000, 1.5, 45, 2.5, "x")), 0.001);
        assertEquals(0.607, breakEven(new LatentDegradationModel(1000, 1.5, 45, 6, "x")), 0.001);
    }

    private static double breakEven(LatentDegradationModel m) {
        for (int i = 1; i < 10000; i++) {
            double x = i / 10000.0;
            if (m.latentRatio(m.onTimeS(x), m.offTimeS(x)) > 0) {
                return x;
            }
        }
        return Double.NaN;
    }

    @Test
    @DisplayName("hand checks in docs/methods.md §3.6: S2 E = 130.4 s, t_o = 174.5 s, ratio 0.492;"
            + " S4 E = 697.5 s, t_o = 742.5 s, ratio 0.396")
    void handChecks() {
        assertEquals(130.4, P1.evaporatedS(90), 0.05);
        assertEquals(174.5, P1.drainDelayS(P1.evaporatedS(90)), 0.05);
        assertEquals(0.492, P1.latentRatio(300, 90), 0.0005);
        assertEquals(697.5, P1.evaporatedS(600), 0.05);
        assertEquals(742.5, P1.drainDelayS(P1.evaporatedS(600)), 0.05);
        assertEquals(0.396, P1.latentRatio(1200, 600), 0.0005);
        // E5 at full dry-out equals the whole inventory t_wet (linear decay to zero at 2 t_wet / gamma)
        assertEquals(1000.0, P1.evaporatedS(1e6), 1e-9);
    }

    @Test
    @DisplayName("E6 bisection agrees with EnergyPlus's documented successive substitution (0.1 % stop)")
    void drainDelayMatchesSuccessiveSubstitution() {
        for (double e : new double[] {5, 50, 130.444, 400, 697.5, 1000}) {
            double t = e + P1.tauS();
            double prev;
            do {
                prev = t;
                t = e - P1.tauS() * Math.expm1(-prev / P1.tauS());
            } while (Math.abs((t - prev) / prev) > 0.001);
            assertEquals(t, P1.drainDelayS(e), 0.002 * t, "E = " + e);
        }
    }

    @Test
    @DisplayName("all 77 rows of latent-vectors.csv (generator in docs/methods.md §3.6, from H&R 1996 / EnergyPlus ER)")
    void referenceVectors() throws IOException {
        List<Map<String, String>> rows = vectors();
        assertEquals(77, rows.size());
        for (Map<String, String> r : rows) {
            String id = r.get("case_id");
            LatentDegradationModel m = new LatentDegradationModel(d(r, "twet_s"), d(r, "gamma"), d(r, "tau_s"),
                    d(r, "nmax_cph"), "ref").atConditions(d(r, "ql_ratio"), d(r, "wb_dep_C"));
            assertEquals(d(r, "twet_eff_s"), m.twetS(), 0.05, id);
            assertEquals(d(r, "gamma_eff"), m.gamma(), 0.00005, id);
            double evap = d(r, "evap_time_s");
            double on = d(r, "on_time_s");
            // the CSV prints times to 2 decimals (e.g. 428.57 s for 3600/8.4): 0.005 s of E or t_o covers it
            assertEquals(d(r, "evap_s"), m.evaporatedS(evap), 0.005, id);
            assertEquals(d(r, "to_s"), m.drainDelayS(m.evaporatedS(evap)), 0.005, id);
            assertEquals(d(r, "lhr_ratio"), m.latentRatio(on, evap), 0.00001, id);
            assertEquals(d(r, "net_over_ss_ontime"), m.netOverSteadyOnTime(on, evap), 0.00001, id);
            assertEquals(d(r, "effective_shr"), LatentDegradationModel.effectiveShr(0.75, m.latentRatio(on, evap)), 0.00001, id);
            if (r.get("case_id").startsWith("P1_EPLUS") || r.get("case_id").startsWith("P2")) {
                double x = d(r, "runtime_fraction");
                assertEquals(d(r, "on_time_s"), m.onTimeS(x), 0.01, id);
                assertEquals(d(r, "off_time_s"), m.offTimeS(x), 0.01, id);
                assertEquals(d(r, "cycling_rate_cph"), m.cyclesPerHour(x), 0.0001, id);
            }
        }
    }

    @Test
    @DisplayName("closed form vs a step-by-step simulation of the water held on the coil (0.1 s steps, 200 cycles)")
    void closedFormMatchesCoilWaterSimulation() {
        double[][] cases = {{300, 300}, {1200, 600}, {600, 600}, {2700, 900}, {300, 90}, {600, 0}, {1500, 375}};
        for (LatentDegradationModel m : List.of(P1, new LatentDegradationModel(1400, 1.5, 45, 3, "x"),
                new LatentDegradationModel(1000, 1.0, 45, 3, "x"))) {
            for (double[] c : cases) {
                double simulated = simulateDrainedPerOnTime(m.twetS(), m.gamma(), m.tauS(), c[0], c[1]);
                assertEquals(simulated, m.netOverSteadyOnTime(c[0], c[1]), 2e-4, m + " on " + c[0] + " evap " + c[1]);
            }
        }
    }

    /**
     * Independent of the production code: the coil holds water up to t_wet (seconds of steady
     * latent capacity); during a run it gains 1 − e^(−t/τ) per second and drains the excess; with the
     * blower on after the stop it loses water at γ(1 − γ·s/(2·t_wet)) until empty. Returns the water
     * drained in the last (periodic) cycle divided by the on-time.
     */
    private static double simulateDrainedPerOnTime(double twet, double gamma, double tau, double on, double evap) {
        double dt = 0.1;
        double m = 0;
        double drained = 0;
        for (int cycle = 0; cycle < 200; cycle++) {
            drained = 0;
            for (int i = 0; i < Math.round(on / dt); i++) {
                double t0 = i * dt;
                m += dt + tau * (Math.exp(-(t0 + dt) / tau) - Math.exp(-t0 / tau));
                if (m > twet) {
                    drained += m - twet;
                    m = twet;
                }
            }
            for (int i = 0; i < Math.round(evap / dt); i++) {
                double s = (i + 0.5) * dt;
                double rate = Math.max(0, gamma * (1 - gamma * s / (2 * twet)));
                m = Math.max(0, m - rate * dt);
            }
        }
        return drained / on;
    }

    private static double d(Map<String, String> r, String key) {
        String v = r.get(key);
        return v == null || v.isEmpty() ? Double.NaN : Double.parseDouble(v);
    }

    private static List<Map<String, String>> vectors() throws IOException {
        List<Map<String, String>> rows = new ArrayList<>();
        try (BufferedReader in = new BufferedReader(new InputStreamReader(
                LatentDegradationModelTest.class.getResourceAsStream("/reference/latent-degradation/latent-vectors.csv"),
                StandardCharsets.UTF_8))) {
            String[] header = null;
            for (String line; (line = in.readLine()) != null; ) {
                if (line.startsWith("#") || line.isBlank()) {
                    continue;
                }
                String[] f = line.split(",", -1);
                if (header == null) {
                    header = f;
                    continue;
                }
                Map<String, String> m = new HashMap<>();
                for (int i = 0; i < header.length; i++) {
                    m.put(header[i], f[i]);
                }
                rows.add(m);
            }
        }
        assertTrue(!rows.isEmpty());
        return rows;
    }
}
