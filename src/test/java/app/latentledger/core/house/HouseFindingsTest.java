package app.latentledger.core.house;

import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.FindingCode;
import app.latentledger.core.psychro.Psychrometrics;
import app.latentledger.core.psychro.SaturationPressure;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.util.List;

import static app.latentledger.core.house.CheckHouse.*;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Each house finding fires on realistic readings that call for it and stays quiet on ones that do not. */
class HouseFindingsTest {
    private static HouseBudget budget(HouseFacts f, HouseReadings r, double rtf) {
        SystemRemoval s = system(r.hasLeakCheck() ? plenumW(r) : wAt(c(75), 50), 0);
        SystemRemoval s2 = new SystemRemoval(s.enteringDryBulbC(), s.enteringW(), s.airflowM3PerS(), s.airflowU(),
                s.massFlowKgPerS(), s.steadyRemovalKgPerS(), s.steadyRemovalU(), s.adpC(), s.adpU(), s.bypassFactor(),
                s.bypassFactorU(), s.totalW(), s.sensibleW(), s.nominalW(), rtf, 0.05, "typed", 0.8, 0.1,
                "henderson-rengarajan", 0);
        return MoistureBudget.compute(inputs(f, r, s2), WhatIfRequest.DEFAULTS, UnitSystem.IP);
    }

    private static double plenumW(HouseReadings r) {
        return app.latentledger.core.coil.AirReading.humidityRatio(r.plenum().humidityKind(), P, r.plenum().dryBulbC(),
                r.plenum().humiditySi(), false);
    }

    private static boolean has(HouseBudget b, FindingCode code) {
        return b.findings().stream().anyMatch(f -> f.code() == code);
    }

    /** A plenum holding grille air with a share {@code f} of attic air (115 °F, dew point 74 °F) mixed in. */
    private static HouseReadings leak(double f) {
        double wg = wAt(c(75), 50);
        double wa = Psychrometrics.humidityRatio(SaturationPressure.pascals(c(74)), P);
        double wp = wg + f * (wa - wg);
        double dpF = SaturationPressure.dewPointC(Psychrometrics.vaporPressurePa(wp, P)) * 1.8 + 32;
        return new HouseReadings(rh("indoor", 75, 50), dp("outdoor", 85, 72), rh("grille", 75, 50),
                dp("plenum", 75 + f * 40, dpF), dp("space", 115, 74));
    }

    private static HouseFacts house(double ach50, VentilationType type, double ventCfm) {
        return new HouseFacts(2000 * FT * FT, 8 * FT, 1, 3, 0, Double.NaN, ach50, 0, Double.NaN, type,
                ventCfm * CFM, Double.NaN);
    }

    @Test
    void returnLeakFiresOnlyWhenClearlyAboveItsThreshold() {
        HouseBudget leaky = budget(house(3, VentilationType.NONE, 0), leak(0.20), 0.6);
        assertTrue(has(leaky, FindingCode.RETURN_LEAK), leaky.findings().toString());
        Finding f = leaky.findings().stream().filter(x -> x.code() == FindingCode.RETURN_LEAK).findFirst().orElseThrow();
        assertEquals(0.20, f.evidence().get(0).valueSi(), 0.005);
        assertTrue(leaky.whatIfs().stream().anyMatch(w -> w.scenario().key().equals("seal-return-leak")));
        assertFalse(has(budget(house(3, VentilationType.NONE, 0), leak(0.02), 0.6), FindingCode.RETURN_LEAK));
    }

    @Test
    void ventilationLoadFiresWithALargeExhaustFlow() {
        assertTrue(has(budget(house(2, VentilationType.EXHAUST, 150), readings(), 0.6),
                FindingCode.VENTILATION_MOISTURE_LOAD));
        assertFalse(has(budget(house(2, VentilationType.NONE, 0), readings(), 0.6),
                FindingCode.VENTILATION_MOISTURE_LOAD));
    }

    @Test
    void infiltrationLoadFiresInALeakyHouse() {
        assertTrue(has(budget(house(12, VentilationType.NONE, 0), readings(), 0.6),
                FindingCode.INFILTRATION_MOISTURE_LOAD));
        // very tight (0.6 ACH50): leakage is a small share of the gains
        assertFalse(has(budget(house(0.6, VentilationType.NONE, 0), readings(), 0.6),
                FindingCode.INFILTRATION_MOISTURE_LOAD));
    }

    @Test
    void removalBelowGainsAndDehumidifier() {
        // a tight house whose system barely runs: no fix but a dehumidifier holds 60 % RH
        HouseBudget dry = budget(house(2, VentilationType.EXHAUST, 60), readings(), 0.03);
        assertTrue(has(dry, FindingCode.REMOVAL_BELOW_GAINS), dry.asFound().equilibriumRhPct() + " "
                + dry.asFound().deficitAtTarget() + " " + dry.findings());
        assertTrue(has(dry, FindingCode.DEHUMIDIFIER_ADVISED), dry.findings().toString());
        assertTrue(dry.dehumidifier().needed() > 0);
        ScenarioResult withUnit = dry.whatIfs().get(dry.whatIfs().size() - 1);
        assertEquals("add-dehumidifier", withUnit.scenario().key());
        assertEquals(60.0, withUnit.equilibriumRhPct().valueSi(), 0.05, "sized to hold the RH target exactly");
        HouseBudget fine = budget(house(2, VentilationType.NONE, 0), readings(), 0.7);
        assertFalse(has(fine, FindingCode.REMOVAL_BELOW_GAINS), fine.findings().toString());
        assertFalse(has(fine, FindingCode.DEHUMIDIFIER_ADVISED));
        assertEquals(0.0, fine.dehumidifier().needed());
    }

    @Test
    void everyListEndsWithTheSafetyLineAndPressureCautionsFollowVentilationFixes() {
        HouseBudget b = budget(house(8, VentilationType.EXHAUST, 150), readings(), 0.6);
        List<String> c = b.cautions();
        assertEquals(app.latentledger.core.findings.Cautions.SAFETY_LINE, c.get(c.size() - 1));
        assertTrue(c.contains(HouseFindings.COMBUSTION));
        assertTrue(c.contains(HouseFindings.ATTIC_HEAT));
    }
}
