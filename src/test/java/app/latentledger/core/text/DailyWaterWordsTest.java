package app.latentledger.core.text;

import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.util.Locale;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Water per day in words. Expected figures are worked by hand from the definitions: a day is
 * 86 400 s; water taken as 1 kg/L; a US liquid pint is 0.473176473 L exactly (NIST Handbook 44,
 * Appendix C).
 */
class DailyWaterWordsTest {
    private static final double PINT_L = 0.473176473;

    @Test
    void aCoilThatDriesTheAirSaysWhatItWouldRemoveInADay() {
        double kgPerS = 0.0005; // 43.2 L/day
        String pints = String.format(Locale.ROOT, "%.1f", 0.0005 * 86_400 / PINT_L);
        assertEquals("Water removed if it ran all day", DailyWaterWords.label(kgPerS, UnitSystem.IP));
        assertEquals(pints + " pints/day if it ran all day", DailyWaterWords.phrase(kgPerS, UnitSystem.IP));
        assertEquals("43.2 L/day if it ran all day", DailyWaterWords.phrase(kgPerS, UnitSystem.SI));
    }

    @Test
    void aCoilThatLeavesTheAirWetterAddsWaterAndNeverShowsANegativeAmount() {
        double kgPerS = -0.0005;
        String pints = String.format(Locale.ROOT, "%.1f", 0.0005 * 86_400 / PINT_L);
        assertEquals("Water added to the air if it ran all day", DailyWaterWords.label(kgPerS, UnitSystem.IP));
        assertEquals(pints, DailyWaterWords.number(kgPerS, UnitSystem.IP));
        assertEquals(pints + " pints/day added to the air if it ran all day", DailyWaterWords.phrase(kgPerS, UnitSystem.IP));
        assertEquals("43.2 L/day added to the air if it ran all day", DailyWaterWords.phrase(kgPerS, UnitSystem.SI));
    }

    @Test
    void aLossTooSmallToShowIsNotCalledAdding() {
        // 1e-8 kg/s is 0.86 mL/day: "0.0" at the shown precision, which is no water either way
        assertEquals("Water removed if it ran all day", DailyWaterWords.label(-1e-8, UnitSystem.SI));
        assertEquals("0.0", DailyWaterWords.number(-1e-8, UnitSystem.SI));
    }
}
