package app.latentledger.ui.log;

import app.latentledger.core.records.VisitPurpose;
import app.latentledger.store.DemoScenario;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Background;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.time.ZoneId;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The log screen with no zone typed: clock times without a UTC offset are read in the visit's
 * site's zone (the demo's Saltreed keeps Eastern time), the import says so, the zone is kept with
 * the log, and the empty zone field says which zone it will use.
 */
class LogZoneDefaultTest {
    @TempDir
    Path dir;

    @Test
    void theSitesZoneIsUsedWhenNoneIsTypedAndTheScreenSaysWhose() {
        try (AppSession s = AppSession.open(dir, new CycleLogAnalysis())) {
            s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).ifPresent(s::openVisit);
            s.startVisit(s.site(), s.system(), VisitPurpose.COMPLAINT, "Test Tech", "");
            LogImportViewModel vm = new LogImportViewModel(s, Background.DIRECT, Background.DIRECT);
            assertEquals("The site's: " + DemoScenario.SALTREED_ZONE, vm.timeZonePromptProperty().get());
            vm.airflowProperty().set("1200");
            vm.fileProperty().set(Path.of("field-data-samples/us-dates-hot-week.csv").toString());
            vm.importFile();
            assertTrue(vm.statusProperty().get().startsWith("Imported"), vm.statusProperty().get());
            assertTrue(vm.notesProperty().get().contains("clock times read in the site's zone America/New_York"),
                    vm.notesProperty().get());
            assertEquals(DemoScenario.SALTREED_ZONE,
                    s.ledger().logs().find(vm.keptLogs().get(0).id()).orElseThrow().kept().timeZone());

            // the site without a zone: the tablet's, and the field says so once the visit is opened again
            s.ledger().sites().save(s.site().withTimeZone(""));
            s.openVisit(s.ledger().visits().find(DemoScenario.VISIT_COMPLAINT).orElseThrow());
            assertEquals("This tablet's: " + ZoneId.systemDefault().getId(), vm.timeZonePromptProperty().get());
        }
    }
}
