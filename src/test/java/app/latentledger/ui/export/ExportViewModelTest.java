package app.latentledger.ui.export;

import app.latentledger.bundle.Bundles;
import app.latentledger.store.Ledger;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The export screen's view model: the bundle it writes imports into another ledger. */
class ExportViewModelTest {
    @TempDir
    Path dir;
    @TempDir
    Path other;

    @Test
    void theVisitBundleImportsIntoAnotherLedger() throws Exception {
        try (AppSession s = TestSessions.open(dir)) {
            ExportViewModel vm = new ExportViewModel(s);
            Path file = vm.exportVisit();
            assertNotNull(file, vm.statusProperty().get());
            assertTrue(Files.size(file) > 0);
            assertTrue(vm.statusProperty().get().startsWith("Saved "), vm.statusProperty().get());
            try (Ledger target = new Ledger(app.latentledger.store.Database.open(other.resolve("x.db")))) {
                Bundles.ImportSummary summary = Bundles.importBundle(target, file);
                assertEquals(java.util.List.of(s.visit().id()), summary.visitIds());
            }
        }
    }
}
