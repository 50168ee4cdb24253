package app.latentledger.ui.house;

import app.latentledger.core.house.HouseFacts;
import app.latentledger.core.house.HouseVisitReadings;
import app.latentledger.core.house.VentilationType;
import app.latentledger.core.measure.HumidityKind;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The House screen's number pad: each fact and reading typed in the tech's units is stored at once
 * with its site or visit and is there after a restart; a refusal names the field, the value and the
 * accepted range and keeps what was stored. Unit conversions checked: 1 ft = 0.3048 m exactly
 * (international foot), °C = (°F − 32)/1.8, 1 cfm = 0.3048³/60 m³/s (definitions).
 */
class HouseEntryViewModelTest {
    private static final double FT = 0.3048;

    @TempDir
    Path dir;

    @Test
    void aNewHouseIsSavedOnceFloorAreaAndBedroomsAreInAndSurvivesARestart() {
        try (AppSession s = open(DemoScenario.VISIT_COMMISSIONING, UnitSystem.IP)) {
            HouseEntryViewModel e = new HouseViewModel(s).entry();
            assertTrue(s.ledger().houses().facts(DemoScenario.SITE_QUAY).isEmpty(), "the quay office starts without facts");
            type(e, HouseField.FLOOR_AREA, "1850");
            assertFalse(e.refusedProperty().get(), e.messageProperty().get());
            assertTrue(e.messageProperty().get().contains("not saved yet"), e.messageProperty().get());
            assertTrue(e.valueText(HouseField.FLOOR_AREA).contains("not saved yet"));
            assertTrue(s.ledger().houses().facts(DemoScenario.SITE_QUAY).isEmpty());
            type(e, HouseField.BEDROOMS, "3");
            HouseFacts f = s.ledger().houses().facts(DemoScenario.SITE_QUAY).orElseThrow();
            assertEquals(1850 * FT * FT, f.floorAreaM2(), 1e-9);
            assertEquals(3, f.bedrooms());
            assertEquals(8 * FT, f.ceilingHeightM(), 1e-12, "the house command's 8 ft default");
            e.selectedProperty().set(HouseField.VENTILATION);
            e.choose("erv");
            type(e, HouseField.VENTILATION, "60");
            type(e, HouseField.BLOWER_DOOR, "1400");
        }
        try (AppSession s = open(DemoScenario.VISIT_COMMISSIONING, UnitSystem.SI)) {
            HouseFacts f = s.ledger().houses().facts(DemoScenario.SITE_QUAY).orElseThrow();
            assertEquals(VentilationType.ERV, f.ventilationType());
            assertEquals(60 * FT * FT * FT / 60, f.ventilationM3PerS(), 1e-12);
            assertEquals(1400 * FT * FT * FT / 60, f.cfm50M3PerS(), 1e-12);
            assertTrue(Double.isNaN(f.ach50()));
            HouseEntryViewModel e = new HouseViewModel(s).entry();
            assertEquals("172 m²", e.valueText(HouseField.FLOOR_AREA), "1850 ft² = 171.87 m², shown in SI after a restart");
        }
    }

    @Test
    void anAirReadingIsSavedWhenItsTwoHalvesAreIn() {
        try (AppSession s = open(DemoScenario.VISIT_COMMISSIONING, UnitSystem.IP)) {
            HouseEntryViewModel e = new HouseViewModel(s).entry();
            type(e, HouseField.OUTDOOR_DB, "91");
            assertNull(s.ledger().houses().readings(DemoScenario.VISIT_COMMISSIONING).outdoor());
            e.selectedProperty().set(HouseField.OUTDOOR_HUMIDITY);
            e.choose("rh");
            type(e, HouseField.OUTDOOR_HUMIDITY, "62");
            var o = s.ledger().houses().readings(DemoScenario.VISIT_COMMISSIONING).outdoor();
            assertNotNull(o, e.messageProperty().get());
            assertEquals((91 - 32) / 1.8, o.dryBulbC(), 1e-12);
            assertEquals(HumidityKind.RELATIVE_HUMIDITY, o.humidityKind());
            assertEquals(62, o.humiditySi(), 1e-12);
            assertEquals(s.settings().tolerances().dryBulbK(), o.dryBulbTolK(), 0, "the settings' instrument tolerance");
            // one half of a stored reading changes alone
            type(e, HouseField.OUTDOOR_DB, "93");
            assertEquals((93 - 32) / 1.8, s.ledger().houses().readings(DemoScenario.VISIT_COMMISSIONING).outdoor()
                    .dryBulbC(), 1e-12);
            type(e, HouseField.RUNTIME, "55");
            assertEquals(0.55, s.ledger().houses().readings(DemoScenario.VISIT_COMMISSIONING).runtimeFraction(), 1e-12);
        }
    }

