package app.latentledger.core.text;

import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

/**
 * The dew-point margin in words. Temperature differences: 1 K = 1.8 °F exactly (NIST SP 811,
 * conversion of temperature intervals), so a 3.2 °F difference is 16/9 K; values below are typed in
 * °F and converted by that factor here, not by the app.
 */
class MarginWordsTest {
    private static double kelvin(double fahrenheitDifference) {
        return fahrenheitDifference / 1.8;
    }

    @Test
    void aCoilWarmerThanTheDewPointCannotDryTheAir() {
        assertEquals("Coil is 3.2 ± 2.3 °F warmer than the return dew point — it cannot dry the air",
                MarginWords.sentence(UnitSystem.IP, kelvin(-3.2), kelvin(2.3), "return"));
        assertEquals("3.2 ± 2.3 °F warmer", MarginWords.amount(UnitSystem.IP, kelvin(-3.2), kelvin(2.3)));
        // no bare minus sign reaches the reader
        assertFalse(MarginWords.sentence(UnitSystem.IP, kelvin(-3.2), kelvin(2.3), "return").contains("-"));
    }

    @Test
    void aCoilColderThanTheDewPointCanDryIt() {
        assertEquals("Coil is 13.4 ± 1.6 °F colder than the return dew point — it can dry the air",
                MarginWords.sentence(UnitSystem.IP, kelvin(13.4), kelvin(1.6), "return"));
        // SI: a temperature difference is printed in kelvin, as everywhere in the app
        assertEquals("Coil is 7.4 ± 0.9 K colder than the entering dew point — it can dry the air",
                MarginWords.sentence(UnitSystem.SI, 7.4, 0.9, "entering"));
    }

    @Test
    void withinItsUncertaintyItIsTooCloseToTell() {
        assertEquals(MarginWords.Side.TOO_CLOSE, MarginWords.side(kelvin(-0.5), kelvin(2.3)));
        assertEquals("Coil is 0.5 ± 2.3 °F warmer than the return dew point — too close to tell whether it dries the air",
                MarginWords.sentence(UnitSystem.IP, kelvin(-0.5), kelvin(2.3), "return"));
        assertEquals("Coil is at the return dew point (± 2.3 °F) — too close to tell whether it dries the air",
                MarginWords.sentence(UnitSystem.IP, kelvin(0.02), kelvin(2.3), "return"));
    }

    @Test
    void withoutAnUncertaintyTheSignDecides() {
        assertEquals(MarginWords.Side.WARMER, MarginWords.side(-1, Double.NaN));
        assertEquals(MarginWords.Side.COLDER, MarginWords.side(1, Double.NaN));
        assertEquals("—", MarginWords.amount(UnitSystem.IP, Double.NaN, 1));
    }
}
