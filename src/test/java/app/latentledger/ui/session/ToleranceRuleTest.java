package app.latentledger.ui.session;

import app.latentledger.cli.Cli;
import app.latentledger.core.coil.Tolerances;
import app.latentledger.core.records.Ids;
import app.latentledger.core.records.Instrument;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.records.StatedAccuracy;
import app.latentledger.core.settings.InstrumentTolerances;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.entry.EntryViewModel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

import static app.latentledger.ui.entry.Typing.type;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The one rule for a reading's ± on the pad: the stated accuracy of the instruments ticked for the
 * set, part by part (the wider when two state a part), over the settings, which start from the one
 * default table; a ± the tech typed stays. The stated accuracies used here:
 * <ul>
 *   <li>"Probe kit A": ±0.3 °C dry bulb and ±1.5 % RH, as a maker states them for a capacitive
 *       temperature/RH probe (a typical stated figure; common practice, no source);</li>
 *   <li>"Code thermometer": ±1.3 °F dry bulb, the coarsest digital thermometer California Title 24
 *       Part 6 Reference Appendix RA3.2.2.2 (2008) accepts (±(0.1 % of reading + 1.3 °F); the
 *       0.1 % part is left out here);</li>
 *   <li>"Flow grid": ±7 % of reading (pressure-matching flow grid used per its instructions;
 *       common practice, no source).</li>
 * </ul>
 * With no instrument ticked the defaults are the table's: ±0.5 °F dry bulb, ±2 % RH inside 10–90 %
 * and ±3 % RH outside (capacitive sensors; common practice, no source), ±10 % airflow (Title 24
 * Part 6 RA3.7.2.2, 2013), ±2 % of the water caught and ±5 s on its timing.
 */
class ToleranceRuleTest {
    private static final double F = 1 / 1.8; // one Fahrenheit degree in kelvin, exact
    private static final StatedAccuracy KIT_A = new StatedAccuracy(0.3, 1.5, null, null, null, null);
    private static final StatedAccuracy CODE_THERMOMETER = new StatedAccuracy(1.3 * F, null, null, null, null, null);
    private static final StatedAccuracy FLOW_GRID = new StatedAccuracy(null, null, null, null, null, 0.07);

    @TempDir
    Path dir;

    private static Instrument instrument(String name, StatedAccuracy a) {
        return new Instrument(Ids.newId(), "visit-1", name, "", null, a);
    }

    @Test
    void withNoInstrumentTheDefaultsAreTheOneTable() {
        InstrumentTolerances t = Tolerancing.forSet(InstrumentTolerances.DEFAULTS, List.of());
        assertEquals(0.5 * F, Tolerancing.of(t, Slot.RETURN_DRY_BULB, null, 24), 1e-12);
        assertEquals(2.0, Tolerancing.of(t, Slot.RETURN_HUMIDITY, "rh", 50), 0);
        assertEquals(3.0, Tolerancing.of(t, Slot.SUPPLY_HUMIDITY, "rh", 95), 0, "outside 10–90 % RH");
        assertEquals(0.5 * F, Tolerancing.of(t, Slot.SUPPLY_HUMIDITY, "wet-bulb", 12), 1e-12);
        assertEquals(1.0 * F, Tolerancing.of(t, Slot.SUPPLY_HUMIDITY, "dew-point", 12), 1e-12);
        assertEquals(1.8 * F, Tolerancing.of(t, Slot.COIL_TEMPERATURE, "evaporator-saturation", 5), 1e-12,
                "±3.5 psi suction gauge at about 2 psi/°F (Title 24 Part 6 RA3.2.2.2, 2013)");
        assertEquals(0.10, Tolerancing.of(t, Slot.AIRFLOW, "entering", 0.5), 0);
        assertEquals(0.02 * 300e-6, Tolerancing.of(t, Slot.CONDENSATE_VOLUME, null, 300e-6), 1e-15);
        assertEquals(5, Tolerancing.of(t, Slot.CONDENSATE_MINUTES, null, 600), 0);
        // the table the command line's defaults come from (DefaultTolerancesTest checks the command)
        assertEquals(Tolerances.RELATIVE_HUMIDITY_PCT, Tolerancing.of(t, Slot.RETURN_HUMIDITY, "rh", 50), 0);
    }

