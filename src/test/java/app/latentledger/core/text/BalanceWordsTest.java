package app.latentledger.core.text;

import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

/**
 * The house's water balance in words. Figures are typed here in pints (or litres) a day and turned
 * into kg/s by hand: 1 US liquid pint = 0.473176473 L exactly (NIST SP 811, appendix B.8), water at
 * 1 kg per litre (the budget's own convention for liquid water, 1000 kg/m³, from memory), 86,400 s a
 * day; not by the app's converter.
 */
class BalanceWordsTest {
    private static double pintsADay(double pints) {
        return pints * 0.473176473 / 86_400;
    }

    private static double litresADay(double litres) {
        return litres / 86_400;
    }

    @Test
    void aHouseTakingOnWaterGains() {
        assertEquals(BalanceWords.Way.GAINS, BalanceWords.way(pintsADay(32.7), pintsADay(10.6)));
        assertEquals("The house gains about 32.7 ± 10.6 pints a day",
                BalanceWords.sentence(UnitSystem.IP, pintsADay(32.7), pintsADay(10.6)));
        assertEquals("The house gains about 15.5 ± 5.0 litres a day",
                BalanceWords.sentence(UnitSystem.SI, litresADay(15.5), litresADay(5.0)));
    }

    @Test
    void aHouseLosingWaterDries() {
        assertEquals(BalanceWords.Way.DRIES, BalanceWords.way(pintsADay(-32.7), pintsADay(10.6)));
        String s = BalanceWords.sentence(UnitSystem.IP, pintsADay(-32.7), pintsADay(10.6));
        assertEquals("The house dries by about 32.7 ± 10.6 pints a day", s);
        assertFalse(s.contains("-") || s.contains("\u2212"), "the words carry the direction, not a sign");
    }

    @Test
    void anUncertaintyThatSpansZeroIsSaidPlainly() {
        // −32.7 ± 60.6: anywhere from drying by 93.3 to gaining 27.9 pints a day
        assertEquals(BalanceWords.Way.IN_BALANCE, BalanceWords.way(pintsADay(-32.7), pintsADay(60.6)));
        assertEquals("About in balance: \u221293.3 to +27.9 pints a day",
                BalanceWords.sentence(UnitSystem.IP, pintsADay(-32.7), pintsADay(60.6)));
        assertEquals("About in balance: \u22125.0 to +12.0 litres a day",
                BalanceWords.sentence(UnitSystem.SI, litresADay(3.5), litresADay(8.5)));
        // exactly at the edge: the interval touches zero, so neither way can be claimed
        assertEquals(BalanceWords.Way.IN_BALANCE, BalanceWords.way(pintsADay(5), pintsADay(5)));
    }

    @Test
    void withoutAnUncertaintyTheSignDecides() {
        assertEquals(BalanceWords.Way.GAINS, BalanceWords.way(pintsADay(0.4), Double.NaN));
        assertEquals("The house gains about 0.4 pints a day",
                BalanceWords.sentence(UnitSystem.IP, pintsADay(0.4), Double.NaN));
        assertEquals(BalanceWords.Way.DRIES, BalanceWords.way(pintsADay(-0.4), Double.NaN));
        assertEquals("About in balance: 0.0 pints a day", BalanceWords.sentence(UnitSystem.IP, 0.0, Double.NaN));
        assertEquals("Water balance not known", BalanceWords.sentence(UnitSystem.IP, Double.NaN, 1));
    }
}
