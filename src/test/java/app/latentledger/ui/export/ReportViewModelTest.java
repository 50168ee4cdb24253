package app.latentledger.ui.export;

import app.latentledger.store.DemoScenario;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.List;
import java.util.Queue;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The report buttons' view model: files in {@code <data>/reports}, paper from the settings, off the FX thread. */
class ReportViewModelTest {
    @TempDir
    Path dir;

    private static List<Path> files(Path folder) throws Exception {
        if (!Files.isDirectory(folder)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(folder)) {
            return s.toList();
        }
    }

    @Test
    void theVisitReportIsWrittenOnThePaperOfTheSettingsAndNamed() throws Exception {
        try (AppSession s = TestSessions.open(dir)) {
            s.openVisit(s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
            s.saveSettings(s.settings().withChoice(app.latentledger.core.settings.SettingsCatalogue.PAPER, "a4"));
            ReportViewModel vm = new ReportViewModel(s, Background.DIRECT, Background.DIRECT);
            vm.visitReport();
            List<Path> written = files(vm.folder());
            assertEquals(1, written.size(), written.toString());
            Path pdf = written.get(0);
            assertTrue(pdf.getFileName().toString().endsWith(".pdf"));
            assertEquals("Saved the report: " + pdf.getFileName() + " in " + vm.folder(), vm.statusProperty().get());
            assertFalse(vm.failedProperty().get());
            try (PDDocument d = Loader.loadPDF(pdf.toFile())) {
                // A4 = 210 × 297 mm = 595.28 × 841.89 pt (ISO 216; 1 pt = 1/72 in)
                PDRectangle box = d.getPage(0).getMediaBox();
                assertEquals(595.28, box.getWidth(), 0.5);
                assertEquals(841.89, box.getHeight(), 0.5);
            }
        }
    }

    @Test
    void dataExportsAndTheBeforeAfterReportGoBesideIt() throws Exception {
        try (AppSession s = TestSessions.open(dir)) {
            s.openVisit(s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
            ReportViewModel vm = new ReportViewModel(s, Background.DIRECT, Background.DIRECT);
            vm.csvData();
            vm.jsonData();
            // the demo's before and after sets are on one visit: its own report compares them
            vm.beforeAfterReport(s.visit().id());
            List<String> names = files(vm.folder()).stream().map(p -> p.getFileName().toString()).sorted().toList();
            assertEquals(3, names.size(), names.toString());
            assertTrue(names.stream().anyMatch(n -> n.contains("-before-after-") && n.endsWith(".pdf")), names.toString());
            assertTrue(names.stream().anyMatch(n -> n.contains("-data-") && n.endsWith(".csv")), names.toString());
            assertTrue(names.stream().anyMatch(n -> n.contains("-data-") && n.endsWith(".json")), names.toString());
        }
    }

    @Test
    void aFailureNamesTheFileAndLeavesNothing() throws Exception {
        try (AppSession s = TestSessions.open(dir)) {
            s.openVisit(s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
            Files.writeString(dir.resolve("reports"), "a file where the folder should be");
            ReportViewModel vm = new ReportViewModel(s, Background.DIRECT, Background.DIRECT);
            vm.visitReport();
            assertTrue(vm.failedProperty().get());
            assertTrue(vm.statusProperty().get().startsWith("No report written (heron-spit-road-residence-report-"),
                    vm.statusProperty().get());
            assertFalse(vm.busyProperty().get());
        }
    }

    @Test
    void theFileIsWrittenOnTheWorkerAndTheMessageSetOnTheFxThread() {
        Queue<Runnable> worker = new ArrayDeque<>();
        Queue<Runnable> fx = new ArrayDeque<>();
        try (AppSession s = TestSessions.open(dir)) {
            s.openVisit(s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
            ReportViewModel vm = new ReportViewModel(s, worker::add, fx::add);
            vm.visitReport();
            assertTrue(vm.busyProperty().get());
            assertTrue(vm.statusProperty().get().startsWith("Writing the report"));
            worker.poll().run();
            assertTrue(vm.busyProperty().get(), "the status waits for the FX thread");
            fx.poll().run();
            assertFalse(vm.busyProperty().get());
            assertTrue(vm.statusProperty().get().startsWith("Saved the report"), vm.statusProperty().get());
        }
    }

    @Test
    void anUnexpectedFailureIsASentenceNotAClassName() {
        Path file = Path.of("heron-report.pdf");
        String shown = ReportViewModel.failure("report", file, Path.of("reports"),
                new IllegalStateException("page tree index 3 out of bounds"));
        assertTrue(shown.startsWith("No report written (heron-report.pdf): something went wrong"), shown);
        assertFalse(shown.contains("Exception") || shown.contains("java.") || shown.contains("out of bounds"), shown);
        String disk = ReportViewModel.failure("report", file, Path.of("reports"),
                new java.io.IOException("No space left on device"));
        assertFalse(disk.contains("IOException"), disk);
        assertTrue(disk.contains("could not be written"), disk);
        // the report's own refusals are written for the tech already and are shown as they are
        assertEquals("No report written (heron-report.pdf): cannot write x: it is a folder; give a file name",
                ReportViewModel.failure("report", file, Path.of("reports"),
                        new app.latentledger.report.ReportRefusedException("cannot write x: it is a folder; give a file name")));
    }
}
