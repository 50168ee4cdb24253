package app.latentledger.ui.log;

import app.latentledger.core.records.VisitPurpose;
import app.latentledger.core.settings.SettingsCatalogue;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.present.FindingCard;
import app.latentledger.ui.present.Row;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import app.latentledger.ui.session.LogAnalysisService;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.Queue;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The log screen's view model on the invented field-data samples, without a window. What each
 * sample must give comes from field-data-samples/README.md (the generator's scenarios: invented
 * data, the expected findings are the scenario's design, checked against the core by
 * FieldSamplesTest); here the point is that the screen shows what the analysis found, keeps the
 * log with the visit and shows it again after a restart.
 */
class LogImportViewModelTest {
    private static final Path SAMPLES = Path.of("field-data-samples");

    @TempDir
    Path dir;

    private static AppSession withNewVisit(Path dir) {
        AppSession s = AppSession.open(dir, new CycleLogAnalysis());
        s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(s::openVisit);
        s.startVisit(s.site(), s.system(), VisitPurpose.COMPLAINT, "Test Tech", "");
        return s;
    }

    private static LogImportViewModel direct(AppSession s) {
        return new LogImportViewModel(s, Background.DIRECT, Background.DIRECT);
    }

    private static List<String> codes(List<FindingCard> cards) {
        return cards.stream().map(FindingCard::code).toList();
    }

    private static Row row(LogImportViewModel vm, String key) {
        return vm.summary().stream().filter(r -> r.key().equals(key)).findFirst().orElseThrow();
    }

    @Test
    void withoutAnAnalysisTheScreenSaysItArrivesLater() {
        try (AppSession s = AppSession.open(dir, LogAnalysisService.NOT_WIRED)) {
            LogImportViewModel vm = direct(s);
            vm.importFile();
            assertEquals(LogImportViewModel.NOT_WIRED_MESSAGE, vm.statusProperty().get());
        }
    }

    /** The timeline takes the saved theme as the Results chart does: outdoor gives its heavy lines, and it follows a change. */
    @Test
    void theTimelineFollowsTheSavedThemeOutdoorIncluded() {
        try (AppSession s = withNewVisit(dir)) {
            s.saveSettings(s.settingsProperty().get().withChoice("theme", "outdoor"));
            LogImportViewModel vm = direct(s);
            vm.fileProperty().set(SAMPLES.resolve("oversized-short-cycling.csv").toString());
            vm.airflowProperty().set("1400");
            vm.importFile();
            assertNotNull(vm.timelineProperty().get(), vm.statusProperty().get());
            assertEquals(app.latentledger.chart.draw.Theme.OUTDOOR, vm.timelineProperty().get().themeProperty().get());
            s.saveSettings(s.settingsProperty().get().withChoice("theme", "dark"));
            assertEquals(app.latentledger.chart.draw.Theme.DARK, vm.timelineProperty().get().themeProperty().get());
        }
    }

