package app.latentledger.ui.paperwork;

import app.latentledger.core.settings.InstrumentTolerances;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.DemoScenario;
import app.latentledger.store.Ledger;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.time.OffsetDateTime;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The paperwork and instrument forms keep what the tech types, and say so next to the form. */
class PaperworkViewModelsTest {
    @TempDir
    Path dir;
    Ledger ledger;

    @BeforeEach
    void open() {
        ledger = Ledger.open(dir, Ledger.FirstRun.SEED_DEMO);
    }

    @AfterEach
    void close() {
        ledger.close();
    }

    @Test
    void notesAndSignOffsAreKeptAndReadBack() {
        OffsetDateTime at = OffsetDateTime.parse("2024-07-16T11:30:00-04:00");
        PaperworkViewModel vm = new PaperworkViewModel(ledger, () -> at);
        vm.load(DemoScenario.VISIT_COMPLAINT, "Marisol Teague");
        assertEquals("Marisol Teague", vm.technicianNameProperty().get(), "the visit's technician is offered");
        vm.customerWordsProperty().set("Windows sweat");
        vm.workDoneProperty().set("Slowed the blower");
        assertTrue(vm.saveNotes());
        assertEquals("Notes saved.", vm.notesMessageProperty().get());
        assertFalse(vm.signAsCustomer(), "no name, no signature");
        assertTrue(vm.signMessageProperty().get().contains("customer's name"));
        vm.customerNameProperty().set("Ada Marsh");
        assertTrue(vm.signAsCustomer());
        assertTrue(vm.signAsTechnician());

        PaperworkViewModel again = new PaperworkViewModel(ledger);
        again.load(DemoScenario.VISIT_COMPLAINT, "someone else");
        assertEquals("Windows sweat", again.customerWordsProperty().get());
        assertEquals("Marisol Teague", again.technicianNameProperty().get(), "the signed name, not the offered one");
        assertEquals("Signed by Ada Marsh, 16 Jul 2024, 11:30", again.customerSignedProperty().get());
        assertEquals(at, ledger.paperwork().forVisit(DemoScenario.VISIT_COMPLAINT).technician().signedAt());
    }

    @Test
    void instrumentsAreAddedInTheTechsUnitsAndChosenPerSet() {
        InstrumentsViewModel vm = new InstrumentsViewModel(ledger);
        vm.load(DemoScenario.VISIT_COMPLAINT, DemoScenario.READINGS_BEFORE, UnitSystem.IP);
        vm.nameProperty().set("Probe kit A");
        vm.serialProperty().set("SR-1001");
        vm.calibratedProperty().set("2024-03-02");
        vm.dryBulbProperty().set("0,36"); // a comma is refused, not guessed (the one number rule)
        vm.relativeHumidityProperty().set("1.5");
        assertFalse(vm.add());
        assertEquals("Not added: stated dry bulb accuracy '0,36' refused: type digits with a point for decimals,"
                + " no thousands separator, e.g. 0.36", vm.messageProperty().get());
        assertEquals(0, vm.rows().size());
        vm.dryBulbProperty().set("0.36"); // °F
        assertTrue(vm.add(), vm.messageProperty().get());
        assertEquals("", vm.nameProperty().get(), "the form clears for the next one");
        assertEquals(1, vm.rows().size());
        assertTrue(vm.rows().get(0).text().contains("dry bulb ±0.36 °F"), vm.rows().get(0).text());
        assertFalse(vm.rows().get(0).usedOnSet());

        vm.setUsed(vm.rows().get(0).instrument(), true);
        assertTrue(vm.rows().get(0).usedOnSet());
        InstrumentTolerances t = vm.tolerances(InstrumentTolerances.DEFAULTS);
        assertEquals(0.36 / 1.8, t.dryBulbK(), 1e-12);
        assertEquals(1.5, t.relativeHumidityPct());
        assertEquals(InstrumentTolerances.DEFAULTS.wetBulbK(), t.wetBulbK());
        assertEquals(1, ledger.instruments().usedOn(DemoScenario.READINGS_BEFORE).size());

        vm.nameProperty().set("Bad one");
        vm.calibratedProperty().set("March");
        assertFalse(vm.add());
        assertTrue(vm.messageProperty().get().contains("is not a date"), vm.messageProperty().get());
        vm.calibratedProperty().set("");
        vm.airflowPctProperty().set("80");
        assertFalse(vm.add());
        assertTrue(vm.messageProperty().get().contains("accepted range"), vm.messageProperty().get());
        assertEquals(1, ledger.instruments().forVisit(DemoScenario.VISIT_COMPLAINT).size());
    }

    @Test
    void withoutAStoredSetNothingIsChosen() {
        InstrumentsViewModel vm = new InstrumentsViewModel(ledger);
        vm.load(DemoScenario.VISIT_COMPLAINT, null, UnitSystem.SI);
        vm.nameProperty().set("Hood");
        assertTrue(vm.add());
        vm.setUsed(vm.rows().get(0).instrument(), true);
        assertTrue(vm.messageProperty().get().startsWith("Save a reading"));
        assertFalse(vm.rows().get(0).usedOnSet());
    }
}
