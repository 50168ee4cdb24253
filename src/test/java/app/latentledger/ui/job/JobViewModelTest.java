package app.latentledger.ui.job;

import app.latentledger.core.records.VisitPurpose;
import app.latentledger.ui.TestSessions;
import app.latentledger.ui.session.AppSession;
import app.latentledger.ui.session.Screen;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The job screen's view model without a window. */
class JobViewModelTest {
    @TempDir
    Path dir;

    @Test
    void addASiteAndASystemThenStartAVisit() {
        try (AppSession s = TestSessions.open(dir)) {
            JobViewModel vm = new JobViewModel(s);
            assertEquals(2, vm.sites().size(), "the demo's two sites");
            vm.newSiteNameProperty().set("Gullwing Terrace flat");
            vm.newSiteAddressProperty().set("7 Gullwing Terrace, Saltreed");
            vm.newSiteElevationFtProperty().set("30");
            assertTrue(vm.addSite(), vm.statusProperty().get());
            assertEquals("Gullwing Terrace flat", vm.siteProperty().get().name());
            // 30 ft = 9.144 m (exact: 1 ft = 0.3048 m)
            assertEquals(9.144, vm.siteProperty().get().elevationM(), 1e-9);
            vm.newSystemLabelProperty().set("Hall closet air handler");
            vm.newSystemTonsProperty().set("2");
            assertTrue(vm.addSystem(), vm.statusProperty().get());
            vm.purposeProperty().set(VisitPurpose.COMMISSIONING);
            vm.technicianProperty().set("Odile Marsh");
            assertTrue(vm.startVisit(), vm.statusProperty().get());
            assertEquals(Screen.READINGS, s.screenProperty().get());
            assertEquals(VisitPurpose.COMMISSIONING, s.visit().purpose());
            assertEquals(1, vm.visits().size());
        }
    }

    @Test
    void aVisitWithoutATechnicianIsRefusedWithTheRecordsMessage() {
        try (AppSession s = TestSessions.open(dir)) {
            JobViewModel vm = new JobViewModel(s);
            vm.technicianProperty().set("  ");
            assertFalse(vm.startVisit());
            assertEquals("Not started: visit technician refused: missing", vm.statusProperty().get());
        }
    }

    @Test
    void aSiteAboveTheElevationRangeIsRefusedWithTheRange() {
        try (AppSession s = TestSessions.open(dir)) {
            JobViewModel vm = new JobViewModel(s);
            vm.newSiteNameProperty().set("Summit hut");
            vm.newSiteElevationFtProperty().set("20000");
            assertFalse(vm.addSite());
            // the core accepts −450 to 4500 m = −1476.4 to 14763.8 ft (InputLimits)
            assertTrue(vm.statusProperty().get().contains("accepted range -1476 to 14763 ft"),
                    vm.statusProperty().get());
        }
    }
}
