package app.latentledger.core.house;

import app.latentledger.core.psychro.HandbookEdition;
import org.junit.jupiter.api.Test;

import static app.latentledger.core.house.CheckHouse.*;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The EnergyPlus ADP/bypass-factor what-if (Engineering Reference, "Single-Speed Electric DX Air
 * Cooling Coil"; DXCoils.cc CalcCBF, AdjustCBF, CalcDoe2DXCoil) against values computed
 * independently by a port of those routines. Tolerances between the handbook's psychrometrics
 * (used here) and EnergyPlus's own: BF ±0.005, SHR ±0.002, water ±0.05 lb/h; a field-calibrated case
 * computed with the handbook's psychrometrics is held tighter.
 */
class DxCoilWhatIfTest {
    private static final HandbookEdition SI = HandbookEdition.SI;

    private static double wFromWetBulb(double dbF, double wbF) {
        return SI.humidityRatioFromWetBulb(c(dbF), c(wbF), P);
    }

    private static double massFlow(double cfm, double dbC, double w) {
        return cfm * CFM / SI.specificVolumeM3PerKg(dbC, w, P);
    }

    /** Rated 3 tons, 1200 cfm, SHR 0.75 at 80/67 °F: HoF psychrometrics give ADP 13.011 °C, BF 0.13565. */
    @Test
    void ratedBypassFactor() {
        double w = wFromWetBulb(80, 67);
        assertEquals(0.011166, w, 2e-6);
        double[] r = DxCoilWhatIf.ratedBypassFactor(P, c(80), w, massFlow(1200, c(80), w), 10_550.56, 0.75);
        assertEquals(13.011, r[1], 0.03);
        assertEquals(0.13565, r[0], 0.002);
    }

    /**
     * The same coil at other flows (CapFFF = 0.8 + 0.2·ff, entering 80/67 °F): EnergyPlus values
     * 1050 cfm BF 0.0987, SHR 0.7256, 8.784 lb/h; 933.3 cfm BF 0.0739, SHR 0.7034, 9.305 lb/h;
     * 1350 cfm BF 0.1652, SHR 0.7703, 7.731 lb/h.
     */
    @Test
    void sameCoilAtOtherFlows() {
        double w = wFromWetBulb(80, 67);
        double m0 = massFlow(1200, c(80), w);
        double[] rated = DxCoilWhatIf.ratedBypassFactor(P, c(80), w, m0, 10_550.56, 0.75);
        DxCoilWhatIf coil = new DxCoilWhatIf(P, c(80), w, m0, rated[0], 10_550.56, m0);
        double[][] cases = {{1050, 0.0987, 0.7256, 8.784}, {933.3, 0.0739, 0.7034, 9.305},
                {1350, 0.1652, 0.7703, 7.731}, {1200, 0.1319, 0.7500, 8.206}};
        for (double[] c : cases) {
            DxCoilWhatIf.Point p = coil.at(massFlow(c[0], c(80), w));
            assertEquals(c[1], p.bypassFactor(), 0.005, c[0] + " cfm BF");
            assertEquals(c[2], p.shr(), 0.002, c[0] + " cfm SHR");
            assertEquals(c[3], p.waterKgPerS() / LB_PER_H, 0.05, c[0] + " cfm water");
        }
    }

    /**
     * 450 → 350 cfm/ton: a coil rated 3 tons at 1350 cfm, SHR 0.78, at 1050 cfm: BF 0.0986, SHR 0.7323,
     * 8.397 lb/h (vs 7.223 at 1350, +16 %).
     */
    @Test
    void fourFiftyToThreeFifty() {
        double w = wFromWetBulb(80, 67);
        double m0 = massFlow(1350, c(80), w);
        double[] rated = DxCoilWhatIf.ratedBypassFactor(P, c(80), w, m0, 10_550.56, 0.78);
        assertEquals(0.16505, rated[0], 0.005);
        DxCoilWhatIf coil = new DxCoilWhatIf(P, c(80), w, m0, rated[0], 10_550.56, m0);
        DxCoilWhatIf.Point p = coil.at(massFlow(1050, c(80), w));
        assertEquals(0.0986, p.bypassFactor(), 0.005);
        assertEquals(0.7323, p.shr(), 0.002);
        assertEquals(8.397, p.waterKgPerS() / LB_PER_H, 0.05);
        assertEquals(7.223, coil.at(m0).waterKgPerS() / LB_PER_H, 0.05);
    }

    /**
     * Field-calibrated (A₀ from the measured BF; handbook psychrometrics in the independent port too):
     * entering 76 °F / 58 %, measured 1350 cfm, 34 000 Btu/h, BF 0.16, rated flow 1200 cfm → A₀ 1.3607
     * kg/s; at the measured flow ADP 55.58 °F, SHR 0.7267, 8.489 lb/h; at 1050 cfm BF 0.0948,
     * 32 341 Btu/h, ADP 54.07 °F, SHR 0.6872, 9.240 lb/h; at 1200 cfm BF 0.1272, 33 171 Btu/h,
     * SHR 0.7088, 8.824 lb/h.
     */
    @Test
    void fieldCalibrated() {
        double w = wAt(c(76), 58);
        double q = 34_000 * 1055.05585262 / 3600;
        double m0 = massFlow(1350, c(76), w);
        DxCoilWhatIf coil = new DxCoilWhatIf(P, c(76), w, m0, 0.16, q, massFlow(1200, c(76), w));
        assertEquals(1.3607, coil.a0(), 0.0005);
        DxCoilWhatIf.Point now = coil.at(m0);
        assertEquals(c(55.58), now.adpC(), 0.02);
        assertEquals(0.7267, now.shr(), 0.0005);
        assertEquals(8.489, now.waterKgPerS() / LB_PER_H, 0.01);
        DxCoilWhatIf.Point lower = coil.at(massFlow(1050, c(76), w));
        assertEquals(0.0948, lower.bypassFactor(), 0.0005);
        assertEquals(32_341, lower.totalW() * 3600 / 1055.05585262, 5);
        assertEquals(c(54.07), lower.adpC(), 0.02);
        assertEquals(0.6872, lower.shr(), 0.0005);
        assertEquals(9.240, lower.waterKgPerS() / LB_PER_H, 0.01);
        DxCoilWhatIf.Point mid = coil.at(massFlow(1200, c(76), w));
        assertEquals(0.1272, mid.bypassFactor(), 0.0005);
        assertEquals(33_171, mid.totalW() * 3600 / 1055.05585262, 5);
        assertEquals(0.7088, mid.shr(), 0.0005);
        assertEquals(8.824, mid.waterKgPerS() / LB_PER_H, 0.01);
    }

    /** Entering 75 °F / 30 % at the rating-point coil: the ADP lies above the entering W, a dry coil, SHR 1. */
    @Test
    void dryCoil() {
        double w80 = wFromWetBulb(80, 67);
        double m0 = massFlow(1200, c(80), w80);
        double[] rated = DxCoilWhatIf.ratedBypassFactor(P, c(80), w80, m0, 10_550.56, 0.75);
        double w = wAt(c(75), 30);
        DxCoilWhatIf coil = new DxCoilWhatIf(P, c(75), w, massFlow(1200, c(75), w), rated[0], 8776.1,
                massFlow(1200, c(75), w));
        DxCoilWhatIf.Point p = coil.at(massFlow(1200, c(75), w));
        assertTrue(p.dry());
        assertEquals(1.0, p.shr(), 0.0);
        assertEquals(0.0, p.waterKgPerS(), 1e-12);
    }
}
