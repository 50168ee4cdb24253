package app.latentledger.core.units;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The one number format, pinned string by string. The conversions are exact by definition
 * (°F = 1.8 · °C + 32; a temperature difference of 1 K is 1.8 °F); grouping by threes with a comma
 * and a point for decimals is the U.S. printing convention (common practice, no source).
 */
class DisplayNumberTest {
    @Test
    void thousandsAreGroupedWithACommaOnEveryLocale() {
        assertEquals("14,414", DisplayNumber.number(14_414.4, 0));
        assertEquals("1,234,567.89", DisplayNumber.number(1_234_567.891, 2));
        assertEquals("999", DisplayNumber.number(999.4, 0));
        assertEquals("-1,234", DisplayNumber.number(-1_234.0, 0));
    }

    @Test
    void aValueThatRoundsToZeroNeverShowsMinusZero() {
        assertEquals("0.0", DisplayNumber.number(-0.04, 1));
        assertEquals("0", DisplayNumber.number(-0.4, 0));
        assertEquals("-0.1", DisplayNumber.number(-0.06, 1));
    }

    @Test
    void missingAndInfiniteHaveOneSpellingEach() {
        assertEquals("—", DisplayNumber.number(Double.NaN, 2));
        assertEquals("∞", DisplayNumber.number(Double.POSITIVE_INFINITY, 2));
        assertEquals("-∞", DisplayNumber.number(Double.NEGATIVE_INFINITY, 2));
        assertEquals("—", DisplayNumber.withUnit(Quantity.TEMPERATURE, UnitSystem.IP, Double.NaN),
                "no unit after a missing value");
        assertEquals("∞", DisplayNumber.exact(Double.POSITIVE_INFINITY));
        assertEquals("—", DisplayNumber.exact(Double.NaN));
    }

    @Test
    void aChangeAlwaysShowsItsSignUnlessItRoundsToZero() {
        assertEquals("+1.2", DisplayNumber.signed(1.2, 1));
        assertEquals("-330", DisplayNumber.signed(-330, 0));
        assertEquals("+1,234.5", DisplayNumber.signed(1_234.5, 1));
        assertEquals("0.0", DisplayNumber.signed(0.04, 1));
        assertEquals("0.0", DisplayNumber.signed(-0.04, 1));
        assertEquals("—", DisplayNumber.signed(Double.NaN, 1));
        // a fall of 1 K is a fall of 1.8 °F, printed as a temperature difference
        assertEquals("-1.8 °F", DisplayNumber.change(Quantity.TEMPERATURE, UnitSystem.IP, -1.0, Double.NaN, 1));
        assertEquals("+1.8 ± 0.9 °F", DisplayNumber.change(Quantity.TEMPERATURE, UnitSystem.IP, 1.0, 0.5, 1));
    }

    @Test
    void valuesCarryTheQuantitysDecimalsUnitAndSpread() {
        // 76 °F = 24.444… °C; its ±1 K uncertainty is ±1.8 °F
        double c = (76 - 32) / 1.8;
        assertEquals("76.0 °F", DisplayNumber.withUnit(Quantity.TEMPERATURE, UnitSystem.IP, c));
        assertEquals("76.0 ± 1.8 °F", DisplayNumber.withSpread(Quantity.TEMPERATURE, UnitSystem.IP, c, 1.0));
        assertEquals("24.4 ± 1.0 °C", DisplayNumber.withSpread(Quantity.TEMPERATURE, UnitSystem.SI, c, 1.0));
        assertEquals("76.0 °F", DisplayNumber.withSpread(Quantity.TEMPERATURE, UnitSystem.IP, c, Double.NaN),
                "no ± part when the spread is unknown");
        // 1 Btu/h = 1055.05585262 J / 3600 s (IT Btu): 4224.3 W is 14,414 Btu/h
        assertEquals("14,414 Btu/h", DisplayNumber.withUnit(Quantity.POWER, UnitSystem.IP, 14_414 * 1055.05585262 / 3600));
        assertEquals("0.712", DisplayNumber.withUnit(Quantity.DIMENSIONLESS, UnitSystem.IP, 0.7123));
    }

    @Test
    void textToTypeAgainIsExactAndNeverGrouped() {
        assertEquals("1234.5", DisplayNumber.exact(1_234.5));
        assertEquals("0.3333", DisplayNumber.exact(1.0 / 3));
        assertEquals("0", DisplayNumber.exact(-0.00001));
        assertEquals("-58", DisplayNumber.exact(-58.0));
    }

    @Test
    void everyQuantityHasDecimalsInBothUnitSystems() {
        for (Quantity q : Quantity.values()) {
            for (UnitSystem u : UnitSystem.values()) {
                int d = DisplayNumber.decimals(q, u);
                assertTrue(d >= 0 && d <= 5, q + " " + u + ": " + d);
            }
        }
    }
}