    @Test
    void aTickedInstrumentsStatedAccuracyReplacesTheDefaultForWhatItMeasures() {
        InstrumentTolerances t = Tolerancing.forSet(InstrumentTolerances.DEFAULTS,
                List.of(instrument("Probe kit A", KIT_A), instrument("Flow grid", FLOW_GRID)));
        assertEquals(0.3, Tolerancing.of(t, Slot.SUPPLY_DRY_BULB, null, 13), 0);
        assertEquals(1.5, Tolerancing.of(t, Slot.RETURN_HUMIDITY, "rh", 55), 0);
        assertEquals(2.5, Tolerancing.of(t, Slot.SUPPLY_HUMIDITY, "rh", 96), 0,
                "outside 10–90 % the stated figure plus the table's one %-point");
        assertEquals(0.07, Tolerancing.of(t, Slot.AIRFLOW, "entering", 0.5), 0);
        assertEquals(1.0 * F, Tolerancing.of(t, Slot.RETURN_HUMIDITY, "dew-point", 15), 1e-12,
                "neither states a dew point: the default stays");
    }

    @Test
    void twoInstrumentsStatingOnePartGiveTheWiderFigure() {
        InstrumentTolerances t = Tolerancing.forSet(InstrumentTolerances.DEFAULTS,
                List.of(instrument("Probe kit A", KIT_A), instrument("Code thermometer", CODE_THERMOMETER)));
        assertEquals(1.3 * F, Tolerancing.of(t, Slot.RETURN_DRY_BULB, null, 24), 1e-12);
        assertEquals(1.5, Tolerancing.of(t, Slot.RETURN_HUMIDITY, "rh", 50), 0);
    }

    @Test
    void aToleranceTheTechTypedStaysWhenTheRuleChanges() {
        Draft d = Draft.empty("set-1", "visit-1")
                .with(Slot.RETURN_DRY_BULB, new SlotValue(24, 0.5 * F))
                .withTypedTolerance(Slot.SUPPLY_DRY_BULB, new SlotValue(13, 0.1));
        InstrumentTolerances t = Tolerancing.forSet(InstrumentTolerances.DEFAULTS, List.of(instrument("A", KIT_A)));
        Draft ruled = Tolerancing.apply(d, t);
        assertEquals(0.3, ruled.value(Slot.RETURN_DRY_BULB).toleranceSi(), 0);
        assertEquals(0.1, ruled.value(Slot.SUPPLY_DRY_BULB).toleranceSi(), 0);
        assertEquals(24, ruled.value(Slot.RETURN_DRY_BULB).valueSi(), 0, "values never change");
    }

