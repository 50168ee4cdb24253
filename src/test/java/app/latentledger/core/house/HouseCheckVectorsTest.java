package app.latentledger.core.house;

import org.junit.jupiter.api.Test;

import static app.latentledger.core.house.CheckHouse.*;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The house budget's terms against published equations and independently computed values. Where a
 * value is "computed independently" it was worked out outside this code base from the cited
 * equation with PsychroLib 2.5 (ASHRAE HoF 2017 ch. 1) for the moist-air properties. Budget figures
 * are held to ±0.5 %.
 */
class HouseCheckVectorsTest {
    private static double rel(double expected) {
        return Math.abs(expected) * 0.005;
    }

    private static double[] asFound(HouseInputs in, double internalLbPerDay) {
        BudgetModel m = new BudgetModel(in, Scenario.AS_FOUND);
        double[] x = m.nominal();
        x[BudgetModel.INTERNAL] = internalLbPerDay * LB_PER_DAY;
        return m.evaluate(x, false);
    }

    /**
     * Effective leakage area at 4 Pa (ASHRAE HoF ch. 16; LBL definition, n = 0.65, C_D = 1,
     * ρ = 1.2 kg/m³) against OpenStudio-HPXML's independent SLA formula
     * (airflow.rb get_infiltration_SLA_from_ACH50): A_L [in²] = ACH50·0.283316478·4ⁿ·V/(50ⁿ·60).
     */
    @Test
    void leakageAreaMatchesTheSlaFormula() {
        double n = 0.65;
        double in2 = 5 * 0.283316478 * Math.pow(4, n) * 16_000 / (Math.pow(50, n) * 60);
        double q50 = 5 * 16_000 * FT * FT * FT / 3600;
        assertEquals(in2 * 0.0254 * 0.0254, Infiltration.leakageAreaM2(q50), 1e-4 * in2 * 0.0254 * 0.0254);
        assertEquals(0.04719, Infiltration.leakageAreaM2(q50), 0.00003, "471.9 cm² computed independently");
    }

    /**
     * Sherman–Grimsrud with the EnergyPlus I/O Reference coefficients (ZoneInfiltration:
     * EffectiveLeakageArea): 471.9 cm², 1 story, shelter 3, ΔT 5.556 K, 3 m/s → 22.98 L/s; wind only
     * 18.68 L/s; stack only 13.39 L/s (computed independently). Cross-check with the IP form
     * Q = A_L[in²]·√(0.01505·ΔT[°F] + 0.00650·U[mph]²) = 48.7 cfm (coefficients converted
     * independently from the SI table).
     */
    @Test
    void shermanGrimsrud() {
        double al = 0.04719;
        assertEquals(22.98e-3, Infiltration.shermanGrimsrudM3PerS(al, 1, 3, 5.556, 3.0), 0.02e-3);
        assertEquals(18.68e-3, Infiltration.shermanGrimsrudM3PerS(al, 1, 3, 0, 3.0), 0.02e-3);
        assertEquals(13.39e-3, Infiltration.shermanGrimsrudM3PerS(al, 1, 3, 5.556, 0), 0.02e-3);
        double ipCfm = 73.15 * Math.sqrt(0.01505 * 10 + 0.00650 * 6.711 * 6.711);
        assertEquals(ipCfm * CFM, Infiltration.shermanGrimsrudM3PerS(al, 1, 3, 10 / 1.8, 3.0), rel(ipCfm * CFM));
    }

    /**
     * N-factor rule (Sherman 1987; N = 20): 5 ACH50 → 0.25 ACH → 66.67 cfm; water carried at the
     * outdoor air's own specific volume (HoF ch. 1 eq. 28): 52.18 lb/day (computed independently).
     */
    @Test
    void nFactorInfiltrationGain() {
        double[] y = asFound(inputs(), 8.30);
        assertEquals(66.67 * CFM, y[BudgetModel.Y_INFILTRATION_FLOW], rel(66.67 * CFM));
        assertEquals(52.18 * LB_PER_DAY, y[BudgetModel.Y_INFILTRATION], rel(52.18 * LB_PER_DAY));
    }

