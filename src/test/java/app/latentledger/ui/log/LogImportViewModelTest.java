package app.latentledger.ui.log;

import app.latentledger.core.findings.Finding;
import app.latentledger.core.findings.Severity;
import app.latentledger.core.units.Quantity;
import app.latentledger.store.Ledger;
import app.latentledger.ui.AppSession;
import app.latentledger.ui.results.Row;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The log screen's view model, with and without a log analysis wired in. */
class LogImportViewModelTest {
    @TempDir
    Path dir;

    @Test
    void withoutAnAnalysisTheScreenSaysItArrivesLater() {
        try (AppSession s = AppSession.open(dir, LogAnalysisService.NOT_WIRED)) {
            LogImportViewModel vm = new LogImportViewModel(s);
            vm.importFile();
            assertEquals(LogImportViewModel.NOT_WIRED_MESSAGE, vm.statusProperty().get());
        }
    }

    @Test
    void aWiredAnalysisFillsTheSummaryAndFindings() throws Exception {
        LogAnalysisService fake = new LogAnalysisService() {
            @Override
            public boolean wired() {
                return true;
            }

            @Override
            public LogAnalysis importAndAnalyse(Ledger ledger, Path file, app.latentledger.core.records.Visit visit,
                                                app.latentledger.core.records.HvacSystem system,
                                                app.latentledger.core.units.UnitSystem units) {
                return new LogAnalysis(file.getFileName().toString(), List.of(new Row("cycles", "Cycles", "4", "")),
                        List.of(new Finding("short-cycles", Severity.CHECK, "The system starts and stops often.",
                                "4 cycles in 1 h", List.of(app.latentledger.core.findings.Evidence.of("cycles", "cycles",
                                Quantity.DIMENSIONLESS, 4)), List.of("Check the thermostat's cycle rate."))));
            }
        };
        Path log = Files.writeString(dir.resolve("attic.csv"), "time,t\n0,25\n");
        try (AppSession s = AppSession.open(dir, fake)) {
            LogImportViewModel vm = new LogImportViewModel(s);
            vm.fileProperty().set(log.toString());
            vm.importFile();
            assertTrue(vm.statusProperty().get().startsWith("Imported attic.csv."), vm.statusProperty().get());
            assertEquals("4", vm.summary().get(0).value());
            assertEquals(List.of("cycles: 4.00"), vm.findings().get(0).evidence());
        }
    }

    @Test
    void aMissingFileIsNamed() {
        LogAnalysisService wired = new LogAnalysisService() {
            @Override
            public boolean wired() {
                return true;
            }

            @Override
            public LogAnalysis importAndAnalyse(Ledger l, Path f, app.latentledger.core.records.Visit v,
                                                app.latentledger.core.records.HvacSystem y,
                                                app.latentledger.core.units.UnitSystem u) {
                throw new AssertionError("not reached");
            }
        };
        try (AppSession s = AppSession.open(dir, wired)) {
            LogImportViewModel vm = new LogImportViewModel(s);
            vm.fileProperty().set(dir.resolve("nope.csv").toString());
            vm.importFile();
            assertTrue(vm.statusProperty().get().endsWith("nope.csv is not a file."), vm.statusProperty().get());
        }
    }
}
