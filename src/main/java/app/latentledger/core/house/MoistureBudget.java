package app.latentledger.core.house;

import app.latentledger.core.coil.Propagation;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;

/**
 * Computes the house's moisture budget and plans the fixes: the budget as found, then the same
 * budget re-solved for each candidate, all with first-order (GUM) uncertainty through
 * {@link Propagation}. The candidates offered:
 * <ul>
 *   <li>lower blower airflow (asked, or 350 cfm per nominal ton when the system runs above 375),
 *       only with a measured process line (ADP and bypass factor);</li>
 *   <li>blower to AUTO when blower-on rests put water back;</li>
 *   <li>seal the return leak when one was measured;</li>
 *   <li>when the outdoor air is wetter than the house: ventilation reduced (asked, or to the ASHRAE
 *       62.2 rate when above it), an ERV in place of plain ventilation, and the envelope tightened
 *       (asked, or to 3 ACH50 — the IECC 2012 limit for climate zones 3–8, from memory);</li>
 *   <li>a supplemental dehumidifier sized to hold the RH target ({@link DehumidifierRating}).</li>
 * </ul>
 */
public final class MoistureBudget {
    /** Envelope tightness tried when none is asked, ACH50 (IECC 2012 R402.4.1.2, zones 3–8; from memory). */
    public static final double DEFAULT_TARGET_ACH50 = 3.0;
    /** Airflow per nominal ton tried when none is asked (common practice). */
    public static final double DEFAULT_CFM_PER_TON = 350;
    /** Airflow per nominal ton above which the lower-airflow candidate is offered unasked (common practice). */
    public static final double OFFER_ABOVE_CFM_PER_TON = 375;

    private MoistureBudget() {
    }

    /** The budget as found only (no fixes, no findings): the keypad's quick recompute. */
    public static ScenarioResult asFound(HouseInputs in) {
        return solve(in, Scenario.AS_FOUND);
    }

    /** One scenario, with uncertainty. */
    public static ScenarioResult solve(HouseInputs in, Scenario s) {
        return ScenarioResult.of(s, Propagation.firstOrder(in.uncertainInputs(), new BudgetModel(in, s)));
    }

    /** The whole budget, the fixes and the findings. */
    public static HouseBudget compute(HouseInputs in, WhatIfRequest ask, UnitSystem units) {
        ScenarioResult found = solve(in, Scenario.AS_FOUND);
        List<ScenarioResult> fixes = new ArrayList<>();
        for (Scenario s : candidates(in, ask, found)) {
            fixes.add(solve(in, s));
        }
        double needed = Math.max(0.0, found.neededDehumidifier().valueSi());
        double ti = in.readings().indoor().dryBulbC();
        DehumidifierRating.Rated rated = DehumidifierRating.rated(needed, ti, in.rhTargetPct());
        if (needed > 0) {
            fixes.add(solve(in, Scenario.dehumidifier(needed, "add a dehumidifier removing "
                    + dailyPints(needed) + " pints/day (" + fmt(Quantity.WATER_RATE_DAILY.toDisplay(UnitSystem.SI, needed))
                    + " L/day) at the house condition")));
        }
        return new HouseBudget(in, in.facts().infiltrationMethod(), found, fixes, rated,
                HouseFindings.of(in, found, fixes, rated, units), HouseFindings.cautions(fixes));
    }

    /**
     * The candidate fixes for this house, in the order they are shown; a candidate that would not
     * lower the house's net water gain (for example a balanced ERV replacing an exhaust fan in a leaky
     * house, which adds its flow whole instead of in quadrature) is left out.
     */
    static List<Scenario> candidates(HouseInputs in, WhatIfRequest ask, ScenarioResult found) {
        double[] x = new BudgetModel(in, Scenario.AS_FOUND).nominal();
        double before = new BudgetModel(in, Scenario.AS_FOUND).evaluate(x, false)[BudgetModel.Y_BALANCE];
        List<Scenario> helpful = new ArrayList<>();
        for (Scenario s : offered(in, ask, found)) {
            if (new BudgetModel(in, s).evaluate(x, false)[BudgetModel.Y_BALANCE] <= before) {
                helpful.add(s);
            }
        }
        return helpful;
    }