    /** Moisture gain of the Sherman–Grimsrud flow, 48.70 cfm → 38.12 lb/day (computed independently). */
    @Test
    void shermanGrimsrudGain() {
        HouseFacts f = new HouseFacts(2000 * FT * FT, 8 * FT, 1, 3, 0, Double.NaN, 5.0, 3, 3.0,
                VentilationType.NONE, 0, Double.NaN);
        HouseReadings r = new HouseReadings(rh("indoor", 75, 50), dp("outdoor", 85, 72), null, null, null);
        double[] y = asFound(inputs(f, r, system(wAt(c(75), 50), 0)), 8.30);
        assertEquals(48.70 * CFM, y[BudgetModel.Y_INFILTRATION_FLOW], 0.01 * 48.70 * CFM);
        assertEquals(38.12 * LB_PER_DAY, y[BudgetModel.Y_INFILTRATION], 0.01 * 38.12 * LB_PER_DAY);
    }

    /** ASHRAE 62.2-2019 Q_tot = 0.03·A_floor + 7.5·(N_br + 1): 2000 ft², 3 BR → 90.0 cfm. */
    @Test
    void ashrae622Rate() {
        assertEquals(90.0 * CFM, Ventilation.ashrae622TotalM3PerS(2000 * FT * FT, 3), 1e-9);
        assertEquals((0.03 * 1500 + 7.5 * 3) * CFM, Ventilation.ashrae622TotalM3PerS(1500 * FT * FT, 2), 1e-9);
    }

    /**
     * Balanced ventilation of 90 cfm with ERV latent effectiveness 0, 0.5, 0.7 (EnergyPlus Engineering
     * Reference, air-to-air heat exchanger: gain × (1 − ε_L)): 70.45, 35.22, 21.13 lb/day (computed
     * independently).
     */
    @Test
    void ventilationAndErv() {
        double[][] cases = {{0, 70.45}, {0.5, 35.22}, {0.7, 21.13}};
        for (double[] c : cases) {
            HouseFacts f = new HouseFacts(2000 * FT * FT, 8 * FT, 1, 3, 0, Double.NaN, Double.NaN, 0, Double.NaN,
                    c[0] == 0 ? VentilationType.BALANCED : VentilationType.ERV, 90 * CFM, c[0] == 0 ? Double.NaN : c[0]);
            double[] y = asFound(inputs(f, readings(), system(wAt(c(75), 50), 0)), 8.30);
            assertEquals(c[1] * LB_PER_DAY, y[BudgetModel.Y_VENTILATION], rel(c[1] * LB_PER_DAY), "ε " + c[0]);
            assertEquals(0.0, y[BudgetModel.Y_INFILTRATION], 1e-15, "no blower-door result, no infiltration");
        }
    }

    /**
     * A 90 cfm exhaust fan with 66.67 cfm natural infiltration combine in quadrature (EnergyPlus
     * Engineering Reference, "Zone Air Balance Outdoor Airflow"): √(66.67² + 90²) = 112.00 cfm →
     * 87.67 lb/day (computed independently), not the plain sum 156.67 cfm.
     */
    @Test
    void exhaustCombinesInQuadrature() {
        HouseFacts f = facts(0, VentilationType.EXHAUST, 90, Double.NaN);
        double[] y = asFound(inputs(f, readings(), system(wAt(c(75), 50), 0)), 8.30);
        assertEquals(87.67 * LB_PER_DAY, y[BudgetModel.Y_INFILTRATION] + y[BudgetModel.Y_VENTILATION],
                rel(87.67 * LB_PER_DAY));
        assertEquals((112.00 - 90) * CFM, y[BudgetModel.Y_INFILTRATION_FLOW], rel(22 * CFM));
    }

    /**
     * Internal generation presets, both from memory: HoF ch. 17 q_l = 68 + 0.07·2000 + 41·4 = 372 Btu/h
     * → 8.30 lb/day at 1076 Btu/lb; Std 160, 3 BR → 14 kg/day.
     */
    @Test
    void internalPresets() {
        assertEquals(372.0 / 1076 * 24 * LB_PER_DAY, InternalMoisture.handbookKgPerS(2000 * FT * FT, 4), 1e-12);
        assertEquals(8.30 * LB_PER_DAY, InternalMoisture.handbookKgPerS(2000 * FT * FT, 4), rel(8.30 * LB_PER_DAY));
        assertEquals(14.0 / 86_400, InternalMoisture.standard160KgPerS(3), 1e-15);
        assertEquals(17.0 / 86_400, InternalMoisture.standard160KgPerS(5), 1e-15);
    }

