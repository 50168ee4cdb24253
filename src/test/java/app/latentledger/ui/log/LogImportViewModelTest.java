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
            // README: short-cycling, short-cycling-limits-latent, off-cycle-reevaporation
            assertTrue(shownCodes.containsAll(List.of("short-cycling", "short-cycling-limits-latent",
                    "off-cycle-reevaporation")), shownCodes.toString());
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
            vm.headerMapProperty().set("Date/Time=time; RA Temp [°C]=return_db; RA RH [%]=return_rh;"
                    + " SA Temp [°C]=supply_db\nSA RH [%]=supply_rh");
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
    void withoutTheMapTheFileIsRefusedAndNothingIsKept() {
        try (AppSession s = withNewVisit(dir)) {
            LogImportViewModel vm = direct(s);
            vm.fileProperty().set(SAMPLES.resolve("other-logger-export.csv").toString());
            vm.importFile();
            assertTrue(vm.statusProperty().get().startsWith("Not imported: other-logger-export.csv refused: no time column"),
                    vm.statusProperty().get());
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

    @Test
    void parsesAHeaderMapAtTheLastEqualsSign() {
        assertEquals(java.util.Map.of("A=B", "time", "RA", "return_db"), LogImportViewModel.parseMap("A=B=time; RA=return_db"));
    }
}
