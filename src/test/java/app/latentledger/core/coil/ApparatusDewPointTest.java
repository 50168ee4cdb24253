package app.latentledger.core.coil;

import app.latentledger.core.psychro.Psychrometrics;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ApparatusDewPointTest {
    private static final double P = 101_325;

    @ParameterizedTest(name = "ADP {0} °F, BF {1}: leaving state built forward, ADP and BF recovered")
    @CsvSource({"40, 0.10", "45, 0.20", "50, 0.10", "52, 0.20", "54, 0.10"})
    void recoversForwardModel(double adpF, double bf) {
        // Textbook coil model (bypass-factor definition, e.g. McQuiston, Parker & Spitler — from memory):
        // leaving = ADP + BF × (entering − ADP) on both t and W, ADP on the saturation curve (HoF eq. 23).
        // Entering 75 °F / 50 % RH, as in docs/methods.md §9.6.
        double t1 = IpCase.c(75);
        double w1 = Psychrometrics.humidityRatio(0.5 * app.latentledger.core.psychro.SaturationPressure.pascals(t1), P);
        double ta = IpCase.c(adpF);
        double wa = Psychrometrics.saturationHumidityRatio(ta, P);
        double t2 = ta + bf * (t1 - ta);
        double w2 = wa + bf * (w1 - wa);
        ApparatusDewPoint a = ApparatusDewPoint.find(P, t1, w1, t2, w2);
        assertTrue(a.found());
        assertEquals(ta, a.temperatureC(), 1e-6);
        assertEquals(bf, a.bypassFactor(), 1e-6);
    }

    @Test
    @DisplayName("docs/methods.md §9.6 table row: ADP 50 °F, BF 0.10 → leaving 52.5 °F / 54.5 gr")
    void tableRow() {
        double t1 = IpCase.c(75);
        double w1 = 64.65 / 7000;
        ApparatusDewPoint a = ApparatusDewPoint.find(P, t1, w1, IpCase.c(52.5), 54.5 / 7000);
        assertEquals(50.0, a.temperatureC() * 1.8 + 32, 0.15);
        assertEquals(0.10, a.bypassFactor(), 0.01);
    }

    @Test
    @DisplayName("No number when the coil added moisture, removed none, or did not cool")
    void noNumber() {
        assertEquals(ApparatusDewPoint.Status.COIL_ADDED_MOISTURE,
                ApparatusDewPoint.find(P, 24, 0.0092, 13, 0.0095).status());
        assertEquals(ApparatusDewPoint.Status.NO_MOISTURE_REMOVED,
                ApparatusDewPoint.find(P, 24, 0.0092, 13, 0.0092).status());
        assertEquals(ApparatusDewPoint.Status.NOT_COOLING,
                ApparatusDewPoint.find(P, 24, 0.0092, 25, 0.0080).status());
        ApparatusDewPoint none = ApparatusDewPoint.find(P, 24, 0.0092, 13, 0.0095);
        assertFalse(none.found());
        assertTrue(Double.isNaN(none.temperatureC()) && Double.isNaN(none.bypassFactor()));
    }

    @Test
    @DisplayName("A steep line that reaches W = 0 before saturation has no ADP (readings inconsistent)")
    void lineMisses() {
        // 75 °F / 64.6 gr to 74 °F / 30 gr: the line falls 34.6 gr per °F and hits W = 0 near 73 °F,
        // where saturation holds about 124 gr (HoF eq. 23): it cannot meet the curve.
        ApparatusDewPoint a = ApparatusDewPoint.find(P, IpCase.c(75), 64.6 / 7000, IpCase.c(74), 30.0 / 7000);
        assertEquals(ApparatusDewPoint.Status.LINE_MISSES_SATURATION, a.status());
    }
}
