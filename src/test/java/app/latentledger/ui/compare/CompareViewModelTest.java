package app.latentledger.ui.compare;

import app.latentledger.store.DemoScenario;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** The compare screen's view model on the demo's before/after pair (DemoScenario's numbers). */
class CompareViewModelTest {
    @TempDir
    Path dir;

    @Test
    void afterIsComparedWithBeforeSideBySide() {
        try (AppSession s = TestSessions.open(dir)) {
            s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(s::openVisit);
            s.openReadingSet(DemoScenario.READINGS_AFTER);
            CompareViewModel vm = new CompareViewModel(s);
            assertEquals(DemoScenario.READINGS_BEFORE, vm.chosenProperty().get().id());
            CompareRow airflow = row(vm, "airflow");
            // the demo's airflow went from 1410 to 1080 cfm when the blower tap was lowered
            assertEquals("1,410", airflow.before());
            assertEquals("1,080", airflow.after());
            assertEquals("-330", airflow.change());
            assertEquals("cfm", airflow.unit());
            assertEquals("Not dehumidifying  →  Dehumidifying", vm.verdictsProperty().get());
        }
    }

    @Test
    void anIncompleteCurrentSetSaysWhatIsMissing() {
        try (AppSession s = TestSessions.withNewVisit(dir)) {
            CompareViewModel vm = new CompareViewModel(s);
            assertEquals(0, vm.rows().size());
            assertEquals("The current readings are not complete yet: return dry bulb, return wet bulb, supply dry bulb,"
                    + " supply wet bulb, airflow.", vm.statusProperty().get());
        }
    }

    private static CompareRow row(CompareViewModel vm, String key) {
        return vm.rows().stream().filter(r -> r.key().equals(key)).findFirst().orElseThrow();
    }
}
