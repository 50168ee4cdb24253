package app.latentledger.ui.entry;

import app.latentledger.ui.TestSessions;
import app.latentledger.ui.results.ResultsViewModel;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Draft;
import app.latentledger.ui.session.FileDraftStore;
import app.latentledger.ui.session.Slot;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static app.latentledger.ui.entry.Typing.type;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The readings screen's view model without a window: entry, refusal, keeping, reopening. */
class EntryViewModelTest {
    @TempDir
    Path dir;

    @Test
    void anAcceptedValueIsKeptInTheDraftFileAtOnce() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            type(vm, Slot.RETURN_DRY_BULB, "76");
            assertFalse(vm.refusedProperty().get(), vm.messageProperty().get());
            assertEquals("76.0", vm.valueText(Slot.RETURN_DRY_BULB).get());
            Draft kept = new FileDraftStore(dir).find(s.draft().readingSetId()).orElseThrow();
            // 76 °F = 24.444… °C (exact conversion, °C = (°F − 32) / 1.8)
            assertEquals((76 - 32) / 1.8, kept.value(Slot.RETURN_DRY_BULB).valueSi(), 1e-9);
            assertEquals(0, s.ledger().readings().forVisit(s.visit().id()).size(), "not a reading set yet");
        }
    }

    @Test
    void theFourthRequiredValueMakesAReadingSetInTheLedger() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            type(vm, Slot.RETURN_DRY_BULB, "76");
            type(vm, Slot.RETURN_HUMIDITY, "66");
            type(vm, Slot.SUPPLY_DRY_BULB, "66.5");
            type(vm, Slot.SUPPLY_HUMIDITY, "62.8");
            assertEquals(1, s.ledger().readings().forVisit(s.visit().id()).size());
            type(vm, Slot.AIRFLOW, "1410");
            assertNotNull(s.ledger().readings().find(s.draft().readingSetId()).orElseThrow().airflow(),
                    "each later value updates the stored reading set");
        }
    }

    @Test
    void theCondensateRefusalStaysInTheMillilitresTheTechTyped() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            // the box is in mL whatever the units (IP here); the catch limit is 0.05 m³ = 50000 mL (FieldLimits)
            type(vm, Slot.CONDENSATE_VOLUME, "60000");
            assertTrue(vm.refusedProperty().get());
            assertEquals("Not saved: water caught 60000 mL refused: accepted range 0 to 50000 mL",
                    vm.messageProperty().get());
        }
    }

    @Test
    void anOutOfRangeValueIsRefusedWithItsRangeAndNothingKeptChanges() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            type(vm, Slot.RETURN_DRY_BULB, "76");
            type(vm, Slot.RETURN_DRY_BULB, "250");
            assertTrue(vm.refusedProperty().get());
            // the core's temperature range is −50 to 95 °C = −58 to 203 °F (InputLimits)
            assertEquals("Not saved: return dry bulb 250 °F refused: accepted range -58 to 203 °F",
                    vm.messageProperty().get());
            assertEquals("76.0", vm.valueText(Slot.RETURN_DRY_BULB).get());
            assertEquals((76 - 32) / 1.8, new FileDraftStore(dir).find(s.draft().readingSetId()).orElseThrow()
                    .value(Slot.RETURN_DRY_BULB).valueSi(), 1e-9);
        }
    }

    @Test
    void aWetBulbAboveTheDryBulbIsHeldNotStoredAndSaysWhichPairDisagrees() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            type(vm, Slot.RETURN_DRY_BULB, "75");
            type(vm, Slot.RETURN_HUMIDITY, "80");
            assertFalse(vm.refusedProperty().get());
            String m = vm.messageProperty().get();
            assertTrue(m.contains("return wet bulb 80.0 °F and return dry bulb 75.0 °F cannot both be right"), m);
            assertFalse(s.draft().has(Slot.RETURN_HUMIDITY), "the stored set stays a valid one");
            assertTrue(vm.isHeld(Slot.RETURN_HUMIDITY));
            assertTrue(vm.inConflict(Slot.RETURN_DRY_BULB) && vm.inConflict(Slot.RETURN_HUMIDITY));
        }
    }

    @Test
    void aRefusedAirflowNamesItsRangeAtTheShownPrecision() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            type(vm, Slot.AIRFLOW, "0");
            String m = vm.messageProperty().get();
            // the limits convert to 19.9175 and 52972.0001 cfm; airflow is shown in whole cfm, and the
            // ends are rounded inwards so the shown ends are themselves accepted
            assertTrue(m.endsWith("accepted range 20 to 52972 cfm"), m);
            assertEquals("", vm.pad().text(), "a refusal empties the pad");
        }
    }

    @Test
    void aToleranceIsTypedSeparatelyAndKept() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            type(vm, Slot.AIRFLOW, "1200");
            vm.select(Slot.AIRFLOW);
            vm.toleranceModeProperty().set(true);
            assertEquals("%", vm.unit());
            vm.pad().digit(5);
            assertTrue(vm.enter(), vm.messageProperty().get());
            assertEquals("± 5 %", vm.toleranceText(Slot.AIRFLOW).get());
            assertEquals(0.05, s.draft().value(Slot.AIRFLOW).toleranceSi(), 1e-12);
        }
    }

    @Test
    void switchingAHumidityBoxToRhKeepsTheWetBulbUntilAnRhIsEntered() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            type(vm, Slot.RETURN_DRY_BULB, "75");
            type(vm, Slot.RETURN_HUMIDITY, "65");
            vm.select(Slot.RETURN_HUMIDITY);
            vm.choose("rh");
            assertEquals("wet-bulb", s.draft().choice(Slot.RETURN_HUMIDITY), "a tap erases nothing");
            // 65 °F = 18.333… °C (°C = (°F − 32) / 1.8)
            assertEquals((65 - 32) / 1.8, s.draft().value(Slot.RETURN_HUMIDITY).valueSi(), 1e-9);
            assertEquals("%", vm.unit(), "the pad types the new kind: 65 °F wet bulb is not 65 % RH");
            type(vm, Slot.RETURN_HUMIDITY, "55");
            assertEquals("rh", s.draft().choice(Slot.RETURN_HUMIDITY));
            assertEquals(55, s.draft().value(Slot.RETURN_HUMIDITY).valueSi(), 1e-9);
        }
    }

    @Test
    void theCoilBoxShowsTheCautionBeforeTheReading() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            vm.select(Slot.COIL_TEMPERATURE);
            assertEquals(app.latentledger.core.findings.Cautions.BEFORE_COIL_READINGS, vm.messageProperty().get());
        }
    }

    @Test
    void theNominalSizeIsSavedOnTheSystem() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            type(vm, Slot.NOMINAL_TONS, "2.5");
            // 1 ton = 12 000 Btu/h = 3516.85 W (trade definition)
            assertEquals(2.5 * 3516.85, s.ledger().systems().find(s.system().id()).orElseThrow().nominalCapacityW(), 0.01);
            type(vm, Slot.NOMINAL_TONS, "0.1");
            assertTrue(vm.refusedProperty().get(), "a tenth of a ton is below any air handler");
        }
    }

    @Test
    void aReopenedSessionFindsEveryAcceptedValue() {
        String readingSet;
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            type(vm, Slot.RETURN_DRY_BULB, "76");
            type(vm, Slot.RETURN_HUMIDITY, "66");
            type(vm, Slot.COIL_TEMPERATURE, "50");
            readingSet = s.draft().readingSetId();
            vm.select(Slot.SUPPLY_DRY_BULB);
            vm.pad().digit(6);
            vm.keepPending(); // the platform paused the app mid-entry
        }
        try (AppSession again = TestSessions.open(dir)) {
            assertEquals(readingSet, again.draft().readingSetId(), "the visit in progress opens");
            EntryViewModel vm = new EntryViewModel(again);
            assertEquals("76.0", vm.valueText(Slot.RETURN_DRY_BULB).get());
            assertEquals("66.0", vm.valueText(Slot.RETURN_HUMIDITY).get());
            assertEquals("50.0", vm.valueText(Slot.COIL_TEMPERATURE).get());
            assertEquals("6.0", vm.valueText(Slot.SUPPLY_DRY_BULB).get());
            assertEquals("incomplete", new ResultsViewModel(again).sheet().verdictKey());
        }
    }

    @Test
    void enterMovesToTheNextBoxButATolerancesStays() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            vm.select(Slot.RETURN_DRY_BULB);
            vm.pad().digit(7);
            vm.pad().digit(5);
            assertTrue(vm.enterAndAdvance());
            assertEquals(Slot.RETURN_HUMIDITY, vm.selectedProperty().get());
            vm.select(Slot.RETURN_DRY_BULB);
            vm.toleranceModeProperty().set(true);
            vm.pad().digit(1);
            assertTrue(vm.enterAndAdvance());
            assertEquals(Slot.RETURN_DRY_BULB, vm.selectedProperty().get());
            assertEquals("± 1.0 °F", vm.toleranceText(Slot.RETURN_DRY_BULB).get());
        }
    }
}