    @Test
    void anOversizedSystemsLogShowsItsShortCyclingIsKeptAndComesBackAfterARestart() {
        String visitId;
        List<String> shownCodes;
        String shownRate;
        try (AppSession s = withNewVisit(dir)) {
            visitId = s.visit().id();
            LogImportViewModel vm = direct(s);
            assertTrue(vm.airflowNeededProperty().get(), "a new visit has no reading set with an airflow");
            assertEquals("Airflow, cfm", vm.airflowCaptionProperty().get());
            List<Double> progress = new ArrayList<>();
            vm.progressProperty().addListener((o, a, b) -> progress.add(b.doubleValue()));
            vm.fileProperty().set(SAMPLES.resolve("oversized-short-cycling.csv").toString());
            vm.airflowProperty().set("1400"); // the sample's airflow, field-data-samples/README.md
            vm.importFile();
            assertTrue(vm.statusProperty().get().startsWith("Imported oversized-short-cycling.csv"),
                    vm.statusProperty().get());
            assertFalse(vm.busyProperty().get());
            // 8 641 rows: the importer reports every 8 192 rows, then the end
            assertTrue(progress.stream().anyMatch(p -> p > 0 && p < 1), "progress on the way: " + progress);
            assertEquals(1.0, progress.get(progress.size() - 1));
            shownCodes = codes(vm.findings());
            // README: short-cycling, short-cycling-limits-latent, fan-off-delay-reevaporation (the sample has a 3-min fan-off delay)
            assertTrue(shownCodes.containsAll(List.of("short-cycling", "short-cycling-limits-latent",
                    "fan-off-delay-reevaporation")), shownCodes.toString());
            shownRate = row(vm, "cycles-per-hour").value();
            // README: ≈ 3.9 cycles per hour
            assertEquals(3.9, Double.parseDouble(shownRate), 0.2);
            assertEquals("compressor column", row(vm, "timed-from").value(), "the sample has a compressor column");
            assertNotNull(vm.timelineProperty().get(), "a timeline to draw");
            assertEquals(List.of("oversized-short-cycling.csv"), vm.imported());
            assertEquals(1, s.ledger().logs().idsForVisit(visitId).size());
        }
        try (AppSession again = AppSession.open(dir, new CycleLogAnalysis())) {
            again.openVisit(again.ledger().visits().find(visitId).orElseThrow());
            LogImportViewModel vm = direct(again);
            assertEquals(List.of("oversized-short-cycling.csv"), vm.imported());
            assertEquals(shownCodes, codes(vm.findings()), "the kept log gives the same findings");
            assertEquals(shownRate, row(vm, "cycles-per-hour").value());
            assertNotNull(vm.timelineProperty().get());
            assertTrue(vm.statusProperty().get().startsWith("Showing oversized-short-cycling.csv"),
                    vm.statusProperty().get());
        }
    }

    @Test
    void anotherLoggersExportIsReadThroughTheHeaderMapInSiUnits() {
        try (AppSession s = withNewVisit(dir)) {
            s.saveSettings(s.settings().withChoice(SettingsCatalogue.UNITS, "si"));
            LogImportViewModel vm = direct(s);
            assertEquals("Airflow, L/s", vm.airflowCaptionProperty().get());
            vm.fileProperty().set(SAMPLES.resolve("other-logger-export.csv").toString());
            assertEquals(List.of("Date/Time", "RA Temp [°C]", "RA RH [%]", "SA Temp [°C]", "SA RH [%]", "Battery [V]"),
                    vm.columns().picks().stream().map(ColumnPicks.Pick::header).toList(), "every column needs a pick");
            pick(vm, "Date/Time", "Date and time");
            pick(vm, "RA Temp [°C]", "Return dry bulb");
            pick(vm, "RA RH [%]", "Return relative humidity");
            pick(vm, "SA Temp [°C]", "Supply dry bulb");
            pick(vm, "SA RH [%]", "Supply relative humidity");
            vm.airflowProperty().set("470");
            vm.importFile();
            assertTrue(vm.statusProperty().get().startsWith("Imported other-logger-export.csv"),
                    vm.statusProperty().get());
            // README: off-cycle-reevaporation and sensor-offset; 2 rows kept out, 1 repeated time, battery ignored
            assertTrue(codes(vm.findings()).containsAll(List.of("off-cycle-reevaporation", "sensor-offset")),
                    codes(vm.findings()).toString());
            assertTrue(vm.notesProperty().get().contains("2 kept out"), vm.notesProperty().get());
            assertTrue(vm.notesProperty().get().contains("1 repeated time(s) dropped"), vm.notesProperty().get());
            assertTrue(vm.notesProperty().get().contains("Battery [V]"), vm.notesProperty().get());
            assertEquals("kg", row(vm, "removed").unit());
        }
    }

    @Test
    void withoutPicksTheFileIsRefusedInWordsAndNothingIsKept() {
        try (AppSession s = withNewVisit(dir)) {
            LogImportViewModel vm = direct(s);
            vm.fileProperty().set(SAMPLES.resolve("other-logger-export.csv").toString());
            vm.importFile();
            // said in words beside the column picker, never as the command line's --map syntax
            assertEquals("Not imported: no column holds the time: set the column with the date and time (or the"
                    + " seconds from the start) to Date and time or Seconds from the start.", vm.statusProperty().get());
            assertEquals(LogImportViewModel.About.COLUMNS, vm.aboutProperty().get());
            assertTrue(s.ledger().logs().idsForVisit(s.visit().id()).isEmpty());
        }
    }