    @Test
    void refusalsNameFieldValueAndRangeAndKeepWhatWasStored() {
        try (AppSession s = open(DemoScenario.VISIT_COMPLAINT, UnitSystem.IP)) {
            HouseEntryViewModel e = new HouseViewModel(s).entry();
            HouseFacts before = s.ledger().houses().facts(DemoScenario.SITE_HERON).orElseThrow();
            HouseVisitReadings readingsBefore = s.ledger().houses().readings(DemoScenario.VISIT_COMPLAINT);

            // 20–2000 m² is 215.3–21,527.8 ft² (1 ft² = 0.09290304 m²), shown rounded inwards
            type(e, HouseField.FLOOR_AREA, "50000");
            refused(e, "floor area 50000 ft² refused", "accepted range 216 to 21527 ft²");
            type(e, HouseField.STORIES, "4");
            refused(e, "stories 4", "accepted range 1 to 3");
            type(e, HouseField.BEDROOMS, "2.5");
            refused(e, "bedrooms 2.5 refused: a whole number");
            type(e, HouseField.RUNTIME, "150");
            refused(e, "runtime fraction 150 %", "accepted range 1 to 100 %");
            // a dew point above the stored 88 °F outdoor dry bulb is no possible air (ASHRAE HoF 2017 ch. 1)
            type(e, HouseField.OUTDOOR_HUMIDITY, "95");
            refused(e, "outdoor dew point 95", "accepted range");
            type(e, HouseField.GRILLE_DB, "250");
            refused(e, "grille dry bulb 250 °F refused", "accepted range -58 to 203 °F");

            assertEquals(before, s.ledger().houses().facts(DemoScenario.SITE_HERON).orElseThrow(), "facts unchanged");
            assertEquals(readingsBefore, s.ledger().houses().readings(DemoScenario.VISIT_COMPLAINT), "readings unchanged");
        }
    }

    @Test
    void eachStoreRecomputesTheBudget() {
        try (AppSession s = open(DemoScenario.VISIT_COMPLAINT, UnitSystem.IP)) {
            HouseViewModel vm = new HouseViewModel(s);
            double gains = vm.budgetProperty().get().asFound().gains().valueSi();
            // more bedrooms: more people, more internal moisture (ASHRAE HoF ch. 17: latent gain grows with occupants)
            type(vm.entry(), HouseField.BEDROOMS, "6");
            assertFalse(vm.entry().refusedProperty().get(), vm.entry().messageProperty().get());
            assertTrue(vm.budgetProperty().get().asFound().gains().valueSi() > gains);
        }
    }

