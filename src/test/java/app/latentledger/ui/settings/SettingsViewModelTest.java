package app.latentledger.ui.settings;

import app.latentledger.core.findings.Thresholds;
import app.latentledger.core.settings.SettingGroup;
import app.latentledger.core.settings.Settings;
import app.latentledger.core.settings.SettingsCatalogue;
import app.latentledger.core.units.Quantity;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.store.Ledger;
import app.latentledger.store.StoreException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The screen's behaviour without a window: JavaFX properties need no toolkit. */
class SettingsViewModelTest {
    private static final String HIGH = Thresholds.COIL_HIGH_AIRFLOW_PER_TON.key();

    @TempDir
    Path dir;

    private static double highCfmPerTon(Settings s) {
        return Quantity.AIRFLOW_PER_CAPACITY.toDisplay(UnitSystem.IP, s.thresholds().valueSi(Thresholds.COIL_HIGH_AIRFLOW_PER_TON));
    }

    @Test
    void anAcceptedValueIsSavedAtOnceAndSurvivesReopening() {
        try (Ledger ledger = Ledger.open(dir)) {
            SettingsViewModel vm = new SettingsViewModel(SettingsStore.of(ledger.settings()));
            NumberRow row = vm.number(HIGH);
            assertEquals("450", row.textProperty().get());
            assertEquals("cfm/ton", row.unitProperty().get());
            assertEquals("default 450 cfm/ton · accepts 225 to 675 cfm/ton", row.hintProperty().get());
            assertFalse(row.changedProperty().get());
            row.textProperty().set("400");
            row.commit();
            assertEquals(400, highCfmPerTon(ledger.settings().load()), 1e-9, "saved without a Save button");
            assertTrue(row.changedProperty().get());
            assertEquals("", row.messageProperty().get());
            assertTrue(vm.statusProperty().get().startsWith("Saved airflow per ton above which latent removal suffers: 400"),
                    vm.statusProperty().get());
        }
        try (Ledger ledger = Ledger.open(dir)) {
            assertEquals("400", new SettingsViewModel(SettingsStore.of(ledger.settings())).number(HIGH).textProperty().get());
        }
    }

    @Test
    void aThousandsCommaInTheDefaultElevationIsRefused() {
        SettingsViewModel vm = new SettingsViewModel(new MemoryStore());
        NumberRow row = vm.number(SettingsCatalogue.DEFAULT_ELEVATION);
        row.textProperty().set("5,000");
        row.commit();
        assertTrue(row.messageProperty().get().startsWith("default site elevation '5,000' refused: type digits with a"
                + " point for decimals, no thousands separator, e.g. 5000"), row.messageProperty().get());
        assertEquals("0", row.textProperty().get(), "nothing saved: not 5 ft");
    }

    @Test
    void theDefaultReadsAtTheQuantitysDecimalsAndStaysExactWhenStored() {
        SettingsViewModel vm = new SettingsViewModel(new MemoryStore());
        NumberRow row = vm.number(Thresholds.BLOWER_ENTHALPY_BAND.key());
        // 2000 J/kg = 0.8598 Btu/lb (1 Btu/lb = 2326 J/kg exactly, ASHRAE Handbook—Fundamentals ch. 39);
        // enthalpy reads to 0.1 Btu/lb; the range 1000 to 3000 J/kg rounds inward to 0.5 to 1.2
        assertEquals("default 0.9 Btu/lb · accepts 0.5 to 1.2 Btu/lb", row.hintProperty().get());
        assertEquals("0.9", row.textProperty().get(), "an untouched default reads at the shown precision");
        row.commit();
        assertEquals("", vm.statusProperty().get(), "committing the shown default changes nothing");
        assertEquals(2000.0, vm.savedProperty().get().thresholds().valueSi(Thresholds.BLOWER_ENTHALPY_BAND), 1e-9);
    }

    @Test
    void aRefusedValueKeepsTheSavedOneAndSaysWhy() {
        try (Ledger ledger = Ledger.open(dir)) {
            SettingsViewModel vm = new SettingsViewModel(SettingsStore.of(ledger.settings()));
            NumberRow row = vm.number(HIGH);
            row.textProperty().set("700");
            row.commit();
            assertEquals("airflow per ton above which latent removal suffers 700 cfm/ton refused: accepted range 225 to"
                    + " 675 cfm/ton", row.messageProperty().get());
            assertEquals("450", row.textProperty().get(), "the saved value is shown again");
            assertEquals(Settings.DEFAULTS, ledger.settings().load());
            row.textProperty().set("four hundred");
            row.commit();
            assertTrue(row.messageProperty().get().startsWith("airflow per ton above which latent removal suffers"
                    + " 'four hundred' refused: type digits with a point for decimals"), row.messageProperty().get());
            assertTrue(row.messageProperty().get().endsWith("; default 450 cfm/ton · accepts 225 to 675 cfm/ton"),
                    row.messageProperty().get());
            // a comma is refused, not guessed: "412,5" could be 412.5 or 4125 (the command line's rule)
            row.textProperty().set("412,5");
            row.commit();
            assertTrue(row.messageProperty().get().startsWith("airflow per ton above which latent removal suffers"
                    + " '412,5' refused: type digits with a point for decimals, no thousands separator, e.g. 412.5"),
                    row.messageProperty().get());
            assertEquals(Settings.DEFAULTS, ledger.settings().load());
            row.textProperty().set("412.5");
            row.commit();
            assertEquals("", row.messageProperty().get());
            assertEquals(412.5, highCfmPerTon(ledger.settings().load()), 1e-9);
        }
    }