    @Test
    void anAirflowOutOfRangeIsRefusedWithItsRange() {
        try (AppSession s = withNewVisit(dir)) {
            LogImportViewModel vm = direct(s);
            vm.fileProperty().set(SAMPLES.resolve("healthy-long-cycling.csv").toString());
            vm.airflowProperty().set("5");
            vm.importFile();
            String m = vm.statusProperty().get();
            assertTrue(m.startsWith("Not imported: airflow 5 cfm") && m.contains("accepted range"), m);
            assertTrue(s.ledger().logs().idsForVisit(s.visit().id()).isEmpty());
        }
    }

    @Test
    void theImportRunsOnTheWorkerAndItsResultsArriveOnlyThroughTheFxExecutor() {
        Queue<Runnable> worker = new ArrayDeque<>();
        Queue<Runnable> fx = new ArrayDeque<>();
        try (AppSession s = withNewVisit(dir)) {
            LogImportViewModel vm = new LogImportViewModel(s, worker::add, fx::add);
            vm.fileProperty().set(SAMPLES.resolve("healthy-long-cycling.csv").toString());
            vm.airflowProperty().set("1200");
            vm.importFile();
            assertTrue(vm.busyProperty().get(), "busy while the worker has the job");
            assertEquals(1, worker.size());
            worker.poll().run();
            assertTrue(vm.summary().isEmpty(), "nothing applied off the FX thread");
            assertNull(vm.timelineProperty().get());
            while (!fx.isEmpty()) {
                fx.poll().run();
            }
            assertFalse(vm.busyProperty().get());
            assertFalse(vm.summary().isEmpty());
            // README: the healthy log has no findings
            assertTrue(vm.findings().isEmpty(), codes(vm.findings()).toString());
        }
    }

    private static void importSample(LogImportViewModel vm, String name) {
        vm.fileProperty().set(SAMPLES.resolve(name).toString());
        vm.importFile();
        assertTrue(vm.statusProperty().get().startsWith("Imported " + name), vm.statusProperty().get());
    }

    @Test
    void severalKeptLogsAreListedAndEachCanBeShownAgainWithItsOwnFigures() {
        try (AppSession s = withNewVisit(dir)) {
            LogImportViewModel vm = direct(s);
            assertTrue(vm.formOpenProperty().get(), "a visit without logs opens on the import form");
            vm.airflowProperty().set("1400");
            importSample(vm, "oversized-short-cycling.csv");
            assertFalse(vm.formOpenProperty().get(), "the form closes once a log is shown");
            assertEquals(LogImportViewModel.About.LOGS, vm.aboutProperty().get(), "the message sits by the kept logs");
            String oversizedRate = row(vm, "cycles-per-hour").value();
            vm.formOpenProperty().set(true);
            vm.airflowProperty().set("1200");
            importSample(vm, "healthy-long-cycling.csv");
            assertEquals(List.of("oversized-short-cycling.csv", "healthy-long-cycling.csv"),
                    vm.keptLogs().stream().map(LogImportViewModel.KeptLog::name).toList());
            LogImportViewModel.KeptLog first = vm.keptLogs().get(0);
            LogImportViewModel.KeptLog second = vm.keptLogs().get(1);
            assertTrue(second.shown() && !first.shown(), "the newest import is the one shown");
            // README: the healthy log has no findings, the oversized one short-cycles
            assertTrue(vm.findings().isEmpty(), codes(vm.findings()).toString());
            vm.view(first);
            assertTrue(vm.statusProperty().get().startsWith("Showing oversized-short-cycling.csv"),
                    vm.statusProperty().get());
            assertTrue(codes(vm.findings()).contains("short-cycling"), codes(vm.findings()).toString());
            assertEquals(oversizedRate, row(vm, "cycles-per-hour").value(), "the same figures as at import");
            assertEquals(first.id(), vm.shownIdProperty().get());
            assertTrue(vm.keptLogs().get(0).shown());
        }
    }