    /**
     * Half a pair typed, the app killed (the session closed without a word to the pad) and started
     * again: the half is back in its box, still "not saved yet", with the choice it was typed under;
     * typing the other half stores the pair through the house repository and the half is gone.
     * 91 °F = 32.777… °C and 1.5 ACH50 are the typed numbers (°C = (°F − 32)/1.8, definition).
     */
    @Test
    void halfAPairSurvivesARestartAndFinishingItSavesThePair() {
        try (AppSession s = open(DemoScenario.VISIT_COMMISSIONING, UnitSystem.IP)) {
            HouseEntryViewModel e = new HouseViewModel(s).entry();
            type(e, HouseField.OUTDOOR_DB, "91");
            e.selectedProperty().set(HouseField.BLOWER_DOOR);
            e.choose("ach50");
            type(e, HouseField.BLOWER_DOOR, "1.5");
            assertTrue(e.valueText(HouseField.OUTDOOR_DB).endsWith("(not saved yet)"));
            assertNull(s.ledger().houses().readings(DemoScenario.VISIT_COMMISSIONING).outdoor());
            assertTrue(s.ledger().houses().facts(DemoScenario.SITE_QUAY).isEmpty());
        }
        try (AppSession s = open(DemoScenario.VISIT_COMMISSIONING, UnitSystem.IP)) {
            HouseEntryViewModel e = new HouseViewModel(s).entry();
            assertEquals("91.0 °F (not saved yet)", e.valueText(HouseField.OUTDOOR_DB), "back after the restart");
            assertEquals("1.5 ACH50 (not saved yet)", e.valueText(HouseField.BLOWER_DOOR),
                    "with the choice it was typed under, not the box's default CFM50");
            assertEquals("—", e.valueText(HouseField.OUTDOOR_HUMIDITY));
            assertNull(s.ledger().houses().readings(DemoScenario.VISIT_COMMISSIONING).outdoor(), "still not saved");
            e.selectedProperty().set(HouseField.OUTDOOR_HUMIDITY);
            e.choose("rh");
            type(e, HouseField.OUTDOOR_HUMIDITY, "62");
            assertFalse(e.refusedProperty().get(), e.messageProperty().get());
            var o = s.ledger().houses().readings(DemoScenario.VISIT_COMMISSIONING).outdoor();
            assertNotNull(o, "the pair is stored through the house repository");
            assertEquals((91 - 32) / 1.8, o.dryBulbC(), 1e-12);
            assertEquals(HumidityKind.RELATIVE_HUMIDITY, o.humidityKind());
            assertEquals(62, o.humiditySi(), 1e-12);
            assertFalse(e.valueText(HouseField.OUTDOOR_DB).contains("not saved"), e.valueText(HouseField.OUTDOOR_DB));
            // the house's facts: bedrooms finish the pair the blower door was waiting in, kept as ACH50
            type(e, HouseField.FLOOR_AREA, "1850");
            type(e, HouseField.BEDROOMS, "3");
            HouseFacts f = s.ledger().houses().facts(DemoScenario.SITE_QUAY).orElseThrow();
            assertEquals(1.5, f.ach50(), 1e-12);
            assertTrue(Double.isNaN(f.cfm50M3PerS()));
        }
        try (AppSession s = open(DemoScenario.VISIT_COMMISSIONING, UnitSystem.IP)) {
            HouseEntryViewModel e = new HouseViewModel(s).entry();
            for (HouseField f : HouseField.values()) {
                assertFalse(e.valueText(f).contains("not saved"), f + ": nothing waits once the pairs are stored");
            }
        }
    }

    private AppSession open(String visit, UnitSystem units) {
        AppSession s = TestSessions.open(dir);
        s.saveSettings(s.settings().withChoice(app.latentledger.core.settings.SettingsCatalogue.UNITS, units.key()));
        s.openVisit(s.ledger().visits().find(visit).orElseThrow());
        return s;
    }

    private static void type(HouseEntryViewModel e, HouseField f, String number) {
        e.selectedProperty().set(f);
        for (char c : number.toCharArray()) {
            if (c == '.') {
                e.pad().point();
            } else {
                e.pad().digit(c - '0');
            }
        }
        e.enter();
    }

    private static void refused(HouseEntryViewModel e, String... words) {
        assertTrue(e.refusedProperty().get(), e.messageProperty().get());
        for (String w : words) {
            assertTrue(e.messageProperty().get().contains(w), "'" + w + "' in: " + e.messageProperty().get());
        }
    }
}