    private static List<Scenario> offered(HouseInputs in, WhatIfRequest ask, ScenarioResult found) {
        List<Scenario> out = new ArrayList<>();
        SystemRemoval sys = in.system();
        HouseFacts f = in.facts();
        if (sys.hasProcessLine()) {
            double flow = ask.airflowM3PerS();
            double perW = Double.isFinite(sys.nominalW()) ? sys.nominalW() : sys.totalW();
            double cfmPerTon = Quantity.AIRFLOW_PER_CAPACITY.toDisplay(UnitSystem.IP, sys.airflowM3PerS() / perW);
            if (!Double.isFinite(flow) && Double.isFinite(sys.nominalW()) && cfmPerTon > OFFER_ABOVE_CFM_PER_TON) {
                flow = Quantity.AIRFLOW_PER_CAPACITY.fromDisplay(UnitSystem.IP, DEFAULT_CFM_PER_TON) * sys.nominalW();
            }
            if (Double.isFinite(flow)) {
                double per = flow / perW;
                boolean inside = per >= DxCoilWhatIf.MIN_FLOW_PER_W && per <= DxCoilWhatIf.MAX_FLOW_PER_W;
                String text = "blower airflow to " + cfm(flow) + " cfm / " + litres(flow) + " L/s ("
                        + Math.round(Quantity.AIRFLOW_PER_CAPACITY.toDisplay(UnitSystem.IP, per)) + " cfm/ton)"
                        + (inside ? "" : " — outside the method's 200–500 cfm/ton limits, an extrapolation");
                out.add(Scenario.airflow(flow, text));
            }
        }
        if (sys.reevaporationShare() > 0) {
            out.add(Scenario.blowerAuto());
        }
        if (found.leakFraction().exists() && found.leakFraction().valueSi() > 0) {
            out.add(Scenario.sealLeak());
        }
        boolean wetterOutside = humidityRatio(in, in.readings().outdoor()) > humidityRatio(in, in.readings().indoor());
        if (wetterOutside && f.ventilationType() != VentilationType.NONE && f.ventilationM3PerS() > 0) {
            double target = ask.ventilationM3PerS();
            double q622 = Ventilation.ashrae622TotalM3PerS(f.floorAreaM2(), f.bedrooms());
            if (!Double.isFinite(target) && f.ventilationM3PerS() > q622 * 1.05) {
                target = q622;
            }
            if (Double.isFinite(target) && target < f.ventilationM3PerS()) {
                out.add(Scenario.ventilation(target, "ventilation reduced to " + cfm(target) + " cfm / "
                        + litres(target) + " L/s"
                        + (target == q622 ? " (the ASHRAE 62.2 rate)" : "")));
            }
            if (f.ventilationType() != VentilationType.ERV) {
                out.add(Scenario.erv());
            }
        }
        if (wetterOutside && f.hasLeakage()) {
            double ach = Double.isFinite(ask.ach50()) ? ask.ach50() : DEFAULT_TARGET_ACH50;
            double q50 = ach * f.volumeM3() / 3600.0;
            if (q50 < f.q50M3PerS()) {
                out.add(Scenario.tighten(q50, "envelope tightened to " + fmt(ach) + " ACH50"));
            }
        }
        return out;
    }

    private static double humidityRatio(HouseInputs in, app.latentledger.core.coil.AirReading r) {
        return app.latentledger.core.coil.AirReading.humidityRatio(r.humidityKind(), in.pressurePa(), r.dryBulbC(),
                r.humiditySi(), true);
    }

    private static long cfm(double m3PerS) {
        return Math.round(Quantity.AIRFLOW.toDisplay(UnitSystem.IP, m3PerS));
    }

    private static long litres(double m3PerS) {
        return Math.round(Quantity.AIRFLOW.toDisplay(UnitSystem.SI, m3PerS));
    }

    private static String dailyPints(double kgPerS) {
        return fmt(Quantity.WATER_RATE_DAILY.toDisplay(UnitSystem.IP, kgPerS));
    }

    private static String fmt(double v) {
        return String.format(java.util.Locale.ROOT, "%.1f", v);
    }
}
