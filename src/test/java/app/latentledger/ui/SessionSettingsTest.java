package app.latentledger.ui;

import app.latentledger.core.settings.DisplayTheme;
import app.latentledger.core.settings.SettingsCatalogue;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.ui.entry.EntryViewModel;
import app.latentledger.ui.job.JobViewModel;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Slot;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static app.latentledger.ui.entry.Typing.type;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The session reads the stored settings and applies a change at once, without a window. */
class SessionSettingsTest {
    @TempDir
    Path dir;

    @Test
    void storedSettingsAreUsedOnTheNextStart() {
        try (AppSession s = TestSessions.open(dir)) {
            s.saveSettings(s.settings().withChoice(SettingsCatalogue.UNITS, "si")
                    .withChoice(SettingsCatalogue.THEME, "dark"));
        }
        try (AppSession s = TestSessions.open(dir)) {
            assertEquals(UnitSystem.SI, s.units());
            assertTrue(s.darkProperty().get());
        }
    }

    @Test
    void theHeaderThemeSwitchIsKeptAsTheThemeSetting() {
        try (AppSession s = TestSessions.open(dir)) {
            s.darkProperty().set(true);
            assertEquals(DisplayTheme.DARK, s.ledger().settings().load().theme());
        }
    }

    @Test
    void aNewValueGetsTheInstrumentToleranceOfTheSettings() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            // 1 °F dry-bulb probe: typed as 1 in IP, stored as 1/1.8 K (exact conversion)
            s.saveSettings(s.settings().withTyped(SettingsCatalogue.TOL_DRY_BULB, 1.0, UnitSystem.IP));
            EntryViewModel entry = new EntryViewModel(s);
            type(entry, Slot.RETURN_DRY_BULB, "75");
            assertEquals(1.0 / 1.8, s.draft().value(Slot.RETURN_DRY_BULB).toleranceSi(), 1e-12);
            assertEquals("± 1.0 °F", entry.toleranceText(Slot.RETURN_DRY_BULB).get());
            s.saveSettings(s.settings().withChoice(SettingsCatalogue.UNITS, "si"));
            // 1 °F difference = 5/9 K: shown as 0.6 K (one decimal; SI writes differences in K)
            assertEquals("± 0.6 K", entry.toleranceText(Slot.RETURN_DRY_BULB).get());
            assertEquals("23.9", entry.valueText(Slot.RETURN_DRY_BULB).get(), "75 °F = 23.9 °C");
        }
    }

    @Test
    void aNewSiteStartsAtTheDefaultElevationInTheTechsUnits() {
        try (AppSession s = TestSessions.open(dir)) {
            // 300 m default; 300 m = 984.25 ft (1 ft = 0.3048 m exactly)
            s.saveSettings(s.settings().withNumber(SettingsCatalogue.DEFAULT_ELEVATION, 300));
            JobViewModel job = new JobViewModel(s);
            assertEquals("984", job.newSiteElevationFtProperty().get());
            assertEquals("Elevation, ft", job.elevationCaptionProperty().get());
            s.saveSettings(s.settings().withChoice(SettingsCatalogue.UNITS, "si"));
            assertEquals("300", job.newSiteElevationFtProperty().get());
            assertEquals("Elevation, m", job.elevationCaptionProperty().get());
        }
    }
}
