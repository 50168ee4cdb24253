package app.latentledger.core.settings;

import app.latentledger.core.InvalidInputException;
import app.latentledger.core.findings.Threshold;
import app.latentledger.core.findings.ThresholdSettings;
import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import java.util.HashSet;
import java.util.Map;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SettingsTest {
    private static final String HIGH = Thresholds.COIL_HIGH_AIRFLOW_PER_TON.key();
    private static final String LOW = Thresholds.COIL_LOW_AIRFLOW_PER_TON.key();

    @Test
    @DisplayName("Defaults are the catalogue's: Tolerances, Thresholds, IP, sea level, light, Letter")
    void defaults() {
        Settings d = Settings.DEFAULTS;
        assertEquals(UnitSystem.IP, d.units());
        assertEquals(0.0, d.defaultElevationM());
        assertEquals(InstrumentTolerances.DEFAULTS, d.tolerances());
        assertEquals(60.0, d.indoorRhTargetPct());
        for (Threshold t : Thresholds.all()) {
            assertEquals(t.defaultSi(), d.thresholds().valueSi(t), t.key());
            assertTrue(d.isDefault(t.key()), t.key());
        }
        for (String key : SettingsCatalogue.keys()) {
            assertTrue(d.isDefault(key), key);
        }
    }

    @Test
    @DisplayName("Every threshold of the one catalogue is a setting whose range holds its default and is not empty")
    void everyThresholdIsSettable() {
        for (Threshold t : Thresholds.all()) {
            NumberSetting s = SettingsCatalogue.number(t.key()).orElseThrow(() -> new AssertionError(t.key()));
            assertTrue(s.minSi() < s.maxSi(), t.key());
            assertTrue(s.minSi() <= t.defaultSi() && t.defaultSi() <= s.maxSi(), t.key());
            assertEquals(t.source(), s.source(), "the screen shows the catalogue's own source");
            assertEquals(t.quantity(), s.quantity());
        }
        Set<String> keys = new HashSet<>(SettingsCatalogue.keys());
        assertEquals(SettingsCatalogue.keys().size(), keys.size(), "no key used twice");
    }

    @Test
    @DisplayName("±50 % rule: 450 cfm/ton allows 225–675; 0.20 mismatch allows 10–30 %; RH offset 3 % allows 1.5–4.5 %"
            + " (by hand: default × 0.5 and × 1.5)")
    void thresholdRangesByHand() {
        NumberSetting high = SettingsCatalogue.number(HIGH).orElseThrow();
        assertEquals(225, Quantity.AIRFLOW_PER_CAPACITY.toDisplay(UnitSystem.IP, high.minSi()), 1e-9);
        assertEquals(675, Quantity.AIRFLOW_PER_CAPACITY.toDisplay(UnitSystem.IP, high.maxSi()), 1e-9);
        NumberSetting mismatch = SettingsCatalogue.number(Thresholds.CONDENSATE_MISMATCH_FRACTION.key()).orElseThrow();
        assertEquals(0.10, mismatch.minSi(), 1e-12);
        assertEquals(0.30, mismatch.maxSi(), 1e-12);
        NumberSetting latent = SettingsCatalogue.number(Thresholds.LATENT_FRACTION_MIN.key()).orElseThrow();
        assertEquals(1.0, latent.maxSi(), "a fraction stops at 100 % (0.7 × 1.5 = 1.05 cut)");
        NumberSetting dew = SettingsCatalogue.number(Thresholds.INDOOR_DEW_POINT_MAX.key()).orElseThrow();
        assertEquals(50, Quantity.TEMPERATURE.toDisplay(UnitSystem.IP, dew.minSi()), 1e-9);
        assertEquals(65, Quantity.TEMPERATURE.toDisplay(UnitSystem.IP, dew.maxSi()), 1e-9);
        NumberSetting shr = SettingsCatalogue.number(Thresholds.COIL_HIGH_SHR.key()).orElseThrow();
        assertEquals(1.0, shr.maxSi(), "SHR = sensible / total cannot exceed 1");
    }

    @Test
    @DisplayName("A changed threshold reaches the analyses; set back to its default it is no override any more")
    void thresholdOverrideAndBack() {
        Settings s = Settings.DEFAULTS.withTyped(HIGH, 400, UnitSystem.IP);
        assertEquals(400, Quantity.AIRFLOW_PER_CAPACITY.toDisplay(UnitSystem.IP,
                s.thresholds().valueSi(Thresholds.COIL_HIGH_AIRFLOW_PER_TON)), 1e-9);
        assertFalse(s.isDefault(HIGH));
        Settings back = s.withTyped(HIGH, 450, UnitSystem.IP);
        assertEquals(Settings.DEFAULTS, back);
        assertEquals(Map.of(), back.thresholdOverrides().overridesSi());
        assertEquals(Settings.DEFAULTS, s.reset(HIGH));
    }

    @Test
    @DisplayName("The indoor RH target is its own setting and goes to the analyses as the indoorRhTarget threshold")
    void rhTarget() {
        Settings s = Settings.DEFAULTS.withNumber(SettingsCatalogue.INDOOR_RH_TARGET, 50);
        assertEquals(50.0, s.thresholds().valueSi(Thresholds.INDOOR_RH_TARGET));
        assertThrows(IllegalArgumentException.class, () -> new Settings(UnitSystem.IP, 0, InstrumentTolerances.DEFAULTS,
                60, new ThresholdSettings(Map.of(Thresholds.INDOOR_RH_TARGET.key(), 50.0)), DisplayTheme.LIGHT,
                PaperSize.LETTER));
    }

    @Test
    @DisplayName("Out of range: refused naming the setting, the value and the range in the tech's units")
    void refusals() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> Settings.DEFAULTS.withTyped(HIGH, 700, UnitSystem.IP));
        assertEquals("airflow per ton above which latent removal suffers 700 cfm/ton refused: accepted range 225 to"
                + " 675 cfm/ton", e.message(UnitSystem.IP));
        InvalidInputException tol = assertThrows(InvalidInputException.class,
                () -> Settings.DEFAULTS.withTyped(SettingsCatalogue.TOL_DRY_BULB, -0.1, UnitSystem.IP));
        assertEquals("dry-bulb probe tolerance -0.1 °F refused: accepted range 0 to 5 °F", tol.message(UnitSystem.IP));
        // 5 °F = 2.7778 K (÷ 1.8), shown inwards at the 0.1 K a temperature difference is shown with
        assertEquals("dry-bulb probe tolerance -0.0556 K refused: accepted range 0 to 2.7 K", tol.message(UnitSystem.SI));
        InvalidInputException elev = assertThrows(InvalidInputException.class,
                () -> Settings.DEFAULTS.withTyped(SettingsCatalogue.DEFAULT_ELEVATION, 5000, UnitSystem.SI));
        assertTrue(elev.message(UnitSystem.SI).contains("default site elevation 5000 m refused: accepted range -450 to 4500 m"),
                elev.message(UnitSystem.SI));
        assertThrows(InvalidInputException.class, () -> Settings.DEFAULTS.withNumber(SettingsCatalogue.TOL_RH, Double.NaN));
        IllegalArgumentException word = assertThrows(IllegalArgumentException.class,
                () -> Settings.DEFAULTS.withChoice(SettingsCatalogue.PAPER, "legal"));
        assertEquals("paper size 'legal' refused: accepted letter, a4", word.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Settings.DEFAULTS.withNumber("noSuchKey", 1));
    }

    @Test
    @DisplayName("The low airflow limit stays below the high one, whichever is changed")
    void pairsStayOrdered() {
        InvalidInputException high = assertThrows(InvalidInputException.class,
                () -> Settings.DEFAULTS.withTyped(HIGH, 290, UnitSystem.IP));
        assertTrue(high.message(UnitSystem.IP).contains("accepted range 300 to 675 cfm/ton"), high.message(UnitSystem.IP));
        InvalidInputException low = assertThrows(InvalidInputException.class,
                () -> Settings.DEFAULTS.withTyped(LOW, 449, UnitSystem.IP).withTyped(LOW, 450, UnitSystem.IP));
        assertTrue(low.message(UnitSystem.IP).startsWith("airflow per ton below which the coil risks icing 450 cfm/ton"),
                low.message(UnitSystem.IP));
        assertTrue(low.message(UnitSystem.IP).contains("must stay below"), low.message(UnitSystem.IP));
        assertThrows(InvalidInputException.class, () -> Settings.DEFAULTS
                .withNumber(Thresholds.SPLIT_OFF.key(), 1.5).withNumber(Thresholds.SPLIT_ON.key(), 1.5));
    }

    @Test
    void choices() {
        Settings s = Settings.DEFAULTS.withChoice("units", "SI").withChoice("theme", "dark").withChoice("paper", "A4");
        assertEquals(UnitSystem.SI, s.units());
        assertEquals(DisplayTheme.DARK, s.theme());
        assertEquals(PaperSize.A4, s.paper());
        assertEquals("si", s.choice("units"));
        // ISO 216: A4 is 210 × 297 mm; US Letter 8.5 × 11 in = 215.9 × 279.4 mm (25.4 mm/in)
        assertEquals(297.0, PaperSize.A4.heightMm());
        assertEquals(11 * 25.4, PaperSize.LETTER.heightMm(), 1e-9);
    }
}
