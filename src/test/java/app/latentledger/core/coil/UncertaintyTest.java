package app.latentledger.core.coil;

import app.latentledger.core.units.Quantity;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class UncertaintyTest {
    private static final int DRAWS = 20_000;

    @Test
    @DisplayName("Rectangular tolerance ±a has standard uncertainty a/√3 (JCGM 100:2008, GUM §4.3.7)")
    void rectangular() {
        assertEquals(1 / Math.sqrt(3), new UncertainInput("x", "x", Quantity.DIMENSIONLESS, 5, 1).standardUncertainty(), 1e-15);
    }

    @Test
    @DisplayName("Linear model: first order is exact, Monte Carlo (JCGM 101:2008) agrees within 2 %")
    void linearModel() {
        List<UncertainInput> in = List.of(new UncertainInput("a", "a", Quantity.DIMENSIONLESS, 1, 0.3),
                new UncertainInput("b", "b", Quantity.DIMENSIONLESS, 2, 0.5));
        Propagation.Model f = (x, clamp) -> new double[] {2 * x[0] + 3 * x[1]};
        double exact = 2 * Math.sqrt(Math.pow(2 * 0.3 / Math.sqrt(3), 2) + Math.pow(3 * 0.5 / Math.sqrt(3), 2));
        assertEquals(exact, Propagation.firstOrder(in, f).expanded()[0], 1e-9);
        assertEquals(exact, Propagation.monteCarlo(in, f, DRAWS, 7).expanded()[0], exact * 0.02);
    }

    @Test
    @DisplayName("Dew point and humidity ratio sensitivities match docs/methods.md §9.7 and §5.3 (derived there)")
    void sensitivities() {
        // §5.2: ±2 % RH, ±0.5 °F rectangular → U(t_d) 1.38 °F at 75/50, 0.90 °F at 55/90;
        // U(W) 3.3 and 1.9 gr; §5.3: independent probes, U95(Δgr) ≈ ±3.8 gr
        CoilResult r = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).run();
        assertEquals(1.38, r.estimate(Measurand.ENTERING_DEW_POINT).expandedSi() * 1.8, 0.02);
        assertEquals(0.90, r.estimate(Measurand.LEAVING_DEW_POINT).expandedSi() * 1.8, 0.02);
        assertEquals(3.8, r.estimate(Measurand.HUMIDITY_RATIO_DROP).expandedSi() * 7000, 0.1);
    }

    @ParameterizedTest(name = "case A (RH probes): first order vs Monte Carlo within 10 % — {0}")
    @EnumSource(value = Measurand.class, names = {"CONDENSATE_RATE", "CONDENSATE_MINUS_AIRSIDE", "COIL_TEMPERATURE",
            "OUTDOOR_DEW_POINT"},
            mode = EnumSource.Mode.EXCLUDE)
    void firstOrderAgreesWithMonteCarloRh(Measurand m) {
        compare(IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).condensate(560, 15).readings(), m);
    }

    @ParameterizedTest(name = "wet-bulb probes, measured coil, condensate: first order vs Monte Carlo within 10 % — {0}")
    @EnumSource(value = Measurand.class, names = "OUTDOOR_DEW_POINT", mode = EnumSource.Mode.EXCLUDE) // no outdoor reading
    void firstOrderAgreesWithMonteCarloWb(Measurand m) {
        compare(IpCase.returnWb(80, 67).supplyWb(57, 55).cfm(1000).coilF(45).condensate(900, 20).readings(), m);
    }

    private static void compare(CoilReadings r, Measurand m) {
        CoilModel model = new CoilModel(r);
        double fo = Propagation.firstOrder(model.inputs(), model).expanded()[m.ordinal()];
        double mc = Propagation.monteCarlo(model.inputs(), model, DRAWS, 20240611L).expanded()[m.ordinal()];
        assertTrue(fo > 0, m + " has an uncertainty");
        assertEquals(mc, fo, 0.10 * mc, m.key() + ": first order " + fo + " vs Monte Carlo " + mc);
    }

    @Test
    @DisplayName("Monte Carlo 95 % interval of the humidity-ratio drop brackets the value and matches ±2σ roughly")
    void coverageInterval() {
        CoilReadings r = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).readings();
        CoilModel model = new CoilModel(r);
        Propagation.Result mc = Propagation.monteCarlo(model.inputs(), model, DRAWS, 3);
        int i = Measurand.HUMIDITY_RATIO_DROP.ordinal();
        double half = (mc.high95()[i] - mc.low95()[i]) / 2;
        assertTrue(mc.low95()[i] < mc.values()[i] && mc.values()[i] < mc.high95()[i]);
        assertEquals(mc.expanded()[i], half, 0.1 * half);
    }
}