    @Test
    void deletingAKeptLogAsksFirstThenMovesItToTheRecycleBinFromWhereItCanBeRestored() {
        try (AppSession s = withNewVisit(dir)) {
            LogImportViewModel vm = direct(s);
            vm.airflowProperty().set("1200");
            importSample(vm, "healthy-long-cycling.csv");
            vm.formOpenProperty().set(true);
            importSample(vm, "oversized-short-cycling.csv");
            LogImportViewModel.KeptLog shown = vm.keptLogs().get(1);
            vm.askDelete(shown);
            assertNotNull(vm.pendingDeleteProperty().get(), "asked first");
            assertTrue(vm.pendingDeleteProperty().get().question().contains("oversized-short-cycling.csv"));
            vm.cancelDelete();
            assertEquals(2, s.ledger().logs().idsForVisit(s.visit().id()).size(), "no means nothing is deleted");
            vm.askDelete(shown);
            vm.confirmDelete();
            assertEquals(List.of("healthy-long-cycling.csv"), vm.keptLogs().stream().map(LogImportViewModel.KeptLog::name).toList());
            assertTrue(vm.statusProperty().get().startsWith("Deleted Log oversized-short-cycling.csv"), vm.statusProperty().get());
            assertTrue(vm.summary().isEmpty() && vm.findings().isEmpty() && vm.timelineProperty().get() == null,
                    "the deleted log's figures leave the screen");
            var entry = s.ledger().recycleBin().find(app.latentledger.core.records.RecordKind.LOG, shown.id());
            assertTrue(entry.isPresent(), "the log is in the recycle bin");
            s.ledger().recycleBin().restore(app.latentledger.core.records.RecordKind.LOG, shown.id());
            s.screenProperty().set(app.latentledger.ui.session.Screen.RESULTS);
            s.screenProperty().set(app.latentledger.ui.session.Screen.LOGS);
            assertEquals(2, vm.keptLogs().size(), "a restored log is listed again when the screen is shown");
        }
    }

    @Test
    void theDateOrderAndTimeZoneChosenAreUsedAndTheZoneIsKeptWithTheLog() {
        try (AppSession s = withNewVisit(dir)) {
            LogImportViewModel vm = direct(s);
            vm.airflowProperty().set("1200");
            vm.fileProperty().set(SAMPLES.resolve("us-dates-hot-week.csv").toString());
            vm.timeZoneProperty().set("Saltreed/Nowhere");
            vm.dateOrderProperty().set("mdy");
            vm.importFile();
            assertEquals(LogImportViewModel.About.TIME_ZONE, vm.aboutProperty().get());
            assertTrue(vm.statusProperty().get().contains("Saltreed/Nowhere"), vm.statusProperty().get());
            vm.timeZoneProperty().set("America/Chicago");
            vm.fanAirflowProperty().set("x");
            vm.importFile();
            assertEquals(LogImportViewModel.About.FAN_AIRFLOW, vm.aboutProperty().get());
            vm.fanAirflowProperty().set("800");
            importSample(vm, "us-dates-hot-week.csv");
            assertTrue(vm.notesProperty().get().contains("dates read as mdy"), vm.notesProperty().get());
            assertTrue(vm.keptLogs().get(0).when().contains("America/Chicago"), vm.keptLogs().get(0).when());
            var kept = s.ledger().logs().find(vm.keptLogs().get(0).id()).orElseThrow().kept();
            assertEquals("America/Chicago", kept.timeZone());
            // 800 cfm in m³/s: 800 × 0.3048³ / 60
            assertEquals(800 * Math.pow(0.3048, 3) / 60, kept.fanAirflowM3PerS(), 1e-9);
            // README: us-dates-hot-week gives oversized-for-load
            assertTrue(codes(vm.findings()).contains("oversized-for-load"), codes(vm.findings()).toString());
        }
    }

    @Test
    void anAirflowRefusedIsSaidBesideTheAirflowField() {
        try (AppSession s = withNewVisit(dir)) {
            LogImportViewModel vm = direct(s);
            vm.fileProperty().set(SAMPLES.resolve("healthy-long-cycling.csv").toString());
            vm.airflowProperty().set("5");
            vm.importFile();
            assertEquals(LogImportViewModel.About.AIRFLOW, vm.aboutProperty().get());
            vm.airflowProperty().set("1200");
            vm.fileProperty().set("no-such-file.csv");
            vm.importFile();
            assertEquals(LogImportViewModel.About.IMPORT, vm.aboutProperty().get());
            assertTrue(vm.formOpenProperty().get(), "a refused import leaves the form open");
        }
    }

