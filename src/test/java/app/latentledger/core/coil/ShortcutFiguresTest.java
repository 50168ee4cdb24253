package app.latentledger.core.coil;

import app.latentledger.core.psychro.SitePressure;
import app.latentledger.core.units.Conversions;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

class ShortcutFiguresTest {
    private static final double BTU_H_PER_W = 3600 / Conversions.J_PER_BTU;

    @Test
    @DisplayName("Standard-air constants: 1.08 = 60 × 0.075 × 0.24, 4.5 = 60 × 0.075, 0.68 ≈ 4.5 × 1061/7000 (common practice, no source)")
    void constantsFromStandardAir() {
        assertEquals(60 * 0.075 * 0.24, ShortcutFigures.IP_SENSIBLE, 1e-12);
        assertEquals(60 * 0.075, ShortcutFigures.IP_TOTAL, 1e-12);
        assertEquals(60 * 0.075 * 1061 / 7000.0, ShortcutFigures.IP_LATENT, 0.005);
        // HoF 2021 SI ch. 18 §"standard air": 1.23, 3010, 1.2 (read in docs/methods.md §9.8, HoF 2021 SI ch. 18)
        assertEquals(1.23, ShortcutFigures.SI_SENSIBLE, 0);
        assertEquals(3010, ShortcutFigures.SI_LATENT, 0);
        assertEquals(1.2, ShortcutFigures.SI_TOTAL, 0);
    }

    @ParameterizedTest(name = "{0} ft → ratio {1} (docs/methods.md §9.8, from HoF ch. 1 eq. 3 per ch. 18)")
    @CsvSource({"1000, 0.9644, 1.042, 4.340", "5000, 0.8321, 0.899, 3.744", "5280, 0.8234, 0.889, 3.705"})
    void altitudeScaling(double feet, double ratio, double sensible, double total) {
        double p = SitePressure.fromElevation(feet * 0.3048).pressurePa();
        CoilProcess q = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).elevationFt(feet).run().process();
        ShortcutFigures s = ShortcutFigures.of(UnitSystem.IP, p, IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200)
                .readings().airflowM3PerS(), q);
        // the table rounds to 4 places from the IP form of eq. 3 (6.8754e-6 per ft); the SI form differs in the 5th
        assertEquals(ratio, s.pressureRatio(), 0.0001);
        assertEquals(sensible, s.scaledConstants()[0], 0.0005);
        assertEquals(total, s.scaledConstants()[2], 0.0005);
    }

    @ParameterizedTest(name = "HoF 2021 SI ch. 18 altitude example: {0} m → C_t {1}, C_s {2}, C_l {3}")
    @CsvSource({"1194, 1.04, 1.07, 2608", "1619, 0.99, 1.01, 2475"})
    void handbookAltitudeExamples(double metres, double ct, double cs, double cl) {
        double p = SitePressure.fromElevation(metres).pressurePa();
        CoilProcess q = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).run().process();
        double[] c = ShortcutFigures.of(UnitSystem.SI, p, 0.5, q).scaledConstants();
        assertEquals(cs, c[0], 0.005);
        assertEquals(cl, c[1], 5);
        assertEquals(ct, c[2], 0.005);
    }

    @Test
    @DisplayName("Case A shortcuts: 1.08 → 25 920, 0.68 → 5555, 4.5 → 32 063 Btu/h (hand-computed, docs/methods.md §9.5)")
    void caseAShortcuts() {
        // 1.08 × 1200 × 20 = 25 920; 0.68 × 1200 × 6.807 = 5555; 4.5 × 1200 × (28.107 − 22.169) = 32 063
        IpCase k = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200);
        CoilProcess q = k.run().process();
        ShortcutFigures s = ShortcutFigures.of(UnitSystem.IP, 101_325, k.readings().airflowM3PerS(), q);
        assertEquals(25_920, s.sensibleW() * BTU_H_PER_W, 1);
        assertEquals(5_555, s.latentW() * BTU_H_PER_W, 5);
        // Δh here from the SI edition's eq. 32, the hand figure from the IP edition's: 0.1 %
        assertEquals(32_063, s.totalW() * BTU_H_PER_W, 32_063 * 0.002);
    }

    @Test
    @DisplayName("At 5000 ft uncorrected shortcuts overstate; scaled ones land near the mass-flow figures (case C)")
    void caseCAltitude() {
        // docs/methods.md §9.5 case C: mass-based total 26 843 Btu/h; uncorrected 4.5 shortcut 33 344
        IpCase k = IpCase.returnRh(75, 50).supplyRh(55, 90).cfm(1200).elevationFt(5000);
        CoilReadings r = k.readings();
        CoilProcess q = k.run().process();
        assertEquals(26_843, q.totalW() * BTU_H_PER_W, 26_843 * 0.003);
        ShortcutFigures s = ShortcutFigures.of(UnitSystem.IP, r.pressurePa(), r.airflowM3PerS(), q);
        assertEquals(33_344 * 0.8321, s.totalW() * BTU_H_PER_W, 33_344 * 0.8321 * 0.003);
        assertEquals(q.totalW(), s.totalW(), 0.05 * q.totalW());
    }
}
