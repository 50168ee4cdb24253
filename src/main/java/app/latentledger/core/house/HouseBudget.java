package app.latentledger.core.house;

import app.latentledger.core.findings.Finding;

import java.util.List;

/**
 * The house's moisture budget as found, the fixes re-solved beside it, the supplemental dehumidifier
 * it would take, and the findings.
 *
 * @param inputs        what it was computed from
 * @param method        which infiltration model was used
 * @param asFound       the budget as found
 * @param whatIfs       each candidate fix, re-solved
 * @param dehumidifier  capacity needed to hold the RH target, in pints/day-free SI (kg/s) at the house
 *                      condition and converted to the rating conditions (same unit)
 * @param findings      what to tell the tech and the homeowner
 * @param cautions      safety lines for the fixes
 */
public record HouseBudget(HouseInputs inputs, Infiltration.Method method, ScenarioResult asFound,
                          List<ScenarioResult> whatIfs, DehumidifierRating.Rated dehumidifier, List<Finding> findings,
                          List<String> cautions) {
    public HouseBudget {
        whatIfs = List.copyOf(whatIfs);
        findings = List.copyOf(findings);
        cautions = List.copyOf(cautions);
    }
}