    @Test
    void unitsChangeEveryRowAndValuesAreTypedInThem() {
        SettingsViewModel vm = new SettingsViewModel(new MemoryStore());
        vm.number(HIGH).textProperty().set("400");
        vm.number(HIGH).commit();
        vm.choice(SettingsCatalogue.UNITS).choose("si");
        assertEquals("si", vm.choice(SettingsCatalogue.UNITS).valueProperty().get());
        assertEquals("Saved units: SI  °C · L/s", vm.statusProperty().get());
        // -450…4500 m is -1476.378…14763.78 ft (÷ 0.3048): the hint rounds inward in ft, exact in m
        assertEquals("default 0 m · accepts -450 to 4500 m", vm.number(SettingsCatalogue.DEFAULT_ELEVATION).hintProperty().get());
        NumberRow high = vm.number(HIGH);
        assertEquals("L/s per kW", high.unitProperty().get());
        // 400 cfm/ton × 0.47194745 L/s per cfm ÷ 3.5168525 kW per ton = 53.678 L/s per kW (by hand, NIST SP 811 factors)
        assertEquals(53.678, Double.parseDouble(high.textProperty().get()), 0.001);
        NumberRow tol = vm.number(SettingsCatalogue.TOL_DRY_BULB);
        assertEquals("K", tol.unitProperty().get());
        tol.textProperty().set("0.5");
        tol.commit();
        // 0.5 K typed in SI is 0.9 °F (× 1.8)
        vm.choice(SettingsCatalogue.UNITS).choose("ip");
        assertEquals("0.9", vm.number(SettingsCatalogue.TOL_DRY_BULB).textProperty().get());
        assertEquals("default 0 ft · accepts -1476 to 14763 ft", vm.number(SettingsCatalogue.DEFAULT_ELEVATION).hintProperty().get());
    }

    @Test
    void resetAndGroups() {
        MemoryStore store = new MemoryStore();
        SettingsViewModel vm = new SettingsViewModel(store);
        vm.number(SettingsCatalogue.INDOOR_RH_TARGET).textProperty().set("50");
        vm.number(SettingsCatalogue.INDOOR_RH_TARGET).commit();
        assertEquals(50.0, store.settings.indoorRhTargetPct());
        vm.number(SettingsCatalogue.INDOOR_RH_TARGET).resetToDefault();
        assertEquals(Settings.DEFAULTS, store.settings);
        assertEquals(1, vm.numbers(SettingGroup.INDOOR_TARGET).size());
        assertEquals(7, vm.numbers(SettingGroup.INSTRUMENTS).size());
        assertEquals(Thresholds.all().size() - 1, vm.numbers(SettingGroup.FINDING_THRESHOLDS).size(),
                "every threshold but the RH target, which has its own group");
        assertEquals(2, vm.choices(SettingGroup.DISPLAY_AND_PAPER).size());
        for (NumberRow r : vm.numbers(SettingGroup.FINDING_THRESHOLDS)) {
            assertFalse(r.source().isBlank(), r.key());
        }
    }

    @Test
    void whenTheLedgerCannotBeWrittenNothingChangesAndTheTechIsTold() {
        MemoryStore store = new MemoryStore();
        store.broken = true;
        SettingsViewModel vm = new SettingsViewModel(store);
        vm.number(HIGH).textProperty().set("400");
        vm.number(HIGH).commit();
        assertEquals("450", vm.number(HIGH).textProperty().get());
        assertEquals(Settings.DEFAULTS, vm.savedProperty().get());
        assertTrue(vm.statusProperty().get().startsWith("Not saved, the ledger could not be written"));
        vm.choice(SettingsCatalogue.THEME).choose("dark");
        assertEquals("light", vm.choice(SettingsCatalogue.THEME).valueProperty().get());
    }

    @Test
    void typingTheSameValueAgainSavesNothing() {
        MemoryStore store = new MemoryStore();
        SettingsViewModel vm = new SettingsViewModel(store);
        vm.number(HIGH).commit();
        assertEquals(0, store.saves);
    }

    /** A stand-in store; the repository itself is tested in SettingsRepositoryTest. */
    static final class MemoryStore implements SettingsStore {
        Settings settings = Settings.DEFAULTS;
        boolean broken;
        int saves;

        @Override
        public Settings load() {
            return settings;
        }

        @Override
        public void save(Settings s) {
            if (broken) {
                throw new StoreException("disk full");
            }
            saves++;
            settings = s;
        }
    }
}