    /**
     * Return leak: grille 75 °F / 50 %, attic 115 °F with a 74 °F dew point, plenum mixed with
     * f = 0.08 (HoF ch. 1 adiabatic mixing): plenum 78.25 °F, dew point 57.13 °F (computed
     * independently with PsychroLib). Inverting from the dew points gives f = 0.0800 ± 0.063 (k = 2,
     * ±1 °F dew points). With 1200 cfm at the grille air's volume and RTF 0.55: 49.35 lb/day.
     */
    @Test
    void returnLeak() {
        HouseReadings r = new HouseReadings(rh("indoor", 75, 50), dp("outdoor", 85, 72), rh("grille", 75, 50),
                dp("plenum", 78.25, 57.13), dp("space", 115, 74));
        double wp = CheckHouse.wAt(c(75), 50) + 0.08 * (126.80 / 7000 - CheckHouse.wAt(c(75), 50));
        HouseInputs in = inputs(facts(), r, system(wp, 0));
        ScenarioResult s = MoistureBudget.asFound(in);
        assertEquals(0.0800, s.leakFraction().valueSi(), 0.001);
        assertEquals(0.063, s.leakFraction().expandedSi(), 0.012, "k = 2 from ±1 °F dew points, ±2 % RH grille");
        // blower mass flow in the model is at the plenum air's volume; the independent figure at the grille's
        assertEquals(49.35 * LB_PER_DAY, s.returnLeak().valueSi(), 0.01 * 49.35 * LB_PER_DAY);
    }

    /** Daily coil removal 8.25 lb/h × 24 h × RTF 0.55 × LHR/LHR_ss 0.80 = 87.12 lb/day. */
    @Test
    void dailyRemoval() {
        HouseInputs base = inputs();
        SystemRemoval s = base.system();
        SystemRemoval s2 = new SystemRemoval(s.enteringDryBulbC(), s.enteringW(), s.airflowM3PerS(), s.airflowU(),
                s.massFlowKgPerS(), 8.25 * LB_PER_H, 0, s.adpC(), s.adpU(), s.bypassFactor(), s.bypassFactorU(),
                s.totalW(), s.sensibleW(), s.nominalW(), 0.55, 0, "typed", 0.80, 0, "log", 0);
        ScenarioResult r = MoistureBudget.asFound(inputs(facts(), readings(), s2));
        assertEquals(87.12 * LB_PER_DAY, r.removal().valueSi(), 1e-6 * LB_PER_DAY);
    }

    /**
     * Equilibrium, return sealed: W* = (K_o·W_o + G + c_R·W_ADP)/(K_o + c_R) with K_o = 283.6 lb/h,
     * c_R = 2010.5 lb/h, G = 8.30 lb/day → 66.88 gr/lb, dew point 56.04 °F, 51.7 % RH at 75 °F
     * (daily mass balance on the house air, HoF ch. 1; computed independently).
     */
    @Test
    void equilibriumSealed() {
        double[] y = asFound(inputs(), 8.30);
        assertEquals(66.88 / 7000, y[BudgetModel.Y_EQ_W], 0.05 / 7000);
        assertEquals(c(56.04), y[BudgetModel.Y_EQ_DEW_POINT], 0.03);
        assertEquals(51.7, y[BudgetModel.Y_EQ_RH], 0.1);
        // with the Std 160 preset the house sits wetter
        double[] wetter = asFound(inputs(), 30.86);
        assertTrue(wetter[BudgetModel.Y_EQ_W] > y[BudgetModel.Y_EQ_W]);
    }

    /**
     * Equilibrium with the leak: the leak's water enters through the return and the coil sees the
     * mixed air, so r(W) = K_o(W_o − W) + K_d(W_a − W) + G − c_R((W + f(W_a − W)) − W_ADP) = 0 has the
     * closed form below (the same balance solved by hand); the model solves it numerically.
     */
    @Test
    void equilibriumWithLeakMatchesClosedForm() {
        HouseReadings r = new HouseReadings(rh("indoor", 75, 50), dp("outdoor", 85, 72), rh("grille", 75, 50),
                dp("plenum", 78.25, 57.13), dp("space", 115, 74));
        double wi = CheckHouse.wAt(c(75), 50);
        double wa = app.latentledger.core.psychro.Psychrometrics.humidityRatio(
                app.latentledger.core.psychro.SaturationPressure.pascals(c(74)), P);
        double f0 = ReturnLeak.fraction(wi, app.latentledger.core.psychro.Psychrometrics.humidityRatio(
                app.latentledger.core.psychro.SaturationPressure.pascals(c(57.13)), P), wa);
        // the coil's entering air is the plenum air, so the coil check was taken there
        HouseInputs in = inputs(facts(), r, system(wi + f0 * (wa - wi), 0));
        BudgetModel m = new BudgetModel(in, Scenario.AS_FOUND);
        double[] x = m.nominal();
        x[BudgetModel.INTERNAL] = 8.30 * LB_PER_DAY;
        double[] y = m.evaluate(x, false);
        double f = y[BudgetModel.Y_LEAK_FRACTION];
        double kO = y[BudgetModel.Y_INFILTRATION] / (0.016902 - wi);
        double kD = y[BudgetModel.Y_LEAK] / (wa - wi);
        double cR = 0.55 * 0.80 * 5263.0 * LB_PER_H * (1 - 0.1319);
        double wAdp = 58.42 / 7000;
        double expected = (kO * 0.016902 + kD * wa + 8.30 * LB_PER_DAY - cR * f * wa + cR * wAdp)
                / (kO + kD + cR * (1 - f));
        assertEquals(expected, y[BudgetModel.Y_EQ_W], 1e-8, "bisection converges to 1e-9 kg/kg");
    }

