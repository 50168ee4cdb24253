package app.latentledger.core.psychro;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The band near 32 °F where the psychrometer equations have two wet-bulb solutions, one over
 * water (eq. 33) and one over ice (eq. 35). PsychroLib's bisection returns either, depending on
 * its search path (its grid README lists 38.35–42.40 % RH at 40 °F, sea level, as that band). The
 * core documents one choice: the liquid-wick root whenever it exists.
 */
class WetBulbConventionTest {
    private static final double P = 101_325;
    private static final double DB_40F = (40 - 32) / 1.8;

    @Test
    void insideTheBandBothRootsSatisfyTheEquationsAndTheLiquidOneIsChosen() {
        for (double rh = 38.5; rh <= 42.3; rh += 0.1) {
            MoistAirState s = MoistAirState.fromRelativeHumidity(P, DB_40F, rh, HandbookEdition.IP);
            assertTrue(s.wetBulbC() >= 0, "liquid-wick root chosen at " + rh + " %");
            double w = HandbookEdition.IP.humidityRatioFromWetBulb(DB_40F, s.wetBulbC(), P);
            assertEquals(s.humidityRatio(), w, 1e-12, "eq. 33 satisfied at " + rh + " %");
            // the ice-bulb root exists as well: eq. 35 changes sign between 0 °C and the frost point
            double iceAtZero = HandbookEdition.IP.humidityRatioFromWetBulb(DB_40F, -1e-9, P) - s.humidityRatio();
            double iceLow = HandbookEdition.IP.humidityRatioFromWetBulb(DB_40F, s.dewPointC(), P) - s.humidityRatio();
            assertTrue(iceAtZero > 0 && iceLow < 0, "an ice-bulb root also exists at " + rh + " %");
        }
    }

    @Test
    void belowTheBandOnlyTheIceBulbRootExists() {
        MoistAirState s = MoistAirState.fromRelativeHumidity(P, DB_40F, 30, HandbookEdition.IP);
        assertTrue(s.wetBulbC() < 0);
        assertEquals(s.humidityRatio(), HandbookEdition.IP.humidityRatioFromWetBulb(DB_40F, s.wetBulbC(), P), 1e-12);
    }

    @Test
    void wetBulbIsContinuousInRhOutsideTheBand() {
        double previous = Double.NEGATIVE_INFINITY;
        for (double rh = 43; rh <= 100; rh += 0.5) {
            double wb = MoistAirState.fromRelativeHumidity(P, DB_40F, rh, HandbookEdition.SI).wetBulbC();
            assertTrue(wb > previous, "wet bulb rises with RH");
            previous = wb;
        }
    }

    /**
     * A wet bulb a hair above the triple point (0.0102 °C), where pws switches from eq. 5 to eq. 6
     * and W(t*) has a kink: the solver must still satisfy eq. 33 to far better than 1e-6 K. Found by
     * a random search of 2 million states; the implied error had been 1.1e-5 K.
     */
    @Test
    void convergesAtTheTriplePointKink() {
        double p = 95_500.05573449326;
        double db = 7.077869995467097;
        MoistAirState s = MoistAirState.fromRelativeHumidity(p, db, 17.700424087687463, HandbookEdition.IP);
        assertEquals(0.0102, s.wetBulbC(), 1e-4);
        double w = HandbookEdition.IP.humidityRatioFromWetBulb(db, s.wetBulbC(), p);
        double slope = (HandbookEdition.IP.humidityRatioFromWetBulb(db, s.wetBulbC() + 1e-3, p)
                - HandbookEdition.IP.humidityRatioFromWetBulb(db, s.wetBulbC(), p)) / 1e-3;
        assertTrue(Math.abs(w - s.humidityRatio()) / slope < 1e-9);
    }

    /** The short series the solver uses between close iterates agree with the JDK's log1p and exp. */
    @Test
    void shortSeriesMatchTheJdk() {
        for (double u = -0.01; u <= 0.01; u += 1e-4) {
            assertEquals(Math.log1p(u), WetBulb.log1p(u), 1e-17);
        }
        for (double d = -0.05; d <= 0.05; d += 1e-4) {
            assertEquals(Math.exp(d), WetBulb.expSmall(d), 3e-16);
        }
    }
}
