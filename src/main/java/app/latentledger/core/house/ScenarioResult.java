package app.latentledger.core.house;

import app.latentledger.core.coil.Estimate;
import app.latentledger.core.coil.Propagation;

/**
 * The budget of one {@link Scenario}, each figure with its expanded uncertainty (k = 2). Water flows
 * in kg/s (shown per day at the edges); NaN when a figure does not exist (no equilibrium, no leak
 * check).
 *
 * @param scenario       what was assumed
 * @param infiltration   water brought by air leakage, kg/s
 * @param ventilation    water brought by mechanical ventilation, kg/s
 * @param internal       water released indoors, kg/s (memory-only presets)
 * @param returnLeak     water brought by a leaking return duct, kg/s
 * @param gains          their sum, kg/s
 * @param removal        net removal by the system (and any dehumidifier), kg/s
 * @param removedInRuns  water removed while the compressor runs, kg/s
 * @param reevaporated   of it, what blower-on rests put back, kg/s
 * @param balance        gains − removal at the house's present humidity, kg/s (positive: getting wetter)
 * @param leakFraction   return leak fraction f, 0–1
 * @param equilibriumW   indoor humidity ratio where gains equal removal, kg/kg
 * @param equilibriumDewPointC its dew point, °C
 * @param equilibriumRhPct its RH at the indoor dry bulb, %
 * @param deficitAtTarget gains − removal at the RH target, kg/s (positive: a dehumidifier is needed)
 * @param shr            sensible heat ratio of the coil
 * @param latentW        latent capacity, W
 * @param steadyRemoval  steady moisture removal, kg/s
 * @param runtimeFraction compressor runtime fraction
 * @param infiltrationFlowM3PerS the leakage flow counted under infiltration, m³/s
 * @param neededDehumidifier water a dehumidifier must remove to hold the RH target, kg/s (before any)
 */
public record ScenarioResult(Scenario scenario, Estimate infiltration, Estimate ventilation, Estimate internal,
                             Estimate returnLeak, Estimate gains, Estimate removal, Estimate removedInRuns,
                             Estimate reevaporated, Estimate balance, Estimate leakFraction, Estimate equilibriumW,
                             Estimate equilibriumDewPointC, Estimate equilibriumRhPct, Estimate deficitAtTarget,
                             Estimate shr, Estimate latentW, Estimate steadyRemoval, Estimate runtimeFraction,
                             Estimate infiltrationFlowM3PerS, Estimate neededDehumidifier) {

    static ScenarioResult of(Scenario s, Propagation.Result r) {
        return new ScenarioResult(s, e(r, BudgetModel.Y_INFILTRATION), e(r, BudgetModel.Y_VENTILATION),
                e(r, BudgetModel.Y_INTERNAL), e(r, BudgetModel.Y_LEAK), e(r, BudgetModel.Y_GAINS),
                e(r, BudgetModel.Y_REMOVAL), e(r, BudgetModel.Y_GROSS), e(r, BudgetModel.Y_REEVAPORATED),
                e(r, BudgetModel.Y_BALANCE), e(r, BudgetModel.Y_LEAK_FRACTION), e(r, BudgetModel.Y_EQ_W),
                e(r, BudgetModel.Y_EQ_DEW_POINT), e(r, BudgetModel.Y_EQ_RH), e(r, BudgetModel.Y_DEFICIT),
                e(r, BudgetModel.Y_SHR), e(r, BudgetModel.Y_LATENT), e(r, BudgetModel.Y_STEADY),
                e(r, BudgetModel.Y_RUNTIME), e(r, BudgetModel.Y_INFILTRATION_FLOW), e(r, BudgetModel.Y_DEHUMIDIFIER));
    }

    private static Estimate e(Propagation.Result r, int i) {
        return new Estimate(r.values()[i], r.expanded()[i]);
    }

    /** True when the system holds the house at some indoor humidity below saturation. */
    public boolean hasEquilibrium() {
        return equilibriumW.exists();
    }
}