    @Test
    void aCelsiusFileUnderFahrenheitSettingsIsRefusedWithItsUnitAndReadInSiSettings() {
        try (AppSession s = withNewVisit(dir)) {
            LogImportViewModel vm = direct(s);
            vm.airflowProperty().set("1200");
            vm.fileProperty().set(SAMPLES.resolve("celsius-plain.csv").toString());
            vm.importFile();
            // README: celsius-plain.csv is refused under IP settings (24 °F return air)
            String m = vm.statusProperty().get();
            assertTrue(m.startsWith("Not imported") && m.contains("return_db") && m.contains("°F"), m);
            assertEquals(LogImportViewModel.About.IMPORT, vm.aboutProperty().get());
            assertTrue(s.ledger().logs().idsForVisit(s.visit().id()).isEmpty(), "nothing kept");
            s.saveSettings(s.settings().withChoice(SettingsCatalogue.UNITS, "si"));
            vm.airflowProperty().set("570"); // README: --units si --airflow 570
            importSample(vm, "celsius-plain.csv");
            assertTrue(codes(vm.findings()).contains("fan-off-delay-reevaporation"), codes(vm.findings()).toString());
        }
    }

    /** Picks what a column holds by the words the drop-down shows, as a tech does. */
    private static void pick(LogImportViewModel vm, String header, String words) {
        ColumnPicks.Pick p = vm.columns().picks().stream().filter(x -> x.header().equals(header)).findFirst()
                .orElseThrow(() -> new AssertionError("no pick for " + header));
        p.fieldProperty().set(LogField.choices().stream().filter(f -> f.words().equals(words)).findFirst()
                .orElseThrow(() -> new AssertionError("no choice " + words)));
    }

    @Test
    void refusalsOfThePicksNameTheColumnsAndFieldsInWordsAndKeepNothing() {
        try (AppSession s = withNewVisit(dir)) {
            LogImportViewModel vm = direct(s);
            vm.fileProperty().set(SAMPLES.resolve("other-logger-export.csv").toString());
            vm.airflowProperty().set("470");
            pick(vm, "Date/Time", "Date and time");
            vm.importFile();
            assertEquals(LogImportViewModel.About.COLUMNS, vm.aboutProperty().get());
            assertTrue(vm.statusProperty().get().startsWith("Not imported: no column holds a temperature"),
                    vm.statusProperty().get());
            pick(vm, "RA Temp [°C]", "Return dry bulb");
            pick(vm, "SA Temp [°C]", "Return dry bulb");
            vm.importFile();
            assertEquals("Not imported: the columns 'RA Temp [°C]' and 'SA Temp [°C]' are both Return dry bulb: set"
                    + " one of them to another field or to Not used.", vm.statusProperty().get());
            pick(vm, "SA Temp [°C]", "Seconds from the start");
            vm.importFile();
            assertTrue(vm.statusProperty().get().contains("'Date/Time' and 'SA Temp [°C]' both hold the time"),
                    vm.statusProperty().get());
            assertTrue(s.ledger().logs().idsForVisit(s.visit().id()).isEmpty(), "nothing kept");
            String shown = vm.statusProperty().get();
            assertFalse(shown.contains("--map") || shown.contains("_db") || shown.contains("HEADER="), shown);
        }
    }

    @Test
    void aNewFileBringsItsOwnColumnsAndTheGenericLayoutNeedsNoPicks() {
        try (AppSession s = withNewVisit(dir)) {
            LogImportViewModel vm = direct(s);
            vm.fileProperty().set(SAMPLES.resolve("other-logger-export.csv").toString());
            pick(vm, "Date/Time", "Date and time");
            vm.fileProperty().set(SAMPLES.resolve("celsius-plain.csv").toString());
            assertTrue(vm.columns().picks().isEmpty(), "the sample's headers are the field names");
            assertTrue(vm.columns().knownProperty().get().startsWith("Read by their names: "),
                    vm.columns().knownProperty().get());
        }
    }
}