    /**
     * Dehumidifier rating conversion by the ratio of the Winkler, Christensen &amp; Tomerlin (2011)
     * curve (OpenStudio-HPXML apply_dehumidifiers): curve values 0.985985 (80 °F/60 %), 0.83102
     * (73 °F/60 %), 0.64973 (65 °F/60 %), 0.76469 (75 °F/55 %); 50 pints/day at 65 °F/60 % is 75.88 at
     * 80 °F/60 %; 100 at 73 °F/60 % is 118.65 at 80 °F/60 % (computed independently).
     */
    @Test
    void dehumidifierCurveAndConversion() {
        assertEquals(0.985985, DehumidifierRating.curve(c(80), 60), 1e-5);
        assertEquals(0.83102, DehumidifierRating.curve(c(73), 60), 1e-5);
        assertEquals(0.64973, DehumidifierRating.curve(c(65), 60), 1e-5);
        assertEquals(0.76469, DehumidifierRating.curve(c(75), 55), 1e-5);
        assertEquals(75.88, DehumidifierRating.convert(50, c(65), 60, c(80), 60), 0.01);
        assertEquals(58.85, DehumidifierRating.convert(50, c(65), 60, c(75), 55), 0.01);
        assertEquals(118.65, DehumidifierRating.convert(100, c(73), 60, c(80), 60), 0.01);
        assertEquals(92.02, DehumidifierRating.convert(100, c(73), 60, c(75), 55), 0.01);
        DehumidifierRating.Rated r = DehumidifierRating.rated(64.2, c(75), 50);
        assertEquals(64.1, r.portable65F(), 0.1);
        assertEquals(82.0, r.wholeHome73F(), 0.1);
        assertEquals(97.3, r.rated80F(), 0.1);
    }

    /**
     * The propagated uncertainty of f (first order over the readings, GUM §5.1.2) against the closed
     * form u(f) = √(u_p² + (1−f)²u_g² + f²u_a²)/(W_a − W_g) with each u(W) from its own reading.
     */
    @Test
    void leakUncertaintyMatchesItsClosedForm() {
        HouseReadings r = new HouseReadings(rh("indoor", 75, 50), dp("outdoor", 85, 72), dp("grille", 75, 55.12),
                dp("plenum", 78.25, 57.13), dp("space", 115, 74));
        HouseInputs in = inputs(facts(), r, system(wAt(c(75), 50), 0));
        ScenarioResult s = MoistureBudget.asFound(in);
        double ug = uW(r.grille());
        double up = uW(r.plenum());
        double ua = uW(r.space());
        double wg = w(r.grille());
        double wa = w(r.space());
        double f = s.leakFraction().valueSi();
        double u = ReturnLeak.standardUncertainty(f, wg, wa, up, ug, ua);
        assertEquals(2 * u, s.leakFraction().expandedSi(), 0.01 * 2 * u);
    }

    private static double w(app.latentledger.core.coil.AirReading a) {
        return app.latentledger.core.coil.AirReading.humidityRatio(a.humidityKind(), P, a.dryBulbC(), a.humiditySi(),
                false);
    }

    /** u(W) of a dew-point reading: dW/dT_dp × (half-width/√3), by a central difference. */
    private static double uW(app.latentledger.core.coil.AirReading a) {
        double h = 1e-4;
        double up = app.latentledger.core.coil.AirReading.humidityRatio(a.humidityKind(), P, a.dryBulbC(),
                a.humiditySi() + h, false);
        double down = app.latentledger.core.coil.AirReading.humidityRatio(a.humidityKind(), P, a.dryBulbC(),
                a.humiditySi() - h, false);
        return (up - down) / (2 * h) * a.humidityTolSi() / Math.sqrt(3);
    }
}