    @Test
    void tickingAnInstrumentOnTheSetGivesThePadTheStoredSetAndTheResultsItsAccuracy() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel vm = new EntryViewModel(s);
            type(vm, Slot.RETURN_DRY_BULB, "75");
            vm.select(Slot.RETURN_HUMIDITY);
            vm.choose("rh");
            type(vm, Slot.RETURN_HUMIDITY, "50");
            type(vm, Slot.SUPPLY_DRY_BULB, "55");
            vm.select(Slot.SUPPLY_HUMIDITY);
            vm.choose("rh");
            type(vm, Slot.SUPPLY_HUMIDITY, "95");
            type(vm, Slot.AIRFLOW, "1200");
            assertEquals("± 3.0 %", vm.toleranceText(Slot.SUPPLY_HUMIDITY).get(), "95 % RH: the table's ±3 %");
            // the tech types a ± of their own on the return dry bulb
            vm.select(Slot.RETURN_DRY_BULB);
            vm.toleranceModeProperty().set(true);
            vm.pad().digit(1);
            vm.enter();
            assertFalse(vm.refusedProperty().get(), vm.messageProperty().get());
            // instruments are ticked for the stored set (the Record screen), then the tech comes back
            Instrument kit = new Instrument(Ids.newId(), s.visit().id(), "Probe kit A", "", null, KIT_A);
            Instrument grid = new Instrument(Ids.newId(), s.visit().id(), "Flow grid", "", null, FLOW_GRID);
            s.ledger().instruments().save(kit);
            s.ledger().instruments().save(grid);
            s.ledger().instruments().useOn(s.draft().readingSetId(), List.of(kit.id(), grid.id()));
            s.screenProperty().set(Screen.RECORD);
            s.screenProperty().set(Screen.READINGS);
            assertEquals("± 2.5 %", vm.toleranceText(Slot.SUPPLY_HUMIDITY).get());
            assertEquals("± 1.5 %", vm.toleranceText(Slot.RETURN_HUMIDITY).get());
            assertEquals("± 7 %", vm.toleranceText(Slot.AIRFLOW).get());
            assertEquals("± 1.0 °F", vm.toleranceText(Slot.RETURN_DRY_BULB).get(), "typed, kept");
            ReadingSet stored = s.ledger().readings().find(s.draft().readingSetId()).orElseThrow();
            assertEquals(0.3, stored.supplyDryBulb().toleranceSi(), 0);
            assertEquals(2.5, stored.supplyHumidity().value().toleranceSi(), 0);
            assertEquals(0.07 * stored.airflow().volume().valueSi(), stored.airflow().volume().toleranceSi(), 1e-15);
            // the results work from the stored tolerances: the same readings the report reads
            assertEquals(stored, s.currentCheck().readings());
            // a new reading typed now starts from the instrument too
            type(vm, Slot.OUTDOOR_DRY_BULB, "90");
            assertEquals(0.3, s.draft().value(Slot.OUTDOOR_DRY_BULB).toleranceSi(), 0);
        }
    }

    @Test
    void theCommandLineStoresTheSameTolerancesForTheSameInstrumentAndReadings() {
        String setId;
        String visitId;
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            visitId = s.visit().id();
            Instrument kit = new Instrument(Ids.newId(), visitId, "Probe kit A", "", null, KIT_A);
            s.ledger().instruments().save(kit);
            EntryViewModel vm = new EntryViewModel(s);
            type(vm, Slot.RETURN_DRY_BULB, "75");
            vm.select(Slot.RETURN_HUMIDITY);
            vm.choose("rh");
            type(vm, Slot.RETURN_HUMIDITY, "50");
            type(vm, Slot.SUPPLY_DRY_BULB, "55");
            vm.select(Slot.SUPPLY_HUMIDITY);
            vm.choose("rh");
            type(vm, Slot.SUPPLY_HUMIDITY, "95");
            type(vm, Slot.AIRFLOW, "1200");
            s.ledger().instruments().useOn(s.draft().readingSetId(), List.of(kit.id()));
            assertTrue(s.applyToleranceRule());
            setId = s.draft().readingSetId();
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Cli.standard().run(List.of("--data-dir", dir.toString(), "readings", "add", visitId,
                        "--return-db", "75", "--return-rh", "50", "--supply-db", "55", "--supply-rh", "95",
                        "--airflow", "1200", "--instrument", "Probe kit A"),
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8));
        assertEquals(0, code, err.toString(StandardCharsets.UTF_8));
        try (AppSession s = TestSessions.open(dir)) {
            List<ReadingSet> sets = s.ledger().readings().forVisit(visitId);
            ReadingSet app = sets.stream().filter(r -> r.id().equals(setId)).findFirst().orElseThrow();
            ReadingSet cli = sets.stream().filter(r -> !r.id().equals(setId)).findFirst().orElseThrow();
            assertEquals(app.returnDryBulb().toleranceSi(), cli.returnDryBulb().toleranceSi(), 1e-12);
            assertEquals(app.supplyDryBulb().toleranceSi(), cli.supplyDryBulb().toleranceSi(), 1e-12);
            assertEquals(app.returnHumidity().value().toleranceSi(), cli.returnHumidity().value().toleranceSi(), 1e-12);
            assertEquals(app.supplyHumidity().value().toleranceSi(), cli.supplyHumidity().value().toleranceSi(), 1e-12);
            assertEquals(app.airflow().volume().toleranceSi(), cli.airflow().volume().toleranceSi(), 1e-9);
        }
    }
}
