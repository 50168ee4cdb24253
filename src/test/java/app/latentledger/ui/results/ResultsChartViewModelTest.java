package app.latentledger.ui.results;

import app.latentledger.chart.draw.Theme;
import app.latentledger.chart.psychro.CoilProcessOverlay;
import app.latentledger.chart.psychro.PsychroChartData;
import app.latentledger.core.coil.CoilResult;
import app.latentledger.core.records.ReadingSet;
import app.latentledger.core.settings.SettingsCatalogue;
import app.latentledger.core.units.UnitSystem;
import app.latentledger.core.visit.ReadingSetCheck;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.chart.PsychroChartViewModel;
import app.latentledger.ui.compare.CompareViewModel;
import app.latentledger.ui.entry.EntryViewModel;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Slot;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.List;

import static app.latentledger.ui.entry.Typing.type;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The results and compare screens' psychrometric chart, without a window: the states it plots are
 * the coil check's own (ReadingSetCheck, the adapter the report uses too), so the chart cannot
 * disagree with the figures beside it; the pair is drawn when the visit has a "before" set.
 */
class ResultsChartViewModelTest {
    @TempDir
    Path dir;

    private static List<String> names(PsychroChartData d) {
        return d.overlays().stream().map(CoilProcessOverlay::name).toList();
    }

    private static CoilResult check(AppSession s, String readingSetId) {
        ReadingSet rs = s.ledger().readings().find(readingSetId).orElseThrow();
        return ReadingSetCheck.run(rs, s.system(), s.site(), s.thresholds(), s.units());
    }

    @Test
    void theAfterSetIsDrawnWithTheBeforeSetOfItsVisit() {
        try (AppSession s = TestSessions.open(dir)) {
            s.openVisit(s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
            ResultsViewModel vm = new ResultsViewModel(s);
            s.openReadingSet(DemoScenario.READINGS_AFTER);
            PsychroChartData d = vm.chartDataProperty().get();
            assertEquals(List.of("Before", "After"), names(d));
            CoilResult after = check(s, DemoScenario.READINGS_AFTER);
            CoilResult before = check(s, DemoScenario.READINGS_BEFORE);
            assertEquals(after.leaving().humidityRatio(), d.overlays().get(1).leaving().humidityRatio(), 1e-12);
            assertEquals(before.entering().dryBulbC(), d.overlays().get(0).entering().dryBulbC(), 1e-12);
            assertEquals(after.entering().pressurePa(), d.pressurePa(), 1e-9);

            s.openReadingSet(DemoScenario.READINGS_BEFORE);
            assertEquals(List.of("Measured"), names(vm.chartDataProperty().get()), "the before set alone");
        }
    }

    @Test
    void aValueEnteredOnThePadMovesThePlottedStateOnTheSameChart() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            EntryViewModel entry = new EntryViewModel(s);
            ResultsViewModel vm = new ResultsViewModel(s);
            PsychroChartViewModel chart = vm.chart();
            assertTrue(chart.chart().data().overlays().isEmpty(), "nothing to plot before the readings");
            type(entry, Slot.RETURN_DRY_BULB, "75");
            type(entry, Slot.RETURN_HUMIDITY, "65");
            type(entry, Slot.SUPPLY_DRY_BULB, "57");
            type(entry, Slot.SUPPLY_HUMIDITY, "55");
            type(entry, Slot.AIRFLOW, "1080");
            assertEquals(1, chart.chart().data().overlays().size());
            // 57 °F = (57 − 32)/1.8 °C, exact conversion (NIST SP 811)
            assertEquals((57 - 32) / 1.8, chart.chart().data().overlays().get(0).leaving().dryBulbC(), 1e-9);
            assertSame(vm.chart(), chart, "one chart view model follows the readings");
            type(entry, Slot.SUPPLY_DRY_BULB, "58");
            assertEquals((58 - 32) / 1.8, chart.chart().data().overlays().get(0).leaving().dryBulbC(), 1e-9);
        }
    }

    @Test
    void unitsAndThemeFromTheSettingsReachTheChartWithoutARestart() {
        try (AppSession s = TestSessions.open(dir)) {
            s.openVisit(s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
            s.openReadingSet(DemoScenario.READINGS_AFTER);
            ResultsViewModel vm = new ResultsViewModel(s);
            PsychroChartViewModel chart = vm.chart();
            assertEquals(UnitSystem.IP, chart.chart().data().units());
            assertEquals("°F", vm.sheet().entering().get(0).unit());
            s.saveSettings(s.settings().withChoice(SettingsCatalogue.UNITS, "si"));
            assertEquals(UnitSystem.SI, chart.chart().data().units());
            assertEquals("°C", vm.sheet().entering().get(0).unit());
            s.saveSettings(s.settings().withChoice(SettingsCatalogue.THEME, "dark"));
            assertTrue(s.darkProperty().get());
            assertSame(Theme.DARK, chart.themeProperty().get());
        }
    }

    @Test
    void theCompareScreenDrawsTheChosenSetAsBeforeAndTheSetInHandAsAfter() {
        try (AppSession s = TestSessions.open(dir)) {
            s.openVisit(s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
            s.openReadingSet(DemoScenario.READINGS_AFTER);
            CompareViewModel vm = new CompareViewModel(s);
            PsychroChartData d = vm.chart().chart().data();
            assertEquals(List.of("Before", "After"), names(d));
            assertEquals(check(s, DemoScenario.READINGS_BEFORE).leaving().humidityRatio(),
                    d.overlays().get(0).leaving().humidityRatio(), 1e-12);
        }
    }
}
